/**
 * Plücker coordinates modulo a prime p < 2^31, on 32-bit integer arrays.
 *
 * The same depth-first walk over column sets as the generic one in
 * plucker.ts (see there for why it is correct and what it costs), specialised
 * so that no step goes through the `Field` interface: each level of the walk
 * keeps its remaining rows in one Int32Array, and every entry update is one
 * exact multiply-add of modular-arithmetic.ts (whose branch-free last step
 * made the whole walk about three times faster on random residues).
 *
 * Three things differ from the generic walk, all to save work near the leaves,
 * where most of it is:
 * - When four rows a, b, c, d remain, the minors under the node are σ times
 *   the 4×4 minors of those rows, expanded along a over the 3×3 minors of
 *   b, c, d, themselves expanded along b over the 2×2 minors of c and d
 *   (Laplace expansion). Each leaf is then one four-term dot product, and the
 *   last three eliminations (with their inversions) are skipped. Matrices of
 *   two, three or four rows are expanded the same way from the start.
 * - The pivots of all children of a node are known before the first child is
 *   visited (they are entries of the node's rows), so their inverses are found
 *   together: one inversion and three multiplications per child instead of one
 *   inversion per child (simultaneous inversion; common practice, no source).
 * - The scratch arrays are kept between calls (see `scratch`).
 *
 * Tried and dropped (measured at G(5,15) to G(12,24)): taking the walk level
 * by level, with all nodes of a depth and first free column stored together
 * so that every loop runs over hundreds of nodes. Against the depth-first
 * walk with the branch-free kernels it ran at 0.5–1.1 times the speed: the
 * levels no longer fit the first-level cache, and the leaves are written
 * scattered over the result.
 */
import { dot3Mod, dot4Mod, dotMod, invMod, mulAddMod, mulMod, negMod } from './modular-arithmetic.js';
import { binomial } from './subsets.js';

/** How much arithmetic one run did, for the benchmarks' arithmetic floor. */
export interface ModularWalkCounts {
  /** Entry updates x + f·y (one product each). */
  updates: number;
  /** Two-term dot products a·b + c·d (one reduction each): 2×2 minors. */
  dots: number;
  /** Three-term dot products a·b + c·d + e·f (one reduction each): leaves under a node with three rows. */
  triples: number;
  /** Four-term dot products (one reduction each): leaves under a node with four rows. */
  quadruples: number;
  /** Single products (scaling by σ, factors, the running pivot product, simultaneous inversion). */
  products: number;
  /** Modular inversions. */
  inversions: number;
  /** Entries copied unchanged (a row whose factor is zero). */
  copies: number;
}

export function emptyModularWalkCounts(): ModularWalkCounts {
  return { updates: 0, dots: 0, triples: 0, quadruples: 0, products: 0, inversions: 0, copies: 0 };
}

/**
 * The leaves under a node with two rows a, b left (in m): σ·(a_c·b_j − a_j·b_c)
 * for from ≤ c < j < n, written from out[index] on. Returns the next index.
 */
function pairLeaves(m: Int32Array, n: number, from: number, sigma: number, out: Int32Array, index: number, p: number, reciprocal: number): number {
  for (let c = from; c <= n - 2; c++) {
    const a = m[c]!;
    const b = m[n + c]!;
    if (a === 0 && b === 0) {
      index += n - 1 - c;
      continue;
    }
    const sa = mulMod(sigma, a, p, reciprocal);
    const sb = negMod(mulMod(sigma, b, p, reciprocal), p);
    for (let j = c + 1; j < n; j++) out[index++] = dotMod(sa, m[n + j]!, sb, m[j]!, p, reciprocal);
  }
  return index;
}

/** The arithmetic of `pairLeaves` on the same arguments, without doing it. */
function countPairLeaves(m: Int32Array, n: number, from: number, counts: ModularWalkCounts): void {
  for (let c = from; c <= n - 2; c++) {
    if (m[c] === 0 && m[n + c] === 0) continue;
    counts.products += 2;
    counts.dots += n - 1 - c;
  }
}

/**
 * The leaves under a node with three rows a, b, c left (in m): σ·det of the
 * rows on columns x < y < z, for from ≤ x, expanded along a as
 * σa_x·M(y,z) − σa_y·M(x,z) + σa_z·M(x,y) with M(y,z) = b_y·c_z − b_z·c_y.
 * `scaled` (n entries) and `minors` (n·n entries) are scratch space. Returns
 * the next index.
 */
