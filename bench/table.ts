/** Markdown tables and number formats for the benchmark reports. */

export function markdownTable(header: readonly string[], rows: readonly (readonly string[])[]): string {
  const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => (r[i] ?? '').length)));
  const line = (cells: readonly string[]) => `| ${cells.map((c, i) => c.padEnd(widths[i]!)).join(' | ')} |`;
  return [line(header), `|${widths.map((w) => '-'.repeat(w + 2)).join('|')}|`, ...rows.map(line)].join('\n');
}

/** Milliseconds with three significant digits. */
export function ms(x: number): string {
  if (x >= 100) return x.toFixed(0);
  if (x >= 10) return x.toFixed(1);
  if (x >= 1) return x.toFixed(2);
  return x.toPrecision(2);
}

/** A ratio such as 12× or 0.8×. */
export function times(x: number): string {
  if (!Number.isFinite(x)) return '–';
  if (x >= 100) return `${x.toFixed(0)}×`;
  if (x >= 10) return `${x.toFixed(1)}×`;
  return `${x.toFixed(2)}×`;
}

export function nanoseconds(x: number): string {
  return x >= 100 ? `${x.toFixed(0)} ns` : `${x.toFixed(1)} ns`;
}
