/**
 * Evaluation of a whole program, statement by statement in source order, into
 * results and problems. A statement that fails reports one problem and leaves
 * its name bound to nothing, so later uses stay quiet instead of cascading.
 */
import { parametricField } from './parameters.js';
import type { AnyField } from '../engine/fields.js';
import { finiteField } from '../engine/finite-fields.js';
import { FieldOrderLimitError } from '../engine/extension-field.js';
import { QQ } from '../engine/rational.js';
import { NotPrimeError } from '../engine/prime-field.js';
import { fromVector, isZeroMV, toDense } from '../engine/multivector.js';
import type { ClaimStmt, DeclStmt, FieldStmt, FlagStmt, Ident, MapStmt, Program, ShowStmt, SpaceStmt } from './ast.js';
import { flagFromVectors } from './geometry.js';
import { checkClaim, shortTitle } from './claims.js';
import { conventionSentence, defaultBasisNames, Labels, type Convention, type FileConvention } from './conventions.js';
import type { Environment } from './environment.js';
import { evaluate } from './expressions.js';
import { Failure, Poisoned, fail } from './failure.js';
import { presentSpace, presentValue, type Presented } from './present.js';
import type { Limits, Problem, Result, ResultKind, Span } from './types.js';
import { describeValue, type SpaceInfo, type Value } from './values.js';
import { EvaluationMemo, RecordingMap, type RecordedMaps } from './statement-memo.js';
import { EvaluationStopped } from './stopped.js';
import type { Binding } from './environment.js';

interface RunHooks extends EvaluationHooks {
  contextKey: string;
}

export interface ProgramOutcome {
  results: Result[];
  problems: Problem[];
  /** The convention the results are stated in, field included. */
  convention: Convention;
}

function result(kind: ResultKind, span: Span, anchor: Span, title: string, p: Presented, name?: string): Result {
  return {
    kind,
    ...(name !== undefined ? { name } : {}),
    span,
    anchor,
    summary: p.summary,
    hover: `${title}\n\n${p.hover}`,
    latex: p.latex,
    json: p.json,
    ...(p.parts ? { parts: p.parts } : {}),
  };
}

/** The field: from the first `field` statement, QQ when there is none. */
function chooseField(program: Program, problems: Problem[]): { field: AnyField; statement?: FieldStmt } {
  const statements = program.statements.filter((s): s is FieldStmt => s.type === 'field');
  let chosen: { field: AnyField; statement?: FieldStmt } = { field: QQ };
  statements.forEach((s, i) => {
    let field: AnyField;
    try {
      field = fieldOf(s);
    } catch (err) {
      if (err instanceof Failure) problems.push(err.problem);
      return;
    }
    if (i === 0 || !chosen.statement) {
      chosen = { field, statement: s };
    } else if (field.name !== chosen.field.name) {
      problems.push({
        code: 'type/mixed-fields',
        severity: 'error',
        message: `this file already computes over ${chosen.field.name}; one file works over one field (found ${field.name} here)`,
        span: s.span,
        related: [{ span: chosen.statement.span, message: `the field ${chosen.field.name} is chosen here` }],
      });
    } else {
      problems.push({ code: 'type/duplicate-field', severity: 'warning', message: `the field is already ${field.name}`, span: s.span });
    }
  });
  return chosen;
}

function fieldOf(s: FieldStmt): AnyField {
  const name = s.name.name;
  if (name === 'QQ') {
    if (s.modulus) fail('type/unknown-field', s.span, 'QQ takes no modulus; for a prime field write GF(p)');
    return QQ;
  }
  if (name === 'GF') {
    if (!s.modulus) fail('type/unknown-field', s.name.span, 'GF needs a prime: GF(p), e.g. GF(7)');
    if (!/^\d+$/.test(s.modulus.text)) fail('type/unknown-field', s.modulus.span, `the modulus of GF must be a whole number, found ${s.modulus.text}`);
    try {
      const field = finiteField(BigInt(s.modulus.text), s.generator ? { generator: s.generator.name } : undefined);
      if (s.generator && field.characteristic === BigInt(s.modulus.text)) {
        fail('type/unknown-field', s.generator.span, `GF(${s.modulus.text}) is a prime field: its elements are the integers mod ${s.modulus.text}, with no generator to name`);
      }
      return field;
    } catch (err) {
      if (err instanceof NotPrimeError) {
        fail('math/not-prime', s.modulus.span, `GF(${s.modulus.text}): ${s.modulus.text} is not a prime power; finite fields GF(q) need q = p^m for a prime p`);
      }
      if (err instanceof FieldOrderLimitError) fail('limit/field-order', s.modulus.span, err.message);
      throw err;
    }
  }
  fail('type/unknown-field', s.name.span, `unknown field '${name}': write QQ (the rationals) or GF(q) for a prime power q`);
}

