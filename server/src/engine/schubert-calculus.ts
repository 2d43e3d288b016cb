/**
 * Arithmetic in the cohomology ring of the Grassmannian G(k, n) in the basis
 * of Schubert classes.
 *
 * Convention (the one of schubert.ts): σ_λ, for λ in the k×(n−k) box, is the
 * class of the Schubert variety whose dense cell has partition λ, so its
 * degree is the codimension |λ|. Then σ_∅ = 1, σ_1 is the hyperplane class of
 * the Plücker embedding, and σ_{(n−k)^k} (the full box) is the class of a
 * point. A class is a sparse integer combination Σ c_λ σ_λ; products follow
 * the Littlewood–Richardson rule, truncated to the box.
 *
 * Two facts the functions below rest on (Fulton, Young Tableaux, §9.4 — from
 * memory): the classes of complementary degrees pair by duality,
 * σ_λ·σ_μ = δ_{μ, λ^∨}·[point] when |λ| + |μ| = k(n−k), with λ^∨ the
 * complement of λ in the box turned by a half turn; and the degree of G(k, n)
 * in the Plücker embedding is the number of points in σ_1^{k(n−k)}.
 */
import { grassmannianDimension } from './grassmannian.js';
import {
  grassmannianBox,
  multiplyTermsBySchubertClass,
  type PartitionBox,
  type PartitionTerm,
} from './littlewood-richardson.js';
import {
  checkPartitionInBox,
  comparePartitions,
  complementInBox,
  normalizePartition,
  parsePartition,
  partitionFromKey,
  partitionKey,
  partitionSize,
  rectangle,
} from './partitions.js';

/** The Schubert class convention, in one sentence for hovers. */
export const SCHUBERT_CLASS_CONVENTION =
  'σ_λ is the class of the Schubert variety of codimension |λ| in G(k, n) whose cells have the partition λ in the k×(n−k) box (λ_j = n − k + j − i_j, as for Schubert cells), ' +
  'so σ_1 is the hyperplane class of the Plücker embedding, the full box is the class of a point, and σ_λ·σ_μ = Σ c^ν_{λμ} σ_ν by the Littlewood–Richardson rule over ν in the box.';

/** An integer combination of Schubert classes of one Grassmannian. */
export interface SchubertClass {
  /** The dimension of the subspaces. */
  readonly k: number;
  /** The dimension of the ambient space. */
  readonly n: number;
  /**
   * The terms c·σ_λ with c ≠ 0, each λ in normal form (no trailing zeros) and
   * in the k×(n−k) box, listed by increasing degree |λ| and then
   * lexicographically (σ_{1,1,1} before σ_{2,1} before σ_{3}). The zero class
   * has no terms.
   */
  readonly terms: readonly PartitionTerm[];
}

function boxOf(c: SchubertClass): PartitionBox {
  return { rows: c.k, columns: c.n - c.k };
}

/**
 * The class Σ c·σ_λ from (λ, c) pairs: partitions may have trailing zeros,
 * equal partitions are added up and zero sums dropped. Throws
 * `InvalidPartitionError` for a list that is no partition and
 * `PartitionOutsideBoxError` for one outside the k×(n−k) box.
 */
export function schubertClass(
  k: number,
  n: number,
  terms: Iterable<readonly [readonly number[], bigint | number]>,
): SchubertClass {
  const box = grassmannianBox(k, n, 'schubertClass');
  const sums = new Map<string, bigint>();
  for (const [parts, c] of terms) {
    const lambda = normalizePartition(parts, 'schubertClass');
    checkPartitionInBox(lambda, box.rows, box.columns, `schubertClass in G(${k}, ${n})`);
    const key = partitionKey(lambda);
    sums.set(key, (sums.get(key) ?? 0n) + BigInt(c));
  }
  return fromSums(k, n, sums);
}

function fromSums(k: number, n: number, sums: ReadonlyMap<string, bigint>): SchubertClass {
  const terms = [...sums]
    .filter(([, c]) => c !== 0n)
    .map(([key, coefficient]) => ({ partition: partitionFromKey(key), coefficient }))
    .sort((a, b) => comparePartitions(a.partition, b.partition));
  return Object.freeze({ k, n, terms: Object.freeze(terms) });
}

/** c·σ_λ in G(k, n) (c = 1 by default). */
export function schubertSigma(k: number, n: number, partition: readonly number[], coefficient: bigint = 1n): SchubertClass {
  return schubertClass(k, n, [[partition, coefficient]]);
}

/**
 * σ_λ in G(k, n) with λ read from text such as `2,1`, `(2, 1)` or `3^2`
 * (see `parsePartition`); throws `InvalidPartitionError` or
 * `PartitionOutsideBoxError` with a message naming the problem.
 */
