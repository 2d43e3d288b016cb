/**
 * Presentation of maps, flags, Schubert cells, quotients and compound
 * matrices: summary, hover, LaTeX and JSON, each with the convention used.
 */
import { FLAG_CONVENTION } from '../engine/flags.js';
import { LINEAR_MAP_CONVENTION, rankOfMap } from '../engine/linear-map.js';
import { SCHUBERT_CONVENTION } from '../engine/schubert.js';
import { forEachSubset } from '../engine/subsets.js';
import { conventionJson, conventionSentence } from './conventions.js';
import type { Environment } from './environment.js';
import { matrixLatex, nameLatex } from './latex.js';
import type { Presented } from './present.js';
import { formatMatrix, formatMatrixInline, formatTuple } from './text.js';
import type { CompoundValue, FlagValue, MapValue, QuotientValue, Scalar, SchubertValue } from './values.js';
import { schubertImage } from './svg/value-images.js';

function codeBlock(text: string): string {
  return '```text\n' + text + '\n```';
}

const strings = (env: Environment, rows: readonly (readonly Scalar[])[]) => rows.map((r) => r.map((x) => env.F.format(x)));

/** The matrix as the file's layout writes it: rows are f(e_i), or columns are. */
function mapMatrix(env: Environment, f: MapValue): Scalar[][] {
  if (env.convention.layout === 'rows') return f.matrix;
  return Array.from({ length: f.to.dim }, (_, j) => f.matrix.map((r) => r[j]));
}

export function presentMap(env: Environment, f: MapValue): Presented {
  const rank = rankOfMap(env.F, f.matrix, f.to.dim);
  const layoutSentence =
    env.convention.layout === 'rows'
      ? LINEAR_MAP_CONVENTION
      : `A linear map V → U is written as the (dim U)×(dim V) matrix whose column i is the image of the i-th basis vector (columns layout, v ↦ A·v).`;
  return {
    summary: `${f.from.name} → ${f.to.name} · rank ${rank} · kernel dim ${f.from.dim - rank} · image dim ${rank}`,
    hover: [
      `A linear map ${f.from.name} → ${f.to.name} (${env.F.name}^${f.from.dim} → ${env.F.name}^${f.to.dim}) of rank ${rank}: kernel of dimension ${f.from.dim - rank}, image of dimension ${rank}.`,
      '',
      codeBlock(formatMatrix(env.F, mapMatrix(env, f))),
      '',
      layoutSentence,
      '',
      conventionSentence(env.convention),
    ].join('\n'),
    latex: `${nameLatex(f.name)} = ${matrixLatex(env.F, mapMatrix(env, f))}`,
    json: { from: f.from.name, to: f.to.name, rank, matrix: strings(env, f.matrix), convention: conventionJson(env.convention) },
  };
}

export function presentFlag(env: Environment, flag: FlagValue): Presented {
  const origin = flag.origin === 'standard' ? 'the standard flag' : flag.origin === 'opposite' ? 'the opposite flag' : 'a flag given by vectors';
  return {
    summary: `${origin} of ${flag.space.name} · f1 … f${flag.space.dim} = ${formatMatrixInline(env.F, flag.rows)}`,
    hover: [
      `${origin[0]!.toUpperCase()}${origin.slice(1)} of ${flag.space.name}: F_i = span(f_1 … f_i), the vectors f_i being the rows below.`,
      '',
      codeBlock(formatMatrix(env.F, flag.rows)),
      '',
      FLAG_CONVENTION,
    ].join('\n'),
    latex: matrixLatex(env.F, flag.rows),
    json: { space: flag.space.name, origin: flag.origin, vectors: strings(env, flag.rows) },
  };
}

export function presentSchubert(env: Environment, c: SchubertValue): Presented {
  const n = c.subspace.space.dim;
  const k = c.partition.length;
  const jumps = c.jumps.map((j) => env.labels.position(j));
  const lambda = `(${c.partition.join(', ')})`;
  const conditions = c.conditions.map((d, i) => `dim(W ∩ F${i + 1}) = ${d}`).join('\n');
  const diagram = schubertImage(c);
  return {
    summary: `Schubert cell λ = ${lambda} · codim ${c.codimension} · dim ${c.cellDimension} in G(${k},${n}) · jumps ${jumps.join(', ')}`,
    hover: [
      `The Schubert cell of the subspace relative to ${c.flag.origin === 'vectors' ? 'the given flag' : `the ${c.flag.origin} flag`}: partition λ = ${lambda} in the ${k}×${n - k} box, codimension |λ| = ${c.codimension}, cell dimension ${c.cellDimension}; the flag positions where dim(W ∩ F_i) grows are ${jumps.join(', ')}.`,
      '',
      ...(diagram ? [diagram, ''] : []),
      '**Schubert conditions**:',
      codeBlock(conditions),
      '**Basis adapted to the flag**:',
      codeBlock(formatMatrix(env.F, c.echelon)),
      '',
      SCHUBERT_CONVENTION,
      '',
      conventionSentence(env.convention),
    ].join('\n'),
    latex: `\\lambda = ${lambda}, \\quad \\operatorname{codim} = ${c.codimension}`,
    json: {
      partition: c.partition,
      jumps,
      codimension: c.codimension,
      cellDimension: c.cellDimension,
      conditions: c.conditions,
      basis: strings(env, c.echelon),
      flag: c.flag.origin,
      convention: { ...conventionJson(env.convention), schubert: 'λ_j = n − k + j − i_j (codimension indexing)' },
    },
  };
}

export function presentQuotient(env: Environment, q: QuotientValue): Presented {
  const dim = q.space.dim - q.subspace.basis.length;
  return {
    summary: `dim ${dim} = ${q.space.dim} − ${q.subspace.basis.length} · representatives ${q.representatives.map((r) => formatTuple(env.F, r)).join(', ') || 'none'}`,
    hover: [
      `The quotient of ${q.space.name} by a ${q.subspace.basis.length}-dimensional subspace: dimension ${dim}. Its basis is represented by the standard basis vectors of the non-pivot columns of the reduced basis:`,
      '',
      codeBlock(q.representatives.length ? formatMatrix(env.F, q.representatives) : '(the zero space)'),
    ].join('\n'),
    latex: `\\dim = ${dim}`,
    json: { dim, representatives: strings(env, q.representatives) },
  };
}

export function presentCompound(env: Environment, c: CompoundValue): Presented {
  const rows: string[] = [];
  forEachSubset(c.map.from.dim, c.k, (s) => {
    rows.push(env.labels.label(s, c.map.from.dim));
  });
  const cols: string[] = [];
  forEachSubset(c.map.to.dim, c.k, (s) => {
    cols.push(env.labels.label(s, c.map.to.dim));
  });
  return {
    summary: `∧^${c.k} ${c.map.name}: ${rows.length}×${cols.length} compound matrix`,
    hover: [
      `The ${c.k}-th compound matrix of ${c.map.name}, the induced map ∧^${c.k} ${c.map.from.name} → ∧^${c.k} ${c.map.to.name}: entry (I, J) is the minor of ${c.map.name}'s matrix on rows I and columns J; rows I = ${rows.join(', ')}, columns J = ${cols.join(', ')} (lexicographic). A Plücker vector (a row) maps to its product with it (Cauchy–Binet).`,
      '',
      codeBlock(formatMatrix(env.F, c.matrix)),
      '',
      conventionSentence(env.convention),
    ].join('\n'),
    latex: matrixLatex(env.F, c.matrix),
    json: { k: c.k, rows, columns: cols, matrix: strings(env, c.matrix), convention: conventionJson(env.convention) },
  };
}
