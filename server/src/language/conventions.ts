/**
 * The conventions every result is stated in. A Plücker vector means nothing
 * without them: two sources that disagree on index order or labels disagree on
 * every coordinate. Every hover, lens, CLI and LaTeX output names them.
 *
 * A file chooses them in header statements (`convention order colex labels 0
 * layout columns`, `normalize positive`); what it leaves open comes from the
 * workspace settings (the analyze options) and then the defaults below.
 */
import type { AnyField } from '../engine/fields.js';
import { binomial, forEachSubset, rankLex } from '../engine/subsets.js';
import type { ConventionStmt, NormalizeStmt, Program } from './ast.js';
import { NORMALIZATIONS, type Normalization, type Problem } from './types.js';

export type IndexOrder = 'lex' | 'colex';
export type Layout = 'rows' | 'columns';

export interface Convention {
  field: AnyField;
  normalization: Normalization;
  /** How index sets are listed: lexicographic (12, 13, 14, 23, …) or colexicographic (12, 13, 23, 14, …). */
  order: IndexOrder;
  /** The label of the first basis vector and coordinate: e1, p12… or e0, p01…. */
  firstLabel: 0 | 1;
  /** Whether a basis matrix is displayed with the basis vectors as its rows or as its columns. */
  layout: Layout;
  /** Lines of projective 3-space as 6-vectors: (direction, moment) or (moment, direction). */
  lines: 'direction-moment' | 'moment-direction';
  /** The moment of a line: point × direction (`pxd`) or direction × point (`dxp`). */
  moment: 'pxd' | 'dxp';
  /**
   * Which homogeneous coordinate of projective 3-space is 1 at finite points (the first or the last);
   * undefined until a file says so — and only then is there a plane at infinity to tell parallel lines apart.
   */
  homogeneous?: 'first' | 'last';
}

/** The parts of a convention a file can choose, without the field. */
export type FileConvention = Omit<Convention, 'field'>;

export const DEFAULT_CONVENTION: FileConvention = {
  normalization: 'primitive',
  order: 'lex',
  firstLabel: 1,
  layout: 'rows',
  lines: 'direction-moment',
  moment: 'pxd',
};


const NORMALIZATION_WORDS: Record<Normalization, string> = {
  raw: 'raw minors (no rescaling)',
  'first-one': 'first nonzero coordinate 1',
  primitive: 'primitive integer vector (gcd 1, first nonzero positive)',
  positive: 'positive representative (primitive, every coordinate ≥ 0)',
};

export function normalizationWords(n: Normalization): string {
  return NORMALIZATION_WORDS[n];
}

function fallbackWords(asked: Normalization, applied: Normalization): string {
  if (asked === applied) return '';
  if (asked === 'positive' && applied === 'primitive') return ' (asked for positive, but the coordinates have both signs)';
  return ` (asked for ${asked}, which needs the rationals)`;
}

/** The field with its construction: `GF(4) = GF(2)[a]/(a^2 + a + 1)` for a prime power, else its name. */
export function fieldWords(F: AnyField): string {
  const f = F as AnyField & { definingPolynomialText?: string; generatorName?: string };
  if (!f.definingPolynomialText || !f.generatorName) return F.name;
  const g = f.generatorName;
  return `${F.name} = GF(${F.characteristic})[${g}]/(${f.definingPolynomialText.replace(/x/g, g)})`;
}

/** One sentence naming every convention, for the end of a hover. */
export function conventionSentence(c: Convention, applied?: Normalization): string {
  const norm = applied ?? c.normalization;
  const order = c.order === 'lex' ? 'lexicographic' : 'colexicographic';
  return (
    `Convention: field ${fieldWords(c.field)}; index sets in ${order} order, labels from ${c.firstLabel}; ` +
    `basis vectors as ${c.layout}; projective points shown as ${pointWords(c, norm)}.`
  );
}

/** How points are scaled, in words; in a family (rational functions), primitive means coprime polynomials. */
function pointWords(c: Convention, norm: Normalization): string {
  const family = (c.field as { family?: { variables: readonly string[] } }).family;
  if (family && norm === 'primitive') {
    return `polynomials in ${family.variables.join(', ')} without common factor, the first nonzero one with a positive (over QQ) or 1 (otherwise) leading coefficient${c.normalization === 'positive' ? ' (asked for positive, which needs numbers)' : ''}`;
  }
  return `${normalizationWords(norm)}${fallbackWords(c.normalization, norm)}`;
}

/** A short tag for a lens line: `QQ, lex from 1, primitive` (and `, columns` when not rows). */
export function conventionTag(c: Convention, applied?: Normalization): string {
  return `${c.field.name}, ${c.order} from ${c.firstLabel}, ${applied ?? c.normalization}${c.layout === 'columns' ? ', columns' : ''}`;
}

/** The convention as exact JSON, for the CLI. */
export function conventionJson(c: Convention, applied?: Normalization): Record<string, unknown> {
  return {
    field: c.field.name,
    order: c.order,
    firstLabel: c.firstLabel,
    layout: c.layout,
    normalization: applied ?? c.normalization,
  };
}

/** Printed labels of index sets under a convention's first label. */
export class Labels {
  constructor(readonly first: 0 | 1) {}

  /** `13`, or `1,10` once some label of the space has two digits. */
  label(subset: readonly number[], n: number): string {
    const labels = subset.map((i) => i + this.first);
    return n - 1 + this.first <= 9 ? labels.join('') : labels.join(',');
  }

