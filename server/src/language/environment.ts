/**
 * What evaluation knows while it walks a file: the field and conventions, the
 * declared spaces, and the value (or failure) of every name declared so far.
 */
import type { AnyField } from '../engine/fields.js';
import type { Convention, Labels } from './conventions.js';
import type { Limits, Problem, Span } from './types.js';
import type { Scalar, SpaceInfo, SubspaceValue, Value } from './values.js';
import type { Multivector } from '../engine/multivector.js';
import { pluckerMultivector } from '../engine/plucker.js';

export interface Binding {
  /** Undefined when the declaration failed: uses of the name are then silent. */
  value: Value | undefined;
  declSpan: Span;
  nameSpan: Span;
}

export interface Environment {
  F: AnyField;
  /** The document text, for quoting the user's own expressions in messages. */
  source: string;
  convention: Convention;
  /** Printed labels of index sets under the convention's first label. */
  labels: Labels;
  limits: Limits;
  spaces: Map<string, SpaceInfo>;
  bindings: Map<string, Binding>;
  /** Problems that do not stop a statement (warnings, a dependent span that still has a value). */
  problems: Problem[];
}

/** The basis vectors named `name`, in every space that has one. */
export function basisCandidates(env: Environment, name: string): { space: SpaceInfo; index: number }[] {
  const out: { space: SpaceInfo; index: number }[] = [];
  for (const space of env.spaces.values()) {
    const index = space.basisNames.indexOf(name);
    if (index >= 0) out.push({ space, index });
  }
  return out;
}

const pluckerCache = new WeakMap<SubspaceValue, Multivector<Scalar>>();

/**
 * The Plücker vector of a subspace, computed once per value: the minors of the
 * basis as the user gave it when there is one (so raw coordinates are the
 * user's), otherwise of the reduced basis.
 */
export function subspacePlucker(env: Environment, w: SubspaceValue): Multivector<Scalar> {
  let mv = pluckerCache.get(w);
  if (!mv) {
    mv = pluckerMultivector(env.F, w.given ?? w.basis, w.space.dim);
    pluckerCache.set(w, mv);
  }
  return mv;
}
