/**
 * The rewrite "write this basis as its reduced basis" on a `rows [ … ]` or
 * `columns [ … ]` declaration of a subspace whose matrix is not already the
 * reduced row echelon basis. It reads the declaration from the text and the
 * reduced basis from the declaration's evaluated result.
 */
import type { DeclStmt } from '../ast.js';
import { parseProgram } from '../parse.js';
import type { Analysis, EditAction, Span } from '../types.js';
import { isRationalLiteral } from './literals.js';
import { matrixLiteralLike } from './matrix-text.js';

function touches(a: Span, b: Span): boolean {
  return a.start <= b.end && b.start <= a.end;
}

function transpose(rows: readonly string[][]): string[][] {
  return Array.from({ length: rows[0]?.length ?? 0 }, (_, j) => rows.map((r) => r[j]!));
}

export function reducedBasisActions(analysis: Analysis, range: Span): EditAction[] {
  if (!analysis.evaluated) return [];
  const text = analysis.text;
  const actions: EditAction[] = [];
  for (const s of parseProgram(text).program.statements) {
    if (s.type !== 'decl' || s.declKind !== 'subspace' || !touches(s.span, range)) continue;
    const value = (s as DeclStmt).value;
    if (value.type !== 'rows' && value.type !== 'columns') continue;
    const result = analysis.results.find((r) => r.kind === 'subspace' && r.name === s.name.name && r.span.start === s.span.start);
    const basis = result?.json.basis;
    if (!Array.isArray(basis) || basis.length === 0) continue;
    const rows = basis as string[][];
    if (!rows.every((r) => Array.isArray(r) && r.every((x) => typeof x === 'string' && isRationalLiteral(x)))) continue;
    const wanted = value.type === 'rows' ? rows : transpose(rows);
    const written = value.matrix.rows.map((r) => r.map((x) => x.text));
    const same = written.length === wanted.length && written.every((r, i) => r.length === wanted[i]!.length && r.every((x, j) => x === wanted[i]![j]));
    if (same) continue;
    const literal = matrixLiteralLike(text, value.matrix, wanted);
    if (!literal) continue;
    actions.push({
      title: `Rewrite the basis of ${s.name.name} as its reduced basis`,
      kind: 'rewrite',
      edits: [{ span: value.matrix.span, newText: literal }],
    });
  }
  return actions;
}
