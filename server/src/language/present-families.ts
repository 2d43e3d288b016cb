/**
 * Presentation of what families add: the degeneracy locus of a basis depending on parameters.
 */
import { conventionSentence } from './conventions.js';
import type { Environment } from './environment.js';
import type { Presented } from './present.js';
import type { DegeneracyValue } from './values.js';

export function presentDegeneracy(env: Environment, d: DegeneracyValue): Presented {
  const B = (env.F as unknown as { family: { base: { format(x: unknown): string; latex(x: unknown): string } } }).family.base;
  const k = (d.subspace.given ?? d.subspace.basis).length;
  const name = d.variables.join(', ');
  const roots = d.roots.map((r) => `${d.variables[0]} = ${B.format(r.value)}${r.multiplicity > 1 ? ` (multiplicity ${r.multiplicity})` : ''}`);
  const lines = [
    `Where the ${k} basis vectors of this family stop being independent: the common zeros of its maximal minors, ` +
      `whose greatest common divisor is`,
    '',
    '```text',
    d.text,
    '```',
  ];
  let summary: string;
  if (d.text === '0') {
    summary = `the basis has rank below ${k} for every value of ${name}`;
    lines.push('', `Every maximal minor vanishes identically: the ${k} vectors are dependent for all values of ${name}.`);
  } else if (d.text === '1') {
    summary = `never: the basis has rank ${k} for every value of ${name}`;
    lines.push('', `The minors have no common factor: the rank is ${k} for every value of ${name}${d.variables.length > 1 ? ' outside a set of codimension at least 2' : ''}.`);
  } else if (d.variables.length === 1) {
    summary = roots.length > 0 ? `rank drops at ${roots.join(', ')} · gcd ${d.text}` : `gcd ${d.text}, with no zero in the field`;
    lines.push(
      '',
      roots.length > 0
        ? `The rank drops exactly at ${roots.join(', ')}${d.roots.reduce((a, r) => a + r.multiplicity, 0) < d.degree ? ', and at the zeros of the other factors outside the field' : ''}.`
        : 'The gcd has no zero in the field: the rank drops only at values outside it.',
    );
  } else {
    summary = `rank drops where ${d.text} = 0`;
    lines.push('', `The rank drops on the hypersurface ${d.text} = 0 (and possibly on smaller sets where every minor vanishes).`);
  }
  lines.push('', conventionSentence(env.convention));
  return {
    summary,
    hover: lines.join('\n'),
    latex: `\\gcd(\\text{maximal minors}) = ${d.latex}`,
    json: {
      gcd: d.text,
      parameters: [...d.variables],
      roots: d.roots.map((r) => ({ value: B.format(r.value), multiplicity: r.multiplicity })),
    },
  };
}
