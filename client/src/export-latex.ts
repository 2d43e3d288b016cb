/**
 * "Export Results as LaTeX…": asks the server for the fragment of the active
 * `.wedge` file's results (workspace/executeCommand) and writes it to a new
 * file the user chooses. The `.wedge` file itself is never written: a target
 * that is the source, or any `.wedge` file, is refused.
 */
import * as vscode from 'vscode';
import { ExecuteCommandRequest, type LanguageClient } from 'vscode-languageclient/node';

/** Must match EXPORT_LATEX_COMMAND in server/src/lsp/actions.ts. */
const SERVER_EXPORT_COMMAND = 'wedgework.server.exportLatex';

interface LatexExport {
  fileName: string;
  latex: string;
  results: number;
  errors: number;
}

/** Beside the source, with `.tex` for `.wedge`; nothing for an untitled or virtual document without a path. */
function suggestedTarget(source: vscode.Uri): vscode.Uri | undefined {
  if (source.scheme === 'untitled' || !/\.wedge$/i.test(source.path)) return undefined;
  return source.with({ path: source.path.replace(/\.wedge$/i, '.tex') });
}

export async function exportLatex(client: LanguageClient | undefined): Promise<void> {
  const document = vscode.window.activeTextEditor?.document;
  if (!client || !document || document.languageId !== 'wedge') {
    void vscode.window.showInformationMessage('Wedgework: open a .wedge file to export its results as LaTeX.');
    return;
  }
  const answer = (await client.sendRequest(ExecuteCommandRequest.type, {
    command: SERVER_EXPORT_COMMAND,
    arguments: [document.uri.toString()],
  })) as LatexExport | null;
  if (!answer) {
    void vscode.window.showWarningMessage('Wedgework: the file could not be evaluated (closed, or stopped at the time limit), so nothing was exported.');
    return;
  }
  const suggested = suggestedTarget(document.uri);
  const target = await vscode.window.showSaveDialog({
    title: `Export the results of ${answer.fileName} as a LaTeX fragment`,
    saveLabel: 'Export',
    filters: { LaTeX: ['tex'] },
    ...(suggested ? { defaultUri: suggested } : {}),
  });
  if (!target) return;
  if (target.toString() === document.uri.toString() || /\.wedge$/i.test(target.path)) {
    void vscode.window.showErrorMessage('Wedgework: the export writes a new .tex file and never a .wedge file; choose another name.');
    return;
  }
  await vscode.workspace.fs.writeFile(target, new TextEncoder().encode(answer.latex));
  const errors = answer.errors > 0 ? ` (the file has ${answer.errors} error${answer.errors === 1 ? '' : 's'})` : '';
  const open = await vscode.window.showInformationMessage(
    `Wedgework: exported ${answer.results} result${answer.results === 1 ? '' : 's'} to ${vscode.workspace.asRelativePath(target)}${errors}.`,
    'Open',
  );
  if (open === 'Open') await vscode.window.showTextDocument(target);
}
