/**
 * Small, slow, obviously correct exterior and linear algebra written for the
 * property tests, independently of the engine's own algorithms: subsets are
 * listed by recursion, signs come from counting inversions, ranks and row
 * spaces from a textbook Gauss–Jordan elimination, and determinants from
 * cofactor expansion. Only the field operations are shared with the engine.
 */
import type { Field } from '../../server/src/engine/field.js';
import type { Multivector } from '../../server/src/engine/multivector.js';
import { inversionSign } from '../engine/exterior-arbitraries.js';

/** All k-subsets of {0, …, n−1}, increasing, in lexicographic order. */
export function subsetsOf(n: number, k: number): number[][] {
  const out: number[][] = [];
  const pick = (from: number, chosen: number[]) => {
    if (chosen.length === k) {
      out.push(chosen.slice());
      return;
    }
    for (let x = from; x <= n - (k - chosen.length); x++) {
      chosen.push(x);
      pick(x + 1, chosen);
      chosen.pop();
    }
  };
  if (k >= 0 && k <= n) pick(0, []);
  return out;
}

/** The sign of the permutation that sorts `indices` (0 when an index repeats): the engine tests' own, by counting inversions. */
export const permutationSign = inversionSign;

const keyOf = (subset: readonly number[]) => subset.join(',');

/** The coefficient of e_S for a strictly increasing S, read from the multivector's terms by comparing subsets. */
export function coefficientOf<T>(F: Field<T>, mv: Multivector<T>, subset: readonly number[]): T {
  const wanted = keyOf(subset);
  for (const term of mv.terms.values()) if (keyOf(term.subset) === wanted) return term.coeff;
  return F.zero;
}

/** All C(n, k) coefficients in lexicographic order of the subsets. */
export function denseCoefficients<T>(F: Field<T>, mv: Multivector<T>): T[] {
  return subsetsOf(mv.n, mv.k).map((s) => coefficientOf(F, mv, s));
}

/** Same dimension, same degree, same coefficient on every basis element. */
export function sameMultivector<T>(F: Field<T>, a: Multivector<T>, b: Multivector<T>): boolean {
  if (a.n !== b.n || a.k !== b.k) return false;
  const x = denseCoefficients(F, a);
  const y = denseCoefficients(F, b);
  return x.every((c, i) => F.eq(c, y[i]!));
}

const positionTables = new Map<string, Map<string, number>>();

/** The position of each k-subset of {0, …, n−1} in lexicographic order, computed once per (n, k). */
export function lexPositions(n: number, k: number): Map<string, number> {
  const id = `${n}:${k}`;
  let table = positionTables.get(id);
  if (table === undefined) {
    table = new Map(subsetsOf(n, k).map((s, i) => [keyOf(s), i]));
    positionTables.set(id, table);
  }
  return table;
}

/**
 * The alternating coordinate p(i_1, …, i_k) of a dense coordinate vector (lexicographic order):
 * the coordinate of the sorted set times the sign of the sorting, zero for a repeated index.
 */
export function alternatingCoordinate<T>(F: Field<T>, dense: readonly T[], n: number, indices: readonly number[]): T {
  const sign = permutationSign(indices);
  if (sign === 0) return F.zero;
  const sorted = indices.slice().sort((a, b) => a - b);
  const value = dense[lexPositions(n, indices.length).get(keyOf(sorted))!]!;
  return sign === 1 ? value : F.neg(value);
}

/** Reduced row echelon form by textbook Gauss–Jordan elimination: the nonzero rows only. */
export function reducedRows<T>(F: Field<T>, rows: readonly (readonly T[])[], n: number): T[][] {
  const m = rows.map((r) => r.slice());
  let rank = 0;
  for (let col = 0; col < n && rank < m.length; col++) {
    const pivot = m.findIndex((r, i) => i >= rank && !F.isZero(r[col]!));
    if (pivot < 0) continue;
    [m[rank], m[pivot]] = [m[pivot]!, m[rank]!];
    const inverse = F.inv(m[rank]![col]!);
    m[rank] = m[rank]!.map((x) => F.mul(inverse, x));
    for (let i = 0; i < m.length; i++) {
      if (i === rank || F.isZero(m[i]![col]!)) continue;
      const factor = m[i]![col]!;
      m[i] = m[i]!.map((x, j) => F.sub(x, F.mul(factor, m[rank]![j]!)));
    }
    rank++;
  }
  return m.slice(0, rank);
}

