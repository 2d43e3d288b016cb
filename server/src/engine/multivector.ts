/**
 * Sparse homogeneous multivectors: elements of the k-th exterior power of an
 * n-dimensional space with basis e_0, …, e_{n−1}.
 *
 * A multivector is a map from sorted k-subsets K to coefficients c_K, standing
 * for Σ c_K · e_K with e_K = e_{K[0]} ∧ … ∧ e_{K[k−1]}. Zero coefficients are
 * never stored, so the zero multivector has no terms. Values are treated as
 * immutable: every operation returns a new multivector.
 *
 * A multivector made from all its coefficients (`fromDense`, which is how
 * every Plücker vector is made) keeps them, and builds its map of terms only
 * when something reads `terms`: at G(10,20) the map is 184,756 string keys,
 * which cost several times the minors themselves, while most users of a
 * Plücker vector want the coefficients in order (`toDense`) or a few of them.
 */
import type { Field } from './field.js';
import { binomial, checkSubset, compareLex, forEachSubset, mergeSorted, rankLex, sortWithSign, subsetKey, wedgeSign } from './subsets.js';

export interface MultivectorTerm<T> {
  /** Strictly increasing indices in [0, n). */
  subset: number[];
  /** Never zero. */
  coeff: T;
}

export interface Multivector<T> {
  /** Dimension of the underlying space. */
  n: number;
  /** Degree: the number of vectors in each wedge. */
  k: number;
  /** Keyed by `subsetKey(subset)`. */
  terms: Map<string, MultivectorTerm<T>>;
}

/**
 * The coefficients, in lexicographic order of subsets, of the multivectors made
 * by `fromDense`, with every zero replaced by `F.zero` (as `toDense` of the map
 * of terms would give them). Nothing changes a multivector after it is made,
 * so the map of terms, once built, always agrees with these.
 */
const denseCoefficients = new WeakMap<object, { values: readonly unknown[]; nonzero: number }>();

function keptCoefficients<T>(mv: Multivector<T>): readonly T[] | undefined {
  return denseCoefficients.get(mv)?.values as readonly T[] | undefined;
}

/** The map of terms of the nonzero coefficients of a dense list (zeros already replaced by F.zero). */
function termsOfDense<T>(F: Field<T>, n: number, k: number, values: readonly T[]): Map<string, MultivectorTerm<T>> {
  const terms = new Map<string, MultivectorTerm<T>>();
  if (k <= n) {
    forEachSubset(n, k, (s, rank) => {
      const c = values[rank]!;
      if (!F.isZero(c)) terms.set(subsetKey(s), { subset: s.slice(), coeff: c });
    });
  }
  return terms;
}

function checkShape(n: number, k: number, what: string): void {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`${what}: dimension ${n} must be a nonnegative integer`);
  if (!Number.isInteger(k) || k < 0) throw new RangeError(`${what}: degree ${k} must be a nonnegative integer`);
}

function sameShape<T>(a: Multivector<T>, b: Multivector<T>, what: string): void {
  if (a.n !== b.n || a.k !== b.k) {
    throw new RangeError(`${what}: degree ${a.k} in dimension ${a.n} does not match degree ${b.k} in dimension ${b.n}`);
  }
}

/** Adds c to the coefficient of a sorted subset, dropping the term when it becomes zero. */
function accumulate<T>(F: Field<T>, terms: Map<string, MultivectorTerm<T>>, subset: number[], c: T): void {
  if (F.isZero(c)) return;
  const key = subsetKey(subset);
  const old = terms.get(key);
  if (old === undefined) {
    terms.set(key, { subset, coeff: c });
    return;
  }
  const sum = F.add(old.coeff, c);
  if (F.isZero(sum)) terms.delete(key);
  else terms.set(key, { subset: old.subset, coeff: sum });
}

/** The zero element of the k-th exterior power of an n-space. */
export function zeroMV<T>(n: number, k: number): Multivector<T> {
  checkShape(n, k, 'zeroMV');
  return { n, k, terms: new Map() };
}

/**
 * Σ c · e_{i1} ∧ … ∧ e_{ik} over the given (indices, c) pairs. The indices may
 * come in any order: they are sorted and the coefficient takes the sign of the
 * sorting permutation, so ([1, 0], c) is −c · e_0 ∧ e_1. A repeated index makes
 * the term zero. Terms with the same subset are added.
 */
