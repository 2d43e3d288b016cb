/**
 * The built-in operations beyond spans and Plücker vectors: duality
 * (annihilators, complements, quotients), linear maps (images, kernels,
 * preimages, compound matrices, change of basis) and flags with Schubert cells.
 * Each checks its arguments and turns engine errors into problems with spans.
 */
import { annihilator, annihilatorPlucker, COMPLEMENT_SIGN_RULE, hodgeStar, HODGE_SIGN_RULE, quotientBasis } from '../engine/duality.js';
import { oppositeFlag, standardFlag, checkFlag, InvalidFlagError } from '../engine/flags.js';
import { changeOfBasis, compoundMatrix, imageOf, kernelOf, mapPlucker, NotInvertibleError, preimageOf } from '../engine/linear-map.js';
import { fromDense, toDense } from '../engine/multivector.js';
import { schubertCell, schubertConditions } from '../engine/schubert.js';
import { binomialBig } from '../engine/subsets.js';
import type { Call, Expr } from './ast.js';
import { subspacePlucker, type Environment } from './environment.js';
import { arity, asMultivector, subspaceOf } from './arguments.js';
import { fail } from './failure.js';
import type { Span } from './types.js';
import {
  describeValue,
  type FlagValue,
  type MapValue,
  type SchubertValue,
  type SpaceInfo,
  type SubspaceValue,
  type Value,
  type VectorValue,
} from './values.js';

export type Evaluate = (e: Expr) => Value;

export const GEOMETRY_BUILTINS = [
  'annihilator', 'complement', 'quotient', 'kernel', 'image', 'preimage', 'compound', 'coordinates',
  'standard', 'opposite', 'schubert',
] as const;

function expect<T extends Value['t']>(v: Value, t: T, span: Span, what: string): Extract<Value, { t: T }> {
  if (v.t !== t) fail('type/operand', span, `${what}, found ${describeValue(v)}`);
  return v as Extract<Value, { t: T }>;
}

/** The dual space V* with the dual basis e1* … en*, created once per space. */
export function dualSpace(env: Environment, space: SpaceInfo): SpaceInfo {
  const name = space.name.endsWith('*') ? space.name.slice(0, -1) : `${space.name}*`;
  let dual = env.spaces.get(name);
  if (!dual) {
    dual = {
      name,
      dim: space.dim,
      basisNames: space.basisNames.map((b) => (b.endsWith('*') ? b.slice(0, -1) : `${b}*`)),
      namedBasis: space.namedBasis,
      declaration: space.declaration,
      derived: true,
    };
    env.spaces.set(name, dual);
  }
  return dual;
}

/** f applied to a vector, a subspace or a multivector (through the induced map on the exterior power). */
export function applyMap(env: Environment, f: MapValue, arg: Value, span: Span): Value {
  const F = env.F;
  if (arg.t === 'vector') {
    if (arg.space.name !== f.from.name) fail('type/space-mismatch', span, `${f.name} maps ${f.from.name}, but this is a vector of ${arg.space.name}`);
    const coords = Array.from({ length: f.to.dim }, (_, j) => arg.coords.reduce((acc, x, i) => F.add(acc, F.mul(x, f.matrix[i]![j])), F.zero));
    return { t: 'vector', space: f.to, coords } satisfies VectorValue;
  }
  if (arg.t === 'subspace') {
    if (arg.space.name !== f.from.name) fail('type/space-mismatch', span, `${f.name} maps ${f.from.name}, but this is a subspace of ${arg.space.name}`);
    return subspaceOf(env, f.to, imageOf(F, f.matrix, arg.basis, f.to.dim));
  }
  const mv = asMultivector(env, arg);
  if (mv) {
    if (mv.space.name !== f.from.name) fail('type/space-mismatch', span, `${f.name} maps ${f.from.name}, but this lives over ${mv.space.name}`);
    const k = mv.mv.k;
    if (k > f.to.dim) return { t: 'multivector', space: f.to, mv: { n: f.to.dim, k, terms: new Map() } };
    // The image is computed on the dense coordinates of both exterior powers, which past the coordinate
    // limit cannot even be allocated: fuzzing found a map applied to e1∧…∧e32 in dimension 64 (one term)
    // reported as an internal error.
    for (const dim of [f.from.dim, f.to.dim]) {
      const count = binomialBig(dim, k);
      if (count > BigInt(env.limits.maxCoordinates)) {
        fail(
          'limit/too-many-coordinates',
          span,
          `applying ${f.name} to an element of degree ${k} works on all C(${dim},${k}) = ${count} coordinates, more than the limit of ${env.limits.maxCoordinates}`,
        );
      }
    }
    const dense = mapPlucker(F, f.matrix, toDense(F, mv.mv), k, f.to.dim);
    return {
      t: 'multivector',
      space: f.to,
      mv: fromDense(F, f.to.dim, k, dense),
      note: `The image under ∧^${k} ${f.name}: the coordinates times the ${k}-th compound matrix of ${f.name} (Cauchy–Binet).`,
    };
  }
  fail('type/operand', span, `${f.name} applies to vectors, subspaces and multivectors of ${f.from.name}, not to ${describeValue(arg)}`);
}