function tripleLeaves(
  m: Int32Array,
  n: number,
  from: number,
  sigma: number,
  out: Int32Array,
  index: number,
  p: number,
  reciprocal: number,
  scaled: Int32Array,
  minors: Int32Array,
): number {
  const b = n;
  const c = 2 * n;
  for (let y = from; y < n - 1; y++) {
    const by = m[b + y]!;
    const cy = negMod(m[c + y]!, p);
    const row = y * n;
    for (let z = y + 1; z < n; z++) minors[row + z] = dotMod(by, m[c + z]!, cy, m[b + z]!, p, reciprocal);
  }
  for (let x = from; x < n; x++) scaled[x] = mulMod(sigma, m[x]!, p, reciprocal);
  for (let x = from; x <= n - 3; x++) {
    const ax = scaled[x]!;
    const rowX = x * n;
    for (let y = x + 1; y <= n - 2; y++) {
      const ay = negMod(scaled[y]!, p);
      const mxy = minors[rowX + y]!;
      const rowY = y * n;
      for (let z = y + 1; z < n; z++) {
        out[index++] = dot3Mod(ax, minors[rowY + z]!, ay, minors[rowX + z]!, scaled[z]!, mxy, p, reciprocal);
      }
    }
  }
  return index;
}

/** The arithmetic of `tripleLeaves` from column `from` on, without doing it. */
function countTripleLeaves(n: number, from: number, counts: ModularWalkCounts): void {
  const w = n - from;
  counts.dots += (w * (w - 1)) / 2;
  counts.products += w;
  counts.triples += (w * (w - 1) * (w - 2)) / 6;
}

/**
 * The leaves under a node with four rows a, b, c, d left (in m): σ·det of the
 * rows on columns x < y < z < t, for from ≤ x, expanded along a as
 * σa_x·N(y,z,t) − σa_y·N(x,z,t) + σa_z·N(x,y,t) − σa_t·N(x,y,z), where N are
 * the 3×3 minors of b, c, d, themselves expanded along b over the 2×2 minors
 * M of c and d. `scaled`, `negated` (n entries each), `minors` (n²) and
 * `triples` (n³) are scratch space. Returns the next index.
 */
function quadrupleLeaves(
  m: Int32Array,
  n: number,
  from: number,
  sigma: number,
  out: Int32Array,
  index: number,
  p: number,
  reciprocal: number,
  scaled: Int32Array,
  negated: Int32Array,
  minors: Int32Array,
  triples: Int32Array,
): number {
  const b = n;
  const c = 2 * n;
  const d = 3 * n;
  const nn = n * n;
  for (let y = from; y < n - 1; y++) {
    const cy = m[c + y]!;
    const dy = negMod(m[d + y]!, p);
    const row = y * n;
    for (let z = y + 1; z < n; z++) minors[row + z] = dotMod(cy, m[d + z]!, dy, m[c + z]!, p, reciprocal);
  }
  for (let x = from; x < n; x++) {
    scaled[x] = m[b + x]!;
    negated[x] = negMod(m[b + x]!, p);
  }
  for (let x = from; x <= n - 3; x++) {
    const bx = scaled[x]!;
    const rowX = x * n;
    const planeX = x * nn;
    for (let y = x + 1; y <= n - 2; y++) {
      const by = negated[y]!;
      const mxy = minors[rowX + y]!;
      const rowY = y * n;
      const base = planeX + rowY;
      for (let z = y + 1; z < n; z++) {
        triples[base + z] = dot3Mod(bx, minors[rowY + z]!, by, minors[rowX + z]!, scaled[z]!, mxy, p, reciprocal);
      }
    }
  }
  for (let x = from; x < n; x++) {
    const ax = mulMod(sigma, m[x]!, p, reciprocal);
    scaled[x] = ax;
    negated[x] = negMod(ax, p);
  }
  for (let x = from; x <= n - 4; x++) {
    const ax = scaled[x]!;
    const planeX = x * nn;
    for (let y = x + 1; y <= n - 3; y++) {
      const ay = negated[y]!;
      const planeY = y * nn;
      const rowXY = planeX + y * n;
      for (let z = y + 1; z <= n - 2; z++) {
        const az = scaled[z]!;
        const nxyz = triples[rowXY + z]!;
        const rowYZ = planeY + z * n;
        const rowXZ = planeX + z * n;
        for (let t = z + 1; t < n; t++) {
          out[index++] = dot4Mod(ax, triples[rowYZ + t]!, ay, triples[rowXZ + t]!, az, triples[rowXY + t]!, negated[t]!, nxyz, p, reciprocal);
        }
      }
    }
  }
  return index;
}

