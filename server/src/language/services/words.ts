/**
 * The fixed vocabularies of the language that editor features offer: what each
 * statement keyword does, the convention settings with their values, the
 * normalizations, the fields and the claimable properties. The lists mirror
 * what the language accepts (`../conventions.ts`, `../combinatorics.ts`); a
 * test analyzes every word listed here to keep the two in step.
 */
import { normalizationWords } from '../conventions.js';
import { NORMALIZATIONS } from '../types.js';

export interface Word {
  word: string;
  /** One line for a completion list. */
  detail: string;
}

export const STATEMENT_KEYWORD_DETAILS: Readonly<Record<string, string>> = {
  field: 'the field to compute over: field QQ, field GF(7)',
  normalize: 'how projective points are scaled: normalize primitive',
  space: 'a vector space: space V dim 4 (basis e1 … e4), or with basis a b c d',
  vector: 'a vector: vector p = (1, 0, 2, -1) or 3 e1 - e2',
  subspace: 'a subspace: subspace L = span(p, q), rows [ … ], L + M, L & M',
  multivector: 'a multivector: multivector eta = e1^e2 + e3^e4, {12: 1}, plucker(L)',
  claim: 'a claim checked on evaluation: claim dim L = 2',
  show: 'show the value of an expression: show plucker(L)',
  convention: 'the file\'s conventions: convention order colex labels 0',
  map: 'a linear map by its matrix: map f : V -> U = [ … ]',
  flag: 'a flag: flag E = standard(V), or by n independent vectors',
  parameter: 'parameters the entries may use: parameter t, or parameter s, t',
  grassmannian: 'a Grassmannian for Schubert calculus: grassmannian X = Gr(2, 4)',
  class: 'a Schubert class: class c = sigma(X, 1)^4',
};

/** Keywords inside statements, with what they introduce. */
export const INNER_KEYWORD_DETAILS: Readonly<Record<string, string>> = {
  dim: 'the dimension of a subspace or space',
  basis: 'names for the basis vectors of the space',
  in: 'the space the value lies in (in a claim: membership)',
  not: 'negates the relation of a claim',
  decomposable: 'a multivector that is a wedge of vectors',
  rows: 'the span of the rows of a matrix',
  columns: 'the span of the columns of a matrix',
  solutions: 'the solutions x of A·x = 0',
  is: 'a property of the subject: is totally nonnegative, is uniform, …',
};

export interface ConventionSettingWords {
  key: string;
  detail: string;
  values: readonly Word[];
}

/** The settings of a `convention` statement (the spelling `basis` for `layout` is also read). */
export const CONVENTION_SETTINGS: readonly ConventionSettingWords[] = [
  {
    key: 'order',
    detail: 'how index sets are listed',
    values: [
      { word: 'lex', detail: 'lexicographic: 12, 13, 14, 23, 24, 34' },
      { word: 'colex', detail: 'colexicographic: 12, 13, 23, 14, 24, 34' },
    ],
  },
  {
    key: 'labels',
    detail: 'the first label of basis vectors and coordinates',
    values: [
      { word: '1', detail: 'e1 …, p12 …' },
      { word: '0', detail: 'e0 …, p01 …' },
    ],
  },
  {
    key: 'layout',
    detail: 'basis vectors shown as rows or columns (and how a map\'s matrix is read)',
    values: [
      { word: 'rows', detail: 'basis vectors as rows; a map sends v to v·A' },
      { word: 'columns', detail: 'basis vectors as columns; a map sends v to A·v' },
    ],
  },
  {
    // `normalize` is a statement keyword, so inside a convention the setting is spelt `normalization`.
    key: 'normalization',
    detail: 'how projective points are scaled',
    values: NORMALIZATIONS.map((n) => ({ word: n, detail: normalizationWords(n) })),
  },
  {
    key: 'lines',
    detail: 'lines of projective 3-space as 6-vectors',
    values: [
      { word: 'direction-moment', detail: '(d, m)' },
      { word: 'moment-direction', detail: '(m, d)' },
    ],
  },
  {
    key: 'moment',
    detail: 'the moment of a line',
    values: [
      { word: 'pxd', detail: 'point × direction' },
      { word: 'dxp', detail: 'direction × point' },
    ],
  },
  {
    key: 'homogeneous',
    detail: 'which coordinate of projective 3-space is 0 on the plane at infinity',
    values: [
      { word: 'first', detail: 'x1 (or x0) is the homogeneous coordinate' },
      { word: 'last', detail: 'x4 (or x3) is the homogeneous coordinate' },
    ],
  },
];

export const NORMALIZATION_MODES: readonly Word[] = NORMALIZATIONS.map((n) => ({ word: n, detail: normalizationWords(n) }));

/** The properties of `claim X is …`, as words. */
export const PROPERTIES: readonly Word[] = [
  { word: 'totally nonnegative', detail: 'every nonzero Plücker coordinate has one sign' },
  { word: 'totally positive', detail: 'every Plücker coordinate is nonzero and of one sign' },
  { word: 'uniform', detail: 'every set of k columns is a basis (the matroid is uniform)' },
  { word: 'decomposable', detail: 'the multivector is a wedge of vectors' },
  { word: 'on Klein quadric', detail: 'a 6-vector satisfying p12·p34 − p13·p24 + p14·p23 = 0' },
];
