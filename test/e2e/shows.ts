/**
 * One readable failure for "this text must show these pieces": what was expected, what is missing,
 * and the text as it was shown.
 */
import { AssertionError } from 'node:assert';
import { missingFrom } from './sample-facts.js';

export type Expected = readonly (string | RegExp)[];

export const describeExpected = (expected: Expected) =>
  expected.map((e) => (typeof e === 'string' ? JSON.stringify(e) : String(e))).join(', ');

/** Throws unless `shown` contains every string of `expected` and matches every regular expression. */
export function assertShows(what: string, shown: string, expected: Expected): void {
  const missing = missingFrom(shown, expected);
  if (missing.length === 0) return;
  throw new AssertionError({
    message: `${what}\nexpected: ${describeExpected(expected)}\nmissing: ${missing.join(', ')}\nshown:\n${shown.replace(/^/gm, '  | ')}`,
    actual: shown,
    expected,
    operator: 'shows',
  });
}