export function parseSchubertSigma(k: number, n: number, text: string): SchubertClass {
  return schubertSigma(k, n, parsePartition(text));
}

/** The class of a point, σ_{(n−k)^k}: the full k×(n−k) box. */
export function pointClass(k: number, n: number): SchubertClass {
  const box = grassmannianBox(k, n, 'pointClass');
  return schubertSigma(k, n, rectangle(box.rows, box.columns));
}

/** The unit σ_∅ = 1 (the class of the whole Grassmannian). */
export function unitClass(k: number, n: number): SchubertClass {
  return schubertSigma(k, n, []);
}

/** The zero class of G(k, n). */
export function zeroClass(k: number, n: number): SchubertClass {
  return schubertClass(k, n, []);
}

function checkSameGrassmannian(a: SchubertClass, b: SchubertClass, what: string): void {
  if (a.k !== b.k || a.n !== b.n) {
    throw new RangeError(`${what}: the classes live in different Grassmannians, G(${a.k}, ${a.n}) and G(${b.k}, ${b.n})`);
  }
}

/** The coefficient of σ_λ in the class (0 when absent); λ may have trailing zeros. */
export function classCoefficient(c: SchubertClass, partition: readonly number[]): bigint {
  const key = partitionKey(normalizePartition(partition, 'classCoefficient'));
  return c.terms.find((t) => partitionKey(t.partition) === key)?.coefficient ?? 0n;
}

function linearCombination(a: SchubertClass, b: SchubertClass, sign: bigint): SchubertClass {
  const sums = new Map<string, bigint>();
  for (const t of a.terms) sums.set(partitionKey(t.partition), t.coefficient);
  for (const t of b.terms) {
    const key = partitionKey(t.partition);
    sums.set(key, (sums.get(key) ?? 0n) + sign * t.coefficient);
  }
  return fromSums(a.k, a.n, sums);
}

/** a + b. */
export function addClasses(a: SchubertClass, b: SchubertClass): SchubertClass {
  checkSameGrassmannian(a, b, 'addClasses');
  return linearCombination(a, b, 1n);
}

/** a − b. */
export function subtractClasses(a: SchubertClass, b: SchubertClass): SchubertClass {
  checkSameGrassmannian(a, b, 'subtractClasses');
  return linearCombination(a, b, -1n);
}

/** s·a for an integer s. */
export function scaleClass(a: SchubertClass, s: bigint | number): SchubertClass {
  const factor = BigInt(s);
  const sums = new Map<string, bigint>();
  for (const t of a.terms) sums.set(partitionKey(t.partition), factor * t.coefficient);
  return fromSums(a.k, a.n, sums);
}

/** a·b in the cohomology ring: each σ_λ·σ_μ by the Littlewood–Richardson rule, truncated to the box. */
export function multiplyClasses(a: SchubertClass, b: SchubertClass): SchubertClass {
  checkSameGrassmannian(a, b, 'multiplyClasses');
  const sums = new Map<string, bigint>();
  for (const tb of b.terms) {
    for (const t of multiplyTermsBySchubertClass(a.terms, tb.partition, a.k, a.n)) {
      const key = partitionKey(t.partition);
      sums.set(key, (sums.get(key) ?? 0n) + tb.coefficient * t.coefficient);
    }
  }
  return fromSums(a.k, a.n, sums);
}

/**
 * The product of the classes, left to right; the empty product is 1. Entries
 * may be classes or partitions (standing for σ_λ).
 */
export function productOfClasses(k: number, n: number, factors: readonly (SchubertClass | readonly number[])[]): SchubertClass {
  let result = unitClass(k, n);
  for (const f of factors) {
    result = multiplyClasses(result, isClass(f) ? f : schubertSigma(k, n, f));
    if (result.terms.length === 0) break;
  }
  return result;
}

function isClass(f: SchubertClass | readonly number[]): f is SchubertClass {
  return !Array.isArray(f);
}

/**
 * a^e for an integer e ≥ 0 (a^0 = 1). It multiplies by a one factor at a
 * time: powers of σ_1, the common case, stay cheap that way, and any class of
 * positive degree becomes 0 past the top degree.
 */
export function powerClass(a: SchubertClass, e: number): SchubertClass {
  if (!Number.isSafeInteger(e) || e < 0) throw new RangeError(`powerClass: the exponent must be an integer ≥ 0, got ${e}`);
  let result = unitClass(a.k, a.n);
  for (let i = 0; i < e && result.terms.length > 0; i++) result = multiplyClasses(result, a);
  return result;
}

/** The degree d when every term has degree |λ| = d; undefined for the zero class and for mixed degrees. */
export function classDegree(a: SchubertClass): number | undefined {
  if (a.terms.length === 0) return undefined;
  const d = partitionSize(a.terms[0]!.partition);
  return a.terms.every((t) => partitionSize(t.partition) === d) ? d : undefined;
}

