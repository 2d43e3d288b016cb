/**
 * Evaluation of expressions into values, with type checking on the way. Every
 * failure is a `Failure` carrying a problem with the span of the offending
 * sub-expression, or `Poisoned` when an earlier failure already explains it.
 */
import { callParameters, chartInFamilyNote } from './parameters.js';
import { callSchubertCalculus, classArithmetic } from './schubert-calculus.js';
import { DivisionByZeroError } from '../engine/field.js';
import { findDependency, intersectRowSpaces, kernel, rref, sumRowSpaces } from '../engine/matrix.js';
import {
  type Multivector,
  add as addMV,
  fromTerms,
  isZeroMV,
  neg as negMV,
  scale as scaleMV,
  sub as subMV,
  wedge as wedgeMV,
  toDense,
} from '../engine/multivector.js';
import { binomialBig } from '../engine/subsets.js';
import { parseRational, type Rational } from '../engine/rational.js';
import { chartCoordinates } from '../engine/chart.js';
import type {
  Binary,
  Call,
  DimExpr,
  Entry,
  Expr,
  IndexMapLit,
  MatrixLit,
  NameRef,
  SolutionsExpr,
  RowsExpr,
  ColumnsExpr,
  Tuple,
} from './ast.js';
import { basisCandidates, subspacePlucker, type Environment } from './environment.js';
import { arity, asMultivector, readIndexSet, subspaceOf } from './arguments.js';
import { fail, Poisoned } from './failure.js';
import { decompositionOf, describeRelation } from './decomposition.js';
import { applyMap, callGeometry } from './geometry.js';
import { callCombinatorics } from './combinatorics.js';
import { formatCombination, formatScalar } from './text.js';
import { columnsFixes, rowsFixes, spanFixes } from './fixes/dependency-fixes.js';
import type { Fix, Span } from './types.js';
import {
  describeValue,
  type MatrixValue,
  type MultivectorValue,
  type Scalar,
  type SpaceInfo,
  type SubspaceValue,
  type Value,
  type VectorValue,
} from './values.js';

/** What the surrounding statement tells an expression: the space named by `in V`, if any. */
export interface ExprContext {
  space?: SpaceInfo;
}

export function evaluate(env: Environment, e: Expr, ctx: ExprContext): Value {
  switch (e.type) {
    case 'number':
      return { t: 'scalar', value: literal(env, e.text, e.span) };
    case 'name':
      return lookup(env, e);
    case 'unary': {
      const v = evaluate(env, e.operand, ctx);
      return e.op === '+' ? v : negate(env, v, e.span);
    }
    case 'binary':
      return binary(env, e, ctx);
    case 'call':
      return call(env, e, ctx);
    case 'tuple':
      return tuple(env, e, ctx);
    case 'dim':
      return dimension(env, e, ctx);
    case 'matrix':
      return matrix(env, e);
    case 'point':
      return { t: 'point', values: e.entries.map((x) => entry(env, x)) };
    case 'indexmap':
      return indexMap(env, e, ctx);
    case 'rows':
      return rowsSubspace(env, e, ctx);
    case 'columns':
      return columnsSubspace(env, e, ctx);
    case 'solutions':
      return solutionsSubspace(env, e, ctx);
  }
}

/** An exact literal ('3', '0.125', '-1/2') as an element of the file's field. */
function literal(env: Environment, text: string, span: Span): Scalar {
  let r;
  try {
    r = parseRational(text);
  } catch (err) {
    if (err instanceof DivisionByZeroError) fail('math/division-by-zero', span, `${text} divides by zero`);
    fail('syntax/bad-number', span, `'${text}' is not a number`);
  }
  try {
    return env.F.fromRational(r.num, r.den);
  } catch (err) {
    if (err instanceof DivisionByZeroError) {
      fail('math/division-by-zero', span, `${text} has a denominator that is zero in ${env.F.name}`);
    }
    throw err;
  }
}

function entry(env: Environment, x: Entry): Scalar {
  if (!x.expr) return literal(env, x.text, x.span);
  const value = evaluate(env, x.expr, {});
  if (value.t !== 'scalar') fail('type/operand', x.span, `an entry is a number, found ${describeValue(value)}`);
  return value.value;
}

