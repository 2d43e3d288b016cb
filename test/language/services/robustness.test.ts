/**
 * The editor features run on whatever the user has typed so far, so none of
 * them may throw on any text, at any offset; and formatting, whatever it is
 * given, either declines or returns a text that reads as the same program
 * (property-based, on random sequences of the language's own words and
 * symbols; common practice for editor tooling, no source).
 */
import { test } from 'node:test';
import assert from 'node:assert/strict';
import fc from 'fast-check';
import {
  analyze,
  completionsAt,
  definitionAt,
  documentSymbols,
  foldingRanges,
  formatDocument,
  formatText,
  prepareRenameAt,
  referencesAt,
  renameAt,
  semanticTokens,
  signatureHelpAt,
} from '../../../server/src/language/index.js';
import { parseProgram } from '../../../server/src/language/parse.js';
import { sameStatements } from '../../../server/src/language/services/same-tree.js';
import { applyTextEdits } from './marked-source.js';

const PIECES = [
  'space V dim 3', 'space U dim 2 basis a b', 'vector p = ', 'subspace W = ', 'multivector m = ', 'claim ', 'show ',
  'convention order ', 'normalize first-one', 'field GF(5)', 'map f : V -> U = ', 'flag F = ',
  'span(', 'plucker(', 'chart(', ')', '(', ',', ' ', '\n', '  ', 'e1', 'e2', 'V.e1', 'p', 'W', 'f', 'a',
  '[', ']', '1 0 2', '-1/2', ';', ':', '{12: 1}', '+', '-', '^', '&', '=', 'in', 'is', 'not', 'dim', 'rows',
  '# note', '@', 'lex', 'decomposable', 'totally', 'positive',
];

const texts = fc.array(fc.constantFrom(...PIECES), { maxLength: 30 }).map((parts) => parts.join(''));

test('no feature throws, anywhere in any text', () => {
  fc.assert(
    fc.property(texts, (text) => {
      const analysis = analyze(text, { evaluate: false });
      documentSymbols(analysis);
      semanticTokens(analysis);
      foldingRanges(analysis);
      formatDocument(analysis);
      for (let offset = 0; offset <= text.length; offset++) {
        completionsAt(analysis, offset);
        completionsAt(analysis, offset, { afterSpace: true });
        signatureHelpAt(analysis, offset);
        definitionAt(analysis, offset);
        referencesAt(analysis, offset, true);
        const prepared = prepareRenameAt(analysis, offset);
        if ('span' in prepared) {
          const renamed = renameAt(analysis, offset, 'zz');
          // A rename that goes through leaves the document without new syntax problems.
          if ('edits' in renamed) {
            const after = parseProgram(applyTextEdits(text, renamed.edits));
            assert.equal(after.problems.length, parseProgram(text).problems.length);
          }
        }
      }
    }),
    { numRuns: 150 },
  );
});

test('formatting declines or keeps the program, and a second pass changes nothing', () => {
  fc.assert(
    fc.property(texts, (text) => {
      const formatted = formatText(text);
      if (formatted === undefined) return;
      assert.ok(sameStatements(parseProgram(text).program.statements, parseProgram(formatted).program.statements));
      assert.equal(formatText(formatted), formatted);
    }),
    { numRuns: 300 },
  );
});

const STATEMENTS = [
  'vector p = (1, 0, 2)',
  'vector q=3 e1-e2+1/2 e3',
  'subspace W = rows [1 0 2\n 0 1 -1] in V',
  'subspace S = solutions [ 1, 1, 0 ]  # a plane',
  'multivector m = e1^e2+{13: -2}',
  'claim dim W = 2  # checked',
  '# a comment of its own',
  'show plucker(W)',
  'map f : V -> U = [1 0\n0 1 # second row\n1 1]',
  'claim plucker(W)=[1:-1:-2]',
  'claim W is totally nonnegative',
  'show V.e1 - -e2',
  'claim dim(W & S) = 1',
  '',
];

const programs = fc
  .tuple(fc.array(fc.constantFrom(...STATEMENTS), { maxLength: 10 }), fc.array(fc.integer({ min: 0, max: 3 }), { minLength: 1, maxLength: 5 }))
  .map(([statements, widths]) => {
    const text = ['space V dim 3', 'space U dim 2 basis a b', ...statements].join('\n');
    // Widen some gaps between tokens on a line: the program stays the same.
    let k = 0;
    return text.replace(/ /g, () => ' '.repeat(1 + widths[k++ % widths.length]!));
  });

test('a program without syntax errors is always formatted, to the same program, once and for all', () => {
  fc.assert(
    fc.property(programs, (text) => {
      const formatted = formatText(text);
      assert.ok(formatted !== undefined, text);
      assert.ok(sameStatements(parseProgram(text).program.statements, parseProgram(formatted).program.statements));
      assert.equal(formatText(formatted), formatted);
    }),
    { numRuns: 200 },
  );
});
