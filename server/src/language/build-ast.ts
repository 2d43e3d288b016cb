/**
 * Turns the concrete syntax tree of one statement (from `./parser.ts`) into
 * the AST of `./ast.ts`, with spans.
 *
 * Chevrotain's offsets are inclusive at both ends; our spans are half-open, so
 * a token spans `[startOffset, endOffset + 1)`. Parentheses do not appear in
 * the AST (`(x)` is just `x`), but they do count in the span of the enclosing
 * node, so every expression builder returns the node together with its
 * `extent`: the source range including any parentheses around it.
 *
 * The shape checks that the grammar cannot express are made here: a bracket
 * that mixes `:` with other separators (`syntax/mixed-separators`), and index
 * keys that are not label lists (`syntax/bad-index-key`). A statement with such
 * a problem is not returned. A missing child, or a token without a real
 * position (which the parser's settings rule out, but a defensive builder does
 * not rely on that), makes it drop the statement instead of throwing.
 */
import type { CstElement, CstNode, IToken, TokenType } from 'chevrotain';
import type {
  Binary, DeclStmt, Entry, Expr, Ident, IndexKey, IndexMapLit, MatrixLit, NamedArgument, PointLit, Relation, Statement,
} from './ast.js';
import type { Problem, Span } from './types.js';
import * as T from './tokens.js';

/** Raised inside the builder when the tree lacks something; caught per statement. */
class Incomplete extends Error {}

/** Raised after a shape problem has been recorded; the statement is dropped. */
class Rejected extends Error {}

interface Built<E extends Expr = Expr> {
  node: E;
  extent: Span;
}

export interface BuiltStatement {
  /** Undefined when the statement was dropped (a problem says why, unless the tree was incomplete). */
  statement: Statement | undefined;
  problems: Problem[];
}

function isToken(element: CstElement): element is IToken {
  return (element as IToken).tokenType !== undefined;
}

function isRealToken(token: IToken): boolean {
  return !token.isInsertedInRecovery && Number.isFinite(token.startOffset) && Number.isFinite(token.endOffset);
}

export function tokenSpan(token: IToken): Span {
  return { start: token.startOffset, end: token.endOffset! + 1 };
}

function join(a: Span, b: Span): Span {
  return { start: Math.min(a.start, b.start), end: Math.max(a.end, b.end) };
}

function tokens(node: CstNode, label: string): IToken[] {
  const found = node.children[label] ?? [];
  const result: IToken[] = [];
  for (const element of found) {
    if (!isToken(element) || !isRealToken(element)) throw new Incomplete();
    result.push(element);
  }
  return result;
}

function optionalToken(node: CstNode, label: string): IToken | undefined {
  return tokens(node, label)[0];
}

function token(node: CstNode, label: string): IToken {
  const found = optionalToken(node, label);
  if (!found) throw new Incomplete();
  return found;
}

function nodes(node: CstNode, label: string): CstNode[] {
  const found = node.children[label] ?? [];
  const result: CstNode[] = [];
  for (const element of found) {
    if (isToken(element)) throw new Incomplete();
    if (element.recoveredNode) throw new Incomplete();
    result.push(element);
  }
  return result;
}

function optionalNode(node: CstNode, label: string): CstNode | undefined {
  return nodes(node, label)[0];
}

function child(node: CstNode, label: string): CstNode {
  const found = optionalNode(node, label);
  if (!found) throw new Incomplete();
  return found;
}

/** Every token under a node, in source order. */
function tokensOf(node: CstNode): IToken[] {
  const out: IToken[] = [];
  const visit = (n: CstNode): void => {
    for (const elements of Object.values(n.children)) {
      for (const e of elements) {
        if (isToken(e)) {
          if (isRealToken(e)) out.push(e);
        } else visit(e);
      }
    }
  };
  visit(node);
  return out.sort((a, b) => a.startOffset - b.startOffset);
}

function ident(token: IToken): Ident {
  return { span: tokenSpan(token), name: token.image };
}

function numberLit(token: IToken) {
  return { type: 'number' as const, span: tokenSpan(token), text: token.image };
}

