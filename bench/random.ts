/**
 * A small seeded generator (SplitMix64; Steele, Lea and Flood, "Fast splittable
 * pseudorandom number generators", OOPSLA 2014 — from memory), so that every
 * benchmark run times the same matrices. Only the high bits are used: the low
 * bits of simpler generators repeat with short periods, which makes random
 * matrices singular.
 */
export class Random {
  private state: bigint;

  constructor(seed: number) {
    this.state = BigInt(seed) & 0xffffffffffffffffn;
  }

  /** 64 random bits. */
  next64(): bigint {
    this.state = (this.state + 0x9e3779b97f4a7c15n) & 0xffffffffffffffffn;
    let z = this.state;
    z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & 0xffffffffffffffffn;
    z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & 0xffffffffffffffffn;
    return z ^ (z >> 31n);
  }

  /** A uniform integer in [min, max] (inclusive), for ranges below 2^32. */
  integer(min: number, max: number): number {
    const span = max - min + 1;
    // The top 32 bits, scaled; the bias is below 2^-20 for the spans used here.
    return min + Math.floor((Number(this.next64() >> 32n) / 2 ** 32) * span);
  }

  /** A uniform signed integer of at most `bits` bits (|x| < 2^(bits−1)), bits ≤ 64. */
  signedBits(bits: number): bigint {
    const x = this.next64() >> BigInt(64 - bits);
    return x - (1n << BigInt(bits - 1));
  }
}
