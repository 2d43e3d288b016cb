/** The performance targets of docs/performance.md, checked against one run's results. */
import type { DecomposeResult } from './decompose.js';
import type { PluckerResult } from './plucker.js';
import type { ServerResult } from './server.js';
import { markdownTable, ms, nanoseconds, times } from './table.js';

interface Target {
  target: string;
  measured: string;
  met: boolean | undefined;
}

function p95(values: readonly number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.max(0, Math.ceil(0.95 * sorted.length) - 1)]!;
}

export function pluckerTargets(results: readonly PluckerResult[]): Target[] {
  const at = (kind: string) => results.find((r) => r.kind === kind && r.k === 10 && r.n === 20);
  const out: Target[] = [];
  const qq = at('QQ small');
  if (qq) {
    const perCoord = (qq.oursMs * 1e6) / qq.coordinates;
    out.push({ target: 'G(10,20) over QQ, small entries: ≤ 1 µs per coordinate (< 200 ms)', measured: `${ms(qq.oursMs)} ms, ${nanoseconds(perCoord)}`, met: perCoord <= 1000 });
  }
  const gf = at('GF(p)');
  if (gf) {
    const perCoord = (gf.oursMs * 1e6) / gf.coordinates;
    out.push({ target: 'G(10,20) over GF(p), p < 2^31: ≤ 100 ns per coordinate', measured: `${ms(gf.oursMs)} ms, ${nanoseconds(perCoord)}`, met: perCoord <= 100 });
  }
  for (const kind of ['QQ small', 'QQ large', 'GF(p)']) {
    const r = at(kind);
    if (r) out.push({ target: `G(10,20) ${kind}: ≥ 50× faster than Bareiss per minor`, measured: times(r.vsBareiss), met: r.vsBareiss >= 50 });
  }
  const slowest = [...results].sort((a, b) => a.vsBareiss - b.vsBareiss)[0];
  if (slowest) {
    out.push({
      target: 'faster than Bareiss per minor at every size in the table',
      measured: `least: ${times(slowest.vsBareiss)} (${slowest.kind} G(${slowest.k},${slowest.n}))`,
      met: slowest.vsBareiss > 1,
    });
  }
  for (const [label, kinds, limit] of [
    ['QQ', ['QQ small', 'QQ large'], 3],
    ['GF(p)', ['GF(p)'], 2],
  ] as const) {
    const rows = results.filter((r) => (kinds as readonly string[]).includes(r.kind));
    const worst = [...rows].sort((a, b) => b.overFloor - a.overFloor)[0];
    const big = rows.filter((r) => r.k === 10);
    if (worst) {
      out.push({
        target: `within ${limit}× of the floor over ${label}`,
        measured: `G(10,20): ${big.map((r) => `${r.kind} ${times(r.overFloor)}`).join(', ')}; worst ${times(worst.overFloor)} (${worst.kind} G(${worst.k},${worst.n}))`,
        met: worst.overFloor <= limit,
      });
    }
  }
  return out;
}

export function decomposeTargets(results: readonly DecomposeResult[]): Target[] {
  const rows = results.filter((r) => r.n === 12 && r.kind === 'decomposable');
  if (rows.length === 0) return [];
  const least = [...rows].sort((a, b) => a.speedup - b.speedup)[0]!;
  return [
    {
      target: 'decomposability ≥ 20× faster than evaluating all relations at n = 12',
      measured: `decomposable inputs, k = 2..5: ${rows.map((r) => times(r.speedup)).join(', ')} (least ${times(least.speedup)})`,
      met: least.speedup >= 20,
    },
  ];
}

export function serverTargets(result: ServerResult): Target[] {
  const out: Target[] = [];
  const thousand = result.documents.find((d) => d.lines >= 900 && d.lines <= 1100);
  if (thousand) {
    const raw = p95(thousand.keystroke);
    const typing = p95(thousand.typing);
    out.push({
      target: 'keystroke → diagnostics p95 < 50 ms in a 1000-line file',
      measured: `${ms(raw)} ms (quick pass); ${ms(typing)} ms re-evaluating the edited statement and its dependents (evaluateOn: type)`,
      met: raw < 50,
    });
  }
  const worstHover = Math.max(...result.documents.map((d) => p95(d.hover)));
  out.push({ target: 'hover p95 < 5 ms', measured: `worst p95 over the files: ${ms(worstHover)} ms`, met: worstHover < 5 });
  const cold = [...result.coldInitializeMs].sort((a, b) => a - b)[Math.floor(result.coldInitializeMs.length / 2)]!;
  out.push({ target: 'cold start < 300 ms (spawn → initialize answered)', measured: `median ${ms(cold)} ms`, met: cold < 300 });
  return out;
}

export function targetTable(targets: readonly Target[]): string {
  return markdownTable(
    ['target', 'measured', 'met'],
    targets.map((t) => [t.target, t.measured, t.met === undefined ? '–' : t.met ? 'yes' : 'no']),
  );
}
