/**
 * The `wedgework` command, independent of the process it runs in: arguments
 * and I/O come in, the exit status goes out.
 */
import { analyze, exportLatex } from '../../server/src/language/index.js';
import { parseArgs, USAGE, UsageError } from './args.js';
import { jsonReport, problemLines, resultLines, summaryLine, tally, type CheckedFile } from './report.js';

export interface CliIo {
  stdout(text: string): void;
  stderr(text: string): void;
  /** Reads a file as UTF-8 text; rejects when it cannot be read. */
  readFile(path: string): Promise<string>;
  /** Writes UTF-8 text to a file (for `--latex`); rejects when it cannot be written. */
  writeFile?(path: string, text: string): Promise<void>;
  /** Whether two existing paths are one file (through links too); false when either does not exist. */
  sameFile?(a: string, b: string): Promise<boolean>;
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

  // The LaTeX target must not be an input under another name (a link): checked before any work.
  if (command.latex !== undefined && io.sameFile) {
    for (const file of command.files) {
      if (await io.sameFile(file, command.latex)) {
        io.stderr(`wedgework: --latex ${command.latex} is the same file as ${file}: the LaTeX goes to a file of its own, never over an input\n`);
        return EXIT_USAGE;
      }
    }
  }

  const checked: CheckedFile[] = command.files.map((file, i) => {
    const text = texts[i]!;
    return { file, text, analysis: analyze(text, { evaluate: true, normalization: command.normalization }) };
  });
  const counts = tally(checked);
  let wrote: string | undefined;
  if (command.latex !== undefined) {
    const fragment = checked.map((c) => exportLatex(c.analysis, c.file)).join('\n');
    try {
      if (!io.writeFile) throw new Error('writing files is not available here');
      await io.writeFile(command.latex, fragment);
    } catch (error) {
      io.stderr(`wedgework: cannot write ${command.latex}: ${reason(error)}\n`);
      return EXIT_USAGE;
    }
    const results = checked.reduce((sum, c) => sum + c.analysis.results.filter((r) => r.kind !== 'field').length, 0);
    wrote = `wrote ${results} result${results === 1 ? '' : 's'} as LaTeX to ${command.latex}`;
  }
  if (command.json) {
    io.stdout(`${JSON.stringify(jsonReport(version, checked), null, 2)}\n`);
  } else {
    const lines = checked.flatMap((c) => (command.results ? [...resultLines(c), ...problemLines(c)] : problemLines(c)));
    lines.push(summaryLine(checked.length, counts));
    if (wrote) lines.push(wrote);
    io.stdout(`${lines.join('\n')}\n`);
  }
  return counts.errors > 0 ? EXIT_ERRORS_FOUND : EXIT_OK;
}
