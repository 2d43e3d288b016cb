import { pluckerMultimodular } from '../server/src/engine/plucker-multimodular.js';
import { pluckerModular } from '../server/src/engine/plucker-modular.js';
import { rational } from '../server/src/engine/rational.js';
let s = 12345n;
const rnd = () => { s = (s * 6364136223846793005n + 1442695040888963407n) % (1n << 64n); return s; };
const cpu = (f: () => void) => { const a = process.cpuUsage(); f(); const b = process.cpuUsage(a); return (b.user + b.system) / 1000; };
const rows = Array.from({length:10},()=>Array.from({length:20},()=> rational(rnd() % 19n - 9n)));
const nums = rows.map(r => r.map(x => { const v = Number(x.num) % 2147483647; return v < 0 ? v + 2147483647 : v; }));
for (let i = 0; i < 8; i++) console.log(cpu(() => pluckerMultimodular(rows, 20)).toFixed(1), cpu(() => pluckerModular(nums, 20, 2147483647)).toFixed(1), cpu(() => { const a = new Array(184756); for (let j = 0; j < a.length; j++) a[j] = { num: BigInt(j * 1000003), den: 1n }; }).toFixed(1));
