/**
 * Deciding whether a multivector is decomposable (a wedge of vectors), exactly,
 * in every degree and over every field, with a witness either way.
 *
 * The test is the divisor space D(ω) = {v ∈ V : v ∧ ω = 0}. For ω ≠ 0 of
 * degree k, independent v_1, …, v_m in D(ω) divide ω (ω = v_1 ∧ … ∧ v_m ∧ η),
 * so dim D(ω) ≤ k, with equality exactly when ω is a multiple of the wedge of a
 * basis of D(ω). (Classical, over any field; e.g. Griffiths–Harris, Principles
 * of Algebraic Geometry, Ch. 1 §5 — from memory.) The often quoted test
 * ω ∧ ω = 0 is not used: it holds trivially in odd degree and fails to detect
 * e_0∧e_1 + e_2∧e_3 in characteristic 2.
 *
 * An equivalent criterion is cheaper to check and is tried first: the
 * contractions u_I of ω by (k−1)-covectors span the smallest subspace W with
 * ω ∈ ∧^k W, and ω is decomposable exactly when dim W = k (then W = D(ω)).
 * `decompose` tests whether all u_I lie in the span of the k contractions at
 * one term of ω, and computes D(ω) only for the not-decomposable report.
 *
 * The witness of non-decomposability is one quadratic Plücker relation that
 * fails, see `evaluateRelation` for the sign rule and `findFailedRelation` for
 * why the search always succeeds.
 */
import type { Field } from './field.js';
import { coordinatesIn, kernel, rref } from './matrix.js';
import { coefficient, fromVector, sortedTerms, wedge, type Multivector, type MultivectorTerm } from './multivector.js';
import { primeField } from './prime-field.js';
import { QQ, lcmBigInt, type Rational } from './rational.js';
import { binomialBig, checkSubset, complement, forEachSubset, insertIndex, subsetKey } from './subsets.js';

export type Decomposition<T> =
  | { kind: 'zero' }
  /** basis = RREF rows (k of them); mv = scalar · (basis[0] ∧ … ∧ basis[k−1]). */
  | { kind: 'decomposable'; basis: T[][]; scalar: T }
  | { kind: 'not-decomposable'; divisorBasis: T[][]; divisorDimension: number; relation: FailedRelation<T> };

/** One product in a quadratic Plücker relation: sign · p_first · p_second, both subsets sorted. */
export interface RelationTerm<T> {
  sign: 1 | -1;
  /** The k-subset I ∪ {j_t}, sorted. */
  first: number[];
  /** The k-subset J ∖ {j_t}. */
  second: number[];
  firstValue: T;
  secondValue: T;
}

/** A quadratic Plücker relation evaluated at a multivector; `value` is Σ sign·firstValue·secondValue. */
export interface FailedRelation<T> {
  /** The (k−1)-subset I. */
  left: number[];
  /** The (k+1)-subset J. */
  right: number[];
  terms: RelationTerm<T>[];
  value: T;
}

/** Rows are reduced whenever this many times n have been collected, keeping memory at O(n²). */
const BATCH_FACTOR = 4;

/**
 * The RREF of the span of the rows produced by `emit`, reducing in batches so
 * that a long stream of rows never has to be held at once. `push` returns
 * false once the span is the whole space, so that `emit` can stop early.
 */
function spanOfStream<T>(F: Field<T>, n: number, emit: (push: (row: T[]) => boolean) => void): T[][] {
  let basis: T[][] = [];
  let buffer: T[][] = [];
  const flush = () => {
    if (buffer.length === 0) return;
    basis = rref(F, [...basis, ...buffer], n).rows;
    buffer = [];
  };
  emit((row) => {
    if (basis.length === n) return false;
    buffer.push(row);
    // The first reduction comes after n rows, so that a stream of full rank stops as early as it can.
    if (buffer.length >= (basis.length === 0 ? 1 : BATCH_FACTOR) * Math.max(n, 1)) flush();
    return basis.length < n;
  });
  flush();
  return basis;
}

/**
 * The rows of the matrix of v ↦ v ∧ ω (see `divisorSpace`), one per
 * (k+1)-subset J that occurs, each passed to `push`; stops when push says so.
 * `image` maps each coefficient into the field the rows are wanted in.
 */
