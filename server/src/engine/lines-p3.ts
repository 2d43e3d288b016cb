/**
 * Lines in projective 3-space: the 2-dimensional subspaces of F^4, with
 * homogeneous point coordinates (x0 : x1 : x2 : x3) stored at indices 0..3.
 *
 * A line is held by its Plücker vector (p01, p02, p03, p12, p13, p23), the
 * 2×2 minors of a 2×4 basis in lexicographic order of column pairs; for the
 * line through the points a and b, p_ij = a_i b_j − a_j b_i. Planes are dual
 * vectors u: the plane u is {x : u0 x0 + u1 x1 + u2 x2 + u3 x3 = 0}.
 *
 * The Plücker vectors of lines are the points of the Klein quadric
 * p01 p23 − p02 p13 + p03 p12 = 0, and two lines meet exactly when the
 * bilinear form of that quadric vanishes on them (classical; e.g. Pottmann–
 * Wallner, Computational Line Geometry — from memory). The identity behind
 * it: for lines a∧b and c∧d, det[a; b; c; d] = kleinPairing(a∧b, c∧d).
 */
import type { Field } from './field.js';
import { intersectRowSpaces, kernel, rank, rowSpaceEquals, sumRowSpaces } from './matrix.js';
import { normalizePoint } from './normalize.js';
import { pluckerCoordinates } from './plucker.js';

export type Vector3<T> = [T, T, T];

/** The column pairs of the six Plücker coordinates, in the engine's (lexicographic) order. */
export const LINE_COORDINATE_PAIRS: readonly (readonly [number, number])[] = [
  [0, 1],
  [0, 2],
  [0, 3],
  [1, 2],
  [1, 3],
  [2, 3],
];

/** The labels of the six coordinates in that order: `p01`, …, `p23`. */
export const LINE_COORDINATE_LABELS: readonly string[] = LINE_COORDINATE_PAIRS.map(([i, j]) => `p${i}${j}`);

function checkVector<T>(v: readonly T[], length: number, what: string): void {
  if (v.length !== length) throw new RangeError(`${what}: ${v.length} coordinates given, expected ${length}`);
}

function checkLineRows<T>(F: Field<T>, rows: readonly (readonly T[])[], what: string): T[] {
  if (rows.length !== 2) throw new RangeError(`${what}: a line needs 2 basis rows, ${rows.length} given`);
  rows.forEach((row, i) => checkVector(row, 4, `${what} (row ${i})`));
  const p = pluckerCoordinates(F, rows, 4);
  if (p.every((x) => F.isZero(x))) {
    throw new RangeError(`${what}: the two rows are proportional, so they span a point, not a line`);
  }
  return p;
}

/**
 * The Plücker vector of the line through the points a and b (4 homogeneous
 * coordinates each): p_ij = a_i b_j − a_j b_i in the order p01, p02, p03,
 * p12, p13, p23. Swapping a and b negates it. Throws when a and b are
 * proportional (the same point, or one of them zero).
 */
export function lineThroughPoints<T>(F: Field<T>, a: readonly T[], b: readonly T[]): T[] {
  checkVector(a, 4, 'lineThroughPoints (first point)');
  checkVector(b, 4, 'lineThroughPoints (second point)');
  const p = pluckerCoordinates(F, [a, b], 4);
  if (p.every((x) => F.isZero(x))) {
    throw new RangeError('lineThroughPoints: the two points are proportional (or zero), so they span no line');
  }
  return p;
}

/**
 * Exchanges point (ray) coordinates and plane (axis) coordinates of a line:
 * (x01, x02, x03, x12, x13, x23) ↦ (x23, −x13, x12, x03, −x02, x01), that is
 * x_ij ↦ sgn(i j k l)·x_kl with {k, l} the complementary pair. The map is its
 * own inverse. If π = u∧v for two planes u, v through a line, then
 * dualCoordinates(π) is proportional to the line's Plücker vector p, and
 * conversely (classical; from memory, and checked in the tests).
 */
export function dualCoordinates<T>(F: Field<T>, x: readonly T[]): T[] {
  checkVector(x, 6, 'dualCoordinates');
  const [x01, x02, x03, x12, x13, x23] = x as [T, T, T, T, T, T];
  return [x23, F.neg(x13), x12, x03, F.neg(x02), x01];
}

/** The line where two planes meet. */
export interface LineOfPlanes<T> {
  /** A basis of the line: the kernel basis of the 2×4 matrix [u; v] (one row per free column), two points on both planes. */
  rows: T[][];
  /** The Plücker vector of `rows` (lexicographic p01 … p23). */
  plucker: T[];
  /** The plane coordinates π_ij = u_i v_j − u_j v_i (same order); `plucker` is proportional to dualCoordinates(π). */
  dual: T[];
}

