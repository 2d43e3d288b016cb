/**
 * Multivariate gcds by evaluation and interpolation modulo primes: Brown's
 * dense modular algorithm (W. S. Brown, "On Euclid's algorithm and the
 * computation of polynomial greatest common divisors", J. ACM 18 (1971),
 * from memory). The pseudo-remainder sequence of gcd-domain.ts is correct
 * but its intermediate coefficients grow with the degrees, which made a gcd
 * of two polynomials of degree 35 in two variables over the rationals take
 * minutes; working modulo primes keeps every number one machine word.
 *
 * Over GF(p), for polynomials in variables (v_0, …, v_(d−1)), the last
 * variable y is given values r: the gcd of the images is computed
 * recursively, scaled to the leading coefficient γ(r) where γ is the gcd of
 * the leading coefficients (leading in lexicographic order of the other
 * variables, as polynomials in y), and the images are interpolated in y. An
 * image whose leading monomial is larger than another's comes from an
 * unlucky value and is dropped; a smaller one restarts the interpolation.
 * Once more values than the degree bound in y have been used, the primitive
 * part in y of the interpolant is accepted exactly when it divides both
 * inputs, so the result is proven, not guessed.
 *
 * Over the rationals the same is done modulo several word-size primes, the
 * images are combined by the Chinese remainder theorem, and the candidate,
 * once it stops changing, is again accepted only after trial division over
 * the integers.
 *
 * Polynomials here are the nested dense lists of recursive-form.ts: depth d
 * for d variables, the innermost lists holding coefficients in y.
 */
import type { Field } from '../field.js';
import { isPrime } from '../primes.js';
import { primeField } from '../prime-field.js';
import { gcdBigInt } from '../rational.js';
import { denseDivMod, denseGcd, denseMul, trimDense } from './dense-polynomial.js';
import { INTEGERS, fieldDomain, polynomialsOver, type GcdDomain } from './gcd-domain.js';

/** A nested dense polynomial: a leaf (depth 0) or a list of nodes one level deeper, with no trailing zero node. */
type Node = unknown;

function isZeroAt(x: Node, depth: number): boolean {
  return depth === 0 ? x === 0 || x === 0n : (x as Node[]).length === 0;
}

function trimAt(list: Node[], depth: number): Node[] {
  // `depth` is the depth of the list; its entries have depth − 1.
  while (list.length > 0 && isZeroAt(list[list.length - 1], depth - 1)) list.pop();
  return list;
}

function nestedDomain<C>(base: GcdDomain<C>, levels: number): GcdDomain<Node> {
  let D: GcdDomain<any> = base;
  for (let i = 0; i < levels; i++) D = polynomialsOver(D);
  return D;
}

/** The exponents along the lexicographically leading path (last entry at every level). */
function leadingMonomial(x: Node, depth: number): number[] {
  const out: number[] = [];
  let node = x;
  for (let k = 0; k < depth; k++) {
    const list = node as Node[];
    out.push(list.length - 1);
    node = list[list.length - 1];
  }
  return out;
}

function compareLex(a: readonly number[], b: readonly number[]): number {
  for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) return a[i]! - b[i]!;
  return 0;
}

/** Applies f to every innermost list (the coefficients in y) of a node of depth ≥ 1, trimming as it goes. */
function mapInner(x: Node, depth: number, f: (leaf: number[]) => number[]): Node {
  if (depth === 1) return f(x as number[]);
  return trimAt((x as Node[]).map((child) => mapInner(child, depth - 1, f)), depth);
}

function innerLists(x: Node, depth: number, out: number[][] = []): number[][] {
  if (depth === 1) out.push(x as number[]);
  else for (const child of x as Node[]) innerLists(child, depth - 1, out);
  return out;
}

/** The leading coefficient in the variables other than y, a polynomial in y. */
function leadingInY(x: Node, depth: number): number[] {
  let node = x;
  for (let k = 1; k < depth; k++) node = (node as Node[])[(node as Node[]).length - 1];
  return node as number[];
}

