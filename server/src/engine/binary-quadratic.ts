/**
 * The zeros of a binary quadratic form a·s² + b·s·t + c·t² on the projective
 * line: the points (s : t) where it vanishes, found in the field itself.
 *
 * Outside characteristic 2 the discriminant b² − 4ac decides everything: a
 * double zero when it is 0, two zeros over the algebraic closure otherwise,
 * both in the field exactly when it is a square there. In characteristic 2 the
 * form has a double zero exactly when b = 0 (it is then the square of
 * √a·s + √c·t), and otherwise two distinct zeros that are found by solving
 * y² + y = ac/b² over the (finite) field.
 */
import type { Field } from './field.js';
import { finiteFieldElements, finiteFieldOrder } from './finite-fields.js';
import { normalizePoint } from './normalize.js';
import { squareRootInField } from './field-square-roots.js';

/** A zero (s : t) of the form, scaled so its first nonzero entry is 1. */
export interface BinaryQuadraticZero<T> {
  point: [T, T];
  /** 2 for a double zero, 1 for a simple one. */
  multiplicity: 1 | 2;
}

export interface BinaryQuadraticZeros<T> {
  /** b² − 4ac (in characteristic 2 this is b², and it vanishes exactly at a double zero). */
  discriminant: T;
  /** The number of distinct zeros over the algebraic closure: 1 (a double zero) or 2. */
  distinctOverClosure: 1 | 2;
  /** Whether those zeros all lie in the field. */
  inField: boolean;
  /** The zeros in the field, simple ones in a fixed order; empty when `inField` is false. */
  zeros: BinaryQuadraticZero<T>[];
}

function point<T>(F: Field<T>, s: T, t: T): [T, T] {
  const [x, y] = normalizePoint(F, [s, t], 'first-one').values;
  return [x!, y!];
}

/** The zeros in characteristic 2, where the quadratic formula needs a division by 2. */
function zerosInCharacteristicTwo<T>(F: Field<T>, a: T, b: T, c: T, discriminant: T): BinaryQuadraticZeros<T> {
  if (F.isZero(b)) {
    // a·s² + c·t² = (√a·s + √c·t)²: the double zero is (√c : √a); every element has a square root.
    const ra = squareRootInField(F, a)!;
    const rc = squareRootInField(F, c)!;
    return { discriminant, distinctOverClosure: 1, inField: true, zeros: [{ point: point(F, rc, ra), multiplicity: 2 }] };
  }
  if (F.isZero(a)) {
    // t·(b·s + c·t): the zeros t = 0 and (c : b) (signs do not matter in characteristic 2).
    return {
      discriminant,
      distinctOverClosure: 2,
      inField: true,
      zeros: [
        { point: point(F, F.one, F.zero), multiplicity: 1 },
        { point: point(F, c, b), multiplicity: 1 },
      ],
    };
  }
  // With s/t = (b/a)·y the equation a x² + b x + c = 0 becomes y² + y = ac/b².
  const d = F.div(F.mul(a, c), F.mul(b, b));
  if (finiteFieldOrder(F) === undefined) throw new RangeError(`Quadratic equations over ${F.name} are not supported`);
  for (const y of finiteFieldElements(F)) {
    if (!F.eq(F.add(F.mul(y, y), y), d)) continue;
    const ratio = F.div(b, a);
    // The other solution is y + 1.
    return {
      discriminant,
      distinctOverClosure: 2,
      inField: true,
      zeros: [
        { point: point(F, F.mul(ratio, y), F.one), multiplicity: 1 },
        { point: point(F, F.mul(ratio, F.add(y, F.one)), F.one), multiplicity: 1 },
      ],
    };
  }
  return { discriminant, distinctOverClosure: 2, inField: false, zeros: [] };
}

/**
 * The zeros on the projective line of a·s² + b·s·t + c·t², which must not be
 * the zero form. Square roots come from `squareRootInField`, so the field must
 * be the rationals or a finite field when the discriminant is a nonzero.
 */
export function binaryQuadraticZeros<T>(F: Field<T>, a: T, b: T, c: T): BinaryQuadraticZeros<T> {
  if (F.isZero(a) && F.isZero(b) && F.isZero(c)) throw new RangeError('binaryQuadraticZeros: the form is zero, so every point is a zero');
  const discriminant = F.sub(F.mul(b, b), F.mul(F.fromBigInt(4n), F.mul(a, c)));
  if (F.characteristic === 2n) return zerosInCharacteristicTwo(F, a, b, c, discriminant);
  const two = F.fromBigInt(2n);
  if (F.isZero(discriminant)) {
    // A double zero: (−b : 2a), or (1 : 0) when a = 0 (then b = 0 too and the form is c·t²).
    const zero = F.isZero(a) ? point(F, F.one, F.zero) : point(F, F.neg(b), F.mul(two, a));
    return { discriminant, distinctOverClosure: 1, inField: true, zeros: [{ point: zero, multiplicity: 2 }] };
  }
  const root = squareRootInField(F, discriminant);
  if (root === undefined) return { discriminant, distinctOverClosure: 2, inField: false, zeros: [] };
  const zeros: [T, T][] = F.isZero(a)
    ? // a = 0 and b ≠ 0: t·(b·s + c·t) vanishes at t = 0 and at (−c : b).
      [point(F, F.one, F.zero), point(F, F.neg(c), b)]
    : [point(F, F.add(F.neg(b), root), F.mul(two, a)), point(F, F.sub(F.neg(b), root), F.mul(two, a))];
  return { discriminant, distinctOverClosure: 2, inField: true, zeros: zeros.map((z) => ({ point: z, multiplicity: 1 })) };
}
