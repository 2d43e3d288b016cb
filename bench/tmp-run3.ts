import { runDecomposeBenchmark, decomposeTable } from './decompose.js';
const t = Date.now();
const r = runDecomposeBenchmark({ rounds: 3, budgetMs: 40 }, console.log);
console.log(decomposeTable(r)); console.log((Date.now() - t) / 1000, 's');
