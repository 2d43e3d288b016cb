/**
 * Signature help inside the parentheses of a built-in call or a map
 * application: the signatures of the callee and which parameter the cursor is
 * on, counted by the commas before it at the call's own depth (commas inside
 * nested parentheses, brackets and braces belong to those). Works on
 * incomplete text: only the tokens before the cursor are read.
 */
import { builtin } from '../builtins.js';
import * as T from '../tokens.js';
import type { Analysis } from '../types.js';
import { inComment, lastStatementStart, lex } from './lexed.js';

export interface SignatureParameter {
  label: string;
  /** Where the parameter stands in the signature's label: [start, end) in UTF-16 units. */
  start: number;
  end: number;
}

export interface Signature {
  label: string;
  documentation: string;
  parameters: SignatureParameter[];
  /** The parameter the cursor is on, for this signature. */
  activeParameter: number;
}

export interface SignatureHelp {
  signatures: Signature[];
  /** The first signature with room for the arguments written so far. */
  activeSignature: number;
}

interface Frame {
  callee?: string;
  commas: number;
}

/** One signature from its text, e.g. `chart(W, I)` or `span(v1, v2, …)`. */
function signatureOf(label: string, documentation: string, commas: number): Signature {
  const open = label.indexOf('(');
  const close = label.lastIndexOf(')');
  const parameters: SignatureParameter[] = [];
  if (open >= 0 && close > open) {
    let start = open + 1;
    for (const part of label.slice(open + 1, close).split(',')) {
      const lead = part.length - part.trimStart().length;
      const name = part.trim();
      if (name.length > 0) parameters.push({ label: name, start: start + lead, end: start + lead + name.length });
      start += part.length + 1;
    }
  }
  return { label, documentation, parameters, activeParameter: activeIndex(parameters, commas) };
}

/**
 * The parameter for the argument after `commas` commas. A signature with `…`
 * repeats the parameter before it (`span(v1, v2, …)`: v2 from the second on); one
 * with a parameter after `…` ends with it (`coordinates(v, u1, …, un)`: un from
 * the third on).
 */
function activeIndex(parameters: SignatureParameter[], commas: number): number {
  const ellipsis = parameters.findIndex((p) => p.label === '…');
  if (ellipsis < 0) return Math.min(commas, Math.max(parameters.length - 1, 0));
  if (commas < ellipsis) return commas;
  return ellipsis + 1 < parameters.length ? ellipsis + 1 : Math.max(ellipsis - 1, 0);
}

function fixedArity(s: Signature): number {
  return s.parameters.some((p) => p.label === '…') ? Infinity : s.parameters.length;
}

/** The signature help at `offset`, or undefined outside a call's parentheses. */
export function signatureHelpAt(analysis: Analysis, offset: number): SignatureHelp | undefined {
  const facts = analysis.syntax;
  if (!facts) return undefined;
  const { tokens, comments } = lex(analysis.text);
  if (inComment(comments, offset)) return undefined;
  const before = tokens.filter((t) => t.endOffset! + 1 <= offset);
  const statement = before.slice(Math.max(lastStatementStart(before), 0));
  const stack: Frame[] = [];
  statement.forEach((t, i) => {
    const type = t.tokenType;
    if (type === T.LParen) {
      const previous = statement[i - 1];
      // A name followed by `(` is always a call in the grammar (see `nameOrCall` in ../parser.ts).
      stack.push(previous?.tokenType === T.Identifier ? { callee: previous.image, commas: 0 } : { commas: 0 });
    } else if (type === T.LBracket || type === T.LBrace) {
      stack.push({ commas: 0 });
    } else if (type === T.RParen || type === T.RBracket || type === T.RBrace) {
      stack.pop();
    } else if (type === T.Comma && stack.length > 0) {
      stack[stack.length - 1]!.commas++;
    }
  });
  for (let i = stack.length - 1; i >= 0; i--) {
    const frame = stack[i]!;
    if (frame.callee === undefined) continue;
    // A map applies wherever it is declared before this statement; its name then shadows a built-in.
    const statementStart = statement[0]?.startOffset ?? 0;
    const map = facts.symbols.find((s) => s.kind === 'map' && s.name === frame.callee && s.declSpan.start < statementStart);
    let signatures: Signature[];
    if (map) {
      const declaration = facts.program.statements.find((s) => s.span.start === map.declSpan.start);
      const arrow = declaration?.type === 'map' ? ` : ${declaration.from.name} → ${declaration.to.name}` : '';
      signatures = [
        signatureOf(
          `${map.name}(x)`,
          `the map ${map.name}${arrow} applied to a vector, a subspace (its image) or a multivector (through the compound matrix)`,
          frame.commas,
        ),
      ];
    } else {
      const known = builtin(frame.callee);
      if (!known) return undefined;
      signatures = known.signature.split(' or ').map((label) => signatureOf(label.trim(), known.summary, frame.commas));
    }
    const fits = signatures.findIndex((s) => fixedArity(s) > frame.commas);
    return { signatures, activeSignature: fits >= 0 ? fits : signatures.length - 1 };
  }
  return undefined;
}
