/**
 * Duality for subspaces of V = F^n: annihilators in the dual space, the
 * complement rule that turns a Plücker vector of W into one of its
 * annihilator, the metric-free complement (Hodge star) on multivectors, and
 * representatives for quotients V/W.
 *
 * The dual space V* has the dual basis e*_0, …, e*_{n−1} with e*_i(e_j) = δ_ij,
 * and a functional φ is written as the row of its values (φ(e_0), …, φ(e_{n−1})),
 * so φ(v) = Σ φ_i·v_i. Through this basis V* is identified with F^n, and its
 * Plücker coordinates are minors of those rows exactly as for V.
 *
 * The sign rule. For a sorted k-subset I with complement J = I^c (sorted), let
 * s(I) = ±1 be the sign with e_I ∧ e_J = s(I)·e_0 ∧ … ∧ e_{n−1}: the sign of the
 * permutation listing I and then J. Each i ∈ I must pass the elements of J
 * below it, and the t-th smallest element i_t of I (0-based t) has exactly
 * i_t − t of them, so s(I) = (−1)^(Σ_t (i_t − t)) = (−1)^(ΣI − k(k−1)/2) with
 * 0-based indices, which is (−1)^(ΣI − k(k+1)/2) with 1-based indices.
 */
import type { Field } from './field.js';
import { kernel, rref } from './matrix.js';
import type { Multivector, MultivectorTerm } from './multivector.js';
import { binomial, complement, forEachSubset, rankLex, subsetKey, wedgeSign } from './subsets.js';

/** The complement sign rule on Plücker vectors, in one sentence for hovers. */
export const COMPLEMENT_SIGN_RULE =
  'The annihilator of a k-subspace W of F^n has Plücker coordinate q_J = s(I)·p_I on the complement J of each k-subset I, ' +
  'where s(I) = ±1 is the sign with e_I ∧ e_J = s(I)·e_1 ∧ … ∧ e_n, that is (−1)^(i_1 + … + i_k − k(k+1)/2) for 1-based indices i_1 < … < i_k.';

/** The complement (Hodge star) rule on multivectors, in one sentence for hovers. */
export const HODGE_SIGN_RULE =
  'The complement ⋆ sends e_I to s(I)·e_J, where J is the complement of I and s(I) = ±1 is the sign with e_I ∧ e_J = s(I)·e_1 ∧ … ∧ e_n ' +
  '(that is (−1)^(i_1 + … + i_k − k(k+1)/2) for 1-based indices), so ⋆⋆ω = (−1)^(k(n−k))·ω in degree k.';

function checkDimension(n: number, what: string): void {
  if (!Number.isInteger(n) || n < 0) throw new RangeError(`${what}: dimension ${n} must be a nonnegative integer`);
}

/** s(I): the sign with e_I ∧ e_{I^c} = s(I)·e_0 ∧ … ∧ e_{n−1}, for a sorted subset of {0..n−1}. */
export function complementSign(subset: readonly number[], n: number): 1 | -1 {
  // The two parts are disjoint, so the wedge sign is never 0.
  return wedgeSign(subset, complement(subset, n)) === -1 ? -1 : 1;
}

/**
 * A basis, in reduced row echelon form, of the annihilator
 * W^⊥ = {φ ∈ V* : φ(w) = 0 for all w ∈ W} of W = rowspace(basisRows), as rows
 * in the dual basis. Its dimension is n − dim W. The rows need not be
 * independent. W^⊥ is the kernel of the matrix whose rows span W.
 */
export function annihilator<T>(F: Field<T>, basisRows: readonly (readonly T[])[], n: number): T[][] {
  checkDimension(n, 'annihilator');
  return rref(F, kernel(F, basisRows, n), n).rows;
}

/**
 * The dense vector q of length C(n, n−k) with q_{I^c} = s(I)·values[rank of I]
 * (see the sign rule at the top of this file): the common core of
 * `annihilatorPlucker` and `hodgeStar`.
 */
function complementDense<T>(F: Field<T>, values: readonly T[], n: number, k: number): T[] {
  const out = new Array<T>(binomial(n, n - k)).fill(F.zero);
  forEachSubset(n, k, (subset, rank) => {
    const p = values[rank]!;
    if (F.isZero(p)) return;
    out[rankLex(complement(subset, n), n)] = complementSign(subset, n) === 1 ? p : F.neg(p);
  });
  return out;
}

