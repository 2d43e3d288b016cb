/**
 * Schubert calculus in the language: the Grassmannian `Gr(k, n)`, Schubert classes `sigma(X, λ…)` and
 * their arithmetic (sums, whole multiples, products by the Littlewood–Richardson rule, powers), the
 * degree of a Grassmannian, intersection numbers, and the explicit problem of the lines meeting four
 * given lines (`transversals`). The counting is the engine's (../engine/schubert-calculus.ts); here
 * arguments are read and checked, with a clear problem at the argument that is wrong.
 */
import {
  addClasses,
  classCoefficient,
  dualClass,
  grassmannianDegree,
  multiplyClasses,
  powerClass,
  scaleClass,
  schubertSigma,
  subtractClasses,
  type SchubertClass,
} from '../engine/schubert-calculus.js';
import { InvalidPartitionError } from '../engine/partitions.js';
import { fourLineTransversals } from '../engine/four-line-transversals.js';
import type { Binary, Call, Expr } from './ast.js';
import type { Environment } from './environment.js';
import { fail } from './failure.js';
import type { Evaluate } from './geometry.js';
import { describeValue, type ClassValue, type CountValue, type GrassmannianValue, type SubspaceValue, type Value } from './values.js';

/** The largest n of `Gr(k, n)`: the classes of G(k, n) number C(n, k), and products walk them. */
const MAX_AMBIENT = 64;
/** The largest exponent of a class power, a bound on the work a few characters can ask for. */
const MAX_POWER = 400;

/** A whole number as written (`3`, or `-3` for sums and multiples), or undefined for anything else. */
export function wholeNumberLiteral(e: Expr): bigint | undefined {
  if (e.type === 'number' && /^\d+$/.test(e.text)) return BigInt(e.text);
  if (e.type === 'unary' && e.operand.type === 'number' && /^\d+$/.test(e.operand.text)) {
    return e.op === '-' ? -BigInt(e.operand.text) : BigInt(e.operand.text);
  }
  return undefined;
}

function wholeArgument(e: Expr, what: string, least: number, most: number): number {
  const n = wholeNumberLiteral(e);
  if (n === undefined || n < BigInt(least) || n > BigInt(most)) {
    fail('type/operand', e.span, `${what} is a whole number from ${least} to ${most}`);
  }
  return Number(n);
}

function grassmannianArg(v: Value, e: Expr, what: string): GrassmannianValue {
  if (v.t !== 'grassmannian') fail('type/operand', e.span, `${what} takes a Grassmannian such as Gr(2, 4), found ${describeValue(v)}`);
  return v;
}

function classArg(v: Value, e: Expr, what: string): ClassValue {
  if (v.t === 'class') return v;
  fail('type/operand', e.span, `${what} takes a Schubert class such as sigma(X, 1), found ${describeValue(v)}`);
}

/** `Gr(k, n)` or `Gr(k, V)` for a declared space V. */
function grassmannianOf(e: Call, evaluate: Evaluate): GrassmannianValue {
  if (e.args.length !== 2) fail('type/arguments', e.span, `Gr(k, n) takes 2 arguments, found ${e.args.length}`);
  const nArg = e.args[1]!;
  let n: number;
  if (wholeNumberLiteral(nArg) !== undefined) n = wholeArgument(nArg, 'n of Gr(k, n)', 1, MAX_AMBIENT);
  else {
    const v = evaluate(nArg);
    if (v.t !== 'space') fail('type/operand', nArg.span, `Gr(k, n) takes the dimension n or a space, found ${describeValue(v)}`);
    if (v.space.dim > MAX_AMBIENT) fail('limit/dimension', nArg.span, `Schubert calculus is offered up to n = ${MAX_AMBIENT}; ${v.space.name} has dimension ${v.space.dim}`);
    n = v.space.dim;
  }
  const k = wholeArgument(e.args[0]!, `k of Gr(k, ${n})`, 0, n);
  return { t: 'grassmannian', k, n };
}

/** The partition of `sigma(X, 2, 1)` or `sigma(X, (2, 1))`; `sigma(X)` is σ_∅ = 1. */
function partitionOf(args: readonly Expr[]): { parts: number[]; span: Expr['span'] | undefined } {
  const items = args.length === 1 && args[0]!.type === 'tuple' ? args[0]!.items : args;
  const parts = items.map((item) => {
    const n = wholeNumberLiteral(item);
    if (n === undefined || n < 0n) fail('type/operand', item.span, 'a partition lists whole numbers, largest first: sigma(X, 2, 1)');
    return Number(n);
  });
  const span = args.length > 0 ? { start: args[0]!.span.start, end: args[args.length - 1]!.span.end } : undefined;
  return { parts, span };
}

function sigmaOf(e: Call, evaluate: Evaluate): ClassValue {
  if (e.args.length === 0) fail('type/arguments', e.span, 'sigma(X, λ1, λ2, …) takes a Grassmannian and a partition');
  const X = grassmannianArg(evaluate(e.args[0]!), e.args[0]!, 'sigma');
  const { parts, span } = partitionOf(e.args.slice(1));
  try {
    return { t: 'class', cls: schubertSigma(X.k, X.n, parts) };
  } catch (err) {
    if (err instanceof InvalidPartitionError) {
      fail(
        'math/bad-partition',
        span ?? e.span,
        `(${parts.join(', ')}) is no partition of a Schubert class of G(${X.k},${X.n}): those fit in the ${X.k}×${X.n - X.k} box, ` +
          `at most ${X.k} parts, each at most ${X.n - X.k}, largest first`,
      );
    }
    throw err;
  }
}