export function fromTerms<T>(
  F: Field<T>,
  n: number,
  k: number,
  terms: Iterable<readonly [readonly number[], T]>,
): Multivector<T> {
  checkShape(n, k, 'fromTerms');
  const out = new Map<string, MultivectorTerm<T>>();
  for (const [indices, c] of terms) {
    if (indices.length !== k) {
      throw new RangeError(`fromTerms: the term [${indices.join(', ')}] has ${indices.length} indices, expected ${k}`);
    }
    for (const x of indices) {
      if (!Number.isInteger(x) || x < 0 || x >= n) {
        throw new RangeError(`fromTerms: index ${x} in [${indices.join(', ')}] is not in [0, ${n})`);
      }
    }
    const { sorted, sign } = sortWithSign(indices);
    if (sign === 0) continue;
    accumulate(F, out, sorted, sign === 1 ? c : F.neg(c));
  }
  return { n, k, terms: out };
}

/** The vector v as a multivector of degree 1. */
export function fromVector<T>(F: Field<T>, v: readonly T[]): Multivector<T> {
  const terms = new Map<string, MultivectorTerm<T>>();
  v.forEach((c, i) => {
    if (!F.isZero(c)) terms.set(subsetKey([i]), { subset: [i], coeff: c });
  });
  return { n: v.length, k: 1, terms };
}

/** The scalar c as a multivector of degree 0 in an n-space. */
export function fromScalar<T>(F: Field<T>, n: number, c: T): Multivector<T> {
  checkShape(n, 0, 'fromScalar');
  const terms = new Map<string, MultivectorTerm<T>>();
  if (!F.isZero(c)) terms.set('', { subset: [], coeff: c });
  return { n, k: 0, terms };
}

/** The basis element e_subset (the subset must be sorted). */
export function basisMV<T>(F: Field<T>, n: number, subset: readonly number[]): Multivector<T> {
  checkShape(n, subset.length, 'basisMV');
  checkSubset(subset, n, 'basisMV');
  return { n, k: subset.length, terms: new Map([[subsetKey(subset), { subset: subset.slice(), coeff: F.one }]]) };
}

export function add<T>(F: Field<T>, a: Multivector<T>, b: Multivector<T>): Multivector<T> {
  sameShape(a, b, 'add');
  const terms = new Map(a.terms);
  for (const t of b.terms.values()) accumulate(F, terms, t.subset, t.coeff);
  return { n: a.n, k: a.k, terms };
}

export function sub<T>(F: Field<T>, a: Multivector<T>, b: Multivector<T>): Multivector<T> {
  sameShape(a, b, 'sub');
  const terms = new Map(a.terms);
  for (const t of b.terms.values()) accumulate(F, terms, t.subset, F.neg(t.coeff));
  return { n: a.n, k: a.k, terms };
}

/** c · mv. */
export function scale<T>(F: Field<T>, c: T, mv: Multivector<T>): Multivector<T> {
  const terms = new Map<string, MultivectorTerm<T>>();
  if (!F.isZero(c)) {
    for (const [key, t] of mv.terms) terms.set(key, { subset: t.subset, coeff: F.mul(c, t.coeff) });
  }
  return { n: mv.n, k: mv.k, terms };
}

export function neg<T>(F: Field<T>, mv: Multivector<T>): Multivector<T> {
  const terms = new Map<string, MultivectorTerm<T>>();
  for (const [key, t] of mv.terms) terms.set(key, { subset: t.subset, coeff: F.neg(t.coeff) });
  return { n: mv.n, k: mv.k, terms };
}

/**
 * a ∧ b, of degree a.k + b.k. Each pair of terms contributes
 * c·d · e_A ∧ e_B = c·d · wedgeSign(A, B) · e_{A∪B}, which is zero when A and B
 * meet. A degree above n gives the (empty) zero multivector of that degree.
 * Cost: one merge of two subsets per pair of terms.
 */
export function wedge<T>(F: Field<T>, a: Multivector<T>, b: Multivector<T>): Multivector<T> {
  if (a.n !== b.n) throw new RangeError(`wedge: dimensions ${a.n} and ${b.n} differ`);
  const terms = new Map<string, MultivectorTerm<T>>();
  for (const s of a.terms.values()) {
    for (const t of b.terms.values()) {
      const sign = wedgeSign(s.subset, t.subset);
      if (sign === 0) continue;
      const product = F.mul(s.coeff, t.coeff);
      accumulate(F, terms, mergeSorted(s.subset, t.subset), sign === 1 ? product : F.neg(product));
    }
  }
  return { n: a.n, k: a.k + b.k, terms };
}

/** The wedge of a list of vectors of length n (1 in degree 0 for an empty list). */
export function wedgeVectors<T>(F: Field<T>, n: number, vectors: readonly (readonly T[])[]): Multivector<T> {
  let result = fromScalar(F, n, F.one);
  for (const v of vectors) {
    if (v.length !== n) throw new RangeError(`wedgeVectors: a vector has ${v.length} entries, expected ${n}`);
    result = wedge(F, result, fromVector(F, v));
  }
  return result;
}

