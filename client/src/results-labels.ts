/**
 * How one result looks in the results view: its label, the dimmed text
 * beside it, its tooltip and its icon. Kept apart from the VS Code API so it
 * can be tested without an editor.
 */
import type { ResultItem } from '../../server/src/lsp/results-protocol.js';

/** The view's id; must match `contributes.views` in package.json. */
export const RESULTS_VIEW_ID = 'wedgework.results';
/** The context key that makes the view visible (set once the extension runs). */
export const VIEW_ENABLED_CONTEXT = 'wedgework.resultsViewEnabled';

export interface ResultPresentation {
  /** The declared name, or the kind for a claim or a show. */
  label: string;
  /** Kind (for a named result), value and convention, on one line. */
  description: string;
  /** Plain text, one fact per line. */
  tooltip: string;
  /** A product icon id (`codicon` name). */
  icon: string;
}

/** Icons by result kind, from VS Code's built-in icon set; a claim's depends on its verdict. */
const ICONS: Record<string, string> = {
  field: 'symbol-constant',
  space: 'symbol-namespace',
  vector: 'symbol-array',
  subspace: 'symbol-interface',
  multivector: 'symbol-operator',
  scalar: 'symbol-number',
  map: 'symbol-function',
  flag: 'list-tree',
  show: 'eye',
};

function iconOf(item: ResultItem): string {
  // A claim's summary opens with its verdict (✓ holds / ✗ false).
  if (item.kind === 'claim') return item.summary.startsWith('✗') ? 'error' : 'pass';
  return ICONS[item.kind] ?? 'symbol-misc';
}

export function presentResult(item: ResultItem): ResultPresentation {
  const label = item.name ?? item.kind;
  const value = item.name !== undefined ? `${item.kind}: ${item.summary}` : item.summary;
  const description = item.convention !== undefined ? `${value} · ${item.convention}` : value;
  const tooltip = [
    item.name !== undefined ? `${item.name} (${item.kind})` : item.kind,
    item.summary,
    ...(item.convention !== undefined ? [`Convention: ${item.convention}`] : []),
    `Line ${item.range.start.line + 1}`,
  ].join('\n');
  return { label, description, tooltip, icon: iconOf(item) };
}

/** The view's message: why the list is empty, or that it describes an earlier version of the file. */
export function viewMessage(results: { version: number; evaluatedVersion?: number; results: ResultItem[] } | undefined): string | undefined {
  if (!results) return undefined;
  if (results.evaluatedVersion === undefined) return 'Not evaluated yet.';
  if (results.evaluatedVersion !== results.version) return 'Results of the last evaluation; the file has changed since.';
  return undefined;
}