/** Collects the shape problems of one statement while building it. */
class StatementBuilder {
  readonly problems: Problem[] = [];

  private reject(code: string, span: Span, message: string): never {
    this.problems.push({ code, severity: 'error', message, span });
    throw new Rejected();
  }

  statement(cst: CstNode, extent: Span): Statement {
    const [kind] = Object.keys(cst.children);
    const inner = kind ? child(cst, kind) : undefined;
    if (!inner) throw new Incomplete();
    switch (inner.name) {
      case 'fieldStmt': {
        const keyword = token(inner, 'keyword');
        const modulus = optionalToken(inner, 'modulus');
        const word = optionalToken(inner, 'generatorWord');
        const generator = optionalToken(inner, 'generator');
        if (word && word.image !== 'generator') {
          this.reject('syntax/unexpected-token', tokenSpan(word), `expected 'generator' and a name after the field, as in field GF(9) generator w; found '${word.image}'`);
        }
        return {
          type: 'field',
          span: extent,
          keyword: tokenSpan(keyword),
          name: ident(token(inner, 'name')),
          ...(modulus ? { modulus: numberLit(modulus) } : {}),
          ...(generator ? { generator: ident(generator) } : {}),
        };
      }
      case 'normalizeStmt': {
        const words = tokens(inner, 'word');
        if (words.length === 0) throw new Incomplete();
        const span = join(tokenSpan(words[0]!), tokenSpan(words[words.length - 1]!));
        return {
          type: 'normalize',
          span: extent,
          keyword: tokenSpan(token(inner, 'keyword')),
          mode: { span, name: words.map((w) => w.image).join('-') },
        };
      }
      case 'spaceStmt': {
        const basis = tokens(inner, 'basis');
        return {
          type: 'space',
          span: extent,
          keyword: tokenSpan(token(inner, 'keyword')),
          name: ident(token(inner, 'name')),
          dim: numberLit(token(inner, 'dim')),
          ...(basis.length > 0 ? { basis: basis.map(ident) } : {}),
        };
      }
      case 'declStmt': {
        const keyword = token(inner, 'keyword');
        const inSpace = optionalToken(inner, 'inSpace');
        const kinds = new Map<TokenType, DeclStmt['declKind']>([
          [T.Vector, 'vector'],
          [T.Subspace, 'subspace'],
          [T.Multivector, 'multivector'],
          [T.GrassmannianKeyword, 'grassmannian'],
          [T.ClassKeyword, 'class'],
        ]);
        const declKind = kinds.get(keyword.tokenType) ?? 'multivector';
        return {
          type: 'decl',
          span: extent,
          keyword: tokenSpan(keyword),
          declKind,
          name: ident(token(inner, 'name')),
          value: this.expression(child(inner, 'value')).node,
          ...(inSpace ? { inSpace: ident(inSpace) } : {}),
        };
      }
      case 'claimStmt':
        return {
          type: 'claim',
          span: extent,
          keyword: tokenSpan(token(inner, 'keyword')),
          subject: this.expression(child(inner, 'subject')).node,
          relation: this.relation(child(inner, 'relation')),
        };
      case 'conventionStmt':
        return {
          type: 'convention',
          span: extent,
          keyword: tokenSpan(token(inner, 'keyword')),
          settings: nodes(inner, 'setting').map((n) => {
            const key = token(n, 'key');
            const words = tokens(n, 'word');
            if (words.length === 0) throw new Incomplete();
            const valueSpan = join(tokenSpan(words[0]!), tokenSpan(words[words.length - 1]!));
            return {
              span: join(tokenSpan(key), valueSpan),
              key: ident(key),
              value: { span: valueSpan, name: words.map((w) => w.image).join('-') },
            };
          }),
        };
      case 'mapStmt':
        return {
          type: 'map',
          span: extent,
          keyword: tokenSpan(token(inner, 'keyword')),
          name: ident(token(inner, 'name')),
          from: ident(token(inner, 'from')),
          to: ident(token(inner, 'to')),
          value: this.expression(child(inner, 'value')).node,
        };
      case 'flagStmt': {
        const inSpace = optionalToken(inner, 'inSpace');
        return {
          type: 'flag',
          span: extent,
          keyword: tokenSpan(token(inner, 'keyword')),
          name: ident(token(inner, 'name')),
          value: this.expression(child(inner, 'value')).node,
          ...(inSpace ? { inSpace: ident(inSpace) } : {}),
        };
      }
      case 'parameterStmt':
        return {
          type: 'parameter',
          span: extent,
          keyword: tokenSpan(token(inner, 'keyword')),
          names: tokens(inner, 'name').map(ident),
        };
      case 'showStmt':
        return {
          type: 'show',
          span: extent,
          keyword: tokenSpan(token(inner, 'keyword')),
          value: this.expression(child(inner, 'value')).node,
        };
      default:
        throw new Incomplete();
    }
  }

