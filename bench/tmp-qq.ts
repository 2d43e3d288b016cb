import { pluckerMultimodular, emptyMultimodularReport } from '../server/src/engine/plucker-multimodular.js';
import { pluckerFractionFree } from '../server/src/engine/plucker-fraction-free.js';
import { QQ, rational } from '../server/src/engine/rational.js';
let s = 12345n;
const rnd = () => { s = (s * 6364136223846793005n + 1442695040888963407n) % (1n << 64n); return s; };
const cpu = (f: () => void) => { const a = process.cpuUsage(); f(); const b = process.cpuUsage(a); return (b.user + b.system) / 1000; };
for (const [label, bits] of [['small', 0], ['large', 63]] as const) {
  for (const [k, n] of [[4,12],[5,15],[8,16],[10,20]]) {
    const rows = Array.from({length:k},()=>Array.from({length:n},()=> bits === 0 ? rational(rnd() % 19n - 9n) : rational((rnd() >> 1n) - (1n << 62n))));
    const rep = emptyMultimodularReport();
    const a = pluckerMultimodular(rows, n, rep)!;
    let tm = Infinity, tf = Infinity;
    for (let i = 0; i < 3; i++) { tm = Math.min(tm, cpu(() => pluckerMultimodular(rows, n))); }
    let b: any; tf = cpu(() => { b = pluckerFractionFree(rows, n); });
    for (let i = 0; i < a.length; i++) if (!QQ.eq(a[i], b[i])) throw new Error('mismatch ' + i);
    console.log(label, k, n, 'primes', rep.primes, 'mm', tm.toFixed(1), 'ff', tf.toFixed(1), 'ns/coord', (tm * 1e6 / a.length).toFixed(0));
  }
}
