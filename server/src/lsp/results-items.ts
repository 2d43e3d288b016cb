/**
 * The results of an analysis as the `wedgework/results` notification carries
 * them (./results-protocol.ts): one item per result, its range in the current
 * text, its summary and the convention it is stated in, as separate fields.
 */
import type { TextDocument } from 'vscode-languageserver-textdocument';
import type { Analysis, Result } from '../language/index.js';
import { toRange } from './convert.js';
import type { ResultItem } from './results-protocol.js';

/**
 * The convention tag of a result, from its exact JSON form (the same words the summary ends with, see
 * `conventionTag` in the language layer), or `undefined` when the result names no convention.
 */
export function conventionOf(result: Result): string | undefined {
  const c = result.json['convention'];
  if (typeof c !== 'object' || c === null) return undefined;
  const { field, order, firstLabel, normalization, layout } = c as Record<string, unknown>;
  if (typeof field !== 'string' || typeof order !== 'string') return undefined;
  return `${field}, ${order} from ${String(firstLabel)}, ${String(normalization)}${layout === 'columns' ? ', columns' : ''}`;
}

/**
 * The item of one result. The convention is split off the summary where the summary ends with it, that
 * is where the language layer judged it part of the value's meaning (Plücker vectors, multivectors),
 * and is absent elsewhere (a vector's coordinates, a claim's verdict).
 */
export function toResultItem(document: TextDocument, result: Result): ResultItem {
  const tag = conventionOf(result);
  const convention = tag !== undefined && result.summary.endsWith(` · ${tag}`) ? tag : undefined;
  const summary = convention === undefined ? result.summary : result.summary.slice(0, -` · ${convention}`.length);
  return {
    kind: result.kind,
    ...(result.name !== undefined ? { name: result.name } : {}),
    summary,
    ...(convention !== undefined ? { convention } : {}),
    range: toRange(document, result.span),
  };
}

export function resultItems(document: TextDocument, analysis: Analysis | undefined): ResultItem[] {
  return (analysis?.results ?? []).map((r) => toResultItem(document, r));
}
