/**
 * The language layer's one facade. The LSP server and the CLI use only this.
 * Nothing here throws on user input: problems come back as data.
 */
import type { Analysis, AnalyzeOptions, Hover, Lens } from './types.js';

export * from './types.js';

export function analyze(text: string, options: AnalyzeOptions): Analysis {
  // Placeholder until the pipeline (parse → resolve → evaluate) is wired in.
  void options;
  return { text, problems: [], results: [], evaluated: false };
}

/** The hover for the innermost result whose anchor contains `offset`. */
export function hoverAt(analysis: Analysis, offset: number): Hover | undefined {
  let best: Hover | undefined;
  for (const r of analysis.results) {
    if (r.anchor.start <= offset && offset <= r.anchor.end) {
      if (!best || r.anchor.end - r.anchor.start < best.span.end - best.span.start) {
        best = { span: r.anchor, markdown: r.hover };
      }
    }
  }
  return best;
}

/** One lens per result, above its statement. */
export function lensesFor(analysis: Analysis): Lens[] {
  return analysis.results
    .filter((r) => r.kind !== 'field')
    .map((r) => ({ span: r.span, title: r.summary, latex: r.latex, name: r.name }));
}
