import { dot3Mod } from '../server/src/engine/modular-arithmetic.js';
import * as M from '../server/src/engine/plucker-modular.js';
let s = 12345;
const rnd = () => { s = (s * 1103515245 + 12345) % 2147483648; return s; };
const p = 2147483647; const r = 1/p;
for (const n of [20, 8, 5]) {
const rows = Array.from({length:3},()=>Array.from({length:n},()=>rnd()%p));
const reps = Math.round(200000 / (n*(n-1)*(n-2)/6));
let bo = Infinity, bf = Infinity;
const N = 1 << 12; const x = new Int32Array(N), y = new Int32Array(N), o = new Int32Array(N);
for (let i = 0; i < N; i++) { x[i] = rnd() % p; y[i] = rnd() % p; }
for (let it = 0; it < 20; it++) {
  let t = performance.now(); for (let i = 0; i < reps; i++) M.pluckerModular(rows, n, p); bo = Math.min(bo, performance.now() - t);
  t = performance.now(); let u = 200000; while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = dot3Mod(x[i], 12345, y[i], 777, x[i], y[i], p, r); u -= m; } bf = Math.min(bf, performance.now() - t);
}
console.log(n, 'ours', bo.toFixed(2), 'floor', bf.toFixed(2));
}