function lookup(env: Environment, e: NameRef): Value {
  const name = e.name.name;
  if (e.qualifier) {
    const space = env.spaces.get(e.qualifier.name);
    if (!space) throw new Poisoned();
    const index = space.basisNames.indexOf(name);
    if (index < 0) throw new Poisoned();
    return basisVector(env, space, index);
  }
  const bound = env.bindings.get(name);
  if (bound) {
    if (!bound.value) throw new Poisoned();
    return bound.value;
  }
  const space = env.spaces.get(name);
  if (space) return { t: 'space', space };
  const candidates = basisCandidates(env, name);
  if (candidates.length === 1) return basisVector(env, candidates[0]!.space, candidates[0]!.index);
  // Unknown and ambiguous names were reported by name resolution.
  throw new Poisoned();
}

function basisVector(env: Environment, space: SpaceInfo, index: number): VectorValue {
  const coords = Array.from({ length: space.dim }, (_, i) => (i === index ? env.F.one : env.F.zero));
  return { t: 'vector', space, coords };
}

function sameSpace(a: SpaceInfo, b: SpaceInfo, span: Span, what: string): void {
  if (a.name !== b.name) {
    fail('type/space-mismatch', span, `${what}: the left side lives in ${a.name} and the right side in ${b.name}`);
  }
}

function negate(env: Environment, v: Value, span: Span): Value {
  const F = env.F;
  switch (v.t) {
    case 'scalar':
      return { t: 'scalar', value: F.neg(v.value) };
    case 'vector':
      return { ...v, coords: v.coords.map((x) => F.neg(x)) };
    case 'multivector':
      return { t: 'multivector', space: v.space, mv: negMV(F, v.mv) };
    case 'point':
      return { t: 'point', values: v.values.map((x) => F.neg(x)) };
    default:
      fail('type/operand', span, `cannot negate ${describeValue(v)}`);
  }
}

function binary(env: Environment, e: Binary, ctx: ExprContext): Value {
  const left = evaluate(env, e.left, ctx);
  const right = evaluate(env, e.right, ctx);
  const classes = classArithmetic(e, left, right);
  if (classes) return classes;
  switch (e.op) {
    case '+':
    case '-':
      return addOrSubtract(env, e, left, right);
    case '*':
      return multiply(env, e, left, right);
    case '/':
      return divide(env, e, left, right);
    case '^':
      return wedge(env, e, left, right);
    case '&':
      return intersect(env, e, left, right);
  }
}

function addOrSubtract(env: Environment, e: Binary, left: Value, right: Value): Value {
  const F = env.F;
  const minus = e.op === '-';
  const verb = minus ? 'subtract' : 'add';
  if (left.t === 'scalar' && right.t === 'scalar') {
    return { t: 'scalar', value: minus ? F.sub(left.value, right.value) : F.add(left.value, right.value) };
  }
  if (left.t === 'vector' && right.t === 'vector') {
    sameSpace(left.space, right.space, e.opSpan, `cannot ${verb} vectors of different spaces`);
    const coords = left.coords.map((x, i) => (minus ? F.sub(x, right.coords[i]) : F.add(x, right.coords[i])));
    return { t: 'vector', space: left.space, coords };
  }
  if (left.t === 'subspace' && right.t === 'subspace' && !minus) {
    sameSpace(left.space, right.space, e.opSpan, 'cannot add subspaces of different spaces');
    return subspaceOf(env, left.space, sumRowSpaces(env.F, left.basis, right.basis, left.space.dim));
  }
  const a = asMultivector(env, left);
  const b = asMultivector(env, right);
  if (a && b) {
    sameSpace(a.space, b.space, e.opSpan, `cannot ${verb} multivectors of different spaces`);
    if (a.mv.k !== b.mv.k) {
      fail(
        'type/mixed-degree',
        e.opSpan,
        `cannot ${verb} a multivector of degree ${a.mv.k} and one of degree ${b.mv.k}: only elements of one exterior power add`,
      );
    }
    return { t: 'multivector', space: a.space, mv: minus ? subMV(F, a.mv, b.mv) : addMV(F, a.mv, b.mv) };
  }
  const hint = left.t === 'subspace' && right.t === 'subspace' ? ' (subspaces have a sum `+` and an intersection `&`, no difference)' : '';
  fail('type/operand', e.opSpan, `cannot ${verb} ${describeValue(left)} and ${describeValue(right)}${hint}`);
}

