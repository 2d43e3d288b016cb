/**
 * The in-host checks: the extension's features asked for through the VS Code API, as other
 * extensions and VS Code's own commands see them. Expected values: ../sample-facts.ts.
 */
import * as vscode from 'vscode';
import * as facts from '../sample-facts.js';

/** How long the language server may take to evaluate the sample after it is opened. */
const EVALUATION_TIMEOUT_MS = 30_000;

function fail(what: string, expected: readonly (string | RegExp)[], shown: string): never {
  throw new Error(
    `${what}\nexpected: ${expected.map((e) => (typeof e === 'string' ? JSON.stringify(e) : String(e))).join(', ')}\n` +
      `missing: ${facts.missingFrom(shown, expected).join(', ')}\nfound:\n${shown}`,
  );
}

function expectAll(what: string, shown: string, expected: readonly (string | RegExp)[]): void {
  if (facts.missingFrom(shown, expected).length > 0) fail(what, expected, shown);
}

function sampleUri(name: string): vscode.Uri {
  const folder = vscode.workspace.workspaceFolders?.[0];
  if (!folder) throw new Error('the test session opened no workspace folder');
  return vscode.Uri.joinPath(folder.uri, name);
}

/** Resolves with the document's diagnostics once `ready` accepts them (waiting on the change event). */
function diagnosticsWhen(uri: vscode.Uri, ready: (d: readonly vscode.Diagnostic[]) => boolean): Promise<readonly vscode.Diagnostic[]> {
  return new Promise((resolve, reject) => {
    const check = (): boolean => {
      const diagnostics = vscode.languages.getDiagnostics(uri);
      if (!ready(diagnostics)) return false;
      subscription.dispose();
      clearTimeout(timer);
      resolve(diagnostics);
      return true;
    };
    const subscription = vscode.languages.onDidChangeDiagnostics((event) => {
      if (event.uris.some((u) => u.toString() === uri.toString())) check();
    });
    const timer = setTimeout(() => {
      subscription.dispose();
      const shown = vscode.languages.getDiagnostics(uri).map(describeDiagnostic).join('\n') || '(no diagnostics)';
      reject(new Error(`no expected diagnostics for ${uri.path} within ${EVALUATION_TIMEOUT_MS / 1000} s; found:\n${shown}`));
    }, EVALUATION_TIMEOUT_MS);
    check();
  });
}

function codeOf(diagnostic: vscode.Diagnostic): string {
  const code = diagnostic.code;
  return typeof code === 'object' && code !== null ? String(code.value) : String(code ?? '');
}

function describeDiagnostic(d: vscode.Diagnostic): string {
  return `line ${d.range.start.line + 1}: [${d.source}] ${codeOf(d)}: ${d.message}`;
}

let sampleText = '';
let sample: vscode.Uri;

async function openSample(): Promise<readonly vscode.Diagnostic[]> {
  sample = sampleUri(facts.SAMPLE_FILE);
  const document = await vscode.workspace.openTextDocument(sample);
  await vscode.window.showTextDocument(document);
  sampleText = document.getText();
  if (document.languageId !== 'wedge') throw new Error(`the sample opened in language ${document.languageId}, not wedge`);
  return diagnosticsWhen(sample, (d) => d.length > 0);
}

async function lensesOf(uri: vscode.Uri): Promise<vscode.CodeLens[]> {
  return (await vscode.commands.executeCommand<vscode.CodeLens[]>('vscode.executeCodeLensProvider', uri)) ?? [];
}

function titles(lenses: vscode.CodeLens[]): string {
  return lenses.map((l) => l.command?.title ?? '(no command)').join('\n');
}

