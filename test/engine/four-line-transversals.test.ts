import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import type { Field } from '../../server/src/engine/field.js';
import { binaryQuadraticZeros } from '../../server/src/engine/binary-quadratic.js';
import { squareRootInField } from '../../server/src/engine/field-square-roots.js';
import { finiteField } from '../../server/src/engine/finite-fields.js';
import {
  fourLineTransversals,
  lineBasisFromPlucker,
  type FourLineTransversals,
  type FourLinesFinite,
} from '../../server/src/engine/four-line-transversals.js';
import { primeField } from '../../server/src/engine/prime-field.js';
import { QQ, rational, type Rational } from '../../server/src/engine/rational.js';
import { mathjsDeterminant } from './exterior-arbitraries.js';

const PAIRS = [[0, 1], [0, 2], [0, 3], [1, 2], [1, 3], [2, 3]] as const;
const q = (rows: readonly (readonly number[])[]) => rows.map((r) => r.map((x) => rational(BigInt(x))));
const num = (x: Rational) => Number(x.num) / Number(x.den);

// ---- Independent references, written out here. ----

/** The 2×2 minors p_ij = a_i b_j − a_j b_i of a 2×4 basis, over any field. */
function minors<T>(F: Field<T>, rows: readonly (readonly T[])[]): T[] {
  const [a, b] = rows as [readonly T[], readonly T[]];
  return PAIRS.map(([i, j]) => F.sub(F.mul(a[i]!, b[j]!), F.mul(a[j]!, b[i]!)));
}

/** The Klein quadric x01 x23 − x02 x13 + x03 x12 (classical). */
function klein<T>(F: Field<T>, x: readonly T[]): T {
  return F.add(F.sub(F.mul(x[0]!, x[5]!), F.mul(x[1]!, x[4]!)), F.mul(x[2]!, x[3]!));
}

/** A 4×4 determinant by expansion along the first row, over any field. */
function det4<T>(F: Field<T>, m: readonly (readonly T[])[]): T {
  const det3 = (r: readonly (readonly T[])[]) =>
    [0, 1, 2].reduce((s, j) => {
      const a = r[1]![(j + 1) % 3]!;
      const b = r[2]![(j + 2) % 3]!;
      const c = r[1]![(j + 2) % 3]!;
      const d = r[2]![(j + 1) % 3]!;
      return F.add(s, F.mul(r[0]![j]!, F.sub(F.mul(a, b), F.mul(c, d))));
    }, F.zero);
  return [0, 1, 2, 3].reduce((s, j) => {
    const sub = m.slice(1).map((row) => row.filter((_, c) => c !== j));
    const term = F.mul(m[0]![j]!, det3(sub));
    return j % 2 === 0 ? F.add(s, term) : F.sub(s, term);
  }, F.zero);
}

/** Two lines of P^3 meet exactly when their four basis vectors are dependent (common practice). */
function meetsOverQ(a: readonly (readonly Rational[])[], b: readonly (readonly Rational[])[]): boolean {
  return QQ.isZero(mathjsDeterminant([...a, ...b]));
}

/** Scales a vector so that its first nonzero entry is 1, and writes it as a key. */
function projectiveKey<T>(F: Field<T>, v: readonly T[]): string {
  const first = v.find((x) => !F.isZero(x))!;
  return v.map((x) => F.format(F.div(x, first))).join(' ');
}

function assertFinite<T>(r: FourLineTransversals<T>): asserts r is FourLinesFinite<T> {
  assert.equal(r.kind, 'finite', r.summary);
}

/**
 * The transversals meeting L1, L2, L3 sweep a quadric; L4 meets it where the
 * binary quadratic g(σ, τ) = h(σ·a4 + τ·b4) vanishes, with
 * h(X) = (n1·a3)(n2·b3) − (n1·b3)(n2·a3), n_i the plane through X and L_i.
 * This is an independent floating-point path (it presumes L1, L2, L3 skew to
 * L4 and L1 skew to L2). Returns g's coefficients and, for each real zero,
 * the Plücker vector of the transversal there (from the planes n1, n2).
 */
