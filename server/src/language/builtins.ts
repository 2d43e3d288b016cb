/** The built-in operations, with the signatures shown in messages (and later in completion). */
export interface Builtin {
  name: string;
  signature: string;
  summary: string;
}

export const BUILTINS: readonly Builtin[] = [
  { name: 'span', signature: 'span(v1, v2, …)', summary: 'the subspace spanned by vectors; a dependent list is an error' },
  { name: 'plucker', signature: 'plucker(W)', summary: 'the Plücker vector of a subspace, as a multivector' },
  { name: 'chart', signature: 'chart(W, I)', summary: 'the affine chart coordinates of W where p_I ≠ 0' },
  { name: 'recover', signature: 'recover(ω)', summary: 'the subspace a decomposable multivector comes from' },
  { name: 'annihilator', signature: 'annihilator(W)', summary: 'the functionals vanishing on W, a subspace of the dual space' },
  { name: 'complement', signature: 'complement(ω)', summary: 'the complement ⋆ω of a multivector (sign rule in the hover)' },
  { name: 'quotient', signature: 'quotient(V, W)', summary: 'the quotient space V/W: its dimension and basis representatives' },
  { name: 'kernel', signature: 'kernel(f)', summary: 'the kernel of a map' },
  { name: 'image', signature: 'image(f)', summary: 'the image of a map' },
  { name: 'preimage', signature: 'preimage(f, W)', summary: 'the vectors a map sends into W' },
  { name: 'compound', signature: 'compound(f, k)', summary: 'the k-th compound matrix: the induced map on the k-th exterior power' },
  { name: 'coordinates', signature: 'coordinates(v, u1, …, un)', summary: 'the coordinates of v in the basis u1 … un' },
  { name: 'standard', signature: 'standard(V)', summary: 'the standard flag e1 ⊂ span(e1, e2) ⊂ …' },
  { name: 'opposite', signature: 'opposite(V)', summary: 'the opposite flag en ⊂ span(en, en−1) ⊂ …' },
  { name: 'matroid', signature: 'matroid(W)', summary: 'the matroid of the columns: bases, loops, coloops (over the file\'s field)' },
  { name: 'rank', signature: 'rank(W, I)', summary: 'the rank of the columns I of a basis of W' },
  { name: 'positivity', signature: 'positivity(W)', summary: 'the sign pattern of the Plücker vector; totally nonnegative or positive' },
  { name: 'shift', signature: 'shift(W)', summary: 'the cyclic shift of columns with the twist (−1)^(k−1) on the wrapped column' },
  { name: 'pairing', signature: 'pairing(L1, L2)', summary: 'the Klein pairing of two lines of projective 3-space: 0 exactly when they meet' },
  { name: 'meet', signature: 'meet(L1, L2)', summary: 'whether two lines meet, are parallel or skew, with their common point and plane' },
  { name: 'line_of_planes', signature: 'line_of_planes(u, v)', summary: 'the line where two planes of projective 3-space meet (planes by their coefficients)' },
  { name: 'line_from_direction_moment', signature: 'line_from_direction_moment(a1, …, a6)', summary: 'the line with the given six direction–moment numbers, in the file\'s convention' },
  { name: 'direction_moment', signature: 'direction_moment(L)', summary: 'a line of projective 3-space as direction and moment' },
  { name: 'count', signature: 'count(k, V)', summary: 'the number of k-dimensional subspaces of V over a finite field (a Gaussian binomial)' },
  { name: 'subspaces', signature: 'subspaces(k, V)', summary: 'every k-dimensional subspace of V over a finite field, for small cases' },
  { name: 'distance', signature: 'distance(U, W)', summary: 'the subspace distance dim U + dim W − 2 dim(U ∩ W)' },
  { name: 'min_distance', signature: 'min_distance(U1, U2, …)', summary: 'the minimum subspace distance of a code, with the pair reaching it' },
  { name: 'schubert', signature: 'schubert(W) or schubert(W, F)', summary: 'the Schubert cell of W relative to a flag (standard by default)' },
  { name: 'Gr', signature: 'Gr(k, n) or Gr(k, V)', summary: 'the Grassmannian G(k, n), for Schubert calculus' },
  { name: 'sigma', signature: 'sigma(X, λ1, λ2, …)', summary: 'the Schubert class σ_λ of the Grassmannian X (λ in the k×(n−k) box; sigma(X) is 1)' },
  { name: 'degree', signature: 'degree(X)', summary: 'the degree of the Grassmannian X in its Plücker embedding' },
  { name: 'intersection_number', signature: 'intersection_number(c)', summary: 'the coefficient of the point class in a Schubert class: the intersection number of a top-degree product' },
  { name: 'dual', signature: 'dual(c)', summary: 'the dual class: σ_λ ↦ σ_λ∨, the complement of λ in the box turned around' },
  { name: 'at', signature: 'at(x, t = 2)', summary: 'the member of a family at given values of its parameters' },
  { name: 'degeneracy', signature: 'degeneracy(W)', summary: 'where the basis of a family drops rank: the gcd of its maximal minors, factored, with its zeros' },
  { name: 'transversals', signature: 'transversals(L1, L2, L3, L4)', summary: 'the lines of projective 3-space meeting four given lines' },
];

export const BUILTIN_NAMES: ReadonlySet<string> = new Set(BUILTINS.map((b) => b.name));

export function builtin(name: string): Builtin | undefined {
  return BUILTINS.find((b) => b.name === name);
}

/** Names a file cannot declare because they name fields. */
export const FIELD_NAMES: ReadonlySet<string> = new Set(['QQ', 'GF']);
