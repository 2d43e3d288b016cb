/**
 * The VS Code side: starts the bundled language server and adds the two
 * commands. Everything about the language itself happens in the server.
 */
import * as vscode from 'vscode';
import {
  CloseAction,
  ErrorAction,
  LanguageClient,
  TransportKind,
  type ErrorHandler,
  type LanguageClientOptions,
  type ServerOptions,
} from 'vscode-languageclient/node';
import { RestartPolicy } from './restart-policy.js';
import { registerResultsView } from './results-view.js';
import { exportLatex } from './export-latex.js';
import { registerMacroCommands } from './macros-export.js';

/** Must match the command the server's code lenses run (server/src/lsp/convert.ts). */
const COPY_LATEX_COMMAND = 'wedgework.copyLatex';
const RESTART_SERVER_COMMAND = 'wedgework.restartServer';
const EXPORT_LATEX_COMMAND = 'wedgework.exportLatex';

let client: LanguageClient | undefined;

async function copyLatex(latex: unknown, name: unknown): Promise<void> {
  if (typeof latex !== 'string' || latex.length === 0) {
    void vscode.window.showInformationMessage('Wedgework: use the code lens above a result to copy it as LaTeX.');
    return;
  }
  await vscode.env.clipboard.writeText(latex);
  const what = typeof name === 'string' && name.length > 0 ? name : 'the result';
  vscode.window.setStatusBarMessage(`Wedgework: copied ${what} as LaTeX`, 3000);
}

export async function activate(context: vscode.ExtensionContext): Promise<void> {
  // The client logs here; `wedgework.trace.server` ('messages' | 'verbose') chooses how much of the
  // traffic is traced into the trace channel, shown when that channel's log level is Trace.
  const outputChannel = vscode.window.createOutputChannel('Wedgework', { log: true });
  const traceOutputChannel = vscode.window.createOutputChannel('Wedgework Language Server Trace', { log: true });
  context.subscriptions.push(outputChannel, traceOutputChannel);

  const serverModule = context.asAbsolutePath('dist/server.cjs');
  const serverOptions: ServerOptions = {
    run: { module: serverModule, transport: TransportKind.ipc, options: { execArgv: ['--enable-source-maps'] } },
    debug: {
      module: serverModule,
      transport: TransportKind.ipc,
      options: { execArgv: ['--enable-source-maps', '--nolazy', '--inspect=6009'] },
    },
  };
  const restarts = new RestartPolicy();
  // A crashed server is started again a bounded number of times, and the user is told each time (./restart-policy.ts).
  const errorHandler: ErrorHandler = {
    // A message the connection could not read or write: keep going, the next one may be fine.
    error: () => ({ action: ErrorAction.Continue }),
    closed: () => {
      const decision = restarts.closed();
      outputChannel.error(decision.message);
      if (decision.restart) void vscode.window.showWarningMessage(decision.message);
      else void vscode.window.showErrorMessage(decision.message);
      return { action: decision.restart ? CloseAction.Restart : CloseAction.DoNotRestart, handled: true };
    },
  };
  const clientOptions: LanguageClientOptions = {
    // No scheme: files, untitled editors and virtual workspaces alike.
    documentSelector: [{ language: 'wedge' }],
    outputChannel,
    traceOutputChannel,
    errorHandler,
  };
  client = new LanguageClient('wedgework', 'Wedgework', serverOptions, clientOptions);
  // The results view (./results-view.ts) declares a client capability, so it is added before the start.
  registerResultsView(context, client);
  registerMacroCommands(context, () => client);

  context.subscriptions.push(
    vscode.commands.registerCommand(COPY_LATEX_COMMAND, copyLatex),
    vscode.commands.registerCommand(EXPORT_LATEX_COMMAND, () => exportLatex(client)),
    vscode.commands.registerCommand(RESTART_SERVER_COMMAND, async () => {
      if (!client) return;
      restarts.reset();
      await client.restart();
      vscode.window.setStatusBarMessage('Wedgework: language server restarted', 3000);
    }),
  );

  await client.start();
}

export async function deactivate(): Promise<void> {
  const running = client;
  client = undefined;
  await running?.stop();
}