function sweepSolve(lines: readonly (readonly (readonly number[])[])[]) {
  const [L1, L2, L3, L4] = lines as [number[][], number[][], number[][], number[][]];
  const dot = (x: readonly number[], y: readonly number[]) => x.reduce((s, v, i) => s + v * y[i]!, 0);
  const det3 = (m: number[][]) =>
    m[0]![0]! * (m[1]![1]! * m[2]![2]! - m[1]![2]! * m[2]![1]!) -
    m[0]![1]! * (m[1]![0]! * m[2]![2]! - m[1]![2]! * m[2]![0]!) +
    m[0]![2]! * (m[1]![0]! * m[2]![1]! - m[1]![1]! * m[2]![0]!);
  // The plane through x, a, b: n_i = (−1)^i times the minor without column i.
  const plane = (x: number[], a: number[], b: number[]) =>
    [0, 1, 2, 3].map((i) => (i % 2 === 0 ? 1 : -1) * det3([x, a, b].map((r) => r.filter((_, c) => c !== i))));
  const planes = (x: number[]) => [plane(x, L1[0]!, L1[1]!), plane(x, L2[0]!, L2[1]!)] as const;
  const h = (x: number[]) => {
    const [n1, n2] = planes(x);
    return dot(n1, L3[0]!) * dot(n2, L3[1]!) - dot(n1, L3[1]!) * dot(n2, L3[0]!);
  };
  const at = (s: number, t: number) => h(L4[0]!.map((v, i) => s * v + t * L4[1]![i]!));
  const a = at(1, 0);
  const c = at(0, 1);
  const b = at(1, 1) - a - c;
  const discriminant = b * b - 4 * a * c;
  const zeros: [number, number][] = [];
  if (discriminant >= 0 && (a !== 0 || b !== 0 || c !== 0)) {
    const r = Math.sqrt(discriminant);
    if (a !== 0) zeros.push([-b + r, 2 * a], [-b - r, 2 * a]);
    else zeros.push([1, 0], [-c, b]);
  }
  // The line of the planes n1, n2: p01 : … : p23 = π23 : −π13 : π12 : π03 : −π02 : π01 with π = n1∧n2
  // (classical, from memory; stated in lines-p3.ts and checked in its tests).
  const lineAt = ([s, t]: [number, number]) => {
    const [n1, n2] = planes(L4[0]!.map((v, i) => s * v + t * L4[1]![i]!));
    const pi = PAIRS.map(([i, j]) => n1[i]! * n2[j]! - n1[j]! * n2[i]!);
    return [pi[5]!, -pi[4]!, pi[3]!, pi[2]!, -pi[1]!, pi[0]!];
  };
  return { coefficients: [a, b, c], discriminant, lines: zeros.map(lineAt) };
}

/** Whether two real 6-vectors are proportional up to rounding. */
function nearlyProportional(x: readonly number[], y: readonly number[]): boolean {
  const norm = (v: readonly number[]) => Math.sqrt(v.reduce((s, a) => s + a * a, 0));
  const scale = norm(x) * norm(y);
  return x.every((xi, i) => y.every((yj, j) => Math.abs(xi * yj - x[j]! * y[i]!) <= 1e-9 * scale));
}

/** The real transversals s·u + t·v of the engine's pencil, by the quadratic formula in floating point. */
function engineRealLines(r: FourLinesFinite<Rational>): number[][] {
  const a = num(r.quadratic.ss);
  const b = num(r.quadratic.st);
  const c = num(r.quadratic.tt);
  const d = b * b - 4 * a * c;
  if (d < 0) return [];
  const zeros: [number, number][] = a !== 0 ? [[-b + Math.sqrt(d), 2 * a], [-b - Math.sqrt(d), 2 * a]] : [[1, 0], [-c, b]];
  const [u, v] = r.pencil;
  return zeros.map(([s, t]) => u.map((x, i) => s * num(x) + t * num(v[i]!)));
}

// ---- Explicit examples over the rationals. ----