function emitDivisorRows<T, S>(
  F: Field<T>,
  mv: Multivector<T>,
  terms: readonly MultivectorTerm<T>[],
  zero: S,
  image: (c: T) => S,
  push: (row: S[]) => boolean,
): void {
  const { n } = mv;
  const seen = new Set<string>();
  for (const { subset } of terms) {
    for (const i of complement(subset, n)) {
      const { sorted: J } = insertIndex(subset, i);
      const key = subsetKey(J);
      if (seen.has(key)) continue;
      seen.add(key);
      // Row J: column x ∈ J gets the coefficient of e_x ∧ e_{J∖x} = (−1)^(position of x in J) e_J.
      const row = new Array<S>(n).fill(zero);
      J.forEach((x, position) => {
        const t = mv.terms.get(subsetKey(J.filter((_, s) => s !== position)));
        if (t !== undefined) row[x] = image(position % 2 === 0 ? t.coeff : F.neg(t.coeff));
      });
      if (!push(row)) return;
    }
  }
}

/** The prime for the modular rank test of `divisorSpace` over the rationals. */
const RANK_TEST_PRIME = 2n ** 31n - 1n;

/**
 * Over the rationals, whether the rows of v ↦ v ∧ ω have rank n modulo a
 * prime. If they do, they have rank n over the rationals too (an n×n minor
 * that is nonzero modulo p is nonzero; common practice, no source), so
 * D(ω) = 0 without any fraction arithmetic. A denominator divisible by p
 * makes the test inconclusive (false).
 */
function fullRankModular(mv: Multivector<Rational>, terms: readonly MultivectorTerm<Rational>[]): boolean {
  const Fp = primeField(RANK_TEST_PRIME) as Field<number>;
  let defined = true;
  const basis = spanOfStream(Fp, mv.n, (push) =>
    emitDivisorRows(QQ, mv, terms, 0, (c) => {
      if (c.den % RANK_TEST_PRIME === 0n) {
        defined = false;
        return 0;
      }
      return Fp.fromRational(c.num, c.den);
    }, push),
  );
  return defined && basis.length === mv.n;
}

/**
 * A basis, in reduced row echelon form, of D(ω) = {v ∈ V : v ∧ ω = 0}.
 *
 * The map v ↦ v ∧ ω sends e_i to Σ_K c_K · e_i ∧ e_K, and e_i ∧ e_K is
 * wedgeSign([i], K) · e_{K∪{i}} for i ∉ K. Its matrix has one row per
 * (k+1)-subset J = K ∪ {i} that occurs, built from the terms of ω alone and
 * streamed into a running row reduction that stops once the rank is n; D(ω)
 * is its kernel. For ω = 0 this is the whole space. Over the rationals a rank
 * test modulo a prime settles the common case D(ω) = 0 first.
 */
export function divisorSpace<T>(F: Field<T>, mv: Multivector<T>): T[][] {
  return divisorSpaceOf(F, mv, sortedTerms(mv));
}

/** `divisorSpace`, given the terms of ω in lexicographic order. */
function divisorSpaceOf<T>(F: Field<T>, mv: Multivector<T>, terms: readonly MultivectorTerm<T>[]): T[][] {
  const { n } = mv;
  if (
    (F as unknown) === QQ &&
    terms.length > 0 &&
    fullRankModular(mv as unknown as Multivector<Rational>, terms as unknown as MultivectorTerm<Rational>[])
  ) {
    return [];
  }
  const reduced = spanOfStream(F, n, (push) => emitDivisorRows(F, mv, terms, F.zero, (c) => c, push));
  return rref(F, kernel(F, reduced, n), n).rows;
}

function checkRelationIndices(mv: Multivector<unknown>, left: readonly number[], right: readonly number[]): void {
  if (mv.k < 1) throw new RangeError('evaluateRelation: Plücker relations need degree at least 1');
  if (left.length !== mv.k - 1) {
    throw new RangeError(`evaluateRelation: the left set has ${left.length} indices, expected k − 1 = ${mv.k - 1}`);
  }
  if (right.length !== mv.k + 1) {
    throw new RangeError(`evaluateRelation: the right set has ${right.length} indices, expected k + 1 = ${mv.k + 1}`);
  }
  checkSubset(left, mv.n, 'evaluateRelation (left set)');
  checkSubset(right, mv.n, 'evaluateRelation (right set)');
}

