/**
 * Matroids and positivity of subspaces, and lines of projective 3-space:
 * the built-ins and the property claims (`claim W is totally nonnegative`).
 */
import { matroidOfPlucker, rankOfColumns } from '../engine/matroid.js';
import { cyclicShift, positivityOf } from '../engine/positivity.js';
import { describeDirectionMoment, directionMoment, fromDirectionMoment, kleinPairing, lineMeet, lineOfPlanes, onKleinQuadric, type DirectionMomentOptions } from '../engine/lines-p3.js';
import { decompose } from '../engine/decompose.js';
import { fromDense, toDense } from '../engine/multivector.js';
import { binomialBig, unrankLex } from '../engine/subsets.js';
import { EnumerationLimitError, enumerateSubspaces, gaussianBinomial } from '../engine/grassmannian.js';
import { finiteFieldOrder } from '../engine/finite-fields.js';
import { minimumDistance, subspaceDistance } from '../engine/subspace-codes.js';
import { rref } from '../engine/matrix.js';
import type { Call } from './ast.js';
import { subspacePlucker, type Environment } from './environment.js';
import { readIndexSet } from './arguments.js';
import { checkCoordinateLimit } from './expressions.js';
import { fail } from './failure.js';
import type { Evaluate } from './geometry.js';
import type { Span } from './types.js';
import { describeValue, type MatroidValue, type PositivityValue, type SpaceInfo, type SubspaceValue, type Value } from './values.js';

function subspaceArg(v: Value, span: Span, what: string): SubspaceValue {
  if (v.t !== 'subspace') fail('type/operand', span, `${what} takes a subspace, found ${describeValue(v)}`);
  return v;
}

export function matroidOfSubspace(env: Environment, w: SubspaceValue, span: Span): MatroidValue {
  checkCoordinateLimit(env, w.space.dim, w.basis.length, span);
  const m = matroidOfPlucker(env.F, toDense(env.F, subspacePlucker(env, w)), w.space.dim, w.basis.length);
  return { t: 'matroid', subspace: w, field: m.field, rank: m.rank, bases: m.bases, loops: m.loops, coloops: m.coloops, isUniform: m.isUniform };
}

export function positivityOfSubspace(env: Environment, w: SubspaceValue, span: Span): PositivityValue {
  if (!env.F.sign) fail('type/unordered-field', span, `positivity needs an ordered field such as QQ: signs are not defined over ${env.F.name}`);
  checkCoordinateLimit(env, w.space.dim, w.basis.length, span);
  const p = positivityOf(env.F, toDense(env.F, subspacePlucker(env, w)));
  return { t: 'positivity', subspace: w, totallyNonnegative: p.totallyNonnegative, totallyPositive: p.totallyPositive, signs: p.signPattern };
}

/** A line of projective 3-space: a 2-dimensional subspace of a 4-dimensional space. */
function lineArg(v: Value, span: Span): SubspaceValue {
  if (v.t !== 'subspace' || v.space.dim !== 4 || v.basis.length !== 2) {
    fail('type/not-a-line', span, `a line of projective 3-space is a 2-dimensional subspace of a 4-dimensional space, found ${describeValue(v)}${v.t === 'subspace' ? ` of dimension ${v.basis.length} in a ${v.space.dim}-dimensional space` : ''}`);
  }
  return v;
}

export function lineOptions(env: Environment): DirectionMomentOptions {
  return {
    order: env.convention.lines,
    momentSign: env.convention.moment === 'pxd' ? 'p×d' : 'd×p',
    homogeneousIndex: env.convention.homogeneous === 'last' ? 3 : 0,
  };
}

/** Rewrites the engine's 0-based point labels (x0 … x3, p01 …) into the file's labels. */
function relabel(env: Environment, text: string): string {
  if (env.convention.firstLabel === 0) return text;
  return text.replace(/\b([px])([0-3]+)\b/g, (_, letter: string, digits: string) => `${letter}${[...digits].map((d) => Number(d) + 1).join('')}`).replace(/\ba(\d)\b/g, (_, d: string) => `a${Number(d) + 1}`).replace(/\bb(\d)\b/g, (_, d: string) => `b${Number(d) + 1}`);
}