  private relation(node: CstNode): Relation {
    const other = optionalNode(node, 'other');
    const negated = optionalToken(node, 'not') !== undefined;
    const isToken = optionalToken(node, 'is');
    if (isToken) {
      const words = tokens(node, 'property');
      if (words.length === 0) throw new Incomplete();
      const span = join(tokenSpan(words[0]!), tokenSpan(words[words.length - 1]!));
      return {
        span: join(tokenSpan(isToken), span),
        op: negated ? 'is not' : 'is',
        property: { span, name: words.map((w) => w.image.toLowerCase()).join('-') },
      };
    }
    const first = ['not', 'equals', 'notEquals', 'in', 'notIn', 'decomposable']
      .map((label) => optionalToken(node, label))
      .filter((t): t is IToken => t !== undefined)
      .sort((a, b) => a.startOffset - b.startOffset)[0];
    if (!first) throw new Incomplete();
    let op: Relation['op'];
    if (optionalToken(node, 'equals')) op = '=';
    else if (optionalToken(node, 'notEquals')) op = '!=';
    else if (optionalToken(node, 'notIn')) op = 'not in';
    else if (optionalToken(node, 'in')) op = negated ? 'not in' : 'in';
    else if (optionalToken(node, 'decomposable')) op = negated ? 'not decomposable' : 'decomposable';
    else throw new Incomplete();
    const needsOther = op !== 'decomposable' && op !== 'not decomposable';
    if (needsOther !== (other !== undefined)) throw new Incomplete();
    if (!other) return { span: join(tokenSpan(first), tokenSpan(token(node, 'decomposable'))), op };
    const built = this.expression(other);
    return { span: join(tokenSpan(first), built.extent), op, other: built.node };
  }

  /** Folds `operand (op operand)*` to the left. */
  private leftFold(
    operands: Built[],
    ops: IToken[],
    opOf: (token: IToken) => Binary['op'],
  ): Built {
    if (operands.length !== ops.length + 1 || operands.length === 0) throw new Incomplete();
    let result = operands[0]!;
    ops.forEach((opToken, i) => {
      const right = operands[i + 1]!;
      result = this.binary(opOf(opToken), tokenSpan(opToken), result, right, false);
    });
    return result;
  }

  private binary(op: Binary['op'], opSpan: Span, left: Built, right: Built, implicit: boolean): Built {
    const span = join(left.extent, right.extent);
    const node: Binary = {
      type: 'binary',
      span,
      op,
      opSpan,
      ...(implicit ? { implicit: true } : {}),
      left: left.node,
      right: right.node,
    };
    return { node, extent: span };
  }

  expression(node: CstNode): Built {
    const operands = nodes(node, 'operand').map((n) => this.additive(n));
    return this.leftFold(operands, tokens(node, 'op'), () => '&');
  }

  private additive(node: CstNode): Built {
    const operands = nodes(node, 'operand').map((n) => this.multiplicative(n));
    return this.leftFold(operands, tokens(node, 'op'), (t) => (t.tokenType === T.Plus ? '+' : '-'));
  }

  private multiplicative(node: CstNode): Built {
    let result = this.unary(child(node, 'head'));
    for (const tail of nodes(node, 'tail')) {
      const op = optionalToken(tail, 'op');
      if (op) {
        const right = this.unary(child(tail, 'operand'));
        result = this.binary(op.tokenType === T.Star ? '*' : '/', tokenSpan(op), result, right, false);
      } else {
        const right = this.wedge(child(tail, 'juxtaposed'));
        const gap = { start: result.extent.end, end: right.extent.start };
        result = this.binary('*', gap, result, right, true);
      }
    }
    return result;
  }

