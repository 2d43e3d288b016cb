/**
 * LaTeX forms of values, for "copy as LaTeX". Only the amsmath environments
 * (`pmatrix`, `array`) and core commands are used, so the output compiles in
 * any standard document.
 */
import type { AnyField } from '../engine/fields.js';
import { sortedTerms, type Multivector } from '../engine/multivector.js';
import type { Scalar } from './values.js';

const GREEK = new Set([
  'alpha', 'beta', 'gamma', 'delta', 'epsilon', 'zeta', 'eta', 'theta', 'iota', 'kappa', 'lambda', 'mu', 'nu',
  'xi', 'pi', 'rho', 'sigma', 'tau', 'upsilon', 'phi', 'chi', 'psi', 'omega',
  'Gamma', 'Delta', 'Theta', 'Lambda', 'Xi', 'Pi', 'Sigma', 'Upsilon', 'Phi', 'Psi', 'Omega',
]);

export const GREEK_LETTERS: Record<string, string> = {
  α: 'alpha', β: 'beta', γ: 'gamma', δ: 'delta', ε: 'epsilon', ζ: 'zeta', η: 'eta', θ: 'theta', ι: 'iota',
  κ: 'kappa', λ: 'lambda', μ: 'mu', ν: 'nu', ξ: 'xi', π: 'pi', ρ: 'rho', σ: 'sigma', τ: 'tau', υ: 'upsilon',
  φ: 'phi', χ: 'chi', ψ: 'psi', ω: 'omega', Γ: 'Gamma', Δ: 'Delta', Θ: 'Theta', Λ: 'Lambda', Ξ: 'Xi', Π: 'Pi',
  Σ: 'Sigma', Φ: 'Phi', Ψ: 'Psi', Ω: 'Omega',
};

/**
 * A name from the file in math mode: `eta` → `\eta`, `e1` → `e_{1}`,
 * `p'` → `p'`, `L_2` → `L_{2}`, longer words upright.
 */
export function nameLatex(name: string): string {
  const m = /^(.*?)_?(\d+)('*)$/u.exec(name);
  if (m && m[1]) return `${nameLatex(m[1])}_{${m[2]}}${m[3]}`;
  const prime = /^(.*?)('+)$/u.exec(name);
  if (prime && prime[1]) return `${nameLatex(prime[1])}${prime[2]}`;
  if (GREEK.has(name)) return `\\${name}`;
  const greek = GREEK_LETTERS[name];
  if (greek) return `\\${greek}`;
  if ([...name].length === 1) return name;
  return `\\mathrm{${name.replace(/_/g, '\\_')}}`;
}

export function scalarLatex(F: AnyField, s: Scalar): string {
  return F.latex(s);
}

export function matrixLatex(F: AnyField, rows: readonly (readonly Scalar[])[]): string {
  const body = rows.map((r) => r.map((x) => F.latex(x)).join(' & ')).join(' \\\\ ');
  return `\\begin{pmatrix} ${body} \\end{pmatrix}`;
}

/** A matrix with a vertical rule before column `split` (0-based), e.g. [I | Y]. */
export function blockMatrixLatex(F: AnyField, rows: readonly (readonly Scalar[])[], split: number): string {
  const ncols = rows[0]?.length ?? 0;
  const spec = `${'c'.repeat(split)}|${'c'.repeat(ncols - split)}`;
  const body = rows.map((r) => r.map((x) => F.latex(x)).join(' & ')).join(' \\\\ ');
  return `\\left(\\begin{array}{${spec}} ${body} \\end{array}\\right)`;
}

export function pointLatex(F: AnyField, values: readonly Scalar[]): string {
  return `\\bigl[${values.map((x) => F.latex(x)).join(' : ')}\\bigr]`;
}

/** Σ c_i·name_i in LaTeX, names already in LaTeX. */
export function combinationLatex(F: AnyField, coefficients: readonly Scalar[], names: readonly string[]): string {
  const parts: string[] = [];
  coefficients.forEach((c, i) => {
    if (F.isZero(c)) return;
    const text = F.latex(c);
    const negative = text.startsWith('-');
    const magnitude = negative ? text.slice(1) : text;
    const coeff = magnitude === '1' && names[i] !== '1' ? '' : `${magnitude}\\,`;
    const name = names[i] === '1' ? '' : names[i];
    const term = `${coeff}${name}`.replace(/\\,$/, '');
    parts.push(parts.length === 0 ? `${negative ? '-' : ''}${term}` : `${negative ? '-' : '+'} ${term}`);
  });
  return parts.length ? parts.join(' ') : '0';
}

export function multivectorLatex(F: AnyField, mv: Multivector<Scalar>, basisNames: readonly string[]): string {
  const terms = sortedTerms(mv);
  return combinationLatex(
    F,
    terms.map((t) => t.coeff),
    terms.map((t) => (t.subset.length === 0 ? '1' : t.subset.map((i) => nameLatex(basisNames[i]!)).join(' \\wedge '))),
  );
}
