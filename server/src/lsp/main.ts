/**
 * Entry point of the bundled language server (dist/server.cjs).
 *
 * Transport: `--stdio` (or `--node-ipc`, `--socket=N`, `--pipe=NAME`) as
 * understood by the LSP library; started as a Node child process without a
 * flag, it talks over Node's IPC channel, which is what the editor's client
 * uses.
 */
import { createConnection, IPCMessageReader, IPCMessageWriter, ProposedFeatures } from 'vscode-languageserver/node';
import { startServer } from './server.js';

const TRANSPORT_FLAGS = ['--stdio', '--node-ipc', '--socket', '--pipe'];

function hasTransportFlag(args: string[]): boolean {
  return args.some((arg) => TRANSPORT_FLAGS.some((flag) => arg === flag || arg.startsWith(`${flag}=`)));
}

function connect() {
  if (hasTransportFlag(process.argv.slice(2))) return createConnection(ProposedFeatures.all);
  if (typeof process.send === 'function') {
    return createConnection(ProposedFeatures.all, new IPCMessageReader(process), new IPCMessageWriter(process));
  }
  process.stderr.write(
    'wedgework language server: choose a transport: --stdio, --node-ipc, --socket=PORT or --pipe=NAME\n',
  );
  process.exit(2);
}

// A last line of defence: handlers are guarded, but a stray exception must not end the session.
// stderr is safe in every transport (stdout may carry the protocol).
process.on('uncaughtException', (error) => {
  process.stderr.write(`wedgework language server: unexpected error: ${error.stack ?? String(error)}\n`);
});
process.on('unhandledRejection', (reason) => {
  process.stderr.write(`wedgework language server: unhandled rejection: ${String(reason)}\n`);
});

startServer(connect());
