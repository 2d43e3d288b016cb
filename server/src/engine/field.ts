/**
 * The one interface every algorithm in the engine is written against.
 *
 * Values of type `T` are opaque to callers: they are only combined through the
 * field's operations. This keeps row reduction, Plücker coordinates and
 * decomposability identical over the rationals and over prime fields.
 */
export interface Field<T> {
  /** Short name as users write it: `QQ`, `GF(7)`. */
  readonly name: string;
  /** 0n for the rationals, p for GF(p). */
  readonly characteristic: bigint;
  readonly zero: T;
  readonly one: T;

  add(a: T, b: T): T;
  sub(a: T, b: T): T;
  mul(a: T, b: T): T;
  neg(a: T): T;
  /** Throws `DivisionByZeroError` when `a` is zero. */
  inv(a: T): T;
  /** Throws `DivisionByZeroError` when `b` is zero. */
  div(a: T, b: T): T;

  eq(a: T, b: T): boolean;
  isZero(a: T): boolean;
  isOne(a: T): boolean;

  /** The image of an integer. */
  fromBigInt(n: bigint): T;
  /** The image of num/den; throws `DivisionByZeroError` when den maps to zero. */
  fromRational(num: bigint, den: bigint): T;

  /** Exact text: `-3/4`, `5`; over GF(p) the representative in [0, p). */
  format(a: T): string;
  /** LaTeX: `-\frac{3}{4}`; over GF(p) the representative. */
  latex(a: T): string;

  /**
   * The sign of a value where the field is ordered (the rationals): -1, 0 or 1.
   * Undefined for fields without an order (GF(p)).
   */
  sign?(a: T): -1 | 0 | 1;
}

/** Raised by `inv`, `div` and `fromRational` on a zero divisor. */
export class DivisionByZeroError extends Error {
  constructor(what = 'division by zero') {
    super(what);
    this.name = 'DivisionByZeroError';
  }
}
