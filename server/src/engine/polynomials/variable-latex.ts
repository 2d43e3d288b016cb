/**
 * How a parameter's name is written in LaTeX: `t` stays `t`, `t1` and `t_1`
 * become `t_{1}`, spelled-out and Unicode Greek letters become their commands
 * (`alpha` and `α` give `\alpha`), and any other longer name is set upright
 * in italics as one word (`\mathit{speed}`), so that it is not read as a
 * product of one-letter variables.
 */

const GREEK = [
  'alpha', 'beta', 'gamma', 'delta', 'epsilon', 'zeta', 'eta', 'theta', 'iota', 'kappa', 'lambda', 'mu',
  'nu', 'xi', 'omicron', 'pi', 'rho', 'sigma', 'tau', 'upsilon', 'phi', 'chi', 'psi', 'omega',
];

// The Greek letters in alphabetical order, small and capital, matched with the spelled-out names above.
const UNICODE_GREEK = new Map<string, string>();
'αβγδεζηθικλμνξοπρστυφχψω'.split('').forEach((ch, i) => UNICODE_GREEK.set(ch, GREEK[i]!));
'ΑΒΓΔΕΖΗΘΙΚΛΜΝΞΟΠΡΣΤΥΦΧΨΩ'.split('').forEach((ch, i) => {
  const name = GREEK[i]!;
  UNICODE_GREEK.set(ch, name[0]!.toUpperCase() + name.slice(1));
});

// Capital Greek letters that look like Latin ones have no LaTeX command; they are written as the Latin letter.
const CAPITAL_COMMANDS = new Set(['Gamma', 'Delta', 'Theta', 'Lambda', 'Xi', 'Pi', 'Sigma', 'Upsilon', 'Phi', 'Psi', 'Omega']);
const LATIN_LOOKALIKE: Record<string, string> = {
  Alpha: 'A', Beta: 'B', Epsilon: 'E', Zeta: 'Z', Eta: 'H', Iota: 'I', Kappa: 'K', Mu: 'M', Nu: 'N', Omicron: 'O', Rho: 'P', Tau: 'T', Chi: 'X',
};

function greekCommand(name: string): string | undefined {
  if (GREEK.includes(name)) return name === 'omicron' ? 'o' : `\\${name}`;
  if (CAPITAL_COMMANDS.has(name)) return `\\${name}`;
  return LATIN_LOOKALIKE[name];
}

function baseLatex(base: string): string {
  const spelled = UNICODE_GREEK.get(base) ?? base;
  const greek = greekCommand(spelled);
  if (greek !== undefined) return greek;
  if ([...base].length === 1) return base;
  return `\\mathit{${base.replace(/_/g, '\\_')}}`;
}

/** The LaTeX for one variable name (see the module comment). */
export function variableLatex(name: string): string {
  // A trailing run of digits, possibly after an underscore, is a subscript: t1, t_1, x_12.
  const subscripted = /^(.*?)_?(\d+)('*)$/u.exec(name);
  if (subscripted !== null && subscripted[1]!.length > 0) {
    return `${baseLatex(subscripted[1]!)}_{${subscripted[2]}}${subscripted[3]}`;
  }
  const primed = /^(.*?)('+)$/u.exec(name);
  if (primed !== null && primed[1]!.length > 0) return `${baseLatex(primed[1]!)}${primed[2]}`;
  return baseLatex(name);
}
