/**
 * Test cases for syntax problems written as one annotated string: the input,
 * with the expected problem marked underneath the offending text, e.g.
 *
 *     vector p = (1, 0, 2
 *     #                 ^ syntax/missing-token
 *
 * An annotation line is `#`, spaces, a run of carets and a problem code. The
 * carets mark columns (UTF-16 code units) of the nearest source line above it.
 * To mark column 0 the line starts with the carets themselves (no `#`).
 * Annotation lines are removed before parsing, so they do not shift the
 * offsets of the text under test.
 */
import assert from 'node:assert/strict';
import { parseProgram, type ParseResult } from '../../server/src/language/parse.js';
import type { Span } from '../../server/src/language/types.js';

const ANNOTATION = /^(#\s*|)(\^+)\s+(\S+)\s*$/;

export interface ExpectedProblem {
  code: string;
  span: Span;
}

export interface AnnotatedSource {
  text: string;
  expected: ExpectedProblem[];
}

/** Removes the indentation common to all non-blank lines, and a leading and trailing blank line. */
export function dedent(source: string): string {
  const lines = source.replace(/^\n/, '').replace(/\n[ \t]*$/, '').split('\n');
  const indents = lines.filter((l) => l.trim() !== '').map((l) => l.length - l.trimStart().length);
  const common = indents.length > 0 ? Math.min(...indents) : 0;
  return lines.map((l) => l.slice(common)).join('\n');
}

export function readAnnotated(source: string): AnnotatedSource {
  const kept: string[] = [];
  const expected: ExpectedProblem[] = [];
  let offset = 0;
  let previousLineStart: number | undefined;
  for (const line of dedent(source).split('\n')) {
    const match = ANNOTATION.exec(line);
    if (match) {
      if (previousLineStart === undefined) throw new Error(`annotation before any source line: ${line}`);
      const column = match[1]!.length;
      expected.push({
        code: match[3]!,
        span: { start: previousLineStart + column, end: previousLineStart + column + match[2]!.length },
      });
      continue;
    }
    kept.push(line);
    previousLineStart = offset;
    offset += line.length + 1;
  }
  return { text: kept.join('\n'), expected };
}

function describe(text: string, problem: ExpectedProblem): string {
  return `${problem.code} at ${problem.span.start}-${problem.span.end} ${JSON.stringify(text.slice(problem.span.start, problem.span.end))}`;
}

/** Parses the annotated input and asserts that exactly the marked problems are reported. */
export function expectProblems(source: string): ParseResult & { text: string } {
  const { text, expected } = readAnnotated(source);
  const result = parseProgram(text);
  const order = (a: ExpectedProblem, b: ExpectedProblem) => a.span.start - b.span.start || a.code.localeCompare(b.code);
  const actual = result.problems.map((p) => describe(text, p)).sort();
  const wanted = [...expected].sort(order).map((p) => describe(text, p)).sort();
  assert.deepEqual(actual, wanted, `problems of:\n${text}\nmessages: ${result.problems.map((p) => p.message).join(' | ')}`);
  return { ...result, text };
}
