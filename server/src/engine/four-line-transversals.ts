/**
 * The explicit Schubert problem of the lines in projective 3-space that meet
 * four given lines L1, …, L4.
 *
 * Method. A line ℓ is a point of the Klein quadric Q(x) = x01 x23 − x02 x13 +
 * x03 x12 = 0 in P^5 (its Plücker vector), and ℓ meets L_i exactly when the
 * polar form B(x, y) = Q(x + y) − Q(x) − Q(y) of Q (`kleinPairing`) vanishes
 * on ℓ and L_i (see lines-p3.ts). Each condition B(x, L_i) = 0 is one linear
 * equation in x, so the lines meeting all four are the points of the Klein
 * quadric inside W = {x : B(x, L_i) = 0 for i = 1..4}. B is nondegenerate, so
 * dim W = 6 − rank(L1, …, L4).
 *
 * When the four Plücker vectors are independent, W is 2-dimensional, a pencil
 * s·u + t·v, and on it Q is the binary quadratic form
 *   Q(s·u + t·v) = Q(u)·s² + B(u, v)·s·t + Q(v)·t².
 * Its zeros are the transversals: two over the algebraic closure (counted with
 * multiplicity) unless the form vanishes identically, when the whole pencil —
 * the lines through one point in one plane — meets all four lines. The count
 * 2 is the intersection number σ_1^4 in G(2, 4), since σ_1 is the class of the
 * lines meeting a given line.
 *
 * When the Plücker vectors are dependent (for instance when L4 belongs to the
 * regulus of L1, L2, L3, or two given lines coincide), W has dimension 3 or
 * more and Q restricted to P(W) is a conic or a larger quadric: over the
 * algebraic closure the transversals then form a family of positive dimension.
 *
 * Given lines that meet but are distinct keep the Plücker vectors independent
 * as a rule, and the count of two survives: if L1 and L2 meet at X and span
 * the plane π, the transversals are the line through X meeting L3 and L4 and
 * the line in π through the points where π meets L3 and L4. They are reported
 * in `meetingPairs`, and the computation above stays valid.
 *
 * The transversal with Plücker vector p contains the vectors
 * (p_{m0}, p_{m1}, p_{m2}, p_{m3}) for every m (with p_mm = 0 and p_nm = −p_mn):
 * for p = a∧b that vector is a_m·b − b_m·a. Two of them, for m = i and j with
 * p_ij ≠ 0, are independent (their minor on the columns i, j is p_ij²), so they
 * give a basis of the line.
 */
import type { Field } from './field.js';
import { binaryQuadraticZeros } from './binary-quadratic.js';
import { dualCoordinates, kleinPairing, LINE_COORDINATE_PAIRS } from './lines-p3.js';
import { kernel, rank, rref } from './matrix.js';
import { normalizePoint, projectivelyEqual } from './normalize.js';
import { pluckerCoordinates } from './plucker.js';
import { intersectionNumber } from './schubert-calculus.js';

/** One line meeting the four given lines. */
export interface TransversalLine<T> {
  /** The point (s : t) of the pencil, first nonzero entry 1: the line is s·u + t·v for the pencil (u, v). */
  parameter: [T, T];
  /**
   * The Plücker vector (p01, p02, p03, p12, p13, p23): coprime integers with a
   * positive first nonzero entry over the rationals, first nonzero entry 1
   * over other fields.
   */
  plucker: T[];
  /** A basis of the line: its 2×4 reduced row echelon form. */
  basis: T[][];
  /** 2 when the line is a double zero of the quadratic form (it counts twice), 1 otherwise. */
  multiplicity: 1 | 2;
}

/** The binary quadratic form q·s² + r·s·t + w·t² of the Klein quadric on the pencil s·u + t·v. */
export interface PencilQuadratic<T> {
  /** The coefficient of s²: Q(u). */
  ss: T;
  /** The coefficient of s·t: B(u, v). */
  st: T;
  /** The coefficient of t²: Q(v). */
  tt: T;
}

