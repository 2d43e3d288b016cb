/**
 * Name resolution: which declaration each name refers to. Cheap enough to run
 * on every keystroke; it reports unknown, duplicate, reserved and ambiguous
 * names, and records every reference so a hover on a use finds its declaration.
 */
import { entryExpressions, type Expr, type NameRef, type Program } from './ast.js';
import { BUILTIN_NAMES, BUILTINS, FIELD_NAMES } from './builtins.js';
import { defaultBasisNames } from './conventions.js';
import type { Problem, Span } from './types.js';

export type SymbolKind = 'space' | 'basis' | 'vector' | 'subspace' | 'multivector' | 'map' | 'flag' | 'grassmannian' | 'class' | 'scalar';

export interface SymbolInfo {
  name: string;
  kind: SymbolKind;
  nameSpan: Span;
  /** The whole declaring statement. */
  declSpan: Span;
  /** For a basis vector: its space and 0-based position. */
  space?: string;
  index?: number;
}

export interface Reference {
  span: Span;
  target: SymbolInfo;
}

export interface Resolution {
  problems: Problem[];
  references: Reference[];
  /** Every declared symbol, in declaration order. */
  symbols: SymbolInfo[];
}

const NAME_PROBLEM = (code: string, span: Span, message: string, related?: Problem['related']): Problem => ({
  code,
  severity: 'error',
  message,
  span,
  ...(related ? { related } : {}),
});

class Resolver {
  readonly problems: Problem[] = [];
  readonly references: Reference[] = [];
  readonly symbols: SymbolInfo[] = [];
  /** Declared names (spaces, vectors, subspaces, multivectors). */
  private readonly names = new Map<string, SymbolInfo>();
  /** Basis vector names: one name may belong to several spaces (e1 of V and of W). */
  private readonly basis = new Map<string, SymbolInfo[]>();

  /** Names whose declarations had syntax errors: their uses are explained already. */
  constructor(readonly broken: ReadonlySet<string>) {}

  declare(info: SymbolInfo): void {
    // Built-in operations are recognised only where they are called, so `subspace meet = P & Q` is a
    // fine name; the names of fields are kept free of declarations to avoid `QQ` meaning two things.
    if (FIELD_NAMES.has(info.name)) {
      this.problems.push(NAME_PROBLEM('name/reserved', info.nameSpan, `'${info.name}' names a field and cannot be declared; choose another name`));
      return;
    }
    // A basis name may repeat across spaces (e1 of V and of W), never within one space
    // and never as another declaration's name.
    const earlier =
      this.names.get(info.name) ??
      (info.kind === 'basis'
        ? this.basis.get(info.name)?.find((b) => b.space === info.space)
        : this.basis.get(info.name)?.[0]);
    if (earlier) {
      const what = earlier.kind === 'basis' ? `a basis vector of ${earlier.space}` : `a ${earlier.kind}`;
      this.problems.push(
        NAME_PROBLEM('name/duplicate', info.nameSpan, `'${info.name}' is already declared (as ${what})`, [
          { span: earlier.nameSpan, message: `'${info.name}' is first declared here` },
        ]),
      );
      return;
    }
    this.symbols.push(info);
    if (info.kind === 'basis') {
      const list = this.basis.get(info.name) ?? [];
      list.push(info);
      this.basis.set(info.name, list);
    } else {
      this.names.set(info.name, info);
    }
  }

  referToSpace(id: { name: string; span: Span }): void {
    const target = this.names.get(id.name);
    if (!target) {
      this.problems.push(NAME_PROBLEM('name/unknown', id.span, `no space named '${id.name}' is declared before this line`));
    } else if (target.kind !== 'space') {
      this.problems.push(NAME_PROBLEM('name/not-a-space', id.span, `'${id.name}' is a ${target.kind}, not a space`));
    } else {
      this.references.push({ span: id.span, target });
    }
  }

