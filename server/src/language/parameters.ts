/**
 * Families: a file that declares parameters (`parameter t`) computes over the field of rational
 * functions in them over its field, QQ(t) or GF(p)(s, t) (../engine/polynomials/). Every engine
 * algorithm is written against a field, so ranks, Plücker coordinates, charts and claims run unchanged
 * and hold as identities in the parameters. This module makes that field, shows its elements factored,
 * and gives the built-ins of families: `at(x, t = 2)` (the member at given values) and `degeneracy(W)`
 * (where a basis drops rank), and the witness value of a false identity.
 */
import type { Field } from '../engine/field.js';
import { DivisionByZeroError } from '../engine/field.js';
import {
  factorPolynomial,
  factorRationalFunction,
  formatFactored,
  formatFactoredQuotient,
  gcdPolynomials,
  latexFactored,
  latexFactoredQuotient,
  rationalFunctionField,
  type MultivariatePolynomial,
  type RationalFunction,
  type RationalFunctionField,
} from '../engine/polynomials/index.js';
import { pluckerCoordinates } from '../engine/plucker.js';
import { determinant } from '../engine/matrix.js';
import { fromDense, toDense } from '../engine/multivector.js';
import type { Call, Ident } from './ast.js';
import { subspaceOf } from './arguments.js';
import type { Environment } from './environment.js';
import { fail } from './failure.js';
import type { Evaluate } from './geometry.js';
import { describeValue, type DegeneracyValue, type Scalar, type SubspaceValue, type Value } from './values.js';

/* eslint-disable @typescript-eslint/no-explicit-any */
type Family = RationalFunctionField<any>;

/** Past these sizes an element is shown expanded: factoring it would cost more than a hover may. */
const FACTOR_TERMS = 120;
const FACTOR_DEGREE = 60;

/** Whether the file's field is a field of rational functions (the file declares parameters). */
export function familyField(F: Field<any>): Family | undefined {
  const K = F as Partial<Family> & { family?: Family };
  return K.family ?? (K.ring && K.variables && K.substitute ? (K as Family) : undefined);
}

function factorable(R: Family['ring'], p: MultivariatePolynomial<any>): boolean {
  return p.terms.length <= FACTOR_TERMS && R.totalDegree(p) <= FACTOR_DEGREE;
}

/**
 * The field of rational functions in `names` over `base`, with elements written factored over the base
 * field (`(t - 1)^2 (t + 2)`, `t/(t + 1)`): what a reader of a family wants to see, and where its
 * special values are read off. Factored text is remembered per element.
 */
export function parametricField(base: Field<any>, names: readonly string[]): Field<RationalFunction<any>> {
  const K = rationalFunctionField(base, names);
  const text = new WeakMap<object, string>();
  const tex = new WeakMap<object, string>();
  const shown = (a: RationalFunction<any>, style: 'text' | 'latex'): string => {
    const cache = style === 'text' ? text : tex;
    const known = cache.get(a);
    if (known !== undefined) return known;
    let out: string;
    if (K.isZero(a) || !factorable(K.ring, a.num) || !factorable(K.ring, a.den)) out = style === 'text' ? K.format(a) : K.latex(a);
    else {
      const form = factorRationalFunction(K, a);
      out = style === 'text' ? formatFactoredQuotient(K.ring, form) : latexFactoredQuotient(K.ring, form);
    }
    cache.set(a, out);
    return out;
  };
  return Object.freeze({
    ...bindAll(K),
    family: K,
    format: (a: RationalFunction<any>) => shown(a, 'text'),
    latex: (a: RationalFunction<any>) => shown(a, 'latex'),
  }) as unknown as Field<RationalFunction<any>>;
}

/** The field's operations as plain properties (a spread drops methods of a prototype). */
function bindAll(K: Family): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  let o: object | null = K;
  while (o && o !== Object.prototype) {
    for (const key of Object.getOwnPropertyNames(o)) {
      if (key === 'constructor' || key in out) continue;
      const value = (K as unknown as Record<string, unknown>)[key];
      out[key] = typeof value === 'function' ? (value as (...a: unknown[]) => unknown).bind(K) : value;
    }
    o = Object.getPrototypeOf(o);
  }
  return out;
}

/** A polynomial factored, as text and LaTeX (expanded past the sizes above). */
export function factoredPolynomial(K: Family, p: MultivariatePolynomial<any>): { text: string; latex: string } {
  if (!factorable(K.ring, p) || K.ring.isZero(p)) {
    const f = K.fromPolynomial(p);
    return { text: K.format(f), latex: K.latex(f) };
  }
  const form = factorPolynomial(K.ring, p);
  return { text: formatFactored(K.ring, form), latex: latexFactored(K.ring, form) };
}

