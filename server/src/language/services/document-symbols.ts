/**
 * The outline of a document: one entry per declaration (spaces, vectors,
 * subspaces, multivectors, maps, flags) and per claim and show, in source
 * order, all at the top level. Claims and shows are entries of their own
 * rather than children of what they mention, because a claim may mention
 * several declarations (or none); an outline in file order reads like the file.
 * A space declared with a `basis` list has its basis vectors as children.
 *
 * Each entry's `span` is its whole statement and `selection` the name (for a
 * claim or show: its keyword). A declaration whose statement has a syntax error
 * is kept, marked in its detail, so the outline does not jump while typing.
 */
import type { Statement } from '../ast.js';
import type { Analysis, Span } from '../types.js';

export type OutlineKind = 'space' | 'basis' | 'vector' | 'subspace' | 'multivector' | 'map' | 'flag' | 'grassmannian' | 'class' | 'parameter' | 'claim' | 'show';

export interface OutlineEntry {
  name: string;
  kind: OutlineKind;
  detail: string;
  /** The whole statement. */
  span: Span;
  /** The part to select and reveal: the name, or a claim's or show's keyword. */
  selection: Span;
  children: OutlineEntry[];
}

/** The statement's text after its keyword, on one line, comments left out, shortened past 60 characters. */
function statementWords(text: string, s: Statement): string {
  const words = text
    .slice(s.keyword.end, s.span.end)
    .replace(/#[^\r\n]*/g, ' ')
    .replace(/\s+/g, ' ')
    .trim();
  return words.length > 60 ? `${words.slice(0, 59)}…` : words;
}

function entryOf(text: string, s: Statement): OutlineEntry | undefined {
  const entry = (name: string, kind: OutlineKind, detail: string, selection: Span, children: OutlineEntry[] = []): OutlineEntry => ({
    name,
    kind,
    detail,
    span: s.span,
    selection,
    children,
  });
  switch (s.type) {
    case 'space': {
      const basis = (s.basis ?? []).map((b) => ({
        name: b.name,
        kind: 'basis' as const,
        detail: `basis vector of ${s.name.name}`,
        span: b.span,
        selection: b.span,
        children: [],
      }));
      return entry(s.name.name, 'space', `dim ${s.dim.text}`, s.name.span, basis);
    }
    case 'decl':
      return entry(s.name.name, s.declKind, s.inSpace ? `${s.declKind} in ${s.inSpace.name}` : s.declKind, s.name.span);
    case 'map':
      return entry(s.name.name, 'map', `${s.from.name} → ${s.to.name}`, s.name.span);
    case 'flag':
      return entry(s.name.name, 'flag', s.inSpace ? `flag in ${s.inSpace.name}` : 'flag', s.name.span);
    case 'claim':
      return entry(statementWords(text, s), 'claim', 'claim', s.keyword);
    case 'show':
      return entry(statementWords(text, s), 'show', 'show', s.keyword);
    case 'parameter':
      // One statement may name several parameters; the outline lists the first, the detail all of them.
      return entry(s.names[0]!.name, 'parameter', `parameter${s.names.length > 1 ? `s ${s.names.map((n) => n.name).join(', ')}` : ''}`, s.names[0]!.span);
    case 'field':
    case 'normalize':
    case 'convention':
      return undefined;
  }
}

const DECLARING: ReadonlySet<string> = new Set(['space', 'vector', 'subspace', 'multivector', 'map', 'flag', 'grassmannian', 'class', 'parameter']);

export function documentSymbols(analysis: Analysis): OutlineEntry[] {
  const facts = analysis.syntax;
  if (!facts) return [];
  const entries: OutlineEntry[] = [];
  for (const s of facts.program.statements) {
    const entry = entryOf(analysis.text, s);
    if (entry) entries.push(entry);
  }
  for (const d of facts.program.dropped ?? []) {
    if (d.declares && DECLARING.has(d.kind)) {
      entries.push({
        name: d.declares.name,
        kind: d.kind as OutlineKind,
        detail: `${d.kind} (syntax error)`,
        span: d.span,
        selection: d.declares.span,
        children: [],
      });
    }
  }
  return entries.sort((a, b) => a.span.start - b.span.start);
}