export function callCombinatorics(env: Environment, e: Call, evaluate: Evaluate): Value | undefined {
  const F = env.F;
  const arg = (i: number) => evaluate(e.args[i]!);
  const arity = (n: number, signature: string) => {
    if (e.args.length !== n) fail('type/arguments', e.span, `${signature} takes ${n} argument${n === 1 ? '' : 's'}, found ${e.args.length}`);
  };
  switch (e.callee.name) {
    case 'matroid': {
      arity(1, 'matroid(W)');
      return matroidOfSubspace(env, subspaceArg(arg(0), e.args[0]!.span, 'matroid'), e.span);
    }
    case 'positivity': {
      arity(1, 'positivity(W)');
      return positivityOfSubspace(env, subspaceArg(arg(0), e.args[0]!.span, 'positivity'), e.span);
    }
    case 'rank': {
      arity(2, 'rank(W, I)');
      const w = subspaceArg(arg(0), e.args[0]!.span, 'rank');
      const columns = readIndexSet(env, e.args[1]!, w.space);
      return { t: 'integer', value: rankOfColumns(F, w.basis, columns) };
    }
    case 'shift': {
      arity(1, 'shift(W)');
      const w = subspaceArg(arg(0), e.args[0]!.span, 'shift');
      const rows = cyclicShift(F, w.basis, w.space.dim, w.basis.length);
      const ech = rref(F, rows, w.space.dim);
      return {
        t: 'subspace',
        space: w.space,
        basis: ech.rows,
        pivots: ech.pivots,
        given: rows,
        note: `The cyclic shift: columns (v1, …, vn) become (v2, …, vn, (−1)^(k−1)·v1) with k = ${w.basis.length}, so p'_I = p_{I+1} and total nonnegativity is kept.`,
      };
    }
    case 'pairing': {
      arity(2, 'pairing(L1, L2)');
      const a = lineArg(arg(0), e.args[0]!.span);
      const b = lineArg(arg(1), e.args[1]!.span);
      return { t: 'scalar', value: kleinPairing(F, toDense(F, subspacePlucker(env, a)), toDense(F, subspacePlucker(env, b))) };
    }
    case 'meet': {
      arity(2, 'meet(L1, L2)');
      const a = lineArg(arg(0), e.args[0]!.span);
      const b = lineArg(arg(1), e.args[1]!.span);
      const h = env.convention.homogeneous;
      const infinity = h === undefined ? undefined : [0, 1, 2, 3].map((i) => (i === (h === 'last' ? 3 : 0) ? F.one : F.zero));
      // The pairing is bilinear in the two Plücker vectors: take the points as the user gave them, so it is det[a; b; c; d].
      const m = lineMeet(F, a.given ?? a.basis, b.given ?? b.basis, infinity);
      return {
        t: 'meet',
        kind: m.kind,
        pairing: m.pairing,
        ...(m.commonPoint ? { commonPoint: m.commonPoint } : {}),
        ...(m.commonPlane ? { commonPlane: m.commonPlane } : {}),
        infinityDeclared: h !== undefined,
      };
    }
    case 'direction_moment': {
      arity(1, 'direction_moment(L)');
      const l = lineArg(arg(0), e.args[0]!.span);
      const options = lineOptions(env);
      const dm = directionMoment(F, toDense(F, subspacePlucker(env, l)), options);
      return { t: 'direction-moment', direction: dm.direction, moment: dm.moment, coordinates: dm.coordinates, description: relabel(env, describeDirectionMoment(options)) };
    }
    case 'line_of_planes': {
      arity(2, 'line_of_planes(u, v)');
      // Planes are given by their coefficient vectors (u1 x1 + … + u4 x4 = 0), as vectors of a 4-space.
      const [u, v] = [0, 1].map((i) => {
        const value = arg(i);
        if (value.t !== 'vector' || value.space.dim !== 4) fail('type/operand', e.args[i]!.span, `a plane of projective 3-space is given by 4 coefficients (a vector of a 4-dimensional space), found ${describeValue(value)}`);
        return value;
      });
      const line = lineOfPlanes(F, u!.coords, v!.coords);
      if (line.rows.length !== 2) fail('math/same-plane', e.span, 'the two planes are the same (or one is zero): they meet in a plane, not a line');
      const ech = rref(F, line.rows, 4);
      return { t: 'subspace', space: u!.space, basis: ech.rows, pivots: ech.pivots, note: 'The line where the two planes meet: the common solutions of both plane equations.' };
    }
    case 'line_from_direction_moment': {
      if (e.args.length !== 6) fail('type/arguments', e.span, 'line_from_direction_moment takes the six numbers of the line, in the order of the file\'s convention');
      const six = e.args.map((a, i) => {
        const value = arg(i);
        if (value.t !== 'scalar') fail('type/operand', a.span, `expected a number, found ${describeValue(value)}`);
        return value.value;
      });
      const options = lineOptions(env);
      const p = fromDirectionMoment(F, six, options);
      if (!onKleinQuadric(F, p)) {
        fail('math/not-a-line', e.span, 'these six numbers are no line: the direction is not orthogonal to the moment (d·m ≠ 0), so the point is off the Klein quadric');
      }
      if (p.every((x) => F.isZero(x))) fail('math/not-a-line', e.span, 'all six numbers are zero: that is no line');
      const space = [...env.spaces.values()].find((s) => s.dim === 4 && !s.derived);
      if (!space) fail('type/no-space', e.span, 'a line of projective 3-space lives in a 4-dimensional space: declare one, e.g. `space P dim 4`');
      const d = decompose(F, fromDense(F, 4, 2, p));
      if (d.kind !== 'decomposable') fail('math/not-a-line', e.span, 'these six numbers are no line');
      return { t: 'subspace', space, basis: d.basis, pivots: d.basis.map((r) => r.findIndex((x) => !F.isZero(x))), note: relabel(env, describeDirectionMoment(options)) };
    }
    case 'count': {
      arity(2, 'count(k, V)');
      const [k, space] = degreeAndSpace(env, e, evaluate);
      const q = finiteFieldOrder(F);
      if (q === undefined) fail('type/infinite-field', e.span, `over ${F.name} there are infinitely many ${k}-subspaces; count needs a finite field GF(q)`);
      return { t: 'count', value: gaussianBinomial(space.dim, k, q), what: `${k}-dimensional subspaces of ${F.name}^${space.dim} (the Gaussian binomial [${space.dim} choose ${k}]_${q})` };
    }
    case 'subspaces': {
      arity(2, 'subspaces(k, V)');
      const [k, space] = degreeAndSpace(env, e, evaluate);
      const q = finiteFieldOrder(F);
      if (q === undefined) fail('type/infinite-field', e.span, `over ${F.name} there are infinitely many ${k}-subspaces; subspaces needs a finite field GF(q)`);
      try {
        return { t: 'subspaces', space, k, bases: enumerateSubspaces(F, space.dim, k, LIST_LIMIT) };
      } catch (err) {
        if (err instanceof EnumerationLimitError) {
          fail('limit/too-many-subspaces', e.span, `GF(${q})^${space.dim} has ${err.count} subspaces of dimension ${k}, more than the ${LIST_LIMIT} a list shows; count(${k}, ${space.name}) gives the number`);
        }
        throw err;
      }
    }
    case 'distance': {
      arity(2, 'distance(U, W)');
      const u = subspaceArg(arg(0), e.args[0]!.span, 'distance');
      const w = subspaceArg(arg(1), e.args[1]!.span, 'distance');
      if (u.space.name !== w.space.name) fail('type/space-mismatch', e.args[1]!.span, `the subspaces lie in ${u.space.name} and ${w.space.name}`);
      return { t: 'integer', value: subspaceDistance(F, u.basis, w.basis, u.space.dim) };
    }
    case 'min_distance': {
      if (e.args.length < 2) fail('type/arguments', e.span, 'min_distance(U1, U2, …) takes at least two subspaces');
      const all = e.args.map((a, i) => subspaceArg(arg(i), a.span, 'min_distance'));
      all.forEach((w, i) => {
        if (w.space.name !== all[0]!.space.name) fail('type/space-mismatch', e.args[i]!.span, `all subspaces of a code lie in one space; this one is in ${w.space.name}`);
      });
      const m = minimumDistance(F, all.map((w) => w.basis), all[0]!.space.dim)!;
      const names = e.args.map((a) => env.source.slice(a.span.start, a.span.end));
      return { t: 'count', value: BigInt(m.distance), what: `the minimum subspace distance dim U + dim W − 2·dim(U ∩ W) over ${all.length} subspaces, reached by ${names[m.pair[0]]} and ${names[m.pair[1]]}` };
    }
    default:
      return undefined;
  }
}