/**
 * The quadratic Plücker relation for a (k−1)-subset I = `left` and a
 * (k+1)-subset J = `right` = (j_0 < … < j_k), evaluated at ω:
 *
 *   Σ_{t = 0..k} (−1)^t · p(i_1, …, i_{k−1}, j_t) · p(J ∖ {j_t}),
 *
 * where p(·) of an index list is the alternating coordinate. Terms with
 * j_t ∈ I vanish and are left out. Written with sorted sets, p(I, j_t) =
 * (−1)^m · p_{I ∪ {j_t}} with m = #{i ∈ I : i > j_t}, so each term's sign is
 * (−1)^(t + m). This sum is the coefficient of e_J in u_I ∧ ω, where
 * u_I = Σ_j p(I, j) e_j is the contraction of ω by e*_I; it vanishes for every
 * I, J exactly when ω is decomposable or zero.
 */
export function evaluateRelation<T>(
  F: Field<T>,
  mv: Multivector<T>,
  left: readonly number[],
  right: readonly number[],
): FailedRelation<T> {
  checkRelationIndices(mv, left, right);
  const terms: RelationTerm<T>[] = [];
  let value = F.zero;
  right.forEach((j, t) => {
    const { sorted: first, sign: m } = insertIndex(left, j);
    if (m === 0) return;
    const sign: 1 | -1 = (t % 2 === 0) === (m === 1) ? 1 : -1;
    const second = right.filter((_, s) => s !== t);
    const firstValue = coefficient(F, mv, first);
    const secondValue = coefficient(F, mv, second);
    terms.push({ sign, first, second, firstValue, secondValue });
    const product = F.mul(firstValue, secondValue);
    value = sign === 1 ? F.add(value, product) : F.sub(value, product);
  });
  return { left: left.slice(), right: right.slice(), terms, value };
}

/**
 * Keys of the contraction table: for n ≤ 52 the bit mask Σ 2^i of the subset,
 * an exact number (building and hashing the text keys of subsetKey was the
 * larger part of the cost); otherwise the text key.
 */
type TableKey = number | string;
const MASK_LIMIT = 52;
const BIT: readonly number[] = Array.from({ length: MASK_LIMIT }, (_, i) => 2 ** i);

function tableKey(subset: readonly number[], n: number): TableKey {
  if (n > MASK_LIMIT) return subsetKey(subset);
  let key = 0;
  for (const x of subset) key += BIT[x]!;
  return key;
}

function dropAt(subset: readonly number[], r: number): number[] {
  return subset.filter((_, s) => s !== r);
}

/** A (k−1)-subset I with the contraction u_I = Σ_{j ∉ I} p(I, j) e_j of ω by e*_I (see `evaluateRelation`). */
interface Contraction<T> {
  left: number[];
  u: T[];
}

/**
 * Every nonzero contraction u_I, keyed by tableKey(I), built in one pass over
 * the terms: a term p_K contributes p(K ∖ {k_r}, k_r) = (−1)^(k−1−r) p_K to
 * u_{K∖{k_r}} in column k_r, and every nonzero p(I, j) arises so, once. The
 * terms are taken in lexicographic order and, within a term, the last index
 * is dropped first, so the first entry for e_0∧e_1 + … gives the textbook
 * relation. Cost: k map updates per term.
 */
function contractionTable<T>(
  F: Field<T>,
  mv: Multivector<T>,
  terms: readonly MultivectorTerm<T>[] = sortedTerms(mv),
): Map<TableKey, Contraction<T>> {
  const table = new Map<TableKey, Contraction<T>>();
  for (const { subset, coeff } of terms) {
    const k = subset.length;
    const whole = mv.n <= MASK_LIMIT ? (tableKey(subset, mv.n) as number) : 0;
    for (let r = k - 1; r >= 0; r--) {
      // With bit-mask keys, dropping index subset[r] is a subtraction; otherwise the key is built.
      const key = mv.n <= MASK_LIMIT ? whole - BIT[subset[r]!]! : tableKey(dropAt(subset, r), mv.n);
      let entry = table.get(key);
      if (entry === undefined) {
        entry = { left: dropAt(subset, r), u: new Array<T>(mv.n).fill(F.zero) };
        table.set(key, entry);
      }
      entry.u[subset[r]!] = (k - 1 - r) % 2 === 0 ? coeff : F.neg(coeff);
    }
  }
  return table;
}

/** The search of `findFailedRelation`, on a contraction table already built. */
function failedRelationIn<T>(
  F: Field<T>,
  mv: Multivector<T>,
  table: Map<TableKey, Contraction<T>>,
  divisorBasis: T[][],
): FailedRelation<T> | undefined {
  if (mv.k < 2) return undefined;
  for (const { left, u } of table.values()) {
    if (coordinatesIn(F, divisorBasis, u) !== undefined) continue;
    // u lies outside D(ω), so u ∧ ω ≠ 0 and a first term exists.
    return evaluateRelation(F, mv, left, firstTermOfWedge(F, u, mv));
  }
  return undefined;
}

