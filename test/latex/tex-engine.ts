/**
 * A real TeX engine for the tests: pdfLaTeX compiles a document in a temporary folder and pdftotext
 * reads the words of the PDF back. Both must be installed (Debian's texlive-latex-base and
 * poppler-utils; `.ci/run` installs them when they are missing); without them the tests fail with
 * that instruction rather than pass without compiling anything.
 */
import { spawnSync } from 'node:child_process';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

const INSTALL = 'apt-get install -y --no-install-recommends texlive-latex-base poppler-utils';

/** Throws, saying how to install them, unless pdflatex and pdftotext can be run. */
export function requireTexTools(): void {
  for (const [tool, args] of [['pdflatex', ['--version']], ['pdftotext', ['-v']]] as const) {
    const run = spawnSync(tool, [...args], { encoding: 'utf8' });
    if (run.error) {
      throw new Error(`${tool} is not installed, so the LaTeX Wedgework writes cannot be compiled. Install Debian's TeX and PDF tools with: ${INSTALL} (.ci/run does it when they are missing)`);
    }
  }
}

/** A fresh temporary folder, removed by `done`. */
export function scratchFolder(prefix: string): { dir: string; done: () => void } {
  const dir = mkdtempSync(join(tmpdir(), `wedgework-tex-${prefix}-`));
  return { dir, done: () => rmSync(dir, { recursive: true, force: true }) };
}

/** The lines of a TeX log that report errors, with the two lines after each (where TeX shows the context). */
function logErrors(log: string): string {
  const lines = log.split('\n');
  const shown: string[] = [];
  lines.forEach((line, i) => {
    if (line.startsWith('!')) shown.push(...lines.slice(i, i + 3));
  });
  return shown.join('\n') || lines.slice(-20).join('\n');
}

/**
 * Compiles `dir/name.tex` (written from `source` when given) with pdfLaTeX, stopping at the first
 * error and with shell escape off, and returns the PDF's text with whitespace collapsed and the
 * typographic minus (U+2212) written as `-`. Throws with TeX's error lines when it does not compile.
 */
export function compileToText(dir: string, name: string, source?: string): string {
  if (source !== undefined) writeFileSync(join(dir, `${name}.tex`), source);
  const run = spawnSync('pdflatex', ['-interaction=nonstopmode', '-halt-on-error', '-no-shell-escape', `${name}.tex`], {
    cwd: dir,
    encoding: 'utf8',
    timeout: 60_000,
  });
  const logPath = join(dir, `${name}.log`);
  const log = existsSync(logPath) ? readFileSync(logPath, 'latin1') : run.stdout;
  if (run.status !== 0 || !existsSync(join(dir, `${name}.pdf`))) {
    throw new Error(`pdflatex could not compile ${name}.tex (status ${run.status}):\n${logErrors(log)}`);
  }
  const text = spawnSync('pdftotext', ['-enc', 'UTF-8', `${name}.pdf`, '-'], { cwd: dir, encoding: 'utf8' });
  if (text.status !== 0) throw new Error(`pdftotext failed on ${name}.pdf: ${text.stderr}`);
  return flatten(text.stdout);
}

/** Whitespace collapsed to single spaces, the typographic minus as `-`. */
export function flatten(text: string): string {
  return text.replace(/\u2212/g, '-').replace(/\s+/g, ' ').trim();
}

/** A minimal document around `body`, with the packages Wedgework's LaTeX needs (amsmath, amssymb). */
export function document(body: string, preamble = ''): string {
  return ['\\documentclass{article}', '\\usepackage{amsmath}', '\\usepackage{amssymb}', preamble, '\\begin{document}', body, '\\end{document}', ''].join('\n');
}

/** How the tests print a macro: its name, a colon, its value and an end mark (see `typesetValue`). */
export function labelled(name: string): string {
  return `\\noindent\\texttt{\\string\\${name}}: \\${name}\\ \\texttt{;;}\\par`;
}

/**
 * What a document typeset for `\name` when it printed each macro with `labelled`: the text between
 * the label and the end mark, without whitespace (pdftotext spaces math unevenly). The top rows of a
 * tall matrix come out before the label, on a line of their own; those tests look at the whole text.
 */
export function typesetValue(text: string, name: string): string {
  const start = text.indexOf(`\\${name}:`);
  if (start < 0) throw new Error(`\\${name} was not typeset`);
  const from = start + name.length + 2;
  const end = text.indexOf(';;', from);
  return squeeze(text.slice(from, end < 0 ? undefined : end));
}

/**
 * A text without whitespace and control characters, to compare with what pdftotext shows (it spaces
 * math unevenly, and the big delimiters of \bigl( and \bigl[ come out as control characters).
 */
export function squeeze(text: string): string {
  return text.replace(/[\s\p{Cc}]+/gu, '');
}
