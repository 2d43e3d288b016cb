/**
 * Choosing a field by the name a user wrote.
 */
import type { Field } from './field.js';
import { primeField } from './prime-field.js';
import { QQ } from './rational.js';

/** A field whose element type is not known statically. */
export type AnyField = Field<any>;

const PRIME_FIELD_NAME = /^GF\s*\(\s*(\d+)\s*\)$/;

/**
 * `QQ` gives the rationals; `GF` with a modulus gives the prime field (the
 * spelled-out form `GF(7)` is accepted too). Throws an `Error` for an unknown
 * name or a missing modulus, and `NotPrimeError` for a modulus that is not prime.
 */
export function fieldByName(name: string, modulus?: bigint): AnyField {
  const trimmed = name.trim();
  if (trimmed === 'QQ') {
    if (modulus !== undefined) throw new Error(`The field QQ takes no modulus, but ${modulus} was given`);
    return QQ;
  }
  if (trimmed === 'GF') {
    if (modulus === undefined) throw new Error('The field GF needs a prime modulus, as in GF(7)');
    return primeField(modulus);
  }
  const spelled = PRIME_FIELD_NAME.exec(trimmed);
  if (spelled !== null) {
    const p = BigInt(spelled[1]!);
    if (modulus !== undefined && modulus !== p) {
      throw new Error(`The field ${trimmed} was given a second, different modulus ${modulus}`);
    }
    return primeField(p);
  }
  throw new Error(`Unknown field "${name}": expected QQ or GF with a prime modulus`);
}