/** The arithmetic of `quadrupleLeaves` from column `from` on, without doing it. */
function countQuadrupleLeaves(n: number, from: number, counts: ModularWalkCounts): void {
  const w = n - from;
  counts.dots += (w * (w - 1)) / 2;
  counts.triples += (w * (w - 1) * (w - 2)) / 6;
  counts.quadruples += (w * (w - 1) * (w - 2) * (w - 3)) / 24;
  counts.products += w;
}

/**
 * Finds, for every column c in from..last of the node whose `count` rows are
 * in m, the first row q with a nonzero entry there (or q = count if none), and
 * inverts all those pivots with one inversion: with prefix products
 * P_i = π_0⋯π_i, π_i^{-1} = P_{i−1}·P_i^{-1} and P_{i−1}^{-1} = P_i^{-1}·π_i.
 * Results go to pivotRow, pivot and inverse at offset + c. Returns the number
 * of columns with a pivot.
 */
function findAndInvertPivots(
  m: Int32Array,
  n: number,
  count: number,
  from: number,
  last: number,
  pivotRow: Int32Array,
  pivot: Int32Array,
  inverse: Int32Array,
  offset: number,
  p: number,
  reciprocal: number,
): number {
  let running = 1;
  let found = 0;
  for (let c = from; c <= last; c++) {
    let q = 0;
    while (q < count && m[q * n + c] === 0) q++;
    pivotRow[offset + c] = q;
    if (q === count) continue;
    const x = m[q * n + c]!;
    pivot[offset + c] = x;
    // inverse[c] holds the prefix product before column c until the second pass.
    inverse[offset + c] = running;
    running = found === 0 ? x : mulMod(running, x, p, reciprocal);
    found++;
  }
  if (found === 0) return 0;
  let tail = invMod(running, p);
  for (let c = last; c >= from; c--) {
    if (pivotRow[offset + c] === count) continue;
    const before = inverse[offset + c]!;
    inverse[offset + c] = mulMod(before, tail, p, reciprocal);
    tail = mulMod(tail, pivot[offset + c]!, p, reciprocal);
  }
  return found;
}

/**
 * Scratch arrays kept from one call to the next: for small matrices, making
 * a dozen fresh typed arrays cost more than the walk (measured at G(4,12)).
 * Every user writes an entry before it reads it, so old contents do no harm.
 * Slots 0 to SCRATCH_LEVELS − 1 are the levels of the walk; the others are
 * named below. Buffers beyond KEEP_LIMIT entries are not kept.
 */
const scratchBuffers: Int32Array[] = [];
const SCRATCH_LEVELS = 64;
const SCALED = SCRATCH_LEVELS;
const MINORS = SCRATCH_LEVELS + 1;
const NEGATED = SCRATCH_LEVELS + 2;
const TRIPLES = SCRATCH_LEVELS + 3;
const PIVOT_ROW = SCRATCH_LEVELS + 4;
const PIVOT = SCRATCH_LEVELS + 5;
const INVERSE = SCRATCH_LEVELS + 6;
const SIGMA = SCRATCH_LEVELS + 7;
const CURSOR = SCRATCH_LEVELS + 8;
const KEEP_LIMIT = 1 << 20;

function scratch(slot: number, size: number): Int32Array {
  if (size > KEEP_LIMIT) return new Int32Array(size);
  let buffer = scratchBuffers[slot];
  if (buffer === undefined || buffer.length < size) {
    buffer = new Int32Array(size);
    scratchBuffers[slot] = buffer;
  }
  return buffer;
}

/**
 * An array of `count` zeros whose elements are stored as doubles from the
 * start: residues need not be small integers, and an array that began with
 * small integers would be converted when the first large one is written.
 */
function zeros(count: number): number[] {
  const out = new Array<number>(count).fill(0.5);
  return out.fill(0);
}

/**
 * Writes all C(n, k) maximal minors modulo p of the k×n matrix `rows`
 * (entries in [0, p)) to `out`, in lexicographic order of their column sets,
 * by the depth-first walk; p < 2^31 must be a prime (pivots are inverted).
 * `out` must hold C(n, k) zeros: the minors of skipped subtrees are left as
 * they are. `counts`, when given, is increased by the arithmetic done.
 *
 * The walk is iterative, with the state of each depth in typed arrays, so that
 * residues (which need not fit V8's small integers) are never boxed.
 */