describe('four lines over the rationals', () => {
  // The lines joining (1 : a : 0 : 0) to (0 : 0 : 1 : b) all meet M1 = span(e0, e1) and M2 = span(e2, e3);
  // for four of them in general position these are the only transversals, as there are at most two.
  const joining = (a: number, b: number) => q([[1, a, 0, 0], [0, 0, 1, b]]);
  const M1 = q([[1, 0, 0, 0], [0, 1, 0, 0]]);
  const M2 = q([[0, 0, 1, 0], [0, 0, 0, 1]]);

  test('four lines with the known transversals M1 and M2', () => {
    const lines = [joining(0, 0), joining(1, 1), joining(2, -1), joining(3, 5)];
    const r = fourLineTransversals(QQ, lines);
    assertFinite(r);
    // σ_1^4 = 2 in G(2, 4): Schubert's four-line problem (classical).
    assert.equal(r.predictedCount, 2n);
    assert.equal(r.rootsInField, true);
    assert.equal(r.transversals.length, 2);
    assert.deepEqual(r.meetingPairs, []);
    for (const t of r.transversals) {
      // Each returned line meets all four: the stacked 4×4 matrix is singular (mathjs determinant).
      for (const L of lines) assert.ok(meetsOverQ(t.basis, L));
      assert.equal(t.multiplicity, 1);
    }
    const found = new Set(r.transversals.map((t) => projectiveKey(QQ, minors(QQ, t.basis))));
    assert.deepEqual(found, new Set([projectiveKey(QQ, minors(QQ, M1)), projectiveKey(QQ, minors(QQ, M2))]));
    assert.equal(r.realCount, 2);
  });

  // The quadric x0 x3 = x1 x2 is ruled by the lines R(s : t) = span((s, 0, t, 0), (0, s, 0, t)) and
  // S(a : b) = span((a, b, 0, 0), (0, 0, a, b)); every R meets every S, and the lines meeting three
  // R's are exactly the S's (classical geometry of the quadric, from memory).
  const R = (s: number, t: number) => q([[s, 0, t, 0], [0, s, 0, t]]);
  const S = (a: number, b: number) => q([[a, b, 0, 0], [0, 0, a, b]]);
  const three = [R(0, 1), R(1, 1), R(1, 2)];

  test('a line tangent to the quadric gives one double transversal', () => {
    // span(e0, e1 + e2) meets the quadric only at e0, doubly (x0 x3 − x1 x2 = −μ² on it), so the one
    // transversal is the S through e0, S(1 : 0), counted twice.
    const r = fourLineTransversals(QQ, [...three, q([[1, 0, 0, 0], [0, 1, 1, 0]])]);
    assertFinite(r);
    assert.equal(r.distinctOverClosure, 1);
    assert.equal(QQ.isZero(r.discriminant), true);
    assert.equal(r.transversals.length, 1);
    assert.equal(r.transversals[0]!.multiplicity, 2);
    assert.equal(projectiveKey(QQ, minors(QQ, r.transversals[0]!.basis)), projectiveKey(QQ, minors(QQ, S(1, 0))));
    assert.equal(r.realCount, 1);
  });

  test('irrational real transversals: the discriminant is positive and not a square', () => {
    // L4 = span((1, 0, 0, 2), (0, 1, 1, 0)) meets the quadric where 2 − μ² = 0, at (1 : ±√2 : ±√2 : 2),
    // so the transversals are S(1 : ±√2), with Plücker vectors (0, 1, ±√2, ±√2, 2, 0) (worked by hand).
    const lines = [...three, q([[1, 0, 0, 2], [0, 1, 1, 0]])];
    const r = fourLineTransversals(QQ, lines);
    assertFinite(r);
    assert.equal(r.rootsInField, false);
    assert.deepEqual(r.transversals, []);
    assert.equal(QQ.sign!(r.discriminant), 1);
    assert.equal(r.realCount, 2);
    const expected = [Math.SQRT2, -Math.SQRT2].map((b) => [0, 1, b, b, 2, 0]);
    const fromEngine = engineRealLines(r);
    assert.equal(fromEngine.length, 2);
    for (const e of expected) assert.ok(fromEngine.some((x) => nearlyProportional(x, e)));
    // The independent sweep-quadric solve in floating point sees two real zeros, at the same lines.
    const sweep = sweepSolve(lines.map((L) => L.map((row) => row.map(num))));
    assert.ok(sweep.discriminant > 0);
    for (const line of sweep.lines) assert.ok(fromEngine.some((x) => nearlyProportional(x, line)));
  });

  test('no real transversals: the discriminant is negative', () => {
    // L4 = span((1, 0, 0, −2), (0, 1, 1, 0)) meets the quadric where −2 − μ² = 0: no real point (by hand).
    const lines = [...three, q([[1, 0, 0, -2], [0, 1, 1, 0]])];
    const r = fourLineTransversals(QQ, lines);
    assertFinite(r);
    assert.equal(QQ.sign!(r.discriminant), -1);
    assert.equal(r.realCount, 0);
    assert.deepEqual(r.transversals, []);
    assert.ok(sweepSolve(lines.map((L) => L.map((row) => row.map(num)))).discriminant < 0);
  });

  test('a fourth line of the same regulus: infinitely many transversals', () => {
    // Four R's: every S meets all of them, so there is a whole conic of transversals (classical).
    const r = fourLineTransversals(QQ, [...three, R(2, 1)]);
    assert.equal(r.kind, 'dependent-lines');
    assert.equal(r.pluckerRank, 3);
    if (r.kind !== 'dependent-lines') return;
    assert.equal(r.solutionSpace.length, 3);
    for (const [a, b] of [[1, 0], [0, 1], [1, 1], [2, -3]] as const) {
      const line = S(a, b);
      for (const L of [...three, R(2, 1)]) assert.ok(meetsOverQ(line, L));
      // Its Plücker vector lies in the reported solution space: adding it keeps the rank 3, so every
      // 4×4 minor of the stacked 4×6 matrix vanishes (mathjs determinants).
      const stacked = [...r.solutionSpace, minors(QQ, line)];
      for (let mask = 0; mask < 64; mask++) {
        const cols = [0, 1, 2, 3, 4, 5].filter((c) => (mask >> c) & 1);
        if (cols.length !== 4) continue;
        assert.ok(QQ.isZero(mathjsDeterminant(stacked.map((row) => cols.map((c) => row[c]!)))));
      }
    }
  });

  test('two given lines that meet: still two transversals', () => {
    // L1 = span(e0, e1) and L2 = span(e0, e2) meet at X = e0 and span the plane x3 = 0. Worked by hand:
    // the line through X meeting L3 and L4 is span(e0, (0, 1, 1, 1)), and the line of that plane through
    // its points (0 : 1 : 1 : 0) on L3 and (1 : 1 : 2 : 0) on L4 is the second transversal.
    const lines = [q([[1, 0, 0, 0], [0, 1, 0, 0]]), q([[1, 0, 0, 0], [0, 0, 1, 0]]), q([[0, 1, 1, 0], [1, 0, 0, 1]]), q([[1, 1, 2, 0], [0, 1, 0, 2]])];
    const r = fourLineTransversals(QQ, lines);
    assertFinite(r);
    assert.deepEqual(r.meetingPairs, [[0, 1]]);
    assert.deepEqual(r.coincidentPairs, []);
    const expected = [q([[1, 0, 0, 0], [0, 1, 1, 1]]), q([[0, 1, 1, 0], [1, 1, 2, 0]])];
    for (const L of lines) for (const e of expected) assert.ok(meetsOverQ(e, L));
    const found = new Set(r.transversals.map((t) => projectiveKey(QQ, minors(QQ, t.basis))));
    assert.deepEqual(found, new Set(expected.map((e) => projectiveKey(QQ, minors(QQ, e)))));
  });

  test('two lines through a point and two in a plane through it: a whole pencil', () => {
    // Every line through e0 in the plane x3 = 0 meets L1, L2 (at e0) and L3, L4 (in the plane): classical.
    const lines = [q([[1, 0, 0, 0], [0, 0, 0, 1]]), q([[1, 0, 0, 0], [0, 1, 1, 1]]), q([[0, 1, 0, 0], [0, 0, 1, 0]]), q([[1, 1, 0, 0], [1, 0, 1, 0]])];
    const r = fourLineTransversals(QQ, lines);
    assert.equal(r.kind, 'whole-pencil');
    if (r.kind !== 'whole-pencil') return;
    for (const [s, t] of [[1, 0], [0, 1], [2, 5]] as const) {
      const p = r.pencil[0].map((x, i) => QQ.add(QQ.mul(rational(BigInt(s)), x), QQ.mul(rational(BigInt(t)), r.pencil[1][i]!)));
      const basis = lineBasisFromPlucker(QQ, p);
      for (const L of lines) assert.ok(meetsOverQ(basis, L));
      assert.ok(QQ.isZero(basis[0]![3]!) && QQ.isZero(basis[1]![3]!));
    }
  });

  test('coincident given lines are named', () => {
    const L = q([[1, 0, 0, 0], [0, 1, 0, 0]]);
    const same = q([[1, 1, 0, 0], [2, 1, 0, 0]]);
    const r = fourLineTransversals(QQ, [L, same, joining(1, 1), joining(2, -1)]);
    assert.equal(r.kind, 'coincident-lines');
    assert.deepEqual(r.coincidentPairs, [[0, 1]]);
  });

  test('bad input is refused', () => {
    assert.throws(() => fourLineTransversals(QQ, [joining(0, 0), joining(1, 1), joining(2, 2)]), /4 lines are needed/);
    assert.throws(() => fourLineTransversals(QQ, [joining(0, 0), joining(1, 1), joining(2, 2), q([[1, 2, 3, 4], [2, 4, 6, 8]])]), /span a point/);
  });
});

