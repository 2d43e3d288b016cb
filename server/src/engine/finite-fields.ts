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
import { extensionField, type FiniteField } from './extension-field.js';
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
 * The field with q elements: the prime field when q is prime, the extension
 * field of `extensionField` (generator named `a`) when q = p^m with m ≥ 2.
 * Throws `NotPrimePowerError` when q is not a prime power and
 * `FieldOrderLimitError` for a proper prime power above 2^20. Prime fields have
 * no such limit.
 */
export function finiteField(q: bigint, options?: { generator?: string }): Field<any> {
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