  private unary(node: CstNode): Built {
    const sign = optionalToken(node, 'sign');
    const operandNode = child(node, 'operand');
    if (!sign) return this.wedge(operandNode);
    const operand = this.unary(operandNode);
    const span = join(tokenSpan(sign), operand.extent);
    return {
      node: { type: 'unary', span, op: sign.tokenType === T.Minus ? '-' : '+', operand: operand.node },
      extent: span,
    };
  }

  private wedge(node: CstNode): Built {
    const operands = nodes(node, 'operand').map((n) => this.primary(n));
    return this.leftFold(operands, tokens(node, 'op'), () => '^');
  }

  private primary(node: CstNode): Built {
    const number = optionalToken(node, 'number');
    if (number) {
      const lit = numberLit(number);
      return { node: lit, extent: lit.span };
    }
    const [name] = Object.keys(node.children);
    const inner = name ? child(node, name) : undefined;
    if (!inner) throw new Incomplete();
    switch (inner.name) {
      case 'nameOrCall':
        return this.nameOrCall(inner);
      case 'parenthesised':
        return this.parenthesised(inner);
      case 'bracket': {
        const lit = this.bracket(inner);
        return { node: lit, extent: lit.span };
      }
      case 'indexMap': {
        const lit = this.indexMap(inner);
        return { node: lit, extent: lit.span };
      }
      case 'rowsExpr':
      case 'columnsExpr':
      case 'solutionsExpr': {
        const keyword = token(inner, 'keyword');
        const matrix = this.matrixOnly(child(inner, 'matrix'), keyword);
        const span = join(tokenSpan(keyword), matrix.span);
        const type =
          inner.name === 'rowsExpr' ? ('rows' as const) : inner.name === 'columnsExpr' ? ('columns' as const) : ('solutions' as const);
        return { node: { type, span, keyword: tokenSpan(keyword), matrix }, extent: span };
      }
      case 'dimExpr': {
        const keyword = token(inner, 'keyword');
        const operand = this.primary(child(inner, 'operand'));
        const span = join(tokenSpan(keyword), operand.extent);
        return { node: { type: 'dim', span, keyword: tokenSpan(keyword), operand: operand.node }, extent: span };
      }
      default:
        throw new Incomplete();
    }
  }

  private nameOrCall(node: CstNode): Built {
    const nameToken = token(node, 'name');
    if (optionalToken(node, 'open')) {
      const close = token(node, 'close');
      const args: Expr[] = [];
      const named: NamedArgument[] = [];
      for (const arg of nodes(node, 'arg')) {
        const value = this.expression(child(arg, 'value')).node;
        const name = optionalToken(arg, 'name');
        if (name) named.push({ span: join(tokenSpan(name), value.span), name: ident(name), value });
        else if (named.length > 0) this.reject('syntax/unexpected-token', value.span, `values given to parameters (t = 2) come after the other arguments of ${nameToken.image}`);
        else args.push(value);
      }
      const span = join(tokenSpan(nameToken), tokenSpan(close));
      return { node: { type: 'call', span, callee: ident(nameToken), args, ...(named.length > 0 ? { named } : {}) }, extent: span };
    }
    if (optionalToken(node, 'dot')) {
      const member = token(node, 'member');
      const span = join(tokenSpan(nameToken), tokenSpan(member));
      return { node: { type: 'name', span, name: ident(member), qualifier: ident(nameToken) }, extent: span };
    }
    const span = tokenSpan(nameToken);
    return { node: { type: 'name', span, name: ident(nameToken) }, extent: span };
  }

  private parenthesised(node: CstNode): Built {
    const extent = join(tokenSpan(token(node, 'open')), tokenSpan(token(node, 'close')));
    const items = nodes(node, 'item').map((n) => this.expression(n));
    if (items.length === 0) throw new Incomplete();
    if (items.length === 1) return { node: items[0]!.node, extent };
    return { node: { type: 'tuple', span: extent, items: items.map((i) => i.node) }, extent };
  }

