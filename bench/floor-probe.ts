import { mulAddMod } from '../server/src/engine/modular-arithmetic.js';
import { compare } from './timing.js';
const p0 = 2147483647;
const N = 4096;
const a = new Int32Array(N).map((_, i) => (i * 7919 * 104729) % p0), b = a.map((x) => (x * 3) % p0), c = a.map((x) => (x * 5) % p0), o = new Int32Array(N);
function inlineLoops(total: number, p: number) { const r = 1 / p; for (let left = total; left > 0; left -= N) { const m = Math.min(left, N); for (let i = 0; i < m; i++) o[i] = mulAddMod(a[i]!, b[i]!, c[i]!, p, r); } }
function closureLoops(total: number, p: number) { const r = 1 / p; const loop = (t: number, body: (m: number) => void) => { for (let left = t; left > 0; left -= N) body(Math.min(left, N)); }; loop(total, (m) => { for (let i = 0; i < m; i++) o[i] = mulAddMod(a[i]!, b[i]!, c[i]!, p, r); }); }
function constLoops(total: number) { for (let left = total; left > 0; left -= N) { const m = Math.min(left, N); for (let i = 0; i < m; i++) o[i] = mulAddMod(a[i]!, 12345, c[i]!, p0, 1 / p0); } }
const res = compare([{ name: 'inline', run: () => inlineLoops(1e6, p0) }, { name: 'closure', run: () => closureLoops(1e6, p0) }, { name: 'const', run: () => constLoops(1e6) }], 5, 100);
console.log(res.times);