/** What every outcome reports about the given lines. */
export interface FourLinesBase<T> {
  /** The field's name. */
  field: string;
  /** σ_1^4 in G(2, 4): the number of transversals of four general lines over an algebraically closed field. */
  predictedCount: bigint;
  /** The Plücker vectors of the given lines, in input order, as their bases give them (not rescaled). */
  given: T[][];
  /** The rank of the four Plücker vectors (4 for lines in general position). */
  pluckerRank: number;
  /** The pairs [i, j], i < j, 0-based, of given lines that meet (coincident pairs included). */
  meetingPairs: [number, number][];
  /** The pairs [i, j], i < j, 0-based, of given lines that are the same line. */
  coincidentPairs: [number, number][];
  /** The outcome in one sentence, for hovers. */
  summary: string;
}

/** Finitely many transversals: the zeros of a nonzero binary quadratic form on a pencil. */
export interface FourLinesFinite<T> extends FourLinesBase<T> {
  kind: 'finite';
  /** The basis (u, v) of the 2-dimensional space W of vectors Klein-orthogonal to the four lines. */
  pencil: [T[], T[]];
  /** Q(s·u + t·v) = ss·s² + st·s·t + tt·t²; its zeros (s : t) are the transversals. */
  quadratic: PencilQuadratic<T>;
  /** st² − 4·ss·tt (in characteristic 2 it is st², zero exactly for a double transversal). */
  discriminant: T;
  /** The number of distinct transversals over the algebraic closure: 2, or 1 for a double one. */
  distinctOverClosure: 1 | 2;
  /**
   * Whether the transversals are defined over the field; outside
   * characteristic 2, whether the discriminant is a square there.
   */
  rootsInField: boolean;
  /** The transversals defined over the field (empty when `rootsInField` is false). */
  transversals: TransversalLine<T>[];
  /**
   * Over the rationals: the number of distinct real transversals, 2 when the
   * discriminant is positive, 1 when it is 0, 0 when it is negative.
   * Undefined for fields without an order.
   */
  realCount?: 0 | 1 | 2;
}

/** The form vanishes on the whole pencil: every line through one point in one plane is a transversal. */
export interface FourLinesWholePencil<T> extends FourLinesBase<T> {
  kind: 'whole-pencil';
  /** The basis (u, v) of the pencil, every combination of which is a transversal. */
  pencil: [T[], T[]];
}

/**
 * The Plücker vectors are dependent (two given lines may coincide): the
 * transversals are the points of the Klein quadric in the projective space of
 * `solutionSpace`, of dimension ≥ 1 over the algebraic closure.
 */
export interface FourLinesDependent<T> extends FourLinesBase<T> {
  kind: 'coincident-lines' | 'dependent-lines';
  /** A basis of W = {x : B(x, L_i) = 0 for all i}, of dimension 6 − pluckerRank ≥ 3. */
  solutionSpace: T[][];
}

export type FourLineTransversals<T> = FourLinesFinite<T> | FourLinesWholePencil<T> | FourLinesDependent<T>;

/** The quadratic form of the Klein quadric itself (not B(x, x)/2, which fails in characteristic 2). */
function kleinForm<T>(F: Field<T>, x: readonly T[]): T {
  const [x01, x02, x03, x12, x13, x23] = x as [T, T, T, T, T, T];
  return F.add(F.sub(F.mul(x01, x23), F.mul(x02, x13)), F.mul(x03, x12));
}

/** p_ij for any i ≠ j, extended antisymmetrically; p_ii = 0. */
function entry<T>(F: Field<T>, p: readonly T[], i: number, j: number): T {
  if (i === j) return F.zero;
  const index = LINE_COORDINATE_PAIRS.findIndex(([a, b]) => a === Math.min(i, j) && b === Math.max(i, j));
  return i < j ? p[index]! : F.neg(p[index]!);
}

