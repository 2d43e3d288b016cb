/**
 * Writes an expression tree as a fully parenthesised prefix form, so that a
 * test can state the intended grouping in one line: `1/2 e4` is
 * `(juxt (/ 1 2) e4)`. `juxt` is multiplication by juxtaposition.
 */
import type { Expr } from '../../server/src/language/ast.js';

export function prefixForm(e: Expr): string {
  switch (e.type) {
    case 'number':
      return e.text;
    case 'name':
      return (e.qualifier ? `${e.qualifier.name}.` : '') + e.name.name;
    case 'binary':
      return `(${e.implicit ? 'juxt' : e.op} ${prefixForm(e.left)} ${prefixForm(e.right)})`;
    case 'unary':
      return `(${e.op === '-' ? 'neg' : 'pos'} ${prefixForm(e.operand)})`;
    case 'call':
      return `(call ${e.callee.name}${e.args.map((a) => ' ' + prefixForm(a)).join('')})`;
    case 'tuple':
      return `(tuple ${e.items.map(prefixForm).join(' ')})`;
    case 'matrix':
      return `[${e.rows.map((r) => '[' + r.map((x) => x.text).join(' ') + ']').join(' ')}]`;
    case 'point':
      return `[${e.entries.map((x) => x.text).join(' : ')}]`;
    case 'indexmap':
      return `{${e.entries.map((x) => `(${x.key.labels.join(',')}): ${x.value.text}`).join(', ')}}`;
    case 'rows':
    case 'columns':
    case 'solutions':
      return `(${e.type} ${prefixForm(e.matrix)})`;
    case 'dim':
      return `(dim ${prefixForm(e.operand)})`;
  }
}
