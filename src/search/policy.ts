/**
 * The policy: a multilayer perceptron that, given the pair decisions made so far and the
 * position of the next pair, outputs the probability that this pair is an edge.
 *
 * For order n there are N = n(n-1)/2 pairs, decided in graph6 order (01, 02, 12, 03, ...). The
 * input has 2N entries: the bits decided so far (0 for pairs not yet decided) followed by a
 * one-hot of the current position. Hidden layers are dense with ReLU; the output is one sigmoid
 * unit. This is the construction policy of A. Z. Wagner, "Constructions in combinatorics via
 * neural networks", arXiv:2104.14516 (2021), trained by the cross-entropy method.
 *
 * The weights live here as plain Float32Arrays (kernel k is [inputs x outputs], row-major, the
 * layout of a tfjs Dense kernel), so that the fast sampler, the trainer and checkpoints all
 * read the same numbers; {@link buildTfjsModel} wraps them into the equivalent tfjs model.
 */
import type * as tfTypes from '@tensorflow/tfjs';
import { type Rng, normalDeviate } from './random.js';

/** Layer sizes of a policy for graphs of one order. */
export interface PolicyShape {
  /** Number of vertices n. */
  readonly order: number;
  /** Hidden layer widths, e.g. [128, 64, 4]. */
  readonly hidden: readonly number[];
}

/** Dense layers' weights: kernels[k] is sizes[k] x sizes[k+1], row-major; biases[k] has sizes[k+1]. */
export interface PolicyWeights {
  readonly shape: PolicyShape;
  readonly kernels: Float32Array[];
  readonly biases: Float32Array[];
}

/** N = n(n-1)/2, the number of edge decisions. */
export function pairCount(order: number): number {
  return (order * (order - 1)) / 2;
}

/** Widths of every layer, input first: [2N, ...hidden, 1]. */
export function layerSizes(shape: PolicyShape): number[] {
  return [2 * pairCount(shape.order), ...shape.hidden, 1];
}

/** Total number of parameters. */
export function parameterCount(shape: PolicyShape): number {
  const s = layerSizes(shape);
  let total = 0;
  for (let k = 0; k + 1 < s.length; k++) total += s[k] * s[k + 1] + s[k + 1];
  return total;
}

/**
 * Fresh weights: Glorot-uniform kernels and zero biases, the Keras/tfjs Dense defaults
 * (X. Glorot, Y. Bengio, "Understanding the difficulty of training deep feedforward neural
 * networks", AISTATS 2010), drawn from the given seeded stream so that initialisation does not
 * depend on the tfjs backend.
 */
export function initialWeights(shape: PolicyShape, rng: Rng): PolicyWeights {
  const s = layerSizes(shape);
  const kernels: Float32Array[] = [];
  const biases: Float32Array[] = [];
  for (let k = 0; k + 1 < s.length; k++) {
    const limit = Math.sqrt(6 / (s[k] + s[k + 1]));
    const w = new Float32Array(s[k] * s[k + 1]);
    for (let i = 0; i < w.length; i++) w[i] = (2 * rng() - 1) * limit;
    kernels.push(w);
    biases.push(new Float32Array(s[k + 1]));
  }
  return { shape, kernels, biases };
}

/** A deep copy. */
export function cloneWeights(w: PolicyWeights): PolicyWeights {
  return { shape: w.shape, kernels: w.kernels.map((k) => k.slice()), biases: w.biases.map((b) => b.slice()) };
}

/**
 * The weights with Gaussian noise added to every kernel entry, scaled per layer by `relative`
 * times the layer's Glorot limit: a perturbation that un-saturates a collapsed policy while
 * keeping most of what it learnt.
 */
export function perturbedWeights(w: PolicyWeights, relative: number, rng: Rng): PolicyWeights {
  const out = cloneWeights(w);
  const s = layerSizes(w.shape);
  for (let k = 0; k < out.kernels.length; k++) {
    const scale = relative * Math.sqrt(6 / (s[k] + s[k + 1]));
    const kern = out.kernels[k];
    for (let i = 0; i < kern.length; i++) kern[i] += scale * normalDeviate(rng);
  }
  return out;
}

/** All parameters in one buffer (kernel 0, bias 0, kernel 1, ...), for checkpoints and comparisons. */
export function flattenWeights(w: PolicyWeights): Float32Array {
  const out = new Float32Array(parameterCount(w.shape));
  let at = 0;
  for (let k = 0; k < w.kernels.length; k++) {
    out.set(w.kernels[k], at);
    at += w.kernels[k].length;
    out.set(w.biases[k], at);
    at += w.biases[k].length;
  }
  return out;
}

/** Inverse of {@link flattenWeights}. */
export function unflattenWeights(shape: PolicyShape, flat: Float32Array): PolicyWeights {
  if (flat.length !== parameterCount(shape)) {
    throw new RangeError(
      `Expected ${parameterCount(shape)} parameters for this policy shape but found ${flat.length}`,
    );
  }
  const s = layerSizes(shape);
  const kernels: Float32Array[] = [];
  const biases: Float32Array[] = [];
  let at = 0;
  for (let k = 0; k + 1 < s.length; k++) {
    kernels.push(flat.slice(at, at + s[k] * s[k + 1]));
    at += s[k] * s[k + 1];
    biases.push(flat.slice(at, at + s[k + 1]));
    at += s[k + 1];
  }
  return { shape, kernels, biases };
}

/** The policy's input vector for deciding pair `position` after the given earlier decisions. */
export function policyInput(order: number, decided: ArrayLike<number>, position: number): Float32Array {
  const n = pairCount(order);
  const x = new Float32Array(2 * n);
  for (let j = 0; j < position; j++) x[j] = decided[j] !== 0 ? 1 : 0;
  x[n + position] = 1;
  return x;
}

/** The equivalent tfjs model (Dense ReLU layers, sigmoid output) holding copies of the weights. */
export function buildTfjsModel(tf: typeof tfTypes, w: PolicyWeights): tfTypes.Sequential {
  const s = layerSizes(w.shape);
  const model = tf.sequential();
  for (let k = 0; k + 1 < s.length; k++) {
    model.add(
      tf.layers.dense({
        units: s[k + 1],
        activation: k + 2 === s.length ? 'sigmoid' : 'relu',
        inputShape: k === 0 ? [s[0]] : undefined,
      }),
    );
  }
  const tensors: tfTypes.Tensor[] = [];
  for (let k = 0; k + 1 < s.length; k++) {
    tensors.push(tf.tensor2d(w.kernels[k], [s[k], s[k + 1]]), tf.tensor1d(w.biases[k]));
  }
  model.setWeights(tensors);
  tf.dispose(tensors);
  return model;
}
