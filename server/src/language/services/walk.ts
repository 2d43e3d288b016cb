/** Visiting every expression of a statement, outermost first. */
import { entryExpressions, type Expr, type Statement } from '../ast.js';

/** The expressions a statement contains directly (its value, or a claim's two sides). */
export function statementExpressions(s: Statement): Expr[] {
  switch (s.type) {
    case 'decl':
    case 'show':
    case 'map':
    case 'flag':
      return [s.value];
    case 'claim':
      return s.relation.other ? [s.subject, s.relation.other] : [s.subject];
    case 'field':
    case 'parameter':
    case 'normalize':
    case 'space':
    case 'convention':
      return [];
  }
}

export function forEachExpr(e: Expr, visit: (e: Expr) => void): void {
  visit(e);
  switch (e.type) {
    case 'binary':
      forEachExpr(e.left, visit);
      forEachExpr(e.right, visit);
      return;
    case 'unary':
      forEachExpr(e.operand, visit);
      return;
    case 'call':
      e.args.forEach((a) => forEachExpr(a, visit));
      e.named?.forEach((a) => forEachExpr(a.value, visit));
      return;
    case 'tuple':
      e.items.forEach((a) => forEachExpr(a, visit));
      return;
    case 'dim':
      forEachExpr(e.operand, visit);
      return;
    case 'rows':
    case 'columns':
    case 'solutions':
      forEachExpr(e.matrix, visit);
      return;
    case 'matrix':
    case 'point':
    case 'indexmap':
      entryExpressions(e).forEach((x) => forEachExpr(x, visit));
      return;
    case 'number':
    case 'name':
      return;
  }
}

/** Every expression of every statement, outermost first. */
export function forEachStatementExpr(statements: readonly Statement[], visit: (e: Expr, s: Statement) => void): void {
  for (const s of statements) for (const e of statementExpressions(s)) forEachExpr(e, (x) => visit(x, s));
}