/** The coefficient of the point class: the intersection number of a class of top degree k(n−k). */
export function intersectionNumberOf(cls: SchubertClass): bigint {
  const point = Array.from({ length: cls.k }, () => cls.n - cls.k);
  return classCoefficient(cls, point);
}

function count(value: bigint, what: string): CountValue {
  return { t: 'count', value, what };
}

function linesOf(e: Call, evaluate: Evaluate): SubspaceValue[] {
  if (e.args.length !== 4) fail('type/arguments', e.span, `transversals(L1, L2, L3, L4) takes 4 lines, found ${e.args.length}`);
  return e.args.map((arg) => {
    const v = evaluate(arg);
    if (v.t !== 'subspace' || v.space.dim !== 4 || v.basis.length !== 2) {
      fail('type/not-a-line', arg.span, `transversals takes lines of projective 3-space (2-dimensional subspaces of a 4-dimensional space), found ${describeValue(v)}${v.t === 'subspace' ? ` of dimension ${v.basis.length} in dimension ${v.space.dim}` : ''}`);
    }
    return v;
  });
}

/** The built-ins of Schubert calculus, or undefined for another call. */
export function callSchubertCalculus(env: Environment, e: Call, evaluate: Evaluate): Value | undefined {
  switch (e.callee.name) {
    case 'Gr':
      return grassmannianOf(e, evaluate);
    case 'sigma':
      return sigmaOf(e, evaluate);
    case 'degree': {
      if (e.args.length !== 1) fail('type/arguments', e.span, `degree(X) takes 1 argument, found ${e.args.length}`);
      const X = grassmannianArg(evaluate(e.args[0]!), e.args[0]!, 'degree');
      return count(grassmannianDegree(X.k, X.n), `the degree of G(${X.k},${X.n}) in its Plücker embedding`);
    }
    case 'intersection_number': {
      if (e.args.length !== 1) fail('type/arguments', e.span, `intersection_number(c) takes 1 argument, found ${e.args.length}`);
      const c = classArg(evaluate(e.args[0]!), e.args[0]!, 'intersection_number').cls;
      return count(intersectionNumberOf(c), `the intersection number of a class of G(${c.k},${c.n}): its coefficient of the point class`);
    }
    case 'dual': {
      if (e.args.length !== 1) fail('type/arguments', e.span, `dual(c) takes 1 argument, found ${e.args.length}`);
      return { t: 'class', cls: dualClass(classArg(evaluate(e.args[0]!), e.args[0]!, 'dual').cls) };
    }
    case 'transversals': {
      const lines = linesOf(e, evaluate);
      return { t: 'transversals', lines, result: fourLineTransversals(env.F, lines.map((l) => l.given ?? l.basis)) };
    }
    default:
      return undefined;
  }
}

function sameGrassmannian(a: SchubertClass, b: SchubertClass, e: Binary): void {
  if (a.k !== b.k || a.n !== b.n) {
    fail('type/operand', e.opSpan, `these classes live in different Grassmannians, G(${a.k},${a.n}) and G(${b.k},${b.n})`);
  }
}

/**
 * Arithmetic with classes: `c + d`, `c - d`, `2 c`, `c * d` (Littlewood–Richardson), `c^4`. Undefined
 * when neither side is a class. Whole numbers are read as written: the ring of classes has integer
 * coefficients whatever the file's field is.
 */
export function classArithmetic(e: Binary, left: Value, right: Value): Value | undefined {
  if (left.t !== 'class' && right.t !== 'class') return undefined;
  const a = left.t === 'class' ? left.cls : undefined;
  const b = right.t === 'class' ? right.cls : undefined;
  switch (e.op) {
    case '+':
    case '-':
      if (!a || !b) fail('type/operand', e.opSpan, `a Schubert class adds to another class of the same Grassmannian, not to ${describeValue(a ? right : left)}`);
      sameGrassmannian(a, b, e);
      return { t: 'class', cls: e.op === '+' ? addClasses(a, b) : subtractClasses(a, b) };
    case '*': {
      if (a && b) {
        sameGrassmannian(a, b, e);
        return { t: 'class', cls: multiplyClasses(a, b) };
      }
      const factor = wholeNumberLiteral(a ? e.right : e.left);
      if (factor === undefined) fail('type/operand', e.implicit ? e.span : e.opSpan, `a Schubert class is multiplied by a class or by a whole number as written, not by ${describeValue(a ? right : left)}`);
      return { t: 'class', cls: scaleClass((a ?? b)!, factor) };
    }
    case '^': {
      const exponent = wholeNumberLiteral(e.right);
      if (!a || exponent === undefined || exponent < 0n) fail('type/operand', e.opSpan, 'a Schubert class is raised to a whole power as written: sigma(X, 1)^4');
      if (exponent > BigInt(MAX_POWER)) fail('limit/number-size', e.right.span, `powers of classes are computed up to ${MAX_POWER}`);
      return { t: 'class', cls: powerClass(a, Number(exponent)) };
    }
    default:
      fail('type/operand', e.opSpan, `Schubert classes have sums, products and powers; '${e.op}' does not apply to ${describeValue(a ? left : right)}`);
  }
}

/** Whether two classes are equal (same Grassmannian, same coefficients). */
export function classesEqual(a: SchubertClass, b: SchubertClass): boolean {
  return (
    a.k === b.k &&
    a.n === b.n &&
    a.terms.length === b.terms.length &&
    a.terms.every((t, i) => t.coefficient === b.terms[i]!.coefficient && t.partition.join(',') === b.terms[i]!.partition.join(','))
  );
}
