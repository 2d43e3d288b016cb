/**
 * The language layer's one facade. The LSP server and the CLI use only this.
 * Nothing here throws on user input: problems come back as data.
 *
 * The pipeline: parse (syntax problems) → resolve names (name problems, and
 * the references a hover on a use needs) → evaluate, when asked (results,
 * type, math and claim problems).
 */
import { parseProgram } from './parse.js';
import { evaluateProgram } from './program.js';
import { resolveNames } from './scope.js';
import { conventionSentence, readConventions } from './conventions.js';
import { EvaluationStopped } from './stopped.js';
import { DEFAULT_LIMITS, type Analysis, type AnalyzeOptions, type Hover, type Lens, type Problem } from './types.js';

export * from './types.js';
export * from './services/index.js';
export { actionsAt, applyEdits } from './fixes/index.js';
export { exportLatex } from './latex-export.js';
export { buildMacros, macroReferencesAt, type MacroDefinition, type MacroOrigin, type MacroProblem, type MacroSet, type MacroSource } from './latex-macros.js';
export { capitalise, codeMacroPart, MACRO_PREFIX, spellName, wordsOf } from './macro-names.js';
export { parseMacrosFile, renderMacrosFile, type MacrosFileHeader, type MacrosFileSource, type ParsedMacro, type ParsedMacrosFile } from './macros-file.js';
export { compareMacros, macroUses, undefinedMacroUses, type MacroDifference, type MacroUse } from './macros-sync.js';
export { EvaluationMemo } from './statement-memo.js';
export { EvaluationStopped } from './stopped.js';

/**
 * Analyzes a document. It throws only `EvaluationStopped`, and only when `options.shouldStop` asked for it.
 */
export function analyze(text: string, options: AnalyzeOptions): Analysis {
  try {
    const { program, problems: syntax } = parseProgram(text);
    const conventions = readConventions(program, {
      normalization: options.normalization,
      order: options.order,
      firstLabel: options.firstLabel,
      layout: options.layout,
    });
    const resolution = resolveNames(program, conventions.convention.firstLabel);
    const references = resolution.references.map((r) => ({
      span: r.span,
      name: r.target.name,
      kind: r.target.kind,
      ...(r.target.space !== undefined ? { space: r.target.space } : {}),
    }));
    const problems: Problem[] = [...syntax, ...conventions.problems, ...resolution.problems];
    const facts = { program, symbols: resolution.symbols, uses: resolution.references };
    if (!options.evaluate) return { text, problems: sortProblems(problems), results: [], references, evaluated: false, syntax: facts };
    const outcome = evaluateProgram(program, text, conventions.convention, { ...DEFAULT_LIMITS, ...options.limits }, {
      ...(options.onStatement ? { onStatement: options.onStatement } : {}),
      ...(options.shouldStop ? { shouldStop: options.shouldStop } : {}),
      ...(options.memo ? { memo: options.memo } : {}),
    });
    // Name resolution already reported unknown names; evaluation stays silent on them.
    problems.push(...outcome.problems);
    return {
      text,
      problems: sortProblems(problems),
      results: outcome.results,
      references,
      evaluated: true,
      convention: conventionSentence(outcome.convention),
      syntax: facts,
    };
  } catch (err) {
    if (err instanceof EvaluationStopped) throw err;
    // A defect of ours must not take the editor down: report it on the whole text.
    const message = err instanceof Error ? err.message : String(err);
    return {
      text,
      problems: [{ code: 'internal/error', severity: 'error', message: `internal error (please report it): ${message}`, span: { start: 0, end: text.length } }],
      results: [],
      references: [],
      evaluated: false,
    };
  }
}

function sortProblems(problems: Problem[]): Problem[] {
  return problems.sort((a, b) => a.span.start - b.span.start || a.span.end - b.span.end);
}

/**
 * The hover at `offset`: the innermost result whose anchor contains it, else
 * the declaration a name used there refers to.
 */
export function hoverAt(analysis: Analysis, offset: number): Hover | undefined {
  let best: Hover | undefined;
  for (const r of analysis.results) {
    if (r.anchor.start <= offset && offset <= r.anchor.end) {
      if (!best || r.anchor.end - r.anchor.start < best.span.end - best.span.start) {
        best = { span: r.anchor, markdown: r.hover };
      }
    }
  }
  if (best) return best;
  const ref = analysis.references.find((r) => r.span.start <= offset && offset <= r.span.end);
  if (!ref) return undefined;
  if (ref.kind === 'basis') {
    return { span: ref.span, markdown: `**basis vector ${ref.name}** of ${ref.space}` };
  }
  const target = analysis.results.find((r) => r.name === ref.name && r.kind !== 'claim' && r.kind !== 'show');
  return target ? { span: ref.span, markdown: target.hover } : undefined;
}

/** One lens per result, above its statement (a show line has one, not two). */
export function lensesFor(analysis: Analysis): Lens[] {
  const seen = new Set<number>();
  const lenses: Lens[] = [];
  for (const r of analysis.results) {
    if (r.kind === 'field' || seen.has(r.span.start)) continue;
    seen.add(r.span.start);
    lenses.push({ span: r.span, title: r.summary, latex: r.latex, ...(r.name !== undefined ? { name: r.name } : {}) });
  }
  return lenses;
}
