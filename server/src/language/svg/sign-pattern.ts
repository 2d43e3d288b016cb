/**
 * The zero/sign pattern of a Plücker vector as a grid: one cell per
 * coordinate, its index set above and its mark below. The marks differ in
 * symbol and in fill alike — never in colour alone: `+` white on a solid dark
 * cell, `−` dark on a hatched light cell, `0` grey on white in a dashed
 * outline, and over a field without signs `•` (nonzero) white on solid grey.
 */
import { MAX_SVG_BYTES, MONOSPACE, byteLength, escapeXml, svgDocument } from './document.js';

export type Mark = '+' | '-' | '0' | 'nonzero';

/** Up to how many coordinates a pattern is legible in a hover. */
export const SIGN_PATTERN_LIMIT = 70;

const PER_ROW = 10;
const LABEL = 13;
const MARK = 22;
const GAP = 3;
const PAD = 8;

const SYMBOL: Record<Mark, string> = { '+': '+', '-': '−', '0': '0', nonzero: '•' };

/** The SVG, or undefined past the legible number of coordinates. */
export function signPatternSvg(labels: readonly string[], marks: readonly Mark[], title: string): string | undefined {
  if (marks.length === 0 || marks.length > SIGN_PATTERN_LIMIT || labels.length !== marks.length) return undefined;
  const widest = Math.max(...labels.map((l) => l.length));
  const cell = Math.max(22, widest * 7 + 6);
  const perRow = Math.min(PER_ROW, marks.length);
  const rows = Math.ceil(marks.length / perRow);
  const width = 2 * PAD + perRow * (cell + GAP) - GAP;
  const height = 2 * PAD + rows * (LABEL + MARK + GAP) - GAP;
  const cells: Record<Mark, string[]> = { '+': [], '-': [], '0': [], nonzero: [] };
  const labelTexts: string[] = [];
  const symbols: Record<Mark, string[]> = { '+': [], '-': [], '0': [], nonzero: [] };
  marks.forEach((mark, i) => {
    const x = PAD + (i % perRow) * (cell + GAP);
    const y = PAD + Math.floor(i / perRow) * (LABEL + MARK + GAP);
    const middle = x + cell / 2;
    labelTexts.push(`<text x="${middle}" y="${y + 10}">${escapeXml(labels[i]!)}</text>`);
    cells[mark].push(`M${x} ${y + LABEL}h${cell}v${MARK}h${-cell}z`);
    symbols[mark].push(`<text x="${middle}" y="${y + LABEL + 16}">${SYMBOL[mark]}</text>`);
  });
  const body = [
    '<defs><pattern id="h" width="6" height="6" patternUnits="userSpaceOnUse" patternTransform="rotate(45)"><rect width="6" height="6" fill="#fdeedd"/><path d="M0 0v6" stroke="#e2a46a" stroke-width="1.5"/></pattern></defs>',
  ];
  const classes: Record<Mark, string> = { '+': 'p', '-': 'm', '0': 'z', nonzero: 'n' };
  for (const mark of ['+', '-', '0', 'nonzero'] as const) {
    if (cells[mark].length === 0) continue;
    body.push(`<path class="${classes[mark]}" d="${cells[mark].join('')}"/>`);
    body.push(`<g class="${classes[mark]}t">${symbols[mark].join('')}</g>`);
  }
  body.push(`<g class="l">${labelTexts.join('')}</g>`);
  const style =
    `text{font:bold 14px ${MONOSPACE};text-anchor:middle}` +
    '.l text{font-weight:normal;font-size:10px;fill:#333}' +
    '.p{fill:#24528f}.pt{fill:#fff}' +
    '.m{fill:url(#h);stroke:#b86a2a}.mt{fill:#3d1c00;font-size:17px}' +
    '.z{fill:#fff;stroke:#888;stroke-dasharray:3 2}.zt{fill:#777}' +
    '.n{fill:#555}.nt{fill:#fff}';
  const svg = svgDocument(width, height, title, style, body);
  return byteLength(svg) <= MAX_SVG_BYTES ? svg : undefined;
}