// k(n−k), the dimension of G(k, n) and the degree of the point class; the engine has one definition of it.
export { grassmannianDimension };

/**
 * The intersection number of the factors: the coefficient of the point class
 * σ_{(n−k)^k} in their product. When every factor has a single degree and the
 * degrees do not add up to k(n−k), the product has no point component and the
 * answer is 0 without multiplying. Factors may be classes or partitions.
 */
export function intersectionNumber(k: number, n: number, factors: readonly (SchubertClass | readonly number[])[]): bigint {
  const top = grassmannianDimension(k, n);
  const classes = factors.map((f) => (isClass(f) ? f : schubertSigma(k, n, f)));
  for (const c of classes) {
    if (c.k !== k || c.n !== n) throw new RangeError(`intersectionNumber: a factor lives in G(${c.k}, ${c.n}), not in G(${k}, ${n})`);
  }
  const degrees = classes.map(classDegree);
  if (degrees.every((d) => d !== undefined) && degrees.reduce((s, d) => s + d!, 0) !== top) return 0n;
  return classCoefficient(productOfClasses(k, n, classes), rectangle(k, n - k));
}

/**
 * The degree of G(k, n) in the Plücker embedding, as the intersection number
 * of σ_1^{k(n−k)}: the number of points where k(n−k) general hyperplanes
 * meet the Grassmannian.
 */
export function grassmannianDegree(k: number, n: number): bigint {
  const top = grassmannianDimension(k, n);
  return classCoefficient(powerClass(schubertSigma(k, n, top === 0 ? [] : [1]), top), rectangle(k, n - k));
}

function factorial(m: number): bigint {
  let f = 1n;
  for (let i = 2; i <= m; i++) f *= BigInt(i);
  return f;
}

/**
 * The degree of G(k, n) by the closed formula
 * (k(n−k))! · Π_{i=0}^{k−1} i! / (n−k+i)!
 * (the hook length formula for the k×(n−k) rectangle), a second path to
 * `grassmannianDegree` that multiplies no classes.
 */
export function grassmannianDegreeByFormula(k: number, n: number): bigint {
  const box = grassmannianBox(k, n, 'grassmannianDegreeByFormula');
  let numerator = factorial(box.rows * box.columns);
  let denominator = 1n;
  for (let i = 0; i < box.rows; i++) {
    numerator *= factorial(i);
    denominator *= factorial(box.columns + i);
  }
  // The quotient is a count of tableaux, so the division is exact.
  return numerator / denominator;
}

/** λ^∨: the partition of the Schubert class dual to σ_λ in G(k, n) (the complement in the box). */
export function dualPartition(k: number, n: number, partition: readonly number[]): number[] {
  const box = grassmannianBox(k, n, 'dualPartition');
  return complementInBox(normalizePartition(partition, 'dualPartition'), box.rows, box.columns);
}

/**
 * Σ c_λ σ_{λ^∨}: each basis class replaced by its dual, so that the
 * intersection number of a with σ_μ is the coefficient of σ_μ in dualClass(a)
 * (for a of degree k(n−k) − |μ|).
 */
export function dualClass(a: SchubertClass): SchubertClass {
  const box = boxOf(a);
  return schubertClass(
    a.k,
    a.n,
    a.terms.map((t) => [complementInBox(t.partition, box.rows, box.columns), t.coefficient] as const),
  );
}

/** How a class is written: plain text with σ, or LaTeX with \sigma. */
export type ClassStyle = 'text' | 'latex';

/**
 * The class as a person writes it: `2σ_{2,1} + σ_{3}` in text,
 * `2\sigma_{2,1} + \sigma_{3}` in LaTeX; a coefficient 1 is left out, a
 * negative one is subtracted (`σ_{1} - 2σ_{2}`), σ_∅ is written as the unit 1,
 * and the zero class as 0.
 */
export function formatClass(a: SchubertClass, style: ClassStyle = 'text'): string {
  if (a.terms.length === 0) return '0';
  const sigma = style === 'latex' ? '\\sigma' : 'σ';
  return a.terms
    .map((t, i) => {
      const negative = t.coefficient < 0n;
      const magnitude = negative ? -t.coefficient : t.coefficient;
      const basis = t.partition.length === 0 ? '' : `${sigma}_{${t.partition.join(',')}}`;
      const factor = basis === '' ? magnitude.toString() : magnitude === 1n ? '' : magnitude.toString();
      const body = factor + basis;
      if (i === 0) return negative ? `-${body}` : body;
      return negative ? ` - ${body}` : ` + ${body}`;
    })
    .join('');
}