/** The values the linear factors of a factored polynomial in one variable vanish at: t = −c0/c1. */
export function rootsOfLinearFactors(K: Family, p: MultivariatePolynomial<any>): { value: any; multiplicity: number }[] {
  if (K.ring.isZero(p) || K.ring.isConstant(p) || K.variables.length !== 1 || !factorable(K.ring, p)) return [];
  const B = K.base;
  const name = K.variables[0]!;
  const out: { value: any; multiplicity: number }[] = [];
  for (const factor of factorPolynomial(K.ring, p).factors) {
    if (K.ring.degreeIn(factor.polynomial, name) !== 1 || K.ring.totalDegree(factor.polynomial) !== 1) continue;
    // c1·t + c0 = 0 at t = −c0/c1: the values at 0 and 1 give c0 and c0 + c1.
    const c0 = K.ring.evaluate(factor.polynomial, { [name]: B.zero });
    const c1 = B.sub(K.ring.evaluate(factor.polynomial, { [name]: B.one }), c0);
    out.push({ value: B.neg(B.div(c0, c1)), multiplicity: factor.multiplicity });
  }
  return out;
}

/** The value given to a parameter in `at(…, t = 2)`: a constant of the file's field. */
function parameterValue(env: Environment, K: Family, name: Ident, value: Value, span: Call['span']): any {
  if (!K.variables.includes(name.name)) fail('type/operand', name.span, `${name.name} is not a parameter of this file (its parameters: ${K.variables.join(', ')})`);
  if (value.t !== 'scalar') fail('type/operand', span, `a parameter takes a number, found ${describeValue(value)}`);
  const c = K.constantValue(value.value);
  if (c === undefined) fail('type/operand', span, `${name.name} takes a number, not ${env.F.format(value.value)}, which depends on the parameters`);
  return c;
}

/** A value with the parameters given values: every scalar it holds substituted. */
function substituted(env: Environment, K: Family, v: Value, values: Record<string, any>, span: Call['span']): Value {
  const at = (x: Scalar): Scalar => {
    try {
      return K.substitute(x, values);
    } catch (err) {
      if (err instanceof DivisionByZeroError) fail('math/division-by-zero', span, `${env.F.format(x)} has a denominator that vanishes there`);
      throw err;
    }
  };
  switch (v.t) {
    case 'scalar':
      return { t: 'scalar', value: at(v.value) };
    case 'vector':
      return { ...v, coords: v.coords.map(at) };
    case 'subspace': {
      const rows = (v.given ?? v.basis).map((r) => r.map(at));
      const member = subspaceOf(env, v.space, rows, { given: rows });
      if (member.basis.length < rows.length) {
        member.note = `At these values the ${rows.length} basis vectors span only a ${member.basis.length}-dimensional subspace: the family degenerates here (see degeneracy(…)).`;
      }
      return member;
    }
    case 'multivector':
      return { t: 'multivector', space: v.space, mv: fromDense(env.F, v.mv.n, v.mv.k, toDense(env.F, v.mv).map(at)) };
    case 'map':
      return { ...v, matrix: v.matrix.map((r) => r.map(at)) };
    default:
      fail('type/operand', span, `at(…) gives a member of a vector, subspace, multivector, map or number, not of ${describeValue(v)}`);
  }
}

function degeneracyOf(env: Environment, K: Family, w: SubspaceValue): DegeneracyValue {
  const rows = w.given ?? w.basis;
  const minors = pluckerCoordinates(env.F, rows, w.space.dim) as RationalFunction<any>[];
  // The minors are polynomials when the entries are; rational entries are cleared by each minor's denominator.
  let g = K.ring.zero;
  for (const m of minors) if (!K.isZero(m)) g = gcdPolynomials(K.ring, g, m.num);
  const shown = factoredPolynomial(K, g);
  return { t: 'degeneracy', subspace: w, gcd: g, text: shown.text, latex: shown.latex, roots: rootsOfLinearFactors(K, g), degree: K.ring.totalDegree(g), variables: K.variables };
}

/** The built-ins of families, or undefined for another call. */
export function callParameters(env: Environment, e: Call, evaluate: Evaluate): Value | undefined {
  if (e.callee.name !== 'at' && e.callee.name !== 'degeneracy') return undefined;
  const K = familyField(env.F);
  if (!K) fail('type/operand', e.callee.span, `${e.callee.name}(…) is for families: declare a parameter first (parameter t)`);
  if (e.callee.name === 'degeneracy') {
    if (e.args.length !== 1) fail('type/arguments', e.span, `degeneracy(W) takes 1 argument, found ${e.args.length}`);
    const w = evaluate(e.args[0]!);
    if (w.t !== 'subspace') fail('type/operand', e.args[0]!.span, `degeneracy takes a subspace, found ${describeValue(w)}`);
    return degeneracyOf(env, K, w);
  }
  if (e.args.length !== 1 || !e.named || e.named.length === 0) {
    fail('type/arguments', e.span, 'at(x, t = 2) takes one value and the values of parameters, e.g. at(W, t = 2)');
  }
  const values: Record<string, any> = {};
  for (const a of e.named) {
    if (a.name.name in values) fail('type/arguments', a.name.span, `${a.name.name} is given twice`);
    values[a.name.name] = parameterValue(env, K, a.name, evaluate(a.value), a.value.span);
  }
  return substituted(env, K, evaluate(e.args[0]!), values, e.span);
}

