/**
 * All results of a file as one LaTeX fragment, for `\input` into a document:
 * a comment header naming the file and the convention every coordinate is
 * stated in, then a description list with one item per result — its kind and
 * name (or its statement, for claims and shows) and its LaTeX in display math.
 * Only amsmath and amssymb are needed, as for "copy as LaTeX".
 */
import { nameLatex } from './latex.js';
import type { Analysis, Result } from './types.js';

/** Characters with a meaning in LaTeX text, written so that they print as themselves. */
const TEXT_SPECIALS: Record<string, string> = {
  '\\': '\\textbackslash{}',
  '{': '\\{',
  '}': '\\}',
  $: '\\$',
  '&': '\\&',
  '#': '\\#',
  '^': '\\^{}',
  _: '\\_',
  '%': '\\%',
  '~': '\\~{}',
};

/** The symbols of the language's Unicode spellings, and of its Greek names, in math mode. */
const TEXT_SYMBOLS: Record<string, string> = {
  '∧': '\\wedge',
  '∩': '\\cap',
  '≠': '\\neq',
  '∈': '\\in',
  '∉': '\\notin',
  '·': '\\cdot',
  '→': '\\to',
  '⋆': '\\star',
};

/** Code as it appears in the file (a claim, a shown expression), in typewriter type. */
export function codeLatex(code: string): string {
  let out = '';
  for (const ch of code.replace(/\s+/g, ' ').trim()) {
    if (TEXT_SPECIALS[ch]) out += TEXT_SPECIALS[ch];
    else if (TEXT_SYMBOLS[ch]) out += `$${TEXT_SYMBOLS[ch]}$`;
    else if (ch === '−') out += '-';
    else if (/\p{Script=Greek}/u.test(ch)) out += `$${nameLatex(ch)}$`;
    else out += ch;
  }
  return `\\texttt{${out}}`;
}

/** A comment line: a line break inside would end the comment early. */
function comment(text: string): string {
  return `% ${text.replace(/[\r\n]+/g, ' ')}`;
}

function statementText(analysis: Analysis, r: Result): string {
  return analysis.text.slice(r.span.start, r.span.end);
}

function claimVerdict(r: Result): string {
  return r.json.holds === true ? 'holds' : 'is false';
}

/** One item of the list: the label, a line of words where there are any, the display. */
function item(analysis: Analysis, r: Result): string[] {
  const lines: string[] = [];
  if (r.kind === 'claim') {
    const text = statementText(analysis, r).replace(/^claim\s+/, '');
    lines.push(`  \\item[{claim}] ${codeLatex(text)} ${claimVerdict(r)}.`);
  } else if (r.kind === 'show') {
    const text = statementText(analysis, r).replace(/^show\s+/, '');
    lines.push(`  \\item[{show}] ${codeLatex(text)}`);
  } else {
    lines.push(`  \\item[{${r.kind} $${nameLatex(r.name ?? '')}$}]`);
  }
  if (r.latex.trim().length > 0) lines.push(`  \\[ ${r.latex} \\]`);
  return lines;
}

/** The fragment for the evaluated analysis of the file called `fileName`. */
export function exportLatex(analysis: Analysis, fileName: string): string {
  const results = analysis.results.filter((r) => r.kind !== 'field');
  const errors = analysis.problems.filter((p) => p.severity === 'error').length;
  const lines = [
    comment(`Wedgework results of ${fileName}`),
    comment(analysis.convention ?? 'Convention: not evaluated; no results.'),
    comment('A fragment for \\input{...} in a document that loads amsmath and amssymb.'),
  ];
  if (errors > 0) {
    lines.push(comment(`${errors} ${errors === 1 ? 'error was' : 'errors were'} reported; a statement that failed has no result here.`));
  }
  if (results.length === 0) {
    lines.push(comment('No results.'));
    return `${lines.join('\n')}\n`;
  }
  lines.push('\\begin{description}');
  for (const r of results) lines.push(...item(analysis, r));
  lines.push('\\end{description}');
  return `${lines.join('\n')}\n`;
}