function scaleValue(env: Environment, c: Scalar, v: Value, span: Span): Value {
  const F = env.F;
  switch (v.t) {
    case 'scalar':
      return { t: 'scalar', value: F.mul(c, v.value) };
    case 'vector':
      return { ...v, coords: v.coords.map((x) => F.mul(c, x)) };
    case 'multivector':
      return { t: 'multivector', space: v.space, mv: scaleMV(F, c, v.mv) };
    default:
      fail('type/operand', span, `cannot multiply ${describeValue(v)} by a scalar`);
  }
}

function multiply(env: Environment, e: Binary, left: Value, right: Value): Value {
  if (left.t === 'scalar') return scaleValue(env, left.value, right, e.span);
  if (right.t === 'scalar') return scaleValue(env, right.value, left, e.span);
  const both = (left.t === 'vector' || left.t === 'multivector') && (right.t === 'vector' || right.t === 'multivector');
  const hint = both ? '; for the wedge product write ^ or ∧' : '';
  fail('type/operand', e.implicit ? e.span : e.opSpan, `cannot multiply ${describeValue(left)} by ${describeValue(right)}${hint}`);
}

function divide(env: Environment, e: Binary, left: Value, right: Value): Value {
  if (right.t !== 'scalar') fail('type/operand', e.opSpan, `can only divide by a scalar, not by ${describeValue(right)}`);
  if (env.F.isZero(right.value)) fail('math/division-by-zero', e.right.span, `division by zero (the divisor is 0 in ${env.F.name})`);
  return scaleValue(env, env.F.inv(right.value), left, e.span);
}

function wedge(env: Environment, e: Binary, left: Value, right: Value): Value {
  // Between scalars `^` is a power with a whole exponent as written: a^2 + a + 1 in GF(4).
  if (left.t === 'scalar' && e.right.type === 'number' && /^\d+$/.test(e.right.text)) {
    return { t: 'scalar', value: power(env, left.value, BigInt(e.right.text), e.span) };
  }
  const a = asMultivector(env, left);
  const b = asMultivector(env, right);
  if (!a || !b) {
    const scalarHint = left.t === 'scalar' || right.t === 'scalar' ? ' (scalars multiply with * or by juxtaposition, e.g. 3 e1)' : '';
    fail('type/operand', e.opSpan, `cannot wedge ${describeValue(left)} with ${describeValue(right)}${scalarHint}`);
  }
  sameSpace(a.space, b.space, e.opSpan, 'cannot wedge elements of different spaces');
  checkWedgeSize(env, a.mv, b.mv, e.span);
  return { t: 'multivector', space: a.space, mv: wedgeMV(env.F, a.mv, b.mv) };
}

/**
 * Guards a wedge product against a result past the coordinate limit and
 * against a runaway amount of work. The product of a and b multiplies every
 * term of a with every term of b, so it costs |a|·|b| steps and has at most
 * min(|a|·|b|, C(n, p+q)) terms. Fuzzing found chains of wedges of generic
 * vectors, short to write, whose products grow like C(n, k): fifteen vectors in
 * dimension 30 ran for 38 s, and 32 in dimension 64 would never have ended.
 * Such a product is refused, like a Plücker vector of more than the limit of
 * coordinates, once it could have more terms than that limit. The work bound
 * lets every product of a multivector within the limit with one vector pass.
 */
