/**
 * The engine's public API: exact scalars, linear algebra, exterior algebra and
 * Grassmannians. The language layer and the command line import from here.
 */
export * from './field.js';
export * from './rational.js';
export * from './primes.js';
export * from './prime-field.js';
export * from './fields.js';
export * from './matrix.js';
export * from './subsets.js';
export * from './multivector.js';
export * from './plucker.js';
export * from './normalize.js';
export * from './decompose.js';
export * from './chart.js';
export * from './grassmannian.js';
export * from './duality.js';
export * from './linear-map.js';
export * from './flags.js';
export * from './schubert.js';
export * from './matroid.js';
export * from './positivity.js';
export * from './lines-p3.js';
export * from './integer-factors.js';
export * from './polynomial-mod-p.js';
export * from './extension-field.js';
export * from './finite-fields.js';
export * from './subspace-codes.js';
export * from './polynomials/index.js';
export * from './partitions.js';
export * from './littlewood-richardson.js';
export * from './schubert-calculus.js';
export * from './field-square-roots.js';
export * from './binary-quadratic.js';
export * from './four-line-transversals.js';
