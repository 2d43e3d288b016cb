/**
 * The action "add a `show` line" on a declaration's name: a new line right
 * below the statement that shows the declared value — `show plucker(L)` for
 * a subspace (its Plücker vector as a projective point), `show L` otherwise.
 */
import type { EditAction, Result, ResultKind } from '../types.js';

/** Declarations a `show` line adds something to (a space or the field would only repeat its lens). */
const SHOWABLE: ReadonlySet<ResultKind> = new Set(['subspace', 'vector', 'multivector', 'map', 'flag']);

export function showLineText(result: Result): string | undefined {
  if (result.name === undefined || !SHOWABLE.has(result.kind)) return undefined;
  return result.kind === 'subspace' ? `show plucker(${result.name})` : `show ${result.name}`;
}

/** Where the line holding `offset` ends (before its line break), and the break the text uses there. */
function lineEnd(text: string, offset: number): { at: number; newline: string } {
  let at = offset;
  while (at < text.length && text[at] !== '\n' && text[at] !== '\r') at++;
  const newline = text.startsWith('\r\n', at) ? '\r\n' : text[at] === '\r' ? '\r' : '\n';
  return { at, newline };
}

/** The indentation of the line holding `offset`. */
function indentation(text: string, offset: number): string {
  let start = offset;
  while (start > 0 && text[start - 1] !== '\n' && text[start - 1] !== '\r') start--;
  return /^[ \t]*/.exec(text.slice(start))![0];
}

export function showLineAction(text: string, result: Result): EditAction | undefined {
  const line = showLineText(result);
  if (!line) return undefined;
  const end = lineEnd(text, result.span.end);
  // Offered once: not when the next line already shows the same thing.
  const next = text.slice(end.at + end.newline.length).split(/\r\n|\r|\n/, 1)[0] ?? '';
  if (next.trim().replace(/\s+/g, ' ') === line) return undefined;
  return {
    title: `Add '${line}' below`,
    kind: 'insert',
    edits: [{ span: { start: end.at, end: end.at }, newText: `${end.newline}${indentation(text, result.span.start)}${line}` }],
  };
}
