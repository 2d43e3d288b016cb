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
  | { kind: 'check'; files: string[]; json: boolean; results: boolean; normalization: Normalization; latex?: string };

export class UsageError extends Error {}

export const USAGE = `Usage:
  wedgework check FILE... [--results] [--json] [--normalization raw|first-one|primitive|positive]
                           [--latex OUT.tex]
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

/** Whether two names on the command line name one file (same path once resolved; links are checked when writing). */
function sameName(a: string, b: string): boolean {
  return resolve(a) === resolve(b);
}

export function parseArgs(args: readonly string[]): Command {
  if (args.length === 0) throw new UsageError('no command given');
  const [command, ...rest] = args;
  if (command === '--help' || command === '-h' || command === 'help') return { kind: 'help' };
  if (command === '--version' || command === '-v') return { kind: 'version' };
  if (command !== 'check') {
    throw new UsageError(command!.startsWith('-') ? `unknown option '${command}'` : `unknown command '${command}'`);
  }

  const files: string[] = [];
  let json = false;
  let results = false;
  let normalization = DEFAULT_NORMALIZATION;
  let latex: string | undefined;
  let optionsEnded = false;
  for (let i = 0; i < rest.length; i++) {
    const arg = rest[i]!;
    if (optionsEnded || !arg.startsWith('-') || arg === '-') {
      files.push(arg);
    } else if (arg === '--') {
      optionsEnded = true;
    } else if (arg === '--help' || arg === '-h') {
      return { kind: 'help' };
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
  if (files.length === 0) throw new UsageError('check needs at least one FILE');
  if (latex !== undefined) {
    const clash = files.find((f) => sameName(f, latex!));
    if (clash !== undefined) throw new UsageError(`--latex ${latex} is one of the input files: the LaTeX goes to a file of its own, never over an input`);
  }
  return { kind: 'check', files, json, results, normalization, ...(latex !== undefined ? { latex } : {}) };
}