function evaluateDense(F: Field<number>, a: readonly number[], r: number): number {
  let v = 0;
  for (let i = a.length - 1; i >= 0; i--) v = F.add(F.mul(v, r), a[i]!);
  return v;
}

/** The node with y replaced by r: one level less deep. */
function evaluateInnermost(F: Field<number>, x: Node, depth: number, r: number): Node {
  if (depth === 1) return evaluateDense(F, x as number[], r);
  return trimAt((x as Node[]).map((child) => evaluateInnermost(F, child, depth - 1, r)), depth - 1);
}

/**
 * Combines a node of depth d (innermost lists = polynomials in y) with a
 * node of depth d − 1 (numbers where the first has lists), leaf by leaf.
 */
function zipWithValues(x: Node, values: Node, depth: number, f: (leaf: number[], value: number) => number[]): Node {
  if (depth === 1) return f(x as number[], values as number);
  const a = x as Node[];
  const b = values as Node[];
  const out: Node[] = [];
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    out.push(zipWithValues(a[i] ?? [], b[i] ?? (depth - 1 === 1 ? 0 : []), depth - 1, f));
  }
  return trimAt(out, depth);
}

/** The constant polynomial c(y) as a node of the given depth. */
function constantInY(c: number[], depth: number): Node {
  let node: Node = c;
  for (let k = 1; k < depth; k++) node = (c.length === 0 ? [] : [node]) as Node;
  return node;
}

function maxDegreeInY(x: Node, depth: number): number {
  return Math.max(...innerLists(x, depth).map((l) => l.length - 1));
}

/**
 * The monic (in lexicographic order) gcd of two nonzero nodes of depth d ≥ 1
 * over GF(p) with number elements, or undefined when GF(p) has too few
 * elements for the interpolation (or, never seen, too many values are
 * unlucky); the caller then uses the remainder sequence.
 */
export function brownGcd(F: Field<number>, a: Node, b: Node, depth: number): Node | undefined {
  if (depth === 1) return denseGcd(F, a as number[], b as number[]);
  const contentA = innerLists(a, depth).reduce<number[]>((g, l) => denseGcd(F, g, l), []);
  const contentB = innerLists(b, depth).reduce<number[]>((g, l) => denseGcd(F, g, l), []);
  const A = mapInner(a, depth, (l) => denseDivMod(F, l, contentA).quotient);
  const B = mapInner(b, depth, (l) => denseDivMod(F, l, contentB).quotient);
  const c = denseGcd(F, contentA, contentB);
  const leadA = leadingInY(A, depth);
  const leadB = leadingInY(B, depth);
  const gamma = denseGcd(F, leadA, leadB);
  const bound = Math.min(maxDegreeInY(A, depth), maxDegreeInY(B, depth)) + gamma.length - 1;
  const D = nestedDomain(fieldDomain(F), depth);
  const p = Number(F.characteristic);
  let H: Node | undefined;
  let leading: number[] = [];
  let vanishing: number[] = [F.one];
  let points = 0;
  // Unlucky values are roots of fixed nonzero polynomials, so few are met; past this many the
  // caller falls back to the remainder sequence rather than search on.
  const attempts = Math.min(p, 10 * (bound + 1) + 100);
  for (let r = 0; r < attempts; r++) {
    if (evaluateDense(F, leadA, r) === 0 || evaluateDense(F, leadB, r) === 0) continue;
    const image = brownGcd(F, evaluateInnermost(F, A, depth, r), evaluateInnermost(F, B, depth, r), depth - 1);
    if (image === undefined) return undefined;
    const monomial = leadingMonomial(image, depth - 1);
    // A constant image proves that the primitive parts are coprime (their gcd's image divides it with the same degrees).
    if (monomial.every((e) => e === 0)) return constantInY(c, depth);
    const scale = evaluateDense(F, gamma, r);
    const scaled = mapValues(F, image, depth - 1, (v) => F.mul(v, scale));
    const order = H === undefined ? -1 : compareLex(monomial, leading);
    if (order > 0) continue;
    if (order < 0) {
      H = zipWithValues([], scaled, depth, (_, v) => trimDense(F, [v]));
      leading = monomial;
      vanishing = trimDense(F, [F.neg(r), F.one]);
      points = 1;
    } else {
      // Newton's step: H + (image − H(r))/q(r)·q, where q = Π (y − r_i) over the values used so far.
      const correction = F.inv(evaluateDense(F, vanishing, r));
      H = zipWithValues(H!, scaled, depth, (leaf, v) => {
        const difference = F.mul(F.sub(v, evaluateDense(F, leaf, r)), correction);
        return trimDense(F, addScaled(F, leaf, vanishing, difference));
      });
      vanishing = denseMul(F, vanishing, trimDense(F, [F.neg(r), F.one]));
      points++;
    }
    if (points > bound) {
      const content = innerLists(H, depth).reduce<number[]>((g, l) => denseGcd(F, g, l), []);
      const candidate = mapInner(H, depth, (l) => denseDivMod(F, l, content).quotient);
      if (D.divide(A, candidate) !== undefined && D.divide(B, candidate) !== undefined) {
        const result = mapInner(candidate, depth, (l) => denseMul(F, l, c));
        return D.divideByUnit(result, D.unitPart(result));
      }
    }
  }
  return undefined;
}