/**
 * The Plücker vector of W^⊥ (degree n − k, length C(n, n−k), lexicographic
 * order) from the Plücker vector of a k-subspace W of F^n (length C(n, k)):
 * q_{I^c} = s(I)·p_I, see COMPLEMENT_SIGN_RULE.
 *
 * Why it is right: for a basis w_1, …, w_k of W, the functional on ∧^(n−k) V
 * given by η ↦ (coefficient of e_0∧…∧e_{n−1} in w_1∧…∧w_k∧η) vanishes exactly
 * when η has a factor in W, so it is a nonzero multiple of the wedge of a basis
 * of W^⊥; its value on e_L is Σ_I p_I·[e_I ∧ e_L] = s(L^c)·p_{L^c}. The result
 * is therefore the Plücker vector of W^⊥ up to a nonzero factor. The factor is 1
 * for W = rowspace[I_k | A] (identity in the first k columns) against the
 * annihilator basis [−Aᵀ | I_{n−k}]. The zero vector (no subspace) gives zero.
 */
export function annihilatorPlucker<T>(F: Field<T>, pluckerValues: readonly T[], n: number, k: number): T[] {
  checkDimension(n, 'annihilatorPlucker');
  if (!Number.isInteger(k) || k < 0 || k > n) throw new RangeError(`annihilatorPlucker: degree ${k} must be an integer in [0, ${n}]`);
  const expected = binomial(n, k);
  if (pluckerValues.length !== expected) {
    throw new RangeError(`annihilatorPlucker: ${pluckerValues.length} coordinates given, expected C(${n}, ${k}) = ${expected}`);
  }
  return complementDense(F, pluckerValues, n, k);
}

/**
 * The metric-free complement ⋆: ∧^k V → ∧^(n−k) V, e_I ↦ s(I)·e_{I^c}, see
 * HODGE_SIGN_RULE. It is the Hodge star of the inner product that makes
 * e_0, …, e_{n−1} orthonormal with orientation e_0∧…∧e_{n−1}, so that
 * α ∧ ⋆β = (Σ_I α_I β_I)·e_0∧…∧e_{n−1}; no inner product is used to compute
 * it, which is why it works over every field. Applying it twice gives
 * (−1)^(k(n−k)) times the input, because s(I)·s(I^c) = (−1)^(k(n−k)) (moving
 * the n−k vectors of e_{I^c} past the k of e_I). On the Plücker vector of W it
 * gives the Plücker vector of W^⊥ (same rule as `annihilatorPlucker`).
 */
export function hodgeStar<T>(F: Field<T>, mv: Multivector<T>): Multivector<T> {
  const { n, k } = mv;
  if (k > n) throw new RangeError(`hodgeStar: degree ${k} exceeds the dimension ${n}`);
  const terms = new Map<string, MultivectorTerm<T>>();
  for (const t of mv.terms.values()) {
    const target = complement(t.subset, n);
    terms.set(subsetKey(target), { subset: target, coeff: complementSign(t.subset, n) === 1 ? t.coeff : F.neg(t.coeff) });
  }
  return { n, k: n - k, terms };
}

/**
 * Representatives of a basis of V/W for W = rowspace(basisRows): the standard
 * basis vectors e_j of the columns j that are not pivots of W's RREF. Together
 * with the RREF rows they form a basis of V (each RREF row is the only one
 * with a 1 in its pivot column), so their classes form a basis of V/W.
 */
export function quotientBasis<T>(F: Field<T>, basisRows: readonly (readonly T[])[], n: number): T[][] {
  checkDimension(n, 'quotientBasis');
  const pivots = new Set(rref(F, basisRows, n).pivots);
  const out: T[][] = [];
  for (let j = 0; j < n; j++) {
    if (pivots.has(j)) continue;
    const row = new Array<T>(n).fill(F.zero);
    row[j] = F.one;
    out.push(row);
  }
  return out;
}

/**
 * The coordinates of the class v + W in the basis of `quotientBasis`. Reducing
 * v by the RREF rows clears its pivot entries without leaving v + W; what
 * remains is Σ c_j·e_j over the non-pivot columns j, and the c_j are returned
 * in increasing order of j.
 */
export function quotientCoordinates<T>(F: Field<T>, basisRows: readonly (readonly T[])[], n: number, v: readonly T[]): T[] {
  checkDimension(n, 'quotientCoordinates');
  if (v.length !== n) throw new RangeError(`quotientCoordinates: the vector has ${v.length} entries, expected ${n}`);
  const { rows, pivots } = rref(F, basisRows, n);
  const reduced = v.slice();
  rows.forEach((row, i) => {
    const factor = v[pivots[i]!]!;
    if (F.isZero(factor)) return;
    for (let j = 0; j < n; j++) reduced[j] = F.sub(reduced[j]!, F.mul(factor, row[j]!));
  });
  const pivotSet = new Set(pivots);
  return reduced.filter((_, j) => !pivotSet.has(j));
}
