/**
 * A matrix as a picture: a bracketed grid of its exact entries in monospace,
 * right-aligned as in the code blocks, optionally with labels above the
 * columns and some columns (or rows) shaded — the identity block of a chart
 * [I | Y].
 */
import { MAX_SVG_BYTES, MONOSPACE, byteLength, escapeXml, n, svgDocument } from './document.js';

export interface MatrixPicture {
  /** The entries as text, one array per row. */
  cells: readonly (readonly string[])[];
  /** What the picture shows, for its title. */
  title: string;
  /** Labels above the columns (e.g. the basis labels 1 … n). */
  columnLabels?: readonly string[];
  shadedColumns?: ReadonlySet<number>;
  shadedRows?: ReadonlySet<number>;
}

/** Up to which sizes a matrix is legible in a hover (the shorter side, the longer side, one entry). */
export const MATRIX_LIMITS = { shortSide: 8, longSide: 16, entryLength: 12 };

const CHAR = 8;
const ROW = 20;
const HEADER = 16;
const PAD = 8;
const BRACKET = 6;

export function matrixFits(cells: readonly (readonly string[])[]): boolean {
  const rows = cells.length;
  const cols = cells[0]?.length ?? 0;
  if (rows === 0 || cols === 0) return false;
  if (Math.min(rows, cols) > MATRIX_LIMITS.shortSide || Math.max(rows, cols) > MATRIX_LIMITS.longSide) return false;
  return cells.every((r) => r.length === cols && r.every((x) => x.length <= MATRIX_LIMITS.entryLength));
}

/** The SVG, or undefined when the matrix is past the legible sizes (then the hover has text only). */
export function matrixSvg(m: MatrixPicture): string | undefined {
  if (!matrixFits(m.cells)) return undefined;
  const rows = m.cells.length;
  const cols = m.cells[0]!.length;
  const labels = m.columnLabels && m.columnLabels.length === cols ? m.columnLabels : undefined;
  const widest = Math.max(...m.cells.flat().map((x) => x.length), ...(labels ?? []).map((x) => x.length));
  const cell = widest * CHAR + 12;
  const top = PAD + (labels ? HEADER : 0);
  const left = PAD + BRACKET;
  const width = left + cols * cell + BRACKET + PAD;
  const height = top + rows * ROW + PAD;
  const bottom = top + rows * ROW;
  const right = left + cols * cell;
  const body: string[] = [];
  const shade: string[] = [];
  for (const j of m.shadedColumns ?? []) if (j >= 0 && j < cols) shade.push(`M${n(left + j * cell)} ${top}h${n(cell)}v${rows * ROW}h${n(-cell)}z`);
  for (const i of m.shadedRows ?? []) if (i >= 0 && i < rows) shade.push(`M${left} ${top + i * ROW}h${n(cols * cell)}v${ROW}h${n(-cols * cell)}z`);
  if (shade.length) body.push(`<path class="s" d="${shade.join('')}"/>`);
  body.push(`<path class="b" d="M${left} ${top}h${-BRACKET}V${bottom}h${BRACKET}M${right} ${top}h${BRACKET}V${bottom}h${-BRACKET}"/>`);
  if (labels) {
    body.push('<g class="h">');
    labels.forEach((l, j) => body.push(`<text x="${n(left + (j + 1) * cell - 6)}" y="${PAD + 11}">${escapeXml(l)}</text>`));
    body.push('</g>');
  }
  body.push('<g class="e">');
  m.cells.forEach((r, i) =>
    r.forEach((x, j) => body.push(`<text x="${n(left + (j + 1) * cell - 6)}" y="${top + i * ROW + 14}">${escapeXml(x)}</text>`)),
  );
  body.push('</g>');
  const style =
    `text{font:13px ${MONOSPACE};text-anchor:end;fill:#111}` +
    '.h text{font-size:11px;fill:#555}' +
    '.b{fill:none;stroke:#333;stroke-width:1.5}' +
    '.s{fill:#dde6f2}';
  const svg = svgDocument(width, height, m.title, style, body);
  return byteLength(svg) <= MAX_SVG_BYTES ? svg : undefined;
}
