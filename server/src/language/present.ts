/**
 * How each kind of value is shown: a one-line summary (code lens), markdown
 * (hover), LaTeX (copy as LaTeX) and exact JSON (CLI). Every form that carries
 * coordinates also carries the convention it was computed in: index order,
 * labels and layout come from the file's convention (see `coordinates.ts`).
 */
import { familyZeros } from './parameters.js';
import { presentDegeneracy } from './present-families.js';
import { presentClass, presentGrassmannian, presentTransversals } from './present-schubert-calculus.js';
import type { AnyField } from '../engine/fields.js';
import { toDense, sortedTerms } from '../engine/multivector.js';
import { binomialBig } from '../engine/subsets.js';
import { grassmannianDimension } from '../engine/grassmannian.js';
import { finiteFieldOrder } from '../engine/finite-fields.js';
import { conventionJson, conventionSentence, conventionTag } from './conventions.js';
import { displayPoint, type DisplayedPoint } from './coordinates.js';
import { decompositionOf, describeRelation, relationFormula, relationLatex, relationValues } from './decomposition.js';
import { subspacePlucker, type Environment } from './environment.js';
import { blockMatrixLatex, matrixLatex, multivectorLatex, nameLatex, pointLatex } from './latex.js';
import { formatCombination, formatMatrix, formatMatrixInline, formatMultivector, formatPoint, formatTuple } from './text.js';
import { presentDirectionMoment, presentMatroid, presentMeet, presentPositivity } from './present-combinatorics.js';
import { presentCompound, presentFlag, presentMap, presentQuotient, presentSchubert } from './present-geometry.js';
import type { ChartValue, MultivectorValue, Scalar, SpaceInfo, SubspaceValue, Value, VectorValue } from './values.js';
import type { ResultParts } from './types.js';
import { basisImage, chartImage, pointPatternImage } from './svg/value-images.js';
import { defineLazy } from './lazy-property.js';

/** A picture as a paragraph of its own, or nothing when the value is past the legible sizes. */
function picture(markdown: string | undefined): string[] {
  return markdown ? ['', markdown] : [];
}

export interface Presented {
  summary: string;
  /** Markdown body (the caller adds the title line). */
  hover: string;
  latex: string;
  json: Record<string, unknown>;
  /** Pieces of `latex` a paper may cite on their own (`Result.parts`). */
  parts?: ResultParts;
}

/** How many coordinates a lens shows before it abbreviates. */
const LENS_COORDINATES = 10;
/** How many labelled coordinates a hover lists before it abbreviates. */
const HOVER_COORDINATES = 60;
/** Up to how many coordinates the LaTeX form lists them all. */
const LATEX_COORDINATES = 64;

const s = (env: Environment, x: Scalar): string => env.F.format(x);

function codeBlock(text: string): string {
  return '```text\n' + text + '\n```';
}

function transpose(rows: readonly (readonly Scalar[])[]): Scalar[][] {
  const ncols = rows[0]?.length ?? 0;
  return Array.from({ length: ncols }, (_, j) => rows.map((r) => r[j]));
}

/** A list of vectors as a matrix in the file's layout: the vectors as rows, or as columns. */
function laidOut(env: Environment, vectors: readonly (readonly Scalar[])[]): Scalar[][] {
  return env.convention.layout === 'columns' ? transpose(vectors) : vectors.map((r) => r.slice());
}

function matrixText(env: Environment, vectors: readonly (readonly Scalar[])[]): string {
  return formatMatrix(env.F, laidOut(env, vectors));
}

function matrixTex(env: Environment, vectors: readonly (readonly Scalar[])[]): string {
  return matrixLatex(env.F, laidOut(env, vectors));
}

/** `p12 = 1   p13 = 3 …`, wrapped, at most `limit` entries, in display order. */
function labelledList(env: Environment, point: DisplayedPoint, values: readonly Scalar[], limit: number): string {
  const entries = values.slice(0, limit).map((v, i) => `p${point.labelAt(i)} = ${s(env, v)}`);
  const width = Math.max(...entries.map((e) => e.length));
  const perLine = Math.max(1, Math.floor(64 / (width + 3)));
  const lines: string[] = [];
  for (let j = 0; j < entries.length; j += perLine) {
    lines.push(entries.slice(j, j + perLine).map((e) => e.padEnd(width)).join('   ').trimEnd());
  }
  if (values.length > limit) lines.push(`… ${values.length - limit} more (${values.length} in all)`);
  return lines.join('\n');
}

