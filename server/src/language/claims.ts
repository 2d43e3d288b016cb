/**
 * Checking claims. A claim that holds is quiet (its lens says so); a false
 * claim becomes an error that says what was claimed, what was found, and why.
 */
import { coordinatesIn, rref } from '../engine/matrix.js';
import { equalsMV, isZeroMV, toDense } from '../engine/multivector.js';
import { projectivelyEqual } from '../engine/normalize.js';
import { displayPoint, toLexOrder } from './coordinates.js';
import { binomialBig } from '../engine/subsets.js';
import type { ClaimStmt } from './ast.js';
import { decompositionOf, describeRelation, relationLatex } from './decomposition.js';
import { subspacePlucker, type Environment } from './environment.js';
import { checkCoordinateLimit, evaluate } from './expressions.js';
import { asMultivector } from './arguments.js';
import { propertyHolds } from './combinatorics.js';
import { Failure, fail } from './failure.js';
import { partitionReplacement, pointLiteral, valueReplacement } from './fixes/literals.js';
import { matrixLatex } from './latex.js';
import { formatCombination, formatMatrixInline, formatMultivector, formatPoint, formatTuple } from './text.js';
import type { TextEdit } from './types.js';
import { describeValue, type Scalar, type SubspaceValue, type Value } from './values.js';
import { formatClass } from '../engine/schubert-calculus.js';
import { classesEqual } from './schubert-calculus.js';
import { failingMember, familyField, witnessValue } from './parameters.js';

/** In a family: a value of the parameters where a nonzero relation value stays nonzero, as a clause. */
function familyWitness(env: Environment, value: Scalar): string {
  const at = witnessValue(env, value);
  return at ? `; for instance at ${at}` : '';
}

export interface ClaimOutcome {
  holds: boolean;
  /** Stable code of the problem when the claim fails. */
  code: string;
  /** What the file claims, in its own words. */
  claimed: string;
  /** What was found, as a sentence. */
  found: string;
  /** LaTeX of the finding (e.g. the failed relation). */
  latex: string;
  /**
   * For a false claim of a value: the computed value written over the claimed
   * one, in the file's syntax and conventions (the quick fix of the problem).
   */
  replacement?: TextEdit;
}

export function checkClaim(env: Environment, source: string, s: ClaimStmt): ClaimOutcome {
  const outcome = claimOutcome(env, source, s);
  if (outcome.holds || !familyField(env.F) || /differ at|for instance at/.test(outcome.found)) return outcome;
  // A false identity of a family: name a member for which the claim is false too.
  const at = failingMember(env, (member) => claimOutcome(env, source, s, member).holds);
  return at ? { ...outcome, found: `${outcome.found}; it is false for instance at ${at}` } : outcome;
}

function claimOutcome(env: Environment, source: string, s: ClaimStmt, member?: (v: Value) => Value): ClaimOutcome {
  const claimed = source.slice(s.subject.span.start, s.relation.span.end).replace(/\s+/g, ' ');
  const subjectText = source.slice(s.subject.span.start, s.subject.span.end).replace(/\s+/g, ' ');
  const evaluated = (e: typeof s.subject): Value => (member ? member(evaluate(env, e, {})) : evaluate(env, e, {}));
  const subject = evaluated(s.subject);
  const op = s.relation.op;
  if (op === 'decomposable' || op === 'not decomposable') {
    return decomposableClaim(env, subject, subjectText, claimed, op === 'decomposable', s);
  }
  if (op === 'is' || op === 'is not') return propertyClaim(env, subject, subjectText, claimed, op === 'is', s);
  const otherExpr = s.relation.other!;
  if (subject.t === 'schubert') return partitionClaim(subject.partition, subjectText, otherExpr, claimed, op === '=', s, source);
  // A count is compared with a whole number as written, not with its image in
  // the field: over GF(2), `dim A = 3` must not read 3 as 1.
  const other: Value =
    (subject.t === 'integer' || subject.t === 'count' || subject.t === 'transversals') && otherExpr.type === 'number' && /^\d+$/.test(otherExpr.text)
      ? { t: 'count', value: BigInt(otherExpr.text), what: 'a number' }
      : evaluated(otherExpr);
  const otherText = source.slice(s.relation.other!.span.start, s.relation.other!.span.end).replace(/\s+/g, ' ');
  if (op === 'in' || op === 'not in') return membershipClaim(env, subject, other, subjectText, otherText, claimed, op === 'in', s);
  return equalityClaim(env, subject, other, subjectText, otherText, claimed, op === '=', s);
}