  /** `p13` */
  name(subset: readonly number[], n: number): string {
    return `p${this.label(subset, n)}`;
  }

  /** `p_{13}` */
  latex(subset: readonly number[], n: number): string {
    return `p_{${this.label(subset, n)}}`;
  }

  /** The label of one basis position. */
  position(i: number): number {
    return i + this.first;
  }
}

/**
 * The lexicographic ranks of the k-subsets of an n-set in the order the
 * convention lists them. Identity for `lex`; for `colex` the subsets are
 * ordered by their largest element first.
 *
 * Colex needs no sorting: reflecting every index i to n−1−i turns the
 * comparison from the largest element down into the lexicographic comparison
 * with the inequality reversed, so the reflections of the subsets, walked in
 * lexicographic order, list the subsets in colex order backwards.
 */
export function displayOrder(order: IndexOrder, n: number, k: number): number[] {
  const total = binomial(n, k);
  const out = new Array<number>(total);
  const reflected = new Array<number>(k);
  forEachSubset(n, k, (s, rank) => {
    if (order === 'lex') {
      out[rank] = rank;
      return;
    }
    for (let i = 0; i < k; i++) reflected[i] = n - 1 - s[k - 1 - i]!;
    out[total - 1 - rank] = rankLex(reflected, n);
  });
  return out;
}

/** The settings of a file's header statements, with problems for unknown or contradictory ones. */
export function readConventions(program: Program, defaults: Partial<FileConvention>): { convention: FileConvention; problems: Problem[] } {
  const problems: Problem[] = [];
  const chosen: Partial<FileConvention> = {};
  const sources: Partial<Record<keyof FileConvention, ConventionStmt | NormalizeStmt>> = {};
  const problem = (code: string, span: Problem['span'], message: string) => problems.push({ code, severity: 'error', message, span });

  const set = <K extends keyof FileConvention>(key: K, value: FileConvention[K], s: ConventionStmt | NormalizeStmt, span: Problem['span']) => {
    if (chosen[key] === undefined) {
      chosen[key] = value;
      sources[key] = s;
    } else if (chosen[key] !== value) {
      problems.push({
        code: 'type/duplicate-convention',
        severity: 'error',
        message: `the ${key === 'firstLabel' ? 'first label' : key} is already ${String(chosen[key])}; a file has one`,
        span,
        related: [{ span: sources[key]!.span, message: 'chosen here' }],
      });
    }
  };

  for (const s of program.statements) {
    if (s.type === 'normalize') {
      const mode = s.mode.name as Normalization;
      if (!NORMALIZATIONS.includes(mode)) {
        problem('type/unknown-normalization', s.mode.span, `unknown normalization '${s.mode.name}': choose raw, first-one, primitive or positive`);
      } else set('normalization', mode, s, s.span);
    } else if (s.type === 'convention') {
      for (const setting of s.settings) {
        const value = setting.value.name;
        switch (setting.key.name) {
          case 'order':
            if (value === 'lex' || value === 'colex') set('order', value, s, setting.span);
            else problem('type/unknown-convention', setting.value.span, `unknown order '${value}': choose lex or colex`);
            break;
          case 'labels':
            if (value === '0' || value === '1') set('firstLabel', Number(value) as 0 | 1, s, setting.span);
            else problem('type/unknown-convention', setting.value.span, `labels start at 0 or at 1, found '${value}'`);
            break;
          case 'layout':
          case 'basis':
            if (value === 'rows' || value === 'columns') set('layout', value, s, setting.span);
            else problem('type/unknown-convention', setting.value.span, `basis vectors are rows or columns, found '${value}'`);
            break;
          case 'normalize':
          case 'normalization':
            if (NORMALIZATIONS.includes(value as Normalization)) set('normalization', value as Normalization, s, setting.span);
            else problem('type/unknown-normalization', setting.value.span, `unknown normalization '${value}': choose raw, first-one, primitive or positive`);
            break;
          case 'lines':
            if (value === 'direction-moment' || value === 'moment-direction') set('lines', value, s, setting.span);
            else problem('type/unknown-convention', setting.value.span, `lines are direction-moment or moment-direction, found '${value}'`);
            break;
          case 'moment':
            if (value === 'pxd' || value === 'dxp') set('moment', value, s, setting.span);
            else problem('type/unknown-convention', setting.value.span, `the moment is pxd (point × direction) or dxp (direction × point), found '${value}'`);
            break;
          case 'homogeneous':
            if (value === 'first' || value === 'last') set('homogeneous', value, s, setting.span);
            else problem('type/unknown-convention', setting.value.span, `the homogeneous coordinate is the first or the last, found '${value}'`);
            break;
          default:
            problem(
              'type/unknown-convention',
              setting.key.span,
              `unknown convention '${setting.key.name}': the settings are order, labels, layout, normalize, lines, moment and homogeneous`,
            );
        }
      }
    }
  }
  return { convention: { ...DEFAULT_CONVENTION, ...stripUndefined(defaults), ...chosen }, problems };
}

function stripUndefined<T extends object>(o: T): Partial<T> {
  return Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as Partial<T>;
}

/** The default basis names of an n-dimensional space: e1 … en, or e0 … e(n−1) with labels from 0. */
export function defaultBasisNames(n: number, first: 0 | 1): string[] {
  return Array.from({ length: n }, (_, i) => `e${i + first}`);
}
