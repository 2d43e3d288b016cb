// The k-subsets of {0, …, n−1} in lexicographic order, written out independently of the engine.
export function subsets(n: number, k: number): number[][] {
  if (k === 0) return [[]];
  const out: number[][] = [];
  for (let first = 0; first <= n - k; first++) {
    for (const rest of subsets(n - first - 1, k - 1)) out.push([first, ...rest.map((x) => x + first + 1)]);
  }
  return out;
}