function flagOf(env: Environment, space: SpaceInfo, rows: unknown[][], origin: FlagValue['origin'], span: Span): FlagValue {
  try {
    checkFlag(env.F, rows, space.dim);
  } catch (err) {
    if (err instanceof InvalidFlagError) fail('math/bad-flag', span, `not a complete flag of ${space.name}: ${err.message}`);
    throw err;
  }
  return { t: 'flag', space, rows, origin };
}

/** A flag from a tuple of vectors, for `flag F = (v1, …, vn)`. */
export function flagFromVectors(env: Environment, vectors: VectorValue[], spans: Span[], whole: Span): FlagValue {
  const space = vectors[0]!.space;
  vectors.forEach((v, i) => {
    if (v.space.name !== space.name) fail('type/space-mismatch', spans[i]!, `a flag's vectors lie in one space; this one is in ${v.space.name}, not ${space.name}`);
  });
  if (vectors.length !== space.dim) {
    fail('math/bad-flag', whole, `a complete flag of ${space.name} needs ${space.dim} independent vectors, found ${vectors.length}`);
  }
  return flagOf(env, space, vectors.map((v) => v.coords), 'vectors', whole);
}

function schubertOf(env: Environment, w: SubspaceValue, flag: FlagValue, span: Span): SchubertValue {
  if (w.space.name !== flag.space.name) fail('type/space-mismatch', span, `the subspace lives in ${w.space.name} but the flag in ${flag.space.name}`);
  const cell = schubertCell(env.F, w.basis, flag.rows, w.space.dim);
  return {
    t: 'schubert',
    subspace: w,
    flag,
    jumps: cell.jumps,
    partition: cell.partition,
    codimension: cell.codimension,
    cellDimension: cell.cellDimension,
    echelon: cell.basis,
    conditions: schubertConditions(env.F, w.basis, flag.rows),
  };
}

