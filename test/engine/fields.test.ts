import { test, describe } from 'node:test';
import assert from 'node:assert/strict';
import { fieldByName } from '../../server/src/engine/fields.js';
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

  test('clear errors for unknown names, a missing modulus and composite moduli', () => {
    assert.throws(() => fieldByName('RR'), /Unknown field "RR"/);
    assert.throws(() => fieldByName('GF'), /needs a prime modulus/);
    assert.throws(() => fieldByName('QQ', 5n), /takes no modulus/);
    assert.throws(() => fieldByName('GF', 9n), NotPrimeError);
  });
});
