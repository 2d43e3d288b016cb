/**
 * The Young diagram of a partition inside its k×(n−k) box, in English
 * notation: row i (from the top) has λ_i boxes, left-aligned. The boxes of
 * the diagram are filled, the rest of the box is an empty grid, so the
 * diagram reads by shape and shade alike.
 */
import { MAX_SVG_BYTES, MONOSPACE, byteLength, escapeXml, svgDocument } from './document.js';

/** Up to which boxes a diagram is legible in a hover. */
export const YOUNG_LIMITS = { rows: 16, columns: 32 };

const CELL = 16;
const PAD = 8;
const CAPTION = 18;

/**
 * The SVG of `partition` (weakly decreasing parts) in the `rows`×`columns`
 * box, or undefined when the box is past the legible sizes or the partition
 * does not fit in it.
 */
export function youngDiagramSvg(partition: readonly number[], rows: number, columns: number): string | undefined {
  if (rows < 1 || columns < 1 || rows > YOUNG_LIMITS.rows || columns > YOUNG_LIMITS.columns) return undefined;
  if (partition.length > rows || partition.some((x, i) => !Number.isInteger(x) || x < 0 || x > columns || (i > 0 && x > partition[i - 1]!))) {
    return undefined;
  }
  const caption = `λ = (${partition.join(', ')})`;
  // The caption is monospace at 11px: about 7px a character.
  const width = Math.max(2 * PAD + columns * CELL, 2 * PAD + caption.length * 7);
  const height = 2 * PAD + rows * CELL + CAPTION;
  const filled = partition
    .map((x, i) => (x > 0 ? `M${PAD} ${PAD + i * CELL}h${x * CELL}v${CELL}h${-x * CELL}z` : ''))
    .join('');
  const grid: string[] = [];
  for (let i = 0; i <= rows; i++) grid.push(`M${PAD} ${PAD + i * CELL}h${columns * CELL}`);
  for (let j = 0; j <= columns; j++) grid.push(`M${PAD + j * CELL} ${PAD}v${rows * CELL}`);
  const lambda = `λ = (${partition.join(', ')}) in the ${rows}×${columns} box`;
  const body = [
    ...(filled ? [`<path class="f" d="${filled}"/>`] : []),
    `<path class="g" d="${grid.join('')}"/>`,
    `<text x="${PAD}" y="${PAD + rows * CELL + 14}">${escapeXml(caption)}</text>`,
  ];
  const style = `.f{fill:#3b6fb6}.g{fill:none;stroke:#444;stroke-width:1}text{font:11px ${MONOSPACE};fill:#333}`;
  const svg = svgDocument(width, height, `Young diagram of ${lambda}`, style, body);
  return byteLength(svg) <= MAX_SVG_BYTES ? svg : undefined;
}
