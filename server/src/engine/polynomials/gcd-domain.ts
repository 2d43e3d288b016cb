/**
 * Greatest common divisors in polynomial rings over the integers or over a
 * field, by the classical recursive method: a polynomial in several variables
 * is a polynomial in its main variable whose coefficients are polynomials in
 * the others, and R[x] inherits a gcd from R through contents and primitive
 * parts (Gauss's lemma).
 *
 * A `GcdDomain` is such a ring R with a gcd and a choice of normal
 * representative per class of associates: positive integers in Z, 1 for the
 * nonzero elements of a field, and in R[x] the polynomials whose leading
 * coefficient is normal in R. gcds are always returned normal, so they are
 * unique.
 *
 * In R[x] the gcd runs the primitive pseudo-remainder sequence: pseudo-divide,
 * take the primitive part of the remainder, repeat. Removing the content at
 * every step keeps the coefficients from growing exponentially, which is what
 * plain pseudo-remainders do (common practice, no source; the method is the
 * one of Knuth, TAOCP vol. 2, §4.6.1, from memory). Over a field the
 * primitive part is the monic associate, so the sequence is Euclid's
 * algorithm with monic remainders.
 */
import type { Field } from '../field.js';
import { gcdBigInt } from '../rational.js';

export interface GcdDomain<C> {
  readonly zero: C;
  readonly one: C;
  isZero(a: C): boolean;
  isOne(a: C): boolean;
  eq(a: C, b: C): boolean;
  add(a: C, b: C): C;
  sub(a: C, b: C): C;
  mul(a: C, b: C): C;
  neg(a: C): C;
  /** a / b when b ≠ 0 divides a, otherwise undefined. */
  divide(a: C, b: C): C | undefined;
  /** The normal gcd; gcd(0, 0) = 0. */
  gcd(a: C, b: C): C;
  /** A unit u with a/u normal (1 for zero). */
  unitPart(a: C): C;
  /** a / u for a unit u. */
  divideByUnit(a: C, u: C): C;
}

/** The integers, with the nonnegative ones normal. */
export const INTEGERS: GcdDomain<bigint> = Object.freeze({
  zero: 0n,
  one: 1n,
  isZero: (a: bigint) => a === 0n,
  isOne: (a: bigint) => a === 1n,
  eq: (a: bigint, b: bigint) => a === b,
  add: (a: bigint, b: bigint) => a + b,
  sub: (a: bigint, b: bigint) => a - b,
  mul: (a: bigint, b: bigint) => a * b,
  neg: (a: bigint) => -a,
  divide: (a: bigint, b: bigint) => (b !== 0n && a % b === 0n ? a / b : undefined),
  gcd: gcdBigInt,
  unitPart: (a: bigint) => (a < 0n ? -1n : 1n),
  divideByUnit: (a: bigint, u: bigint) => (u === 1n ? a : -a),
});

/** A field as a gcd domain: every nonzero element is a unit, and 1 is its normal form. */
export function fieldDomain<T>(F: Field<T>): GcdDomain<T> {
  return {
    zero: F.zero,
    one: F.one,
    isZero: (a) => F.isZero(a),
    isOne: (a) => F.isOne(a),
    eq: (a, b) => F.eq(a, b),
    add: (a, b) => F.add(a, b),
    sub: (a, b) => F.sub(a, b),
    mul: (a, b) => F.mul(a, b),
    neg: (a) => F.neg(a),
    divide: (a, b) => (F.isZero(b) ? undefined : F.div(a, b)),
    gcd: (a, b) => (F.isZero(a) && F.isZero(b) ? F.zero : F.one),
    unitPart: (a) => (F.isZero(a) ? F.one : a),
    divideByUnit: (a, u) => F.div(a, u),
  };
}

/** Dense coefficients, constant term first, with no trailing zero; the zero polynomial is []. */
export type Dense<C> = C[];

function trim<C>(D: GcdDomain<C>, a: C[]): C[] {
  let end = a.length;
  while (end > 0 && D.isZero(a[end - 1]!)) end--;
  a.length = end;
  return a;
}

function degree<C>(a: Dense<C>): number {
  return a.length - 1;
}

/**
 * The pseudo-remainder lc(b)^(deg a − deg b + 1)·a mod b, computed without
 * division: each step multiplies the running remainder by lc(b) and
 * subtracts a multiple of b that cancels its top coefficient.
 */
