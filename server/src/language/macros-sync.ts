/**
 * The sync check between a macros file and the computation it came from, and the macros a paper uses.
 * Pure: the caller regenerates the macros in memory (`buildMacros`) and reads the files.
 */
import type { MacroDefinition } from './latex-macros.js';
import type { ParsedMacro, ParsedMacrosFile } from './macros-file.js';

/**
 * One way the file and the computation disagree: a macro whose value `changed`, one the file is
 * `missing`, or one the file defines that the computation no longer gives (`gone`).
 */
export type MacroDifference =
  | { kind: 'changed'; name: string; expected: MacroDefinition; found: ParsedMacro }
  | { kind: 'missing'; name: string; expected: MacroDefinition }
  | { kind: 'gone'; name: string; found: ParsedMacro };

/** The differences, in the order of the computation's macros, then those gone, in the file's order. */
export function compareMacros(expected: readonly MacroDefinition[], file: ParsedMacrosFile): MacroDifference[] {
  const found = new Map(file.macros.map((m) => [m.name, m]));
  const names = new Set(expected.map((m) => m.name));
  const differences: MacroDifference[] = [];
  for (const m of expected) {
    const f = found.get(m.name);
    if (!f) differences.push({ kind: 'missing', name: m.name, expected: m });
    else if (f.value !== m.value) differences.push({ kind: 'changed', name: m.name, expected: m, found: f });
  }
  for (const f of file.macros) {
    if (!names.has(f.name)) differences.push({ kind: 'gone', name: f.name, found: f });
  }
  return differences;
}

/** A use of a `\ww…` macro in a LaTeX document. */
export interface MacroUse {
  name: string;
  /** Offset of the backslash. */
  offset: number;
}

/**
 * Every use of a control word `\ww<letters>` in a LaTeX text, outside comments. A control word ends
 * at the first character that is not a letter, as TeX reads it; `\\ww` is a line break followed by
 * text, not a macro.
 */
export function macroUses(text: string): MacroUse[] {
  const uses: MacroUse[] = [];
  const pattern = /\\(?:\\|%|(ww[A-Za-z]+)|[A-Za-z]+|.)|%[^\n\r]*/gs;
  for (const m of text.matchAll(pattern)) {
    if (m[1] !== undefined) uses.push({ name: m[1], offset: m.index! });
  }
  return uses;
}

/** The uses of macros that `defined` (names without the backslash) does not contain. */
export function undefinedMacroUses(text: string, defined: ReadonlySet<string>): MacroUse[] {
  return macroUses(text).filter((u) => !defined.has(u.name));
}
