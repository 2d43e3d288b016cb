/**
 * The server's settings (`wedgework.*` in the editor), read defensively: a
 * missing or misspelt value falls back to its default rather than failing.
 */
import { NORMALIZATIONS, type Normalization } from '../language/index.js';

/** When the full evaluation runs: on save (and open), or also while typing. */
export type EvaluateOn = 'save' | 'type';

export interface Settings {
  normalization: Normalization;
  evaluateOn: EvaluateOn;
  /** Workspace defaults for the conventions a file does not choose itself. */
  indexOrder: 'lex' | 'colex';
  firstLabel: 0 | 1;
  layout: 'rows' | 'columns';
}

export { NORMALIZATIONS };
export const EVALUATE_ON: readonly EvaluateOn[] = ['save', 'type'];

export const DEFAULT_SETTINGS: Settings = {
  normalization: 'primitive',
  evaluateOn: 'save',
  indexOrder: 'lex',
  firstLabel: 1,
  layout: 'rows',
};

function pick<T extends string>(value: unknown, allowed: readonly T[], fallback: T): T {
  return typeof value === 'string' && (allowed as readonly string[]).includes(value) ? (value as T) : fallback;
}

/** Settings from the `wedgework` configuration section (any shape; unknown parts are ignored). */
export function parseSettings(raw: unknown): Settings {
  const section = typeof raw === 'object' && raw !== null ? (raw as Record<string, unknown>) : {};
  return {
    normalization: pick(section['normalization'], NORMALIZATIONS, DEFAULT_SETTINGS.normalization),
    evaluateOn: pick(section['evaluateOn'], EVALUATE_ON, DEFAULT_SETTINGS.evaluateOn),
    indexOrder: pick(section['indexOrder'], ['lex', 'colex'] as const, DEFAULT_SETTINGS.indexOrder),
    firstLabel: section['firstLabel'] === 0 || section['firstLabel'] === '0' ? 0 : 1,
    layout: pick(section['layout'], ['rows', 'columns'] as const, DEFAULT_SETTINGS.layout),
  };
}
