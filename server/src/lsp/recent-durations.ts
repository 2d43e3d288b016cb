/**
 * The last few durations of a repeated piece of work per document, and their median: what decides whether
 * the next run waits for a pause in typing. One slow run (a garbage collection in the middle of a quick
 * pass, say) moves the median of five no more than a typical one does, so a single outlier no longer
 * makes the next keystroke wait.
 */
export class RecentDurations {
  private readonly byDocument = new Map<string, number[]>();

  constructor(private readonly kept = 5) {}

  record(uri: string, ms: number): void {
    const list = this.byDocument.get(uri) ?? [];
    list.push(ms);
    if (list.length > this.kept) list.shift();
    this.byDocument.set(uri, list);
  }

  /**
   * The median of the kept durations (the lower one of two, so that a slow first run — a cold start — is
   * outweighed by the first fast one), or undefined before the first run.
   */
  typical(uri: string): number | undefined {
    const list = this.byDocument.get(uri);
    if (!list || list.length === 0) return undefined;
    const sorted = [...list].sort((a, b) => a - b);
    return sorted[Math.floor((sorted.length - 1) / 2)];
  }

  delete(uri: string): void {
    this.byDocument.delete(uri);
  }
}
