import { pluckerCoordinates } from '../server/src/engine/plucker.js';
import { pluckerFractionFree } from '../server/src/engine/plucker-fraction-free.js';
import { QQ, rational } from '../server/src/engine/rational.js';
import { compare } from './timing.js';
import { Random } from './random.js';
const random = new Random(5);
for (const [k, n] of [[2, 8], [3, 9], [4, 12]]) {
  const rows = Array.from({ length: k }, () => Array.from({ length: n }, () => rational(BigInt(random.integer(-9, 9)))));
  const res = compare([{ name: 'ours', run: () => pluckerCoordinates(QQ, rows, n) }, { name: 'ff', run: () => pluckerFractionFree(rows, n) }], 5, 50);
  console.log(k, n, res.times, res.calls);
}