/**
 * The line common to the planes u and v (dual vectors): the annihilator of
 * span(u, v), found as the kernel of [u; v], with its Plücker vector. The
 * plane coordinates π = u∧v relate to it by p_ij ∝ sgn(i j k l)·π_kl:
 * p01 : p02 : p03 : p12 : p13 : p23 = π23 : −π13 : π12 : π03 : −π02 : π01.
 * Throws when u and v are proportional (the same plane, or zero).
 */
export function lineOfPlanes<T>(F: Field<T>, u: readonly T[], v: readonly T[]): LineOfPlanes<T> {
  checkVector(u, 4, 'lineOfPlanes (first plane)');
  checkVector(v, 4, 'lineOfPlanes (second plane)');
  if (rank(F, [u, v], 4) < 2) {
    throw new RangeError('lineOfPlanes: the two planes are proportional (or zero), so they meet in no line');
  }
  const rows = kernel(F, [u, v], 4);
  return { rows, plucker: pluckerCoordinates(F, rows, 4), dual: pluckerCoordinates(F, [u, v], 4) };
}

/**
 * The bilinear form of the Klein quadric:
 * p01 q23 − p02 q13 + p03 q12 + p12 q03 − p13 q02 + p23 q01.
 * It is 0 exactly when the lines p and q meet (or coincide). For p = a∧b and
 * q = c∧d it equals det[a; b; c; d]. Its sign is the sign of that
 * determinant, so it depends on the orientation of both Plücker vectors.
 */
export function kleinPairing<T>(F: Field<T>, p: readonly T[], q: readonly T[]): T {
  checkVector(p, 6, 'kleinPairing (first line)');
  checkVector(q, 6, 'kleinPairing (second line)');
  const dq = dualCoordinates(F, q);
  return p.reduce((sum, x, i) => F.add(sum, F.mul(x, dq[i]!)), F.zero);
}

/**
 * Whether the 6-vector p lies on the Klein quadric p01 p23 − p02 p13 + p03 p12 = 0,
 * i.e. is the Plücker vector of a line (when nonzero). This uses the quadratic
 * form itself, not kleinPairing(p, p) = 2·(that form), which vanishes for every
 * vector in characteristic 2.
 */
export function onKleinQuadric<T>(F: Field<T>, p: readonly T[]): boolean {
  checkVector(p, 6, 'onKleinQuadric');
  const [p01, p02, p03, p12, p13, p23] = p as [T, T, T, T, T, T];
  return F.isZero(F.add(F.sub(F.mul(p01, p23), F.mul(p02, p13)), F.mul(p03, p12)));
}

/**
 * How two lines lie: 'same' (one line), 'intersecting' (one common point, not
 * on the declared plane at infinity), 'parallel' (their common point lies on
 * the declared plane at infinity), 'skew' (no common point).
 */
export type LineRelation = 'same' | 'intersecting' | 'parallel' | 'skew';

export interface LineMeet<T> {
  /** Whether the lines have a common point (true for 'same', 'intersecting', 'parallel'). */
  meet: boolean;
  /** kleinPairing of the two Plücker vectors: 0 exactly when they meet (including parallel lines). */
  pairing: T;
  kind: LineRelation;
  /** For distinct meeting lines: the common point, scaled so its first nonzero coordinate is 1. */
  commonPoint?: T[];
  /** For distinct meeting lines: the dual vector of the plane containing both, first nonzero coordinate 1. */
  commonPlane?: T[];
}

/**
 * Whether the lines spanned by the rows L1rows and L2rows (2×4 each) meet,
 * with the value of the Klein pairing that decides it. For distinct meeting
 * lines the common point is the intersection of the two 2-subspaces and the
 * common plane the annihilator of their sum. A zero pairing does not tell
 * intersecting lines from parallel ones; declaring a plane at infinity (a dual
 * vector, e.g. (1, 0, 0, 0) for x0 = 0) does: the kind is 'parallel' when the
 * common point lies on it. Without it every distinct meeting pair is
 * 'intersecting'. Throws when a pair of rows spans no line.
 */