  /**
   * The entries one `entry` node holds: usually one; two when a rational and a factor stand apart
   * (`[2 t]` is the entries 2 and t, `[2t]` the one entry 2·t). An entry that is not a plain rational
   * carries the expression it stands for.
   */
  private entries(node: CstNode): { entry: Entry; first: IToken; last: IToken }[] {
    const sign = optionalToken(node, 'sign');
    const numerator = optionalToken(node, 'numerator');
    const slash = optionalToken(node, 'slash');
    const denominator = optionalToken(node, 'denominator');
    if ((slash === undefined) !== (denominator === undefined)) throw new Incomplete();
    const factorNode = optionalNode(node, 'factor');
    const factor = factorNode ? this.entryFactor(factorNode) : undefined;
    const numberParts = [sign, numerator, slash, denominator].filter((t): t is IToken => t !== undefined);
    const rational = (parts: IToken[]) => {
      const first = parts[0]!;
      const last = parts[parts.length - 1]!;
      return { entry: { span: join(tokenSpan(first), tokenSpan(last)), text: parts.map((t) => t.image).join('') }, first, last };
    };
    if (!factor) return [rational(numberParts)];
    if (!numerator) {
      // A factor with an optional sign: `t`, `-t^2`, `(1 + t)`.
      const first = sign ?? factor.first;
      const span = join(tokenSpan(first), tokenSpan(factor.last));
      const expr: Expr = sign ? { type: 'unary', span, op: sign.image === '-' ? '-' : '+', operand: factor.expr } : factor.expr;
      return [{ entry: { span, text: `${sign?.image ?? ''}${factor.text}`, expr }, first, last: factor.last }];
    }
    const numberPart = rational(numberParts);
    const last = denominator ?? numerator;
    if (factor.first.startOffset > last.endOffset! + 1) return [numberPart, { entry: { span: factor.expr.span, text: factor.text, expr: factor.expr }, first: factor.first, last: factor.last }];
    // `2t`, `-1/2 t^2` written together: the rational times the factor.
    const numberSpan = join(tokenSpan(numerator), tokenSpan(last));
    let coefficient: Expr = numberLit(numerator);
    if (denominator) coefficient = { type: 'binary', span: numberSpan, op: '/', opSpan: tokenSpan(slash!), left: coefficient, right: numberLit(denominator) };
    const span = join(numberPart.entry.span, factor.expr.span);
    let expr: Expr = { type: 'binary', span: join(numberSpan, factor.expr.span), op: '*', opSpan: { start: last.endOffset! + 1, end: factor.first.startOffset }, implicit: true, left: coefficient, right: factor.expr };
    if (sign) expr = { type: 'unary', span, op: sign.image === '-' ? '-' : '+', operand: expr };
    return [{ entry: { span, text: `${numberPart.entry.text}${factor.text}`, expr }, first: numberPart.first, last: factor.last }];
  }

  /** `t`, `t^2` or `( expression )` inside an entry, with its first and last tokens. */
  private entryFactor(node: CstNode): { expr: Expr; text: string; first: IToken; last: IToken } {
    const name = optionalToken(node, 'name');
    if (name) {
      const caret = optionalToken(node, 'caret');
      const exponent = optionalToken(node, 'exponent');
      if ((caret === undefined) !== (exponent === undefined)) throw new Incomplete();
      const base: Expr = { type: 'name', span: tokenSpan(name), name: ident(name) };
      if (!caret || !exponent) return { expr: base, text: name.image, first: name, last: name };
      if (caret.image !== '^') this.reject('syntax/unexpected-token', tokenSpan(caret), `a power inside a bracket is written with '^' (t^2); '${caret.image}' is the wedge product`);
      const span = join(tokenSpan(name), tokenSpan(exponent));
      return {
        expr: { type: 'binary', span, op: '^', opSpan: tokenSpan(caret), left: base, right: numberLit(exponent) },
        text: `${name.image}^${exponent.image}`,
        first: name,
        last: exponent,
      };
    }
    const open = token(node, 'open');
    const close = token(node, 'close');
    const inner = this.expression(child(node, 'inner')).node;
    const span = join(tokenSpan(open), tokenSpan(close));
    return { expr: inner, text: `(${tokensOf(child(node, 'inner')).map((t) => t.image).join(' ')})`, first: open, last: close };
  }

