/**
 * Exact rational numbers over bigint, and the field of rationals built on them.
 *
 * Every `Rational` is kept in lowest terms with a positive denominator, so two
 * rationals are equal exactly when their numerators and denominators are.
 */
import { DivisionByZeroError, type Field } from './field.js';

export interface Rational {
  readonly num: bigint;
  readonly den: bigint;
}

/** The greatest common divisor, always >= 0; gcd(0, 0) = 0. */
export function gcdBigInt(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) {
    const t = a % b;
    a = b;
    b = t;
  }
  return a;
}

/** The least common multiple, always >= 0; it is 0 when either argument is 0. */
export function lcmBigInt(a: bigint, b: bigint): bigint {
  if (a === 0n || b === 0n) return 0n;
  const l = (a / gcdBigInt(a, b)) * b;
  return l < 0n ? -l : l;
}

/** The rational num/den in lowest terms; throws `DivisionByZeroError` when den is 0. */
export function rational(num: bigint, den: bigint = 1n): Rational {
  if (den === 0n) throw new DivisionByZeroError(`division by zero: ${num}/0`);
  if (den < 0n) {
    num = -num;
    den = -den;
  }
  if (den === 1n) return { num, den };
  const g = gcdBigInt(num, den);
  // g is never 0 here because den is nonzero.
  return g === 1n ? { num, den } : { num: num / g, den: den / g };
}

/** True when the rational is an integer. */
export function isIntegral(r: Rational): boolean {
  return r.den === 1n;
}

/** -1, 0 or 1 as a is less than, equal to or greater than b. */
export function compareRational(a: Rational, b: Rational): -1 | 0 | 1 {
  // Denominators are positive, so cross-multiplying keeps the order.
  const left = a.num * b.den;
  const right = b.num * a.den;
  return left < right ? -1 : left > right ? 1 : 0;
}

// One unsigned number: digits with an optional fractional part, or a fraction part alone (".5").
const UNSIGNED_DECIMAL = /^(\d+)(?:\.(\d*))?$|^\.(\d+)$/;

function parseUnsignedDecimal(text: string): Rational | undefined {
  const match = UNSIGNED_DECIMAL.exec(text);
  if (match === null) return undefined;
  const whole = match[1] ?? '0';
  const fraction = match[2] ?? match[3] ?? '';
  // 12.345 is 12345 / 10^3; the fraction reduces it to lowest terms.
  return rational(BigInt(whole + fraction), 10n ** BigInt(fraction.length));
}

/**
 * Reads an exact rational from text: an integer (`3`, `-3`, `+3`), a decimal
 * (`0.125` is exactly 1/8, `-1.5`), or a quotient of two unsigned integers or
 * decimals (`3/4`, `-3/4`, `2/0.5`). The sign may only stand in front.
 * Spaces around the text and around `/` are ignored.
 *
 * Throws an `Error` naming the text when it is malformed, and
 * `DivisionByZeroError` when the denominator is zero.
 */
export function parseRational(text: string): Rational {
  const malformed = () =>
    new Error(
      `Malformed rational number "${text}": expected an integer (-3), a decimal (0.125) or a fraction (-3/4)`,
    );
  let rest = text.trim();
  let negative = false;
  if (rest.startsWith('-') || rest.startsWith('+')) {
    negative = rest.startsWith('-');
    rest = rest.slice(1).trimStart();
  }
  const parts = rest.split('/');
  if (parts.length > 2) throw malformed();
  const numerator = parseUnsignedDecimal(parts[0]!.trim());
  if (numerator === undefined) throw malformed();
  let value = numerator;
  if (parts.length === 2) {
    const denominator = parseUnsignedDecimal(parts[1]!.trim());
    if (denominator === undefined) throw malformed();
    if (denominator.num === 0n) throw new DivisionByZeroError(`division by zero in "${text}"`);
    value = rational(numerator.num * denominator.den, numerator.den * denominator.num);
  }
  return negative ? rational(-value.num, value.den) : value;
}

const ZERO: Rational = Object.freeze({ num: 0n, den: 1n });
const ONE: Rational = Object.freeze({ num: 1n, den: 1n });

function add(a: Rational, b: Rational): Rational {
  if (a.den === 1n && b.den === 1n) return { num: a.num + b.num, den: 1n };
  if (a.den === b.den) return rational(a.num + b.num, a.den);
  return rational(a.num * b.den + b.num * a.den, a.den * b.den);
}

function mul(a: Rational, b: Rational): Rational {
  if (a.num === 0n || b.num === 0n) return ZERO;
  if (a.den === 1n && b.den === 1n) return { num: a.num * b.num, den: 1n };
  // Cancelling crosswise first keeps the intermediate numbers small and the result reduced.
  const g1 = gcdBigInt(a.num, b.den);
  const g2 = gcdBigInt(b.num, a.den);
  return { num: (a.num / g1) * (b.num / g2), den: (a.den / g2) * (b.den / g1) };
}

function inv(a: Rational): Rational {
  if (a.num === 0n) throw new DivisionByZeroError('division by zero: the inverse of 0');
  return a.num < 0n ? { num: -a.den, den: -a.num } : { num: a.den, den: a.num };
}

function format(a: Rational): string {
  return a.den === 1n ? a.num.toString() : `${a.num}/${a.den}`;
}

function latex(a: Rational): string {
  if (a.den === 1n) return a.num.toString();
  const magnitude = a.num < 0n ? -a.num : a.num;
  return `${a.num < 0n ? '-' : ''}\\frac{${magnitude}}{${a.den}}`;
}

/** The field of rational numbers. */
export const QQ: Field<Rational> = Object.freeze({
  name: 'QQ',
  characteristic: 0n,
  zero: ZERO,
  one: ONE,
  add,
  sub: (a: Rational, b: Rational) => add(a, { num: -b.num, den: b.den }),
  mul,
  neg: (a: Rational): Rational => (a.num === 0n ? ZERO : { num: -a.num, den: a.den }),
  inv,
  div: (a: Rational, b: Rational) => {
    if (b.num === 0n) throw new DivisionByZeroError(`division by zero: ${format(a)}/0`);
    return mul(a, inv(b));
  },
  eq: (a: Rational, b: Rational) => a.num === b.num && a.den === b.den,
  isZero: (a: Rational) => a.num === 0n,
  isOne: (a: Rational) => a.num === 1n && a.den === 1n,
  fromBigInt: (n: bigint): Rational => ({ num: n, den: 1n }),
  fromRational: (num: bigint, den: bigint) => rational(num, den),
  format,
  latex,
  sign: (a: Rational): -1 | 0 | 1 => (a.num < 0n ? -1 : a.num > 0n ? 1 : 0),
});
