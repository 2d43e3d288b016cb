/**
 * What evaluating each statement produced, remembered between evaluations of
 * one document, so that an edit re-evaluates only the statements it affects.
 *
 * A statement's outcome depends on its own text, on the file's context (the
 * field, the conventions, the limits) and on the names it looks up while it
 * evaluates. Rather than guessing those names from the syntax, the evaluator
 * runs each statement against recording maps (`RecordingMap`): every lookup
 * of a name is written down with the *version* of the entry found (the memo
 * entry of the statement that set it, or "absent"), and every entry the
 * statement sets is written down too. A later evaluation that meets the same
 * text in the same context, with every recorded lookup finding the same
 * version again, replays the entry: it sets the same values (the very same
 * objects, so caches keyed on them keep working), and reports the same
 * results and problems, moved to where the statement now stands. Versions
 * are entries, compared by identity, so a change anywhere up a chain of
 * dependencies changes the version every dependent looks up, and only those
 * dependents are evaluated again.
 *
 * An outcome with a span outside its own statement (a problem pointing at the
 * declaration of a name it used) is not replayed, since that other statement
 * may have moved on its own; the statement is evaluated again, but it keeps
 * its entry as the version of what it sets, so its dependents still replay.
 *
 * One memo belongs to one document. After an evaluation that ran to the end,
 * `prune` forgets the entries it did not use, so the memo holds about one
 * document's worth of outcomes.
 */
import type { Binding } from './environment.js';
import { shiftSpans } from './shift-spans.js';
import type { Problem, Result, Span } from './types.js';
import type { SpaceInfo } from './values.js';

/** The version of a name's entry: the memo entry of the statement that set it, or a fixed marker. */
export type Version = object;

/** The entry set before any statement runs (a finite field's named generator). */
export const PRESET: Version = Object.freeze({ preset: true });

/** A lookup made while a statement evaluated: which map, which name (or every name), what version it found. */
interface Lookup {
  map: 'bindings' | 'spaces';
  /** `undefined` for a look at the whole map (iterating over it, or its size). */
  name?: string;
  /** For one name: its version, `undefined` when absent. For the whole map: every name's version, in order. */
  found: Version | undefined | readonly [string, Version][];
}

/** A binding as the memo keeps it: its value shared, its spans relative to the statement's start. */
interface KeptBinding {
  name: string;
  value: Binding['value'];
  declSpan: Span;
  nameSpan: Span;
}

export interface StatementEntry {
  readonly lookups: readonly Lookup[];
  readonly bindings: readonly KeptBinding[];
  readonly spaces: readonly [string, SpaceInfo][];
  /** Relative to the statement's start; `undefined` when the outcome cannot be replayed (see the file comment). */
  readonly outcome: { results: Result[]; problems: Problem[] } | undefined;
}

/**
 * A map that writes down the lookups and the changes made through it while a
 * statement is recorded, and the version of each of its entries.
 */
export class RecordingMap<V> extends Map<string, V> {
  private readonly versions = new Map<string, Version>();
  private lookups: Lookup[] | undefined;
  private sets: string[] | undefined;
  /** The version given to what is set now: the entry of the statement being evaluated. */
  private current: Version = PRESET;

  constructor(private readonly label: Lookup['map']) {
    super();
  }

  /** Starts recording for a statement whose sets get `version`. */
  record(version: Version, lookups: Lookup[], sets: string[]): void {
    this.current = version;
    this.lookups = lookups;
    this.sets = sets;
  }

  stopRecording(): void {
    this.lookups = undefined;
    this.sets = undefined;
    this.current = PRESET;
  }

  versionOf(name: string): Version | undefined {
    return this.versions.get(name);
  }

  snapshot(): readonly [string, Version][] {
    return [...this.versions.entries()];
  }

  /** Whether a lookup recorded earlier would find the same versions now. */
  agrees(lookup: Lookup): boolean {
    if (lookup.name !== undefined) return this.versions.get(lookup.name) === lookup.found;
    const found = lookup.found as readonly [string, Version][];
    if (found.length !== this.versions.size) return false;
    let i = 0;
    for (const [name, version] of this.versions) {
      const [keptName, keptVersion] = found[i++]!;
      if (name !== keptName || version !== keptVersion) return false;
    }
    return true;
  }

  /** Sets an entry with the version it had when it was first computed. */
  restore(name: string, value: V, version: Version): void {
    super.set(name, value);
    this.versions.set(name, version);
  }

  override get(name: string): V | undefined {
    this.lookups?.push({ map: this.label, name, found: this.versions.get(name) });
    return super.get(name);
  }

  override has(name: string): boolean {
    this.lookups?.push({ map: this.label, name, found: this.versions.get(name) });
    return super.has(name);
  }

  override set(name: string, value: V): this {
    super.set(name, value);
    // The constructor of Map calls `set` before the fields exist.
    this.versions?.set(name, this.current);
    this.sets?.push(name);
    return this;
  }

  override get size(): number {
    this.lookAtAll();
    return super.size;
  }

  override values(): MapIterator<V> {
    this.lookAtAll();
    return super.values();
  }

  override keys(): MapIterator<string> {
    this.lookAtAll();
    return super.keys();
  }

  override entries(): MapIterator<[string, V]> {
    this.lookAtAll();
    return super.entries();
  }

  override [Symbol.iterator](): MapIterator<[string, V]> {
    return this.entries();
  }

  override forEach(callback: (value: V, key: string, map: Map<string, V>) => void, thisArg?: unknown): void {
    this.lookAtAll();
    super.forEach(callback, thisArg);
  }