function decomposableClaim(
  env: Environment,
  subject: Value,
  text: string,
  claimed: string,
  wanted: boolean,
  s: ClaimStmt,
): ClaimOutcome {
  const mv = asMultivector(env, subject);
  if (!mv) fail('type/operand', s.subject.span, `only a multivector can be decomposable; ${text} is ${describeValue(subject)}`);
  const n = mv.space.dim;
  const code = wanted ? 'claim/decomposable' : 'claim/not-decomposable';
  if (isZeroMV(mv.mv)) {
    return { holds: !wanted, code, claimed, found: `${text} is zero, which comes from no subspace`, latex: '0' };
  }
  const d = decompositionOf(env, mv);
  if (d.kind === 'decomposable') {
    const basis = formatMatrixInline(env.F, d.basis);
    return {
      holds: wanted,
      code,
      claimed,
      found: `${text} is decomposable: it is ${env.F.isOne(d.scalar) ? '' : `${env.F.format(d.scalar)} times `}the wedge of the rows of ${basis}`,
      latex: matrixLatex(env.F, d.basis),
    };
  }
  if (d.kind === 'not-decomposable') {
    return {
      holds: !wanted,
      code,
      claimed,
      found:
        `${text} is not decomposable: ${describeRelation(env, d.relation, n)}; ` +
        `the vectors v with v ∧ ${text} = 0 span a space of dimension ${d.divisorDimension}, not ${mv.mv.k}` +
        familyWitness(env, d.relation.value),
      latex: relationLatex(env, d.relation, n),
    };
  }
  return { holds: !wanted, code, claimed, found: `${text} is zero`, latex: '0' };
}

function membershipClaim(
  env: Environment,
  subject: Value,
  other: Value,
  subjectText: string,
  otherText: string,
  claimed: string,
  wanted: boolean,
  s: ClaimStmt,
): ClaimOutcome {
  if (subject.t !== 'vector') fail('type/operand', s.subject.span, `membership is claimed of a vector; ${subjectText} is ${describeValue(subject)}`);
  if (other.t !== 'subspace') fail('type/operand', s.relation.other!.span, `a vector lies in a subspace; ${otherText} is ${describeValue(other)}`);
  if (subject.space.name !== other.space.name) {
    fail('type/space-mismatch', s.relation.span, `${subjectText} is a vector of ${subject.space.name} but ${otherText} is a subspace of ${other.space.name}`);
  }
  const code = wanted ? 'claim/membership' : 'claim/non-membership';
  const coefficients = coordinatesIn(env.F, other.basis, subject.coords);
  if (coefficients) {
    const names = other.basis.map((_, i) => `b${i + 1}`);
    return {
      holds: wanted,
      code,
      claimed,
      found: `${subjectText} lies in ${otherText}: ${subjectText} = ${formatCombination(env.F, coefficients, names)} in the reduced basis b1 … b${other.basis.length} = ${formatMatrixInline(env.F, other.basis)}`,
      latex: '',
    };
  }
  const rank = rref(env.F, [...other.basis, subject.coords], other.space.dim).rank;
  return {
    holds: !wanted,
    code,
    claimed,
    found: `${subjectText} = ${formatTuple(env.F, subject.coords)} is not in ${otherText}: adding it to a basis of ${otherText} raises the rank from ${other.basis.length} to ${rank}`,
    latex: '',
  };
}

function pluckerDense(env: Environment, v: Value, span: ClaimStmt['span']): { dense: Scalar[]; n: number; k: number } | undefined {
  if (v.t === 'subspace') {
    checkCoordinateLimit(env, v.space.dim, v.basis.length, span);
    return { dense: toDense(env.F, subspacePlucker(env, v)), n: v.space.dim, k: v.basis.length };
  }
  if (v.t === 'multivector') return { dense: toDense(env.F, v.mv), n: v.space.dim, k: v.mv.k };
  return undefined;
}

