/**
 * The values the evaluator computes, one variant per kind of object a `.wedge`
 * file talks about. Scalars are opaque elements of the file's field.
 */
import type { Multivector } from '../engine/multivector.js';
import type { Decomposition } from '../engine/decompose.js';
import type { Span } from './types.js';

/** A declared vector space: its dimension and the names of its basis vectors. */
export interface SpaceInfo {
  name: string;
  dim: number;
  basisNames: string[];
  /** Whether the basis names were written by the user (`basis a b c`) or are the default e1…en. */
  namedBasis: boolean;
  declaration: Span;
}

// The field is `Field<any>`: every value below holds scalars of that one field.
/* eslint-disable @typescript-eslint/no-explicit-any */
export type Scalar = any;

export interface ScalarValue {
  t: 'scalar';
  value: Scalar;
}

/** A nonnegative integer that is a count rather than a field element (e.g. a dimension). */
export interface IntegerValue {
  t: 'integer';
  value: number;
}

export interface VectorValue {
  t: 'vector';
  space: SpaceInfo;
  coords: Scalar[];
}

export interface SubspaceValue {
  t: 'subspace';
  space: SpaceInfo;
  /** The reduced row echelon basis (rank rows). */
  basis: Scalar[][];
  pivots: number[];
  /**
   * The rows as the user gave them, when they are independent (span, rows):
   * raw Plücker coordinates are the minors of this matrix, not of the reduced one.
   */
  given?: Scalar[][];
}

export interface MultivectorValue {
  t: 'multivector';
  space: SpaceInfo;
  mv: Multivector<Scalar>;
  /** Set when this is the Plücker vector of a subspace (for display). */
  pluckerOf?: SubspaceValue;
  /** Computed on demand and cached: decomposability is not free. */
  decomposition?: Decomposition<Scalar>;
}

/** `[1 2; 3 4]`: only meaningful inside `rows` and `solutions`. */
export interface MatrixValue {
  t: 'matrix';
  rows: Scalar[][];
  ncols: number;
}

/** `[1 : 3 : 1]`: a projective point given by homogeneous coordinates. */
export interface PointValue {
  t: 'point';
  values: Scalar[];
}

/** An index set as written in `chart(L, 13)`, already 0-based. */
export interface IndexSetValue {
  t: 'indexset';
  /** 0-based positions. */
  positions: number[];
  /** The labels as written. */
  labels: number[];
}

export interface SpaceValue {
  t: 'space';
  space: SpaceInfo;
}

/** The affine chart of a subspace at the index set where p_I ≠ 0. */
export interface ChartValue {
  t: 'chart';
  subspace: SubspaceValue;
  columns: number[];
  otherColumns: number[];
  /** k×(n−k): the entries beside the identity. */
  block: Scalar[][];
  /** k×n: the basis with the identity in `columns`. */
  full: Scalar[][];
}

export type Value =
  | ScalarValue
  | IntegerValue
  | VectorValue
  | SubspaceValue
  | MultivectorValue
  | MatrixValue
  | PointValue
  | IndexSetValue
  | SpaceValue
  | ChartValue;

/** The noun for a value's kind, as messages use it ("a subspace", "a vector in V"). */
export function describeValue(v: Value): string {
  switch (v.t) {
    case 'scalar':
      return 'a scalar';
    case 'integer':
      return 'a whole number';
    case 'vector':
      return `a vector in ${v.space.name}`;
    case 'subspace':
      return `a subspace of ${v.space.name}`;
    case 'multivector':
      return `a multivector of degree ${v.mv.k} over ${v.space.name}`;
    case 'matrix':
      return 'a matrix';
    case 'point':
      return 'a projective point';
    case 'indexset':
      return 'an index set';
    case 'space':
      return 'a space';
    case 'chart':
      return 'chart coordinates';
  }
}
