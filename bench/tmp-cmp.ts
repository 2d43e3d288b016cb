import { pluckerModular, emptyModularWalkCounts } from '../server/src/engine/plucker-modular.js';
import { mulAddMod, dotMod, mulMod } from '../server/src/engine/modular-arithmetic.js';
let s = 12345;
const rnd = () => { s = (s * 1103515245 + 12345) % 2147483648; return s; };
const p = 2147483647; const r = 1/p;
const [k, n] = [10, 20];
const rows = Array.from({length:k},()=>Array.from({length:n},()=>rnd()%p));
const c = emptyModularWalkCounts(); pluckerModular(rows, n, p, c);
const N = 1 << 12; const x = new Int32Array(N), y = new Int32Array(N), o = new Int32Array(N);
for (let i = 0; i < N; i++) { x[i] = rnd() % p; y[i] = rnd() % p; }
function floor() {
  let u = c.updates; let acc = 0;
  while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = mulAddMod(x[i], 12345, y[i], p, r); u -= m; }
  u = c.dots; while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = dotMod(x[i], 12345, y[i], 777, p, r); u -= m; }
  u = c.products; while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = mulMod(x[i], y[i], p, r); u -= m; }
}
let bo = Infinity, bf = Infinity;
const cpu = (f: () => void) => { const a = process.cpuUsage(); f(); const b = process.cpuUsage(a); return (b.user + b.system) / 1000; };
for (let rep = 0; rep < 60; rep++) {
  bo = Math.min(bo, cpu(() => pluckerModular(rows, n, p)));
  bf = Math.min(bf, cpu(floor));
}
console.log('ours', bo.toFixed(2), 'floor', bf.toFixed(2), 'ratio', (bo/bf).toFixed(2), 'ns/coord', (bo*1e6/184756).toFixed(0));
