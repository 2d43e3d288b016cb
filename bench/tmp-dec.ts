import { decompose } from '../server/src/engine/decompose.js';
import { pluckerMultivector } from '../server/src/engine/plucker.js';
import { add } from '../server/src/engine/multivector.js';
import { QQ, rational } from '../server/src/engine/rational.js';
import { compare } from './timing.js';
import { Random } from './random.js';
const random = new Random(3);
const plane = (k: number, n: number) => Array.from({ length: k }, () => Array.from({ length: n }, () => rational(BigInt(random.integer(-9, 9)))));
for (const [k, n] of [[2, 12], [3, 12], [4, 12], [5, 12], [5, 14]]) {
  const w = pluckerMultivector(QQ, plane(k, n), n);
  const v = add(QQ, w, pluckerMultivector(QQ, plane(k, n), n));
  const res = compare([{ name: 'dec', run: () => decompose(QQ, w) }, { name: 'nondec', run: () => decompose(QQ, v) }], 2, 100);
  console.log(k, n, w.terms.size, decompose(QQ, w).kind, decompose(QQ, v).kind, res.times);
}
