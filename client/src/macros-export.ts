/**
 * The LaTeX macros commands (docs/latex-macros.md):
 * - "Copy Macro Reference" asks the server which macros the statement at the cursor gives and copies
 *   one (`\wwW`), letting the user pick when a statement gives several;
 * - "Refresh LaTeX Macros Export" asks the server for the macros file of the active `.wedge` file and
 *   writes it to the file the user chose the first time (remembered per source in workspace state).
 * The only file written is that export, never a `.wedge` file, and only when the user runs the command.
 */
import * as vscode from 'vscode';
import { posix } from 'node:path';
import { ExecuteCommandRequest, type LanguageClient } from 'vscode-languageclient/node';

/** Must match MACRO_REFERENCES_COMMAND and EXPORT_MACROS_COMMAND in server/src/lsp/macros-commands.ts. */
const SERVER_MACRO_REFERENCES = 'wedgework.server.macroReferences';
const SERVER_EXPORT_MACROS = 'wedgework.server.exportMacros';

export const COPY_MACRO_REFERENCE_COMMAND = 'wedgework.copyMacroReference';
export const REFRESH_MACROS_EXPORT_COMMAND = 'wedgework.refreshMacrosExport';

/** The workspace-state key under which the export target of a source is remembered. */
const TARGETS_KEY = 'macrosExportTargets';

interface MacrosExport {
  text: string;
  macros: number;
  errors: number;
  problems: string[];
}

function activeWedgeEditor(): vscode.TextEditor | undefined {
  const editor = vscode.window.activeTextEditor;
  return editor?.document.languageId === 'wedge' ? editor : undefined;
}

async function copyMacroReference(client: LanguageClient | undefined): Promise<void> {
  const editor = activeWedgeEditor();
  if (!client || !editor) {
    void vscode.window.showInformationMessage('Wedgework: put the cursor on a statement of a .wedge file to copy its macro reference.');
    return;
  }
  const references = (await client.sendRequest(ExecuteCommandRequest.type, {
    command: SERVER_MACRO_REFERENCES,
    arguments: [editor.document.uri.toString(), editor.document.offsetAt(editor.selection.active)],
  })) as string[] | null;
  if (!references || references.length === 0) {
    void vscode.window.showInformationMessage('Wedgework: the statement at the cursor gives no LaTeX macro (save the file to evaluate it).');
    return;
  }
  const chosen = references.length === 1 ? references[0] : await vscode.window.showQuickPick(references, { title: 'Copy which macro reference?' });
  if (!chosen) return;
  await vscode.env.clipboard.writeText(chosen);
  vscode.window.setStatusBarMessage(`Wedgework: copied ${chosen}`, 3000);
}

/** A target is never a `.wedge` file nor the source itself. */
function acceptableTarget(target: vscode.Uri, source: vscode.Uri): boolean {
  return target.toString() !== source.toString() && !/\.wedge$/i.test(target.path);
}

async function chooseTarget(source: vscode.Uri): Promise<vscode.Uri | undefined> {
  const suggested = /\.wedge$/i.test(source.path) && source.scheme !== 'untitled'
    ? source.with({ path: posix.join(posix.dirname(source.path), 'results.tex') })
    : undefined;
  return vscode.window.showSaveDialog({
    title: 'Write the LaTeX macros of this file to',
    saveLabel: 'Export Macros',
    filters: { LaTeX: ['tex'] },
    ...(suggested ? { defaultUri: suggested } : {}),
  });
}

async function refreshMacrosExport(context: vscode.ExtensionContext, client: LanguageClient | undefined): Promise<void> {
  const editor = activeWedgeEditor();
  if (!client || !editor) {
    void vscode.window.showInformationMessage('Wedgework: open a .wedge file to refresh its LaTeX macros export.');
    return;
  }
  const source = editor.document.uri;
  const targets = context.workspaceState.get<Record<string, string>>(TARGETS_KEY, {});
  let target = targets[source.toString()] ? vscode.Uri.parse(targets[source.toString()]!) : await chooseTarget(source);
  if (!target) return;
  if (!acceptableTarget(target, source)) {
    void vscode.window.showErrorMessage('Wedgework: the macros go to a .tex file of their own, never to a .wedge file; choose another name.');
    return;
  }
  // Paths relative to the export's folder, as a paper's repository holds them (and as the header records them).
  const folder = posix.dirname(target.path);
  const sourcePath = source.scheme === target.scheme ? posix.relative(folder, source.path) : posix.basename(source.path);
  const normalization = vscode.workspace.getConfiguration('wedgework', source).get<string>('normalization');
  const answer = (await client.sendRequest(ExecuteCommandRequest.type, {
    command: SERVER_EXPORT_MACROS,
    arguments: [source.toString(), sourcePath, posix.basename(target.path), normalization],
  })) as MacrosExport | null;
  if (!answer) {
    void vscode.window.showWarningMessage('Wedgework: the file could not be evaluated (closed, or stopped at the time limit), so nothing was exported.');
    return;
  }
  if (answer.problems.length > 0) {
    void vscode.window.showErrorMessage(`Wedgework: nothing exported: ${answer.problems.join('; ')}`);
    return;
  }
  await vscode.workspace.fs.writeFile(target, new TextEncoder().encode(answer.text));
  await context.workspaceState.update(TARGETS_KEY, { ...targets, [source.toString()]: target.toString() });
  const errors = answer.errors > 0 ? ` (the file has ${answer.errors} error${answer.errors === 1 ? '' : 's'})` : '';
  vscode.window.setStatusBarMessage(`Wedgework: wrote ${answer.macros} macros to ${vscode.workspace.asRelativePath(target)}${errors}`, 5000);
}

/** Registers both commands; `client` is read when a command runs, so a restarted client is used. */
export function registerMacroCommands(context: vscode.ExtensionContext, client: () => LanguageClient | undefined): void {
  context.subscriptions.push(
    vscode.commands.registerCommand(COPY_MACRO_REFERENCE_COMMAND, () => copyMacroReference(client())),
    vscode.commands.registerCommand(REFRESH_MACROS_EXPORT_COMMAND, () => refreshMacrosExport(context, client())),
  );
}