/**
 * The lexicographically first (k+1)-subset J whose coefficient in u ∧ ω is
 * nonzero (u ∧ ω ≠ 0). That coefficient is Σ_{x ∈ J} (−1)^(position of x) u_x
 * c_{J∖x}, so when there are few (k+1)-subsets compared with the products the
 * wedge would form, they are tried in order, which usually stops at the first;
 * otherwise the wedge is formed and its first term taken.
 */
function firstTermOfWedge<T>(F: Field<T>, u: readonly T[], mv: Multivector<T>): number[] {
  const { n, k } = mv;
  const support = u.filter((x) => !F.isZero(x)).length;
  if (binomialBig(n, k + 1) <= BigInt(4 * support * mv.terms.size)) {
    let found: number[] | undefined;
    forEachSubset(n, k + 1, (J) => {
      let sum = F.zero;
      J.forEach((x, position) => {
        if (F.isZero(u[x]!)) return;
        const t = mv.terms.get(subsetKey(dropAt(J, position)));
        if (t === undefined) return;
        const product = F.mul(u[x]!, t.coeff);
        sum = position % 2 === 0 ? F.add(sum, product) : F.sub(sum, product);
      });
      if (F.isZero(sum)) return true;
      found = J.slice();
      return false;
    });
    return found!;
  }
  return sortedTerms(wedge(F, fromVector(F, u), mv))[0]!.subset;
}

/**
 * A Plücker relation that fails at ω, or undefined when ω is decomposable or
 * zero. `divisorBasis` may be passed when already known.
 *
 * The candidates for I are the (k−1)-subsets of the terms' subsets: every I
 * with u_I ≠ 0 is among them, since p(I, j) ≠ 0 needs I ∪ {j} to be a term.
 * Why this search always succeeds for non-decomposable ω: the contractions u_I
 * span the smallest subspace W with ω ∈ ∧^k W (if ω had a term outside ∧^k W
 * in a basis adapted to W, contracting by the other k−1 of its indices would
 * give a vector with a component outside W). The relation (I, J) is the
 * e_J-coefficient of u_I ∧ ω, so if all relations held, every u_I would lie
 * in D(ω), giving W ⊆ D(ω) and dim W ≤ k; then ∧^k W is a line and ω is
 * decomposable. So some u_I lies outside D(ω), and any J with nonzero
 * coefficient in u_I ∧ ω gives a failing relation. The cost is one membership
 * test per candidate (at most k per term) and one wedge at the end.
 */
export function findFailedRelation<T>(
  F: Field<T>,
  mv: Multivector<T>,
  divisorBasis: T[][] = divisorSpace(F, mv),
): FailedRelation<T> | undefined {
  if (mv.k < 2 || mv.terms.size === 0) return undefined;
  return failedRelationIn(F, mv, contractionTable(F, mv), divisorBasis);
}

/**
 * Whether every contraction u_I lies in the span of the k contractions
 * u_{K∖k_r} at the term K (a basis whose columns K are p_K times the identity,
 * up to the signs below). Since the u_I span the smallest subspace W with
 * ω ∈ ∧^k W (see `findFailedRelation`), this holds exactly when dim W = k,
 * that is when ω is decomposable. With row r signed to be p(K with k_r
 * replaced by j) in column j, a vector u lies in that span exactly when
 * p_K·u = Σ_r u[k_r]·row_r; keeping p_K as a factor instead of dividing keeps
 * integral coordinates integral. Returns those rows, or undefined.
 * Cost O(k·n) per candidate, at most k candidates per term.
 */
function chartRowsIfDecomposable<T>(
  F: Field<T>,
  mv: Multivector<T>,
  table: Map<TableKey, Contraction<T>>,
  K: readonly number[],
  pK: T,
): T[][] | undefined {
  const k = K.length;
  const rows = K.map((_, r) => {
    const { u } = table.get(tableKey(dropAt(K, r), mv.n))!;
    // p(I, k_r) = (−1)^(k−1−r) p_K for I = K ∖ {k_r}.
    return (k - 1 - r) % 2 === 0 ? u : u.map((x) => F.neg(x));
  });
  const others = complement(K, mv.n);
  const passes =
    (F as unknown) === QQ
      ? chartTestOnIntegers(
          table as unknown as Map<TableKey, Contraction<Rational>>,
          rows as unknown as Rational[][],
          K,
          others,
          pK as unknown as Rational,
        )
      : chartTest(F, table, rows, K, others, pK);
  return passes ? rows : undefined;
}