export function isZeroMV<T>(mv: Multivector<T>): boolean {
  const kept = denseCoefficients.get(mv);
  if (kept !== undefined) return kept.nonzero === 0;
  return mv.terms.size === 0;
}

/**
 * The coefficient of e_{i1} ∧ … ∧ e_{ik}. The indices may be in any order, so
 * this is the alternating coordinate: coefficient of [j, i] is minus that of
 * [i, j], and a repeated index gives zero.
 */
export function coefficient<T>(F: Field<T>, mv: Multivector<T>, indices: readonly number[]): T {
  if (indices.length !== mv.k) {
    throw new RangeError(`coefficient: [${indices.join(', ')}] has ${indices.length} indices, expected ${mv.k}`);
  }
  const { sorted, sign } = sortWithSign(indices);
  if (sign === 0) return F.zero;
  const kept = keptCoefficients(mv);
  if (kept !== undefined) {
    // An index outside [0, n) names no term, so its coefficient is zero, as the map of terms answers.
    if (!sorted.every((x) => Number.isInteger(x) && x >= 0 && x < mv.n)) return F.zero;
    const c = kept[rankLex(sorted, mv.n)]!;
    return sign === 1 || F.isZero(c) ? c : F.neg(c);
  }
  const t = mv.terms.get(subsetKey(sorted));
  if (t === undefined) return F.zero;
  return sign === 1 ? t.coeff : F.neg(t.coeff);
}

/** The nonzero terms in lexicographic order of their subsets. */
export function sortedTerms<T>(mv: Multivector<T>): MultivectorTerm<T>[] {
  return [...mv.terms.values()].sort((s, t) => compareLex(s.subset, t.subset));
}

/** The sorted union of the subsets of all terms: the coordinates the multivector involves. */
export function supportColumns<T>(mv: Multivector<T>): number[] {
  const seen = new Set<number>();
  for (const t of mv.terms.values()) for (const x of t.subset) seen.add(x);
  return [...seen].sort((x, y) => x - y);
}

/** All C(n, k) coefficients in lexicographic order of the subsets. */
export function toDense<T>(F: Field<T>, mv: Multivector<T>): T[] {
  if (mv.k > mv.n) return [];
  const kept = keptCoefficients(mv);
  if (kept !== undefined) return kept.slice();
  const out = new Array<T>(binomial(mv.n, mv.k));
  forEachSubset(mv.n, mv.k, (s, rank) => {
    out[rank] = mv.terms.get(subsetKey(s))?.coeff ?? F.zero;
  });
  return out;
}

/**
 * The multivector whose coefficients, in lexicographic order of subsets, are
 * `values` (length C(n, k)). It keeps a copy of them; its `terms` is an
 * ordinary enumerable property that is computed on first reading and then
 * stays (see the file comment).
 */
export function fromDense<T>(F: Field<T>, n: number, k: number, values: readonly T[]): Multivector<T> {
  checkShape(n, k, 'fromDense');
  const expected = k > n ? 0 : binomial(n, k);
  if (values.length !== expected) {
    throw new RangeError(`fromDense: ${values.length} values given, expected C(${n}, ${k}) = ${expected}`);
  }
  const kept = new Array<T>(expected);
  let nonzero = 0;
  for (let r = 0; r < expected; r++) {
    const c = values[r]!;
    if (F.isZero(c)) kept[r] = F.zero;
    else {
      kept[r] = c;
      nonzero++;
    }
  }
  const mv = { n, k } as Multivector<T>;
  Object.defineProperty(mv, 'terms', {
    enumerable: true,
    configurable: true,
    get(): Map<string, MultivectorTerm<T>> {
      const terms = termsOfDense(F, n, k, kept);
      Object.defineProperty(mv, 'terms', { value: terms, enumerable: true, writable: true, configurable: true });
      return terms;
    },
  });
  denseCoefficients.set(mv, { values: kept, nonzero });
  return mv;
}

/** Same dimension, same degree and equal coefficients. */
export function equalsMV<T>(F: Field<T>, a: Multivector<T>, b: Multivector<T>): boolean {
  if (a.n !== b.n || a.k !== b.k) return false;
  const da = keptCoefficients(a);
  const db = keptCoefficients(b);
  if (da !== undefined && db !== undefined) return da.every((c, r) => F.eq(c, db[r]!));
  if (a.terms.size !== b.terms.size) return false;
  for (const [key, t] of a.terms) {
    const u = b.terms.get(key);
    if (u === undefined || !F.eq(t.coeff, u.coeff)) return false;
  }
  return true;
}
