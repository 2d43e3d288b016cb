/**
 * Counting the real roots of a polynomial over the rationals exactly, with
 * Sturm sequences (Sturm's theorem; e.g. Basu, Pollack and Roy, Algorithms
 * in Real Algebraic Geometry, §2.2, from memory): for a square-free f, the
 * sequence f_0 = f, f_1 = f', f_(i+1) = −(f_(i−1) mod f_i) has the property
 * that the number of roots in an interval (a, b] whose ends are not roots is
 * the number of sign changes of the sequence at a minus that at b.
 *
 * The sequence is computed on integer polynomials: a pseudo-remainder is a
 * positive multiple of the remainder once the sign of lc^(δ+1) is put right,
 * and dividing by the (positive) content changes no sign, so the sign
 * changes are those of the sequence over Q.
 */
import { type Rational } from '../rational.js';
import { pseudoRemainder, INTEGERS } from './gcd-domain.js';
import {
  integerDerivative,
  integerDivide,
  integerGcd,
  integerPrimitive,
  integerSignAt,
  type IntegerPolynomial,
} from './integer-polynomial.js';
import { primitiveOfRational } from './rational-univariate-factor.js';

/** The Sturm sequence of an integer polynomial of positive degree (each entry primitive). */
export function sturmSequence(f: IntegerPolynomial): IntegerPolynomial[] {
  const sequence: IntegerPolynomial[] = [integerPrimitive(f)];
  let previous = sequence[0]!;
  let current = integerPrimitive(integerDerivative(f));
  while (current.length > 0) {
    sequence.push(current);
    const delta = previous.length - current.length;
    const lead = current[current.length - 1]!;
    // prem = lc^(δ+1)·rem; the remainder's sign is prem's times the sign of lc^(δ+1).
    const flip = lead < 0n && delta % 2 === 0 ? 1n : -1n;
    const remainder = pseudoRemainder(INTEGERS, previous, current).map((c) => c * flip);
    previous = current;
    current = remainder.length === 0 ? [] : absoluteContentFree(remainder);
  }
  return sequence;
}

/** The polynomial divided by the positive gcd of its coefficients (the sign is kept). */
function absoluteContentFree(a: IntegerPolynomial): IntegerPolynomial {
  const p = integerPrimitive(a);
  // integerPrimitive makes the leading coefficient positive; undo that if it flipped the sign.
  return (a[a.length - 1]! < 0n) === (p[p.length - 1]! < 0n) ? p : p.map((c) => -c);
}

function signChanges(signs: readonly number[]): number {
  let changes = 0;
  let last = 0;
  for (const s of signs) {
    if (s === 0) continue;
    if (last !== 0 && s !== last) changes++;
    last = s;
  }
  return changes;
}

function signAtInfinity(f: IntegerPolynomial, positive: boolean): number {
  const lead = f[f.length - 1]! < 0n ? -1 : 1;
  return positive || (f.length - 1) % 2 === 0 ? lead : -lead;
}

/** The square-free part f / gcd(f, f′) of a primitive polynomial of positive degree. */
function squareFreePart(f: IntegerPolynomial): IntegerPolynomial {
  const g = integerGcd(f, integerDerivative(f));
  return integerPrimitive(g.length <= 1 ? f : integerDivide(f, g)!);
}

/** The primitive integer polynomial with the roots of the nonzero polynomial given by rational coefficients. */
function integerVersion(coefficients: readonly Rational[]): IntegerPolynomial {
  const f = coefficients.slice();
  while (f.length > 0 && f[f.length - 1]!.num === 0n) f.pop();
  if (f.length === 0) throw new RangeError('the zero polynomial vanishes everywhere: its real roots cannot be counted');
  return primitiveOfRational(f).primitive;
}

/** The number of distinct real roots of a nonzero polynomial (coefficients constant term first). */
export function countRealRoots(coefficients: readonly Rational[]): number {
  const f = integerVersion(coefficients);
  if (f.length <= 1) return 0;
  const sequence = sturmSequence(squareFreePart(f));
  return signChanges(sequence.map((p) => signAtInfinity(p, false))) - signChanges(sequence.map((p) => signAtInfinity(p, true)));
}

/**
 * The number of distinct real roots in the closed interval [lower, upper]
 * (empty when lower > upper). A root at an end is divided out first, so the
 * sequence is only ever evaluated where the polynomial does not vanish.
 */
export function countRealRootsBetween(coefficients: readonly Rational[], lower: Rational, upper: Rational): number {
  const f = integerVersion(coefficients);
  if (f.length <= 1 || lower.num * upper.den > upper.num * lower.den) return 0;
  let s = squareFreePart(f);
  let atEnds = 0;
  const same = lower.num === upper.num && lower.den === upper.den;
  for (const end of same ? [lower] : [lower, upper]) {
    if (integerSignAt(s, end.num, end.den) === 0) {
      atEnds++;
      // The root end = n/d is simple in the square-free part, so d·x − n divides it once.
      s = integerDivide(s, [-end.num, end.den])!;
    }
  }
  if (same || s.length <= 1) return atEnds;
  const sequence = sturmSequence(s);
  const at = (x: Rational) => signChanges(sequence.map((p) => integerSignAt(p, x.num, x.den)));
  return atEnds + at(lower) - at(upper);
}

/**
 * The number of real roots counted with multiplicity: the sum, over the parts
 * of the square-free decomposition, of multiplicity times distinct roots.
 */
export function countRealRootsWithMultiplicity(coefficients: readonly Rational[]): number {
  const f = integerVersion(coefficients);
  if (f.length <= 1) return 0;
  // Roots of f of multiplicity ≥ m are the roots of gcd(f, f′, …, f^(m−1)); summing the distinct roots of the successive gcds counts each root once per unit of multiplicity.
  let count = 0;
  let current = f;
  while (current.length > 1) {
    count += countRealRoots(current.map((c) => ({ num: c, den: 1n })));
    const g = integerGcd(current, integerDerivative(current));
    current = g.length <= 1 ? [] : integerPrimitive(g);
  }
  return count;
}
