/**
 * Sampler benchmark (DESIGN.md "Performance targets"): 1000 graphs on 19 vertices (171 edge
 * decisions each), layers 128,64,4, with the fast incremental sampler on this thread, the same
 * spread over 2 worker threads, and the plain tfjs predict-per-step loop, in one run, printed with
 * the ratio. Targets: <= 100 ms per batch and >= 50x the plain loop.
 */
import { fileURLToPath } from 'node:url';
import { startTensorflow, tf } from '../../src/search/backend.js';
import { initialWeights } from '../../src/search/policy.js';
import { iterationRng } from '../../src/search/random.js';
import { FastSampler } from '../../src/search/sampler.js';
import { sampleWithPredict } from '../../src/search/reference-sampler.js';
import { workerBatchSource } from '../../src/search/worker-source.js';

const conjecture = fileURLToPath(new URL('../fixtures/conjectures/max-degree-7.ts', import.meta.url));

async function bestOf<T>(repeats: number, fn: () => T | Promise<T>): Promise<number> {
  let best = Infinity;
  for (let r = 0; r < repeats; r++) {
    const t0 = performance.now();
    await fn();
    best = Math.min(best, performance.now() - t0);
  }
  return best;
}

export default async function samplerBench(): Promise<void> {
  const backend = await startTensorflow(1);
  const weights = initialWeights({ order: 19, hidden: [128, 64, 4] }, iterationRng('bench', 'init', 0));
  const request = { seed: 'bench', iteration: 0, firstEpisode: 0, count: 1000, clamp: 0 };
  const sampler = new FastSampler(tf, weights);
  sampler.sample({ ...request, count: 50 });
  const fast = await bestOf(5, () => sampler.sample(request));
  sampler.dispose();
  const workers = await workerBatchSource(2, 'bench', conjecture, 'max-degree-7');
  await workers.sample(weights, 0, 100, 0);
  const parallel = await bestOf(5, () => workers.sample(weights, 0, 1000, 0));
  await workers.close?.();
  const plain = await bestOf(1, () => sampleWithPredict(tf, weights, request));
  console.log(
    `backend ${backend}; 1000 graphs, n = 19 (171 decisions), layers 128,64,4; best of 5 (plain: 1 run)`,
  );
  console.log(`  plain predict per step    ${plain.toFixed(0).padStart(6)} ms`);
  console.log(
    `  fast sampler, 1 thread    ${fast.toFixed(0).padStart(6)} ms   ${(plain / fast).toFixed(1)}x plain   (target <= 100 ms, >= 50x)`,
  );
  console.log(
    `  fast sampler, 2 workers   ${parallel.toFixed(0).padStart(6)} ms   ${(plain / parallel).toFixed(1)}x plain`,
  );
}
