/**
 * Values worked out independently of Wedgework, to look for in the compiled PDFs: Plücker
 * coordinates as the maximal minors of a basis (common practice, no source), each minor a mathjs
 * determinant, scaled as the primitive normalization does (integers with gcd 1, first nonzero
 * positive; docs/language.md states the rule), and written as the PDF shows a projective point.
 */
import { create, all } from 'mathjs';

const math = create(all, { number: 'Fraction' });

/** k-subsets of 0…n−1 in lexicographic order. */
function subsets(n: number, k: number, start = 0): number[][] {
  if (k === 0) return [[]];
  const out: number[][] = [];
  for (let i = start; i <= n - k; i++) for (const rest of subsets(n, k - 1, i + 1)) out.push([i, ...rest]);
  return out;
}

/** The maximal minors of the rows, in lexicographic order of the column sets, by mathjs determinants. */
export function maximalMinors(rows: readonly (readonly number[])[]): number[] {
  const n = rows[0]!.length;
  return subsets(n, rows.length).map((columns) => Number(math.det(math.matrix(rows.map((r) => columns.map((c) => r[c]!))))));
}

function gcd(a: number, b: number): number {
  return b === 0 ? Math.abs(a) : gcd(b, a % b);
}

/** Integers with gcd 1 and the first nonzero one positive. */
export function primitive(values: readonly number[]): number[] {
  const g = values.reduce(gcd, 0);
  const sign = Math.sign(values.find((x) => x !== 0) ?? 1);
  return values.map((x) => (sign * x) / g + 0);
}

/** A projective point as the PDF's text has it: `1 : 6 : -4`. */
export function pointText(values: readonly number[]): string {
  return values.join(' : ');
}

/** The coordinates of `vector NAME = (…)` in a `.wedge` text (integers only). */
export function vectorOf(text: string, name: string): number[] {
  const m = new RegExp(`^vector ${name} = \\(([^)]*)\\)`, 'm').exec(text);
  if (!m) throw new Error(`no vector ${name} in the file`);
  return m[1]!.split(',').map((x) => Number(x.trim()));
}

/**
 * The reduced row echelon form of integer rows (common practice, no source), by Gauss–Jordan
 * elimination on mathjs fractions; rows of zeros dropped. Entries as numbers (they are integers in the
 * sample paper).
 */
export function reducedRows(rows: readonly (readonly number[])[]): number[][] {
  const m = rows.map((r) => r.map((x) => math.fraction(x)));
  const width = m[0]?.length ?? 0;
  let pivotRow = 0;
  for (let col = 0; col < width && pivotRow < m.length; col++) {
    const found = m.findIndex((r, i) => i >= pivotRow && !math.equal(r[col]!, 0));
    if (found < 0) continue;
    [m[pivotRow], m[found]] = [m[found]!, m[pivotRow]!];
    const pivot = m[pivotRow]![col]!;
    m[pivotRow] = m[pivotRow]!.map((x) => math.divide(x, pivot) as typeof x);
    for (let i = 0; i < m.length; i++) {
      if (i === pivotRow || math.equal(m[i]![col]!, 0)) continue;
      const factor = m[i]![col]!;
      m[i] = m[i]!.map((x, j) => math.subtract(x, math.multiply(factor, m[pivotRow]![j]!)) as typeof x);
    }
    pivotRow++;
  }
  return m.slice(0, pivotRow).map((r) => r.map((x) => math.number(x) as number));
}
