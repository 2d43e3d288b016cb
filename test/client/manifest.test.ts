/**
 * The extension manifest (package.json), the TextMate grammar and the
 * language configuration agree with each other, with the code, and with the
 * language definition (docs for helpers: grammar.md, "Tokens").
 *
 * Field meanings follow VS Code's "Extension Manifest" and "Contribution
 * Points" references and the "Workspace Trust" extension guide
 * (code.visualstudio.com/api, from memory).
 */
import { describe, test } from 'node:test';
import assert from 'node:assert/strict';
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { ROOT } from '../support/bundles.js';
import { DEFAULT_SETTINGS, EVALUATE_ON, NORMALIZATIONS } from '../../server/src/lsp/settings.js';
import { COPY_LATEX_COMMAND } from '../../server/src/lsp/convert.js';
import { DEFAULT_NORMALIZATION, NORMALIZATIONS as CLI_NORMALIZATIONS } from '../../cli/src/args.js';

const readJson = (path: string): any => JSON.parse(readFileSync(join(ROOT, path), 'utf8'));
const manifest = readJson('package.json');

interface GrammarRule {
  match?: string;
  begin?: string;
  end?: string;
  name?: string;
  patterns?: GrammarRule[];
  include?: string;
}

describe('extension manifest', () => {
  test('the entry point is the CommonJS client bundle, so "type": "module" does not apply to it', () => {
    assert.equal(manifest.main, './dist/client.cjs');
    assert.equal(manifest.type, 'module');
  });

  test('@types/vscode is not newer than engines.vscode', () => {
    assert.equal(manifest.engines.vscode, '^1.91.0');
    assert.equal(manifest.devDependencies['@types/vscode'], '^1.91.0');
  });

  test('works in restricted mode and in virtual workspaces', () => {
    assert.equal(manifest.capabilities.untrustedWorkspaces.supported, true);
    assert.ok(manifest.capabilities.untrustedWorkspaces.description.length > 0);
    assert.equal(manifest.capabilities.virtualWorkspaces, true);
  });

  test('contributes the wedge language with its grammar and configuration files', () => {
    const [language] = manifest.contributes.languages;
    assert.equal(language.id, 'wedge');
    assert.deepEqual(language.extensions, ['.wedge']);
    assert.deepEqual(language.aliases, ['Wedgework', 'wedge']);
    assert.ok(existsSync(join(ROOT, language.configuration)));
    const [grammar] = manifest.contributes.grammars;
    assert.equal(grammar.language, 'wedge');
    assert.equal(grammar.scopeName, 'source.wedge');
    assert.equal(readJson(grammar.path).scopeName, 'source.wedge');
  });

  test('every command the client registers is contributed, in the Wedgework category', () => {
    // The extension registers its own commands and, through ./macros-export.ts, the LaTeX macros commands.
    const client = ['client/src/extension.ts', 'client/src/macros-export.ts'].map((f) => readFileSync(join(ROOT, f), 'utf8')).join('\n');
    const registered = [...client.matchAll(/'(wedgework\.[A-Za-z]+)'/g)].map((m) => m[1]!).sort();
    const contributed = manifest.contributes.commands.map((c: { command: string }) => c.command).sort();
    assert.deepEqual(registered, [
      'wedgework.copyLatex',
      'wedgework.copyMacroReference',
      'wedgework.exportLatex',
      'wedgework.refreshMacrosExport',
      'wedgework.restartServer',
    ]);
    assert.deepEqual(contributed, registered);
    for (const command of manifest.contributes.commands) assert.equal(command.category, 'Wedgework');
    assert.ok(contributed.includes(COPY_LATEX_COMMAND), 'the command the code lenses run');
  });

  test('settings have the enums and defaults the server and the command line use', () => {
    const properties = manifest.contributes.configuration.properties;
    assert.deepEqual(properties['wedgework.normalization'].enum, [...NORMALIZATIONS]);
    assert.deepEqual([...CLI_NORMALIZATIONS], [...NORMALIZATIONS]);
    assert.equal(properties['wedgework.normalization'].default, DEFAULT_SETTINGS.normalization);
    assert.equal(DEFAULT_NORMALIZATION, DEFAULT_SETTINGS.normalization);
    assert.deepEqual(properties['wedgework.evaluateOn'].enum, [...EVALUATE_ON]);
    assert.equal(properties['wedgework.evaluateOn'].default, DEFAULT_SETTINGS.evaluateOn);
    assert.deepEqual(properties['wedgework.trace.server'].enum, ['off', 'messages', 'verbose']);
    for (const [key, property] of Object.entries<{ description?: string }>(properties)) {
      assert.ok((property.description ?? '').length > 0, `${key} has a description`);
    }
  });

  test('the command-line shim and the build and test scripts are in place', () => {
    assert.equal(manifest.bin.wedgework, 'bin/wedgework.cjs');
    assert.match(readFileSync(join(ROOT, 'bin/wedgework.cjs'), 'utf8'), /^#!\/usr\/bin\/env node\n/);
    for (const script of ['build', 'prepare', 'pretest', 'test']) assert.ok(manifest.scripts[script], script);
  });
});

describe('language configuration', () => {
  test('# starts a line comment and the three bracket pairs close themselves', () => {
    const configuration = readJson('language-configuration.json');
    assert.equal(configuration.comments.lineComment, '#');
    const pairs = [['(', ')'], ['[', ']'], ['{', '}']];
    assert.deepEqual(configuration.brackets, pairs);
    assert.deepEqual(
      configuration.autoClosingPairs.map((p: { open: string; close: string }) => [p.open, p.close]),
      pairs,
    );
  });
});

describe('TextMate grammar', () => {
  const grammar = readJson('syntaxes/wedge.tmLanguage.json');

  function rules(): GrammarRule[] {
    const all: GrammarRule[] = [];
    const visit = (rule: GrammarRule) => {
      all.push(rule);
      for (const inner of rule.patterns ?? []) visit(inner);
    };
    for (const rule of grammar.patterns) visit(rule);
    for (const rule of Object.values<GrammarRule>(grammar.repository)) visit(rule);
    return all;
  }

  /** The scope the first keyword rule gives to the whole of `word`, if any. */
  function keywordScope(word: string): string | undefined {
    for (const rule of grammar.repository.keywords.patterns as GrammarRule[]) {
      const match = new RegExp(rule.match!, 'u').exec(word);
      if (match && match.index === 0 && match[0] === word) return rule.name;
    }
    return undefined;
  }

  // JavaScript's regular expressions stand in for the editor's Oniguruma engine here: the grammar
  // sticks to the syntax both share (lookarounds, \p{…} classes).
  test('every regular expression compiles, and every include points at a rule that exists', () => {
    for (const rule of rules()) {
      for (const source of [rule.match, rule.begin, rule.end]) {
        if (source !== undefined) assert.doesNotThrow(() => new RegExp(source, 'u'), source);
      }
      if (rule.include?.startsWith('#')) assert.ok(grammar.repository[rule.include.slice(1)], rule.include);
    }
  });

  test('all reserved words of the language are highlighted as keywords', () => {
    const reserved = 'field normalize space dim basis vector subspace multivector claim show in not decomposable rows solutions';
    for (const word of reserved.split(' ')) {
      const scope = keywordScope(word);
      assert.ok(scope && /^(keyword|storage)\./.test(scope), `${word} → ${scope}`);
    }
  });

  test('names that merely contain a keyword are not keywords', () => {
    for (const name of ["dim'", 'rows2', 'shown', 'in_V', 'basis_1']) {
      assert.equal(keywordScope(name), undefined, name);
    }
  });

  test('built-in functions are highlighted where they are called', () => {
    const builtin = new RegExp(grammar.repository['builtin-call'].match, 'u');
    for (const name of ['span', 'plucker', 'chart', 'recover']) assert.ok(builtin.test(`${name}(`), name);
    assert.equal(builtin.test('spanning('), false);
  });

  test('numbers are highlighted, but not the digits of a name like e1', () => {
    const number = new RegExp(grammar.repository.number.match, 'u');
    assert.equal(number.exec('0.125')?.[0], '0.125');
    assert.equal(number.exec('e1'), null);
  });

  test('Unicode and ASCII operators are both highlighted', () => {
    const operators = (grammar.repository.operator.patterns as GrammarRule[]).map((r) => new RegExp(`^(?:${r.match})$`, 'u'));
    for (const op of ['=', '!=', '≠', '+', '-', '*', '/', '^', '∧', '&', '∩', '∈', '∉']) {
      assert.ok(operators.some((re) => re.test(op)), op);
    }
  });
});