function equalityClaim(
  env: Environment,
  subject: Value,
  other: Value,
  subjectText: string,
  otherText: string,
  claimed: string,
  wanted: boolean,
  s: ClaimStmt,
): ClaimOutcome {
  const F = env.F;
  const code = wanted ? 'claim/equality' : 'claim/inequality';
  const verdict = (equal: boolean, found: string, latex = '', specific?: string, replacement?: TextEdit): ClaimOutcome => ({
    holds: equal === wanted,
    // A false `=` gets the code of what was compared; a false `!=` is always claim/inequality.
    code: wanted && specific ? specific : code,
    claimed,
    found,
    latex,
    // Only a false `=` has a value to correct: a false `!=` means the two sides are equal.
    ...(wanted && !equal && replacement ? { replacement } : {}),
  });

  // Schubert classes: equal when every coefficient is.
  if (subject.t === 'class' || other.t === 'class') {
    if (subject.t !== 'class' || other.t !== 'class') {
      fail('type/operand', s.relation.span, `cannot compare ${describeValue(subject)} with ${describeValue(other)}`);
    }
    const equal = classesEqual(subject.cls, other.cls);
    const found = equal
      ? `${subjectText} = ${formatClass(subject.cls)}`
      : `${subjectText} is ${formatClass(subject.cls)}, not ${formatClass(other.cls)}${subject.cls.k !== other.cls.k || subject.cls.n !== other.cls.n ? ` (G(${subject.cls.k},${subject.cls.n}) against G(${other.cls.k},${other.cls.n}))` : ''}`;
    return verdict(equal, found, formatClass(subject.cls, 'latex'), 'claim/class');
  }

  // The transversals of four lines against a number: the lines defined over the file's field.
  if (subject.t === 'transversals' && other.t === 'count') {
    const r = subject.result;
    const n = r.kind === 'finite' ? BigInt(r.transversals.length) : undefined;
    const found =
      n === undefined
        ? `${subjectText} is not a finite set: ${r.summary}`
        : n === other.value
          ? `${subjectText}: ${n} line${n === 1n ? '' : 's'} over ${F.name}`
          : `${subjectText} has ${n} line${n === 1n ? '' : 's'} over ${F.name}, not ${other.value}: ${r.summary}`;
    return verdict(n === other.value, found, '', 'claim/transversals');
  }

  // A count against a number: dim L = 2.
  const whole = (v: Value): bigint | undefined => (v.t === 'integer' ? BigInt(v.value) : v.t === 'count' ? v.value : undefined);
  if (whole(subject) !== undefined || whole(other) !== undefined) {
    const a = whole(subject);
    const b = whole(other);
    if (a === undefined || b === undefined) {
      fail('type/operand', s.relation.span, `cannot compare ${describeValue(subject)} with ${describeValue(other)}`);
    }
    const found = a === b ? `${subjectText} = ${a}` : `${subjectText} is ${a}, not ${b}`;
    // The number written on the right is the claimed value; the left side is what was computed.
    const replacement = s.relation.other!.type === 'number' ? valueReplacement(s.relation.other!.span, String(a)) : undefined;
    return verdict(a === b, found, '', 'claim/dimension', replacement);
  }

  // A projective point against a subspace or multivector: plucker(L) = [1 : 3 : …].
  if (other.t === 'point' || subject.t === 'point') {
    const point = other.t === 'point' ? other : (subject as typeof other & { t: 'point' });
    const thing = other.t === 'point' ? subject : other;
    const thingText = other.t === 'point' ? subjectText : otherText;
    const p = pluckerDense(env, thing, s.span);
    if (!p) fail('type/operand', s.relation.span, `a projective point is compared with a subspace or a multivector, not with ${describeValue(thing)}`);
    const pointSpan = (other.t === 'point' ? s.relation.other! : s.subject).span;
    // The computed point, in the file's order and normalization, written as a point literal.
    const computed = (): TextEdit | undefined => {
      if (p.dense.every((x) => F.isZero(x))) return undefined;
      const literal = pointLiteral(displayPoint(env, p.dense, p.n, p.k).normalized.map((x) => F.format(x)));
      return literal === undefined ? undefined : { span: pointSpan, newText: literal };
    };
    if (point.values.length !== p.dense.length) {
      const replacement = computed();
      throw new Failure({
        code: 'type/wrong-length',
        severity: 'error',
        message: `this point has ${point.values.length} coordinates, but G(${p.k},${p.n}) has C(${p.n},${p.k}) = ${binomialBig(p.n, p.k)}`,
        span: pointSpan,
        ...(replacement ? { fixes: [{ title: `Replace with the computed point ${shortTitle(replacement.newText)}`, edits: [replacement], preferred: true }] } : {}),
      });
    }
    if (point.values.every((x) => F.isZero(x))) {
      fail('math/zero-point', (other.t === 'point' ? s.relation.other! : s.subject).span, 'all coordinates are zero: that is no projective point');
    }
    // The literal lists coordinates in the file's index order; compare in the engine's lexicographic order.
    const literal = toLexOrder(env, point.values, p.n, p.k);
    const shown = displayPoint(env, p.dense, p.n, p.k);
    const equal = projectivelyEqual(F, p.dense, literal);
    if (equal) return verdict(true, `${thingText} is the projective point ${formatPoint(F, shown.normalized)} (${shown.applied})`, '', 'claim/plucker');
    const mismatch = firstMismatch(env, shown.raw, point.values, false, (i) => `p${shown.labelAt(i)}`);
    return verdict(
      false,
      `${thingText} is ${formatPoint(F, shown.normalized)} (${shown.applied}), which is not a multiple of ${formatPoint(F, point.values)}${mismatch}`,
      '',
      'claim/plucker',
      computed(),
    );
  }

  if (subject.t === 'subspace' && other.t === 'subspace') {
    if (subject.space.name !== other.space.name) {
      return verdict(false, `${subjectText} is a subspace of ${subject.space.name} and ${otherText} of ${other.space.name}`);
    }
    const equal = subject.basis.length === other.basis.length && subject.basis.every((r, i) => r.every((x, j) => F.eq(x, other.basis[i]![j])));
    if (equal) return verdict(true, `${subjectText} and ${otherText} have the same reduced basis ${formatMatrixInline(F, subject.basis)}`);
    return verdict(false, subspaceDifference(env, subject, other, subjectText, otherText));
  }

  if (subject.t === 'vector' && other.t === 'vector') {
    const equal = subject.space.name === other.space.name && subject.coords.every((x, i) => F.eq(x, other.coords[i]));
    // A tuple written out is the claimed value: `claim p = (1, 2, 0)`.
    const written = s.relation.other!.type === 'tuple' && subject.space.name === other.space.name;
    const replacement = written ? valueReplacement(s.relation.other!.span, formatTuple(F, subject.coords)) : undefined;
    return verdict(equal, `${subjectText} = ${formatTuple(F, subject.coords)} and ${otherText} = ${formatTuple(F, other.coords)}`, '', undefined, replacement);
  }

  if (subject.t === 'scalar' && other.t === 'scalar') {
    const equal = F.eq(subject.value, other.value);
    const literal = s.relation.other!.type === 'number' || s.relation.other!.type === 'unary';
    // In a family an equation is an identity: a false one is shown failing at one value of the parameters.
    const witness = equal ? undefined : witnessValue(env, F.sub(subject.value, other.value));
    const found = (equal
      ? `${subjectText} = ${F.format(subject.value)}`
      : literal
        ? `${subjectText} is ${F.format(subject.value)}, not ${F.format(other.value)}`
        : `${subjectText} = ${F.format(subject.value)} and ${otherText} = ${F.format(other.value)}`) +
      (witness ? `; the two sides differ at ${witness.replace(/ \(where it is .*\)$/, '')}` : '');
    // Only a number as written is replaced (`claim t = -2`), never an expression such as `-b`.
    const o = s.relation.other!;
    const number = o.type === 'number' || (o.type === 'unary' && o.operand.type === 'number');
    return verdict(equal, found, '', undefined, number ? valueReplacement(o.span, F.format(subject.value)) : undefined);
  }

  // `omega ^ omega = 0`: a vector or multivector against the scalar zero.
  const zeroSide = other.t === 'scalar' ? other : subject.t === 'scalar' ? subject : undefined;
  const thing = other.t === 'scalar' ? subject : other;
  if (zeroSide && (thing.t === 'vector' || thing.t === 'multivector')) {
    if (!F.isZero(zeroSide.value)) {
      fail('type/operand', s.relation.span, `${describeValue(thing)} can be compared with 0, not with another scalar`);
    }
    const mv = asMultivector(env, thing)!;
    const zero = isZeroMV(mv.mv);
    const thingText = other.t === 'scalar' ? subjectText : otherText;
    return verdict(zero, zero ? `${thingText} is zero` : `${thingText} = ${formatMultivector(F, mv.mv, mv.space.basisNames)} is not zero`);
  }

  const a = asMultivector(env, subject);
  const b = asMultivector(env, other);
  if (a && b && a.space.name === b.space.name && a.mv.k === b.mv.k && (a.pluckerOf || b.pluckerOf)) {
    // A Plücker vector is a projective point: compare up to a nonzero scalar.
    const equal = projectivelyEqual(F, toDense(F, a.mv), toDense(F, b.mv));
    const found = equal
      ? `${subjectText} and ${otherText} are the same projective point`
      : `${subjectText} and ${otherText} are different projective points${firstMismatch(env, toDense(F, a.mv), toDense(F, b.mv))}`;
    return verdict(equal, found, '', 'claim/plucker');
  }
  if (a && b && a.space.name === b.space.name && a.mv.k === b.mv.k) {
    const equal = equalsMV(F, a.mv, b.mv);
    return verdict(equal, equal ? `${subjectText} and ${otherText} have the same coordinates` : `${subjectText} and ${otherText} differ${firstMismatch(env, toDense(F, a.mv), toDense(F, b.mv), true)}`);
  }
  fail('type/operand', s.relation.span, `cannot compare ${describeValue(subject)} with ${describeValue(other)}`);
}