/** The geometry built-ins; undefined when the callee is none of them. */
export function callGeometry(env: Environment, e: Call, evaluate: Evaluate): Value | undefined {
  const F = env.F;
  const arg = (i: number) => evaluate(e.args[i]!);
  switch (e.callee.name) {
    case 'annihilator': {
      arity(e, 1, 'annihilator(W)');
      const w = expect(arg(0), 'subspace', e.args[0]!.span, 'annihilator takes a subspace');
      const dual = dualSpace(env, w.space);
      const n = w.space.dim;
      const k = w.basis.length;
      let note = `The annihilator ${w.space.name}^⊥ ⊂ ${dual.name}: the functionals vanishing on the subspace, dimension n − k = ${n - k}. ${COMPLEMENT_SIGN_RULE}`;
      if (binomialBig(n, k) <= BigInt(env.limits.maxCoordinates)) {
        // The sign rule, checked on the spot: the rule applied to W's Plücker vector is the annihilator's, up to scale.
        const byRule = annihilatorPlucker(F, toDense(F, subspacePlucker(env, w)), n, k);
        note += ` Applied to this subspace's Plücker vector it gives ${byRule.length <= 12 ? `[${byRule.map((x) => F.format(x)).join(' : ')}]` : `${byRule.length} coordinates`}, the annihilator's Plücker vector up to a nonzero factor.`;
      }
      return subspaceOf(env, dual, annihilator(F, w.basis, n), { note });
    }
    case 'complement': {
      arity(e, 1, 'complement(ω)');
      const v = arg(0);
      const mv = asMultivector(env, v);
      if (!mv) fail('type/operand', e.args[0]!.span, `complement takes a multivector, found ${describeValue(v)}`);
      const n = mv.space.dim;
      return { t: 'multivector', space: mv.space, mv: hodgeStar(F, mv.mv), note: `The complement ⋆ of a degree-${mv.mv.k} element, of degree ${n - mv.mv.k}. ${HODGE_SIGN_RULE}` };
    }
    case 'quotient': {
      arity(e, 2, 'quotient(V, W)');
      const space = expect(arg(0), 'space', e.args[0]!.span, 'quotient takes a space first');
      const w = expect(arg(1), 'subspace', e.args[1]!.span, 'quotient takes a subspace second');
      if (w.space.name !== space.space.name) fail('type/space-mismatch', e.args[1]!.span, `this is a subspace of ${w.space.name}, not of ${space.space.name}`);
      return { t: 'quotient', space: space.space, subspace: w, representatives: quotientBasis(F, w.basis, w.space.dim) };
    }
    case 'kernel': {
      arity(e, 1, 'kernel(f)');
      const f = expect(arg(0), 'map', e.args[0]!.span, 'kernel takes a map');
      return subspaceOf(env, f.from, kernelOf(F, f.matrix, f.to.dim));
    }
    case 'image': {
      arity(e, 1, 'image(f)');
      const f = expect(arg(0), 'map', e.args[0]!.span, 'image takes a map');
      return subspaceOf(env, f.to, f.matrix.length ? imageOf(F, f.matrix, f.matrix.map((_, i) => f.matrix.map((__, j) => (i === j ? F.one : F.zero))), f.to.dim) : []);
    }
    case 'preimage': {
      arity(e, 2, 'preimage(f, W)');
      const f = expect(arg(0), 'map', e.args[0]!.span, 'preimage takes a map first');
      const w = expect(arg(1), 'subspace', e.args[1]!.span, 'preimage takes a subspace second');
      if (w.space.name !== f.to.name) fail('type/space-mismatch', e.args[1]!.span, `${f.name} maps into ${f.to.name}, but this is a subspace of ${w.space.name}`);
      return subspaceOf(env, f.from, preimageOf(F, f.matrix, w.basis, f.to.dim));
    }
    case 'compound': {
      arity(e, 2, 'compound(f, k)');
      const f = expect(arg(0), 'map', e.args[0]!.span, 'compound takes a map first');
      const kArg = e.args[1]!;
      if (kArg.type !== 'number' || !/^\d+$/.test(kArg.text)) fail('type/operand', kArg.span, 'the degree k of compound(f, k) is a whole number');
      const k = Number(kArg.text);
      if (k > f.from.dim) fail('type/operand', kArg.span, `k = ${k} is above dim ${f.from.name} = ${f.from.dim}`);
      const size = binomialBig(f.from.dim, k) * binomialBig(f.to.dim, k);
      if (size > BigInt(env.limits.maxCoordinates)) fail('limit/too-many-coordinates', e.span, `the ${k}-th compound has ${size} entries, more than the limit of ${env.limits.maxCoordinates}`);
      return { t: 'compound', map: f, k, matrix: compoundMatrix(F, f.matrix, k, f.to.dim) };
    }
    case 'coordinates': {
      if (e.args.length < 2) fail('type/arguments', e.span, 'coordinates(v, u1, …, un) takes a vector and a basis');
      const v = expect(arg(0), 'vector', e.args[0]!.span, 'coordinates takes a vector first');
      const basis = e.args.slice(1).map((a, i) => expect(arg(i + 1), 'vector', a.span, 'the basis consists of vectors'));
      basis.forEach((b, i) => {
        if (b.space.name !== v.space.name) fail('type/space-mismatch', e.args[i + 1]!.span, `this vector is in ${b.space.name}, not ${v.space.name}`);
      });
      let coords;
      try {
        coords = changeOfBasis(F, basis.map((b) => b.coords), v.coords);
      } catch (err) {
        if (err instanceof NotInvertibleError) fail('math/not-a-basis', e.span, `${basis.length} vectors given are not a basis of ${v.space.name} (dimension ${v.space.dim})`);
        throw err;
      }
      const names = e.args.slice(1).map((a) => env.source.slice(a.span.start, a.span.end));
      const space: SpaceInfo = { name: `${v.space.name} in the basis (${names.join(', ')})`, dim: v.space.dim, basisNames: names, namedBasis: true, declaration: e.span };
      return { t: 'vector', space, coords };
    }
    case 'standard':
    case 'opposite': {
      arity(e, 1, `${e.callee.name}(V)`);
      const space = expect(arg(0), 'space', e.args[0]!.span, `${e.callee.name} takes a space`).space;
      const rows = e.callee.name === 'standard' ? standardFlag(F, space.dim) : oppositeFlag(F, space.dim);
      return flagOf(env, space, rows, e.callee.name, e.span);
    }
    case 'schubert': {
      if (e.args.length !== 1 && e.args.length !== 2) fail('type/arguments', e.span, 'schubert(W) or schubert(W, F) takes a subspace and optionally a flag');
      const w = expect(arg(0), 'subspace', e.args[0]!.span, 'schubert takes a subspace');
      const flag = e.args.length === 2 ? expect(arg(1), 'flag', e.args[1]!.span, 'the second argument of schubert is a flag') : flagOf(env, w.space, standardFlag(F, w.space.dim), 'standard', e.span);
      return schubertOf(env, w, flag, e.span);
    }
    default:
      return undefined;
  }
}
