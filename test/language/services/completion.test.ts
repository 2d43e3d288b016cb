/**
 * Completion at a cursor `|`, on text as it stands while the user types. What
 * an editor should offer at each place is the language's own grammar and
 * scope rule (docs/language.md); that a completion list offers what may be
 * written next is common practice, no source.
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { analyze, completionsAt, type Completion } from '../../../server/src/language/index.js';
import { CONVENTION_SETTINGS, NORMALIZATION_MODES, PROPERTIES } from '../../../server/src/language/services/words.js';
import { analyzeMarked, textOf } from './marked-source.js';

const STATEMENT_KEYWORDS = ['field', 'normalize', 'space', 'vector', 'subspace', 'multivector', 'claim', 'show', 'convention', 'map', 'flag', 'parameter', 'grassmannian', 'class'];

function complete(source: string, afterSpace = false): { items: Completion[]; text: string } {
  const { text, cursor, analysis } = analyzeMarked(source);
  assert.ok(cursor >= 0, 'the source marks the cursor with |');
  return { items: completionsAt(analysis, cursor, { afterSpace }), text };
}

function labels(source: string, afterSpace = false): string[] {
  return complete(source, afterSpace).items.map((i) => i.label);
}

interface Case {
  name: string;
  source: string;
  /** Exactly these labels, in any order. */
  exactly?: string[];
  includes?: string[];
  excludes?: string[];
}

const CASES: Case[] = [
  { name: 'an empty document: the statement keywords', source: '|', exactly: STATEMENT_KEYWORDS },
  {
    name: 'a new line after a complete statement: statement keywords, no names',
    source: 'space V dim 4\nve|',
    includes: STATEMENT_KEYWORDS,
    excludes: ['e1', 'span'],
  },
  {
    name: 'after `=`: the names in scope, the built-ins and the expression keywords, no statement keyword',
    source: 'space V dim 4\nvector p = (1, 0, 0, 0)\nsubspace L = span(p, |',
    includes: ['V', 'e1', 'e4', 'p', 'span', 'plucker', 'chart', 'rows', 'columns', 'solutions', 'dim'],
    excludes: ['L', 'vector', 'claim'],
  },
  {
    name: 'names declared after the cursor are not in scope',
    source: 'space V dim 2\nvector p = |\nvector q = (1, 0)\nsubspace W = span(q)',
    includes: ['e1', 'e2'],
    excludes: ['q', 'W'],
  },
  {
    name: 'a basis name two spaces share is offered qualified; one only one space has, plainly',
    source: 'space V dim 3\nspace W dim 2\nvector p = |',
    includes: ['V.e1', 'V.e2', 'W.e1', 'W.e2', 'e3'],
    excludes: ['e1', 'e2'],
  },
  {
    name: 'after `V.`: the basis vectors of V only',
    source: 'space V dim 2\nspace U dim 3 basis a b c\nclaim V.|',
    exactly: ['e1', 'e2'],
  },
  {
    name: 'a new name is not completed',
    source: 'space V dim 2\nvector |',
    exactly: [],
  },
  {
    name: 'after `in`: the spaces',
    source: 'space V dim 2\nspace U dim 3 basis a b c\nvector p = (1, 0) in |',
    exactly: ['V', 'U'],
  },
  {
    name: 'after the colon and the arrow of a map: the spaces',
    source: 'space V dim 2\nspace U dim 3\nmap f : V -> |',
    exactly: ['V', 'U'],
  },
  {
    name: 'after `convention`: the setting names',
    source: 'convention |',
    exactly: CONVENTION_SETTINGS.map((s) => s.key),
  },
  {
    name: 'after a setting name: its values',
    source: 'convention order |',
    exactly: ['lex', 'colex'],
  },
  {
    name: 'after a setting: the settings not chosen yet (and a new statement)',
    source: 'convention order lex |',
    includes: ['labels', 'layout', 'normalization', 'lines', 'moment', 'homogeneous'],
    excludes: ['order'],
  },
  {
    name: 'after `normalize`: the modes',
    source: 'normalize |',
    exactly: ['raw', 'first-one', 'primitive', 'positive'],
  },
  {
    name: 'after `field`: QQ and GF(p)',
    source: 'field |',
    exactly: ['QQ', 'GF(p)'],
  },
  {
    name: 'after `is`: the properties and `not`',
    source: 'space V dim 4\nsubspace W = span(e1, e2)\nclaim W is |',
    exactly: [...PROPERTIES.map((p) => p.word), 'not'],
  },
  {
    name: 'after `is totally`: the properties that go on with it',
    source: 'space V dim 4\nsubspace W = span(e1, e2)\nclaim W is totally |',
    includes: ['totally nonnegative', 'totally positive'],
    excludes: ['uniform', 'decomposable', 'not'],
  },
  {
    name: 'after a complete space declaration on its line: `basis`',
    source: 'space V dim 4 |',
    includes: ['basis'],
  },
  {
    name: 'inside a comment: nothing',
    source: 'space V dim 4  # a note about |',
    exactly: [],
  },
  {
    name: 'right after a number: nothing (a word cannot go on a number)',
    source: 'space V dim 2\nvector p = (1, 2|',
    exactly: [],
  },
];

describe('completion: what is offered where', () => {
  for (const c of CASES) {
    test(c.name, () => {
      const got = labels(c.source);
      if (c.exactly) assert.deepEqual([...got].sort(), [...c.exactly].sort());
      for (const l of c.includes ?? []) assert.ok(got.includes(l), `expected ${l} in ${got.join(' ')}`);
      for (const l of c.excludes ?? []) assert.ok(!got.includes(l), `did not expect ${l} in ${got.join(' ')}`);
    });
  }
});

