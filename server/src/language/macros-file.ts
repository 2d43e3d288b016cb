/**
 * The macros file a paper `\input`s: written from a set of macros with a header of comments that
 * records what it was computed from, and read back for the sync check. Its layout is documented in
 * docs/latex-macros.md.
 *
 * The file defines each macro with `\newcommand` on a line of its own, after a guard: reading the
 * same file a second time stops at the guard (`\endinput`), so `\input` twice is safe, while two
 * different exports that define one name make `\newcommand` stop with an error, as they should.
 */
import type { MacroDefinition } from './latex-macros.js';

/** One computation file the export was made from. */
export interface MacrosFileSource {
  /** The path as given to the tool (relative, as the paper's repository has it). */
  path: string;
  /** SHA-256 of the file's text (UTF-8, without a byte order mark), in hexadecimal. */
  sha256: string;
  /** The file's convention sentence (`Analysis.convention`). */
  convention: string;
}

export interface MacrosFileHeader {
  /** The tool's version (package.json). */
  version: string;
  sources: MacrosFileSource[];
  /** The command that writes this file again, e.g. `wedgework export --tex results.tex computation.wedge`. */
  refresh: string;
  /**
   * Letters and digits that name the guard of this export (the caller derives them from the sources'
   * hashes), so that a second `\input` of the same file is skipped and another export is not.
   */
  guard: string;
}

/** A comment line: a line break inside would end the comment early. */
function comment(text: string): string {
  return `% ${text.replace(/\s*[\r\n]+\s*/g, ' ')}`;
}

/** The whole file: header, guard, then one `\newcommand` per macro, each after a comment naming its statement. */
export function renderMacrosFile(header: MacrosFileHeader, macros: readonly MacroDefinition[]): string {
  const guard = `wedgework@macros@${header.guard.replace(/[^A-Za-z0-9]/g, '')}`;
  const lines = [
    comment(`Wedgework ${header.version}: LaTeX macros of computed results.`),
    comment(`Generated file, do not edit: refresh it, in the folder of this file, with  ${header.refresh}`),
    ...header.sources.map((s) => comment(`Source: ${s.path} sha256 ${s.sha256}`)),
    ...header.sources.map((s) => comment(`Convention of ${s.path}: ${s.convention.replace(/^Convention:\s*/, '')}`)),
    comment('Needs amsmath and amssymb. \\input it once or more: a second reading stops at the guard below.'),
    comment('Macro names and values: see docs/latex-macros.md of Wedgework.'),
    `\\expandafter\\ifx\\csname ${guard}\\endcsname\\relax\\else\\expandafter\\endinput\\fi`,
    `\\expandafter\\def\\csname ${guard}\\endcsname{}`,
  ];
  for (const m of macros) {
    lines.push(comment(`${m.origin.what} (${m.origin.file})`));
    lines.push(`\\newcommand{\\${m.name}}{${m.value}}`);
  }
  return `${lines.join('\n')}\n`;
}

/** A macro as the file defines it. */
export interface ParsedMacro {
  name: string;
  value: string;
  /** Offset of the `\newcommand` line in the file's text. */
  offset: number;
}

export interface ParsedMacrosFile {
  /** Whether the header says Wedgework wrote it. */
  generated: boolean;
  version?: string;
  sources: { path: string; sha256: string; offset: number }[];
  macros: ParsedMacro[];
}

/** Reads a macros file back: the header's version and sources, and every `\newcommand{\ww…}{…}` line. */
export function parseMacrosFile(text: string): ParsedMacrosFile {
  const parsed: ParsedMacrosFile = { generated: false, sources: [], macros: [] };
  const seen = new Set<string>();
  let offset = 0;
  for (const line of text.split(/(?<=\n)/)) {
    const body = line.replace(/\r?\n$/, '');
    const version = /^% Wedgework (\S+): LaTeX macros/.exec(body);
    const source = /^% Source: (.+) sha256 ([0-9a-f]{64})\s*$/.exec(body);
    const macro = /^\\newcommand\{\\(ww[A-Za-z]+)\}\{(.*)\}\s*$/.exec(body);
    if (version) {
      parsed.generated = true;
      parsed.version = version[1]!;
    } else if (source) {
      parsed.sources.push({ path: source[1]!, sha256: source[2]!, offset });
    } else if (macro && !seen.has(macro[1]!)) {
      seen.add(macro[1]!);
      parsed.macros.push({ name: macro[1]!, value: macro[2]!, offset });
    }
    offset += line.length;
  }
  return parsed;
}
