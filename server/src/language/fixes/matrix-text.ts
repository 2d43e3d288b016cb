/**
 * Writing a matrix literal `[ … ]` in the style of one the user wrote: its
 * rows on lines of their own (aligned under the first entry) or split by
 * `;` on one line, entries split by spaces or by commas, and the same spacing
 * inside the brackets. Columns are right-aligned, as the hovers print them.
 */
import type { MatrixLit } from '../ast.js';

interface Style {
  multiline: boolean;
  separator: string;
  opening: string;
  closing: string;
  /** What precedes the first entry on its line, as blanks (tabs kept): the indentation of later rows. */
  indent: string;
}

function styleOf(source: string, m: MatrixLit): Style {
  const rows = m.rows.filter((r) => r.length > 0);
  const first = rows[0]?.[0];
  const lastRow = rows[rows.length - 1];
  const last = lastRow?.[lastRow.length - 1];
  let multiline = false;
  for (let i = 1; i < rows.length; i++) {
    const gap = source.slice(rows[i - 1]![rows[i - 1]!.length - 1]!.span.end, rows[i]![0]!.span.start);
    if (gap.includes('\n') || gap.includes('\r')) multiline = true;
  }
  const comma = rows.some((r) => r.slice(1).some((x, j) => source.slice(r[j]!.span.end, x.span.start).includes(',')));
  const inside = (text: string) => (/^[ \t]*$/.test(text) ? text : ' ');
  const opening = first ? inside(source.slice(m.span.start + 1, first.span.start)) : ' ';
  const closing = last ? inside(source.slice(last.span.end, m.span.end - 1)) : ' ';
  const lineStart = first ? Math.max(source.lastIndexOf('\n', first.span.start - 1), source.lastIndexOf('\r', first.span.start - 1)) + 1 : 0;
  const indent = first ? source.slice(lineStart, first.span.start).replace(/[^\t]/g, ' ') : '';
  return { multiline, separator: comma ? ', ' : ' ', opening, closing, indent };
}

/**
 * The literal for `rows` (entry texts, one array per row), styled like
 * `original`. Undefined for an empty matrix (no literal writes it) and when
 * the original holds a comment, which a rewrite would lose.
 */
export function matrixLiteralLike(source: string, original: MatrixLit, rows: readonly (readonly string[])[]): string | undefined {
  if (rows.length === 0 || rows.some((r) => r.length === 0)) return undefined;
  if (source.slice(original.span.start, original.span.end).includes('#')) return undefined;
  const style = styleOf(source, original);
  const ncols = Math.max(...rows.map((r) => r.length));
  const widths = Array.from({ length: ncols }, (_, j) => Math.max(...rows.map((r) => (r[j] ?? '').length)));
  // Rows on lines of their own are aligned; on one line, padding would only spread them out.
  const align = style.multiline && style.separator === ' ';
  const lines = rows.map((r) => r.map((x, j) => (align ? x.padStart(widths[j]!) : x)).join(style.separator));
  const newline = source.includes('\r\n') ? '\r\n' : '\n';
  const body = style.multiline ? lines.join(`${newline}${style.indent}`) : lines.join('; ');
  return `[${style.opening}${body}${style.closing}]`;
}
