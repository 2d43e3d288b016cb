/**
 * Presentation of matroids, sign patterns, and lines of projective 3-space
 * (their meeting and their direction–moment form).
 */
import { binomialBig, unrankLex } from '../engine/subsets.js';
import { conventionJson, conventionSentence } from './conventions.js';
import type { Environment } from './environment.js';
import type { Presented } from './present.js';
import { formatPoint, formatTuple } from './text.js';
import type { DirectionMomentValue, MatroidValue, MeetValue, PositivityValue } from './values.js';
import { positivityImage } from './svg/value-images.js';

const TOLERANCE_NOTE =
  'Exact answers computed from rounded measurements carry no tolerance: verify them with your own methods and the codes and practice that apply.';

function setList(env: Environment, sets: readonly number[][], n: number, limit = 40): string {
  const shown = sets.slice(0, limit).map((s) => env.labels.label(s, n) || '∅');
  return shown.join(' ') + (sets.length > limit ? ` … (${sets.length} in all)` : '');
}

export function presentMatroid(env: Environment, m: MatroidValue): Presented {
  const n = m.subspace.space.dim;
  const total = binomialBig(n, m.rank);
  const positions = (xs: number[]) => (xs.length ? xs.map((x) => env.labels.position(x)).join(', ') : 'none');
  return {
    summary: `rank ${m.rank} on ${n} columns · ${m.bases.length} of ${total} sets are bases over ${m.field}${m.isUniform ? ' (uniform)' : ''} · loops ${positions(m.loops)} · coloops ${positions(m.coloops)}`,
    hover: [
      `The matroid of the columns of a basis of the subspace over **${m.field}** (the bases are the column sets with a nonzero Plücker coordinate, so they can change with the field): rank ${m.rank}, ${m.bases.length} of the C(${n},${m.rank}) = ${total} column sets are bases${m.isUniform ? ' — the uniform matroid' : ''}.`,
      '',
      `**Bases**: ${setList(env, m.bases, n)}`,
      '',
      `**Loops** (in no basis): ${positions(m.loops)}; **coloops** (in every basis): ${positions(m.coloops)}.`,
      '',
      conventionSentence(env.convention),
    ].join('\n'),
    latex: `\\mathcal{B} = \\{${m.bases.slice(0, 64).map((b) => env.labels.label(b, n)).join(', ')}\\}`,
    json: {
      field: m.field,
      rank: m.rank,
      bases: m.bases.map((b) => env.labels.label(b, n)),
      loops: m.loops.map((x) => env.labels.position(x)),
      coloops: m.coloops.map((x) => env.labels.position(x)),
      uniform: m.isUniform,
      convention: conventionJson(env.convention),
    },
  };
}

export function presentPositivity(env: Environment, p: PositivityValue): Presented {
  const n = p.subspace.space.dim;
  const k = p.subspace.basis.length;
  const symbol = (s: number) => (s > 0 ? '+' : s < 0 ? '−' : '0');
  const pattern = p.signs.map((s, i) => `${env.labels.label(unrankLex(i, n, k), n)}:${symbol(s)}`).join(' ');
  const image = positivityImage(env, p);
  const verdict = p.totallyPositive ? 'totally positive' : p.totallyNonnegative ? 'totally nonnegative (not totally positive)' : 'not totally nonnegative';
  return {
    summary: `${verdict} · signs ${p.signs.map(symbol).join('')}`,
    hover: [
      `The sign pattern of the Plücker vector (lexicographic): the subspace is **${verdict}** — totally nonnegative when all nonzero coordinates have one sign, totally positive when moreover none is zero.`,
      '',
      '```text\n' + pattern + '\n```',
      '',
      ...(image ? [image, ''] : []),
      conventionSentence(env.convention),
    ].join('\n'),
    latex: `\\operatorname{sign} = (${p.signs.map((s) => (s > 0 ? '+' : s < 0 ? '-' : '0')).join(',')})`,
    json: { totallyNonnegative: p.totallyNonnegative, totallyPositive: p.totallyPositive, signs: p.signs, convention: conventionJson(env.convention) },
  };
}

/** p12·q34 − p13·q24 + p14·q23 + p23·q14 − p24·q13 + p34·q12 in the file's labels. */
function kleinFormula(env: Environment): string {
  const pairs: [number[], number[], string][] = [
    [[0, 1], [2, 3], ''], [[0, 2], [1, 3], ' − '], [[0, 3], [1, 2], ' + '],
    [[1, 2], [0, 3], ' + '], [[1, 3], [0, 2], ' − '], [[2, 3], [0, 1], ' + '],
  ];
  return pairs.map(([a, b, sign]) => `${sign}${env.labels.name(a, 4)}·q${env.labels.label(b, 4)}`).join('');
}

export function presentMeet(env: Environment, m: MeetValue): Presented {
  const F = env.F;
  const words: Record<MeetValue['kind'], string> = {
    same: 'the same line',
    intersecting: 'meet in a point',
    parallel: 'parallel (they meet at infinity)',
    skew: 'skew (they do not meet)',
  };
  const lines = [
    `The two lines are **${words[m.kind]}**: the Klein pairing of their Plücker vectors p and q, ${kleinFormula(env)}, is ${F.format(m.pairing)} (zero exactly when they meet — parallel lines included).`,
  ];
  if (m.commonPoint) lines.push('', `Common point: ${formatPoint(F, m.commonPoint)}; common plane: ${formatPoint(F, m.commonPlane!)} (as a dual vector).`);
  if (!m.infinityDeclared && m.kind === 'intersecting') {
    lines.push('', 'No plane at infinity is declared (`convention homogeneous first` or `last`), so a meeting at infinity is not told apart.');
  }
  lines.push('', TOLERANCE_NOTE, '', conventionSentence(env.convention));
  return {
    summary: `${words[m.kind]} · pairing ${F.format(m.pairing)}${m.commonPoint ? ` · point ${formatPoint(F, m.commonPoint)}` : ''}`,
    hover: lines.join('\n'),
    latex: `\\langle L_1, L_2 \\rangle = ${F.latex(m.pairing)}`,
    json: {
      kind: m.kind,
      pairing: F.format(m.pairing),
      ...(m.commonPoint ? { commonPoint: m.commonPoint.map((x) => F.format(x)), commonPlane: m.commonPlane!.map((x) => F.format(x)) } : {}),
      infinityDeclared: m.infinityDeclared,
    },
  };
}

export function presentDirectionMoment(env: Environment, d: DirectionMomentValue): Presented {
  const F = env.F;
  return {
    summary: `d = ${formatTuple(F, d.direction)} · m = ${formatTuple(F, d.moment)} · ${env.convention.lines}, ${env.convention.moment}`,
    hover: [`Direction d = ${formatTuple(F, d.direction)}, moment m = ${formatTuple(F, d.moment)}; as a 6-vector ${formatTuple(F, d.coordinates)}.`, '', d.description, '', TOLERANCE_NOTE].join('\n'),
    latex: `(\\mathbf{d}; \\mathbf{m}) = (${d.direction.map((x) => F.latex(x)).join(', ')};\\ ${d.moment.map((x) => F.latex(x)).join(', ')})`,
    json: {
      direction: d.direction.map((x) => F.format(x)),
      moment: d.moment.map((x) => F.format(x)),
      coordinates: d.coordinates.map((x) => F.format(x)),
      convention: { ...conventionJson(env.convention), lines: env.convention.lines, moment: env.convention.moment, homogeneous: env.convention.homogeneous ?? 'first' },
    },
  };
}
