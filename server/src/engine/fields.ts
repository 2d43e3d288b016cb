/**
 * Choosing a field by the name a user wrote.
 */
import type { Field } from './field.js';
import { finiteField } from './finite-fields.js';
import { QQ } from './rational.js';

/** A field whose element type is not known statically. */
export type AnyField = Field<any>;

const FINITE_FIELD_NAME = /^GF\s*\(\s*(\d+)\s*\)$/;

/**
 * `QQ` gives the rationals; `GF` with an order q gives the finite field with q
 * elements (see `finiteField`: a prime field for prime q, an extension field
 * for a prime power q ≤ 2^20); the spelled-out form `GF(9)` is accepted too.
 * Throws an `Error` for an unknown name or a missing order,
 * `NotPrimePowerError` (a kind of `NotPrimeError`) for an order that is not a
 * prime power, and `FieldOrderLimitError` for a prime power above 2^20.
 */
export function fieldByName(name: string, modulus?: bigint): AnyField {
  const trimmed = name.trim();
  if (trimmed === 'QQ') {
    if (modulus !== undefined) throw new Error(`The field QQ takes no modulus, but ${modulus} was given`);
    return QQ;
  }
  if (trimmed === 'GF') {
    if (modulus === undefined) throw new Error('The field GF needs its number of elements, a prime power, as in GF(7) or GF(9)');
    return finiteField(modulus);
  }
  const spelled = FINITE_FIELD_NAME.exec(trimmed);
  if (spelled !== null) {
    const q = BigInt(spelled[1]!);
    if (modulus !== undefined && modulus !== q) {
      throw new Error(`The field ${trimmed} was given a second, different modulus ${modulus}`);
    }
    return finiteField(q);
  }
  throw new Error(`Unknown field "${name}": expected QQ or GF(q) with q a prime power`);
}
