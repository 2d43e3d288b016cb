/**
 * The command line, parsed into what to do. Bad input raises UsageError,
 * which the caller turns into exit status 2.
 */
import { resolve } from 'node:path';
import { NORMALIZATIONS, type Normalization } from '../../server/src/language/index.js';

export { NORMALIZATIONS };

/** The normalization used when neither the command line nor the file chooses one (as in the editor). */
export const DEFAULT_NORMALIZATION: Normalization = 'primitive';

export type Command =
  | { kind: 'help' }
  | { kind: 'version' }
  | {
      kind: 'check';
      files: string[];
      json: boolean;
      results: boolean;
      normalization: Normalization;
      latex?: string;
      /** The macros file to check against the files (`--tex`); read, never written. */
      tex?: string;
      /** Papers whose `\ww…` macros must all be defined by the export (`--paper`, repeatable). */
      papers: string[];
    }
  | { kind: 'export'; files: string[]; normalization: Normalization; tex: string };

export class UsageError extends Error {}

export const USAGE = `Usage:
  wedgework check FILE... [--results] [--json] [--normalization raw|first-one|primitive|positive]
                           [--latex OUT.tex] [--tex MACROS.tex] [--paper PAPER.tex]...
  wedgework export --tex MACROS.tex FILE... [--normalization raw|first-one|primitive|positive]
  wedgework --help
  wedgework --version

Checks .wedge files: parses them, evaluates every statement and checks every
claim. The .wedge files are only read, never written.

Options:
  --results          also print every result (declarations, claims, shows) as
                     FILE:LINE:COLUMN: KIND NAME: SUMMARY
  --json             print one JSON document instead of lines (see docs/cli-json.md)
  --normalization M  how projective points are scaled when the file has no
                     \`normalize\` statement: raw, first-one, primitive or positive
                     (default: ${DEFAULT_NORMALIZATION})
  --latex OUT.tex    also write every result of every file to OUT.tex, a LaTeX
                     fragment for \\input (amsmath, amssymb); OUT.tex must not
                     be one of the input files nor any .wedge file
  --tex MACROS.tex   check: compare MACROS.tex, a macros file written by
                     \`wedgework export\`, with what the files compute now; a
                     macro whose value changed, one missing and one the files no
                     longer give are errors (exit status 1)
                     export: write the LaTeX macros of every result of the
                     files to MACROS.tex (see docs/latex-macros.md); it must not
                     be one of the input files nor any .wedge file
  --paper PAPER.tex  check: report each \\ww... macro PAPER.tex uses that the
                     export does not define (repeatable)
  --                 treat every later argument as a file name
  -h, --help         print this help
  -v, --version      print the version

Problems are printed as FILE:LINE:COLUMN: SEVERITY CODE: MESSAGE (line and
column start at 1; columns count characters).

Exit status: 0 when no error was found, 1 when some file has an error,
2 on a usage error or when a file cannot be read, 70 on an internal error.
`;

function parseNormalization(value: string | undefined): Normalization {
  if (value === undefined || value === '') {
    throw new UsageError('--normalization needs a value: raw, first-one, primitive or positive');
  }
  if (!(NORMALIZATIONS as readonly string[]).includes(value)) {
    throw new UsageError(`unknown normalization '${value}' (choose raw, first-one, primitive or positive)`);
  }
  return value as Normalization;
}

/** The file `--latex` writes: any name but a `.wedge` one (those are only ever read). */
function parseLatexTarget(value: string | undefined): string {
  if (value === undefined || value === '' || value.startsWith('-')) throw new UsageError('--latex needs the name of the .tex file to write');
  if (/\.wedge$/i.test(value)) throw new UsageError(`--latex ${value}: will not write LaTeX into a .wedge file; name a .tex file`);
  return value;
}

/** The macros file of `--tex`: any name but a `.wedge` one (those are only ever read). */
function parseTexTarget(value: string | undefined): string {
  if (value === undefined || value === '' || value.startsWith('-')) throw new UsageError('--tex needs the name of the macros file (.tex)');
  if (/\.wedge$/i.test(value)) throw new UsageError(`--tex ${value}: the macros file is a .tex file, never a .wedge file`);
  return value;
}

