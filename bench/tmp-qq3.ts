import { pluckerMultimodular, emptyMultimodularReport } from '../server/src/engine/plucker-multimodular.js';
import { pluckerFractionFree } from '../server/src/engine/plucker-fraction-free.js';
import { rational } from '../server/src/engine/rational.js';
import { compare } from './timing.js';
let s = 12345n;
const rnd = () => { s = (s * 6364136223846793005n + 1442695040888963407n) % (1n << 64n); return s; };
for (const [k, n] of [[5,15],[8,16],[10,20]]) for (const bits of [4, 8, 12, 16, 24, 32, 48]) {
  const rows = Array.from({length:k},()=>Array.from({length:n},()=> rational(rnd() % (1n << BigInt(bits)) - (1n << BigInt(bits - 1)))));
  const rep = emptyMultimodularReport(); pluckerMultimodular(rows, n, rep, 1000);
  const c = compare([{ name: 'mm', run: () => pluckerMultimodular(rows, n, undefined, 1000) }, { name: 'ff', run: () => pluckerFractionFree(rows, n) }], 3, 60);
  console.log(k, n, bits, 'primes', rep.primes, 'mm', c.times.get('mm')!.toFixed(2), 'ff', c.times.get('ff')!.toFixed(2), 'ff/mm', c.ratios.get('ff')!.toFixed(2));
}
