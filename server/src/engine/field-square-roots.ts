/**
 * Square roots of field elements, where the engine can decide them: in the
 * rationals and in every finite field.
 *
 * Rationals: num/den in lowest terms is a square exactly when num ≥ 0 and num
 * and den are squares of integers. Finite fields of odd order q: a nonzero a is
 * a square exactly when a^((q−1)/2) = 1 (Euler's criterion), and the root is
 * found by the Tonelli–Shanks method (common practice, no source). Finite
 * fields of even order: squaring is a bijection, so every a has the single
 * root a^(q/2).
 */
import type { Field } from './field.js';
import { finiteFieldElement, finiteFieldOrder } from './finite-fields.js';
import { integerRoot } from './integer-factors.js';
import { QQ, type Rational } from './rational.js';

/** Raised for a field in which the engine cannot take square roots. */
export class UnsupportedSquareRootError extends RangeError {
  constructor(fieldName: string) {
    super(`Square roots are not available in the field ${fieldName}: only the rationals and finite fields are supported`);
    this.name = 'UnsupportedSquareRootError';
  }
}

/** a^e by repeated squaring, for an integer e ≥ 0. */
export function fieldPower<T>(F: Field<T>, a: T, e: bigint): T {
  let result = F.one;
  let base = a;
  let rest = e;
  while (rest > 0n) {
    if ((rest & 1n) === 1n) result = F.mul(result, base);
    base = F.mul(base, base);
    rest >>= 1n;
  }
  return result;
}

function rationalSquareRoot(a: Rational): Rational | undefined {
  if (a.num < 0n) return undefined;
  const top = integerRoot(a.num, 2);
  const bottom = integerRoot(a.den, 2);
  // Lowest terms make the root, if any, top/bottom in lowest terms too.
  return top * top === a.num && bottom * bottom === a.den ? { num: top, den: bottom } : undefined;
}

/** Tonelli–Shanks in a finite field of odd order q. */
function oddOrderSquareRoot<T>(F: Field<T>, a: T, q: bigint): T | undefined {
  if (F.isZero(a)) return F.zero;
  const half = (q - 1n) / 2n;
  if (!F.isOne(fieldPower(F, a, half))) return undefined;
  // q − 1 = odd · 2^twos.
  let odd = q - 1n;
  let twos = 0;
  while ((odd & 1n) === 0n) {
    odd >>= 1n;
    twos++;
  }
  // Half of the nonzero elements are non-squares; the first one is found after a few tries.
  let nonSquare = F.zero;
  for (let i = 2n; i < q; i++) {
    const z = finiteFieldElement(F, i);
    if (!F.isZero(z) && !F.isOne(fieldPower(F, z, half))) {
      nonSquare = z;
      break;
    }
  }
  let m = twos;
  let c = fieldPower(F, nonSquare, odd);
  let t = fieldPower(F, a, odd);
  let root = fieldPower(F, a, (odd + 1n) / 2n);
  // Invariant: root² = a·t, and t has order dividing 2^(m−1); each round lowers the order of t.
  while (!F.isOne(t)) {
    let i = 0;
    let power = t;
    while (!F.isOne(power)) {
      power = F.mul(power, power);
      i++;
    }
    let b = c;
    for (let j = 0; j < m - i - 1; j++) b = F.mul(b, b);
    m = i;
    c = F.mul(b, b);
    t = F.mul(t, c);
    root = F.mul(root, b);
  }
  return root;
}

/**
 * Whether the field can take square roots here: the rationals and the finite
 * fields (prime and extension fields).
 */
export function hasSquareRoots<T>(F: Field<T>): boolean {
  return (F as unknown) === QQ || finiteFieldOrder(F) !== undefined;
}

/**
 * A square root r of a (r·r = a) in the field, or undefined when a is not a
 * square there. Which of ±r comes back is not specified. Throws
 * `UnsupportedSquareRootError` for fields other than the rationals and the
 * finite fields.
 */
export function squareRootInField<T>(F: Field<T>, a: T): T | undefined {
  if ((F as unknown) === QQ) return rationalSquareRoot(a as unknown as Rational) as unknown as T | undefined;
  const q = finiteFieldOrder(F);
  if (q === undefined) throw new UnsupportedSquareRootError(F.name);
  if (q % 2n === 0n) return fieldPower(F, a, q / 2n);
  return oddOrderSquareRoot(F, a, q);
}