/** The test of `chartRowsIfDecomposable`: p_K·u[j] = Σ_r u[k_r]·row_r[j] for every u in the table and j ∉ K. */
function chartTest<T>(
  F: Field<T>,
  table: Map<TableKey, Contraction<T>>,
  rows: readonly (readonly T[])[],
  K: readonly number[],
  others: readonly number[],
  pK: T,
): boolean {
  for (const { u } of table.values()) {
    for (const j of others) {
      let expected = F.zero;
      K.forEach((c, r) => {
        const x = u[c]!;
        if (!F.isZero(x)) expected = F.add(expected, F.mul(x, rows[r]![j]!));
      });
      if (!F.eq(expected, F.mul(pK, u[j]!))) return false;
    }
  }
  return true;
}

/**
 * The same test over the rationals on bigints. Both sides are quadratic in the
 * coefficients of ω, so scaling every coefficient by the lcm λ of their
 * denominators scales both by λ² and leaves the test unchanged; after that
 * every value is an integer and no fraction needs reducing.
 */
function chartTestOnIntegers(
  table: Map<TableKey, Contraction<Rational>>,
  rows: readonly (readonly Rational[])[],
  K: readonly number[],
  others: readonly number[],
  pK: Rational,
): boolean {
  let lambda = 1n;
  for (const { u } of table.values()) for (const x of u) if (x.den !== 1n) lambda = lcmBigInt(lambda, x.den);
  const integral = (v: readonly Rational[]): bigint[] =>
    lambda === 1n ? v.map((x) => x.num) : v.map((x) => x.num * (lambda / x.den));
  const rowsZ = rows.map(integral);
  const pKZ = integral([pK])[0]!;
  const k = K.length;
  for (const { u } of table.values()) {
    const uZ = integral(u);
    for (const j of others) {
      let expected = 0n;
      for (let r = 0; r < k; r++) {
        const x = uZ[K[r]!]!;
        if (x !== 0n) expected += x * rowsZ[r]![j]!;
      }
      if (expected !== pKZ * uZ[j]!) return false;
    }
  }
  return true;
}

/**
 * Whether ω is zero, a scalar multiple of a wedge of vectors, or neither.
 * Degree 0 (a scalar), degree 1 and degree n are decomposable whenever nonzero;
 * for degree 0 the basis is empty and the scalar is ω itself.
 *
 * Decomposability is settled first by the cheap test
 * `chartRowsIfDecomposable` at the first term of ω; a decomposable ω then gets
 * the RREF of those rows, which is W = D(ω). Otherwise D(ω) is computed (its
 * dimension is then below k) together with a failing relation. The wedge of
 * an RREF basis has coordinate 1 at its pivot columns, so the scalar is ω's
 * coefficient there.
 */
export function decompose<T>(F: Field<T>, mv: Multivector<T>): Decomposition<T> {
  const terms = sortedTerms(mv);
  const first = terms[0];
  if (first === undefined) return { kind: 'zero' };
  const table = contractionTable(F, mv, terms);
  const rows = chartRowsIfDecomposable(F, mv, table, first.subset, first.coeff);
  if (rows !== undefined) {
    const basis = rref(F, rows, mv.n).rows;
    const pivots = basis.map((row) => row.findIndex((x) => !F.isZero(x)));
    return { kind: 'decomposable', basis, scalar: coefficient(F, mv, pivots) };
  }
  const divisorBasis = divisorSpaceOf(F, mv, terms);
  const relation = failedRelationIn(F, mv, table, divisorBasis);
  if (relation === undefined || divisorBasis.length >= mv.k) {
    // Unreachable by the arguments above; kept as a loud guard.
    throw new Error('decompose: the decomposability tests disagree');
  }
  return { kind: 'not-decomposable', divisorBasis, divisorDimension: divisorBasis.length, relation };
}

/**
 * A basis (RREF) of the smallest subspace W with ω ∈ ∧^k W: the span of the
 * contractions u_I. It equals D(ω) exactly when ω is decomposable; for ω = 0
 * it is the zero space, and for degree 0 as well.
 */
export function supportSpace<T>(F: Field<T>, mv: Multivector<T>): T[][] {
  return spanOfStream(F, mv.n, (push) => {
    if (mv.k === 0) return;
    for (const { u } of contractionTable(F, mv).values()) if (!push(u)) return;
  });
}
