/**
 * Sparse polynomials in finitely many named variables over any `Field`.
 *
 * A polynomial is a list of terms sorted by `compareMonomials` (graded
 * reverse lexicographic order, largest first), with no zero coefficient and
 * no two terms of the same monomial. Because that form is unique, two
 * polynomials are equal exactly when their term lists agree, and the first
 * term is the leading term. Polynomials are immutable values; a
 * `PolynomialRing` fixes the field and the variables and does the arithmetic.
 */
import { DivisionByZeroError, type Field } from '../field.js';
import {
  compareMonomials,
  divideMonomials,
  monomialKey,
  multiplyMonomials,
  totalDegreeOf,
  type Exponents,
} from './monomial-order.js';
import { polynomialLatex, polynomialText } from './polynomial-format.js';

export interface PolynomialTerm<T> {
  /** One exponent per variable of the ring. */
  readonly exponents: Exponents;
  /** Never zero. */
  readonly coefficient: T;
}

export interface MultivariatePolynomial<T> {
  /** Sorted by the monomial order, largest first. */
  readonly terms: readonly PolynomialTerm<T>[];
}

/** Values for some of the variables, by name. */
export type VariableAssignment<T> = Readonly<Record<string, T>>;

/** Raised when a polynomial division that must be exact leaves a remainder. */
export class InexactDivisionError extends Error {
  constructor(what = 'the polynomial division is not exact') {
    super(what);
    this.name = 'InexactDivisionError';
  }
}

