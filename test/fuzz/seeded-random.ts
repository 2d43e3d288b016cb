/**
 * A small seeded pseudo-random generator (mulberry32, a public-domain 32-bit
 * generator; common practice, no source), so that every fuzz run with the
 * same seed tries exactly the same inputs and a failure can be replayed.
 */
export class SeededRandom {
  private state: number;

  constructor(seed: number) {
    this.state = seed >>> 0;
  }

  /** A float in [0, 1). */
  next(): number {
    this.state = (this.state + 0x6d2b79f5) >>> 0;
    let t = this.state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  }

  /** An integer in [0, bound). */
  below(bound: number): number {
    return Math.floor(this.next() * bound);
  }

  /** An integer in [min, max]. */
  between(min: number, max: number): number {
    return min + this.below(max - min + 1);
  }

  pick<T>(items: readonly T[]): T {
    return items[this.below(items.length)]!;
  }

  chance(probability: number): boolean {
    return this.next() < probability;
  }
}
