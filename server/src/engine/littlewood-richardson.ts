/**
 * Littlewood–Richardson coefficients and the products of Schubert classes
 * they give.
 *
 * The coefficient c^ν_{λμ} is the number of Littlewood–Richardson tableaux of
 * the skew shape ν/λ with content μ: fillings of the cells of ν/λ by the
 * numbers 1, 2, … such that the number i occurs μ_i times, rows weakly increase
 * left to right, columns strictly increase top to bottom, and the word read
 * along the rows from right to left, top row first, is a lattice word (every
 * prefix has at least as many i's as (i+1)'s). In the cohomology of G(k, n)
 * the product σ_λ·σ_μ is Σ c^ν_{λμ} σ_ν over the ν in the k×(n−k) box.
 *
 * Counting. The tableaux are built row by row from the top. A weakly
 * increasing row is read right to left in decreasing order of its values, so
 * the lattice condition for the pair (v−1, v) is most demanding just after the
 * row's copies of v have been read and before its copies of v−1: it says
 * before[v] + used[v] ≤ before[v−1], with `before` the counts of the rows above
 * and `used` those of the row being filled. Column strictness involves only the
 * row directly above. So what the rows below can still do depends only on the
 * row index, the counts so far and the filling of the row above, and the count
 * is memoised on exactly that.
 */
import {
  checkPartitionInBox,
  containsPartition,
  normalizePartition,
  partitionKey,
  partitionSize,
  partitionsBetween,
  comparePartitions,
  partitionFromKey,
  type Partition,
} from './partitions.js';

/** One term c·σ_ν of a sum indexed by partitions. */
export interface PartitionTerm {
  /** ν in normal form (no trailing zeros). */
  partition: number[];
  /** The integer coefficient, never 0 in the results of this module. */
  coefficient: bigint;
}

/** The box of G(k, n): k rows, n − k columns. */
export interface PartitionBox {
  rows: number;
  columns: number;
}

/** The k×(n−k) box of G(k, n); throws a RangeError unless 0 ≤ k ≤ n are integers. */
export function grassmannianBox(k: number, n: number, context = 'G(k, n)'): PartitionBox {
  if (!Number.isSafeInteger(k) || !Number.isSafeInteger(n) || k < 0 || k > n) {
    throw new RangeError(`${context}: G(${k}, ${n}) needs integers with 0 ≤ k ≤ n`);
  }
  return { rows: k, columns: n - k };
}

// Coefficients already counted, keyed by λ/μ/ν; cleared when it grows large, since every entry can be recounted.
const computed = new Map<string, bigint>();
const CACHE_LIMIT = 100_000;

/** The number of LR tableaux of shape outer/inner with the given content (all normalized, sizes matching). */
function countTableaux(inner: Partition, content: Partition, outer: Partition): bigint {
  const rows = outer.length;
  const maxValue = content.length;
  // counts[v] for v = 1..maxValue: how often v occurs in the rows filled so far.
  const counts = new Array<number>(maxValue + 1).fill(0);
  const memo = new Map<string, bigint>();
  const innerPart = (r: number) => inner[r] ?? 0;

  const fromRow = (r: number, above: readonly number[]): bigint => {
    // Every cell is filled and no count exceeds its part of the content, so the content is exactly right.
    if (r === rows) return 1n;
    const key = `${r}|${counts.join(',')}|${above.join(',')}`;
    const known = memo.get(key);
    if (known !== undefined) return known;
    const start = innerPart(r);
    const length = outer[r]! - start;
    // The cells of the row above that belong to the skew shape start at its inner part.
    const aboveStart = r > 0 ? innerPart(r - 1) : Number.POSITIVE_INFINITY;
    const before = counts.slice();
    const used = new Array<number>(maxValue + 1).fill(0);
    const row: number[] = [];
    let total = 0n;
    const place = (c: number): void => {
      if (c === length) {
        for (let v = 1; v <= maxValue; v++) counts[v] = before[v]! + used[v]!;
        total += fromRow(r + 1, row);
        for (let v = 1; v <= maxValue; v++) counts[v] = before[v]!;
        return;
      }
      const column = start + c;
      let low = c > 0 ? row[c - 1]! : 1;
      if (column >= aboveStart) low = Math.max(low, above[column - aboveStart]! + 1);
      // Row r (0-based) of a lattice tableau holds no value above r + 1.
      const high = Math.min(maxValue, r + 1);
      for (let v = low; v <= high; v++) {
        const next = before[v]! + used[v]! + 1;
        if (next > content[v - 1]!) continue;
        if (v >= 2 && next > before[v - 1]!) continue;
        used[v]!++;
        row.push(v);
        place(c + 1);
        row.pop();
        used[v]!--;
      }
    };
    place(0);
    memo.set(key, total);
    return total;
  };
  return fromRow(0, []);
}

/** c^ν_{λμ} for normalized partitions. */
function coefficient(lambda: Partition, mu: Partition, nu: Partition): bigint {
  if (partitionSize(nu) !== partitionSize(lambda) + partitionSize(mu)) return 0n;
  if (!containsPartition(nu, lambda) || !containsPartition(nu, mu)) return 0n;
  // c^ν_{λμ} = c^ν_{μλ}; the smaller partition as content means fewer cells to fill.
  const [inner, content] = comparePartitions(lambda, mu) >= 0 ? [lambda, mu] : [mu, lambda];
  const key = `${partitionKey(inner)}/${partitionKey(content)}/${partitionKey(nu)}`;
  const known = computed.get(key);
  if (known !== undefined) return known;
  const value = countTableaux(inner, content, nu);
  if (computed.size >= CACHE_LIMIT) computed.clear();
  computed.set(key, value);
  return value;
}