function addScaled(F: Field<number>, a: readonly number[], b: readonly number[], c: number): number[] {
  const out = new Array<number>(Math.max(a.length, b.length)).fill(0);
  for (let i = 0; i < out.length; i++) out[i] = F.add(a[i] ?? 0, F.mul(c, b[i] ?? 0));
  return out;
}

/** Applies f to every leaf (number) of a node of depth ≥ 1. */
function mapValues(F: Field<number>, x: Node, depth: number, f: (v: number) => number): Node {
  if (depth === 1) return trimDense(F, (x as number[]).map(f));
  return trimAt((x as Node[]).map((child) => mapValues(F, child, depth - 1, f)), depth);
}

function mapBig(x: Node, depth: number, f: (v: bigint) => Node): Node {
  if (depth === 0) return f(x as bigint);
  return (x as Node[]).map((child) => mapBig(child, depth - 1, f));
}

function trimDeep(x: Node, depth: number, isZero: (leaf: Node) => boolean): Node {
  if (depth === 0) return x;
  const list = (x as Node[]).map((child) => trimDeep(child, depth - 1, isZero));
  while (list.length > 0 && (depth - 1 === 0 ? isZero(list[list.length - 1]) : (list[list.length - 1] as Node[]).length === 0)) list.pop();
  return list;
}

function leadingLeaf(x: Node, depth: number): Node {
  let node = x;
  for (let k = 0; k < depth; k++) node = (node as Node[])[(node as Node[]).length - 1];
  return node;
}

function leaves(x: Node, depth: number, out: Node[] = []): Node[] {
  if (depth === 0) out.push(x);
  else for (const child of x as Node[]) leaves(child, depth - 1, out);
  return out;
}

/** Combines residues modulo M (bigint leaves) with residues modulo p (number leaves), leaf by leaf. */
function crt(x: Node, y: Node, depth: number, M: bigint, p: bigint, inverse: bigint): Node {
  if (depth === 0) {
    const h = x as bigint;
    const g = BigInt(y as number);
    let t = ((g - h) % p) * inverse % p;
    if (t < 0n) t += p;
    return h + M * t;
  }
  const a = x as Node[];
  const b = y as Node[];
  const out: Node[] = [];
  for (let i = 0; i < Math.max(a.length, b.length); i++) out.push(crt(a[i] ?? (depth === 1 ? 0n : []), b[i] ?? (depth === 1 ? 0 : []), depth - 1, M, p, inverse));
  return out;
}