// ---- Random lines over the rationals. ----

const smallInt = fc.integer({ min: -2, max: 2 });
const lineQ = fc
  .array(fc.array(smallInt, { minLength: 4, maxLength: 4 }), { minLength: 2, maxLength: 2 })
  .filter((rows) => minors(QQ, q(rows)).some((x) => !QQ.isZero(x)));
const fourLinesQ = fc.array(lineQ, { minLength: 4, maxLength: 4 });

describe('random lines over the rationals', () => {
  test('every returned transversal meets all four lines and the counts add up', () => {
    fc.assert(
      fc.property(fourLinesQ, (raw) => {
        const lines = raw.map(q);
        const r = fourLineTransversals(QQ, lines);
        assert.equal(r.predictedCount, 2n);
        if (r.kind !== 'finite') return;
        for (const t of r.transversals) {
          for (const L of lines) assert.ok(meetsOverQ(t.basis, L), 'a transversal misses a given line');
          // The basis and the Plücker vector describe the same line, and it lies on the Klein quadric.
          assert.equal(projectiveKey(QQ, minors(QQ, t.basis)), projectiveKey(QQ, t.plucker));
          assert.ok(QQ.isZero(klein(QQ, t.plucker)));
        }
        const multiplicity = r.transversals.reduce((s, t) => s + t.multiplicity, 0);
        assert.equal(multiplicity, r.rootsInField ? 2 : 0);
        assert.equal(r.transversals.length, r.rootsInField ? r.distinctOverClosure : 0);
      }),
      { numRuns: 150 },
    );
  });

  test('pairwise skew lines: real counts agree with the floating sweep-quadric solve', () => {
    // Two independent methods (the Klein-quadric pencil and the quadric swept by the transversals of
    // three lines) must see the same number of real transversals; with entries in [−2, 2] every
    // floating value here is an exact integer, so the sign comparison is exact.
    const skew = fourLinesQ.filter((raw) => {
      const lines = raw.map(q);
      return lines.every((a, i) => lines.every((b, j) => j <= i || !meetsOverQ(a, b)));
    });
    fc.assert(
      fc.property(skew, (raw) => {
        const r = fourLineTransversals(QQ, raw.map(q));
        const sweep = sweepSolve(raw);
        assert.ok(Number.isSafeInteger(sweep.discriminant));
        if (sweep.coefficients.every((c) => c === 0)) {
          // L4 lies on the quadric of L1, L2, L3: it belongs to their regulus.
          assert.equal(r.kind, 'dependent-lines');
          return;
        }
        assertFinite(r);
        assert.equal(r.realCount, sweep.discriminant > 0 ? 2 : sweep.discriminant === 0 ? 1 : 0);
        const fromEngine = engineRealLines(r);
        for (const line of sweep.lines) assert.ok(fromEngine.some((x) => nearlyProportional(x, line)));
      }),
      { numRuns: 60 },
    );
  });
});

