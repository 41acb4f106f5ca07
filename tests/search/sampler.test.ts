import { beforeAll, describe, expect, test } from 'vitest';
import type * as tfTypes from '@tensorflow/tfjs';
import { startTensorflow, tf } from '../../src/search/backend.js';
import { buildTfjsModel, initialWeights, pairCount, policyInput } from '../../src/search/policy.js';
import { iterationRng } from '../../src/search/random.js';
import { FastSampler, binaryEntropy } from '../../src/search/sampler.js';
import { sampleWithPredict } from '../../src/search/reference-sampler.js';

beforeAll(async () => {
  await startTensorflow(1);
});

describe('FastSampler', () => {
  for (const [order, hidden] of [
    [7, [16, 8, 4]],
    [10, [128, 64, 4]],
  ] as const) {
    test(`sample() probabilities equal model.predict on the visited states within 1e-5 (n=${order}, layers ${hidden})`, () => {
      const shape = { order, hidden: [...hidden] };
      // Non-zero biases too, so the position term's bias handling is exercised.
      const w = initialWeights(shape, iterationRng('sampler-test', 'init', order));
      const rng = iterationRng('sampler-test', 'bias', order);
      for (const b of w.biases) for (let i = 0; i < b.length; i++) b[i] = (rng() - 0.5) * 0.4;
      const sampler = new FastSampler(tf, w);
      const batch = sampler.sample({
        seed: 't',
        iteration: 0,
        firstEpisode: 0,
        count: 40,
        clamp: 0,
        recordProbabilities: true,
      });
      sampler.dispose();
      const n = pairCount(order);
      // The reference: the tfjs model itself on the dense 2N inputs of every visited state.
      const model = buildTfjsModel(tf, w);
      const inputs = new Float32Array(40 * n * 2 * n);
      for (let b = 0; b < 40; b++) {
        for (let i = 0; i < n; i++)
          inputs.set(policyInput(order, batch.bits.subarray(b * n, (b + 1) * n), i), (b * n + i) * 2 * n);
      }
      const x = tf.tensor2d(inputs, [40 * n, 2 * n]);
      const y = model.predict(x) as tfTypes.Tensor;
      const expected = y.dataSync();
      tf.dispose([x, y]);
      model.dispose();
      let worst = 0;
      for (let k = 0; k < expected.length; k++)
        worst = Math.max(worst, Math.abs(expected[k] - (batch.probabilities as Float32Array)[k]));
      expect(worst).toBeLessThanOrEqual(1e-5);
    });
  }

  test('sample() gives the same graphs as the plain predict-per-step loop drawing from the same streams', () => {
    const w = initialWeights({ order: 8, hidden: [32, 16, 4] }, iterationRng('s2', 'init', 0));
    const sampler = new FastSampler(tf, w);
    const fast = sampler.sample({ seed: 'same', iteration: 5, firstEpisode: 0, count: 50, clamp: 0.01 });
    sampler.dispose();
    const plain = sampleWithPredict(tf, w, {
      seed: 'same',
      iteration: 5,
      firstEpisode: 0,
      count: 50,
      clamp: 0.01,
    });
    // A decision differs only if a uniform draw falls within float32 rounding of p: not expected in 1400 draws.
    expect(Array.from(fast.bits)).toEqual(Array.from(plain));
  });

  test('sample() of a batch equals the concatenation of its episode ranges (thread-count independence)', () => {
    const w = initialWeights({ order: 12, hidden: [128, 64, 4] }, iterationRng('s3', 'init', 0));
    const sampler = new FastSampler(tf, w);
    const req = { seed: 'split', iteration: 2, clamp: 0.002, recordProbabilities: true };
    const whole = sampler.sample({ ...req, firstEpisode: 0, count: 301 });
    const a = sampler.sample({ ...req, firstEpisode: 0, count: 150 });
    const b = sampler.sample({ ...req, firstEpisode: 150, count: 151 });
    sampler.dispose();
    expect(Buffer.from(whole.bits).equals(Buffer.concat([a.bits, b.bits]))).toBe(true);
    expect(
      Buffer.from((whole.probabilities as Float32Array).buffer).equals(
        Buffer.concat([
          Buffer.from((a.probabilities as Float32Array).buffer),
          Buffer.from((b.probabilities as Float32Array).buffer),
        ]),
      ),
    ).toBe(true);
    expect(Array.from(whole.entropySums)).toEqual([...a.entropySums, ...b.entropySums]);
  });

  test('sample() with a saturated policy and clamp c takes the unlikely decision at rate c', () => {
    // Output bias +40: sigmoid gives 1 - 4e-18, so every decision would be an edge without the clamp.
    const w = initialWeights({ order: 10, hidden: [8, 4] }, iterationRng('s4', 'init', 0));
    w.kernels[2].fill(0);
    w.biases[2][0] = 40;
    const sampler = new FastSampler(tf, w);
    const c = 0.05;
    const batch = sampler.sample({ seed: 'clamp', iteration: 0, firstEpisode: 0, count: 400, clamp: c });
    sampler.dispose();
    const zeros = batch.bits.reduce((s, x) => s + (x === 0 ? 1 : 0), 0);
    // 18000 Bernoulli(0.05) draws: mean 900, standard deviation sqrt(18000 * 0.05 * 0.95) = 29.2; allow 5 sd.
    expect(Math.abs(zeros - 900)).toBeLessThan(5 * 29.3);
    // Entropy of every decision is H(0.05) (binary entropy, closed form).
    expect(batch.meanEntropy).toBeCloseTo(-(0.05 * Math.log2(0.05) + 0.95 * Math.log2(0.95)), 6);
    expect(binaryEntropy(0.5)).toBe(1);
  });
});