  /**
   * A bracket literal. The first gap between entries decides the shape: `:`
   * makes a projective point, anything else (`,`, `;` or just spaces) a
   * matrix; a gap of the other kind later on is a mixed-separators problem,
   * reported at that gap's separator (or at the entry after a bare gap).
   *
   * Matrix rows: `;` starts a new row, `,` continues the row even across a
   * line break, and a bare gap starts a new row exactly when the next entry
   * stands on a later line than the previous one.
   */
  bracket(node: CstNode): MatrixLit | PointLit {
    const span = join(tokenSpan(token(node, 'open')), tokenSpan(token(node, 'close')));
    const [first, ...rest] = this.entries(child(node, 'first'));
    // A second entry split off an item (`2 t`) follows its first with a bare gap.
    const items = [
      ...rest.map((e) => ({ separator: undefined as IToken | undefined, ...e })),
      ...nodes(node, 'item').flatMap((item) =>
        this.entries(child(item, 'entry')).map((e, i) => ({ separator: i === 0 ? optionalToken(item, 'separator') : undefined, ...e })),
      ),
    ];
    if (!first) throw new Incomplete();
    const isPoint = items.length > 0 && items[0]!.separator?.tokenType === T.Colon;
    for (const item of items) {
      const isColon = item.separator?.tokenType === T.Colon;
      if (isColon !== isPoint) {
        const where = item.separator ? tokenSpan(item.separator) : item.entry.span;
        const found = item.separator ? `'${item.separator.image}'` : 'entries separated only by spaces';
        this.reject(
          'syntax/mixed-separators',
          where,
          isPoint
            ? `this bracket began as a projective point (entries separated by ':'), so every entry must be ` +
                `separated by ':', found ${found}`
            : `':' separates the coordinates of a projective point, but this bracket began as a matrix ` +
                `(entries separated by spaces or ',', rows by ';' or new lines); use one kind of separator`,
        );
      }
    }
    if (isPoint) return { type: 'point', span, entries: [first.entry, ...items.map((i) => i.entry)] };
    const rows: Entry[][] = [[first.entry]];
    let previousLast = first.last;
    for (const item of items) {
      const kind = item.separator?.tokenType;
      const newRow =
        kind === T.Semicolon || (kind === undefined && (item.first.startLine ?? 0) > (previousLast.endLine ?? 0));
      if (newRow) rows.push([item.entry]);
      else rows[rows.length - 1]!.push(item.entry);
      previousLast = item.last;
    }
    return { type: 'matrix', span, rows };
  }

  /** The bracket after `rows` or `solutions`, which must be a matrix. */
  private matrixOnly(node: CstNode, keyword: IToken): MatrixLit {
    const lit = this.bracket(node);
    if (lit.type === 'matrix') return lit;
    const colon = nodes(node, 'item').map((item) => optionalToken(item, 'separator'))[0];
    this.reject(
      'syntax/mixed-separators',
      colon ? tokenSpan(colon) : lit.span,
      `'${keyword.image}' needs a matrix (entries separated by spaces or ',', rows by ';' or new lines), ` +
        `but ':' makes this bracket a projective point`,
    );
  }

  private indexMap(node: CstNode): IndexMapLit {
    const span = join(tokenSpan(token(node, 'open')), tokenSpan(token(node, 'close')));
    const entries = nodes(node, 'item').map((item) => {
      const key = this.indexKey(child(item, 'key'));
      const values = this.entries(child(item, 'value'));
      if (values.length > 1) this.reject('syntax/unexpected-token', values[1]!.entry.span, `one value per index set: write the product without a space (${values[0]!.entry.text}${values[1]!.entry.text}) or put ',' between entries`);
      const value = values[0]!.entry;
      return { key, value, span: join(key.span, value.span) };
    });
    return { type: 'indexmap', span, entries };
  }