// ---- Finite fields: brute force over every line of P^3. ----

/** Every line of P^3 over a finite field with the given elements, as a 2×4 reduced row echelon form. */
function allLines<T>(F: Field<T>, elements: readonly T[]): T[][][] {
  const out: T[][][] = [];
  for (let a = 0; a < 4; a++) {
    for (let b = a + 1; b < 4; b++) {
      // Free entries: row 1 after its pivot except at column b, row 2 after its pivot.
      const free: [number, number][] = [];
      for (let c = a + 1; c < 4; c++) if (c !== b) free.push([0, c]);
      for (let c = b + 1; c < 4; c++) free.push([1, c]);
      const fill = (i: number, rows: T[][]): void => {
        if (i === free.length) {
          out.push(rows.map((r) => r.slice()));
          return;
        }
        const [r, c] = free[i]!;
        for (const x of elements) {
          rows[r]![c] = x;
          fill(i + 1, rows);
        }
        rows[r]![c] = F.zero;
      };
      const rows = [0, 1].map(() => new Array<T>(4).fill(F.zero));
      rows[0]![a] = F.one;
      rows[1]![b] = F.one;
      fill(0, rows);
    }
  }
  return out;
}

/** The number of points of P(span(basis)) on the Klein quadric, by listing the points. */
function quadricPointsIn<T>(F: Field<T>, elements: readonly T[], basis: readonly (readonly T[])[]): number {
  let count = 0;
  const d = basis.length;
  const go = (coefficients: T[]): void => {
    if (coefficients.length === d) {
      const first = coefficients.findIndex((c) => !F.isZero(c));
      if (first < 0 || !F.isOne(coefficients[first]!)) return;
      const x = basis[0]!.map((_, j) => coefficients.reduce((s, c, i) => F.add(s, F.mul(c, basis[i]![j]!)), F.zero));
      if (F.isZero(klein(F, x))) count++;
      return;
    }
    for (const e of elements) go([...coefficients, e]);
  };
  go([]);
  return count;
}