export const IN_HOST_CHECKS: [string, () => Promise<void>][] = [
  [
    'the false claim is the one error of the sample, with its code, source and message',
    async () => {
      const diagnostics = await openSample();
      const errors = diagnostics.filter((d) => d.severity === vscode.DiagnosticSeverity.Error);
      const shown = diagnostics.map(describeDiagnostic).join('\n');
      if (errors.length !== 1) throw new Error(`expected exactly one error, found ${errors.length}:\n${shown}`);
      const [error] = errors;
      const claimLine = facts.lineOf(sampleText, facts.FALSE_CLAIM_TEXT);
      if (error!.range.start.line !== claimLine) throw new Error(`the error is on line ${error!.range.start.line + 1}, not ${claimLine + 1}:\n${shown}`);
      expectAll('the error of the false claim', `${error!.source} ${codeOf(error!)} ${error!.message}`, [
        'wedgework',
        facts.FALSE_CLAIM_CODE,
        ...facts.FALSE_CLAIM_MESSAGE,
      ]);
    },
  ],
  [
    'vscode.executeHoverProvider over sightA gives its Plücker coordinates and the convention',
    async () => {
      const line = facts.lineOf(sampleText, facts.HOVERED_LINE_TEXT);
      const character = sampleText.split(/\r?\n/)[line]!.indexOf(facts.HOVERED_NAME) + 1;
      const hovers = await vscode.commands.executeCommand<vscode.Hover[]>(
        'vscode.executeHoverProvider',
        sample,
        new vscode.Position(line, character),
      );
      const text = (hovers ?? [])
        .flatMap((h) => h.contents)
        .map((c) => (typeof c === 'string' ? c : c.value))
        .join('\n');
      expectAll('the hover over sightA', text, facts.hoverExpectations());
    },
  ],
  [
    'vscode.executeCodeLensProvider gives the result lenses, which run wedgework.copyLatex',
    async () => {
      const lenses = await lensesOf(sample);
      const sightA = lenses.find((l) => facts.missingFrom(l.command?.title ?? '', facts.SIGHT_A_LENS).length === 0);
      if (!sightA) fail('a lens for sightA', facts.SIGHT_A_LENS, titles(lenses));
      if (sightA.command!.command !== 'wedgework.copyLatex') {
        throw new Error(`the lens runs ${JSON.stringify(sightA.command!.command)}, not "wedgework.copyLatex"`);
      }
      const declaration = facts.lineOf(sampleText, facts.HOVERED_LINE_TEXT);
      if (sightA.range.start.line !== declaration) {
        throw new Error(`the lens sits on line ${sightA.range.start.line + 1}, not on the declaration's line ${declaration + 1}`);
      }
      const claim = lenses.find((l) => l.range.start.line === facts.lineOf(sampleText, facts.FALSE_CLAIM_TEXT));
      expectAll('the lens of the false claim', claim?.command?.title ?? '(none)', ['✗ false']);
    },
  ],
  [
    'running the lens command copies the LaTeX of the result to the clipboard',
    async () => {
      const lenses = await lensesOf(sample);
      const sightA = lenses.find((l) => facts.missingFrom(l.command?.title ?? '', facts.SIGHT_A_LENS).length === 0);
      if (!sightA?.command) fail('a lens for sightA', facts.SIGHT_A_LENS, titles(lenses));
      await vscode.env.clipboard.writeText('(nothing copied yet)');
      await vscode.commands.executeCommand(sightA.command.command, ...(sightA.command.arguments ?? []));
      expectAll('the clipboard after wedgework.copyLatex', await vscode.env.clipboard.readText(), facts.SIGHT_A_LATEX);
    },
  ],
  [
    'a syntax error is reported and the statements after it still get lenses',
    async () => {
      const broken = sampleUri(facts.BROKEN_FILE);
      await vscode.window.showTextDocument(await vscode.workspace.openTextDocument(broken));
      const diagnostics = await diagnosticsWhen(broken, (d) => d.length > 0);
      const syntax = diagnostics.find((d) => codeOf(d).startsWith(facts.SYNTAX_CODE_PREFIX));
      if (!syntax) throw new Error(`no syntax/… diagnostic; found:\n${diagnostics.map(describeDiagnostic).join('\n')}`);
      expectAll('the syntax error', syntax.message, facts.SYNTAX_MESSAGE);
      const lenses = await lensesOf(broken);
      const recovered = lenses.find((l) => facts.missingFrom(l.command?.title ?? '', facts.RECOVERED_LENS).length === 0);
      if (!recovered) fail('the lens of the declaration after the syntax error', facts.RECOVERED_LENS, titles(lenses));
      expectAll('the lenses after the syntax error', titles(lenses), [facts.RECOVERED_CLAIM_LENS]);
    },
  ],
];
