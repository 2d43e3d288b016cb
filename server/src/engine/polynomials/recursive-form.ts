/**
 * Converting sparse polynomials to the recursive dense form the gcd works on,
 * and back. For a variable order (v_0, …, v_{m−1}) the recursive form is a
 * dense list over v_0 whose entries are recursive forms over (v_1, …), down
 * to base coefficients after the last variable.
 */
import type { Exponents } from './monomial-order.js';

/** A term with a coefficient of any type (a field element, or an integer for the rational case). */
export interface LooseTerm<C> {
  exponents: Exponents;
  coefficient: C;
}

/** The nested dense form of the terms for the variables in `order` (all other exponents must be 0). */
export function toRecursive<C>(terms: readonly LooseTerm<C>[], order: readonly number[], baseZero: C): unknown {
  const build = (group: readonly LooseTerm<C>[], level: number): unknown => {
    if (level === order.length) return group.length === 0 ? baseZero : group[0]!.coefficient;
    const v = order[level]!;
    let top = -1;
    for (const t of group) top = Math.max(top, t.exponents[v]!);
    const buckets: LooseTerm<C>[][] = Array.from({ length: top + 1 }, () => []);
    for (const t of group) buckets[t.exponents[v]!]!.push(t);
    // A missing power gets the zero of the next level: [] for a polynomial level, baseZero at the bottom.
    return buckets.map((b) => (b.length === 0 ? (level + 1 === order.length ? baseZero : []) : build(b, level + 1)));
  };
  return build(terms, 0);
}

/** The terms of a nested dense form, for a ring with `nvars` variables; `isZero` tells zero base coefficients. */
export function fromRecursive<C>(
  nested: unknown,
  order: readonly number[],
  nvars: number,
  isZero: (c: C) => boolean,
): LooseTerm<C>[] {
  const out: LooseTerm<C>[] = [];
  const exponents = new Array<number>(nvars).fill(0);
  const walk = (node: unknown, level: number) => {
    if (level === order.length) {
      if (!isZero(node as C)) out.push({ exponents: exponents.slice(), coefficient: node as C });
      return;
    }
    const v = order[level]!;
    (node as unknown[]).forEach((child, e) => {
      exponents[v] = e;
      walk(child, level + 1);
    });
    exponents[v] = 0;
  };
  walk(nested, 0);
  return out;
}