function checkWedgeSize(env: Environment, a: Multivector<Scalar>, b: Multivector<Scalar>, span: Span): void {
  const pairs = a.terms.size * b.terms.size;
  const { maxCoordinates, maxDimension } = env.limits;
  if (pairs <= maxCoordinates) return;
  const degree = a.k + b.k;
  // A degree above the dimension gives zero, with no term to compute, but still every pair to look at.
  const size = degree > a.n ? 0n : binomialBig(a.n, degree);
  const bound = size < BigInt(pairs) ? size : BigInt(pairs);
  if (bound > BigInt(maxCoordinates)) {
    fail(
      'limit/too-many-coordinates',
      span,
      `this wedge product could have up to ${bound} terms (C(${a.n},${degree}) = ${size} in degree ${degree}), more than the limit of ${maxCoordinates} coordinates`,
    );
  }
  if (pairs > maxCoordinates * maxDimension) {
    fail(
      'limit/too-many-coordinates',
      span,
      `this wedge product would multiply ${a.terms.size} terms by ${b.terms.size} terms, ${pairs} products in all, more than the ${maxCoordinates * maxDimension} allowed (the limit of ${maxCoordinates} coordinates times the largest dimension, ${maxDimension})`,
    );
  }
}

function intersect(env: Environment, e: Binary, left: Value, right: Value): Value {
  if (left.t !== 'subspace' || right.t !== 'subspace') {
    fail('type/operand', e.opSpan, `& intersects subspaces; found ${describeValue(left)} and ${describeValue(right)}`);
  }
  sameSpace(left.space, right.space, e.opSpan, 'cannot intersect subspaces of different spaces');
  return subspaceOf(env, left.space, intersectRowSpaces(env.F, left.basis, right.basis, left.space.dim));
}

/**
 * The most bits a power over the rationals may have, about 301 000 decimal
 * digits. Repeated squaring makes a^e quick to ask for and exponentially
 * large in the text: fuzzing found `3^10000000` (4.8 million digits) taking
 * 13 s to show, and `((7^1000)^1000)^1000` would never have finished. Finite
 * fields are not concerned: their elements have a fixed size.
 */
export const MAX_POWER_BITS = 1_000_000;

/** log2 |x| to double precision (0 for x = 0), from the leading 53 bits. */
function log2Magnitude(x: bigint): number {
  const magnitude = x < 0n ? -x : x;
  if (magnitude === 0n) return 0;
  const bits = magnitude.toString(16).length * 4;
  const shift = Math.max(0, bits - 64);
  return shift + Math.log2(Number(magnitude >> BigInt(shift)));
}

function power(env: Environment, base: Scalar, exponent: bigint, span: Span): Scalar {
  if (env.F.characteristic === 0n && typeof (base as Partial<Rational>).num === 'bigint') {
    // Over the rationals the result has about exponent · log2 max(|num|, den) bits (0 for 0, 1 and −1).
    const { num, den } = base as Rational;
    const bitsPerFactor = Math.max(log2Magnitude(num), log2Magnitude(den));
    const bits = bitsPerFactor * Number(exponent);
    if (bitsPerFactor > 0 && bits > MAX_POWER_BITS) {
      const size = Number.isFinite(bits) ? `about ${Math.ceil(bits * Math.log10(2))} decimal digits` : 'more digits than can be counted';
      fail('limit/number-size', span, `this power would have ${size}, more than the ${MAX_POWER_BITS} bits (about 301 000 digits) a power is computed to`);
    }
  }
  let result = env.F.one;
  let b = base;
  for (let e = exponent; e > 0n; e >>= 1n) {
    if (e & 1n) result = env.F.mul(result, b);
    b = env.F.mul(b, b);
  }
  return result;
}

/** The space a literal lives in: `in V`, else the only declared space (of the right dimension, if known). */
function contextSpace(env: Environment, ctx: ExprContext, span: Span, width: number | undefined, what: string): SpaceInfo {
  if (ctx.space) {
    if (width !== undefined && width !== ctx.space.dim) {
      fail(
        'type/wrong-length',
        span,
        `${what} has ${width} ${width === 1 ? 'entry' : 'entries'} per vector, but ${ctx.space.name} has dimension ${ctx.space.dim}`,
      );
    }
    return ctx.space;
  }
  const all = [...env.spaces.values()].filter((s) => !s.derived);
  if (all.length === 0) fail('type/no-space', span, `${what} needs a space: declare one first, e.g. \`space V dim ${width ?? 4}\``);
  const fitting = width === undefined ? all : all.filter((s) => s.dim === width);
  if (all.length === 1) {
    const only = all[0]!;
    if (width !== undefined && width !== only.dim) {
      fail('type/wrong-length', span, `${what} has ${width} entries per vector, but ${only.name} has dimension ${only.dim}`);
    }
    return only;
  }
  if (fitting.length === 1) return fitting[0]!;
  const names = (fitting.length ? fitting : all).map((s) => s.name).join(', ');
  fail('type/which-space', span, `${what} could live in ${names}: add \`in <space>\` at the end of the statement`);
}