export function pluckerModularDepthFirst(rows: readonly ArrayLike<number>[], n: number, p: number, out: Int32Array, counts?: ModularWalkCounts): void {
  const k = rows.length;
  if (k > n) return;
  if (k === 0) {
    out[0] = 1;
    return;
  }
  if (k === 1) {
    for (let j = 0; j < n; j++) out[j] = rows[0]![j]!;
    return;
  }
  const reciprocal = 1 / p;
  // levels[d] holds the k − d remaining rows at depth d, row i at offset i·n (the walk stops at four rows).
  const levels: Int32Array[] = [];
  for (let d = 0; d <= Math.max(0, k - 4); d++) levels.push(d < SCRATCH_LEVELS ? scratch(d, (k - d) * n) : new Int32Array((k - d) * n));
  const top = levels[0]!;
  for (let i = 0; i < k; i++) {
    const row = rows[i]!;
    for (let j = 0; j < n; j++) top[i * n + j] = row[j]!;
  }
  if (k === 2) {
    if (counts !== undefined) countPairLeaves(levels[0]!, n, 0, counts);
    pairLeaves(levels[0]!, n, 0, 1, out, 0, p, reciprocal);
    return;
  }
  const scaled = scratch(SCALED, n);
  const minors = scratch(MINORS, n * n);
  if (k === 3) {
    if (counts !== undefined) countTripleLeaves(n, 0, counts);
    tripleLeaves(levels[0]!, n, 0, 1, out, 0, p, reciprocal, scaled, minors);
    return;
  }
  const negated = scratch(NEGATED, n);
  const triples = scratch(TRIPLES, n * n * n);
  if (k === 4) {
    if (counts !== undefined) countQuadrupleLeaves(n, 0, counts);
    quadrupleLeaves(levels[0]!, n, 0, 1, out, 0, p, reciprocal, scaled, negated, minors, triples);
    return;
  }
  // skip[count·n + c]: the number of minors under a node with `count` rows whose next column c has no pivot.
  const skip = new Float64Array((k + 1) * n);
  for (let count = 1; count <= k; count++) {
    for (let c = 0; c < n; c++) skip[count * n + c] = binomial(n - 1 - c, count - 1);
  }
  // Per depth d (at offset d·n): pivot row, pivot and pivot inverse of each next column.
  const pivotRow = scratch(PIVOT_ROW, k * n);
  const pivot = scratch(PIVOT, k * n);
  const inverse = scratch(INVERSE, k * n);
  // Per depth: σ, the signed product of the pivots so far, and the next column to try.
  const sigma = scratch(SIGMA, k);
  const cursor = scratch(CURSOR, k);

  let index = 0;
  let updates = 0;
  let products = 0;
  let inversions = 0;
  let copies = 0;

  const found = findAndInvertPivots(levels[0]!, n, k, 0, n - k, pivotRow, pivot, inverse, 0, p, reciprocal);
  if (found === 0) return;
  products += 3 * found - 1;
  inversions++;
  sigma[0] = 1;
  cursor[0] = 0;
  let d = 0;
  while (d >= 0) {
    const count = k - d;
    const last = n - count; // the largest column that still leaves room for the rest
    const offset = d * n;
    let c = cursor[d]!;
    while (c <= last && pivotRow[offset + c] === count) {
      index += skip[count * n + c]!;
      c++;
    }
    if (c > last) {
      d--;
      continue;
    }
    cursor[d] = c + 1;

    // Eliminate column c: pivot on row q and remove it from the other rows, in the columns after c.
    const m = levels[d]!;
    const next = levels[d + 1]!;
    const q = pivotRow[offset + c]!;
    const pivotBase = q * n;
    const inv = inverse[offset + c]!;
    let target = 0;
    for (let i = 0; i < count; i++) {
      if (i === q) continue;
      const base = i * n;
      const f = m[base + c]!;
      if (f === 0) {
        for (let j = c + 1; j < n; j++) next[target + j] = m[base + j]!;
        copies += n - 1 - c;
      } else {
        // row_i − (f/π)·row_q, written as row_i + g·row_q with g = −f·π^{-1}.
        const g = negMod(mulMod(f, inv, p, reciprocal), p);
        for (let j = c + 1; j < n; j++) next[target + j] = mulAddMod(m[base + j]!, g, m[pivotBase + j]!, p, reciprocal);
        products++;
        updates += n - 1 - c;
      }
      target += n;
    }
    // Taking the q-th remaining row as the next pivot moves it past q rows: sign (−1)^q.
    const s = sigma[d]!;
    const childSigma = mulMod(q % 2 === 0 ? s : negMod(s, p), pivot[offset + c]!, p, reciprocal);
    products++;

    const childCount = count - 1;
    if (childCount === 4) {
      if (counts !== undefined) countQuadrupleLeaves(n, c + 1, counts);
      index = quadrupleLeaves(next, n, c + 1, childSigma, out, index, p, reciprocal, scaled, negated, minors, triples);
      continue;
    }
    const childFound = findAndInvertPivots(next, n, childCount, c + 1, n - childCount, pivotRow, pivot, inverse, offset + n, p, reciprocal);
    if (childFound === 0) {
      // The remaining rows vanish on every column still to come: the whole subtree is zero.
      index += skip[count * n + c]!;
      continue;
    }
    products += 3 * childFound - 1;
    inversions++;
    d++;
    sigma[d] = childSigma;
    cursor[d] = c + 1;
  }
  if (counts !== undefined) {
    counts.updates += updates;
    counts.products += products;
    counts.inversions += inversions;
    counts.copies += copies;
  }
  return;
}