/** The normalized point on a lens line: all of it up to ten coordinates, else the first ten and the count. */
function shortPoint(env: Environment, point: DisplayedPoint): string {
  if (point.count <= LENS_COORDINATES) return formatPoint(env.F, point.normalized);
  // Only the coordinates shown are normalized: at G(10,20) that is 10 of 184,756.
  const first = Array.from({ length: LENS_COORDINATES }, (_, i) => s(env, point.normalizedAt(i)));
  return `[${first.join(' : ')} : …] (${point.count} coordinates)`;
}

/** The normalized point in a hover: all of it up to sixty coordinates, else as on a lens line. */
function hoverPoint(env: Environment, point: DisplayedPoint): string {
  return point.count <= HOVER_COORDINATES ? formatPoint(env.F, point.normalized) : shortPoint(env, point);
}

/** The labelled Plücker vector in LaTeX: (p_{12}, p_{13}, …) = [1 : 3 : …]. */
function labelledPointLatex(env: Environment, point: DisplayedPoint): string {
  return `\\bigl(${point.labels.map((l) => `p_{${l}}`).join(', ')}\\bigr) = ${pointLatex(env.F, point.normalized)}`;
}

/** What the points of G(k,n) are, projectively: points, lines, planes, (k−1)-planes of P^(n−1). */
function projectiveWords(k: number, n: number): string {
  const flats = k === 1 ? 'points' : k === 2 ? 'lines' : k === 3 ? 'planes' : `${k - 1}-planes`;
  return `${flats} of P^${n - 1}`;
}

function grassmannianWords(k: number, n: number): string {
  const projective = k >= 1 ? `; projectively, the ${projectiveWords(k, n)}` : '';
  return `G(${k},${n}) of ${k}-dimensional subspaces of a ${n}-dimensional space (dimension k(n−k) = ${grassmannianDimension(k, n)}${projective})`;
}

function layoutWords(env: Environment): string {
  return env.convention.layout === 'columns' ? 'columns' : 'rows';
}

/**
 * The `plucker` field of a subspace's JSON: every coordinate as exact text, for `--json`, made only when it
 * is read (the editor never reads it). Made here, apart from the presentation, so that it holds the field
 * and the point alone.
 */
function lazyPluckerJson(json: Record<string, unknown>, F: AnyField, point: DisplayedPoint, minorsOf: 'given' | 'reduced'): void {
  defineLazy(json, 'plucker', () => ({
    labels: point.labels,
    raw: point.raw.map((x) => F.format(x)),
    normalized: point.normalized.map((x) => F.format(x)),
    normalization: point.applied,
    minorsOf,
  }));
}

/** The point fields of a multivector's JSON, the long lists made only when read (as `lazyPluckerJson`). */
function lazyPointJson(json: Record<string, unknown>, F: AnyField, point: DisplayedPoint): void {
  defineLazy(json, 'labels', () => point.labels);
  defineLazy(json, 'normalized', () => point.normalized.map((x) => F.format(x)));
  json.normalization = point.applied;
}

export function presentSubspace(env: Environment, w: SubspaceValue, lexPlucker: Scalar[] | undefined): Presented {
  const n = w.space.dim;
  const k = w.basis.length;
  const lines: string[] = [];
  lines.push(`A point of the Grassmannian ${grassmannianWords(k, n)}; ambient space ${w.space.name} = ${env.F.name}^${n}.`);
  if (w.note) lines.push('', w.note);
  const json: Record<string, unknown> = {
    space: w.space.name,
    dim: k,
    ambientDim: n,
    grassmannian: `G(${k},${n})`,
    grassmannianDim: grassmannianDimension(k, n),
    basis: w.basis.map((r) => r.map((x) => s(env, x))),
    pivots: w.pivots.map((p) => env.labels.position(p)),
  };
  let summary = `dim ${k} in ${w.space.name} · G(${k},${n})`;
  let latex = `\\operatorname{span}${matrixTex(env, w.basis.length ? w.basis : [new Array(n).fill(env.F.zero)])}`;
  let applied = env.convention.normalization;
  const parts: ResultParts = { dim: String(k), basis: matrixTex(env, w.basis.length ? w.basis : [new Array(n).fill(env.F.zero)]) };
  if (lexPlucker) {
    const point = displayPoint(env, lexPlucker, n, k);
    applied = point.applied;
    const count = point.raw.length;
    const source = w.given ? 'the basis as given' : 'the reduced basis';
    lines.push(
      '',
      `**Plücker coordinates** (${count} = C(${n},${k}), minors of ${source}):`,
      codeBlock(labelledList(env, point, point.raw, HOVER_COORDINATES)),
      `**Projective point** (${point.applied}): ${hoverPoint(env, point)}`,
      ...picture(pointPatternImage(env, point)),
    );
    summary += ` · ${shortPoint(env, point)} (${point.applied})`;
    lazyPluckerJson(json, env.F, point, w.given ? 'given' : 'reduced');
    latex = count <= LATEX_COORDINATES ? labelledPointLatex(env, point) : `${latex}, \\quad \\text{${count} Pl\\"ucker coordinates}`;
    if (count <= LATEX_COORDINATES) parts.plucker = latex;
  }
  lines.push(
    '',
    `**Reduced basis** (as ${layoutWords(env)}, reduced row echelon form):`,
    codeBlock(k ? matrixText(env, w.basis) : '(the zero subspace)'),
    ...picture(basisImage(env, w.basis, 'Reduced basis')),
  );
  lines.push('', conventionSentence(env.convention, applied));
  json.convention = conventionJson(env.convention, applied);
  return { summary: `${summary} · ${conventionTag(env.convention, applied)}`, hover: lines.join('\n'), latex, json, parts };
}