  referToName(ref: NameRef): void {
    const { name, qualifier } = ref;
    if (qualifier) {
      this.referToSpace(qualifier);
      const inSpace = (this.basis.get(name.name) ?? []).find((b) => b.space === qualifier.name);
      if (!inSpace) {
        if (this.names.get(qualifier.name)?.kind === 'space') {
          this.problems.push(
            NAME_PROBLEM('name/unknown', name.span, `the space ${qualifier.name} has no basis vector named '${name.name}'`),
          );
        }
        return;
      }
      this.references.push({ span: name.span, target: inSpace });
      return;
    }
    const declared = this.names.get(name.name);
    if (declared) {
      this.references.push({ span: name.span, target: declared });
      return;
    }
    const candidates = this.basis.get(name.name) ?? [];
    if (candidates.length === 1) {
      this.references.push({ span: name.span, target: candidates[0]! });
    } else if (candidates.length > 1) {
      const spaces = candidates.map((c) => c.space!);
      this.problems.push(
        NAME_PROBLEM(
          'name/ambiguous',
          name.span,
          `'${name.name}' is a basis vector of ${spaces.join(' and of ')}; write ${spaces.map((s) => `${s}.${name.name}`).join(' or ')}`,
          candidates.map((c) => ({ span: c.nameSpan, message: `basis vector '${name.name}' of ${c.space}` })),
        ),
      );
    } else if (BUILTIN_NAMES.has(name.name)) {
      this.problems.push(
        NAME_PROBLEM('name/builtin-not-called', name.span, `'${name.name}' is a built-in operation: call it, e.g. ${BUILTINS.find((b) => b.name === name.name)!.signature}`),
      );
    } else if (!this.broken.has(name.name)) {
      this.problems.push(NAME_PROBLEM('name/unknown', name.span, `'${name.name}' is not declared before this line`));
    }
  }

  walk(e: Expr): void {
    switch (e.type) {
      case 'name':
        this.referToName(e);
        return;
      case 'binary':
        this.walk(e.left);
        this.walk(e.right);
        return;
      case 'unary':
        this.walk(e.operand);
        return;
      case 'call':
        if (this.names.get(e.callee.name)?.kind === 'map') {
          this.references.push({ span: e.callee.span, target: this.names.get(e.callee.name)! });
        } else if (!BUILTIN_NAMES.has(e.callee.name)) {
          const known = BUILTINS.map((b) => b.name).join(', ');
          this.problems.push(
            NAME_PROBLEM('name/unknown-operation', e.callee.span, `'${e.callee.name}' is not a built-in operation (known: ${known})`),
          );
        }
        // chart(W, 13): the index set is a literal, not a name, so walking it is harmless.
        e.args.forEach((a) => this.walk(a));
        // at(W, t = 2): t names a parameter, a use of it like any other.
        e.named?.forEach((a) => {
          this.referToName({ type: 'name', span: a.name.span, name: a.name });
          this.walk(a.value);
        });
        return;
      case 'tuple':
        e.items.forEach((a) => this.walk(a));
        return;
      case 'dim':
        this.walk(e.operand);
        return;
      case 'matrix':
      case 'point':
      case 'indexmap':
        entryExpressions(e).forEach((x) => this.walk(x));
        return;
      case 'rows':
      case 'columns':
      case 'solutions':
        this.walk(e.matrix);
        return;
      case 'number':
        return;
    }
  }
}

/** Resolves every name of a program in statement order. */
export function resolveNames(program: Program, firstLabel: 0 | 1 = 1): Resolution {
  const r = new Resolver(new Set((program.dropped ?? []).flatMap((d) => (d.declares ? [d.declares.name] : []))));
  for (const s of program.statements) {
    switch (s.type) {
      case 'field':
        if (s.generator) r.declare({ name: s.generator.name, kind: 'scalar', nameSpan: s.generator.span, declSpan: s.span });
        break;
      case 'parameter':
        for (const name of s.names) r.declare({ name: name.name, kind: 'scalar', nameSpan: name.span, declSpan: s.span });
        break;
      case 'normalize':
      case 'convention':
        break;
      case 'space': {
        r.declare({ name: s.name.name, kind: 'space', nameSpan: s.name.span, declSpan: s.span });
        const dim = Number(s.dim.text);
        const names = s.basis
          ? s.basis.map((b) => ({ name: b.name, span: b.span }))
          : Number.isInteger(dim) && dim <= 64
            ? defaultBasisNames(dim, firstLabel).map((name) => ({ name, span: s.name.span }))
            : [];
        names.forEach((b, index) =>
          r.declare({ name: b.name, kind: 'basis', nameSpan: b.span, declSpan: s.span, space: s.name.name, index }),
        );
        break;
      }
      case 'decl':
        r.walk(s.value);
        if (s.inSpace) r.referToSpace(s.inSpace);
        r.declare({ name: s.name.name, kind: s.declKind, nameSpan: s.name.span, declSpan: s.span });
        break;
      case 'claim':
        r.walk(s.subject);
        if (s.relation.other) r.walk(s.relation.other);
        break;
      case 'show':
        r.walk(s.value);
        break;
      case 'map':
        r.referToSpace(s.from);
        r.referToSpace(s.to);
        r.walk(s.value);
        r.declare({ name: s.name.name, kind: 'map', nameSpan: s.name.span, declSpan: s.span });
        break;
      case 'flag':
        r.walk(s.value);
        if (s.inSpace) r.referToSpace(s.inSpace);
        r.declare({ name: s.name.name, kind: 'flag', nameSpan: s.name.span, declSpan: s.span });
        break;
    }
  }
  return { problems: r.problems, references: r.references, symbols: r.symbols };
}