/** A 2×4 basis (reduced row echelon form) of the line with Plücker vector p (a nonzero point of the Klein quadric). */
export function lineBasisFromPlucker<T>(F: Field<T>, p: readonly T[]): T[][] {
  const index = p.findIndex((x) => !F.isZero(x));
  if (index < 0) throw new RangeError('lineBasisFromPlucker: the zero vector is no line');
  if (!F.isZero(kleinForm(F, p))) throw new RangeError('lineBasisFromPlucker: the vector is not on the Klein quadric, so it is no line');
  const [i, j] = LINE_COORDINATE_PAIRS[index]!;
  const rows = [i, j].map((m) => [0, 1, 2, 3].map((c) => entry(F, p, m, c)));
  return rref(F, rows, 4).rows;
}

let predicted: bigint | undefined;

/** σ_1^4 in G(2, 4), computed once by the Schubert calculus. */
function predictedCount(): bigint {
  predicted ??= intersectionNumber(2, 4, [[1], [1], [1], [1]]);
  return predicted;
}

function checkLines<T>(F: Field<T>, lines: readonly (readonly (readonly T[])[])[]): T[][] {
  if (lines.length !== 4) throw new RangeError(`fourLineTransversals: 4 lines are needed, ${lines.length} given`);
  return lines.map((rows, i) => {
    if (rows.length !== 2 || rows.some((r) => r.length !== 4)) {
      throw new RangeError(`fourLineTransversals: line ${i + 1} must be given by a 2×4 basis matrix`);
    }
    const p = pluckerCoordinates(F, rows, 4);
    if (p.every((x) => F.isZero(x))) {
      throw new RangeError(`fourLineTransversals: the rows of line ${i + 1} are proportional, so they span a point, not a line`);
    }
    return p;
  });
}

function transversal<T>(F: Field<T>, u: readonly T[], v: readonly T[], parameter: [T, T], multiplicity: 1 | 2): TransversalLine<T> {
  const [s, t] = parameter;
  const raw = u.map((x, i) => F.add(F.mul(s, x), F.mul(t, v[i]!)));
  const plucker = normalizePoint(F, raw, 'primitive').values;
  return { parameter, plucker, basis: lineBasisFromPlucker(F, plucker), multiplicity };
}

/**
 * The form as text, such as `s² - 2t²` or `3s·t + t²`: zero terms left out,
 * a coefficient 1 not written, fractions in parentheses.
 */
export function formatPencilQuadratic<T>(F: Field<T>, q: PencilQuadratic<T>): string {
  const terms: [T, string][] = [
    [q.ss, 's²'],
    [q.st, 's·t'],
    [q.tt, 't²'],
  ];
  let out = '';
  for (const [c, monomial] of terms) {
    if (F.isZero(c)) continue;
    const text = F.format(c);
    const negative = text.startsWith('-');
    const magnitude = negative ? text.slice(1) : text;
    const factor = magnitude === '1' ? '' : magnitude.includes('/') ? `(${magnitude})` : magnitude;
    const body = factor + monomial;
    out += out === '' ? (negative ? `-${body}` : body) : negative ? ` - ${body}` : ` + ${body}`;
  }
  return out === '' ? '0' : out;
}

function finiteSummary<T>(F: Field<T>, r: Omit<FourLinesFinite<T>, 'summary'>): string {
  const prediction = `the Schubert calculus predicts σ_1^4 = ${r.predictedCount} counted with multiplicity`;
  if (r.distinctOverClosure === 1) return `One double transversal, defined over ${F.name} (${prediction}).`;
  if (r.rootsInField) return `Two transversals, both defined over ${F.name} (${prediction}).`;
  const real =
    r.realCount === undefined ? '' : r.realCount === 2 ? '; both are real' : r.realCount === 0 ? '; neither is real' : '';
  return (
    `Two transversals over the algebraic closure, not defined over ${F.name}: the lines s·u + t·v with ` +
    `${formatPencilQuadratic(F, r.quadratic)} = 0, ` +
    `discriminant ${F.format(r.discriminant)}${real} (${prediction}).`
  );
}