export function presentVector(env: Environment, v: VectorValue): Presented {
  const tuple = formatTuple(env.F, v.coords);
  const combination = formatCombination(env.F, v.coords, v.space.basisNames);
  return {
    summary: `${tuple} in ${v.space.name}`,
    hover: [
      `${tuple} = ${combination}`,
      '',
      `A vector of ${v.space.name} = ${env.F.name}^${v.space.dim}, coordinates in the basis ${v.space.basisNames.join(', ')}.`,
      '',
      conventionSentence(env.convention),
    ].join('\n'),
    latex: matrixTex(env, [v.coords]),
    json: { space: v.space.name, coordinates: v.coords.map((x) => s(env, x)), convention: conventionJson(env.convention) },
  };
}

export function presentMultivector(env: Environment, v: MultivectorValue): Presented {
  const n = v.space.dim;
  const k = v.mv.k;
  const F = env.F;
  const terms = sortedTerms(v.mv);
  const lines: string[] = [];
  lines.push(
    `An element of ∧^${k} ${v.space.name} (degree ${k}; C(${n},${k}) = ${binomialBig(n, k)} coordinates, ${terms.length} nonzero).`,
    '',
    codeBlock(formatMultivector(F, v.mv, v.space.basisNames)),
  );
  if (v.note) lines.push('', v.note);
  const json: Record<string, unknown> = {
    space: v.space.name,
    degree: k,
    terms: terms.map((t) => ({ indices: env.labels.label(t.subset, n), coefficient: s(env, t.coeff) })),
  };
  let summary: string;
  let latex = multivectorLatex(F, v.mv, v.space.basisNames);
  const parts: ResultParts = { form: latex };
  let applied = env.convention.normalization;
  if (terms.length === 0) {
    summary = `the zero element of ∧^${k} ${v.space.name}`;
    lines.push('', 'The zero multivector: no point of projective space and no subspace.');
    json.decomposable = false;
    json.zero = true;
  } else {
    const d = decompositionOf(env, v);
    const countFits = binomialBig(n, k) <= BigInt(env.limits.maxCoordinates);
    const point = countFits ? displayPoint(env, toDense(F, v.mv), n, k) : undefined;
    if (point) {
      applied = point.applied;
      lazyPointJson(json, env.F, point);
    }
    const shown = point ? ` · ${shortPoint(env, point)} (${point.applied})` : '';
    if (d.kind === 'decomposable') {
      summary = `decomposable · comes from a ${k}-dimensional subspace${shown}`;
      lines.push(
        '',
        `**Decomposable**: it equals c · (b1 ∧ … ∧ b${k}) with c = ${s(env, d.scalar)} and b1 … b${k} the ${layoutWords(env)} below: the reduced basis of the subspace it comes from (the vectors v with v ∧ ω = 0), a point of G(${k},${n}).`,
        codeBlock(matrixText(env, d.basis)),
      );
      json.decomposable = true;
      json.scalar = s(env, d.scalar);
      json.subspace = d.basis.map((r) => r.map((x) => s(env, x)));
      latex = `${latex} = ${F.isOne(d.scalar) ? '' : `${F.latex(d.scalar)}\\,`}${d.basis.map((r) => matrixTex(env, [r])).join(' \\wedge ')}`;
      parts.decomposition = latex;
    } else if (d.kind === 'not-decomposable') {
      summary = `not decomposable · ${relationFormula(env, d.relation, n)} = ${s(env, d.relation.value)} ≠ 0 · divisors dim ${d.divisorDimension}`;
      lines.push(
        '',
        `**Not decomposable**: ${describeRelation(env, d.relation, n)}.`,
        '',
        `The vectors v with v ∧ ω = 0 form a subspace of dimension ${d.divisorDimension} (a decomposable element of degree ${k} has exactly ${k}).`,
      );
      json.decomposable = false;
      json.relation = {
        left: env.labels.label(d.relation.left, n),
        right: env.labels.label(d.relation.right, n),
        formula: relationFormula(env, d.relation, n),
        substituted: relationValues(env, d.relation),
        value: s(env, d.relation.value),
        terms: d.relation.terms.map((t) => ({
          sign: t.sign,
          first: env.labels.label(t.first, n),
          second: env.labels.label(t.second, n),
          firstValue: s(env, t.firstValue),
          secondValue: s(env, t.secondValue),
        })),
      };
      json.divisorDimension = d.divisorDimension;
      latex = relationLatex(env, d.relation, n);
      parts.relation = latex;
    } else {
      summary = 'zero';
    }
    if (point) lines.push('', `**Projective point** (${point.applied}): ${hoverPoint(env, point)}`, ...picture(pointPatternImage(env, point)));
  }
  lines.push('', conventionSentence(env.convention, applied));
  json.convention = conventionJson(env.convention, applied);
  return { summary: `${summary} · ${conventionTag(env.convention, applied)}`, hover: lines.join('\n'), latex, json, parts };
}

