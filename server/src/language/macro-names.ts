/**
 * Names of LaTeX macros made from names and code in a `.wedge` file.
 *
 * A LaTeX control word is a backslash followed by letters only, so a name like `L_2'` cannot be a
 * macro name as it stands. The mapping here is deterministic and documented in docs/latex-macros.md:
 * ASCII letters are kept with their case; each decimal digit is spelled as a capitalised English word
 * (0 → Zero … 9 → Nine); a prime `'` becomes `Prime`; an underscore or any other separator is dropped
 * and the letter after it is capitalised; a Greek letter becomes its name (η → eta, Γ → Gamma); an
 * accent is dropped from the letter it sits on (é → e). Any other character (a letter of another
 * script) has no spelling, and the name gets no macro.
 */
import { GREEK_LETTERS } from './latex.js';

/** Every macro name starts with this, so that no name can be one LaTeX or a package already defines. */
export const MACRO_PREFIX = 'ww';

const DIGIT_WORDS = ['Zero', 'One', 'Two', 'Three', 'Four', 'Five', 'Six', 'Seven', 'Eight', 'Nine'];

/** The first letter in upper case, the rest as it is. */
export function capitalise(word: string): string {
  return word.length === 0 ? word : word[0]!.toUpperCase() + word.slice(1);
}

/**
 * A name of the file (`L_2'`, `sightA`, `η1`) spelled in ASCII letters (`LTwoPrime`, `sightA`,
 * `etaOne`), or undefined when one of its characters has no spelling.
 */
export function spellName(name: string): string | undefined {
  let out = '';
  let capitaliseNext = false;
  const append = (letters: string): void => {
    out += capitaliseNext ? capitalise(letters) : letters;
    capitaliseNext = false;
  };
  // Decomposed, so that an accented letter is its base letter followed by a combining mark.
  for (const ch of name.normalize('NFD')) {
    if (/^[A-Za-z]$/.test(ch)) append(ch);
    else if (/^[0-9]$/.test(ch)) append(DIGIT_WORDS[Number(ch)]!);
    else if (ch === "'") append('Prime');
    else if (GREEK_LETTERS[ch] !== undefined) append(GREEK_LETTERS[ch]!);
    else if (/^\p{M}$/u.test(ch)) continue;
    else if (/^[\p{L}\p{N}]$/u.test(ch)) return undefined;
    else capitaliseNext = true;
  }
  return out;
}

/** The names and numbers of a piece of code, in order (comments left out): `chart(W, 13)` → chart, W, 13. */
export function wordsOf(code: string): string[] {
  const text = code.replace(/#[^\n\r]*/g, ' ');
  return text.match(/[\p{L}_][\p{L}\p{M}\p{Nd}_']*|[0-9]+/gu) ?? [];
}

/**
 * The words of a piece of code as one macro name part, each word spelled and capitalised:
 * `plucker(W)` → `PluckerW`, `chart(W, 13)` → `ChartWOneThree`. Undefined when a word has no spelling.
 */
export function codeMacroPart(code: string): string | undefined {
  let out = '';
  for (const word of wordsOf(code)) {
    const spelled = spellName(word);
    if (spelled === undefined) return undefined;
    out += capitalise(spelled);
  }
  return out;
}
