/**
 * Polynomials and rational functions in declared parameters: the public part
 * of the engine's polynomial algebra. Internal helpers (dense forms, Hensel
 * lifting, gcd domains) stay private to this folder.
 */
export { compareMonomials, type Exponents } from './monomial-order.js';
export {
  InexactDivisionError,
  PolynomialRing,
  polynomialRing,
  type MultivariatePolynomial,
  type PolynomialTerm,
  type VariableAssignment,
} from './multivariate-polynomial.js';
export { variableLatex } from './variable-latex.js';
export { coefficientsIn, contentIn, gcdPolynomials, lcmPolynomials, monomialContent } from './polynomial-gcd.js';
export { rationalFunctionField, type RationalFunction, type RationalFunctionField } from './rational-function-field.js';
export {
  compareFactorPolynomials,
  expandFactored,
  formatFactored,
  formatFactoredQuotient,
  latexFactored,
  latexFactoredQuotient,
  normalizeFactor,
  type FactoredPolynomial,
  type FactoredQuotient,
  type PolynomialFactor,
} from './factored-form.js';
export { factorPolynomial, factorRationalFunction, rationalRoots, type FactorOptions } from './polynomial-factor.js';
export { DEFAULT_KRONECKER_LIMITS, type KroneckerLimits } from './kronecker-factor.js';
export {
  factorRationalUnivariate,
  rationalRootsOf,
  type IntegerFactor,
  type RationalRoot,
  type RationalUnivariateFactorisation,
} from './rational-univariate-factor.js';
export { factorOverFiniteField, finiteFieldSize, type DenseFactor } from './finite-field-factor.js';
export { countRealRoots, countRealRootsBetween, countRealRootsWithMultiplicity, sturmSequence } from './sturm.js';
export { univariateCoefficients } from './univariate-view.js';
export { polynomialRepresentative, type PolynomialPoint } from './projective-polynomials.js';
