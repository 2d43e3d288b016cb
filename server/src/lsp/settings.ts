/**
 * The server's settings (`wedgework.*` in the editor), read defensively: a
 * missing or misspelt value falls back to its default rather than failing.
 */
import { DEFAULT_LIMITS, NORMALIZATIONS, type Normalization } from '../language/index.js';

/** When the full evaluation runs: on save (and open), or also while typing. */
export type EvaluateOn = 'save' | 'type';

export interface Settings {
  normalization: Normalization;
  evaluateOn: EvaluateOn;
  /** Workspace defaults for the conventions a file does not choose itself. */
  indexOrder: 'lex' | 'colex';
  firstLabel: 0 | 1;
  layout: 'rows' | 'columns';
  limits: EvaluationLimits;
}

/** `wedgework.limits.*`: bounds on one evaluation. */
export interface EvaluationLimits {
  /** Largest number of Plücker coordinates computed for one subspace (the language's `Limits.maxCoordinates`). */
  maxCoordinates: number;
  /** Milliseconds one evaluation of a file may run before it is stopped; 0 means no limit. */
  timeoutMs: number;
}

export { NORMALIZATIONS };
export const EVALUATE_ON: readonly EvaluateOn[] = ['save', 'type'];

export const DEFAULT_SETTINGS: Settings = {
  normalization: 'primitive',
  evaluateOn: 'save',
  indexOrder: 'lex',
  firstLabel: 1,
  layout: 'rows',
  limits: { maxCoordinates: DEFAULT_LIMITS.maxCoordinates, timeoutMs: 10_000 },
};

function pick<T extends string>(value: unknown, allowed: readonly T[], fallback: T): T {
  return typeof value === 'string' && (allowed as readonly string[]).includes(value) ? (value as T) : fallback;
}

/** A whole number ≥ `least`, given as a number or a numeric string; anything else is `fallback`. */
function count(value: unknown, least: number, fallback: number): number {
  const n = typeof value === 'string' && value.trim() !== '' ? Number(value) : value;
  return typeof n === 'number' && Number.isSafeInteger(n) && n >= least ? n : fallback;
}

/** The `limits` part, whether the client sends it nested (`limits: {…}`) or with dotted keys. */
function parseLimits(section: Record<string, unknown>): EvaluationLimits {
  const nested = section['limits'];
  const limits = typeof nested === 'object' && nested !== null ? (nested as Record<string, unknown>) : {};
  const value = (key: string) => limits[key] ?? section[`limits.${key}`];
  return {
    maxCoordinates: count(value('maxCoordinates'), 1, DEFAULT_SETTINGS.limits.maxCoordinates),
    timeoutMs: count(value('timeoutMs'), 0, DEFAULT_SETTINGS.limits.timeoutMs),
  };
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
    limits: parseLimits(section),
  };
}
