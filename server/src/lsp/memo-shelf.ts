/**
 * The memos of statement outcomes an evaluation worker keeps, one per document, for the few documents it
 * evaluated last. A memo holds about one document's results, so the shelf is small; the least recently
 * evaluated document's memo is dropped first.
 */

/** Documents whose memos one worker keeps. */
export const MEMOS_PER_WORKER = 8;

export class MemoShelf<M> {
  private readonly memos = new Map<string, M>();

  constructor(
    private readonly create: () => M,
    private readonly capacity = MEMOS_PER_WORKER,
  ) {}

  /** The memo of `document`, made when there is none. */
  for(document: string): M {
    let memo = this.memos.get(document);
    if (memo) this.memos.delete(document);
    else memo = this.create();
    this.memos.set(document, memo);
    while (this.memos.size > this.capacity) this.memos.delete(this.memos.keys().next().value as string);
    return memo;
  }

  has(document: string): boolean {
    return this.memos.has(document);
  }
}