function parsePaper(value: string | undefined): string {
  if (value === undefined || value === '' || value.startsWith('-')) throw new UsageError('--paper needs the name of the paper\'s .tex file');
  if (/\.wedge$/i.test(value)) throw new UsageError(`--paper ${value}: the paper is a .tex file, not a .wedge file`);
  return value;
}

/** Whether two names on the command line name one file (same path once resolved; links are checked when writing). */
function sameName(a: string, b: string): boolean {
  return resolve(a) === resolve(b);
}

export function parseArgs(args: readonly string[]): Command {
  if (args.length === 0) throw new UsageError('no command given');
  const [command, ...rest] = args;
  if (command === '--help' || command === '-h' || command === 'help') return { kind: 'help' };
  if (command === '--version' || command === '-v') return { kind: 'version' };
  if (command !== 'check' && command !== 'export') {
    throw new UsageError(command!.startsWith('-') ? `unknown option '${command}'` : `unknown command '${command}'`);
  }

  const files: string[] = [];
  let json = false;
  let results = false;
  let normalization = DEFAULT_NORMALIZATION;
  let latex: string | undefined;
  let tex: string | undefined;
  const papers: string[] = [];
  let optionsEnded = false;
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i]!;
    if (optionsEnded || !arg.startsWith('-') || arg === '-') {
      files.push(arg);
    } else if (arg === '--') {
      optionsEnded = true;
    } else if (arg === '--help' || arg === '-h') {
      return { kind: 'help' };
    } else if (arg === '--tex') {
      tex = parseTexTarget(rest[++i]);
    } else if (arg.startsWith('--tex=')) {
      tex = parseTexTarget(arg.slice('--tex='.length));
    } else if (command === 'export') {
      if (arg === '--normalization') normalization = parseNormalization(rest[++i]);
      else if (arg.startsWith('--normalization=')) normalization = parseNormalization(arg.slice('--normalization='.length));
      else throw new UsageError(`unknown option '${arg}' for export (it takes --tex and --normalization)`);
    } else if (arg === '--paper') {
      papers.push(parsePaper(rest[++i]));
    } else if (arg.startsWith('--paper=')) {
      papers.push(parsePaper(arg.slice('--paper='.length)));
    } else if (arg === '--json') {
      json = true;
    } else if (arg === '--results') {
      results = true;
    } else if (arg === '--normalization') {
      normalization = parseNormalization(rest[++i]);
    } else if (arg.startsWith('--normalization=')) {
      normalization = parseNormalization(arg.slice('--normalization='.length));
    } else if (arg === '--latex') {
      latex = parseLatexTarget(rest[++i]);
    } else if (arg.startsWith('--latex=')) {
      latex = parseLatexTarget(arg.slice('--latex='.length));
    } else {
      throw new UsageError(`unknown option '${arg}'`);
    }
  }
  if (files.length === 0) throw new UsageError(`${command} needs at least one FILE`);
  if (command === 'export') {
    if (tex === undefined) throw new UsageError('export needs --tex MACROS.tex, the file to write');
    const target = tex;
    const clash = files.find((f) => sameName(f, target));
    if (clash !== undefined) throw new UsageError(`--tex ${tex} is one of the input files: the macros go to a file of its own, never over an input`);
    return { kind: 'export', files, normalization, tex };
  }
  if (tex !== undefined && latex !== undefined && sameName(tex, latex)) {
    throw new UsageError(`--latex ${latex} would write over the macros file that --tex checks; name another file`);
  }
  if (latex !== undefined) {
    const clash = files.find((f) => sameName(f, latex!));
    if (clash !== undefined) throw new UsageError(`--latex ${latex} is one of the input files: the LaTeX goes to a file of its own, never over an input`);
  }
  return { kind: 'check', files, json, results, normalization, papers, ...(latex !== undefined ? { latex } : {}), ...(tex !== undefined ? { tex } : {}) };
}
