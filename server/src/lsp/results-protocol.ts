/**
 * The `wedgework/results` notification: after each analysis the server tells
 * the editor every result of the document, for the client's results view.
 * Shared by the server and the client (client/src/results-view.ts); it
 * imports nothing, so the client bundle takes nothing else from the server.
 *
 * The server sends it only to clients that declare the experimental client
 * capability `RESULTS_CAPABILITY` (other editors never see an unknown method).
 */

export const RESULTS_NOTIFICATION = 'wedgework/results';

/** `capabilities.experimental[RESULTS_CAPABILITY] === true` in the client's initialize request. */
export const RESULTS_CAPABILITY = 'wedgeworkResults';

/** A zero-based LSP position and range (declared here so that this file imports nothing). */
export interface ResultPosition {
  line: number;
  character: number;
}

export interface ResultRange {
  start: ResultPosition;
  end: ResultPosition;
}

export interface ResultItem {
  /** `space`, `subspace`, `vector`, `multivector`, `claim`, `show`, … (the language's result kinds). */
  kind: string;
  /** The declared name; absent for claims and shows. */
  name?: string;
  /** One line: the value (or a claim's verdict), without the convention tag. */
  summary: string;
  /** The convention the value is stated in, e.g. `QQ, lex from 1, primitive`; absent where the summary names none. */
  convention?: string;
  /** The whole statement, in the document as it is now. */
  range: ResultRange;
}

export interface ResultsParams {
  uri: string;
  /** The document version the ranges refer to (the current one). */
  version: number;
  /**
   * The version that was evaluated. Smaller than `version` while the user types between evaluations:
   * the results are then those of the last evaluation, carried through the edits.
   */
  evaluatedVersion?: number;
  /** Every result, in document order. Empty when the document has no evaluation yet, or was closed. */
  results: ResultItem[];
}