const VARIABLE_NAME = /^[\p{L}_][\p{L}\p{N}_']*$/u;

/** The polynomials over `field` in `variables`; see the module comment for the representation. */
export class PolynomialRing<T> {
  readonly field: Field<T>;
  readonly variables: readonly string[];
  readonly zero: MultivariatePolynomial<T>;
  readonly one: MultivariatePolynomial<T>;
  private readonly zeroExponents: readonly number[];
  private readonly indexOf: ReadonlyMap<string, number>;

  constructor(field: Field<T>, variables: readonly string[]) {
    const seen = new Map<string, number>();
    variables.forEach((v, i) => {
      if (!VARIABLE_NAME.test(v)) throw new Error(`"${v}" is not a valid variable name`);
      if (seen.has(v)) throw new Error(`the variable ${v} is listed twice`);
      seen.set(v, i);
    });
    this.field = field;
    this.variables = Object.freeze(variables.slice());
    this.indexOf = seen;
    this.zeroExponents = Object.freeze(new Array<number>(variables.length).fill(0));
    this.zero = Object.freeze({ terms: Object.freeze([]) });
    this.one = this.constant(field.one);
  }

  /** The position of a variable, or a RangeError naming it. */
  variableIndex(name: string): number {
    const i = this.indexOf.get(name);
    if (i === undefined) throw new RangeError(`${name} is not a variable of this ring (${this.variables.join(', ')})`);
    return i;
  }

  /** The variable with the given name or position, as a polynomial. */
  variable(which: string | number): MultivariatePolynomial<T> {
    const i = typeof which === 'number' ? which : this.variableIndex(which);
    if (!Number.isInteger(i) || i < 0 || i >= this.variables.length) throw new RangeError(`no variable number ${i}`);
    const exponents = this.zeroExponents.slice();
    exponents[i] = 1;
    return { terms: [{ exponents, coefficient: this.field.one }] };
  }

  constant(c: T): MultivariatePolynomial<T> {
    return this.field.isZero(c) ? this.zero : { terms: [{ exponents: this.zeroExponents, coefficient: c }] };
  }

  /** c·x^exponents. */
  monomial(exponents: Exponents, c: T = this.field.one): MultivariatePolynomial<T> {
    this.checkExponents(exponents);
    return this.field.isZero(c) ? this.zero : { terms: [{ exponents: exponents.slice(), coefficient: c }] };
  }

  /** The polynomial with the given terms in any order; like monomials are added and zeros dropped. */
  fromTerms(terms: Iterable<{ exponents: Exponents; coefficient: T }>): MultivariatePolynomial<T> {
    const F = this.field;
    const sums = new Map<string, { exponents: Exponents; coefficient: T }>();
    for (const t of terms) {
      this.checkExponents(t.exponents);
      const key = monomialKey(t.exponents);
      const known = sums.get(key);
      if (known === undefined) sums.set(key, { exponents: t.exponents.slice(), coefficient: t.coefficient });
      else known.coefficient = F.add(known.coefficient, t.coefficient);
    }
    const out: PolynomialTerm<T>[] = [];
    for (const t of sums.values()) if (!F.isZero(t.coefficient)) out.push(t);
    out.sort((a, b) => compareMonomials(b.exponents, a.exponents));
    return { terms: out };
  }

  /** The polynomial Σ c_i x^i in the variable `which`, constant term first. */
  fromCoefficients(coefficients: readonly T[], which: string | number = 0): MultivariatePolynomial<T> {
    const v = typeof which === 'number' ? which : this.variableIndex(which);
    return this.fromTerms(
      coefficients.map((coefficient, i) => {
        const exponents = this.zeroExponents.slice();
        exponents[v] = i;
        return { exponents, coefficient };
      }),
    );
  }

  isZero(a: MultivariatePolynomial<T>): boolean {
    return a.terms.length === 0;
  }

  isOne(a: MultivariatePolynomial<T>): boolean {
    return a.terms.length === 1 && totalDegreeOf(a.terms[0]!.exponents) === 0 && this.field.isOne(a.terms[0]!.coefficient);
  }

  /** Whether a is a constant (zero included). */
  isConstant(a: MultivariatePolynomial<T>): boolean {
    return a.terms.length === 0 || (a.terms.length === 1 && totalDegreeOf(a.terms[0]!.exponents) === 0);
  }

  /** The value of a constant polynomial, or undefined when a involves a variable. */
  constantValue(a: MultivariatePolynomial<T>): T | undefined {
    if (a.terms.length === 0) return this.field.zero;
    return this.isConstant(a) ? a.terms[0]!.coefficient : undefined;
  }

  /** Whether a is c·x^e for one monomial (zero is not). */
  isMonomial(a: MultivariatePolynomial<T>): boolean {
    return a.terms.length === 1;
  }

  eq(a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): boolean {
    if (a === b) return true;
    if (a.terms.length !== b.terms.length) return false;
    const F = this.field;
    for (let i = 0; i < a.terms.length; i++) {
      const x = a.terms[i]!;
      const y = b.terms[i]!;
      if (compareMonomials(x.exponents, y.exponents) !== 0 || !F.eq(x.coefficient, y.coefficient)) return false;
    }
    return true;
  }

  add(a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): MultivariatePolynomial<T> {
    if (a.terms.length === 0) return b;
    if (b.terms.length === 0) return a;
    return this.mergeScaled(a, b, this.field.one, this.zeroExponents);
  }

  sub(a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): MultivariatePolynomial<T> {
    if (b.terms.length === 0) return a;
    return this.mergeScaled(a, b, this.field.neg(this.field.one), this.zeroExponents);
  }

  neg(a: MultivariatePolynomial<T>): MultivariatePolynomial<T> {
    const F = this.field;
    return { terms: a.terms.map((t) => ({ exponents: t.exponents, coefficient: F.neg(t.coefficient) })) };
  }

  /** c·a for a field element c. */
  scale(a: MultivariatePolynomial<T>, c: T): MultivariatePolynomial<T> {
    const F = this.field;
    if (F.isZero(c)) return this.zero;
    if (F.isOne(c)) return a;
    return { terms: a.terms.map((t) => ({ exponents: t.exponents, coefficient: F.mul(c, t.coefficient) })) };
  }

  /** a·x^e·c, still sorted because the monomial order is preserved by multiplying by a monomial. */
  shift(a: MultivariatePolynomial<T>, e: Exponents, c: T = this.field.one): MultivariatePolynomial<T> {
    const F = this.field;
    if (F.isZero(c)) return this.zero;
    return {
      terms: a.terms.map((t) => ({ exponents: multiplyMonomials(t.exponents, e), coefficient: F.mul(c, t.coefficient) })),
    };
  }

  mul(a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): MultivariatePolynomial<T> {
    if (a.terms.length === 0 || b.terms.length === 0) return this.zero;
    if (a.terms.length === 1) return this.shift(b, a.terms[0]!.exponents, a.terms[0]!.coefficient);
    if (b.terms.length === 1) return this.shift(a, b.terms[0]!.exponents, b.terms[0]!.coefficient);
    const F = this.field;
    const sums = new Map<string, { exponents: number[]; coefficient: T }>();
    for (const x of a.terms) {
      for (const y of b.terms) {
        const exponents = multiplyMonomials(x.exponents, y.exponents);
        const key = monomialKey(exponents);
        const product = F.mul(x.coefficient, y.coefficient);
        const known = sums.get(key);
        if (known === undefined) sums.set(key, { exponents, coefficient: product });
        else known.coefficient = F.add(known.coefficient, product);
      }
    }
    const out: PolynomialTerm<T>[] = [];
    for (const t of sums.values()) if (!F.isZero(t.coefficient)) out.push(t);
    out.sort((p, q) => compareMonomials(q.exponents, p.exponents));
    return { terms: out };
  }

  /** a^n for an integer n ≥ 0, by repeated squaring. */
  pow(a: MultivariatePolynomial<T>, n: number): MultivariatePolynomial<T> {
    if (!Number.isInteger(n) || n < 0) throw new RangeError(`pow: the exponent must be an integer ≥ 0, got ${n}`);
    let result = this.one;
    let base = a;
    for (let e = n; e > 0; e = Math.floor(e / 2)) {
      if (e % 2 === 1) result = this.mul(result, base);
      if (e > 1) base = this.mul(base, base);
    }
    return result;
  }

  /** The first term in the monomial order; undefined for zero. */
  leadingTerm(a: MultivariatePolynomial<T>): PolynomialTerm<T> | undefined {
    return a.terms[0];
  }

  /** The coefficient of the leading term; zero for the zero polynomial. */
  leadingCoefficient(a: MultivariatePolynomial<T>): T {
    return a.terms[0]?.coefficient ?? this.field.zero;
  }

  /** The coefficient of one monomial (zero when absent). */
  coefficientOf(a: MultivariatePolynomial<T>, exponents: Exponents): T {
    for (const t of a.terms) if (compareMonomials(t.exponents, exponents) === 0) return t.coefficient;
    return this.field.zero;
  }

  /** The total degree; −1 for the zero polynomial. */
  totalDegree(a: MultivariatePolynomial<T>): number {
    // The order is graded, so the leading term has the largest total degree.
    return a.terms.length === 0 ? -1 : totalDegreeOf(a.terms[0]!.exponents);
  }

  /** The degree in one variable; −1 for the zero polynomial. */
  degreeIn(a: MultivariatePolynomial<T>, which: string | number): number {
    const v = typeof which === 'number' ? which : this.variableIndex(which);
    let d = -1;
    for (const t of a.terms) d = Math.max(d, t.exponents[v]!);
    return d;
  }

  /** The positions of the variables that occur in a, ascending. */
  variablesIn(a: MultivariatePolynomial<T>): number[] {
    const used: number[] = [];
    for (let v = 0; v < this.variables.length; v++) if (a.terms.some((t) => t.exponents[v]! > 0)) used.push(v);
    return used;
  }

  /** The polynomial divided by c ≠ 0 so that its leading coefficient is 1 (zero stays zero). */
  monic(a: MultivariatePolynomial<T>): MultivariatePolynomial<T> {
    if (a.terms.length === 0 || this.field.isOne(a.terms[0]!.coefficient)) return a;
    return this.scale(a, this.field.inv(a.terms[0]!.coefficient));
  }

  /**
   * q with a = q·b, or undefined when b does not divide a. If b divides a then
   * the leading term of b divides the leading term of every a − m·b along the
   * way (each is again a multiple of b), so stopping at the first one it does
   * not divide is a proof that the division is not exact.
   */
  tryDivide(a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): MultivariatePolynomial<T> | undefined {
    if (b.terms.length === 0) throw new DivisionByZeroError('division of a polynomial by the zero polynomial');
    const F = this.field;
    const lead = b.terms[0]!;
    if (b.terms.length === 1) {
      const terms: PolynomialTerm<T>[] = [];
      const inverse = F.inv(lead.coefficient);
      for (const t of a.terms) {
        const e = divideMonomials(t.exponents, lead.exponents);
        if (e === undefined) return undefined;
        terms.push({ exponents: e, coefficient: F.mul(t.coefficient, inverse) });
      }
      return { terms };
    }
    const inverse = F.inv(lead.coefficient);
    const quotient: PolynomialTerm<T>[] = [];
    let rest = a;
    while (rest.terms.length > 0) {
      const top = rest.terms[0]!;
      const e = divideMonomials(top.exponents, lead.exponents);
      if (e === undefined) return undefined;
      const c = F.mul(top.coefficient, inverse);
      quotient.push({ exponents: e, coefficient: c });
      rest = this.mergeScaled(rest, b, F.neg(c), e);
    }
    // Each quotient term is smaller than the one before, so the list is already sorted.
    return { terms: quotient };
  }

  /** a / b, throwing `InexactDivisionError` when b does not divide a. */
  divideExact(a: MultivariatePolynomial<T>, b: MultivariatePolynomial<T>): MultivariatePolynomial<T> {
    const q = this.tryDivide(a, b);
    if (q === undefined) throw new InexactDivisionError(`${this.format(b)} does not divide ${this.format(a)}`);
    return q;
  }

  /** The partial derivative with respect to one variable. */
  derivative(a: MultivariatePolynomial<T>, which: string | number): MultivariatePolynomial<T> {
    const v = typeof which === 'number' ? which : this.variableIndex(which);
    const F = this.field;
    const terms: PolynomialTerm<T>[] = [];
    for (const t of a.terms) {
      const e = t.exponents[v]!;
      if (e === 0) continue;
      const c = F.mul(F.fromBigInt(BigInt(e)), t.coefficient);
      if (F.isZero(c)) continue;
      const exponents = t.exponents.slice();
      exponents[v] = e - 1;
      terms.push({ exponents, coefficient: c });
    }
    // Lowering one exponent can reorder terms (and never merges two), so sort again.
    terms.sort((p, q) => compareMonomials(q.exponents, p.exponents));
    return { terms };
  }

  /**
   * The value at a point: `values` lists one field element per variable, or
   * names every variable that occurs in a.
   */
  evaluate(a: MultivariatePolynomial<T>, values: readonly T[] | VariableAssignment<T>): T {
    const point = this.pointOf(values);
    for (const v of this.variablesIn(a)) {
      if (point[v] === undefined) throw new RangeError(`no value was given for the variable ${this.variables[v]}`);
    }
    const F = this.field;
    let sum = F.zero;
    const powers = this.powerTables(a, point);
    for (const t of a.terms) {
      let product = t.coefficient;
      t.exponents.forEach((e, v) => {
        if (e > 0) product = F.mul(product, powers[v]![e]!);
      });
      sum = F.add(sum, product);
    }
    return sum;
  }

  /**
   * The polynomial with the named variables replaced by values: the member of
   * the family at those parameter values. The result lies in the same ring and
   * no longer involves the substituted variables.
   */
  substitute(a: MultivariatePolynomial<T>, values: VariableAssignment<T>): MultivariatePolynomial<T> {
    const point = this.pointOf(values);
    const F = this.field;
    const powers = this.powerTables(a, point);
    return this.fromTerms(
      a.terms.map((t) => {
        let c = t.coefficient;
        const exponents = t.exponents.slice();
        exponents.forEach((e, v) => {
          if (e > 0 && point[v] !== undefined) {
            c = F.mul(c, powers[v]![e]!);
            exponents[v] = 0;
          }
        });
        return { exponents, coefficient: c };
      }),
    );
  }

  /** The polynomial with the named variables replaced by polynomials of this ring. */
  compose(a: MultivariatePolynomial<T>, images: Readonly<Record<string, MultivariatePolynomial<T>>>): MultivariatePolynomial<T> {
    const replaced = new Map<number, MultivariatePolynomial<T>>();
    for (const [name, image] of Object.entries(images)) replaced.set(this.variableIndex(name), image);
    const powerCache = new Map<string, MultivariatePolynomial<T>>();
    const powerOf = (v: number, e: number) => {
      const key = `${v}^${e}`;
      let known = powerCache.get(key);
      if (known === undefined) powerCache.set(key, (known = this.pow(replaced.get(v)!, e)));
      return known;
    };
    let sum = this.zero;
    for (const t of a.terms) {
      const kept = t.exponents.map((e, v) => (replaced.has(v) ? 0 : e));
      let product = this.monomial(kept, t.coefficient);
      t.exponents.forEach((e, v) => {
        if (e > 0 && replaced.has(v)) product = this.mul(product, powerOf(v, e));
      });
      sum = this.add(sum, product);
    }
    return sum;
  }

  /** The same polynomial over another field, each coefficient mapped by `image` (zeros are dropped). */
  mapCoefficients<S>(target: PolynomialRing<S>, a: MultivariatePolynomial<T>, image: (c: T) => S): MultivariatePolynomial<S> {
    if (target.variables.length !== this.variables.length) throw new RangeError('mapCoefficients: the rings have different variables');
    const terms = a.terms.map((t) => ({ exponents: t.exponents, coefficient: image(t.coefficient) }));
    // A map into a field of positive characteristic can send a coefficient to zero, which must not stay as a term.
    return { terms: terms.filter((t) => !target.field.isZero(t.coefficient)) };
  }

  /** Text such as `t^2 - 3t + 2` or `s^2 t + 1/2 s`. */
  format(a: MultivariatePolynomial<T>): string {
    return polynomialText(this.field, this.variables, a);
  }

  /** LaTeX such as `t^{2} - 3t + 2`. */
  latex(a: MultivariatePolynomial<T>): string {
    return polynomialLatex(this.field, this.variables, a);
  }

  /** a + c·x^e·b, merging the two sorted term lists. */
  private mergeScaled(
    a: MultivariatePolynomial<T>,
    b: MultivariatePolynomial<T>,
    c: T,
    e: Exponents,
  ): MultivariatePolynomial<T> {
    const F = this.field;
    const shifted = totalDegreeOf(e) === 0;
    const out: PolynomialTerm<T>[] = [];
    let i = 0;
    let j = 0;
    const x = a.terms;
    const y = b.terms;
    while (i < x.length || j < y.length) {
      const ye = j < y.length ? (shifted ? y[j]!.exponents : multiplyMonomials(y[j]!.exponents, e)) : undefined;
      const order = ye === undefined ? 1 : i >= x.length ? -1 : compareMonomials(x[i]!.exponents, ye);
      if (order > 0) {
        out.push(x[i++]!);
      } else if (order < 0) {
        const coefficient = F.isOne(c) ? y[j]!.coefficient : F.mul(c, y[j]!.coefficient);
        if (!F.isZero(coefficient)) out.push({ exponents: ye!, coefficient });
        j++;
      } else {
        const coefficient = F.add(x[i]!.coefficient, F.mul(c, y[j]!.coefficient));
        if (!F.isZero(coefficient)) out.push({ exponents: x[i]!.exponents, coefficient });
        i++;
        j++;
      }
    }
    return { terms: out };
  }

  private checkExponents(e: Exponents): void {
    if (e.length !== this.variables.length || !e.every((x) => Number.isInteger(x) && x >= 0)) {
      throw new RangeError(`expected ${this.variables.length} nonnegative integer exponents, got [${e.join(', ')}]`);
    }
  }

  /** One value (or undefined) per variable, from a list or by name. */
  private pointOf(values: readonly T[] | VariableAssignment<T>): (T | undefined)[] {
    if (Array.isArray(values)) {
      if (values.length !== this.variables.length) {
        throw new RangeError(`expected ${this.variables.length} values, one per variable, got ${values.length}`);
      }
      return values.slice();
    }
    const point = new Array<T | undefined>(this.variables.length).fill(undefined);
    for (const [name, value] of Object.entries(values as VariableAssignment<T>)) point[this.variableIndex(name)] = value;
    return point;
  }

  /** powers[v][e] = value_v^e for every exponent e of variable v that occurs in a (v with a value). */
  private powerTables(a: MultivariatePolynomial<T>, point: readonly (T | undefined)[]): T[][] {
    const F = this.field;
    return point.map((value, v) => {
      const top = value === undefined ? 0 : this.degreeIn(a, v);
      const table: T[] = [F.one];
      for (let e = 1; e <= top; e++) table.push(F.mul(table[e - 1]!, value as T));
      return table;
    });
  }
}

/** The ring of polynomials over `field` in the given variables (names distinct, identifiers). */
export function polynomialRing<T>(field: Field<T>, variables: readonly string[]): PolynomialRing<T> {
  return new PolynomialRing(field, variables);
}
