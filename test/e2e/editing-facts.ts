/**
 * What a user must see when editing the fixtures test/e2e/fixtures/plane-completion.wedge,
 * meeting-lines-rename.wedge and false-plucker-point.wedge in the workbench.
 *
 * Where the expected values come from:
 * - Plücker points are the 2×2 minors of the vectors written in the fixtures, scaled to the
 *   primitive representative, computed here as in ./sample-facts.ts (the definition; common
 *   practice, no source for the scaling). By hand, for false-plucker-point.wedge, u = (1, 2, 0, 1),
 *   v = (0, 1, 1, −1): p12 = 1, p13 = 1, p14 = −1, p23 = 2, p24 = −3, p34 = −1, and the quadratic
 *   relation p12·p34 − p13·p24 + p14·p23 = −1 + 3 − 2 = 0 holds (Hodge & Pedoe, vol. I, ch. VII,
 *   from memory).
 * - The names offered by completion and their details: the kinds the fixture declares them with
 *   and the built-in operations' signatures as docs/language.md lists them ("Expressions").
 * - The refusals of a rename and the quick fix's title are the documented interface of the language
 *   layer (server/src/language/services/rename.ts, server/src/language/program.ts): a keyword and a
 *   built-in operation are part of the language, and a false claimed value is replaced with the
 *   computed one.
 * - The renamed text is the fixture with every whole-word occurrence of the old name replaced,
 *   which is what a rename means when, as here, the name occurs in no comment.
 */
import { primitive, twoByTwoMinors } from './sample-facts.js';

const pointText = (a: number[], b: number[]) => `[${primitive(twoByTwoMinors(a, b).map((c) => c.value)).join(' : ')}]`;

export const COMPLETION_FILE = 'plane-completion.wedge';
export const RENAME_FILE = 'meeting-lines-rename.wedge';
export const QUICK_FIX_FILE = 'false-plucker-point.wedge';
export const EDITING_FIXTURES = [COMPLETION_FILE, RENAME_FILE, QUICK_FIX_FILE];

/** plane-completion.wedge: plane = span(p, q), p = (1, 0, 2, −1), q = (0, 1, 0, 3). */
export const COMPLETION_FIRST_LINE = 'One plane in a 4-dimensional space';
export const COMPLETION_PLANE_POINT = pointText([1, 0, 2, -1], [0, 1, 0, 3]);
/** What typing `show (p` must offer: the names in scope with their kinds, and built-ins by signature. */
export const COMPLETIONS_FOR_P = [
  { label: 'p', detail: 'vector' },
  { label: 'plane', detail: 'subspace' },
  { label: 'plucker', detail: 'plucker(W)' },
  { label: 'pairing', detail: 'pairing(L1, L2)' },
];
export const COMPLETED_LINE = 'show (plucker(plane))';
/** The lens of the completed statement after saving. */
export const COMPLETED_LENS = ['plucker(plane) =', 'G(2,4)', COMPLETION_PLANE_POINT];

/** meeting-lines-rename.wedge: the point both lines pass through, renamed from its declaration. */
export const RENAME_FIRST_LINE = 'Two lines of projective 3-space through one point';
export const RENAMED_FROM = 'corner';
export const RENAMED_TO = 'origin';
export const RENAME_DECLARATION_LINE = 'vector corner = (1, 0, 0, 0)';
/** The fixture's text after the rename. */
export function renamedText(fixture: string): string {
  if (fixture.split('\n').some((line) => line.startsWith('#') && new RegExp(`\\b${RENAMED_FROM}\\b`).test(line))) {
    throw new Error(`the rename fixture must not mention ${RENAMED_FROM} in a comment`);
  }
  return fixture.replace(new RegExp(`\\b${RENAMED_FROM}\\b`, 'g'), RENAMED_TO);
}
/** After saving the renamed file, the claim about the point still holds and speaks of the new name. */
export const RENAMED_CLAIM_LENS = ['✓ holds', `${RENAMED_TO} lies in second`];
/** Words where F2 must be refused, the line showing each, and words of the refusal. */
export const REFUSED_RENAMES = [
  { lineText: 'claim corner in first', word: 'claim', message: ['is a keyword of the language', 'cannot be renamed'] },
  { lineText: 'subspace first = span(corner, edge)', word: 'span', message: ['is a built-in operation', 'part of the language'] },
];

/** false-plucker-point.wedge: the claimed point has a sign slip in p24. */
export const QUICK_FIX_FIRST_LINE = 'A plane whose Plücker vector was copied with a sign slip';
export const FALSE_POINT_CLAIM = 'claim plucker(plane) = [1 : 1 : -1 : 2 : 3 : -1]';
export const COMPUTED_POINT = pointText([1, 2, 0, 1], [0, 1, 1, -1]);
export const QUICK_FIX_TITLE = ['Replace with the computed value', COMPUTED_POINT];
export const FIXED_CLAIM = `claim plucker(plane) = ${COMPUTED_POINT}`;
export const FIXED_CLAIM_LENS = ['✓ holds', `is the projective point ${COMPUTED_POINT}`];