/**
 * For a nonzero rational function of a false identity: a small value of the parameters where it is
 * defined and not zero, as `t = 2` (integers 0, 1, −1, 2, −2, … for each parameter in turn, the others
 * at 0 first). Undefined when none of the tried values works (over a tiny field, say).
 */
export function witnessValue(env: Environment, x: Scalar): string | undefined {
  const K = familyField(env.F);
  if (!K || K.isZero(x)) return undefined;
  const B = K.base;
  const tries = [0n, 1n, -1n, 2n, -2n, 3n, -3n, 4n, -4n, 5n].map((n) => B.fromBigInt(n));
  const names = K.variables;
  // Assignments in order of their largest |value|: every parameter at 0, then one moved, and so on.
  const assignments: Record<string, any>[] = [];
  const walk = (i: number, current: Record<string, any>) => {
    if (assignments.length > 400) return;
    if (i === names.length) return void assignments.push({ ...current });
    for (const v of tries) walk(i + 1, { ...current, [names[i]!]: v });
  };
  walk(0, {});
  for (const values of assignments) {
    try {
      const value = K.evaluate(x, values);
      if (!B.isZero(value)) return names.map((n) => `${n} = ${B.format(values[n])}`).join(', ') + ` (where it is ${B.format(value)})`;
    } catch (err) {
      if (!(err instanceof DivisionByZeroError)) throw err;
    }
  }
  return undefined;
}

/**
 * For a scalar of a one-parameter family: the values of the parameter where it is zero (a pairing of
 * two families of lines is zero exactly where they meet), or undefined outside families.
 */
export function familyZeros(env: Environment, x: Scalar): { sentence: string; values: string[] } | undefined {
  const K = familyField(env.F);
  if (!K || K.variables.length !== 1 || K.isZero(x) || K.ring.isConstant(x.num)) return undefined;
  const roots = rootsOfLinearFactors(K, x.num);
  const t = K.variables[0]!;
  const values = roots.map((r) => K.base.format(r.value));
  const sentence =
    roots.length > 0
      ? `Zero exactly at ${roots.map((r) => `${t} = ${K.base.format(r.value)}${r.multiplicity > 1 ? ` (multiplicity ${r.multiplicity})` : ''}`).join(', ')}${roots.reduce((a, r) => a + r.multiplicity, 0) < K.ring.totalDegree(x.num) ? ', and where its other factors vanish, outside the field' : ''}.`
      : `Zero at no value of ${t} in the field.`;
  return { sentence, values };
}

/**
 * In a family: where the chart with the identity in `columns` stops applying, the zeros of the minor of
 * the basis on those columns (in words, for the chart's hover); undefined outside families.
 */
export function chartInFamilyNote(env: Environment, w: SubspaceValue, columns: readonly number[]): string | undefined {
  const K = familyField(env.F);
  if (!K) return undefined;
  const rows = w.given ?? w.basis;
  const minor = determinant(env.F, rows.map((r) => columns.map((c) => r[c])));
  const name = `the minor on columns ${columns.map((c) => env.labels.position(c)).join(', ')}`;
  const zeros = familyZeros(env, minor);
  if (K.variables.length === 1 && zeros && zeros.values.length > 0) {
    return `The chart applies where ${name}, ${env.F.format(minor)}, is not zero: for every ${K.variables[0]} except ${zeros.values.join(', ')} (there it has no point of this family).`;
  }
  if (zeros === undefined && K.ring.isConstant(minor.num)) return `The chart applies for every value of ${K.variables.join(', ')}: ${name} is a nonzero constant.`;
  return `The chart applies where ${name}, ${env.F.format(minor)}, is not zero.`;
}

/**
 * A small value of the parameters (as `t = 2`) for which `holdsFor` is false, given a way to turn each
 * value of a claim into its member there; undefined when every tried value passes or cannot be taken
 * (a denominator vanishing, a value that has no member).
 */
export function failingMember(env: Environment, holdsFor: (member: (v: Value) => Value) => boolean): string | undefined {
  const K = familyField(env.F);
  if (!K) return undefined;
  const B = K.base;
  const tries = [0n, 1n, -1n, 2n, -2n, 3n].map((n) => B.fromBigInt(n));
  const assignments: Record<string, any>[] = [{}];
  for (const name of K.variables) {
    const next: Record<string, any>[] = [];
    for (const a of assignments) for (const v of tries) next.push({ ...a, [name]: v });
    assignments.splice(0, assignments.length, ...next.slice(0, 200));
  }
  const span = { start: 0, end: 0 };
  for (const values of assignments) {
    try {
      const member = (v: Value): Value => (isSubstitutable(v) ? substituted(env, K, v, values, span) : v);
      if (!holdsFor(member)) return K.variables.map((n) => `${n} = ${B.format(values[n])}`).join(', ');
    } catch {
      // No member there (a pole, a value that degenerates): try the next value.
    }
  }
  return undefined;
}

function isSubstitutable(v: Value): boolean {
  return v.t === 'scalar' || v.t === 'vector' || v.t === 'subspace' || v.t === 'multivector' || v.t === 'map';
}