export function presentChart(env: Environment, c: ChartValue): Presented {
  const n = c.subspace.space.dim;
  const k = c.columns.length;
  const F = env.F;
  const sortedColumns = c.columns.slice().sort((a, b) => a - b);
  const name = env.labels.name(sortedColumns, n);
  const chartColumns = c.columns.map((i) => env.labels.position(i)).join(', ');
  const others = c.otherColumns.map((i) => env.labels.position(i)).join(', ');
  const ordered = [...c.columns, ...c.otherColumns];
  const permuted = c.full.map((row) => ordered.map((j) => row[j]));
  return {
    summary: `chart ${name} ≠ 0 · Y = ${formatMatrixInline(F, laidOut(env, c.block))} (${k}×${n - k}, columns ${others})`,
    hover: [
      `The affine chart of G(${k},${n}) where ${name} ≠ 0: the unique basis with the identity in columns ${chartColumns}.`,
      '',
      codeBlock(matrixText(env, c.full)),
      ...picture(chartImage(env, c)),
      '',
      `Chart coordinates Y (${k}×${n - k} = ${k * (n - k)} free entries, columns ${others}):`,
      codeBlock(matrixText(env, c.block)),
      ...(c.note ? ['', c.note] : []),
      '',
      conventionSentence(env.convention),
    ].join('\n'),
    latex:
      env.convention.layout === 'columns'
        ? `\\begin{pmatrix} I_{${k}} \\\\ Y \\end{pmatrix} = ${matrixLatex(F, transpose(permuted))}`
        : `\\left[\\, I_{${k}} \\;\\middle|\\; Y \\,\\right] = ${blockMatrixLatex(F, permuted, k)}`,
    json: {
      columns: c.columns.map((i) => env.labels.position(i)),
      otherColumns: c.otherColumns.map((i) => env.labels.position(i)),
      block: c.block.map((r) => r.map((x) => s(env, x))),
      basis: c.full.map((r) => r.map((x) => s(env, x))),
      convention: conventionJson(env.convention),
    },
  };
}

/** The file's field in LaTeX: \\mathbb{Q}, \\mathbb{F}_{7}, or with parameters \\mathbb{Q}(t). */
function fieldLatex(F: AnyField): string {
  const family = (F as { family?: { base: AnyField; variables: readonly string[] } }).family;
  if (family) return `${fieldLatex(family.base)}(${family.variables.join(', ')})`;
  return F.name === 'QQ' ? '\\mathbb{Q}' : `\\mathbb{F}_{${finiteFieldOrder(F) ?? F.characteristic}}`;
}

