import { beforeAll, describe, expect, test } from 'vitest';
import type * as tfTypes from '@tensorflow/tfjs';
import { startTensorflow, tf } from '../../src/search/backend.js';
import { flattenWeights, initialWeights, pairCount, parameterCount } from '../../src/search/policy.js';
import { iterationRng } from '../../src/search/random.js';
import {
  ADAM_DEFAULTS,
  denseLogits,
  denseTrainingInputs,
  freshOptimizerState,
  meanCrossEntropy,
  prefixLogits,
  trainEpoch,
} from '../../src/search/training.js';

beforeAll(async () => {
  await startTensorflow(1);
});

function randomBits(count: number, rng: () => number, p = 0.4): Uint8Array {
  return Uint8Array.from({ length: count }, () => (rng() < p ? 1 : 0));
}

describe('prefixLogits', () => {
  test("prefixLogits() gives the dense model formulation's loss gradients within 1e-5 on random batches", () => {
    for (const trial of [0, 1, 2]) {
      const order = 7 + trial;
      const n = pairCount(order);
      const w = initialWeights({ order, hidden: [32, 16, 4] }, iterationRng('grad', 'init', trial));
      const rng = iterationRng('grad', 'bits', trial);
      for (const b of w.biases) for (let i = 0; i < b.length; i++) b[i] = (rng() - 0.5) * 0.2;
      const graphs = 5;
      const bits = randomBits(graphs * n, rng);
      const params: tfTypes.Tensor[] = [];
      w.kernels.forEach((k, i) =>
        params.push(
          tf.tensor2d(k, [k.length / w.biases[i].length, w.biases[i].length]),
          tf.tensor1d(w.biases[i]),
        ),
      );
      const { x, y } = denseTrainingInputs(order, bits);
      const xs = tf.tensor2d(x, [graphs * n, 2 * n]);
      const ys = tf.tensor2d(y, [graphs * n, 1]);
      const bt = tf.tensor2d(Float32Array.from(bits), [graphs, n]);
      const dense = tf.grads((...p: tfTypes.Tensor[]) => meanCrossEntropy(tf, denseLogits(tf, p, xs), ys))(
        params,
      );
      const prefix = tf.grads((...p: tfTypes.Tensor[]) => meanCrossEntropy(tf, prefixLogits(tf, p, bt), ys))(
        params,
      );
      for (let k = 0; k < params.length; k++) {
        const a = dense[k].dataSync();
        const b = prefix[k].dataSync();
        let worst = 0;
        for (let i = 0; i < a.length; i++) worst = Math.max(worst, Math.abs(a[i] - b[i]));
        expect(worst, `parameter tensor ${k}`).toBeLessThanOrEqual(1e-5);
      }
      tf.dispose([...params, xs, ys, bt, ...dense, ...prefix]);
    }
  });
});

describe('trainEpoch', () => {
  test('trainEpoch() first Adam step moves every parameter with a non-zero gradient by about the learning rate', () => {
    // Kingma & Ba (ICLR 2015), Algorithm 1 with zero initial moments: the first step is
    // lr * g / (|g| + eps'), eps' = eps / sqrt(1 - beta2) in the folded form of their Section 2,
    // so about lr for every parameter whose gradient is not tiny.
    const order = 6;
    const w = initialWeights({ order, hidden: [8, 4] }, iterationRng('adam', 'init', 0));
    const bits = randomBits(pairCount(order), iterationRng('adam', 'bits', 0), 0.5);
    const lr = 0.01;
    const r = trainEpoch(
      tf,
      w,
      freshOptimizerState(parameterCount(w.shape)),
      bits,
      { ...ADAM_DEFAULTS, learningRate: lr },
      8,
      iterationRng('adam', 'order', 0),
    );
    const before = flattenWeights(w);
    const after = flattenWeights(r.weights);
    const m = r.optimizer.firstMoment;
    let checked = 0;
    for (let i = 0; i < before.length; i++) {
      const g = m[i] / (1 - ADAM_DEFAULTS.beta1);
      if (Math.abs(g) < 1e-4) continue;
      const expected =
        (lr * Math.abs(g)) / (Math.abs(g) + ADAM_DEFAULTS.epsilon / Math.sqrt(1 - ADAM_DEFAULTS.beta2));
      expect(Math.abs(after[i] - before[i])).toBeCloseTo(expected, 6);
      expect(Math.sign(after[i] - before[i])).toBe(-Math.sign(g));
      checked++;
    }
    expect(checked).toBeGreaterThan(20);
    expect(r.optimizer.step).toBe(1);
  });

  test('trainEpoch() repeated on one elite graph drives the loss towards 0 (the policy learns to reproduce it)', () => {
    const order = 8;
    let w = initialWeights({ order, hidden: [64, 32, 4] }, iterationRng('fit', 'init', 0));
    let opt = freshOptimizerState(parameterCount(w.shape));
    // One graph three times: its decisions are then a function of the position, so the optimum loss is 0.
    const one = randomBits(pairCount(order), iterationRng('fit', 'bits', 0));
    const bits = new Uint8Array(3 * one.length);
    for (let k = 0; k < 3; k++) bits.set(one, k * one.length);
    const first = trainEpoch(
      tf,
      w,
      opt,
      bits,
      { ...ADAM_DEFAULTS, learningRate: 0.01 },
      1,
      iterationRng('fit', 'o', 0),
    );
    let last = first.meanLoss;
    ({ weights: w, optimizer: opt } = first);
    for (let e = 1; e < 150; e++) {
      const r = trainEpoch(
        tf,
        w,
        opt,
        bits,
        { ...ADAM_DEFAULTS, learningRate: 0.01 },
        1,
        iterationRng('fit', 'o', e),
      );
      ({ weights: w, optimizer: opt } = r);
      last = r.meanLoss;
    }
    // ln 2 = 0.693 is the loss of a uniform policy.
    expect(first.meanLoss).toBeGreaterThan(0.5);
    expect(last).toBeLessThan(0.05);
  });

  test('trainEpoch() is a pure function of its inputs (same inputs, same output bytes; inputs untouched)', () => {
    const order = 7;
    const w = initialWeights({ order, hidden: [16, 4] }, iterationRng('pure', 'init', 0));
    const copy = flattenWeights(w);
    const opt = freshOptimizerState(parameterCount(w.shape));
    const bits = randomBits(4 * pairCount(order), iterationRng('pure', 'bits', 0));
    const a = trainEpoch(tf, w, opt, bits, ADAM_DEFAULTS, 2, iterationRng('pure', 'o', 0));
    const b = trainEpoch(tf, w, opt, bits, ADAM_DEFAULTS, 2, iterationRng('pure', 'o', 0));
    expect(
      Buffer.from(flattenWeights(a.weights).buffer).equals(Buffer.from(flattenWeights(b.weights).buffer)),
    ).toBe(true);
    expect(Buffer.from(flattenWeights(w).buffer).equals(Buffer.from(copy.buffer))).toBe(true);
    expect(opt.step).toBe(0);
  });
});
