import { runPluckerBenchmark, pluckerTable } from './plucker.js';
const r = runPluckerBenchmark({ rounds: 3, budgetMs: 60, sampleSize: 200, kinds: ['GF(p)'] }, console.log);
console.log(pluckerTable(r));
