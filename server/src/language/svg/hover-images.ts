/**
 * The pictures hovers carry, as markdown image lines with alt text that says
 * in words what the picture shows (the entries, the partition, the signs), so
 * nothing is lost where images are not shown. Each returns undefined past the
 * sizes where its picture is legible; the hover then has its text alone.
 */
import { svgImageMarkdown } from './document.js';
import { matrixSvg, type MatrixPicture } from './matrix.js';
import { signPatternSvg, type Mark } from './sign-pattern.js';
import { youngDiagramSvg } from './young-diagram.js';

export type { Mark };

/** A matrix picture; the alt text lists the entries row by row. */
export function matrixImage(picture: MatrixPicture): string | undefined {
  const svg = matrixSvg(picture);
  if (!svg) return undefined;
  const rows = picture.cells.length;
  const cols = picture.cells[0]?.length ?? 0;
  const entries = picture.cells.map((r) => r.join(' ')).join('; ');
  return svgImageMarkdown(`${picture.title}, a ${rows}×${cols} matrix with rows ${entries}`, svg);
}

/** The Young diagram of a Schubert cell's partition in its k×(n−k) box. */
export function youngDiagramImage(partition: readonly number[], k: number, m: number): string | undefined {
  const svg = youngDiagramSvg(partition, k, m);
  if (!svg) return undefined;
  return svgImageMarkdown(`Young diagram of λ = (${partition.join(', ')}) in the ${k}×${m} box (${partition.reduce((a, b) => a + b, 0)} boxes)`, svg);
}

const MARK_WORDS: Record<Mark, string> = { '+': '+', '-': '−', '0': '0', nonzero: 'nonzero' };

/** The zero/sign pattern of a Plücker vector, one labelled cell per coordinate. */
export function signPatternImage(labels: readonly string[], marks: readonly Mark[], what: string): string | undefined {
  const svg = signPatternSvg(labels, marks, what);
  if (!svg) return undefined;
  return svgImageMarkdown(`${what}: ${labels.map((l, i) => `${l} ${MARK_WORDS[marks[i]!]}`).join(', ')}`, svg);
}