/** `claim W is totally nonnegative`, `claim eta is not decomposable`, `claim W is uniform`. */
function propertyClaim(env: Environment, subject: Value, subjectText: string, claimed: string, wanted: boolean, s: ClaimStmt): ClaimOutcome {
  const property = s.relation.property!.name;
  if (property === 'decomposable') return decomposableClaim(env, subject, subjectText, claimed, wanted, s);
  const { holds, found } = propertyHolds(env, subject, property, s.relation.property!.span);
  const words = property.replace(/-/g, ' ');
  return {
    holds: holds === wanted,
    code: wanted ? `claim/${property}` : `claim/not-${property}`,
    claimed,
    found: `${subjectText} is ${holds ? '' : 'not '}${words}: ${found}`,
    latex: '',
  };
}

/** `claim schubert(W) = (2, 1)`: the partition as written, compared with the cell's. */
function partitionClaim(
  partition: number[],
  subjectText: string,
  other: ClaimStmt['subject'],
  claimed: string,
  wanted: boolean,
  s: ClaimStmt,
  source: string,
): ClaimOutcome {
  const items = other.type === 'tuple' ? other.items : [other];
  const written = items.map((item) => {
    if (item.type !== 'number' || !/^\d+$/.test(item.text)) fail('type/operand', item.span, 'a partition is a list of whole numbers, e.g. (2, 1)');
    return Number(item.text);
  });
  // Zero parts are not part of a partition: (2, 1, 0) is (2, 1).
  const a = partition.filter((x) => x !== 0);
  const b = written.filter((x) => x !== 0);
  const equal = a.length === b.length && a.every((x, i) => x === b[i]);
  return {
    holds: equal === wanted,
    code: wanted ? 'claim/schubert' : 'claim/inequality',
    claimed,
    found: `${subjectText} has the partition (${partition.join(', ')})${equal ? '' : `, not (${written.join(', ')})`}`,
    latex: `\\lambda = (${partition.join(', ')})`,
    ...(wanted && !equal ? { replacement: partitionReplacement(source, other.span, partition) } : {}),
  };
}

