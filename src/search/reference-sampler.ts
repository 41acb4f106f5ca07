/**
 * The plain sampler: one tfjs `model.predict` on the full 2N-entry inputs per decision step.
 * Kept as the baseline that the fast sampler is measured against (tests/bench/sampler.bench.ts),
 * and as a second implementation drawing from the same streams, so both give the same graphs.
 */
import { type TfModule } from './backend.js';
import { type PolicyWeights, buildTfjsModel, pairCount } from './policy.js';
import { episodeRng } from './random.js';
import { type SampleRequest } from './sampler.js';
import type * as tfTypes from '@tensorflow/tfjs';

export function sampleWithPredict(tf: TfModule, weights: PolicyWeights, req: SampleRequest): Uint8Array {
  const n = pairCount(weights.shape.order);
  const model = buildTfjsModel(tf, weights);
  const count = req.count;
  const bits = new Uint8Array(count * n);
  const input = new Float32Array(count * 2 * n);
  const rngs = Array.from({ length: count }, (_, b) =>
    episodeRng(req.seed, req.iteration, req.firstEpisode + b),
  );
  for (let i = 0; i < n; i++) {
    for (let b = 0; b < count; b++) {
      if (i > 0) input[b * 2 * n + n + i - 1] = 0;
      input[b * 2 * n + n + i] = 1;
    }
    const x = tf.tensor2d(input, [count, 2 * n]);
    const y = model.predict(x) as tfTypes.Tensor;
    const probs = y.dataSync();
    tf.dispose([x, y]);
    for (let b = 0; b < count; b++) {
      const q = Math.min(1 - req.clamp, Math.max(req.clamp, probs[b]));
      const bit = rngs[b]() < q ? 1 : 0;
      bits[b * n + i] = bit;
      input[b * 2 * n + i] = bit;
    }
  }
  model.dispose();
  return bits;
}
