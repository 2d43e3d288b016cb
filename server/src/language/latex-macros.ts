/**
 * The LaTeX macros of evaluated files: which results get a macro, its name and its value, and the
 * clashes between names (the rule is documented in docs/latex-macros.md).
 *
 * - Every declared name (space, vector, subspace, multivector, map, flag) gets `\ww<Name>`, typesetting
 *   the result's LaTeX; a subspace also gets `\ww<Name>Dim` (its dimension), `\ww<Name>Basis` (its
 *   basis matrix) and `\ww<Name>Plucker` (its labelled Plücker vector, when the LaTeX form lists it); a
 *   multivector gets `\ww<Name>Form` (its terms) and `\ww<Name>Decomposition` (as a wedge of vectors)
 *   or `\ww<Name>Relation` (the quadratic relation it fails, with the value).
 * - Every `show` line gets `\ww<Words>`, from the names and numbers of its expression.
 * - Every claim gets `\wwClaim<Words>` (its outcome: the claim's LaTeX, or its verdict when it has none)
 *   and `\wwClaim<Words>Verdict` (`holds` or `false`).
 *
 * Pure: the caller reads the files and says what they are called.
 */
import { capitalise, codeMacroPart, MACRO_PREFIX, spellName } from './macro-names.js';
import type { Analysis, Result, ResultParts, Span } from './types.js';

/** One evaluated file and the name the output should call it by. */
export interface MacroSource {
  file: string;
  analysis: Analysis;
}

/** The statement a macro comes from. */
export interface MacroOrigin {
  file: string;
  /** The span of the statement in that file's text. */
  span: Span;
  /** The statement in a few words: `subspace W`, `show plucker(W)`, `claim dim W = 2`. */
  what: string;
}

export interface MacroDefinition {
  /** The control word without its backslash, e.g. `wwW`. */
  name: string;
  /** The replacement text: math wrapped in `\ensuremath{…}`, words in `\textup{…}`. */
  value: string;
  origin: MacroOrigin;
}

export interface MacroProblem {
  code: 'macro/clash' | 'macro/unspellable-name';
  message: string;
  /** The statements involved, the first one being where the problem is reported. */
  places: MacroOrigin[];
}

export interface MacroSet {
  /** In the order of the files and of the statements in each, one per name. */
  macros: MacroDefinition[];
  problems: MacroProblem[];
}

/** Math that reads the same in a sentence and in a display, on one line. */
function math(latex: string): string {
  return `\\ensuremath{${oneLine(latex)}}`;
}

function words(text: string): string {
  return `\\textup{${text}}`;
}

function oneLine(text: string): string {
  return text.replace(/\s*[\r\n]+\s*/g, ' ').trim();
}

