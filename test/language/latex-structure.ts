/**
 * A structural check of LaTeX source, short of compiling it: braces balance
 * (escaped ones aside), every \begin{x} meets its \end{x}, display math \[ … \]
 * and inline $ … $ open and close without nesting, \left/\right and
 * \bigl/\bigr pair up inside each formula, \item appears only in a list, and
 * math holds ASCII only (a Unicode symbol such as ∧ stops pdfLaTeX). The
 * rules are those of the LaTeX manual (Lamport, "LaTeX: A Document
 * Preparation System", 2nd ed., from memory). Throws on the first problem.
 */

function withoutComments(source: string): string {
  return source
    .split('\n')
    .map((line) => {
      for (let i = 0; i < line.length; i++) {
        if (line[i] === '\\') i++;
        else if (line[i] === '%') return line.slice(0, i);
      }
      return line;
    })
    .join('\n');
}

function checkFormula(formula: string, where: string): void {
  if (/[^\x20-\x7e\s]/.test(formula)) throw new Error(`a character outside ASCII in math ${where}: ${formula}`);
  const count = (re: RegExp) => (formula.match(re) ?? []).length;
  if (count(/\\left(?![a-zA-Z])/g) !== count(/\\right(?![a-zA-Z])/g)) throw new Error(`\\left and \\right do not pair ${where}: ${formula}`);
  if (count(/\\bigl(?![a-zA-Z])/g) !== count(/\\bigr(?![a-zA-Z])/g)) throw new Error(`\\bigl and \\bigr do not pair ${where}: ${formula}`);
  let depth = 0;
  for (const m of formula.matchAll(/\\left|\\right|\\middle/g)) {
    if (m[0] === '\\left') depth++;
    else if (m[0] === '\\right') depth--;
    else if (depth === 0) throw new Error(`\\middle outside \\left … \\right ${where}`);
    if (depth < 0) throw new Error(`\\right before its \\left ${where}`);
  }
}

export function checkLatexStructure(source: string): void {
  const text = withoutComments(source);
  const environments: string[] = [];
  let braces = 0;
  let math: { kind: '\\[' | '$'; start: number } | undefined;
  for (let i = 0; i < text.length; i++) {
    const c = text[i]!;
    if (c === '\\') {
      const command = /^\\([a-zA-Z]+|.)/.exec(text.slice(i))![0];
      if (command === '\\[' || command === '\\]') {
        if (command === '\\[') {
          if (math) throw new Error(`\\[ inside math at offset ${i}`);
          math = { kind: '\\[', start: i + 2 };
        } else {
          if (math?.kind !== '\\[') throw new Error(`\\] without \\[ at offset ${i}`);
          checkFormula(text.slice(math.start, i), `at offset ${math.start}`);
          math = undefined;
        }
      } else if (command === '\\begin' || command === '\\end') {
        const name = /^\{([^}]*)\}/.exec(text.slice(i + command.length))?.[1];
        if (!name) throw new Error(`${command} without a name at offset ${i}`);
        if (command === '\\begin') environments.push(name);
        else if (environments.pop() !== name) throw new Error(`\\end{${name}} does not close the open environment at offset ${i}`);
      } else if (command === '\\item') {
        if (!environments.some((e) => e === 'description' || e === 'itemize' || e === 'enumerate')) throw new Error(`\\item outside a list at offset ${i}`);
      }
      i += command.length - 1;
      continue;
    }
    if (c === '{') braces++;
    if (c === '}' && --braces < 0) throw new Error(`an unmatched } at offset ${i}`);
    if (c === '$') {
      if (!math) math = { kind: '$', start: i + 1 };
      else if (math.kind === '$') {
        checkFormula(text.slice(math.start, i), `at offset ${math.start}`);
        math = undefined;
      } else throw new Error(`$ inside display math at offset ${i}`);
    }
  }
  if (braces !== 0) throw new Error(`${braces} unclosed {`);
  if (environments.length) throw new Error(`\\begin{${environments[environments.length - 1]}} is never ended`);
  if (math) throw new Error(`math opened at offset ${math.start} is never closed`);
}