export function lineMeet<T>(
  F: Field<T>,
  L1rows: readonly (readonly T[])[],
  L2rows: readonly (readonly T[])[],
  planeAtInfinity?: readonly T[],
): LineMeet<T> {
  const p = checkLineRows(F, L1rows, 'lineMeet (first line)');
  const q = checkLineRows(F, L2rows, 'lineMeet (second line)');
  if (planeAtInfinity !== undefined) {
    checkVector(planeAtInfinity, 4, 'lineMeet (plane at infinity)');
    if (planeAtInfinity.every((x) => F.isZero(x))) throw new RangeError('lineMeet: the plane at infinity is the zero vector');
  }
  const pairing = kleinPairing(F, p, q);
  if (!F.isZero(pairing)) return { meet: false, pairing, kind: 'skew' };
  if (rowSpaceEquals(F, L1rows, L2rows, 4)) return { meet: true, pairing, kind: 'same' };
  // Distinct lines that meet: the subspaces share exactly one dimension and span a 3-space.
  const [point] = intersectRowSpaces(F, L1rows, L2rows, 4);
  const [plane] = kernel(F, sumRowSpaces(F, L1rows, L2rows, 4), 4);
  const commonPoint = normalizePoint(F, point!, 'first-one').values;
  const commonPlane = normalizePoint(F, plane!, 'first-one').values;
  const atInfinity =
    planeAtInfinity !== undefined &&
    F.isZero(commonPoint.reduce((sum, x, i) => F.add(sum, F.mul(x, planeAtInfinity[i]!)), F.zero));
  return { meet: true, pairing, kind: atInfinity ? 'parallel' : 'intersecting', commonPoint, commonPlane };
}

/** How a line's 6-vector of direction and moment is laid out and signed. */
export interface DirectionMomentOptions {
  /** Whether the 6-vector lists (d, m) or (m, d). */
  order: 'direction-moment' | 'moment-direction';
  /** 'p×d': the moment is m = (point) × d; 'd×p': m = d × (point), the negative. */
  momentSign: 'p×d' | 'd×p';
  /**
   * Which coordinate is homogeneous: 0 means the point (x0 : x1 : x2 : x3) with
   * x0 ≠ 0 is the Euclidean point (x1, x2, x3)/x0; 3 means it is (x0, x1, x2)/x3.
   */
  homogeneousIndex: 0 | 3;
}

export interface DirectionMoment<T> {
  direction: Vector3<T>;
  moment: Vector3<T>;
  /** The six numbers laid out as `order` asks: (d, m) or (m, d). */
  coordinates: T[];
}

/** One component of d or m: ± one Plücker coordinate, by its lexicographic position. */
interface SignedCoordinate {
  position: number;
  negate: boolean;
}

/**
 * The linear maps from p to d and to m (for m = point × d), derived for the
 * line through a, b with a_h = b_h = 1 and Euclidean points A, B:
 * with h = 0, p_0j = b_j − a_j gives d = B − A = (p01, p02, p03), and
 * A × B = (p23, −p13, p12); with h = 3, p_j3 = a_j − b_j gives
 * d = (−p03, −p13, −p23), and A × B = (p12, −p02, p01). In both cases
 * A × d = A × (B − A) = A × B.
 */
const DIRECTION_MAPS: Record<0 | 3, { direction: SignedCoordinate[]; moment: SignedCoordinate[] }> = {
  0: {
    direction: [
      { position: 0, negate: false },
      { position: 1, negate: false },
      { position: 2, negate: false },
    ],
    moment: [
      { position: 5, negate: false },
      { position: 4, negate: true },
      { position: 3, negate: false },
    ],
  },
  3: {
    direction: [
      { position: 2, negate: true },
      { position: 4, negate: true },
      { position: 5, negate: true },
    ],
    moment: [
      { position: 3, negate: false },
      { position: 1, negate: true },
      { position: 0, negate: false },
    ],
  },
};

function checkOptions(options: DirectionMomentOptions, what: string): void {
  if (options.homogeneousIndex !== 0 && options.homogeneousIndex !== 3) {
    throw new RangeError(`${what}: the homogeneous coordinate must be x0 or x3, not index ${String(options.homogeneousIndex)}`);
  }
  if (options.order !== 'direction-moment' && options.order !== 'moment-direction') {
    throw new RangeError(`${what}: unknown order ${String(options.order)}`);
  }
  if (options.momentSign !== 'p×d' && options.momentSign !== 'd×p') {
    throw new RangeError(`${what}: unknown moment sign ${String(options.momentSign)}`);
  }
}

/** The component maps for the options: the moment map flips every sign for 'd×p'. */
function mapsFor(options: DirectionMomentOptions) {
  const base = DIRECTION_MAPS[options.homogeneousIndex];
  const flip = options.momentSign === 'd×p';
  return {
    direction: base.direction,
    moment: base.moment.map((c) => ({ position: c.position, negate: c.negate !== flip })),
  };
}

