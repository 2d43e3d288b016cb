/**
 * The mapping from names and code of a `.wedge` file to LaTeX macro names (docs/latex-macros.md).
 *
 * Facts used: a TeX control word is an escape character followed by letters only, where "letters"
 * are A–Z and a–z under plain TeX's and LaTeX's category codes (Knuth, The TeXbook, chapter 3 and
 * chapter 7, from memory); the English names of the digits (common practice, no source).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import { codeMacroPart, MACRO_PREFIX, spellName, wordsOf } from '../../server/src/language/index.js';

describe('spelling a name in letters', () => {
  test('letters keep their case; digits become capitalised English words', () => {
    assert.equal(spellName('W'), 'W');
    assert.equal(spellName('w'), 'w');
    assert.equal(spellName('sightA'), 'sightA');
    const digits = ['Zero', 'One', 'Two', 'Three', 'Four', 'Five', 'Six', 'Seven', 'Eight', 'Nine'];
    digits.forEach((word, d) => assert.equal(spellName(`L${d}`), `L${word}`));
    assert.equal(spellName('e10'), 'eOneZero');
  });

  test("a separator is dropped and the next letter capitalised; a prime is 'Prime'", () => {
    assert.equal(spellName('sight_a'), 'sightA');
    assert.equal(spellName('L_2'), 'LTwo');
    assert.equal(spellName("p'"), 'pPrime');
    assert.equal(spellName("p''"), 'pPrimePrime');
    assert.equal(spellName('_x'), 'X');
  });

  test('Greek letters become their names, accents are dropped, other scripts have no spelling', () => {
    assert.equal(spellName('η'), 'eta');
    assert.equal(spellName('Γ1'), 'GammaOne');
    assert.equal(spellName('é'), 'e');
    assert.equal(spellName('ж'), undefined);
  });

  test('every spelling is letters only, so the macro is one control word', () => {
    fc.assert(
      fc.property(fc.stringMatching(/^[A-Za-z_][A-Za-z0-9_']{0,12}$/), (name) => {
        const spelled = spellName(name);
        assert.ok(spelled !== undefined);
        assert.match(`${MACRO_PREFIX}${spelled}`, /^[A-Za-z]+$/);
      }),
    );
  });
});

describe('words of code', () => {
  test('names and numbers in order, comments left out', () => {
    assert.deepEqual(wordsOf('chart(W, 13) # the chart'), ['chart', 'W', '13']);
    assert.deepEqual(wordsOf("dim (L_2 & M')"), ['dim', 'L_2', "M'"]);
  });

  test('the examples of the rule: show plucker(W) and show chart(W, 13)', () => {
    assert.equal(codeMacroPart('plucker(W)'), 'PluckerW');
    assert.equal(codeMacroPart('chart(W, 13)'), 'ChartWOneThree');
    assert.equal(codeMacroPart('eta not decomposable'), 'EtaNotDecomposable');
    assert.equal(codeMacroPart('count(2, V)'), 'CountTwoV');
  });
});
