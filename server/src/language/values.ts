/**
 * The values the evaluator computes, one variant per kind of object a `.wedge`
 * file talks about. Scalars are opaque elements of the file's field.
 */
import type { Multivector } from '../engine/multivector.js';
import type { SchubertClass } from '../engine/schubert-calculus.js';
import type { FourLineTransversals } from '../engine/four-line-transversals.js';
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
  /** A space the file did not declare (the dual V* of an annihilator): never guessed as the home of a literal. */
  derived?: boolean;
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
  /** A sentence about how it was obtained, shown in its hover (e.g. the sign rule of an annihilator). */
  note?: string;
}

export interface MultivectorValue {
  t: 'multivector';
  space: SpaceInfo;
  mv: Multivector<Scalar>;
  /** Set when this is the Plücker vector of a subspace (for display). */
  pluckerOf?: SubspaceValue;
  /** Computed on demand and cached: decomposability is not free. */
  decomposition?: Decomposition<Scalar>;
  /** A sentence about how it was obtained, shown in its hover (e.g. the sign rule of a complement). */
  note?: string;
}

/** A linear map f: V → U, as the (dim V)×(dim U) matrix whose row i is f(e_i). */
export interface MapValue {
  t: 'map';
  name: string;
  from: SpaceInfo;
  to: SpaceInfo;
  matrix: Scalar[][];
}

/** A complete flag F_1 ⊂ … ⊂ F_n of V, by vectors f_1 … f_n with F_i = span(f_1 … f_i). */
export interface FlagValue {
  t: 'flag';
  space: SpaceInfo;
  rows: Scalar[][];
  /** 'standard', 'opposite' or 'vectors'. */
  origin: 'standard' | 'opposite' | 'vectors';
}

/** The Schubert cell of a subspace relative to a flag. */
export interface SchubertValue {
  t: 'schubert';
  subspace: SubspaceValue;
  flag: FlagValue;
  jumps: number[];
  partition: number[];
  codimension: number;
  cellDimension: number;
  echelon: Scalar[][];
  conditions: number[];
}

/** V/W: its dimension and representatives of a basis. */
export interface QuotientValue {
  t: 'quotient';
  space: SpaceInfo;
  subspace: SubspaceValue;
  representatives: Scalar[][];
}

/** The k-th compound matrix of a map: the induced map on the k-th exterior power. */
export interface CompoundValue {
  t: 'compound';
  map: MapValue;
  k: number;
  matrix: Scalar[][];
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
  /** In a family: where the chart stops applying (the zeros of its minor), in words. */
  note?: string;
}

/** The matroid of a subspace's basis columns, over the file's field. */
export interface MatroidValue {
  t: 'matroid';
  subspace: SubspaceValue;
  field: string;
  rank: number;
  bases: number[][];
  loops: number[];
  coloops: number[];
  isUniform: boolean;
}

/** Signs of a Plücker vector (ordered fields only). */
export interface PositivityValue {
  t: 'positivity';
  subspace: SubspaceValue;
  totallyNonnegative: boolean;
  totallyPositive: boolean;
  /** Signs in lexicographic order. */
  signs: (-1 | 0 | 1)[];
}

/** How two lines of projective 3-space lie: the pairing, and the common point and plane when they meet. */
export interface MeetValue {
  t: 'meet';
  kind: 'same' | 'intersecting' | 'parallel' | 'skew';
  pairing: Scalar;
  commonPoint?: Scalar[];
  commonPlane?: Scalar[];
  /** Whether a plane at infinity was declared (only then can 'parallel' be told from 'intersecting'). */
  infinityDeclared: boolean;
}

/** A line of projective 3-space as direction and moment. */
export interface DirectionMomentValue {
  t: 'direction-moment';
  direction: Scalar[];
  moment: Scalar[];
  coordinates: Scalar[];
  description: string;
}

/** A count too large for a plain number (the number of k-subspaces of GF(q)^n), with what it counts. */
export interface CountValue {
  t: 'count';
  value: bigint;
  what: string;
}

/** A bounded list of subspaces (all k-subspaces of a small space over a finite field). */
export interface SubspaceListValue {
  t: 'subspaces';
  space: SpaceInfo;
  k: number;
  bases: Scalar[][][];
}

/** A Grassmannian G(k, n) for Schubert calculus (`Gr(2, 4)`). */
export interface GrassmannianValue {
  t: 'grassmannian';
  k: number;
  n: number;
}

/** An integer combination of Schubert classes of one Grassmannian. */
export interface ClassValue {
  t: 'class';
  cls: SchubertClass;
}

/** The lines of projective 3-space meeting four given lines. */
export interface TransversalsValue {
  t: 'transversals';
  lines: SubspaceValue[];
  result: FourLineTransversals<Scalar>;
}

/** Where the basis of a family drops rank: the gcd of its maximal minors (`degeneracy(W)`). */
export interface DegeneracyValue {
  t: 'degeneracy';
  subspace: SubspaceValue;
  /** The gcd of the maximal minors of the basis as given, normalized (0 when the rank is lower everywhere). */
  gcd: unknown;
  /** The gcd factored, as text and LaTeX. */
  text: string;
  latex: string;
  /** Its zeros in the field, for one parameter: the values where the rank drops, with multiplicities. */
  roots: { value: Scalar; multiplicity: number }[];
  /** The total degree of the gcd. */
  degree: number;
  variables: readonly string[];
}

export type Value =
  | ScalarValue
  | DegeneracyValue
  | GrassmannianValue
  | ClassValue
  | TransversalsValue
  | IntegerValue
  | VectorValue
  | SubspaceValue
  | MultivectorValue
  | MatrixValue
  | PointValue
  | IndexSetValue
  | SpaceValue
  | ChartValue
  | MapValue
  | FlagValue
  | SchubertValue
  | QuotientValue
  | CompoundValue
  | MatroidValue
  | PositivityValue
  | MeetValue
  | DirectionMomentValue
  | CountValue
  | SubspaceListValue;

/** The noun for a value's kind, as messages use it ("a subspace", "a vector in V"). */
export function describeValue(v: Value): string {
  switch (v.t) {
    case 'scalar':
      return 'a scalar';
    case 'integer':
      return 'a whole number';
    case 'degeneracy':
      return 'the degeneracy locus of a family';
    case 'grassmannian':
      return `the Grassmannian G(${v.k},${v.n})`;
    case 'class':
      return `a Schubert class of G(${v.cls.k},${v.cls.n})`;
    case 'transversals':
      return 'the transversals of four lines';
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
    case 'map':
      return `a map ${v.from.name} → ${v.to.name}`;
    case 'flag':
      return `a flag of ${v.space.name}`;
    case 'schubert':
      return 'a Schubert cell';
    case 'quotient':
      return `a quotient of ${v.space.name}`;
    case 'compound':
      return 'a compound matrix';
    case 'matroid':
      return 'a matroid';
    case 'positivity':
      return 'a sign pattern';
    case 'meet':
      return 'the relative position of two lines';
    case 'direction-moment':
      return 'direction and moment of a line';
    case 'count':
      return 'a count';
    case 'subspaces':
      return 'a list of subspaces';
  }
}
