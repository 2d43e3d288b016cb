/**
 * Integer partitions as the Schubert calculus uses them: weakly decreasing
 * arrays of nonnegative integers, with trailing zeros carrying no meaning.
 *
 * The normal form drops the trailing zeros, so (2, 1, 0) and (2, 1) are one
 * partition and the empty partition is []. Partitions that index Schubert
 * classes of G(k, n) lie in the k×(n−k) box: at most k nonzero parts, each at
 * most n − k (see schubert.ts for how a partition belongs to a cell).
 */

/** A weakly decreasing array of nonnegative integers; the normal form has no trailing zeros. */
export type Partition = readonly number[];

/** Why a list of numbers is not an acceptable partition. */
export type PartitionProblem = 'not-integer' | 'negative' | 'not-decreasing' | 'outside-box' | 'malformed';

/** Raised when numbers do not form a partition, or a partition does not fit where it must. */
export class InvalidPartitionError extends RangeError {
  /** Which rule the input broke. */
  readonly problem: PartitionProblem;
  /** The parts as given (empty when the text could not be read at all). */
  readonly parts: readonly number[];
  constructor(problem: PartitionProblem, parts: readonly number[], message: string) {
    super(message);
    this.name = 'InvalidPartitionError';
    this.problem = problem;
    this.parts = parts.slice();
  }
}

/**
 * Raised when a partition has more than k nonzero parts or a part above n − k,
 * so it indexes no Schubert class of G(k, n). It is a kind of
 * `InvalidPartitionError` with problem 'outside-box'.
 */
export class PartitionOutsideBoxError extends InvalidPartitionError {
  /** The number of rows of the box (k). */
  readonly rows: number;
  /** The number of columns of the box (n − k). */
  readonly columns: number;
  constructor(parts: readonly number[], rows: number, columns: number, context: string) {
    super(
      'outside-box',
      parts,
      `${context}: the partition (${parts.join(', ')}) does not fit in the ${rows}×${columns} box ` +
        `(at most ${rows} nonzero parts, each at most ${columns})`,
    );
    this.name = 'PartitionOutsideBoxError';
    this.rows = rows;
    this.columns = columns;
  }
}

/**
 * The normal form of a partition: checks that the parts are nonnegative
 * integers in weakly decreasing order and drops the trailing zeros.
 * Throws `InvalidPartitionError` naming the first broken rule.
 */
export function normalizePartition(parts: readonly number[], context = 'partition'): number[] {
  parts.forEach((x, i) => {
    if (!Number.isSafeInteger(x)) {
      throw new InvalidPartitionError('not-integer', parts, `${context}: part ${i + 1} is ${x}, not an integer`);
    }
    if (x < 0) throw new InvalidPartitionError('negative', parts, `${context}: part ${i + 1} is ${x}, which is negative`);
    if (i > 0 && parts[i - 1]! < x) {
      throw new InvalidPartitionError(
        'not-decreasing',
        parts,
        `${context}: the parts (${parts.join(', ')}) are not weakly decreasing (part ${i + 1} exceeds part ${i})`,
      );
    }
  });
  let end = parts.length;
  while (end > 0 && parts[end - 1] === 0) end--;
  return parts.slice(0, end);
}

/** Throws `PartitionOutsideBoxError` unless the (normalized) partition fits in the rows×columns box. */
export function checkPartitionInBox(partition: Partition, rows: number, columns: number, context = 'partition'): void {
  if (partition.length > rows || (partition.length > 0 && partition[0]! > columns)) {
    throw new PartitionOutsideBoxError(partition, rows, columns, context);
  }
}

/** Whether the (normalized) partition fits in the rows×columns box. */
export function fitsInBox(partition: Partition, rows: number, columns: number): boolean {
  return partition.length <= rows && (partition.length === 0 || partition[0]! <= columns);
}

/** |λ|, the sum of the parts. */
export function partitionSize(partition: Partition): number {
  return partition.reduce((a, b) => a + b, 0);
}

/** Whether the diagram of λ contains the diagram of μ: λ_i ≥ μ_i for every i. */
export function containsPartition(lambda: Partition, mu: Partition): boolean {
  return mu.length <= lambda.length && mu.every((x, i) => lambda[i]! >= x);
}

