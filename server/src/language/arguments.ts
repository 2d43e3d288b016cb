/**
 * Small helpers every built-in shares: argument counts, reading index sets
 * as written, viewing a vector as a degree-1 multivector, and making a
 * subspace value from spanning rows.
 */
import { rref } from '../engine/matrix.js';
import { fromVector } from '../engine/multivector.js';
import type { Call, Expr } from './ast.js';
import type { Environment } from './environment.js';
import { fail } from './failure.js';
import type { MultivectorValue, Scalar, SpaceInfo, SubspaceValue, Value } from './values.js';

export function arity(e: Call, n: number, signature: string): void {
  if (e.args.length !== n) {
    fail('type/arguments', e.span, `${signature} takes ${n} argument${n === 1 ? '' : 's'}, found ${e.args.length}`);
  }
}

/** A vector as a degree-1 multivector, so that sums, wedges and claims mix the two freely. */
export function asMultivector(env: Environment, v: Value): MultivectorValue | undefined {
  if (v.t === 'multivector') return v;
  if (v.t === 'vector') return { t: 'multivector', space: v.space, mv: fromVector(env.F, v.coords) };
  return undefined;
}

/**
 * The subspace spanned by `rows`, reduced. `given` keeps the user's rows when
 * they are independent, so raw Plücker coordinates are the user's minors.
 */
export function subspaceOf(
  env: Environment,
  space: SpaceInfo,
  rows: Scalar[][],
  extras: { given?: Scalar[][]; note?: string } = {},
): SubspaceValue {
  const ech = rref(env.F, rows, space.dim);
  const value: SubspaceValue = { t: 'subspace', space, basis: ech.rows, pivots: ech.pivots };
  if (extras.given && extras.given.length === ech.rank) value.given = extras.given;
  if (extras.note) value.note = extras.note;
  return value;
}

/**
 * An index set as written — `13` (one digit a label, while every label of the
 * space has one digit) or `(1, 3)` — as 0-based positions, checked against the
 * space and, when `size` is given, against the number of labels expected.
 */
export function readIndexSet(env: Environment, arg: Expr, space: SpaceInfo, size?: number): number[] {
  const singleDigits = space.dim - 1 + env.convention.firstLabel <= 9;
  let labels: number[];
  if (arg.type === 'number' && /^\d+$/.test(arg.text)) {
    labels = singleDigits ? [...arg.text].map(Number) : [Number(arg.text)];
    if (!singleDigits && arg.text.length > 1 && size !== 1) {
      fail('type/index-set', arg.span, 'with labels above 9 write the index set as a list, e.g. (1, 10)');
    }
  } else if (arg.type === 'tuple' && arg.items.every((x) => x.type === 'number' && /^\d+$/.test(x.text))) {
    labels = arg.items.map((x) => Number((x as { text: string }).text));
  } else {
    fail('type/index-set', arg.span, 'expected an index set such as 13 or (1, 3)');
  }
  if (size !== undefined && labels.length !== size) {
    fail('type/index-set', arg.span, `the index set has ${labels.length} labels, but the subspace has dimension ${size}`);
  }
  const positions = labels.map((l) => l - env.convention.firstLabel);
  const bad = positions.findIndex((p) => p < 0 || p >= space.dim);
  if (bad >= 0) {
    fail('type/bad-label', arg.span, `label ${labels[bad]} is outside ${env.labels.position(0)}…${env.labels.position(space.dim - 1)}`);
  }
  if (new Set(positions).size !== positions.length) fail('type/repeated-label', arg.span, 'the index set repeats a label');
  return positions;
}