  private indexKey(node: CstNode): IndexKey {
    const badName = optionalToken(node, 'badName');
    if (badName) {
      this.reject(
        'syntax/bad-index-key',
        tokenSpan(badName),
        `an index key lists basis labels, as digits (13 means labels 1 and 3) or in parentheses ` +
          `((1, 10) for labels above 9); found the name '${badName.image}'`,
      );
    }
    const digits = optionalToken(node, 'digits');
    if (digits) {
      if (!/^[0-9]+$/.test(digits.image)) {
        this.reject(
          'syntax/bad-index-key',
          tokenSpan(digits),
          `an index key is a string of digits, one per label (13 means labels 1 and 3), found ${digits.image}`,
        );
      }
      return { span: tokenSpan(digits), labels: [...digits.image].map(Number) };
    }
    const open = token(node, 'open');
    const close = token(node, 'close');
    const labels = tokens(node, 'label');
    if (labels.length === 0) throw new Incomplete();
    for (const label of labels) {
      if (!/^[0-9]+$/.test(label.image) || !Number.isSafeInteger(Number(label.image))) {
        this.reject(
          'syntax/bad-index-key',
          tokenSpan(label),
          `a label in an index key is a whole number, found ${label.image}`,
        );
      }
    }
    return { span: join(tokenSpan(open), tokenSpan(close)), labels: labels.map((l) => Number(l.image)) };
  }
}

/**
 * The deepest expression tree a statement may have, counted in nodes from the
 * statement down. A chain `a + b + c + …` folds to the left, one level per
 * operator, and name resolution, evaluation and the editor features all walk
 * the tree recursively: fuzzing found a 5000-term sum reported as an internal
 * error (the evaluator ran out of stack). Nesting in parentheses is bounded
 * before parsing (parser.ts); this bounds long chains.
 */
export const MAX_EXPRESSION_DEPTH = 1000;

/**
 * The first expression node found deeper than MAX_EXPRESSION_DEPTH, if any.
 * The walk uses its own stack, so it cannot overflow on the trees it rejects.
 */
function tooDeepExpression(statement: Statement): Expr | undefined {
  const pending: [unknown, number][] = [[statement, 0]];
  while (pending.length > 0) {
    const [value, depth] = pending.pop()!;
    if (typeof value !== 'object' || value === null) continue;
    // Children are pushed last first, so the walk goes down the left operands first and reports,
    // for a long chain, the part of it from its start to where it gets too deep.
    const children = Array.isArray(value) ? value : Object.values(value);
    // Statements and expressions are the nodes with a `type`; spans, names and entries are leaves.
    const isNode = !Array.isArray(value) && typeof (value as { type?: unknown }).type === 'string';
    const level = isNode ? depth + 1 : depth;
    if (isNode && level > MAX_EXPRESSION_DEPTH) return value as Expr;
    for (let i = children.length - 1; i >= 0; i--) {
      const item: unknown = children[i];
      if (typeof item === 'object' && item !== null) pending.push([item, level]);
    }
  }
  return undefined;
}

/**
 * Builds one statement whose source range (keyword to last token) is `span`.
 * A missing part or a shape problem drops the statement; only a bug in the
 * builder itself can throw, and `parse.ts` contains that.
 */
export function buildStatement(cst: CstNode, span: Span): BuiltStatement {
  const builder = new StatementBuilder();
  try {
    const statement = builder.statement(cst, span);
    const deep = tooDeepExpression(statement);
    if (deep !== undefined) {
      // Dropped like a statement with a shape problem: every later pass would recurse through it.
      builder.problems.push({
        code: 'limit/nesting',
        severity: 'error',
        message:
          `this expression nests more than ${MAX_EXPRESSION_DEPTH} operations deep (each operator of a long chain ` +
          'such as a + b + c + … adds a level), which is past what can be evaluated; split it into several declarations',
        span: deep.span,
      });
      return { statement: undefined, problems: builder.problems };
    }
    return { statement, problems: builder.problems };
  } catch (error) {
    if (error instanceof Incomplete || error instanceof Rejected) {
      return { statement: undefined, problems: builder.problems };
    }
    throw error;
  }
}
