import { runDecomposeBenchmark, decomposeTable } from './decompose.js';
const t = Date.now();
const r = runDecomposeBenchmark({ rounds: 1, budgetMs: 30 }, console.log);
console.log(decomposeTable(r)); console.log((Date.now() - t) / 1000, 's');
