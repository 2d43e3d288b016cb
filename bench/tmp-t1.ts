import { pluckerCoordinates } from '../server/src/engine/plucker.js';
import { pluckerModular, emptyModularWalkCounts } from '../server/src/engine/plucker-modular.js';
import { primeField } from '../server/src/engine/prime-field.js';
let s = 12345;
const rnd = () => { s = (s * 1103515245 + 12345) % 2147483648; return s; };
for (const p of [2, 3, 7, 101, 2147483647, 2147483629]) {
  const F = { ...primeField(BigInt(p)) };
  for (const [k, n] of [[2,5],[3,7],[4,9],[5,10],[6,12],[1,4],[3,3],[4,4],[4,5],[3,4],[7,8],[5,5],[5,6],[6,9],[8,11]]) {
    for (let rep = 0; rep < 20; rep++) {
      const rows = Array.from({length:k},()=>Array.from({length:n},()=> rnd() % 3 === 0 ? 0 : rnd() % p));
      if (rep % 4 === 1) rows[k-1] = rows[0].slice();
      const a = pluckerCoordinates(F, rows, n);
      const b = pluckerModular(rows, n, p);
      for (let i = 0; i < a.length; i++) if (a[i] !== b[i]) { console.log('MISMATCH', p, k, n, i, a[i], b[i]); process.exit(1); }
    }
  }
}
console.log('ok');
const p = 2147483647;
for (const [k, n] of [[2,8],[3,9],[4,12],[5,15],[8,16],[10,20]]) {
  const rows = Array.from({length:k},()=>Array.from({length:n},()=>rnd()%p));
  const c = emptyModularWalkCounts();
  pluckerModular(rows, n, p, c);
  let best = Infinity;
  for (let r = 0; r < 5; r++) { const t = performance.now(); pluckerModular(rows, n, p); best = Math.min(best, performance.now()-t); }
  console.log(k, n, best.toFixed(2), 'ms', (best*1e6/c.dots/ 1).toFixed(1), JSON.stringify(c));
}
import { mulAddMod, dotMod, mulMod } from '../server/src/engine/modular-arithmetic.js';
{
  const N = 1 << 12; const x = new Int32Array(N), y = new Int32Array(N), o = new Int32Array(N);
  for (let i = 0; i < N; i++) { x[i] = rnd() % p; y[i] = rnd() % p; }
  const r = 1 / p;
  for (let rep = 0; rep < 3; rep++) {
    let t = performance.now();
    for (let it = 0; it < 212; it++) for (let i = 0; i < N; i++) o[i] = mulAddMod(x[i], 12345, y[i], p, r);
    const a = performance.now() - t;
    t = performance.now();
    for (let it = 0; it < 45; it++) for (let i = 0; i < N; i++) o[i] = dotMod(x[i], 12345, y[i], 777, p, r);
    const b = performance.now() - t;
    console.log('floor-ish updates', a.toFixed(2), 'dots', b.toFixed(2));
  }
}
