import { pluckerModular, emptyModularWalkCounts } from '../server/src/engine/plucker-modular.js';
import { mulAddMod, dotMod, mulMod, dot3Mod, dot4Mod } from '../server/src/engine/modular-arithmetic.js';
import { modularFloor } from './floor.js';
import { compare } from './timing.js';
let s = 12345;
const rnd = () => { s = (s * 1103515245 + 12345) % 2147483648; return s; };
const p = 2147483647; const r = 1/p;
const rows = Array.from({length:10},()=>Array.from({length:20},()=>rnd()%p));
const c = emptyModularWalkCounts(); pluckerModular(rows, 20, p, c);
console.log(c);
const N = 1 << 12; const x = new Int32Array(N), y = new Int32Array(N), o = new Int32Array(N);
for (let i = 0; i < N; i++) { x[i] = rnd() % p; y[i] = rnd() % p; }
function floor() {
  let u = c.updates;
  while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = mulAddMod(x[i], 12345, y[i], p, r); u -= m; }
  u = c.dots; while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = dotMod(x[i], 12345, y[i], 777, p, r); u -= m; }
  u = c.triples; while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = dot3Mod(x[i], 12345, y[i], 777, x[i], y[i], p, r); u -= m; }
  u = c.quadruples; while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = dot4Mod(x[i], 12345, y[i], 777, x[i], y[i], y[i], x[i], p, r); u -= m; }
  u = c.products; while (u > 0) { const m = Math.min(u, N); for (let i = 0; i < m; i++) o[i] = mulMod(x[i], y[i], p, r); u -= m; }
}
const f2 = modularFloor(c, p);
const res = compare([{ name: 'ours', run: () => pluckerModular(rows, 20, p) }, { name: 'floorA', run: floor }, { name: 'floorB', run: f2 }], 5, 100);
console.log(res.times);