class ProgramEvaluator {
  readonly results: Result[] = [];

  constructor(
    readonly env: Environment,
    readonly source: string,
  ) {}

  run(program: Program, hooks: RunHooks): void {
    const { memo, onStatement, shouldStop } = hooks;
    for (const s of program.statements) {
      if (shouldStop?.()) throw new EvaluationStopped();
      if (!memo) {
        onStatement?.(s.span);
        this.guardedStatement(s);
        continue;
      }
      const maps = this.env as unknown as RecordedMaps;
      const key = `${hooks.contextKey}\u0000${this.source.slice(s.span.start, s.span.end)}`;
      const entry = memo.find(key, maps);
      let produced: { results: Result[]; problems: Problem[] };
      if (entry?.outcome) {
        produced = memo.replay(entry, s.span, maps);
        memo.replayed++;
      } else {
        onStatement?.(s.span);
        produced = memo.record(key, s.span, maps, () => {
          const results = this.results.length;
          const problems = this.env.problems.length;
          this.guardedStatement(s);
          return { results: this.results.splice(results), problems: this.env.problems.splice(problems) };
        }, entry);
        memo.evaluated++;
      }
      this.results.push(...produced.results);
      this.env.problems.push(...produced.problems);
    }
  }

  /** One statement; a failure becomes its problem and leaves a declared name bound to nothing. */
  private guardedStatement(s: Program['statements'][number]): void {
    try {
      this.statement(s);
    } catch (err) {
      if (s.type === 'decl') this.env.bindings.set(s.name.name, { value: undefined, declSpan: s.span, nameSpan: s.name.span });
      if (err instanceof Failure) this.env.problems.push(err.problem);
      else if (!(err instanceof Poisoned)) this.env.problems.push(internalProblem(err, s.span));
    }
  }

  private statement(s: Program['statements'][number]): void {
    switch (s.type) {
      case 'field':
      case 'parameter':
      case 'normalize':
      case 'convention':
        return;
      case 'map':
        return this.map(s);
      case 'flag':
        return this.flag(s);
      case 'space':
        return this.space(s);
      case 'decl':
        return this.declaration(s);
      case 'claim':
        return this.claim(s);
      case 'show':
        return this.show(s);
    }
  }

  private space(s: SpaceStmt): void {
    const dim = Number(s.dim.text);
    if (!/^\d+$/.test(s.dim.text) || dim < 1) fail('type/bad-dimension', s.dim.span, `a dimension is a whole number of at least 1, found ${s.dim.text}`);
    if (dim > this.env.limits.maxDimension) {
      fail('limit/dimension', s.dim.span, `dimension ${dim} is above the limit of ${this.env.limits.maxDimension}`);
    }
    if (s.basis && s.basis.length !== dim) {
      fail('type/basis-count', s.basis.length ? { start: s.basis[0]!.span.start, end: s.basis[s.basis.length - 1]!.span.end } : s.span, `a ${dim}-dimensional space needs ${dim} basis names, found ${s.basis.length}`);
    }
    if (this.env.spaces.has(s.name.name)) return; // reported by name resolution
    const space: SpaceInfo = {
      name: s.name.name,
      dim,
      basisNames: s.basis ? s.basis.map((b) => b.name) : defaultBasisNames(dim, this.env.convention.firstLabel),
      namedBasis: !!s.basis,
      declaration: s.span,
    };
    this.env.spaces.set(space.name, space);
    this.results.push(result('space', s.span, s.name.span, `**space ${space.name}**`, presentSpace(this.env, space), space.name));
  }

  private declaration(s: DeclStmt): void {
    if (this.env.bindings.has(s.name.name) || this.env.spaces.has(s.name.name)) {
      // A duplicate was reported by name resolution; keep the first binding.
      return;
    }
    let space: SpaceInfo | undefined;
    if (s.inSpace) {
      space = this.env.spaces.get(s.inSpace.name);
      if (!space) throw new Poisoned();
    }
    let value = evaluate(this.env, s.value, space ? { space } : {});
    value = coerce(this.env, value, s);
    const valueSpace = 'space' in value ? value.space : undefined;
    if (space && valueSpace && valueSpace.name !== space.name) {
      fail('type/space-mismatch', s.inSpace!.span, `the value is ${describeValue(value)}, not of ${space.name}`);
    }
    this.env.bindings.set(s.name.name, { value, declSpan: s.span, nameSpan: s.name.span });
    if (value.t === 'multivector' && isZeroMV(value.mv)) {
      this.env.problems.push({
        code: 'math/zero-multivector',
        severity: 'warning',
        message: `${s.name.name} is the zero multivector: it is no point of projective space and comes from no subspace`,
        span: s.value.span,
      });
    }
    // A declared multivector is shown as one (degree, decomposability), even when it is a Plücker vector.
    const shown = value.t === 'multivector' && value.pluckerOf ? { ...value, pluckerOf: undefined } : value;
    const p = presentValue(this.env, shown);
    const title = `**${s.declKind} ${s.name.name}**`;
    this.results.push(result(s.declKind, s.span, s.name.span, title, p, s.name.name));
  }