export function presentSpace(env: Environment, space: SpaceInfo): Presented {
  return {
    summary: `${env.F.name}^${space.dim} · basis ${abbreviate(space.basisNames)}`,
    hover: `A ${space.dim}-dimensional space over ${env.F.name} with basis ${space.basisNames.join(', ')}${space.namedBasis ? '' : ' (the default names)'}.`,
    latex: `${nameLatex(space.name)} \\cong ${fieldLatex(env.F)}^{${space.dim}}`,
    json: { dim: space.dim, basis: space.basisNames, field: env.F.name },
  };
}

function abbreviate(names: readonly string[]): string {
  return names.length <= 6 ? names.join(' ') : `${names.slice(0, 3).join(' ')} … ${names[names.length - 1]}`;
}

/** Any value, for declarations and `show` lines. */
export function presentValue(env: Environment, v: Value): Presented {
  switch (v.t) {
    case 'grassmannian':
      return presentGrassmannian(v);
    case 'class':
      return presentClass(v);
    case 'transversals':
      return presentTransversals(env, v);
    case 'degeneracy':
      return presentDegeneracy(env, v);
    case 'subspace':
      return presentSubspaceWithPlucker(env, v);
    case 'vector':
      return presentVector(env, v);
    case 'multivector':
      return v.pluckerOf ? presentSubspace(env, v.pluckerOf, toDense(env.F, v.mv)) : presentMultivector(env, v);
    case 'chart':
      return presentChart(env, v);
    case 'space':
      return presentSpace(env, v.space);
    case 'scalar': {
      const zeros = familyZeros(env, v.value);
      return {
        summary: s(env, v.value),
        hover: `${s(env, v.value)} in ${env.F.name}${zeros ? `\n\n${zeros.sentence}` : ''}`,
        latex: env.F.latex(v.value),
        json: { value: s(env, v.value), ...(zeros ? { zeros: zeros.values } : {}) },
      };
    }
    case 'integer':
      return { summary: String(v.value), hover: String(v.value), latex: String(v.value), json: { value: v.value } };
    case 'point':
      return { summary: formatPoint(env.F, v.values), hover: formatPoint(env.F, v.values), latex: pointLatex(env.F, v.values), json: { point: v.values.map((x) => s(env, x)) } };
    case 'matrix':
      return { summary: formatMatrixInline(env.F, v.rows), hover: codeBlock(formatMatrix(env.F, v.rows)), latex: matrixLatex(env.F, v.rows), json: { rows: v.rows.map((r) => r.map((x) => s(env, x))) } };
    case 'indexset':
      return { summary: '', hover: '', latex: '', json: {} };
    case 'map':
      return presentMap(env, v);
    case 'flag':
      return presentFlag(env, v);
    case 'schubert':
      return presentSchubert(env, v);
    case 'quotient':
      return presentQuotient(env, v);
    case 'compound':
      return presentCompound(env, v);
    case 'matroid':
      return presentMatroid(env, v);
    case 'positivity':
      return presentPositivity(env, v);
    case 'meet':
      return presentMeet(env, v);
    case 'direction-moment':
      return presentDirectionMoment(env, v);
    case 'count':
      return { summary: `${v.value}`, hover: `${v.value}: ${v.what}.`, latex: `${v.value}`, json: { value: v.value.toString(), what: v.what } };
    case 'subspaces': {
      const shown = v.bases.slice(0, 40).map((b) => formatMatrixInline(env.F, b)).join('\n');
      return {
        summary: `${v.bases.length} subspaces of dimension ${v.k} in ${v.space.name}`,
        hover: [`All ${v.bases.length} subspaces of dimension ${v.k} of ${v.space.name} over ${env.F.name}, each by its reduced basis:`, '', codeBlock(shown + (v.bases.length > 40 ? `\n… (${v.bases.length} in all)` : ''))].join('\n'),
        latex: `${v.bases.length}`,
        json: { count: v.bases.length, bases: v.bases.map((b) => b.map((r) => r.map((x) => s(env, x)))) },
      };
    }
  }
}

/** A subspace with its Plücker vector, unless C(n,k) is past the coordinate limit. */
export function presentSubspaceWithPlucker(env: Environment, w: SubspaceValue): Presented {
  if (binomialBig(w.space.dim, w.basis.length) > BigInt(env.limits.maxCoordinates)) return presentSubspace(env, w, undefined);
  return presentSubspace(env, w, toDense(env.F, subspacePlucker(env, w)));
}
