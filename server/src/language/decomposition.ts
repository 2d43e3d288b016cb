/**
 * Decomposability of a multivector value, computed once and cached on the
 * value, and the words for its witness.
 */
import { decompose, type Decomposition, type FailedRelation } from '../engine/decompose.js';
import type { Environment } from './environment.js';
import type { MultivectorValue, Scalar } from './values.js';

export function decompositionOf(env: Environment, v: MultivectorValue): Decomposition<Scalar> {
  v.decomposition ??= decompose(env.F, v.mv);
  return v.decomposition;
}

/** `p12·p34 - p13·p24 + p14·p23` */
export function relationFormula(env: Environment, relation: FailedRelation<Scalar>, n: number): string {
  return relation.terms
    .map((t, i) => {
      const product = `${env.labels.name(t.first, n)}·${env.labels.name(t.second, n)}`;
      if (i === 0) return t.sign < 0 ? `-${product}` : product;
      return `${t.sign < 0 ? '-' : '+'} ${product}`;
    })
    .join(' ');
}

/** The relation with its values substituted: `1·1 - 0·0 + 0·0 = 1`. */
export function relationValues(env: Environment, relation: FailedRelation<Scalar>): string {
  const F = env.F;
  const products = relation.terms
    .map((t, i) => {
      const product = `${paren(F.format(t.firstValue))}·${paren(F.format(t.secondValue))}`;
      if (i === 0) return t.sign < 0 ? `-${product}` : product;
      return `${t.sign < 0 ? '-' : '+'} ${product}`;
    })
    .join(' ');
  return `${products} = ${F.format(relation.value)}`;
}

function paren(s: string): string {
  return s.startsWith('-') || s.includes('/') ? `(${s})` : s;
}

/** A full sentence: which relation fails and by how much. */
export function describeRelation(env: Environment, relation: FailedRelation<Scalar>, n: number): string {
  return (
    `the quadratic Plücker relation ${relationFormula(env, relation, n)} = 0 fails: ` +
    `${relationValues(env, relation)} ≠ 0`
  );
}

/** The relation and its value in LaTeX. */
export function relationLatex(env: Environment, relation: FailedRelation<Scalar>, n: number): string {
  const F = env.F;
  const formula = relation.terms
    .map((t, i) => {
      const product = `${env.labels.latex(t.first, n)}\\,${env.labels.latex(t.second, n)}`;
      if (i === 0) return t.sign < 0 ? `-${product}` : product;
      return `${t.sign < 0 ? '-' : '+'} ${product}`;
    })
    .join(' ');
  return `${formula} = ${F.latex(relation.value)} \\neq 0`;
}