function bruteForceCase(name: string, F: Field<any>, elements: readonly any[], runs: number) {
  test(`${name}: the transversals are exactly the lines found by trying every line`, () => {
    const all = allLines(F, elements);
    // There are (q² + 1)(q² + q + 1) lines in P^3 over GF(q) (common practice, no source).
    const size = elements.length;
    assert.equal(all.length, (size * size + 1) * (size * size + size + 1));
    const element = fc.constantFrom(...elements);
    const line = fc
      .array(fc.array(element, { minLength: 4, maxLength: 4 }), { minLength: 2, maxLength: 2 })
      .filter((rows) => minors(F, rows).some((x) => !F.isZero(x)));
    fc.assert(
      fc.property(fc.array(line, { minLength: 4, maxLength: 4 }), (lines) => {
        const meeting = all.filter((m) => lines.every((L) => F.isZero(det4(F, [...m, ...L]))));
        const r = fourLineTransversals(F, lines);
        if (r.kind === 'finite') {
          const expected = new Set(meeting.map((m) => projectiveKey(F, minors(F, m))));
          const found = new Set(r.transversals.map((t) => projectiveKey(F, t.plucker)));
          assert.deepEqual(found, expected);
          assert.equal(found.size, r.transversals.length);
        } else if (r.kind === 'whole-pencil') {
          assert.equal(meeting.length, size + 1);
        } else {
          assert.equal(meeting.length, quadricPointsIn(F, elements, r.solutionSpace));
        }
      }),
      { numRuns: runs },
    );
  });
}

describe('finite fields against brute force', () => {
  const prime = (p: number) => {
    const F = primeField(BigInt(p));
    return [F, Array.from({ length: p }, (_, i) => F.fromBigInt(BigInt(i)))] as const;
  };
  for (const p of [2, 3, 5, 7]) {
    const [F, elements] = prime(p);
    bruteForceCase(`GF(${p})`, F, elements, p <= 5 ? 30 : 15);
  }
  const GF4 = finiteField(4n);
  bruteForceCase('GF(4)', GF4, [0, 1, 2, 3], 20);
  const GF9 = finiteField(9n);
  bruteForceCase('GF(9)', GF9, Array.from({ length: 9 }, (_, i) => i), 6);

  test('over GF(7) the roots found agree with the discriminant being a square', () => {
    // Euler's criterion: d ≠ 0 is a square mod 7 exactly when d is 1, 2 or 4 (squares listed by hand).
    const F = primeField(7n);
    const squares = new Set([1, 2, 4]);
    const element = fc.integer({ min: 0, max: 6 });
    const line = fc
      .array(fc.array(element, { minLength: 4, maxLength: 4 }), { minLength: 2, maxLength: 2 })
      .filter((rows) => minors(F, rows).some((x) => !F.isZero(x)));
    fc.assert(
      fc.property(fc.array(line, { minLength: 4, maxLength: 4 }), (lines) => {
        const r = fourLineTransversals(F, lines);
        if (r.kind !== 'finite') return;
        const d = r.discriminant as number;
        const expected = d === 0 ? 1 : squares.has(d) ? 2 : 0;
        assert.equal(r.transversals.length, expected);
      }),
      { numRuns: 100 },
    );
  });
});