  private lookAtAll(): void {
    this.lookups?.push({ map: this.label, found: this.snapshot() });
  }
}

/** The maps of one evaluation that the memo records and restores. */
export interface RecordedMaps {
  bindings: RecordingMap<Binding>;
  spaces: RecordingMap<SpaceInfo>;
}

function isInside(span: Span, statement: Span): boolean {
  return span.start >= statement.start && span.end <= statement.end;
}

function spansOf(problem: Problem): Span[] {
  return [
    problem.span,
    ...(problem.related ?? []).map((r) => r.span),
    ...(problem.fixes ?? []).flatMap((f) => f.edits.map((e) => e.span)),
  ];
}

function shiftSpan(span: Span, delta: number): Span {
  return { start: span.start + delta, end: span.end + delta };
}

/** A result moved by `delta`; only its two spans are copied, its (possibly very long) texts are shared. */
function shiftResult(result: Result, delta: number): Result {
  return { ...result, span: shiftSpan(result.span, delta), anchor: shiftSpan(result.anchor, delta) };
}

export class EvaluationMemo {
  /** Entries by context and statement text; several when the same text met different versions of its names. */
  private readonly entries = new Map<string, StatementEntry[]>();
  private used = new Set<StatementEntry>();

  /** How many statements the last evaluation replayed and evaluated (for tests and measurements). */
  replayed = 0;
  evaluated = 0;

  /** The entry for this statement whose lookups all agree with the maps now, if any. */
  find(key: string, maps: RecordedMaps): StatementEntry | undefined {
    const candidates = this.entries.get(key);
    if (!candidates) return undefined;
    const found = candidates.find((entry) => entry.lookups.every((l) => maps[l.map].agrees(l)));
    if (found) this.used.add(found);
    return found;
  }

  /**
   * Runs `evaluate` for the statement at `span`, recording it; returns what it produced. `unreplayable`
   * is the entry `find` gave for this statement when its outcome could not be replayed: the statement
   * takes the same path again (its lookups agreed), so that entry stays the version of what it sets.
   */
  record(
    key: string,
    span: Span,
    maps: RecordedMaps,
    evaluate: () => { results: Result[]; problems: Problem[] },
    unreplayable?: StatementEntry,
  ): { results: Result[]; problems: Problem[] } {
    const lookups: Lookup[] = [];
    const bindingSets: string[] = [];
    const spaceSets: string[] = [];
    // The entry object exists before its contents, since it is the version the statement's sets carry.
    const entry = (unreplayable ?? {}) as { -readonly [K in keyof StatementEntry]: StatementEntry[K] };
    maps.bindings.record(entry, lookups, bindingSets);
    maps.spaces.record(entry, lookups, spaceSets);
    let produced: { results: Result[]; problems: Problem[] };
    try {
      produced = evaluate();
    } finally {
      maps.bindings.stopRecording();
      maps.spaces.stopRecording();
    }
    if (unreplayable) return produced;
    const replayable =
      produced.results.every((r) => isInside(r.span, span) && isInside(r.anchor, span)) &&
      produced.problems.every((p) => spansOf(p).every((s) => isInside(s, span)));
    entry.lookups = lookups;
    entry.bindings = [...new Set(bindingSets)].map((name) => {
      const b = unrecordedGet(maps.bindings, name);
      return { name, value: b.value, declSpan: shiftSpan(b.declSpan, -span.start), nameSpan: shiftSpan(b.nameSpan, -span.start) };
    });
    entry.spaces = [...new Set(spaceSets)].map((name) => [name, unrecordedGet(maps.spaces, name)] as [string, SpaceInfo]);
    entry.outcome = replayable
      ? { results: produced.results.map((r) => shiftResult(r, -span.start)), problems: shiftSpans(produced.problems, -span.start) }
      : undefined;
    const list = this.entries.get(key) ?? [];
    list.push(entry);
    this.entries.set(key, list);
    this.used.add(entry);
    return produced;
  }

  /**
   * Replays `entry` for the statement now at `span`: sets what it set, with the versions it gave them, and
   * returns its results and problems moved there.
   */
  replay(entry: StatementEntry, span: Span, maps: RecordedMaps): { results: Result[]; problems: Problem[] } {
    for (const b of entry.bindings) {
      maps.bindings.restore(b.name, { value: b.value, declSpan: shiftSpan(b.declSpan, span.start), nameSpan: shiftSpan(b.nameSpan, span.start) }, entry);
    }
    for (const [name, space] of entry.spaces) maps.spaces.restore(name, space, entry);
    const outcome = entry.outcome!;
    return { results: outcome.results.map((r) => shiftResult(r, span.start)), problems: shiftSpans(outcome.problems, span.start) };
  }

  /** After an evaluation that reached the end: forget every entry it did not use. */
  prune(): void {
    for (const [key, list] of this.entries) {
      const kept = list.filter((entry) => this.used.has(entry));
      if (kept.length === 0) this.entries.delete(key);
      else this.entries.set(key, kept);
    }
    this.used = new Set();
  }

  /** Begins an evaluation: the count of uses starts again. */
  begin(): void {
    this.used = new Set();
    this.replayed = 0;
    this.evaluated = 0;
  }

  get size(): number {
    let n = 0;
    for (const list of this.entries.values()) n += list.length;
    return n;
  }
}

/** Reads an entry the statement has just set, without recording a lookup. */
function unrecordedGet<V>(map: RecordingMap<V>, name: string): V {
  return Map.prototype.get.call(map, name) as V;
}