  private bind(name: Ident, span: Span, value: Value, kind: ResultKind, keyword: string): void {
    this.env.bindings.set(name.name, { value, declSpan: span, nameSpan: name.span });
    this.results.push(result(kind, span, name.span, `**${keyword} ${name.name}**`, presentValue(this.env, value), name.name));
  }

  private map(s: MapStmt): void {
    if (this.env.bindings.has(s.name.name)) return; // a duplicate, reported by name resolution
    const from = this.env.spaces.get(s.from.name);
    const to = this.env.spaces.get(s.to.name);
    if (!from || !to) throw new Poisoned();
    const value = evaluate(this.env, s.value, {});
    if (value.t !== 'matrix') {
      fail('type/declared-kind', s.value.span, `a map is given by a matrix in brackets [ … ], found ${describeValue(value)}`);
    }
    const columns = this.env.convention.layout === 'columns';
    const [wantRows, wantCols] = columns ? [to.dim, from.dim] : [from.dim, to.dim];
    if (value.rows.length !== wantRows || value.ncols !== wantCols) {
      fail(
        'type/wrong-shape',
        s.value.span,
        `a map ${from.name} → ${to.name} is a ${wantRows}×${wantCols} matrix (${columns ? 'its columns are' : 'its rows are'} the images of the ${from.dim} basis vectors of ${from.name}), found ${value.rows.length}×${value.ncols}`,
      );
    }
    const matrix = columns ? Array.from({ length: from.dim }, (_, i) => value.rows.map((r) => r[i])) : value.rows;
    this.bind(s.name, s.span, { t: 'map', name: s.name.name, from, to, matrix }, 'map', 'map');
  }

  private flag(s: FlagStmt): void {
    if (this.env.bindings.has(s.name.name)) return;
    let space: SpaceInfo | undefined;
    if (s.inSpace) {
      space = this.env.spaces.get(s.inSpace.name);
      if (!space) throw new Poisoned();
    }
    let value: Value;
    if (s.value.type === 'tuple') {
      const items = s.value.items;
      const vectors = items.map((item) => {
        const v = evaluate(this.env, item, space ? { space } : {});
        if (v.t !== 'vector') fail('type/operand', item.span, `a flag is given by vectors, found ${describeValue(v)}`);
        return v;
      });
      value = flagFromVectors(this.env, vectors, items.map((i) => i.span), s.value.span);
    } else {
      value = evaluate(this.env, s.value, space ? { space } : {});
      if (value.t !== 'flag') fail('type/declared-kind', s.value.span, `a flag is standard(V), opposite(V) or a tuple of vectors (f1, …, fn), found ${describeValue(value)}`);
    }
    if (space && value.space.name !== space.name) fail('type/space-mismatch', s.inSpace!.span, `this flag is in ${value.space.name}, not ${space.name}`);
    this.bind(s.name, s.span, value, 'flag', 'flag');
  }

  private claim(s: ClaimStmt): void {
    const outcome = checkClaim(this.env, this.source, s);
    const summary = outcome.holds ? `✓ holds: ${outcome.found}` : `✗ false: ${outcome.found}`;
    if (!outcome.holds) {
      const r = outcome.replacement;
      this.env.problems.push({
        code: outcome.code,
        severity: 'error',
        message: `the claim '${outcome.claimed}' is false: ${outcome.found}`,
        span: s.span,
        ...(r ? { fixes: [{ title: `Replace with the computed value ${shortTitle(r.newText)}`, edits: [r], preferred: true }] } : {}),
      });
    }
    const hover = [
      `**claim** \`${outcome.claimed}\` — ${outcome.holds ? '**holds**' : '**false**'}`,
      '',
      outcome.found,
      '',
      conventionSentence(this.env.convention),
    ].join('\n');
    this.results.push({
      kind: 'claim',
      span: s.span,
      anchor: s.keyword,
      summary,
      hover,
      latex: outcome.latex,
      json: { claim: outcome.claimed, holds: outcome.holds, found: outcome.found, ...(outcome.holds ? {} : { code: outcome.code }) },
    });
  }

  private show(s: ShowStmt): void {
    const value = evaluate(this.env, s.value, {});
    const text = this.source.slice(s.value.span.start, s.value.span.end).replace(/\s+/g, ' ');
    const p = presentValue(this.env, value);
    // The whole line answers a hover: the keyword and the shown expression alike.
    this.results.push(result('show', s.span, s.span, `**show** \`${text}\``, { ...p, summary: `${text} = ${p.summary}` }));
  }
}

