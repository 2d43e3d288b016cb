import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import { fieldByName } from '../../server/src/engine/fields.js';
import { extensionField, FieldOrderLimitError } from '../../server/src/engine/extension-field.js';
import { NotPrimePowerError } from '../../server/src/engine/finite-fields.js';
import { NotPrimeError } from '../../server/src/engine/prime-field.js';
import { QQ } from '../../server/src/engine/rational.js';

describe('fieldByName', () => {
  test('QQ is the rationals', () => {
    assert.equal(fieldByName('QQ'), QQ);
  });

  test('GF with a prime modulus is that prime field, in either spelling', () => {
    assert.equal(fieldByName('GF', 7n).name, 'GF(7)');
    assert.equal(fieldByName('GF(7)').characteristic, 7n);
    assert.equal(fieldByName('GF', 7n), fieldByName('GF(7)'));
  });

  test('GF with a prime power is the extension field, in either spelling', () => {
    assert.equal(fieldByName('GF', 9n), extensionField(3n, 2));
    assert.equal(fieldByName('GF(9)'), extensionField(3n, 2));
    assert.equal(fieldByName(' GF ( 8 ) ').name, 'GF(8)');
    assert.equal(fieldByName('GF(4)', 4n).characteristic, 2n);
  });

  test('clear errors for unknown names, a missing modulus, non-prime-powers and orders above 2^20', () => {
    assert.throws(() => fieldByName('RR'), /Unknown field "RR"/);
    assert.throws(() => fieldByName('GF'), /needs its number of elements, a prime power/);
    assert.throws(() => fieldByName('QQ', 5n), /takes no modulus/);
    assert.throws(() => fieldByName('GF(9)', 27n), /second, different modulus/);
    // Composite orders that are no prime power still raise a NotPrimeError, now the more precise NotPrimePowerError.
    assert.throws(() => fieldByName('GF', 6n), (e: unknown) => e instanceof NotPrimeError && e instanceof NotPrimePowerError);
    assert.throws(() => fieldByName('GF(12)'), /GF\(12\): 12 is not a prime power/);
    assert.throws(() => fieldByName('GF', 2n ** 21n), FieldOrderLimitError);
  });
});
