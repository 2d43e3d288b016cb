/**
 * How each kind of value is shown: a one-line summary (code lens), markdown
 * (hover), LaTeX (copy as LaTeX) and exact JSON (CLI). Every form that carries
 * coordinates also carries the convention it was computed in.
 */
import { toDense, sortedTerms } from '../engine/multivector.js';
import { normalizePoint } from '../engine/normalize.js';
import { forEachSubset, binomialBig } from '../engine/subsets.js';
import { grassmannianDimension } from '../engine/grassmannian.js';
import { conventionSentence, conventionTag, coordinateLatex, coordinateName, indexLabel } from './conventions.js';
import { decompositionOf, describeRelation, relationFormula, relationLatex, relationValues } from './decomposition.js';
import { subspacePlucker, type Environment } from './environment.js';
import {
  blockMatrixLatex,
  matrixLatex,
  multivectorLatex,
  nameLatex,
  pointLatex,
} from './latex.js';
import { formatCombination, formatMatrix, formatMatrixInline, formatMultivector, formatPoint, formatTuple } from './text.js';
import type { Normalization } from './types.js';
import type { ChartValue, MultivectorValue, Scalar, SpaceInfo, SubspaceValue, Value, VectorValue } from './values.js';

export interface Presented {
  summary: string;
  /** Markdown body (the caller adds the title line). */
  hover: string;
  latex: string;
  json: Record<string, unknown>;
}

/** How many coordinates a lens shows before it abbreviates. */
const LENS_COORDINATES = 10;
/** How many labelled coordinates a hover lists before it abbreviates. */
const HOVER_COORDINATES = 60;

const s = (env: Environment, x: Scalar): string => env.F.format(x);

function conventionJson(env: Environment, applied: Normalization): Record<string, unknown> {
  return {
    field: env.F.name,
    order: env.convention.order,
    firstLabel: env.convention.firstLabel,
    layout: env.convention.layout,
    normalization: applied,
  };
}

function codeBlock(text: string): string {
  return '```text\n' + text + '\n```';
}

/** All C(n,k) labels in lexicographic order. */
function labelsOf(n: number, k: number): string[] {
  const out: string[] = [];
  forEachSubset(n, k, (subset) => {
    out.push(indexLabel(subset, n));
  });
  return out;
}

/** `p12 = 1   p13 = 3 …`, wrapped, at most `limit` entries. */
function labelledList(env: Environment, values: readonly Scalar[], n: number, k: number, limit: number): string {
  const entries: string[] = [];
  let i = 0;
  forEachSubset(n, k, (subset) => {
    if (i < limit) entries.push(`${coordinateName(subset, n)} = ${s(env, values[i])}`);
    i++;
  });
  const width = Math.max(...entries.map((e) => e.length));
  const perLine = Math.max(1, Math.floor(64 / (width + 3)));
  const lines: string[] = [];
  for (let j = 0; j < entries.length; j += perLine) {
    lines.push(entries.slice(j, j + perLine).map((e) => e.padEnd(width)).join('   ').trimEnd());
  }
  if (values.length > limit) lines.push(`… ${values.length - limit} more (${values.length} in all)`);
  return lines.join('\n');
}