/**
 * Small results are carved from a shared 16 KiB buffer, as Node's own
 * `Buffer` pool does for small buffers: a fresh typed array costs its own
 * backing store, measured at 260 ns for 28 entries and 700 ns for 495 — more
 * than computing them at G(2,8) — while a view on the pool costs about 45 ns.
 * The pool is only ever carved forwards, so every view starts zeroed and no
 * two results share memory; the price is that a small result kept alive keeps
 * its 16 KiB alive with it. Results above 2 KiB get their own buffer.
 */
const POOL_BYTES = 16384;
const POOLED_BYTES_LIMIT = 2048;
let pool = new ArrayBuffer(POOL_BYTES);
let poolUsed = 0;

/** `bytes` zeroed bytes at a multiple of 8 in the pool (the caller has checked the limit): the offset. */
function carve(bytes: number): number {
  poolUsed = (poolUsed + 7) & ~7;
  if (poolUsed + bytes > POOL_BYTES) {
    pool = new ArrayBuffer(POOL_BYTES);
    poolUsed = 0;
  }
  const at = poolUsed;
  poolUsed += bytes;
  return at;
}

/** A zeroed Int32Array of `count` entries, not shared with any other. */
export function zeroResidues(count: number): Int32Array {
  if (count * 4 > POOLED_BYTES_LIMIT) return new Int32Array(count);
  const at = carve(count * 4);
  return new Int32Array(pool, at, count);
}

/** A zeroed Float64Array of `count` entries, not shared with any other (from the same pool). */
export function zeroDoubles(count: number): Float64Array {
  if (count * 8 > POOLED_BYTES_LIMIT) return new Float64Array(count);
  const at = carve(count * 8);
  return new Float64Array(pool, at, count);
}

/**
 * All C(n, k) maximal minors modulo p of the k×n matrix `rows` (entries
 * integers in [0, p)), in lexicographic order of their column sets, as
 * residues in an Int32Array; p < 2^31 must be a prime (pivots are inverted).
 * `counts`, when given, is increased by the arithmetic done.
 */
export function pluckerResidues(rows: readonly ArrayLike<number>[], n: number, p: number, counts?: ModularWalkCounts): Int32Array {
  const k = rows.length;
  const out = zeroResidues(k > n ? 0 : binomial(n, k));
  pluckerModularDepthFirst(rows, n, p, out, counts);
  return out;
}

/**
 * The same minors in a plain array, for callers that keep `number[]` (the
 * elements of GF(p) as the `Field` interface hands them out). Copying costs
 * about as much per coordinate as the walk itself at G(10,20); callers that
 * can keep the Int32Array should use `pluckerResidues`.
 */
export function pluckerModular(rows: readonly ArrayLike<number>[], n: number, p: number, counts?: ModularWalkCounts): number[] {
  const residues = pluckerResidues(rows, n, p, counts);
  const out = zeros(residues.length);
  for (let i = 0; i < residues.length; i++) out[i] = residues[i]!;
  return out;
}