export function rankOf<T>(F: Field<T>, rows: readonly (readonly T[])[], n: number): number {
  return reducedRows(F, rows, n).length;
}

/** Whether two lists of rows span the same subspace: their reduced row echelon forms agree. */
export function sameRowSpace<T>(F: Field<T>, a: readonly (readonly T[])[], b: readonly (readonly T[])[], n: number): boolean {
  const x = reducedRows(F, a, n);
  const y = reducedRows(F, b, n);
  return x.length === y.length && x.every((row, i) => row.every((v, j) => F.eq(v, y[i]![j]!)));
}

/** The determinant by cofactor expansion along the first row (fine for the k ≤ 7 used here). */
export function cofactorDeterminant<T>(F: Field<T>, m: readonly (readonly T[])[]): T {
  if (m.length === 0) return F.one;
  let total = F.zero;
  m[0]!.forEach((entry, j) => {
    if (F.isZero(entry)) return;
    const minor = m.slice(1).map((row) => row.filter((_, c) => c !== j));
    const term = F.mul(entry, cofactorDeterminant(F, minor));
    total = j % 2 === 0 ? F.add(total, term) : F.sub(total, term);
  });
  return total;
}

/** The square submatrix of `rows` on the given columns, in the order given. */
export function columnsOf<T>(rows: readonly (readonly T[])[], columns: readonly number[]): T[][] {
  return rows.map((row) => columns.map((c) => row[c]!));
}

/**
 * The matrix of the linear map v ↦ v ∧ ω from V = F^n to the (k+1)-th exterior
 * power: row i holds the coefficients of e_i ∧ ω on the (k+1)-subsets in
 * lexicographic order. For a term c·e_K with i ∉ K, e_i ∧ e_K is the sign of
 * sorting (i, K) times e_{K ∪ {i}}.
 */
export function wedgeMapMatrix<T>(F: Field<T>, mv: Multivector<T>): T[][] {
  const position = lexPositions(mv.n, mv.k + 1);
  return Array.from({ length: mv.n }, (_, i) => {
    const row = new Array<T>(position.size).fill(F.zero);
    for (const { subset, coeff } of mv.terms.values()) {
      const sign = permutationSign([i, ...subset]);
      if (sign === 0) continue;
      const target = position.get(keyOf([i, ...subset].sort((a, b) => a - b)))!;
      row[target] = sign === 1 ? F.add(row[target]!, coeff) : F.sub(row[target]!, coeff);
    }
    return row;
  });
}

/**
 * A basis of the solutions of rows·x = 0 (the kernel), read off the reduced
 * row echelon form: one vector per free column, with 1 there and minus the
 * pivot rows' entries in the pivot columns.
 */
export function nullSpace<T>(F: Field<T>, rows: readonly (readonly T[])[], n: number): T[][] {
  const reduced = reducedRows(F, rows, n);
  const pivots = reduced.map((row) => row.findIndex((x) => !F.isZero(x)));
  const out: T[][] = [];
  for (let free = 0; free < n; free++) {
    if (pivots.includes(free)) continue;
    const v = new Array<T>(n).fill(F.zero);
    v[free] = F.one;
    reduced.forEach((row, i) => {
      v[pivots[i]!] = F.neg(row[free]!);
    });
    out.push(v);
  }
  return out;
}

/** All maximal minors of a k×n matrix by cofactor expansion, in lexicographic order of the column sets. */
export function minorsOf<T>(F: Field<T>, rows: readonly (readonly T[])[], n: number): T[] {
  return subsetsOf(n, rows.length).map((columns) => cofactorDeterminant(F, columnsOf(rows, columns)));
}

/** Whether x = c·y for some nonzero c (both nonzero), i.e. the same projective point. */
export function proportional<T>(F: Field<T>, x: readonly T[], y: readonly T[]): boolean {
  if (x.length !== y.length) return false;
  const i = y.findIndex((v) => !F.isZero(v));
  if (i < 0 || F.isZero(x[i]!)) return false;
  const c = F.div(x[i]!, y[i]!);
  return x.every((v, j) => F.eq(v, F.mul(c, y[j]!)));
}