function shortPoint(env: Environment, values: readonly Scalar[]): string {
  if (values.length <= LENS_COORDINATES) return formatPoint(env.F, values);
  return `[${values.slice(0, LENS_COORDINATES).map((x) => s(env, x)).join(' : ')} : … ] (${values.length} coordinates)`;
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

export interface PluckerData {
  raw: Scalar[];
  normalized: Scalar[];
  applied: Normalization;
  /** Whose minors the raw values are. */
  source: 'given' | 'reduced';
}

/** The Plücker vector of a subspace, raw and normalized. */
export function pluckerOfSubspace(env: Environment, w: SubspaceValue, dense: Scalar[]): PluckerData {
  const point = normalizePoint(env.F, dense, env.convention.normalization);
  return { raw: dense, normalized: point.values, applied: point.mode, source: w.given ? 'given' : 'reduced' };
}

export function presentSubspace(env: Environment, w: SubspaceValue, plucker: PluckerData | undefined): Presented {
  const n = w.space.dim;
  const k = w.basis.length;
  const lines: string[] = [];
  lines.push(`A point of the Grassmannian ${grassmannianWords(k, n)}; ambient space ${w.space.name} = ${env.F.name}^${n}.`);
  const json: Record<string, unknown> = {
    space: w.space.name,
    dim: k,
    ambientDim: n,
    grassmannian: `G(${k},${n})`,
    grassmannianDim: grassmannianDimension(k, n),
    basis: w.basis.map((r) => r.map((x) => s(env, x))),
    pivots: w.pivots.map((p) => p + env.convention.firstLabel),
  };
  let summary = `dim ${k} in ${w.space.name} · G(${k},${n})`;
  let latex = `\\operatorname{rowspace}${matrixLatex(env.F, w.basis.length ? w.basis : [new Array(n).fill(env.F.zero)])}`;
  if (plucker) {
    const count = plucker.raw.length;
    lines.push(
      '',
      `**Plücker coordinates** (${count} = C(${n},${k}), minors of the ${plucker.source === 'given' ? 'basis as given' : 'reduced basis'}):`,
      codeBlock(labelledList(env, plucker.raw, n, k, HOVER_COORDINATES)),
      `**Projective point** (${plucker.applied}): ${count <= HOVER_COORDINATES ? formatPoint(env.F, plucker.normalized) : shortPoint(env, plucker.normalized)}`,
    );
    summary += ` · ${shortPoint(env, plucker.normalized)} (${plucker.applied})`;
    json.plucker = {
      labels: labelsOf(n, k),
      raw: plucker.raw.map((x) => s(env, x)),
      normalized: plucker.normalized.map((x) => s(env, x)),
      normalization: plucker.applied,
      minorsOf: plucker.source,
    };
    const labels: string[] = [];
    forEachSubset(n, k, (subset) => {
      labels.push(coordinateLatex(subset, n));
    });
    latex =
      count <= 64
        ? `\\bigl(${labels.join(', ')}\\bigr) = ${pointLatex(env.F, plucker.normalized)}`
        : `${latex}, \\quad \\text{${count} Pl\\"ucker coordinates}`;
  }
  lines.push('', '**Reduced basis** (rows, reduced row echelon form):', codeBlock(k ? formatMatrix(env.F, w.basis) : '(the zero subspace)'));
  lines.push('', conventionSentence(env.convention, plucker?.applied));
  json.convention = conventionJson(env, plucker?.applied ?? env.convention.normalization);
  return { summary: `${summary} · ${conventionTag(env.convention, plucker?.applied)}`, hover: lines.join('\n'), latex, json };
}

export function presentVector(env: Environment, v: VectorValue): Presented {
  const tuple = formatTuple(env.F, v.coords);
  const combination = formatCombination(env.F, v.coords, v.space.basisNames);
  return {
    summary: `${tuple} in ${v.space.name}`,
    hover: [`${tuple} = ${combination}`, '', `A vector of ${v.space.name} = ${env.F.name}^${v.space.dim}, coordinates in the basis ${v.space.basisNames.join(', ')}.`, '', conventionSentence(env.convention)].join('\n'),
    latex: matrixLatex(env.F, [v.coords]),
    json: { space: v.space.name, coordinates: v.coords.map((x) => s(env, x)), convention: conventionJson(env, env.convention.normalization) },
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
  const json: Record<string, unknown> = {
    space: v.space.name,
    degree: k,
    terms: terms.map((t) => ({ indices: indexLabel(t.subset, n), coefficient: s(env, t.coeff) })),
  };
  let summary: string;
  let latex = multivectorLatex(F, v.mv, v.space.basisNames);
  if (terms.length === 0) {
    summary = `the zero element of ∧^${k} ${v.space.name}`;
    lines.push('', 'The zero multivector: no point of projective space and no subspace.');
    json.decomposable = false;
    json.zero = true;
  } else {
    const d = decompositionOf(env, v);
    const dense = toDense(F, v.mv);
    const point = normalizePoint(F, dense, env.convention.normalization);
    json.normalized = point.values.map((x) => s(env, x));
    json.normalization = point.mode;
    if (d.kind === 'decomposable') {
      summary = `decomposable · comes from a ${k}-dimensional subspace · ${shortPoint(env, point.values)} (${point.mode})`;
      lines.push(
        '',
        `**Decomposable**: it equals c · (b1 ∧ … ∧ b${k}) with c = ${s(env, d.scalar)} and the rows b1 … b${k} below, the reduced basis of the subspace it comes from (the vectors v with v ∧ ω = 0), a point of G(${k},${n}).`,
        codeBlock(formatMatrix(F, d.basis)),
      );
      json.decomposable = true;
      json.scalar = s(env, d.scalar);
      json.subspace = d.basis.map((r) => r.map((x) => s(env, x)));
      latex = `${latex} = ${F.isOne(d.scalar) ? '' : `${F.latex(d.scalar)}\\,`}${d.basis
        .map((r) => matrixLatex(F, [r]))
        .join(' \\wedge ')}`;
    } else if (d.kind === 'not-decomposable') {
      summary = `not decomposable · ${relationFormula(d.relation, n)} = ${s(env, d.relation.value)} ≠ 0 · divisors dim ${d.divisorDimension}`;
      lines.push(
        '',
        `**Not decomposable**: ${describeRelation(env, d.relation, n)}.`,
        '',
        `The vectors v with v ∧ ω = 0 form a subspace of dimension ${d.divisorDimension} (a decomposable element of degree ${k} has exactly ${k}).`,
      );
      json.decomposable = false;
      json.relation = {
        left: indexLabel(d.relation.left, n),
        right: indexLabel(d.relation.right, n),
        formula: relationFormula(d.relation, n),
        substituted: relationValues(env, d.relation),
        value: s(env, d.relation.value),
        terms: d.relation.terms.map((t) => ({
          sign: t.sign,
          first: indexLabel(t.first, n),
          second: indexLabel(t.second, n),
          firstValue: s(env, t.firstValue),
          secondValue: s(env, t.secondValue),
        })),
      };
      json.divisorDimension = d.divisorDimension;
      latex = relationLatex(env, d.relation, n);
    } else {
      summary = 'zero';
    }
    lines.push('', `**Projective point** (${point.mode}): ${dense.length <= HOVER_COORDINATES ? formatPoint(F, point.values) : shortPoint(env, point.values)}`);
  }
  lines.push('', conventionSentence(env.convention));
  json.convention = conventionJson(env, env.convention.normalization);
  return { summary: `${summary} · ${conventionTag(env.convention)}`, hover: lines.join('\n'), latex, json };
}

export function presentChart(env: Environment, c: ChartValue): Presented {
  const n = c.subspace.space.dim;
  const k = c.columns.length;
  const F = env.F;
  const sortedColumns = c.columns.slice().sort((a, b) => a - b);
  const label = indexLabel(sortedColumns, n);
  const others = c.otherColumns.map((i) => i + env.convention.firstLabel).join(', ');
  const ordered = [...c.columns, ...c.otherColumns];
  const permuted = c.full.map((row) => ordered.map((j) => row[j]));
  return {
    summary: `chart p${label} ≠ 0 · Y = ${formatMatrixInline(F, c.block)} (${k}×${n - k}, columns ${others})`,
    hover: [
      `The affine chart of G(${k},${n}) where p${label} ≠ 0: the unique basis with the identity in columns ${c.columns.map((i) => i + 1).join(', ')}.`,
      '',
      codeBlock(formatMatrix(F, c.full)),
      '',
      `Chart coordinates Y (${k}×${n - k} = ${k * (n - k)} free entries, columns ${others}):`,
      codeBlock(formatMatrix(F, c.block)),
      '',
      conventionSentence(env.convention),
    ].join('\n'),
    latex: `\\left[\\, I_{${k}} \\;\\middle|\\; Y \\,\\right] = ${blockMatrixLatex(F, permuted, k)}`,
    json: {
      columns: c.columns.map((i) => i + env.convention.firstLabel),
      otherColumns: c.otherColumns.map((i) => i + env.convention.firstLabel),
      block: c.block.map((r) => r.map((x) => s(env, x))),
      basis: c.full.map((r) => r.map((x) => s(env, x))),
      convention: conventionJson(env, env.convention.normalization),
    },
  };
}

export function presentSpace(env: Environment, space: SpaceInfo): Presented {
  return {
    summary: `${env.F.name}^${space.dim} · basis ${abbreviate(space.basisNames)}`,
    hover: `A ${space.dim}-dimensional space over ${env.F.name} with basis ${space.basisNames.join(', ')}${space.namedBasis ? '' : ' (the default names)'}.`,
    latex: `${nameLatex(space.name)} \\cong ${env.F.name === 'QQ' ? '\\mathbb{Q}' : `\\mathbb{F}_{${env.F.characteristic}}`}^{${space.dim}}`,
    json: { dim: space.dim, basis: space.basisNames, field: env.F.name },
  };
}

function abbreviate(names: readonly string[]): string {
  return names.length <= 6 ? names.join(' ') : `${names.slice(0, 3).join(' ')} … ${names[names.length - 1]}`;
}

/** Any value, for `show` lines. */
export function presentValue(env: Environment, v: Value): Presented {
  switch (v.t) {
    case 'subspace':
      return presentSubspaceWithPlucker(env, v);
    case 'vector':
      return presentVector(env, v);
    case 'multivector':
      return v.pluckerOf ? presentSubspaceWithPlucker(env, v.pluckerOf, toDense(env.F, v.mv)) : presentMultivector(env, v);
    case 'chart':
      return presentChart(env, v);
    case 'space':
      return presentSpace(env, v.space);
    case 'scalar':
      return { summary: s(env, v.value), hover: `${s(env, v.value)} in ${env.F.name}`, latex: env.F.latex(v.value), json: { value: s(env, v.value) } };
    case 'integer':
      return { summary: String(v.value), hover: String(v.value), latex: String(v.value), json: { value: v.value } };
    case 'point':
      return { summary: formatPoint(env.F, v.values), hover: formatPoint(env.F, v.values), latex: pointLatex(env.F, v.values), json: { point: v.values.map((x) => s(env, x)) } };
    case 'matrix':
    case 'indexset':
      return { summary: '', hover: '', latex: '', json: {} };
  }
}

/** A subspace with its Plücker vector, computed here unless the caller has it already. */
export function presentSubspaceWithPlucker(env: Environment, w: SubspaceValue, dense?: Scalar[]): Presented {
  if (!dense) {
    if (binomialBig(w.space.dim, w.basis.length) > BigInt(env.limits.maxCoordinates)) return presentSubspace(env, w, undefined);
    dense = toDense(env.F, subspacePlucker(env, w));
  }
  return presentSubspace(env, w, pluckerOfSubspace(env, w, dense));
}
