/**
 * The LaTeX macros export and its sync check, on the command line: the language layer builds,
 * renders, parses and compares the macros; here the sources are hashed and the findings become
 * `file:line:col` lines (docs/latex-macros.md describes both).
 */
import { createHash } from 'node:crypto';
import { basename, dirname, relative, resolve, sep } from 'node:path';
import {
  buildMacros,
  compareMacros,
  parseMacrosFile,
  renderMacrosFile,
  undefinedMacroUses,
  type MacroSet,
  type Normalization,
  type Span,
} from '../../server/src/language/index.js';
import { DEFAULT_NORMALIZATION } from './args.js';
import { LineIndex } from './positions.js';
import type { CheckedFile } from './report.js';

/** SHA-256 of a text in UTF-8, in hexadecimal. */
export function sha256(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** A finding of the export or the sync check, at a place in some file. */
export interface MacroFinding {
  file: string;
  text: string;
  offset: number;
  severity: 'error' | 'note';
  code?: string;
  message: string;
  related?: { file: string; text: string; offset: number; message: string }[];
}

/** A path as a shell word: quoted only when it needs to be. */
function shellWord(path: string): string {
  return /^[\w./@%+=:,-]+$/.test(path) ? path : `'${path.replace(/'/g, `'\\''`)}'`;
}

/** The command that writes the export again, as the header states it. */
export function refreshCommand(tex: string, files: readonly string[], normalization: Normalization): string {
  const option = normalization === DEFAULT_NORMALIZATION ? '' : ` --normalization ${normalization}`;
  return `wedgework export --tex ${shellWord(tex)}${option} ${files.map(shellWord).join(' ')}`;
}

export interface Export {
  set: MacroSet;
  text: string;
  /** Each checked file by the name the export calls it (its path from the macros file's folder). */
  files: Map<string, CheckedFile>;
}

/**
 * A computation file's path from the folder of the macros file, with `/` separators: the name the
 * header and the comments use, so that the export is the same text whichever folder the command runs
 * in (and the same as the editor's, which names sources the same way).
 */
export function exportPath(tex: string, file: string): string {
  return relative(dirname(resolve(tex)), resolve(file)).split(sep).join('/');
}

/** The macros of the checked files and the text of the macros file, computed in memory. */
export function buildExport(checked: readonly CheckedFile[], version: string, tex: string, normalization: Normalization): Export {
  const files = new Map(checked.map((c) => [exportPath(tex, c.file), c]));
  const set = buildMacros([...files].map(([file, c]) => ({ file, analysis: c.analysis })));
  const sources = [...files].map(([path, c]) => ({
    path,
    sha256: sha256(c.text),
    convention: c.analysis.convention ?? 'not evaluated',
  }));
  const guard = sha256(sources.map((s) => `${s.path}\u0000${s.sha256}`).join('\u0000')).slice(0, 16);
  const text = renderMacrosFile(
    {
      version,
      sources,
      // Run in the macros file's folder, where the sources' paths start.
      refresh: refreshCommand(basename(tex), [...files.keys()], normalization),
      guard,
    },
    set.macros,
  );
  return { set, text, files };
}

/** A statement's place, in the checked file the export names `file`, as the command line was given it. */
function place(files: Export['files'], file: string, span: Span) {
  const checked = files.get(file);
  return { file: checked?.file ?? file, text: checked?.text ?? '', offset: span.start };
}

/** Clashes and names without a spelling, at their statements. */
export function macroProblems(exported: Export): MacroFinding[] {
  const checked = exported.files;
  return exported.set.problems.map((p) => {
    const [first, ...others] = p.places;
    return {
      ...place(checked, first!.file, first!.span),
      severity: 'error',
      code: p.code,
      message: p.message,
      related: others.map((o) => ({ ...place(checked, o.file, o.span), message: `${o.what} gives it too` })),
    };
  });
}

/** Where two values first differ, shown with a little of the text around it in each. */
function firstDifference(was: string, now: string): { was: string; now: string } {
  let i = 0;
  while (i < was.length && i < now.length && was[i] === now[i]) i++;
  const from = Math.max(0, i - 24);
  const cut = (v: string) => `${from > 0 ? '...' : ''}${v.slice(from, i + 24)}${i + 24 < v.length ? '...' : ''}`;
  return { was: cut(was), now: cut(now) };
}

function differs(was: string, now: string): string {
  const d = firstDifference(was, now);
  return `${d.was} where the computation gives ${d.now}`;
}

/**
 * The sync check of the macros file `tex` (its text `texText`) against the export computed now:
 * each difference is an error at the statement that gives the macro, or at the file's line for a
 * macro that is gone; when only the header's sources or version differ, one note.
 */
export function syncFindings(exported: Export, tex: string, texText: string, version: string, refresh: string): MacroFinding[] {
  const checked = exported.files;
  const parsed = parseMacrosFile(texText);
  if (!parsed.generated) {
    return [{ file: tex, text: texText, offset: 0, severity: 'error', code: 'macro/not-an-export', message: `${tex} is not a macros file written by wedgework export (its first line says so); write it with: ${refresh}` }];
  }
  const findings: MacroFinding[] = [];
  const again = `refresh the export: ${refresh}`;
  for (const d of compareMacros(exported.set.macros, parsed)) {
    if (d.kind === 'changed') {
      findings.push({
        ...place(checked, d.expected.origin.file, d.expected.origin.span),
        severity: 'error',
        code: 'macro/stale',
        message: `\\${d.name} in ${tex} is not what ${d.expected.origin.what} gives now: ${tex} has ${differs(d.found.value, d.expected.value)}; ${again}`,
        related: [{ file: tex, text: texText, offset: d.found.offset, message: `the stale definition of \\${d.name}` }],
      });
    } else if (d.kind === 'missing') {
      findings.push({
        ...place(checked, d.expected.origin.file, d.expected.origin.span),
        severity: 'error',
        code: 'macro/missing',
        message: `${tex} does not define \\${d.name}, which ${d.expected.origin.what} gives; ${again}`,
      });
    } else {
      findings.push({
        file: tex,
        text: texText,
        offset: d.found.offset,
        severity: 'error',
        code: 'macro/gone',
        message: `${tex} defines \\${d.name}, which the computation no longer gives; ${again}`,
      });
    }
  }
  if (findings.length === 0) {
    const now = parseMacrosFile(exported.text);
    const sameSources =
      now.sources.length === parsed.sources.length &&
      now.sources.every((s, i) => s.path === parsed.sources[i]!.path && s.sha256 === parsed.sources[i]!.sha256);
    if (!sameSources || parsed.version !== version) {
      const changed = now.sources
        .filter((s) => !parsed.sources.some((p) => p.path === s.path && p.sha256 === s.sha256))
        .map((s) => s.path);
      const what = [
        ...(changed.length > 0 || now.sources.length !== parsed.sources.length ? [`the sources differ from the ones it records${changed.length ? ` (${changed.join(', ')})` : ''}`] : []),
        ...(parsed.version !== version ? [`it was written by Wedgework ${parsed.version ?? '(unknown)'}, this is ${version}`] : []),
      ];
      findings.push({
        file: tex,
        text: texText,
        offset: parsed.sources[0]?.offset ?? 0,
        severity: 'note',
        message: `every macro of ${tex} agrees with the computation, but ${what.join(' and ')}; refreshing it would update only its header`,
      });
    }
  }
  return findings;
}

/** Each `\ww…` a paper uses that the export does not define, at its place in the paper. */
export function paperFindings(exported: Export, paper: string, paperText: string, tex: string | undefined): MacroFinding[] {
  const defined = new Set(exported.set.macros.map((m) => m.name));
  return undefinedMacroUses(paperText, defined).map((u) => ({
    file: paper,
    text: paperText,
    offset: u.offset,
    severity: 'error',
    code: 'macro/undefined',
    message: `${paper} uses \\${u.name}, which the export${tex ? ` (${tex})` : ''} of these files does not define`,
  }));
}

function at(file: string, text: string, offset: number): string {
  const p = new LineIndex(text).position(offset);
  return `${file}:${p.line}:${p.column}`;
}

/** `file:line:col: error code: message` (or `note: message`), then one indented note per related place. */
export function findingLines(findings: readonly MacroFinding[]): string[] {
  return findings.flatMap((f) => [
    `${at(f.file, f.text, f.offset)}: ${f.severity === 'note' ? 'note' : `error ${f.code}`}: ${f.message}`,
    ...(f.related ?? []).map((r) => `  ${at(r.file, r.text, r.offset)}: note: ${r.message}`),
  ]);
}

/** The findings in the JSON document (`sync`, see docs/cli-json.md). */
export function findingsJson(findings: readonly MacroFinding[]): Record<string, unknown>[] {
  return findings.map((f) => {
    const position = new LineIndex(f.text).position(f.offset);
    return {
      file: f.file,
      ...(f.code ? { code: f.code } : {}),
      severity: f.severity === 'note' ? 'information' : 'error',
      message: f.message,
      position,
      related: (f.related ?? []).map((r) => ({ file: r.file, message: r.message, position: new LineIndex(r.text).position(r.offset) })),
    };
  });
}
