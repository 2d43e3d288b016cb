/**
 * What a user must see for samples/rig-sight-lines.wedge and test/e2e/fixtures/broken-syntax.wedge,
 * shared by every editor check (the workbench, the in-host suite and the second LSP client).
 *
 * Where the expected values come from:
 * - Plücker coordinates of a 2-plane span(a, b) are its 2×2 minors p_ij = a_i·b_j − a_j·b_i on the
 *   column pairs i < j in lexicographic order (the definition; e.g. Hodge & Pedoe, "Methods of
 *   Algebraic Geometry", vol. I, ch. VII, from memory). They are computed below from the vectors
 *   written in the sample, not from anything the project computes.
 * - The primitive representative of a projective point: divide by the gcd, first nonzero entry
 *   positive (common practice, no source; the project's convention in docs/language.md).
 * - The claim `sightA = sightB` is false: camera A's line passes through (0, 0, 0, 1), which is not a
 *   combination of camera B's points (4, 0, 0, 1) and (2, 1, 3, 1) (its first coordinate would need
 *   4s + 2t = 0 with s + t = 1 and t = 0 from the second coordinate: impossible). Checked by hand.
 * - Problem codes (`claim/equality`, `syntax/…`) and the convention sentence are the documented
 *   interface (docs/cli-json.md, docs/language.md "Conventions").
 */

export const SAMPLE_FILE = 'rig-sight-lines.wedge';
export const BROKEN_FILE = 'broken-syntax.wedge';

/** The sample's two points of sight line A, as written there. */
const CAMERA_A = [0, 0, 0, 1];
const TARGET_A = [2, 1, 3, 1];

export interface Coordinate {
  label: string;
  value: number;
}

/** The 2×2 minors of the rows a, b on the column pairs i < j, lexicographic, labels from 1. */
export function twoByTwoMinors(a: number[], b: number[]): Coordinate[] {
  const result: Coordinate[] = [];
  for (let i = 0; i < a.length; i++) {
    for (let j = i + 1; j < a.length; j++) {
      result.push({ label: `p${i + 1}${j + 1}`, value: a[i]! * b[j]! - a[j]! * b[i]! });
    }
  }
  return result;
}

function gcd(x: number, y: number): number {
  return y === 0 ? Math.abs(x) : gcd(y, x % y);
}

/** The primitive integer representative: gcd 1, first nonzero entry positive. */
export function primitive(values: number[]): number[] {
  const divisor = values.reduce((g, v) => gcd(g, v), 0);
  const first = values.find((v) => v !== 0) ?? 1;
  const sign = first < 0 ? -1 : 1;
  return values.map((v) => (sign * v) / divisor + 0); // + 0 turns −0 into 0.
}

export const SIGHT_A_MINORS = twoByTwoMinors(CAMERA_A, TARGET_A);
export const SIGHT_A_POINT = primitive(SIGHT_A_MINORS.map((c) => c.value));
/** The projective point as the editor prints it: `[0 : 0 : 2 : 0 : 1 : 3]`. */
export const SIGHT_A_POINT_TEXT = `[${SIGHT_A_POINT.join(' : ')}]`;

/** The name hovered in the sample, on its declaration line. */
export const HOVERED_NAME = 'sightA';
export const HOVERED_LINE_TEXT = 'subspace sightA = span(cameraA, targetA)';

/** Substrings the hover over `sightA` must contain. */
export function hoverExpectations(): (string | RegExp)[] {
  return [
    'Plücker coordinates',
    'G(2,4)',
    // Every coordinate with its label, in lexicographic order; the value must end there (no 0 → 0/1).
    ...SIGHT_A_MINORS.map(({ label, value }) => new RegExp(`${label} = ${value}(?![\\d/])`)),
    SIGHT_A_POINT_TEXT,
    // The convention sentence (docs/language.md, "Conventions").
    'Convention:',
    'lexicographic order',
    'labels from 1',
    'basis vectors as rows',
  ];
}

/** Substrings of the code lens above `sightA`'s declaration. */
export const SIGHT_A_LENS = ['dim 2 in V', 'G(2,4)', SIGHT_A_POINT_TEXT];

/** What copying that lens as LaTeX must put on the clipboard. */
export const SIGHT_A_LATEX = [
  `\\bigl(${SIGHT_A_MINORS.map((c) => `p_{${c.label.slice(1)}}`).join(', ')}\\bigr)`,
  `\\bigl${SIGHT_A_POINT_TEXT.slice(0, -1)}\\bigr]`,
];

/** The deliberate false claim, its problem code and words of its message. */
export const FALSE_CLAIM_TEXT = 'claim sightA = sightB';
export const FALSE_CLAIM_CODE = 'claim/equality';
export const FALSE_CLAIM_MESSAGE = ["'sightA = sightB'", 'is false', 'not in sightB'];
/** The edit that makes it true (the two lines are different), and the lens the saved file then shows. */
export const TRUE_CLAIM_TEXT = 'claim sightA != sightB';
export const TRUE_CLAIM_LENS = ['✓ holds', 'sightA and sightB are different'];

/** The broken file: its syntax problem, and a statement after it that must still be computed. */
export const SYNTAX_CODE_PREFIX = 'syntax/';
export const SYNTAX_MESSAGE = ["expected ','", "closing ')'"];
/** M = span(p, q) with p = (1, 0, 2, −1), q = (0, 1, 0, 0): its minors, computed here as for sightA. */
export const RECOVERED_LENS = [
  'dim 2 in V',
  `[${primitive(twoByTwoMinors([1, 0, 2, -1], [0, 1, 0, 0]).map((c) => c.value)).join(' : ')}]`,
];
export const RECOVERED_CLAIM_LENS = '✓ holds: dim M = 2';

/** The zero-based line of the first line of `text` that contains `needle`. */
export function lineOf(text: string, needle: string): number {
  const line = text.split(/\r?\n/).findIndex((l) => l.includes(needle));
  if (line < 0) throw new Error(`the text has no line containing ${JSON.stringify(needle)}`);
  return line;
}

/** Which of `expected` are missing from `actual` (strings as substrings, regular expressions as matches). */
export function missingFrom(actual: string, expected: readonly (string | RegExp)[]): string[] {
  return expected
    .filter((e) => (typeof e === 'string' ? !actual.includes(e) : !e.test(actual)))
    .map((e) => (typeof e === 'string' ? JSON.stringify(e) : String(e)));
}
