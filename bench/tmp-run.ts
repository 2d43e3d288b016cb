import { runPluckerBenchmark, pluckerTable } from './plucker.js';
const t = Date.now();
const r = runPluckerBenchmark({ rounds: 1, budgetMs: 20, sampleSize: 200 }, console.log);
console.log(pluckerTable(r));
console.log((Date.now() - t) / 1000, 's');