describe('completion: the items', () => {
  test('names carry their kind as detail', () => {
    const { items } = complete(
      'space V dim 4\nspace U dim 3 basis a b c\nvector p = (1, 0, 0, 0)\nsubspace L = span(p)\nmultivector w = plucker(L)\n' +
        'map f : V -> U = [ 1 0 0; 0 1 0; 0 0 1; 0 0 0 ]\nflag F = standard(V)\nshow |',
    );
    const detail = (label: string) => items.find((i) => i.label === label)?.detail;
    assert.equal(detail('V'), 'space of dimension 4');
    assert.equal(detail('e1'), 'basis vector of V');
    assert.equal(detail('a'), 'basis vector of U');
    assert.equal(detail('p'), 'vector');
    assert.equal(detail('L'), 'subspace');
    assert.equal(detail('w'), 'multivector');
    assert.equal(detail('f'), 'map V → U');
    assert.equal(detail('F'), 'flag');
    assert.equal(items.find((i) => i.label === 'p')?.kind, 'vector');
  });

  test('a built-in shows its signature and inserts its parentheses as a snippet', () => {
    const { items } = complete('space V dim 4\nshow ch|');
    const chart = items.find((i) => i.label === 'chart');
    assert.ok(chart);
    assert.equal(chart.kind, 'builtin');
    assert.equal(chart.detail, 'chart(W, I)');
    assert.equal(chart.snippet, 'chart($0)');
    assert.ok(chart.documentation && chart.documentation.length > 0);
  });

  test('the typed word is what an item replaces', () => {
    const { items, text } = complete('space V dim 4\nshow plu|');
    const plucker = items.find((i) => i.label === 'plucker')!;
    assert.equal(textOf(text, plucker.replace), 'plu');
  });

  test('a hyphenated value is replaced from its first word', () => {
    const { items, text } = complete('normalize first-|');
    assert.equal(textOf(text, items.find((i) => i.label === 'first-one')!.replace), 'first-');
    const lines = complete('convention lines moment-|');
    assert.equal(textOf(lines.text, lines.items.find((i) => i.label === 'moment-direction')!.replace), 'moment-');
  });

  test('GF inserts a snippet with a place for p', () => {
    const gf = complete('field G|').items.find((i) => i.label === 'GF(p)')!;
    assert.equal(gf.snippet, 'GF(${1:p})');
    assert.equal(gf.filterText, 'GF');
  });

  test('after a complete statement, on a later line the statement keywords sort first; on the same line last', () => {
    const later = complete('space V dim 4\nvector p = (1, 0, 0, 0)\n|').items;
    const same = complete('space V dim 4\nvector p = (1, 0, 0, 0) |').items;
    const byOrder = (items: Completion[]) => [...items].sort((a, b) => a.sortText.localeCompare(b.sortText)).map((i) => i.label);
    assert.ok(STATEMENT_KEYWORDS.includes(byOrder(later)[0]!), byOrder(later).join(' '));
    assert.ok(byOrder(same).indexOf('in') < byOrder(same).indexOf('vector'));
  });

  test('a declaration with a syntax error is still offered, marked', () => {
    const { items } = complete('space V dim 2\nvector p = (1, 0\nvector q = 2 |');
    const p = items.find((i) => i.label === 'p');
    assert.ok(p, items.map((i) => i.label).join(' '));
    assert.match(p.detail, /syntax error/);
  });
});

describe('completion after a typed space', () => {
  test('answers where a word comes from a fixed list', () => {
    assert.deepEqual(labels('convention order |', true).sort(), ['colex', 'lex']);
    assert.deepEqual(labels('space V dim 2\nvector p = (1, 0) in |', true), ['V']);
  });

  test('stays quiet in an expression', () => {
    assert.deepEqual(labels('space V dim 2\nvector p = |', true), []);
    assert.deepEqual(labels('space V dim 2\nvector p = e1 + |', true), []);
  });
});

describe('the fixed word lists are the words the language accepts', () => {
  test('every convention setting and value is read without a problem', () => {
    for (const setting of CONVENTION_SETTINGS) {
      for (const value of setting.values) {
        const text = `convention ${setting.key} ${value.word}\nspace V dim 4\n`;
        const problems = analyze(text, { evaluate: true }).problems;
        assert.deepEqual(problems.map((p) => p.code), [], `${text}: ${problems.map((p) => p.message).join('; ')}`);
      }
    }
  });

  test('every normalization is read without a problem', () => {
    for (const mode of NORMALIZATION_MODES) {
      const problems = analyze(`normalize ${mode.word}\n`, { evaluate: true }).problems;
      assert.deepEqual(problems.map((p) => p.code), [], mode.word);
    }
  });

  test('every property is a known property', () => {
    // Subjects each property applies to: a plane of a 4-space, and a 2-vector of it.
    const prefix = 'space V dim 4\nsubspace W = span(e1, e2)\nmultivector m = e1^e2\n';
    for (const property of PROPERTIES) {
      const subject = property.word === 'decomposable' || property.word.startsWith('on ') ? 'm' : 'W';
      const problems = analyze(`${prefix}claim ${subject} is ${property.word}\n`, { evaluate: true }).problems;
      // A property may be false of the subject (a claim/ problem) but must never be unknown.
      assert.deepEqual(problems.filter((p) => !p.code.startsWith('claim/')).map((p) => `${p.code}: ${p.message}`), [], property.word);
    }
  });

  test('the statement keywords offered are exactly those that start a statement', () => {
    for (const keyword of STATEMENT_KEYWORDS) {
      const problems = analyze(`${keyword}\n`, { evaluate: false }).problems;
      // A bare keyword is an incomplete statement, never an unexpected word.
      assert.ok(problems.every((p) => p.code !== 'syntax/expected-statement'), keyword);
    }
  });
});
