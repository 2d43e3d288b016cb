/**
 * The `wedgework` command, independent of the process it runs in: arguments
 * and I/O come in, the exit status goes out.
 */
import { analyze } from '../../server/src/language/index.js';
import { parseArgs, USAGE, UsageError } from './args.js';
import { jsonReport, problemLines, resultLines, summaryLine, tally, type CheckedFile } from './report.js';

export interface CliIo {
  stdout(text: string): void;
  stderr(text: string): void;
  /** Reads a file as UTF-8 text; rejects when it cannot be read. */
  readFile(path: string): Promise<string>;
}

export const EXIT_OK = 0;
export const EXIT_ERRORS_FOUND = 1;
export const EXIT_USAGE = 2;

function reason(error: unknown): string {
  const code = (error as { code?: unknown } | null)?.code;
  if (code === 'ENOENT') return 'no such file';
  if (code === 'EISDIR') return 'is a directory';
  if (code === 'EACCES' || code === 'EPERM') return 'permission denied';
  return error instanceof Error ? error.message : String(error);
}

/** A byte order mark is not part of the text (editors drop it too, so offsets agree with theirs). */
function withoutByteOrderMark(text: string): string {
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

export async function runCli(args: readonly string[], version: string, io: CliIo): Promise<number> {
  let command;
  try {
    command = parseArgs(args);
  } catch (error) {
    if (!(error instanceof UsageError)) throw error;
    io.stderr(`wedgework: ${error.message}\n\n${USAGE}`);
    return EXIT_USAGE;
  }
  if (command.kind === 'help') {
    io.stdout(USAGE);
    return EXIT_OK;
  }
  if (command.kind === 'version') {
    io.stdout(`${version}\n`);
    return EXIT_OK;
  }

  // Read everything first: when a file cannot be read, nothing is reported but that.
  const texts: string[] = [];
  const unreadable: string[] = [];
  for (const file of command.files) {
    try {
      texts.push(withoutByteOrderMark(await io.readFile(file)));
    } catch (error) {
      unreadable.push(`wedgework: cannot read ${file}: ${reason(error)}`);
    }
  }
  if (unreadable.length > 0) {
    io.stderr(`${unreadable.join('\n')}\n`);
    return EXIT_USAGE;
  }

  const checked: CheckedFile[] = command.files.map((file, i) => {
    const text = texts[i]!;
    return { file, text, analysis: analyze(text, { evaluate: true, normalization: command.normalization }) };
  });
  const counts = tally(checked);
  if (command.json) {
    io.stdout(`${JSON.stringify(jsonReport(version, checked), null, 2)}\n`);
  } else {
    const lines = checked.flatMap((c) => (command.results ? [...resultLines(c), ...problemLines(c)] : problemLines(c)));
    lines.push(summaryLine(checked.length, counts));
    io.stdout(`${lines.join('\n')}\n`);
  }
  return counts.errors > 0 ? EXIT_ERRORS_FOUND : EXIT_OK;
}