function* wordPrimes(): Generator<bigint> {
  for (let n = 2n ** 31n - 1n; ; n -= 2n) if (isPrime(n)) yield n;
}

function inverseModPrime(a: bigint, p: bigint): bigint {
  let [r0, r1] = [((a % p) + p) % p, p];
  let [s0, s1] = [1n, 0n];
  while (r1 !== 0n) {
    const q = r0 / r1;
    [r0, r1] = [r1, r0 - q * r1];
    [s0, s1] = [s1, s0 - q * s1];
  }
  return ((s0 % p) + p) % p;
}

/** How many primes may be used before giving up (never reached in practice: each adds 31 bits). */
const PRIME_LIMIT = 400;

/**
 * The gcd, up to a constant, of two nonzero integer nodes of depth d ≥ 1, as
 * a primitive integer node with positive leading coefficient; see the module
 * comment. Undefined only if the prime limit is reached.
 */
export function modularIntegerGcd(a: Node, b: Node, depth: number): Node | undefined {
  const leadA = leadingLeaf(a, depth) as bigint;
  const leadB = leadingLeaf(b, depth) as bigint;
  const gamma = gcdBigInt(leadA, leadB);
  const Z = nestedDomain(INTEGERS, depth);
  let H: Node | undefined;
  let M = 1n;
  let leading: number[] = [];
  let previous: Node | undefined;
  let used = 0;
  for (const p of wordPrimes()) {
    if (++used > PRIME_LIMIT) return undefined;
    if (leadA % p === 0n || leadB % p === 0n) continue;
    const Fp = primeField(p) as Field<number>;
    const reduce = (x: Node) => trimDeep(mapBig(x, depth, (v) => Number(((v % p) + p) % p)), depth, (leaf) => leaf === 0);
    const image = brownGcd(Fp, reduce(a), reduce(b), depth);
    if (image === undefined) continue;
    const monomial = leadingMonomial(image, depth);
    if (monomial.every((e) => e === 0)) return constantOne(depth);
    const scale = Number(((gamma % p) + p) % p);
    const scaled = mapValues(Fp, image, depth, (v) => Fp.mul(v, scale));
    const order = H === undefined ? -1 : compareLex(monomial, leading);
    if (order > 0) continue;
    if (order < 0) {
      H = mapBigFromNumbers(scaled, depth);
      M = p;
      leading = monomial;
      previous = undefined;
      continue;
    }
    H = trimDeep(crt(H!, scaled, depth, M, p, inverseModPrime(M, p)), depth, (leaf) => leaf === 0n);
    M *= p;
    const half = M / 2n;
    const candidate = trimDeep(mapBig(H, depth, (v) => (v > half ? v - M : v)), depth, (leaf) => leaf === 0n);
    // Trial division only once the candidate has stopped changing, which is when it is likely to be right.
    if (previous !== undefined && Z.eq(previous, candidate)) {
      const primitive = primitiveNode(candidate, depth);
      if (Z.divide(a, primitive) !== undefined && Z.divide(b, primitive) !== undefined) return primitive;
    }
    previous = candidate;
  }
  return undefined;
}

function mapBigFromNumbers(x: Node, depth: number): Node {
  if (depth === 0) return BigInt(x as number);
  return (x as Node[]).map((child) => mapBigFromNumbers(child, depth - 1));
}

function constantOne(depth: number): Node {
  let node: Node = 1n;
  for (let k = 0; k < depth; k++) node = [node];
  return node;
}

/** The node divided by the gcd of its integer leaves, with a positive leading leaf. */
function primitiveNode(x: Node, depth: number): Node {
  let g = 0n;
  for (const leaf of leaves(x, depth)) g = gcdBigInt(g, leaf as bigint);
  if ((leadingLeaf(x, depth) as bigint) < 0n) g = -g;
  return mapBig(x, depth, (v) => v / g);
}
