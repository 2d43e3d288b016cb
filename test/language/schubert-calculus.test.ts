/**
 * Schubert calculus in `.wedge` files: Grassmannians, classes and their products, degrees and
 * intersection numbers, claims on them, and the problems a wrong argument gets. The numbers are
 * classical; each check names where it comes from.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { analyze, type Analysis } from '../../server/src/language/index.js';
import { create, all } from 'mathjs';
import { expectAnalysis, resultNamed } from './analysis-check.js';

const math = create(all, { number: 'Fraction' });

/** Whether two lines of P^3, given by 2×4 bases, meet: the 4×4 matrix of both bases is singular (common practice, no source). */
function meet(a: readonly (readonly number[])[], b: readonly (readonly number[])[]): boolean {
  return Number(math.det(math.matrix([...a, ...b].map((r) => [...r])))) === 0;
}

function shows(a: Analysis) {
  return a.results.filter((r) => r.kind === 'show');
}

describe('Schubert classes in the language', () => {
  test("Schubert's four lines: σ_1^4 = 2 σ_{2,2} in G(2,4), so two lines meet four general lines", () => {
    // The number of lines of projective 3-space meeting four general lines is 2 (Schubert, 1879; e.g.
    // Eisenbud–Harris, "3264 and All That", §3.4 — from memory).
    const a = expectAnalysis(`
      grassmannian X = Gr(2, 4)
      class c = sigma(X, 1)^4
      claim intersection_number(c) = 2
      claim c = 2 sigma(X, 2, 2)
    `);
    assert.deepEqual(resultNamed(a, 'c').json.terms, [{ partition: [2, 2], coefficient: '2' }]);
    assert.equal(resultNamed(a, 'c').json.intersectionNumber, '2');
    assert.match(resultNamed(a, 'X').hover, /dimension k\(n−k\) = 4/);
  });

  test("Pieri's formula: σ_1 · σ_1 = σ_2 + σ_{1,1}, and σ_1 · σ_2 = σ_3 + σ_{2,1} in G(3,6)", () => {
    // Pieri: σ_1 · σ_λ is the sum of σ_μ over μ ⊃ λ with one more box, inside the box (common practice, no source).
    const a = expectAnalysis(`
      grassmannian X = Gr(2, 4)
      grassmannian Y = Gr(3, 6)
      claim sigma(X, 1) * sigma(X, 1) = sigma(X, 2) + sigma(X, 1, 1)
      claim sigma(Y, 1) * sigma(Y, 2) = sigma(Y, 3) + sigma(Y, 2, 1)
      show sigma(X, 1) sigma(X, 2)
    `);
    // In G(2,4) the box is 2×2, so σ_1 · σ_2 = σ_{2,1} only (σ_3 does not fit).
    assert.deepEqual(shows(a)[0]!.json.terms, [{ partition: [2, 1], coefficient: '1' }]);
  });

  test('a Littlewood–Richardson coefficient 2: σ_{2,1}^2 has σ_{3,2,1} with coefficient 2 in G(3,6)', () => {
    // c^{(3,2,1)}_{(2,1),(2,1)} = 2, the smallest Littlewood–Richardson coefficient above 1 (Fulton, Young
    // Tableaux, §5 — from memory).
    const a = expectAnalysis(`
      grassmannian Y = Gr(3, 6)
      show sigma(Y, 2, 1)^2
    `);
    const terms = shows(a)[0]!.json.terms as { partition: number[]; coefficient: string }[];
    assert.equal(terms.find((t) => t.partition.join(',') === '3,2,1')?.coefficient, '2');
    // Every term has degree 6 = 2 · |(2,1)|.
    assert.ok(terms.every((t) => t.partition.reduce((x, y) => x + y, 0) === 6));
  });

  test('degrees of Grassmannians: Catalan numbers for G(2,n), 42 and 462 for G(3,6) and G(3,7)', () => {
    // deg G(2,n) = C_{n−2}, the Catalan numbers 1, 2, 5, 14, 42 (OEIS A000108); deg G(3,6) = 42 and
    // deg G(3,7) = 462, three-dimensional Catalan numbers (OEIS A005789); both are numbers of standard
    // Young tableaux of rectangular shape (hook length formula) — from memory.
    const a = expectAnalysis(`
      claim degree(Gr(2, 3)) = 1
      claim degree(Gr(2, 4)) = 2
      claim degree(Gr(2, 5)) = 5
      claim degree(Gr(2, 6)) = 14
      claim degree(Gr(2, 7)) = 42
      claim degree(Gr(3, 6)) = 42
      claim degree(Gr(3, 7)) = 462
      claim intersection_number(sigma(Gr(2, 5), 1)^6) = 5
    `);
    assert.equal(a.problems.length, 0);
  });

  test('false claims say what was found', () => {
    const a = analyze(
      ['grassmannian X = Gr(2, 4)', 'claim sigma(X, 1)^2 = sigma(X, 2)', 'claim degree(X) = 3', ''].join('\n'),
      { evaluate: true },
    );
    assert.deepEqual(a.problems.map((p) => p.code), ['claim/class', 'claim/dimension']);
    const messages = a.problems.map((p) => p.message).join('\n');
    assert.match(messages, /is σ_\{1,1\} \+ σ_\{2\}, not σ_\{2\}/);
    assert.match(messages, /degree\(X\) is 2, not 3/);
  });

  test('wrong arguments: a partition outside the box, a class of another Grassmannian, a scalar that is no whole number', () => {
    expectAnalysis(`
      grassmannian X = Gr(2, 4)
      grassmannian Y = Gr(2, 5)
      show sigma(X, 3)
      #             ^ math/bad-partition
      show sigma(X, 1, 2)
      #             ^^^^ math/bad-partition
      show sigma(X, 1) * sigma(Y, 1)
      #                ^ type/operand
      show 1/2 sigma(X, 1)
      #    ^^^^^^^^^^^^^^^ type/operand
      show sigma(X, 1)^2 + 1
      #                  ^ type/operand
      class d = Gr(2, 4)
      #         ^^^^^^^^ type/declared-kind
    `);
  });

  test('the convention is stated in hovers, and the LaTeX uses \\sigma', () => {
    const a = expectAnalysis(`
      grassmannian X = Gr(2, 5)
      class c = 3 sigma(X, 2, 1) - sigma(X, 3)
    `);
    const c = resultNamed(a, 'c');
    assert.match(c.hover, /λ_j = n − k \+ j − i_j/);
    assert.equal(c.latex, '3\\sigma_{2,1} - \\sigma_{3}');
    assert.equal(c.summary, '3σ_{2,1} - σ_{3} in G(2,5)');
  });

  test('the lines meeting four lines: two rational ones found and checked; an irrational pair counted', () => {
    // Four lines joining points of the planes span(e1, e2) and span(e3, e4): both planes' lines
    // span(e1, e2) and span(e3, e4) meet all four, and no other line does when the four pairings of
    // points are not one projectivity (common practice, no source).
    const a = expectAnalysis(`
      space V dim 4
      subspace L1 = span(e1, e3)
      subspace L2 = span(e2, e4)
      subspace L3 = span(e1 + e2, e3 + e4)
      subspace L4 = span(e1 + 2 e2, e3 + 3 e4)
      subspace M4 = rows [1 0 0 1; 0 1 2 0]
      show transversals(L1, L2, L3, L4)
      show transversals(L1, L2, L3, M4)
      claim transversals(L1, L2, L3, L4) = 2
    `);
    const given = (text: string) => text.split(';').map((r) => r.trim().split(/\s+/).map(Number));
    const L = [given('1 0 0 0; 0 0 1 0'), given('0 1 0 0; 0 0 0 1'), given('1 1 0 0; 0 0 1 1'), given('1 2 0 0; 0 0 1 3')];
    const [first, second] = shows(a);
    assert.equal(first!.json.kind, 'finite');
    assert.equal(first!.json.predictedCount, '2');
    const found = (first!.json.transversals as { basis: string[][] }[]).map((t) => t.basis.map((r) => r.map(Number)));
    assert.equal(found.length, 2);
    for (const line of found) for (const l of L) assert.ok(meet(line, l), `${JSON.stringify(line)} meets ${JSON.stringify(l)}`);
    assert.ok(!meet(found[0]!, found[1]!), 'the two transversals are distinct, skew lines');

    // The moved fourth line: the transversals are not rational; the quadratic and the real count say so.
    assert.equal(second!.json.rootsInField, false);
    assert.equal(second!.json.realCount, 2);
    assert.deepEqual(second!.json.transversals, []);
    // Independently, numerically: the pencil s·u + t·v with the stated form has two real zeros, and each
    // zero is a line (on the Klein quadric) meeting the four lines, up to rounding.
    const [u, v] = (second!.json.pencil as string[][]).map((x) => x.map((c) => Number(math.fraction(c))));
    const [ss, st, tt] = quadraticOf(second!.json.quadratic as string);
    const roots = [(-st + Math.sqrt(st * st - 4 * ss * tt)) / (2 * ss), (-st - Math.sqrt(st * st - 4 * ss * tt)) / (2 * ss)];
    const M4 = given('1 0 0 1; 0 1 2 0');
    for (const s of roots) {
      const p = u!.map((x, i) => s * x + v![i]!);
      const klein = p[0]! * p[5]! - p[1]! * p[4]! + p[2]! * p[3]!;
      assert.ok(Math.abs(klein) < 1e-9, `on the Klein quadric: ${klein}`);
      for (const l of [...L.slice(0, 3), M4]) {
        const q = [0, 1, 2, 3].flatMap((i) => [0, 1, 2, 3].filter((j) => j > i).map((j) => l[0]![i]! * l[1]![j]! - l[0]![j]! * l[1]![i]!));
        const pairing = p[0]! * q[5]! - p[1]! * q[4]! + p[2]! * q[3]! + p[3]! * q[2]! - p[4]! * q[1]! + p[5]! * q[0]!;
        assert.ok(Math.abs(pairing) < 1e-9, `meets the given line: pairing ${pairing}`);
      }
    }
  });
});

/** The coefficients of s², s·t and t² in a form written like `-s² + 2t²` or `3s·t - (1/2)t²`. */
function quadraticOf(text: string): [number, number, number] {
  const out: [number, number, number] = [0, 0, 0];
  for (const m of text.replace(/\s+/g, '').matchAll(/([+-]?)(\(?[\d/]*\)?)(s²|s·t|t²)/g)) {
    const magnitude = m[2] === '' ? 1 : Number(math.fraction(m[2]!.replace(/[()]/g, '')));
    const value = (m[1] === '-' ? -1 : 1) * magnitude;
    out[m[3] === 's²' ? 0 : m[3] === 's·t' ? 1 : 2] = value;
  }
  return out;
}