/** How many subspaces `subspaces(k, V)` lists at most. */
const LIST_LIMIT = 1000;

function degreeAndSpace(env: Environment, e: Call, evaluate: Evaluate): [number, SpaceInfo] {
  const kArg = e.args[0]!;
  if (kArg.type !== 'number' || !/^\d+$/.test(kArg.text)) fail('type/operand', kArg.span, 'the dimension k is a whole number');
  const v = evaluate(e.args[1]!);
  if (v.t !== 'space') fail('type/operand', e.args[1]!.span, `expected a space, found ${describeValue(v)}`);
  const k = Number(kArg.text);
  if (k > v.space.dim) fail('type/operand', kArg.span, `k = ${k} is above dim ${v.space.name} = ${v.space.dim}`);
  return [k, v.space];
}

/** `claim W is totally nonnegative` and the other property claims. */
export function propertyHolds(env: Environment, subject: Value, property: string, span: Span): { holds: boolean; found: string } {
  switch (property) {
    case 'totally-nonnegative':
    case 'totally-positive': {
      const w = subspaceArg(subject, span, 'positivity');
      const p = positivityOfSubspace(env, w, span);
      const wantPositive = property === 'totally-positive';
      const holds = wantPositive ? p.totallyPositive : p.totallyNonnegative;
      const n = w.space.dim;
      const k = w.basis.length;
      const dense = toDense(env.F, subspacePlucker(env, w));
      const labelOf = (i: number) => env.labels.name(unrankLex(i, n, k), n);
      if (holds) return { holds, found: `all nonzero Plücker coordinates have one sign${p.totallyPositive ? ' and none is zero' : ''}` };
      const pos = p.signs.indexOf(1);
      const neg = p.signs.indexOf(-1);
      if (pos >= 0 && neg >= 0) {
        return { holds, found: `${labelOf(pos)} = ${env.F.format(dense[pos])} and ${labelOf(neg)} = ${env.F.format(dense[neg])} have opposite signs` };
      }
      const zero = p.signs.indexOf(0);
      return { holds, found: `${labelOf(zero)} = 0, so it is totally nonnegative but not totally positive` };
    }
    case 'uniform': {
      const w = subspaceArg(subject, span, 'the matroid');
      const m = matroidOfSubspace(env, w, span);
      const total = binomialBig(w.space.dim, w.basis.length);
      return {
        holds: m.isUniform,
        found: m.isUniform
          ? `every one of the C(${w.space.dim},${w.basis.length}) = ${total} column sets is a basis over ${m.field}`
          : `${m.bases.length} of the ${total} column sets are bases over ${m.field}`,
      };
    }
    case 'on-klein-quadric': {
      const mv = subject.t === 'multivector' ? subject : undefined;
      if (!mv || mv.mv.k !== 2 || mv.space.dim !== 4) fail('type/operand', span, `the Klein quadric lies in the second exterior power of a 4-dimensional space; found ${describeValue(subject)}`);
      const p = toDense(env.F, mv.mv);
      const n = 4;
      const name = (s: number[]) => env.labels.name(s, n);
      const value = env.F.add(env.F.sub(env.F.mul(p[0], p[5]), env.F.mul(p[1], p[4])), env.F.mul(p[2], p[3]));
      return {
        holds: env.F.isZero(value),
        found: `${name([0, 1])}·${name([2, 3])} − ${name([0, 2])}·${name([1, 3])} + ${name([0, 3])}·${name([1, 2])} = ${env.F.format(value)}`,
      };
    }
    default:
      fail('type/unknown-property', span, `unknown property '${property.replace(/-/g, ' ')}': the properties are totally nonnegative, totally positive, uniform, decomposable and on klein quadric`);
  }
}