/** The first coordinate where two vectors fail to be proportional (or, exactly, to agree). */
function firstMismatch(
  env: Environment,
  a: Scalar[],
  b: Scalar[],
  exact = false,
  label: (index: number) => string = (i) => `number ${i + 1}`,
): string {
  const F = env.F;
  const i = a.findIndex((x) => !F.isZero(x));
  const j = b.findIndex((x) => !F.isZero(x));
  if (i !== j && !exact) return `: the first nonzero coordinate is ${label(i)} on one side and ${label(j)} on the other`;
  for (let t = 0; t < a.length; t++) {
    const differs = exact ? !F.eq(a[t], b[t]) : !F.eq(F.mul(a[t], b[i]), F.mul(b[t], a[i]));
    if (differs) {
      const how = exact ? `${F.format(a[t])} against ${F.format(b[t])}` : `its ratio to ${label(i)} is ${F.format(F.div(a[t], a[i]))} on the left and ${F.format(F.div(b[t], b[i]))} on the right`;
      return `: coordinate ${label(t)} breaks the proportion (${how})`;
    }
  }
  return '';
}

function subspaceDifference(env: Environment, a: SubspaceValue, b: SubspaceValue, aText: string, bText: string): string {
  const F = env.F;
  if (a.basis.length !== b.basis.length) {
    return `dim ${aText} = ${a.basis.length} but dim ${bText} = ${b.basis.length}`;
  }
  const outside = a.basis.find((r) => !coordinatesIn(F, b.basis, r));
  const where = outside ? `; the vector ${formatTuple(F, outside)} of ${aText} is not in ${bText}` : '';
  return `${aText} and ${bText} are different ${a.basis.length}-dimensional subspaces (reduced bases ${formatMatrixInline(F, a.basis)} and ${formatMatrixInline(F, b.basis)})${where}`;
}

/** A menu title quotes at most a line's worth of the new text. */
export function shortTitle(text: string): string {
  return text.length <= 48 ? text : `${text.slice(0, 45)}…`;
}
