/**
 * The in-process batch source: samples with the fast sampler and scores with a plain evaluator
 * callback on this thread. The worker-thread source (worker-source.ts) gives the same results.
 */
import { fromUpperTriangleBits } from '../graph/builders.js';
import { type Graph } from '../graph/graph.js';
import { type TfModule } from './backend.js';
import { type BatchSource, type Evaluation } from './hunt.js';
import { type PolicyWeights, pairCount } from './policy.js';
import { FastSampler, type SampledBatch } from './sampler.js';

export function localBatchSource(
  tf: TfModule,
  seed: string,
  evaluate: (g: Graph) => Evaluation,
): BatchSource {
  return {
    async sample(
      weights: PolicyWeights,
      iteration: number,
      count: number,
      clamp: number,
    ): Promise<SampledBatch> {
      const sampler = new FastSampler(tf, weights);
      try {
        return sampler.sample({ seed, iteration, firstEpisode: 0, count, clamp });
      } finally {
        sampler.dispose();
      }
    },
    async evaluate(order: number, bits: Uint8Array, count: number): Promise<Evaluation[]> {
      const n = pairCount(order);
      const out: Evaluation[] = [];
      for (let b = 0; b < count; b++)
        out.push(evaluate(fromUpperTriangleBits(order, bits.subarray(b * n, (b + 1) * n))));
      return out;
    },
  };
}