function apply<T>(F: Field<T>, p: readonly T[], map: readonly SignedCoordinate[]): Vector3<T> {
  const [x, y, z] = map.map((c) => (c.negate ? F.neg(p[c.position]!) : p[c.position]!));
  return [x!, y!, z!];
}

/**
 * The direction d and moment m of the line with Plücker vector p (lexicographic
 * p01 … p23), a linear bijection of 6-vectors.
 *
 * homogeneousIndex 0: d = (p01, p02, p03), and m = (p23, −p13, p12) for 'p×d'.
 * homogeneousIndex 3: d = (−p03, −p13, −p23), and m = (p12, −p02, p01) for 'p×d'.
 * 'd×p' negates m. For the line through the points a then b with a_h = b_h = 1
 * (Euclidean points A, B) this is d = B − A and m = A × d (or d × A), and m
 * is the same for every point of the line in place of A. Scaling p scales
 * (d, m); d · m = ±(p01 p23 − p02 p13 + p03 p12), so d ⊥ m exactly on the
 * Klein quadric. A line at infinity has d = 0.
 */
export function directionMoment<T>(F: Field<T>, pluckerValues: readonly T[], options: DirectionMomentOptions): DirectionMoment<T> {
  checkVector(pluckerValues, 6, 'directionMoment');
  checkOptions(options, 'directionMoment');
  const maps = mapsFor(options);
  const direction = apply(F, pluckerValues, maps.direction);
  const moment = apply(F, pluckerValues, maps.moment);
  const coordinates = options.order === 'direction-moment' ? [...direction, ...moment] : [...moment, ...direction];
  return { direction, moment, coordinates };
}

/**
 * The inverse of `directionMoment`: the Plücker vector (lexicographic p01 … p23)
 * of the given direction and moment, either as the 6-vector laid out as
 * `options.order` says or as the two 3-vectors. Nothing is checked beyond the
 * sizes: the result is the vector of a line exactly when d · m = 0.
 */
export function fromDirectionMoment<T>(
  F: Field<T>,
  value: readonly T[] | { direction: readonly T[]; moment: readonly T[] },
  options: DirectionMomentOptions,
): T[] {
  checkOptions(options, 'fromDirectionMoment');
  let direction: readonly T[];
  let moment: readonly T[];
  if ('direction' in value && !Array.isArray(value)) {
    direction = value.direction;
    moment = value.moment;
  } else {
    const six = value as readonly T[];
    checkVector(six, 6, 'fromDirectionMoment');
    const first = six.slice(0, 3);
    const second = six.slice(3);
    [direction, moment] = options.order === 'direction-moment' ? [first, second] : [second, first];
  }
  checkVector(direction, 3, 'fromDirectionMoment (direction)');
  checkVector(moment, 3, 'fromDirectionMoment (moment)');
  const maps = mapsFor(options);
  const p = new Array<T>(6).fill(F.zero);
  // Every Plücker coordinate appears in exactly one component of d or m, with sign ±1, its own inverse.
  const place = (values: readonly T[], map: readonly SignedCoordinate[]) =>
    map.forEach((c, i) => {
      p[c.position] = c.negate ? F.neg(values[i]!) : values[i]!;
    });
  place(direction, maps.direction);
  place(moment, maps.moment);
  return p;
}

function formula(map: readonly SignedCoordinate[]): string {
  return `(${map.map((c) => `${c.negate ? '−' : ''}${LINE_COORDINATE_LABELS[c.position]}`).join(', ')})`;
}

/**
 * One sentence stating the convention of `directionMoment` for these options,
 * with its formulas, for hovers and reports.
 */
export function describeDirectionMoment(options: DirectionMomentOptions): string {
  checkOptions(options, 'describeDirectionMoment');
  const maps = mapsFor(options);
  const h = options.homogeneousIndex;
  const euclidean = h === 0 ? '(x1, x2, x3)/x0' : '(x0, x1, x2)/x3';
  const layout = options.order === 'direction-moment' ? '(d1, d2, d3, m1, m2, m3)' : '(m1, m2, m3, d1, d2, d3)';
  const product = options.momentSign === 'p×d' ? 'm = A × d (point × direction)' : 'm = d × A (direction × point)';
  return (
    `Lines as ${layout} with homogeneous coordinate x${h}: a point (x0 : x1 : x2 : x3) with x${h} ≠ 0 is ` +
    `the Euclidean point ${euclidean}; for the line through a then b, with p_ij = a_i b_j − a_j b_i, ` +
    `d = ${formula(maps.direction)} and m = ${formula(maps.moment)}; when a${h} = b${h} = 1 with Euclidean ` +
    `points A, B this is d = B − A and ${product}, the same for every point of the line.`
  );
}
