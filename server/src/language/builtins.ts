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
];

export const BUILTIN_NAMES: ReadonlySet<string> = new Set(BUILTINS.map((b) => b.name));

export function builtin(name: string): Builtin | undefined {
  return BUILTINS.find((b) => b.name === name);
}

/** Names a file cannot declare because they name fields. */
export const FIELD_NAMES: ReadonlySet<string> = new Set(['QQ', 'GF']);