/** What a declaration's keyword promises, checked and converted. */
function coerce(env: Environment, value: Value, s: DeclStmt): Value {
  switch (s.declKind) {
    case 'vector':
      if (value.t === 'vector') return value;
      // A degree-1 multivector is a vector: its dense coordinates are the vector's.
      if (value.t === 'multivector' && value.mv.k === 1) return { t: 'vector', space: value.space, coords: toDense(env.F, value.mv) };
      break;
    case 'subspace':
      if (value.t === 'subspace') return value;
      if (value.t === 'multivector') {
        fail('type/declared-kind', s.value.span, `${s.name.name} is declared a subspace but the value is ${describeValue(value)}; recover(…) gives the subspace of a decomposable multivector`);
      }
      break;
    case 'multivector':
      if (value.t === 'multivector') return value;
      if (value.t === 'vector') return { t: 'multivector', space: value.space, mv: fromVector(env.F, value.coords) };
      if (value.t === 'subspace') {
        fail('type/declared-kind', s.value.span, `${s.name.name} is declared a multivector but the value is ${describeValue(value)}; plucker(…) gives its Plücker vector`);
      }
      break;
    case 'grassmannian':
      if (value.t === 'grassmannian') return value;
      break;
    case 'class':
      if (value.t === 'class') return value;
      break;
  }
  fail('type/declared-kind', s.value.span, `${s.name.name} is declared a ${s.declKind} but the value is ${describeValue(value)}`);
}

function internalProblem(err: unknown, span: Span): Problem {
  const message = err instanceof Error ? err.message : String(err);
  return {
    code: 'internal/error',
    severity: 'error',
    message: `internal error while evaluating this statement (please report it): ${message}`,
    span,
  };
}

/** What the caller of `evaluateProgram` may add (see `AnalyzeOptions`). */
export interface EvaluationHooks {
  onStatement?: (span: Span) => void;
  /** Asked before each statement; `true` stops the evaluation with `EvaluationStopped`. */
  shouldStop?: () => boolean;
  /** The document's memo of statement outcomes (./statement-memo.ts), to re-evaluate only what an edit affects. */
  memo?: EvaluationMemo;
}

/**
 * Everything besides a statement's own text and the names it looks up that its outcome depends on: the field
 * (with the name of its generator), the file's conventions and the limits.
 */
function contextKey(field: AnyField, generator: string | undefined, fileConvention: FileConvention, limits: Limits): string {
  return JSON.stringify({ field: field.name, generator, convention: fileConvention, limits });
}

export function evaluateProgram(
  program: Program,
  source: string,
  fileConvention: FileConvention,
  limits: Limits,
  hooks: EvaluationHooks = {},
): ProgramOutcome {
  const problems: Problem[] = [];
  const { field: base } = chooseField(program, problems);
  // Declared parameters make the file compute over the rational functions in them (./parameters.ts).
  const parameters = program.statements.flatMap((s) => (s.type === 'parameter' ? s.names : []));
  const parameterNames = [...new Set(parameters.map((p) => p.name))];
  const field = parameterNames.length > 0 ? parametricField(base, parameterNames) : base;
  const convention: Convention = { field, ...fileConvention };
  const env: Environment = {
    F: field,
    source,
    convention,
    labels: new Labels(convention.firstLabel),
    limits,
    // Recording maps only where a memo listens: they cost a little on every lookup.
    spaces: hooks.memo ? new RecordingMap<SpaceInfo>('spaces') : new Map(),
    bindings: hooks.memo ? new RecordingMap<Binding>('bindings') : new Map(),
    problems,
  };
  const generator = program.statements.find((s): s is FieldStmt => s.type === 'field' && s.generator !== undefined)?.generator;
  const generatorElement = (base as { generatorElement?: () => unknown }).generatorElement;
  if (generator && generatorElement) {
    const element = generatorElement.call(base);
    const value = field === base ? element : (field as unknown as { fromBase(x: unknown): unknown }).fromBase(element);
    env.bindings.set(generator.name, { value: { t: 'scalar', value }, declSpan: generator.span, nameSpan: generator.span });
  }
  for (const p of parameters) {
    if (env.bindings.has(p.name)) continue; // declared twice: reported by name resolution
    const value = (field as unknown as { variable(name: string): unknown }).variable(p.name);
    env.bindings.set(p.name, { value: { t: 'scalar', value }, declSpan: p.span, nameSpan: p.span });
  }
  const evaluator = new ProgramEvaluator(env, source);
  hooks.memo?.begin();
  evaluator.run(program, { ...hooks, contextKey: contextKey(field, generator?.name, fileConvention, limits) });
  hooks.memo?.prune();
  return { results: evaluator.results, problems, convention };
}
