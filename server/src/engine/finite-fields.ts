/**
 * Finite fields of any supported order, and the facts about them that
 * enumerations need: how many elements there are and the list of them.
 *
 * Two kinds of finite field exist in the engine: the prime fields GF(p) of
 * prime-field.ts and the extension fields GF(p^m), m ≥ 2, of
 * extension-field.ts. The helpers here tell them apart by the `order` that only
 * extension fields carry; a field with a positive characteristic p and no
 * `order` is the prime field GF(p), and a field with an `order` numbers its
 * elements 0, 1, …, q − 1 itself.
 */
import type { Field } from './field.js';
import { extensionField, FieldOrderLimitError, type FiniteField } from './extension-field.js';
import { primePowerDecomposition } from './integer-factors.js';
import { NotPrimeError, primeField } from './prime-field.js';

/**
 * Raised when GF(q) is asked for with q not a prime power. It is a kind of
 * `NotPrimeError`, so code that rejects bad moduli keeps working.
 */
export class NotPrimePowerError extends NotPrimeError {
  constructor(order: bigint) {
    super(order);
    this.message =
      order < 2n
        ? `GF(${order}): the number of elements must be a prime power, and ${order} is less than 2`
        : `GF(${order}): ${order} is not a prime power`;
    this.name = 'NotPrimePowerError';
  }
}

/**
 * The largest bit length of a field order: GF(q) needs q < 2^512.
 *
 * Recognising q as a prime power costs one integer root per possible exponent
 * and then Miller–Rabin rounds whose cost grows with the cube of the bit
 * length: about 0.2 s at 512 bits, over a second at 1024, over a minute for a
 * 10^4-digit q and hours for a 10^5-digit one, all before a single element
 * exists (found by fuzzing a file with `field GF(…)` of a long number). Orders
 * past the bound are refused at once; primes of 150 digits stay usable.
 */
export const FIELD_ORDER_BIT_LIMIT = 512;

/**
 * Raised by `finiteField` for an order of more than `FIELD_ORDER_BIT_LIMIT`
 * bits. It is a kind of `FieldOrderLimitError`, so callers that report that
 * limit report this one too, with this message.
 */
export class FieldOrderSizeError extends FieldOrderLimitError {
  constructor(order: bigint) {
    const digits = order.toString().length;
    super(digits <= 40 ? String(order) : `a number of ${digits} digits`);
    this.message =
      `GF(q) needs q < 2^${FIELD_ORDER_BIT_LIMIT}: this order has ${order.toString(2).length} bits (${digits} digits), ` +
      'and deciding whether so large a number is a prime power would take too long';
    this.name = 'FieldOrderSizeError';
  }
}

/**
 * The field with q elements: the prime field when q is prime, the extension
 * field of `extensionField` (generator named `a`) when q = p^m with m ≥ 2.
 * Throws `NotPrimePowerError` when q is not a prime power,
 * `FieldOrderLimitError` for a proper prime power above 2^20, and
 * `FieldOrderSizeError` (a kind of `FieldOrderLimitError`) for any q of more
 * than `FIELD_ORDER_BIT_LIMIT` bits.
 */
export function finiteField(q: bigint, options?: { generator?: string }): Field<any> {
  // The size is checked first: the prime-power test below is what takes too long on huge orders.
  if (q >= 2n ** BigInt(FIELD_ORDER_BIT_LIMIT)) throw new FieldOrderSizeError(q);
  const decomposition = primePowerDecomposition(q);
  if (decomposition === undefined) throw new NotPrimePowerError(q);
  const { prime, exponent } = decomposition;
  if (exponent === 1) return primeField(prime);
  return extensionField(prime, exponent, options);
}

function hasOrder<T>(F: Field<T>): F is Field<T> & Pick<FiniteField, 'order'> {
  return typeof (F as { order?: unknown }).order === 'bigint';
}

/** The number of elements of a finite field, or undefined for an infinite one (the rationals). */
export function finiteFieldOrder<T>(F: Field<T>): bigint | undefined {
  if (hasOrder(F)) return F.order;
  // A field of rational functions GF(p)(t) has characteristic p but infinitely many elements.
  if ((F as { variables?: unknown }).variables !== undefined) return undefined;
  return F.characteristic > 0n ? F.characteristic : undefined;
}

function requireOrder<T>(F: Field<T>, what: string): bigint {
  const q = finiteFieldOrder(F);
  if (q === undefined) throw new RangeError(`${what}: needs a finite field, but ${F.name} is infinite`);
  return q;
}

/**
 * The element with the given index in [0, q): for GF(p) the residue `index`,
 * for GF(p^m) the element whose base-p digits are its coefficients (see
 * extension-field.ts). Indices ascend in the order `finiteFieldElements` lists.
 */
export function finiteFieldElement<T>(F: Field<T>, index: bigint): T {
  const q = requireOrder(F, 'finiteFieldElement');
  if (index < 0n || index >= q) throw new RangeError(`finiteFieldElement: index ${index} is outside [0, ${q}) for ${F.name}`);
  // Extension-field elements are their own indices; prime-field elements are the images of the integers.
  return hasOrder(F) ? (Number(index) as T) : F.fromBigInt(index);
}

/** Every element of a finite field once, lazily, by ascending index (0 and 1 first). */
export function* finiteFieldElements<T>(F: Field<T>): Generator<T> {
  const q = requireOrder(F, 'finiteFieldElements');
  for (let i = 0n; i < q; i++) yield finiteFieldElement(F, i);
}