/**
 * The lines meeting the four lines spanned by the given 2×4 basis matrices,
 * by the pencil method described at the top of this file. Square roots are
 * taken in the rationals and in finite fields; over another field a
 * discriminant that is not 0 raises `UnsupportedSquareRootError`. Throws a
 * RangeError unless exactly four 2×4 matrices of rank 2 are given.
 */
export function fourLineTransversals<T>(F: Field<T>, lines: readonly (readonly (readonly T[])[])[]): FourLineTransversals<T> {
  const given = checkLines(F, lines);
  const meetingPairs: [number, number][] = [];
  const coincidentPairs: [number, number][] = [];
  for (let i = 0; i < 4; i++) {
    for (let j = i + 1; j < 4; j++) {
      if (!F.isZero(kleinPairing(F, given[i]!, given[j]!))) continue;
      meetingPairs.push([i, j]);
      if (projectivelyEqual(F, given[i]!, given[j]!)) coincidentPairs.push([i, j]);
    }
  }
  const pluckerRank = rank(F, given, 6);
  // B(x, L) = x · dualCoordinates(L), so W is the kernel of the matrix of dual coordinates.
  const space = kernel(F, given.map((p) => dualCoordinates(F, p)), 6).map((x) => normalizePoint(F, x, 'primitive').values);
  const base = { field: F.name, predictedCount: predictedCount(), given, pluckerRank, meetingPairs, coincidentPairs };

  if (pluckerRank < 4) {
    const kind = coincidentPairs.length > 0 ? 'coincident-lines' : 'dependent-lines';
    const why =
      kind === 'coincident-lines'
        ? `Given lines ${coincidentPairs.map(([i, j]) => `${i + 1} and ${j + 1}`).join(', ')} coincide`
        : `The Plücker vectors of the four lines are dependent (rank ${pluckerRank})`;
    return {
      ...base,
      kind,
      solutionSpace: space,
      summary: `${why}, so the transversals form a family of positive dimension over the algebraic closure, not the ${base.predictedCount} of general position.`,
    };
  }

  const [u, v] = space as [T[], T[]];
  const quadratic = { ss: kleinForm(F, u), st: kleinPairing(F, u, v), tt: kleinForm(F, v) };
  if (F.isZero(quadratic.ss) && F.isZero(quadratic.st) && F.isZero(quadratic.tt)) {
    return {
      ...base,
      kind: 'whole-pencil',
      pencil: [u, v],
      summary: 'Every line of a pencil (the lines through one point in one plane) meets the four lines: infinitely many transversals over the algebraic closure.',
    };
  }
  const zeros = binaryQuadraticZeros(F, quadratic.ss, quadratic.st, quadratic.tt);
  const sign = F.sign?.(zeros.discriminant);
  const realCount = sign === undefined ? undefined : sign > 0 ? 2 : sign === 0 ? 1 : 0;
  const result: Omit<FourLinesFinite<T>, 'summary'> = {
    ...base,
    kind: 'finite',
    pencil: [u, v],
    quadratic,
    discriminant: zeros.discriminant,
    distinctOverClosure: zeros.distinctOverClosure,
    rootsInField: zeros.inField,
    transversals: zeros.zeros.map((z) => transversal(F, u, v, z.point, z.multiplicity)),
    ...(realCount === undefined ? {} : { realCount }),
  };
  // Meeting lines do not change the count, but they are a special position worth saying.
  const meeting =
    meetingPairs.length === 0 ? '' : `Given lines ${meetingPairs.map(([i, j]) => `${i + 1} and ${j + 1}`).join(', ')} meet. `;
  return { ...result, summary: meeting + finiteSummary(F, result) };
}