export function pseudoRemainder<C>(D: GcdDomain<C>, a: Dense<C>, b: Dense<C>): Dense<C> {
  const db = degree(b);
  let r = a.slice();
  let steps = degree(a) - db + 1;
  if (steps <= 0) return r;
  const lead = b[db]!;
  while (r.length - 1 >= db && r.length > 0) {
    const top = r[r.length - 1]!;
    const shift = r.length - 1 - db;
    const next = r.map((c) => D.mul(c, lead));
    for (let j = 0; j <= db; j++) next[shift + j] = D.sub(next[shift + j]!, D.mul(top, b[j]!));
    r = trim(D, next);
    steps--;
  }
  // Scaling by the remaining power of lc(b) makes the result the pseudo-remainder of the definition.
  for (; steps > 0; steps--) r = r.map((c) => D.mul(c, lead));
  return r;
}

/** The polynomials in one variable over D, themselves a gcd domain. */
export function polynomialsOver<C>(D: GcdDomain<C>): GcdDomain<Dense<C>> {
  const one: Dense<C> = [D.one];
  const content = (a: Dense<C>): C => {
    let g = D.zero;
    for (const c of a) {
      g = D.gcd(g, c);
      if (D.isOne(g)) break;
    }
    return g;
  };
  const divideByConstant = (a: Dense<C>, c: C): Dense<C> | undefined => {
    if (D.isOne(c)) return a;
    const out: C[] = [];
    for (const x of a) {
      const q = D.divide(x, c);
      if (q === undefined) return undefined;
      out.push(q);
    }
    return out;
  };
  const normalize = (a: Dense<C>): Dense<C> => {
    if (a.length === 0) return a;
    const u = D.unitPart(a[a.length - 1]!);
    return D.isOne(u) ? a : a.map((c) => D.divideByUnit(c, u));
  };
  /** The normal primitive part (content removed, leading coefficient normal). */
  const primitive = (a: Dense<C>): Dense<C> => normalize(divideByConstant(a, content(a))!);
  const add = (a: Dense<C>, b: Dense<C>): Dense<C> => {
    const out = new Array<C>(Math.max(a.length, b.length));
    for (let i = 0; i < out.length; i++) {
      out[i] = i >= a.length ? b[i]! : i >= b.length ? a[i]! : D.add(a[i]!, b[i]!);
    }
    return trim(D, out);
  };
  const neg = (a: Dense<C>): Dense<C> => a.map((c) => D.neg(c));
  const mul = (a: Dense<C>, b: Dense<C>): Dense<C> => {
    if (a.length === 0 || b.length === 0) return [];
    const out = new Array<C>(a.length + b.length - 1).fill(D.zero);
    for (let i = 0; i < a.length; i++) {
      if (D.isZero(a[i]!)) continue;
      for (let j = 0; j < b.length; j++) {
        if (!D.isZero(b[j]!)) out[i + j] = D.add(out[i + j]!, D.mul(a[i]!, b[j]!));
      }
    }
    return trim(D, out);
  };
  const divide = (a: Dense<C>, b: Dense<C>): Dense<C> | undefined => {
    if (b.length === 0) return undefined;
    if (a.length === 0) return [];
    const db = degree(b);
    if (degree(a) < db) return undefined;
    if (db === 0) return divideByConstant(a, b[0]!);
    const r = a.slice();
    const q = new Array<C>(degree(a) - db + 1).fill(D.zero);
    const lead = b[db]!;
    for (let d = degree(a); d >= db; d--) {
      if (D.isZero(r[d]!)) continue;
      const c = D.divide(r[d]!, lead);
      if (c === undefined) return undefined;
      q[d - db] = c;
      for (let j = 0; j <= db; j++) r[d - db + j] = D.sub(r[d - db + j]!, D.mul(c, b[j]!));
    }
    return r.every((c) => D.isZero(c)) ? trim(D, q) : undefined;
  };
  const gcd = (a: Dense<C>, b: Dense<C>): Dense<C> => {
    if (a.length === 0) return normalize(b);
    if (b.length === 0) return normalize(a);
    const c = D.gcd(content(a), content(b));
    if (a.length === 1 || b.length === 1) return [c];
    let u = primitive(a);
    let v = primitive(b);
    if (degree(u) < degree(v)) [u, v] = [v, u];
    for (;;) {
      const r = pseudoRemainder(D, u, v);
      if (r.length === 0) break;
      if (r.length === 1) return [c];
      u = v;
      v = primitive(r);
    }
    return normalize(v.map((x) => D.mul(c, x)));
  };
  return {
    zero: [],
    one,
    isZero: (a) => a.length === 0,
    isOne: (a) => a.length === 1 && D.isOne(a[0]!),
    eq: (a, b) => a.length === b.length && a.every((x, i) => D.eq(x, b[i]!)),
    add,
    sub: (a, b) => add(a, neg(b)),
    mul,
    neg,
    divide,
    gcd,
    unitPart: (a) => [a.length === 0 ? D.one : D.unitPart(a[a.length - 1]!)],
    divideByUnit: (a, u) => (D.isOne(u[0]!) ? a : a.map((c) => D.divideByUnit(c, u[0]!))),
  };
}