/**
 * The Littlewood–Richardson coefficient c^ν_{λμ}: the multiplicity of s_ν in
 * s_λ·s_μ, and of σ_ν in σ_λ·σ_μ. It is 0 unless |ν| = |λ| + |μ| and ν
 * contains λ and μ. Trailing zeros are allowed; throws
 * `InvalidPartitionError` for lists that are not partitions.
 */
export function littlewoodRichardsonCoefficient(lambda: readonly number[], mu: readonly number[], nu: readonly number[]): bigint {
  return coefficient(
    normalizePartition(lambda, 'littlewoodRichardsonCoefficient (λ)'),
    normalizePartition(mu, 'littlewoodRichardsonCoefficient (μ)'),
    normalizePartition(nu, 'littlewoodRichardsonCoefficient (ν)'),
  );
}

/**
 * The terms c^ν_{λμ}·ν of s_λ·s_μ with c ≠ 0, in increasing `comparePartitions`
 * order. With a box, only the ν inside it are kept (λ and μ must fit, or
 * `PartitionOutsideBoxError` is thrown); that is the product of σ_λ and σ_μ in
 * the cohomology of the Grassmannian of the box. Without one, every ν comes:
 * they lie in the (ℓ(λ)+ℓ(μ))×(λ_1+μ_1) box, since the first row of an LR
 * tableau holds only 1's and the coefficients are symmetric under conjugation.
 */
export function littlewoodRichardsonProduct(lambda: readonly number[], mu: readonly number[], box?: PartitionBox): PartitionTerm[] {
  const l = normalizePartition(lambda, 'littlewoodRichardsonProduct (λ)');
  const m = normalizePartition(mu, 'littlewoodRichardsonProduct (μ)');
  let rows = l.length + m.length;
  let columns = (l[0] ?? 0) + (m[0] ?? 0);
  if (box !== undefined) {
    checkPartitionInBox(l, box.rows, box.columns, 'littlewoodRichardsonProduct (λ)');
    checkPartitionInBox(m, box.rows, box.columns, 'littlewoodRichardsonProduct (μ)');
    rows = Math.min(rows, box.rows);
    columns = Math.min(columns, box.columns);
  }
  // ν contains both factors, so it contains their union (the larger part in each row).
  const union = normalizePartition(Array.from({ length: Math.max(l.length, m.length) }, (_, i) => Math.max(l[i] ?? 0, m[i] ?? 0)));
  const terms: PartitionTerm[] = [];
  for (const nu of partitionsBetween(union, partitionSize(l) + partitionSize(m), rows, columns)) {
    const c = coefficient(l, m, nu);
    if (c !== 0n) terms.push({ partition: nu, coefficient: c });
  }
  return terms;
}

/**
 * σ_λ·σ_μ in the cohomology of G(k, n): Σ c^ν_{λμ} σ_ν over ν in the
 * k×(n−k) box, as terms in increasing `comparePartitions` order. Throws
 * `PartitionOutsideBoxError` when λ or μ does not fit in the box.
 */
export function schubertProduct(lambda: readonly number[], mu: readonly number[], k: number, n: number): PartitionTerm[] {
  return littlewoodRichardsonProduct(lambda, mu, grassmannianBox(k, n, 'schubertProduct'));
}

/**
 * Multiplies a sum of terms by σ_μ in G(k, n), collecting equal partitions;
 * the result is sorted and free of zero coefficients.
 */
export function multiplyTermsBySchubertClass(terms: readonly PartitionTerm[], mu: readonly number[], k: number, n: number): PartitionTerm[] {
  const sums = new Map<string, bigint>();
  for (const term of terms) {
    if (term.coefficient === 0n) continue;
    for (const t of schubertProduct(term.partition, mu, k, n)) {
      const key = partitionKey(t.partition);
      sums.set(key, (sums.get(key) ?? 0n) + term.coefficient * t.coefficient);
    }
  }
  return [...sums]
    .filter(([, c]) => c !== 0n)
    .map(([key, coefficient]) => ({ partition: partitionFromKey(key), coefficient }))
    .sort((a, b) => comparePartitions(a.partition, b.partition));
}

/**
 * σ_{λ¹}·σ_{λ²}·…·σ_{λʳ} in G(k, n), one factor at a time; the empty product
 * is σ_∅ = 1. Throws `PartitionOutsideBoxError` for a factor outside the box.
 */
export function schubertProductOfMany(partitions: readonly (readonly number[])[], k: number, n: number): PartitionTerm[] {
  const box = grassmannianBox(k, n, 'schubertProductOfMany');
  const factors = partitions.map((p, i) => {
    const normal = normalizePartition(p, `schubertProductOfMany (factor ${i + 1})`);
    checkPartitionInBox(normal, box.rows, box.columns, `schubertProductOfMany (factor ${i + 1})`);
    return normal;
  });
  let terms: PartitionTerm[] = [{ partition: [], coefficient: 1n }];
  for (const mu of factors) {
    terms = multiplyTermsBySchubertClass(terms, mu, k, n);
    if (terms.length === 0) break;
  }
  return terms;
}
