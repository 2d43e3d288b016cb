/**
 * The server side of the editor's LaTeX macros commands (docs/latex-macros.md): which macros the
 * statement at the cursor gives, and the text of the macros file of a document. Both answer data;
 * the client copies it or writes it where the user chose. The server writes nothing.
 */
import { createHash } from 'node:crypto';
import packageJson from '../../../package.json' with { type: 'json' };
import { buildMacros, macroReferencesAt, renderMacrosFile, type Analysis } from '../language/index.js';

/** Answers the macro references (`\wwW`, …) of the statement at an offset: arguments [uri, offset]. */
export const MACRO_REFERENCES_COMMAND = 'wedgework.server.macroReferences';
/** Answers the macros file of a document: arguments [uri, source path, target path, normalization]. */
export const EXPORT_MACROS_COMMAND = 'wedgework.server.exportMacros';

export const MACRO_COMMANDS = [MACRO_REFERENCES_COMMAND, EXPORT_MACROS_COMMAND];

export interface MacrosExport {
  /** The whole macros file. */
  text: string;
  macros: number;
  /** Errors of the document (false claims and the like); the macros are written regardless. */
  errors: number;
  /** Clashes and unspellable names, in words; when there are any, the file must not be written. */
  problems: string[];
}

function sha256(text: string): string {
  return createHash('sha256').update(text, 'utf8').digest('hex');
}

/** A path as a shell word for the refresh line: quoted only when it needs to be. */
function shellWord(path: string): string {
  return /^[\w./@%+=:,-]+$/.test(path) ? path : `'${path.replace(/'/g, `'\\''`)}'`;
}

/** The macro references of the statement at `offset` of an analysis of the document's current text. */
export function macroReferences(analysis: Analysis | undefined, text: string, offset: unknown): string[] {
  if (!analysis?.evaluated || analysis.text !== text || typeof offset !== 'number') return [];
  return macroReferencesAt(analysis, offset);
}

/**
 * The macros file of one evaluated document, as `wedgework export --tex TARGET SOURCE` writes it
 * (paths relative to the target's folder, as the client gives them).
 */
export function macrosExport(analysis: Analysis, source: string, target: string, normalization: string | undefined): MacrosExport {
  const set = buildMacros([{ file: source, analysis }]);
  const hash = sha256(analysis.text);
  const option = normalization && normalization !== 'primitive' ? ` --normalization ${normalization}` : '';
  const text = renderMacrosFile(
    {
      version: packageJson.version,
      sources: [{ path: source, sha256: hash, convention: analysis.convention ?? 'not evaluated' }],
      refresh: `wedgework export --tex ${shellWord(target)}${option} ${shellWord(source)}`,
      guard: sha256(`${source}\u0000${hash}`).slice(0, 16),
    },
    set.macros,
  );
  return {
    text,
    macros: set.macros.length,
    errors: analysis.problems.filter((p) => p.severity === 'error').length,
    problems: set.problems.map((p) => p.message),
  };
}
