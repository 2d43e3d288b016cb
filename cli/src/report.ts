/**
 * What `wedgework check` prints: problem lines with a summary, or one JSON
 * document (its shape is documented in docs/cli-json.md).
 */
import type { Analysis, Problem, Severity, Span } from '../../server/src/language/index.js';
import { LineIndex, type LineColumn } from './positions.js';

/** One checked file: its name as given on the command line, its text and what the analysis found. */
export interface CheckedFile {
  file: string;
  text: string;
  analysis: Analysis;
}

export interface JsonRange {
  start: LineColumn;
  /** Just after the last character (end-exclusive, like the spans it comes from). */
  end: LineColumn;
}

export interface JsonProblem {
  code: string;
  severity: Severity;
  message: string;
  range: JsonRange;
  related: { message: string; range: JsonRange }[];
}

export interface JsonResult {
  kind: string;
  name?: string;
  range: JsonRange;
  summary: string;
  json: Record<string, unknown>;
}

export interface JsonReport {
  version: string;
  files: { file: string; problems: JsonProblem[]; results: JsonResult[] }[];
}

/** Problems in the order of their place in the file (stable for equal places). */
export function sortedProblems(problems: readonly Problem[]): Problem[] {
  return [...problems].sort((a, b) => a.span.start - b.span.start || a.span.end - b.span.end);
}

/** A message on one line, so that every printed line stands for one problem. */
function oneLine(message: string): string {
  return message.replace(/\s*(\r\n|\r|\n)\s*/g, ' ');
}

function at(file: string, position: LineColumn): string {
  return `${file}:${position.line}:${position.column}`;
}

/** `file:line:col: severity code: message`, then one indented `note` line per related place. */
export function problemLines(checked: CheckedFile): string[] {
  const index = new LineIndex(checked.text);
  const lines: string[] = [];
  for (const p of sortedProblems(checked.analysis.problems)) {
    lines.push(`${at(checked.file, index.position(p.span.start))}: ${p.severity} ${p.code}: ${oneLine(p.message)}`);
    for (const r of p.related ?? []) {
      lines.push(`  ${at(checked.file, index.position(r.span.start))}: note: ${oneLine(r.message)}`);
    }
  }
  return lines;
}

/** `file:line:col: kind name: summary`, one line per result, in file order. */
export function resultLines(checked: CheckedFile): string[] {
  const index = new LineIndex(checked.text);
  return checked.analysis.results
    .filter((r) => r.kind !== 'field')
    .map((r) => `${at(checked.file, index.position(r.span.start))}: ${r.kind}${r.name !== undefined ? ` ${r.name}` : ''}: ${oneLine(r.summary)}`);
}

export interface Tally {
  errors: number;
  warnings: number;
  information: number;
}

export function tally(files: readonly CheckedFile[]): Tally {
  const counts: Tally = { errors: 0, warnings: 0, information: 0 };
  for (const f of files) {
    for (const p of f.analysis.problems) {
      if (p.severity === 'error') counts.errors++;
      else if (p.severity === 'warning') counts.warnings++;
      else counts.information++;
    }
  }
  return counts;
}

function plural(count: number, one: string, many: string): string {
  return `${count} ${count === 1 ? one : many}`;
}

/** e.g. `checked 2 files: 1 error, 0 warnings, 0 information messages` */
export function summaryLine(fileCount: number, counts: Tally): string {
  return (
    `checked ${plural(fileCount, 'file', 'files')}: ` +
    `${plural(counts.errors, 'error', 'errors')}, ` +
    `${plural(counts.warnings, 'warning', 'warnings')}, ` +
    `${plural(counts.information, 'information message', 'information messages')}`
  );
}

export function jsonReport(version: string, files: readonly CheckedFile[]): JsonReport {
  return {
    version,
    files: files.map(({ file, text, analysis }) => {
      const index = new LineIndex(text);
      const range = (span: Span): JsonRange => ({ start: index.position(span.start), end: index.position(span.end) });
      return {
        file,
        problems: sortedProblems(analysis.problems).map((p) => ({
          code: p.code,
          severity: p.severity,
          message: p.message,
          range: range(p.span),
          related: (p.related ?? []).map((r) => ({ message: r.message, range: range(r.span) })),
        })),
        results: analysis.results.map(
          (r): JsonResult => ({
            kind: r.kind,
            ...(r.name !== undefined ? { name: r.name } : {}),
            range: range(r.span),
            summary: r.summary,
            json: r.json,
          }),
        ),
      };
    }),
  };
}
