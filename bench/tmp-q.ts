import { dot4Mod } from '../server/src/engine/modular-arithmetic.js';
import { pluckerModular, emptyModularWalkCounts } from '../server/src/engine/plucker-modular.js';
let s = 12345;
const rnd = () => { s = (s * 1103515245 + 12345) % 2147483648; return s; };
const p = 2147483647; const r = 1/p;
const cpu = (f: () => void) => { const a = process.cpuUsage(); f(); const b = process.cpuUsage(a); return (b.user + b.system) / 1000; };
for (const n of [40, 20, 10, 6]) {
  const rows = Array.from({length:4},()=>Array.from({length:n},()=>rnd()%p));
  const c = emptyModularWalkCounts(); pluckerModular(rows, n, p, c);
  const reps = Math.ceil(400000 / c.quadruples);
  const N = 1 << 12; const x = new Int32Array(N), y = new Int32Array(N), o = new Int32Array(N);
  for (let i = 0; i < N; i++) { x[i] = rnd() % p; y[i] = rnd() % p; }
  let bo = Infinity, bf = Infinity;
  for (let it = 0; it < 20; it++) {
    bo = Math.min(bo, cpu(() => { for (let i = 0; i < reps; i++) pluckerModular(rows, n, p); }));
    bf = Math.min(bf, cpu(() => { let u = reps * c.quadruples; while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = dot4Mod(x[i], 12345, y[i], 777, x[i], y[i], o[i], 55, p, r); u -= m; } }));
  }
  console.log(n, JSON.stringify(c), 'ours', bo.toFixed(2), 'floor(quads only)', bf.toFixed(2), (bo/bf).toFixed(2));
}
