/**
 * An analysis as the evaluation worker sends it to the main thread: what the server reads of it, and no more.
 *
 * The exact JSON of a result is for the command line (`--json`); the server reads only a few of its fields
 * (the convention, for the results view; the reduced basis, for the quick fix that rewrites a basis; a
 * claim's verdict, for the LaTeX export), while the JSON of one Plücker vector of G(10,20) is about 10 MB,
 * whose copy between threads took the main thread most of a second. The syntax facts are left out too: the
 * editor features compute their own from the current text.
 */
import type { Analysis, Result } from '../language/index.js';

/** The fields of a result's JSON the server uses (see the file comment). */
export const JSON_FIELDS_FOR_THE_EDITOR = ['convention', 'basis', 'holds'] as const;

function slimResult(result: Result): Result {
  const json: Record<string, unknown> = {};
  for (const field of JSON_FIELDS_FOR_THE_EDITOR) {
    if (field in result.json) json[field] = result.json[field];
  }
  return { ...result, json };
}

export function slimForEditor(analysis: Analysis): Analysis {
  const { syntax: _notSent, ...rest } = analysis;
  return { ...rest, results: analysis.results.map(slimResult) };
}