function tuple(env: Environment, e: Tuple, ctx: ExprContext): VectorValue {
  const coords = e.items.map((item) => {
    const v = evaluate(env, item, ctx);
    if (v.t !== 'scalar') fail('type/operand', item.span, `a coordinate must be a scalar, found ${describeValue(v)}`);
    return v.value;
  });
  const space = contextSpace(env, ctx, e.span, coords.length, 'this coordinate tuple');
  return { t: 'vector', space, coords };
}

function matrix(env: Environment, e: MatrixLit): MatrixValue {
  const rows = e.rows.map((r) => r.map((x) => entry(env, x)));
  const ncols = rows[0]?.length ?? 0;
  e.rows.forEach((r, i) => {
    if (r.length !== ncols) {
      const first = r[0]?.span ?? e.span;
      const last = r[r.length - 1]?.span ?? e.span;
      fail(
        'type/ragged-matrix',
        { start: first.start, end: last.end },
        `row ${i + 1} of this matrix has ${r.length} entries, but row 1 has ${ncols}`,
      );
    }
  });
  return { t: 'matrix', rows, ncols };
}

function describeDependency(env: Environment, names: string[], index: number, coefficients: Scalar[]): string {
  const target = names[index]!;
  if (index === 0 || coefficients.every((c) => env.F.isZero(c))) return `${target} is the zero vector`;
  return `${target} = ${formatCombination(env.F, coefficients, names.slice(0, index))}`;
}

/** Reports a dependent list of rows as an error that keeps the statement's value. */
function reportDependency(
  env: Environment,
  code: string,
  rows: Scalar[][],
  names: string[],
  spans: Span[],
  related: { span: Span; message: string }[],
  whole: Span,
  what: string,
  fixes?: () => Fix[],
): void {
  const dep = findDependency(env.F, rows);
  if (!dep) return;
  const offered = fixes?.() ?? [];
  const message =
    `${what} is degenerate: ${describeDependency(env, names, dep.index, dep.coefficients)}` +
    (dep.index > 0 ? ` (${names[dep.index]} depends on the vectors before it)` : '') +
    `; the span has dimension ${rref(env.F, rows, rows[0]?.length ?? 0).rank}, not ${rows.length}`;
  env.problems.push({
    code,
    severity: 'error',
    message,
    span: spans[dep.index] ?? whole,
    ...(related.length ? { related } : {}),
    ...(offered.length ? { fixes: offered } : {}),
  });
}

function spanCall(env: Environment, e: Call, ctx: ExprContext): SubspaceValue {
  if (e.args.length === 0) fail('type/arguments', e.span, 'span needs at least one vector: span(v1, v2, …)');
  const vectors = e.args.map((arg) => {
    const v = evaluate(env, arg, ctx);
    if (v.t === 'vector') return v;
    if (v.t === 'multivector' && v.mv.k === 1) return { t: 'vector' as const, space: v.space, coords: toDense(env.F, v.mv) };
    fail('type/operand', arg.span, `span takes vectors, found ${describeValue(v)}`);
  });
  const space = vectors[0]!.space;
  vectors.forEach((v, i) => sameSpace(space, v.space, e.args[i]!.span, 'span of vectors from different spaces'));
  const rows = vectors.map((v) => v.coords);
  const names = e.args.map((arg) => (arg.type === 'name' ? arg.name.name : `(${env.source.slice(arg.span.start, arg.span.end).replace(/\s+/g, ' ')})`));
  const related = e.args.flatMap((arg) => {
    if (arg.type !== 'name') return [];
    const bound = env.bindings.get(arg.name.name);
    return bound ? [{ span: bound.declSpan, message: `${arg.name.name} is declared here` }] : [];
  });
  reportDependency(env, 'math/degenerate-span', rows, names, e.args.map((a) => a.span), related, e.span, 'this list of vectors', () => spanFixes(env, e, rows));
  return subspaceOf(env, space, rows, { given: rows });
}