// ---- The square roots and quadratic zeros the solver relies on. ----

describe('square roots and zeros of binary quadratics', () => {
  test('square roots in finite fields agree with the list of squares', () => {
    // The squares of a finite field are the values x·x, listed by squaring every element (by definition).
    const cases: [Field<any>, any[]][] = [
      ...[3, 7, 11, 13].map((p) => {
        const F = primeField(BigInt(p));
        return [F, Array.from({ length: p }, (_, i) => F.fromBigInt(BigInt(i)))] as [Field<any>, any[]];
      }),
      ...[4, 8, 9, 25].map((order) => [finiteField(BigInt(order)), Array.from({ length: order }, (_, i) => i)] as [Field<any>, any[]]),
    ];
    for (const [F, elements] of cases) {
      const squares = new Set(elements.map((x) => F.format(F.mul(x, x))));
      for (const a of elements) {
        const r = squareRootInField(F, a);
        assert.equal(r !== undefined, squares.has(F.format(a)), `${F.name}: ${F.format(a)}`);
        if (r !== undefined) assert.ok(F.eq(F.mul(r, r), a));
      }
    }
  });

  test('square roots of rationals and in a large prime field', () => {
    // 9/4 = (3/2)², while 2, 8/9 and −1 are not squares of rationals (classical).
    assert.deepEqual(squareRootInField(QQ, rational(9n, 4n)), rational(3n, 2n));
    assert.equal(squareRootInField(QQ, rational(2n)), undefined);
    assert.equal(squareRootInField(QQ, rational(8n, 9n)), undefined);
    assert.equal(squareRootInField(QQ, rational(-1n)), undefined);
    // A square x² always has a root, checked by squaring (p = 2^61 − 1 ≡ 3 mod 4 and p = 2^31 − 1 alike).
    for (const p of [2n ** 61n - 1n, 2n ** 31n - 1n, 998244353n]) {
      const F = primeField(p);
      fc.assert(
        fc.property(fc.bigInt({ min: 1n, max: p - 1n }), (x) => {
          const a = F.mul(F.fromBigInt(x), F.fromBigInt(x));
          const r = squareRootInField(F, a)!;
          assert.ok(F.eq(F.mul(r, r), a));
        }),
        { numRuns: 30 },
      );
    }
  });

  test('the zeros of a binary quadratic over GF(q) are the points where it vanishes', () => {
    // Brute force over the q + 1 points of the projective line (by definition).
    for (const order of [2, 3, 4, 5, 8, 9]) {
      const F = finiteField(BigInt(order));
      const elements = Array.from({ length: order }, (_, i) => (order === 2 || order === 3 || order === 5 ? F.fromBigInt(BigInt(i)) : i));
      const points: [any, any][] = [[F.one, F.zero], ...elements.map((x) => [x, F.one] as [any, any])];
      for (const a of elements) {
        for (const b of elements) {
          for (const c of elements) {
            if (F.isZero(a) && F.isZero(b) && F.isZero(c)) continue;
            const value = ([s, t]: [any, any]) => F.add(F.add(F.mul(a, F.mul(s, s)), F.mul(b, F.mul(s, t))), F.mul(c, F.mul(t, t)));
            const expected = new Set(points.filter((pt) => F.isZero(value(pt))).map((pt) => projectiveKey(F, pt)));
            const result = binaryQuadraticZeros(F, a, b, c);
            assert.deepEqual(new Set(result.zeros.map((z) => projectiveKey(F, z.point))), expected, `${F.name}: ${a}, ${b}, ${c}`);
            // A double zero is reported once, with multiplicity 2.
            if (result.distinctOverClosure === 1) assert.equal(result.zeros[0]!.multiplicity, 2);
          }
        }
      }
    }
  });
});
