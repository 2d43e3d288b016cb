import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { primeField } from '../../../server/src/engine/prime-field.js';
import { polynomialRing } from '../../../server/src/engine/polynomials/multivariate-polynomial.js';
import { variableLatex } from '../../../server/src/engine/polynomials/variable-latex.js';
import { QQ, rational } from '../../../server/src/engine/rational.js';
import { QQ_ST, QQ_STU, QQ_T, nonzeroPolynomial, primeFieldElement, randomPolynomial, smallRational } from './polynomial-arbitraries.js';

const point = fc.array(smallRational, { minLength: 3, maxLength: 3 });

describe('sparse polynomials: evaluation is a ring homomorphism (common practice, no source)', () => {
  const poly = randomPolynomial(QQ_STU, smallRational);
  test('sums, differences and products evaluate to sums, differences and products', () => {
    fc.assert(
      fc.property(poly, poly, point, (a, b, x) => {
        const R = QQ_STU;
        const ea = R.evaluate(a, x);
        const eb = R.evaluate(b, x);
        assert.ok(QQ.eq(R.evaluate(R.add(a, b), x), QQ.add(ea, eb)));
        assert.ok(QQ.eq(R.evaluate(R.sub(a, b), x), QQ.sub(ea, eb)));
        assert.ok(QQ.eq(R.evaluate(R.mul(a, b), x), QQ.mul(ea, eb)));
        assert.ok(QQ.eq(R.evaluate(R.pow(a, 3), x), QQ.mul(ea, QQ.mul(ea, ea))));
      }),
      { numRuns: 150 },
    );
  });

  test('a − a = 0 and the canonical form makes equal polynomials identical term lists', () => {
    fc.assert(
      fc.property(poly, poly, (a, b) => {
        const R = QQ_STU;
        assert.ok(R.isZero(R.sub(a, a)));
        assert.ok(R.eq(R.add(a, b), R.add(b, a)));
        assert.ok(R.eq(R.mul(a, b), R.mul(b, a)));
      }),
    );
  });

  test('substituting some variables and then the rest gives the value at the whole point', () => {
    fc.assert(
      fc.property(poly, point, (a, [s, t, u]) => {
        const R = QQ_STU;
        const member = R.substitute(a, { s: s!, u: u! });
        assert.equal(R.degreeIn(member, 's') <= 0 && R.degreeIn(member, 'u') <= 0, true);
        assert.ok(QQ.eq(R.evaluate(member, { t: t! }), R.evaluate(a, [s!, t!, u!])));
      }),
    );
  });

  test('composing with polynomials agrees with evaluating at their values', () => {
    fc.assert(
      fc.property(poly, poly, point, (a, image, x) => {
        const R = QQ_STU;
        const composed = R.compose(a, { t: image });
        const inner = R.evaluate(image, x);
        assert.ok(QQ.eq(R.evaluate(composed, x), R.evaluate(a, [x[0]!, inner, x[2]!])));
      }),
      { numRuns: 60 },
    );
  });
});

describe('exact division and derivatives', () => {
  test('(a·b)/b = a, and a·b + 1 is not divisible by a non-constant b (common practice, no source)', () => {
    fc.assert(
      fc.property(randomPolynomial(QQ_ST, smallRational), nonzeroPolynomial(QQ_ST, smallRational), (a, b) => {
        const R = QQ_ST;
        assert.ok(R.eq(R.divideExact(R.mul(a, b), b), a));
        if (!R.isConstant(b)) assert.equal(R.tryDivide(R.add(R.mul(a, b), R.one), b), undefined);
      }),
    );
  });

  test('the product rule (a·b)′ = a′·b + a·b′ (Leibniz, textbook calculus)', () => {
    fc.assert(
      fc.property(randomPolynomial(QQ_ST, smallRational), randomPolynomial(QQ_ST, smallRational), (a, b) => {
        const R = QQ_ST;
        const left = R.derivative(R.mul(a, b), 's');
        const right = R.add(R.mul(R.derivative(a, 's'), b), R.mul(a, R.derivative(b, 's')));
        assert.ok(R.eq(left, right));
      }),
    );
  });

  test('over GF(3) the derivative of t^3 is 0 (3 = 0 in characteristic 3, common practice)', () => {
    const R = polynomialRing(primeField(3n), ['t']);
    assert.ok(R.isZero(R.derivative(R.pow(R.variable('t'), 3), 't')));
  });

  test('over GF(7) products evaluate correctly too', () => {
    const F = primeField(7n);
    const R = polynomialRing(F, ['s', 't']);
    fc.assert(
      fc.property(
        randomPolynomial(R, primeFieldElement(F)),
        randomPolynomial(R, primeFieldElement(F)),
        fc.array(primeFieldElement(F), { minLength: 2, maxLength: 2 }),
        (a, b, x) => {
          assert.equal(R.evaluate(R.mul(a, b), x), F.mul(R.evaluate(a, x), R.evaluate(b, x)));
        },
      ),
    );
  });
});

describe('degrees, leading terms and the monomial order', () => {
  test('grevlex with s > t lists s^2, s t, t^2, s, t, 1 (the definition of the order)', () => {
    const R = QQ_ST;
    const s = R.variable('s');
    const t = R.variable('t');
    const sum = [R.one, t, s, R.mul(t, t), R.mul(s, t), R.mul(s, s)].reduce((a, b) => R.add(a, b));
    assert.deepEqual(
      sum.terms.map((x) => x.exponents),
      [[2, 0], [1, 1], [0, 2], [1, 0], [0, 1], [0, 0]],
    );
    assert.equal(R.totalDegree(sum), 2);
    assert.equal(R.degreeIn(sum, 't'), 2);
    assert.equal(R.totalDegree(R.zero), -1);
  });
});

describe('text and LaTeX', () => {
  test('the forms the project asked for: t^2 - 3t + 2', () => {
    const R = QQ_T;
    const t = R.variable('t');
    const f = R.add(R.sub(R.mul(t, t), R.scale(t, rational(3n))), R.constant(rational(2n)));
    assert.equal(R.format(f), 't^2 - 3t + 2');
    assert.equal(R.latex(f), 't^{2} - 3t + 2');
    assert.equal(R.format(R.zero), '0');
    assert.equal(R.format(R.scale(t, rational(-1n, 2n))), '-1/2 t');
    assert.equal(R.latex(R.scale(t, rational(-1n, 2n))), '-\\frac{1}{2} t');
  });

  test('several variables are separated by spaces; over GF(5) coefficients are representatives', () => {
    const R = polynomialRing(primeField(5n), ['s', 't']);
    const s = R.variable('s');
    const t = R.variable('t');
    assert.equal(R.format(R.sub(R.mul(R.mul(s, s), t), R.scale(s, 1))), 's^2 t + 4s');
  });

  test('LaTeX names of variables: subscripts, Greek letters, long names', () => {
    assert.equal(variableLatex('t'), 't');
    assert.equal(variableLatex('t1'), 't_{1}');
    assert.equal(variableLatex('x_12'), 'x_{12}');
    assert.equal(variableLatex('alpha'), '\\alpha');
    assert.equal(variableLatex('λ'), '\\lambda');
    assert.equal(variableLatex('speed'), '\\mathit{speed}');
  });

  test('names must be identifiers and distinct', () => {
    assert.throws(() => polynomialRing(QQ, ['t', 't']));
    assert.throws(() => polynomialRing(QQ, ['1t']));
  });
});