function rowsSubspace(env: Environment, e: RowsExpr, ctx: ExprContext): SubspaceValue {
  const m = matrix(env, e.matrix);
  const space = contextSpace(env, ctx, e.matrix.span, m.ncols, 'this matrix');
  const rowSpans = e.matrix.rows.map((r) => ({ start: r[0]!.span.start, end: r[r.length - 1]!.span.end }));
  const names = m.rows.map((_, i) => `row ${i + 1}`);
  reportDependency(env, 'math/degenerate-rows', m.rows, names, rowSpans, [], e.span, 'this basis matrix', () => rowsFixes(env, e, m.rows));
  return subspaceOf(env, space, m.rows, { given: m.rows });
}

/** `columns [ … ]`: an n×k matrix whose columns are the basis vectors (the layout of much engineering work). */
function columnsSubspace(env: Environment, e: ColumnsExpr, ctx: ExprContext): SubspaceValue {
  const m = matrix(env, e.matrix);
  const space = contextSpace(env, ctx, e.matrix.span, m.rows.length, 'this matrix (read by columns)');
  const vectors = Array.from({ length: m.ncols }, (_, j) => m.rows.map((r) => r[j]));
  const names = vectors.map((_, j) => `column ${j + 1}`);
  reportDependency(env, 'math/degenerate-rows', vectors, names, [], [], e.span, 'this basis matrix', () => columnsFixes(env, e, vectors));
  return subspaceOf(env, space, vectors, { given: vectors });
}

function solutionsSubspace(env: Environment, e: SolutionsExpr, ctx: ExprContext): SubspaceValue {
  const m = matrix(env, e.matrix);
  const space = contextSpace(env, ctx, e.matrix.span, m.ncols, 'this system of equations');
  return subspaceOf(env, space, kernel(env.F, m.rows, space.dim));
}

function indexMap(env: Environment, e: IndexMapLit, ctx: ExprContext): MultivectorValue {
  const first = e.entries[0];
  if (!first) fail('syntax/empty-index-map', e.span, 'an index-set multivector needs at least one entry, e.g. {12: 1}');
  const k = first.key.labels.length;
  const maxLabel = Math.max(...e.entries.flatMap((x) => x.key.labels));
  const space = contextSpace(env, ctx, e.span, undefined, 'this multivector');
  const n = space.dim;
  const terms: [number[], Scalar][] = [];
  for (const x of e.entries) {
    const labels = x.key.labels;
    if (labels.length !== k) {
      fail('type/mixed-degree', x.key.span, `index set ${labels.join('')} has ${labels.length} labels, but the first has ${k}: all terms must have one degree`);
    }
    const positions = labels.map((l) => l - env.convention.firstLabel);
    const bad = positions.findIndex((p) => p < 0 || p >= n);
    if (bad >= 0) {
      fail('type/bad-label', x.key.span, `label ${labels[bad]} is outside ${env.labels.position(0)}…${env.labels.position(n - 1)} (the labels of ${space.name}, dimension ${n})`);
    }
    if (new Set(positions).size !== positions.length) {
      fail('type/repeated-label', x.key.span, `index set ${labels.join('')} repeats a label; a wedge with a repeated vector is zero, so leave it out`);
    }
    terms.push([positions, entry(env, x.value)]);
  }
  void maxLabel;
  return { t: 'multivector', space, mv: fromTerms(env.F, n, k, terms) };
}

function dimension(env: Environment, e: DimExpr, ctx: ExprContext): Value {
  const v = evaluate(env, e.operand, ctx);
  if (v.t === 'subspace') return { t: 'integer', value: v.basis.length };
  if (v.t === 'space') return { t: 'integer', value: v.space.dim };
  fail('type/operand', e.operand.span, `dim applies to a subspace or a space, found ${describeValue(v)}`);
}

function expectSubspace(env: Environment, arg: Expr, ctx: ExprContext, what: string): SubspaceValue {
  const v = evaluate(env, arg, ctx);
  if (v.t !== 'subspace') fail('type/operand', arg.span, `${what} takes a subspace, found ${describeValue(v)}`);
  return v;
}

