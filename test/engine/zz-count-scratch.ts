import fc from 'fast-check';
import { decompose, add, pluckerMultivector, fromTerms } from '/work/main/server/src/engine/index.js';
import { EXTERIOR_CASES, matrixOf, termList } from '/work/main/test/engine/exterior-arbitraries.js';
for (const c of EXTERIOR_CASES) {
  const counts: Record<string, number> = {};
  const samples = fc.sample(fc.integer({ min: 3, max: 6 }).chain((n) => fc.integer({ min: 2, max: n - 1 }).chain((k) => fc.tuple(fc.constant(n), fc.constant(k), matrixOf(c.element, k, n), matrixOf(c.element, k, n), termList(c, n, k, 4), fc.integer({ min: 0, max: 2 })))), 200);
  for (const [n, k, a, b, terms, choice] of samples) {
    const F = c.F;
    const omega = choice === 0 ? pluckerMultivector(F, a, n) : choice === 1 ? add(F, pluckerMultivector(F, a, n), pluckerMultivector(F, b, n)) : fromTerms(F, n, k, terms);
    const key = choice + ':' + decompose(F, omega).kind;
    counts[key] = (counts[key] ?? 0) + 1;
  }
  console.log(c.F.name, JSON.stringify(counts));
}
