import { startTensorflow, tf } from './src/search/backend.js';
import { HUNT_DEFAULTS, initialHuntState, runIteration, type HuntOptions } from './src/search/hunt.js';
import { localBatchSource } from './src/search/local-source.js';
import { InvariantMemo } from './src/invariants/registry.js';
await startTensorflow(1);
const order = Number(process.argv[2] ?? 8);
const o: HuntOptions = { ...HUNT_DEFAULTS, seed: process.argv[3] ?? '1', order, batch: 200, connected: false, explore: process.argv[4] !== 'plain' };
const src = localBatchSource(tf, o.seed, (g) => {
  const m = new InvariantMemo(g);
  if ((m.get('triangleCount') as number) !== 0) return { inDomain: false };
  return { inDomain: true, score: g.size - Math.floor(order * order / 4) + 0.5 };
});
let s = initialHuntState(o);
const t0 = performance.now();
for (let it = 0; it < 300; it++) {
  const r = await runIteration(tf, o, s, src, (_g, e) => (e.inDomain && e.score > 0 ? 'numerical' : null));
  s = r.state;
  if (it % 10 === 0 || r.report.newCounterexamples.length) console.log(it, r.report.best, r.report.eliteMean.toFixed(2), r.report.distinctFraction.toFixed(2), r.report.meanEntropy.toFixed(3), r.report.inDomainFraction.toFixed(2), r.report.action, r.report.newCounterexamples.map(c => c.key).join(' '), JSON.stringify(r.report.timings, (k, v) => typeof v === 'number' ? Math.round(v) : v));
  if (r.report.newCounterexamples.length) break;
}
console.log('ms', performance.now() - t0);
