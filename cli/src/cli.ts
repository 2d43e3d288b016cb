/**
 * The `wedgework` command, independent of the process it runs in: arguments
 * and I/O come in, the exit status goes out.
 */
import { analyze, exportLatex, type Normalization } from '../../server/src/language/index.js';
import { parseArgs, USAGE, UsageError } from './args.js';
import { jsonReport, problemLines, resultLines, summaryLine, tally, type CheckedFile } from './report.js';
import { buildExport, findingLines, findingsJson, macroProblems, paperFindings, refreshCommand, syncFindings, type MacroFinding } from './macros.js';

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

  if (command.kind === 'export') return runExport(command, texts, version, io);

  // The macros file and the papers of the sync check are read before any work too.
  const readOthers = async (paths: readonly string[]): Promise<string[] | undefined> => {
    const read: string[] = [];
    for (const path of paths) {
      try {
        read.push(withoutByteOrderMark(await io.readFile(path)));
      } catch (error) {
        unreadable.push(`wedgework: cannot read ${path}: ${reason(error)}`);
      }
    }
    return unreadable.length > 0 ? undefined : read;
  };
  const texText = command.tex !== undefined ? (await readOthers([command.tex]))?.[0] : undefined;
  const paperTexts = await readOthers(command.papers);
  if (unreadable.length > 0 || !paperTexts) {
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
  // The sync check: the export computed now against the macros file, and the papers' macros against the export.
  const syncing = command.tex !== undefined || command.papers.length > 0;
  const findings: MacroFinding[] = [];
  if (syncing) {
    const tex = command.tex ?? 'MACROS.tex';
    const exported = buildExport(checked, version, tex, command.normalization);
    const refresh = refreshCommand(tex, command.files, command.normalization);
    findings.push(...macroProblems(exported));
    if (command.tex !== undefined) findings.push(...syncFindings(exported, command.tex, texText!, version, refresh));
    command.papers.forEach((paper, i) => findings.push(...paperFindings(exported, paper, paperTexts[i]!, command.tex)));
  }
  const macroErrors = findings.filter((f) => f.severity === 'error').length;
  if (command.json) {
    const report = jsonReport(version, checked);
    io.stdout(`${JSON.stringify(syncing ? { ...report, sync: findingsJson(findings) } : report, null, 2)}\n`);
  } else {
    const lines = checked.flatMap((c) => (command.results ? [...resultLines(c), ...problemLines(c)] : problemLines(c)));
    lines.push(...findingLines(findings));
    lines.push(summaryLine(checked.length, counts));
    if (syncing) lines.push(syncSummary(command.tex, command.papers, macroErrors));
    if (wrote) lines.push(wrote);
    io.stdout(`${lines.join('\n')}\n`);
  }
  return counts.errors > 0 || macroErrors > 0 ? EXIT_ERRORS_FOUND : EXIT_OK;
}

function syncSummary(tex: string | undefined, papers: readonly string[], errors: number): string {
  const checkedWhat = [...(tex !== undefined ? [tex] : []), ...papers].join(', ');
  return errors === 0
    ? `macros: ${checkedWhat} in sync with the computation`
    : `macros: ${errors} problem${errors === 1 ? '' : 's'} in ${checkedWhat}`;
}

/** `wedgework export --tex OUT FILE...`: the macros of every result, written to OUT unless names clash. */
async function runExport(
  command: { files: string[]; normalization: Normalization; tex: string },
  texts: readonly string[],
  version: string,
  io: CliIo,
): Promise<number> {
  if (io.sameFile) {
    for (const file of command.files) {
      if (await io.sameFile(file, command.tex)) {
        io.stderr(`wedgework: --tex ${command.tex} is the same file as ${file}: the macros go to a file of its own, never over an input\n`);
        return EXIT_USAGE;
      }
    }
  }
  // Only a macros file written before is replaced: never a paper or any other file that happens to have the name.
  let existing: string | undefined;
  try {
    existing = await io.readFile(command.tex);
  } catch {
    existing = undefined;
  }
  if (existing !== undefined && existing.trim().length > 0 && !/^% Wedgework \S+: LaTeX macros/.test(withoutByteOrderMark(existing))) {
    io.stderr(`wedgework: ${command.tex} exists and is not a macros file written by wedgework export; it is left as it is (choose another name or remove it)\n`);
    return EXIT_USAGE;
  }
  const checked: CheckedFile[] = command.files.map((file, i) => {
    const text = texts[i]!;
    return { file, text, analysis: analyze(text, { evaluate: true, normalization: command.normalization }) };
  });
  const counts = tally(checked);
  const exported = buildExport(checked, version, command.tex, command.normalization);
  const lines = checked.flatMap((c) => problemLines(c));
  const problems = macroProblems(exported);
  lines.push(...findingLines(problems));
  lines.push(summaryLine(checked.length, counts));
  if (problems.length > 0) {
    lines.push(`nothing written to ${command.tex}: ${problems.length} macro problem${problems.length === 1 ? '' : 's'}`);
    io.stdout(`${lines.join('\n')}\n`);
    return EXIT_ERRORS_FOUND;
  }
  try {
    if (!io.writeFile) throw new Error('writing files is not available here');
    await io.writeFile(command.tex, exported.text);
  } catch (error) {
    io.stderr(`wedgework: cannot write ${command.tex}: ${reason(error)}\n`);
    return EXIT_USAGE;
  }
  const n = exported.set.macros.length;
  lines.push(`wrote ${n} macro${n === 1 ? '' : 's'} to ${command.tex}`);
  io.stdout(`${lines.join('\n')}\n`);
  return counts.errors > 0 ? EXIT_ERRORS_FOUND : EXIT_OK;
}