/** The conjugate partition (the transposed diagram): λ'_j = #{i : λ_i ≥ j}. */
export function conjugatePartition(partition: Partition): number[] {
  const out: number[] = [];
  const first = partition[0] ?? 0;
  for (let j = 1; j <= first; j++) out.push(partition.filter((x) => x >= j).length);
  return out;
}

/**
 * The complement of λ in the rows×columns box, turned by a half turn:
 * λ^∨_i = columns − λ_{rows+1−i}. It indexes the Schubert class dual to σ_λ.
 */
export function complementInBox(partition: Partition, rows: number, columns: number): number[] {
  checkPartitionInBox(partition, rows, columns, 'complementInBox');
  const out: number[] = [];
  for (let i = 0; i < rows; i++) out.push(columns - (partition[rows - 1 - i] ?? 0));
  return normalizePartition(out);
}

/** The rectangle with `rows` parts equal to `columns`: the largest partition in the box. */
export function rectangle(rows: number, columns: number): number[] {
  return columns === 0 ? [] : new Array<number>(rows).fill(columns);
}

/** A map key for a normalized partition: the parts joined by commas ('' for the empty partition). */
export function partitionKey(partition: Partition): string {
  return partition.join(',');
}

/** The normalized partition of a key made by `partitionKey`. */
export function partitionFromKey(key: string): number[] {
  return key === '' ? [] : key.split(',').map(Number);
}

/**
 * The order in which sums of Schubert classes list their terms: by size
 * first, then lexicographically by parts (so (1, 1, 1) < (2, 1) < (3)).
 */
export function comparePartitions(a: Partition, b: Partition): number {
  const size = partitionSize(a) - partitionSize(b);
  if (size !== 0) return size;
  for (let i = 0; i < Math.max(a.length, b.length); i++) {
    const d = (a[i] ?? 0) - (b[i] ?? 0);
    if (d !== 0) return d;
  }
  return 0;
}

/**
 * Every partition of `size` inside the rows×columns box that contains
 * `inside` (normalized), in increasing `comparePartitions` order.
 */
export function partitionsBetween(inside: Partition, size: number, rows: number, columns: number): number[][] {
  const out: number[][] = [];
  const parts: number[] = [];
  // Row by row: each part lies between the inner partition's part and the part above, and the
  // parts still to come must be able to absorb what is left of the size.
  const place = (row: number, left: number, cap: number): void => {
    if (row === rows || cap === 0) {
      if (left === 0) out.push(normalizePartition(parts));
      return;
    }
    const low = inside[row] ?? 0;
    for (let x = low; x <= Math.min(cap, left); x++) {
      // The rows below can hold at most x each.
      if (left - x > x * (rows - row - 1)) continue;
      parts.push(x);
      place(row + 1, left - x, x);
      parts.pop();
    }
  };
  if (containsPartition(rectangle(rows, columns), inside)) place(0, size, columns);
  return out.sort(comparePartitions);
}

// A sign is accepted so that a negative part is reported as negative, not as unreadable.
const ITEM = /^(-?\d+)(?:\^(\d+))?$/;

/**
 * Reads a partition from text: parts separated by commas or spaces, optionally
 * in parentheses, a part written `a^m` standing for m parts equal to a (as in
 * `(3^2, 1)` for (3, 3, 1)); `()`, `0`, `∅` and the empty text are the empty
 * partition. Throws `InvalidPartitionError` for text that is not of this form
 * or numbers that are not a partition.
 */
export function parsePartition(text: string): number[] {
  let body = text.trim();
  if (body.startsWith('(') && body.endsWith(')')) body = body.slice(1, -1).trim();
  if (body === '' || body === '∅') return [];
  const parts: number[] = [];
  for (const item of body.split(/\s*,\s*|\s+/)) {
    const match = ITEM.exec(item);
    if (match === null) {
      throw new InvalidPartitionError(
        'malformed',
        [],
        `Malformed partition "${text}": expected nonnegative integers separated by commas, such as (2, 1) or 3^2, 1`,
      );
    }
    const value = Number(match[1]);
    const times = match[2] === undefined ? 1 : Number(match[2]);
    if (!Number.isSafeInteger(value) || !Number.isSafeInteger(times) || times > 10_000) {
      throw new InvalidPartitionError('malformed', [], `Malformed partition "${text}": the number ${item} is too large`);
    }
    for (let i = 0; i < times; i++) parts.push(value);
  }
  return normalizePartition(parts, `partition "${text}"`);
}