/** Guards against computing more Plücker coordinates than the limit allows. */
export function checkCoordinateLimit(env: Environment, n: number, k: number, span: Span): void {
  const count = binomialBig(n, k);
  if (count > BigInt(env.limits.maxCoordinates)) {
    fail(
      'limit/too-many-coordinates',
      span,
      `G(${k},${n}) has C(${n},${k}) = ${count} Plücker coordinates, more than the limit of ${env.limits.maxCoordinates}`,
    );
  }
}

function call(env: Environment, e: Call, ctx: ExprContext): Value {
  switch (e.callee.name) {
    case 'span':
      return spanCall(env, e, ctx);
    case 'plucker': {
      arity(e, 1, 'plucker(W)');
      const v = evaluate(env, e.args[0]!, ctx);
      if (v.t === 'subspace') {
        checkCoordinateLimit(env, v.space.dim, v.basis.length, e.span);
        return { t: 'multivector', space: v.space, mv: subspacePlucker(env, v), pluckerOf: v };
      }
      const mv = asMultivector(env, v);
      if (mv) return mv;
      fail('type/operand', e.args[0]!.span, `plucker takes a subspace, found ${describeValue(v)}`);
    }
    case 'recover': {
      arity(e, 1, 'recover(ω)');
      const v = evaluate(env, e.args[0]!, ctx);
      const mv = asMultivector(env, v);
      if (!mv) fail('type/operand', e.args[0]!.span, `recover takes a multivector, found ${describeValue(v)}`);
      if (isZeroMV(mv.mv)) fail('math/zero-multivector', e.args[0]!.span, 'the zero multivector comes from no subspace');
      const d = decompositionOf(env, mv);
      if (d.kind === 'not-decomposable') {
        fail(
          'math/not-decomposable',
          e.args[0]!.span,
          `cannot recover a subspace: this multivector is not decomposable — ${describeRelation(env, d.relation, mv.space.dim)}`,
        );
      }
      if (d.kind === 'zero') fail('math/zero-multivector', e.args[0]!.span, 'the zero multivector comes from no subspace');
      return subspaceOf(env, mv.space, d.basis);
    }
    case 'chart': {
      arity(e, 2, 'chart(W, I)');
      const w = expectSubspace(env, e.args[0]!, ctx, 'chart');
      const columns = readIndexSet(env, e.args[1]!, w.space, w.basis.length);
      const c = chartCoordinates(env.F, w.basis, w.space.dim, columns);
      if (!c.ok) {
        const sorted = columns.slice().sort((a, b) => a - b);
        fail(
          'math/chart-zero-minor',
          e.args[1]!.span,
          `${env.labels.name(sorted, w.space.dim)} = 0: this subspace is not in the chart where ${env.labels.name(sorted, w.space.dim)} ≠ 0; choose columns whose Plücker coordinate is nonzero`,
        );
      }
      const note = chartInFamilyNote(env, w, columns);
      return { t: 'chart', subspace: w, columns, otherColumns: c.otherColumns, block: c.block, full: c.full, ...(note ? { note } : {}) };
    }
    default: {
      const evaluateArg = (arg: Expr) => evaluate(env, arg, ctx);
      const builtinValue = callGeometry(env, e, evaluateArg) ?? callCombinatorics(env, e, evaluateArg) ?? callSchubertCalculus(env, e, evaluateArg) ?? callParameters(env, e, evaluateArg);
      if (builtinValue) return builtinValue;
      const bound = env.bindings.get(e.callee.name);
      if (bound) {
        if (!bound.value) throw new Poisoned();
        if (bound.value.t !== 'map') fail('type/not-callable', e.callee.span, `${e.callee.name} is ${describeValue(bound.value)}, not a map: only maps and built-in operations are applied with (…)`);
        if (e.args.length !== 1) fail('type/arguments', e.span, `a map takes one argument, found ${e.args.length}`);
        return applyMap(env, bound.value, evaluate(env, e.args[0]!, ctx), e.args[0]!.span);
      }
      // Unknown operations were reported by name resolution.
      throw new Poisoned();
    }
  }
}

/** For messages: the scalar as text in the file's field. */
export function scalarText(env: Environment, s: Scalar): string {
  return formatScalar(env.F, s);
}