/** The statement's code after its keyword (`claim dim W = 2` → `dim W = 2`), on one line. */
function codeAfterKeyword(analysis: Analysis, r: Result, keyword: string): string {
  const text = analysis.text.slice(r.span.start, r.span.end);
  return oneLine(text.replace(/#[^\n\r]*/g, ' ').replace(new RegExp(`^\\s*${keyword}\\b`), ''));
}

interface Candidate {
  name: string | undefined;
  value: string;
}

/** The macros one result gives, before clashes are looked at; an undefined name could not be spelled. */
function candidatesOf(analysis: Analysis, r: Result): { what: string; candidates: Candidate[] } {
  if (r.kind === 'claim') {
    const code = codeAfterKeyword(analysis, r, 'claim');
    const part = codeMacroPart(code);
    const base = part === undefined ? undefined : `${MACRO_PREFIX}Claim${part}`;
    const verdict = words(r.json.holds === true ? 'holds' : 'false');
    const outcome = r.latex.trim().length > 0 ? math(r.latex) : verdict;
    return {
      what: `claim ${code}`,
      candidates: [
        { name: base, value: outcome },
        { name: base && `${base}Verdict`, value: verdict },
      ],
    };
  }
  if (r.kind === 'show') {
    const code = codeAfterKeyword(analysis, r, 'show');
    const part = codeMacroPart(code);
    return {
      what: `show ${code}`,
      candidates: r.latex.trim().length > 0 ? [{ name: part === undefined ? undefined : `${MACRO_PREFIX}${capitalise(part)}`, value: math(r.latex) }] : [],
    };
  }
  const spelled = r.name === undefined ? undefined : spellName(r.name);
  const base = spelled === undefined ? undefined : `${MACRO_PREFIX}${spelled}`;
  const candidates: Candidate[] = [];
  if (r.latex.trim().length > 0) candidates.push({ name: base, value: math(r.latex) });
  // The pieces a result has, each as `\ww<Name><Piece>`, in this order.
  const pieces: [keyof ResultParts, string][] = [
    ['dim', 'Dim'],
    ['basis', 'Basis'],
    ['plucker', 'Plucker'],
    ['form', 'Form'],
    ['decomposition', 'Decomposition'],
    ['relation', 'Relation'],
  ];
  for (const [key, suffix] of pieces) {
    const piece = r.parts?.[key];
    if (piece !== undefined) candidates.push({ name: base && `${base}${suffix}`, value: math(piece) });
  }
  return { what: `${r.kind} ${r.name ?? ''}`.trim(), candidates };
}

/** Results that give macros: every one but the field statement, and only those with a declared name or a claim/show. */
function givesMacros(r: Result): boolean {
  if (r.kind === 'field') return false;
  return r.kind === 'claim' || r.kind === 'show' || r.name !== undefined;
}

/**
 * The macros of evaluated files, in file and statement order. A name given twice with one value is
 * one macro (the first statement is its origin); with two values it is a clash, reported with both
 * statements, and the name keeps its first value.
 */
export function buildMacros(sources: readonly MacroSource[]): MacroSet {
  const byName = new Map<string, MacroDefinition>();
  const macros: MacroDefinition[] = [];
  const problems: MacroProblem[] = [];
  for (const { file, analysis } of sources) {
    for (const r of analysis.results) {
      if (!givesMacros(r)) continue;
      const { what, candidates } = candidatesOf(analysis, r);
      const origin: MacroOrigin = { file, span: r.span, what };
      let unspellable = false;
      for (const c of candidates) {
        if (c.name === undefined) {
          unspellable = true;
          continue;
        }
        const earlier = byName.get(c.name);
        if (!earlier) {
          const definition = { name: c.name, value: c.value, origin };
          byName.set(c.name, definition);
          macros.push(definition);
        } else if (earlier.value !== c.value) {
          problems.push({
            code: 'macro/clash',
            message: `\\${c.name} would be given twice with different values: by ${earlier.origin.what} and by ${what}; rename one of them`,
            places: [origin, earlier.origin],
          });
        }
      }
      if (unspellable) {
        problems.push({
          code: 'macro/unspellable-name',
          message: `${what} gets no LaTeX macro: a macro name has letters only, and a character of its name or code has no spelling in ASCII letters (see docs/latex-macros.md)`,
          places: [origin],
        });
      }
    }
  }
  return { macros, problems };
}

/**
 * The macros the statement at `offset` gives, main macro first, as `\wwW`-style references (for
 * "copy macro reference" in the editor). Empty when no statement there gives one.
 */
export function macroReferencesAt(analysis: Analysis, offset: number): string[] {
  const here = analysis.results.filter((r) => givesMacros(r) && r.span.start <= offset && offset <= r.span.end);
  if (here.length === 0) return [];
  // The innermost statement, should statements ever nest.
  const r = here.reduce((best, x) => (x.span.end - x.span.start < best.span.end - best.span.start ? x : best));
  return candidatesOf(analysis, r).candidates.flatMap((c) => (c.name === undefined ? [] : [`\\${c.name}`]));
}
