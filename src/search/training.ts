/**
 * One epoch of training: binary cross-entropy of the policy's decisions against the decisions
 * of the elite graphs, minimised with Adam, gradients computed by tfjs.
 *
 * Each elite graph contributes N (state, decision) pairs: the state before pair i is the graph's
 * own decisions on pairs 0..i-1 plus the one-hot of i, and the target is its decision on pair i.
 * The graphs are shuffled by a stream keyed by (seed, iteration) and cut into minibatches of
 * whole graphs, so that the first layer can be computed by a prefix sum ({@link prefixLogits}).
 *
 * Adam is D. P. Kingma, J. Ba, "Adam: a method for stochastic optimization", ICLR 2015,
 * Algorithm 1, in the form given at the end of its Section 2 (the bias corrections folded into
 * the step size). It is written here with tfjs ops rather than taken from tf.train.adam because
 * that optimizer accumulates beta^t by repeated multiplication and recomputes it with pow on
 * restore, so a resumed run would drift from an uninterrupted one; here the step size depends
 * only on the integer step count, which makes "run 2K" and "run K, resume K" bit-identical.
 */
import { type TfModule } from './backend.js';
import { type PolicyShape, type PolicyWeights, layerSizes, pairCount, unflattenWeights } from './policy.js';
import { type Rng, shuffledIndices } from './random.js';
import type * as tfTypes from '@tensorflow/tfjs';

export interface AdamSettings {
  readonly learningRate: number;
  readonly beta1: number;
  readonly beta2: number;
  readonly epsilon: number;
}

export const ADAM_DEFAULTS: AdamSettings = { learningRate: 1e-3, beta1: 0.9, beta2: 0.999, epsilon: 1e-7 };

/** Adam's state, in the flat parameter order of flattenWeights. */
export interface OptimizerState {
  step: number;
  firstMoment: Float32Array;
  secondMoment: Float32Array;
}

export function freshOptimizerState(parameters: number): OptimizerState {
  return { step: 0, firstMoment: new Float32Array(parameters), secondMoment: new Float32Array(parameters) };
}

/**
 * Dense inputs (rows of 2N entries) and targets for every position of the given graphs, in
 * order: graph after graph, position after position. Used by tests as the plain formulation.
 */
export function denseTrainingInputs(order: number, bits: Uint8Array): { x: Float32Array; y: Float32Array } {
  const n = pairCount(order);
  const graphs = bits.length / n;
  const x = new Float32Array(graphs * n * 2 * n);
  const y = new Float32Array(graphs * n);
  for (let g = 0; g < graphs; g++) {
    for (let i = 0; i < n; i++) {
      const out = (g * n + i) * 2 * n;
      for (let j = 0; j < i; j++) x[out + j] = bits[g * n + j];
      x[out + n + i] = 1;
      y[g * n + i] = bits[g * n + i];
    }
  }
  return { x, y };
}

/** Logits of the policy for dense inputs x (the model's own formulation), as tfjs ops on (kernel, bias, ...). */
export function denseLogits(tf: TfModule, params: tfTypes.Tensor[], x: tfTypes.Tensor2D): tfTypes.Tensor2D {
  let h = x;
  const layers = params.length / 2;
  for (let k = 0; k < layers; k++) {
    h = tf.add(tf.matMul(h, params[2 * k] as tfTypes.Tensor2D), params[2 * k + 1]);
    if (k + 1 < layers) h = tf.relu(h);
  }
  return h;
}

/**
 * The same logits for every position of G whole graphs (bits: G x N), computed through a prefix
 * sum instead of the dense first layer: the first layer's pre-activation before pair i is
 * sum_{j<i} bit_j * W1[j] + W1[N+i] + b1, i.e. an exclusive cumulative sum along the positions.
 * That costs G*N*h1 instead of G*N*2N*h1, and tfjs differentiates it like any other op.
 */
export function prefixLogits(
  tf: TfModule,
  params: tfTypes.Tensor[],
  bits: tfTypes.Tensor2D,
): tfTypes.Tensor2D {
  const [graphs, n] = bits.shape;
  const w1 = params[0] as tfTypes.Tensor2D;
  const width = w1.shape[1];
  const edgeRows = tf.slice(w1, [0, 0], [n, width]);
  const positionRows = tf.slice(w1, [n, 0], [n, width]);
  // Laid out [G, h1, N] so the sum runs along the last axis: tfjs 4.22's Cumsum gradient
  // returns a wrongly shaped result for any other axis.
  const contributions = tf.mul(
    tf.reshape(bits, [graphs, 1, n]),
    tf.reshape(tf.transpose(edgeRows), [1, width, n]),
  );
  const edgeTerm = tf.transpose(tf.cumsum(contributions, 2, true), [0, 2, 1]);
  const pre = tf.add(tf.add(edgeTerm, tf.reshape(positionRows, [1, n, width])), params[1]);
  let h: tfTypes.Tensor2D = tf.reshape(pre, [graphs * n, width]);
  const layers = params.length / 2;
  for (let k = 1; k < layers; k++) {
    h = tf.relu(h);
    h = tf.add(tf.matMul(h, params[2 * k] as tfTypes.Tensor2D), params[2 * k + 1]);
  }
  return h;
}

/** Mean binary cross-entropy of sigmoid(logits) against 0/1 targets (stable form). */
export function meanCrossEntropy(
  tf: TfModule,
  logits: tfTypes.Tensor2D,
  targets: tfTypes.Tensor2D,
): tfTypes.Scalar {
  return tf.losses.sigmoidCrossEntropy(targets, logits) as tfTypes.Scalar;
}

function variableOf(tf: TfModule, data: Float32Array, shape: number[], trainable: boolean): tfTypes.Variable {
  const t = tf.tensor(data, shape);
  const v = tf.variable(t, trainable);
  t.dispose();
  return v;
}

export interface EpochResult {
  readonly weights: PolicyWeights;
  readonly optimizer: OptimizerState;
  /** Mean training loss over the epoch's minibatches. */
  readonly meanLoss: number;
}

/**
 * Trains for one epoch on the elite graphs' decisions (eliteBits: E x N) and returns the new
 * weights and optimizer state; the inputs are not modified. Minibatches are whole graphs
 * (graphsPerBatch graphs, N samples each), in an order shuffled by `rng`.
 */
export function trainEpoch(
  tf: TfModule,
  weights: PolicyWeights,
  optimizer: OptimizerState,
  eliteBits: Uint8Array,
  adam: AdamSettings,
  graphsPerBatch: number,
  rng: Rng,
): EpochResult {
  const shape: PolicyShape = weights.shape;
  const n = pairCount(shape.order);
  const total = eliteBits.length;
  const s = layerSizes(shape);
  if (total === 0) return { weights, optimizer, meanLoss: 0 };
  const vars: tfTypes.Variable[] = [];
  const ms: tfTypes.Variable[] = [];
  const vs: tfTypes.Variable[] = [];
  const flatM = optimizer.firstMoment;
  const flatV = optimizer.secondMoment;
  let at = 0;
  for (let k = 0; k + 1 < s.length; k++) {
    const kShape: [number, number] = [s[k], s[k + 1]];
    const kLen = s[k] * s[k + 1];
    vars.push(variableOf(tf, weights.kernels[k], kShape, true));
    ms.push(variableOf(tf, flatM.subarray(at, at + kLen), kShape, false));
    vs.push(variableOf(tf, flatV.subarray(at, at + kLen), kShape, false));
    at += kLen;
    vars.push(variableOf(tf, weights.biases[k], [s[k + 1]], true));
    ms.push(variableOf(tf, flatM.subarray(at, at + s[k + 1]), [s[k + 1]], false));
    vs.push(variableOf(tf, flatV.subarray(at, at + s[k + 1]), [s[k + 1]], false));
    at += s[k + 1];
  }
  let step = optimizer.step;
  let lossSum = 0;
  let batches = 0;
  const graphs = total / n;
  const graphOrder = shuffledIndices(graphs, rng);
  const batchBits = new Float32Array(graphsPerBatch * n);
  for (let from = 0; from < graphs; from += graphsPerBatch) {
    const count = Math.min(graphs, from + graphsPerBatch) - from;
    for (let r = 0; r < count; r++) {
      const g = graphOrder[from + r];
      for (let i = 0; i < n; i++) batchBits[r * n + i] = eliteBits[g * n + i];
    }
    step += 1;
    // Kingma & Ba, end of Section 2: alpha_t = alpha * sqrt(1 - beta2^t) / (1 - beta1^t).
    const stepSize =
      (adam.learningRate * Math.sqrt(1 - Math.pow(adam.beta2, step))) / (1 - Math.pow(adam.beta1, step));
    const loss = tf.tidy(() => {
      const bt = tf.tensor2d(batchBits.subarray(0, count * n), [count, n]);
      const ys = tf.reshape(bt, [count * n, 1]) as tfTypes.Tensor2D;
      const { value, grads } = tf.variableGrads(
        () => meanCrossEntropy(tf, prefixLogits(tf, vars, bt), ys),
        vars,
      );
      for (let p = 0; p < vars.length; p++) {
        const g = grads[vars[p].name];
        const m = tf.add(tf.mul(ms[p], adam.beta1), tf.mul(g, 1 - adam.beta1));
        const v = tf.add(tf.mul(vs[p], adam.beta2), tf.mul(tf.square(g), 1 - adam.beta2));
        ms[p].assign(m);
        vs[p].assign(v);
        vars[p].assign(tf.sub(vars[p], tf.div(tf.mul(m, stepSize), tf.add(tf.sqrt(v), adam.epsilon))));
      }
      return value.dataSync()[0];
    });
    lossSum += loss;
    batches += 1;
  }
  const readFlat = (list: tfTypes.Variable[]): Float32Array => {
    const out = new Float32Array(flatM.length);
    let o = 0;
    for (const t of list) {
      const d = t.dataSync() as Float32Array;
      out.set(d, o);
      o += d.length;
    }
    return out;
  };
  const newWeights = unflattenWeights(shape, readFlat(vars));
  const result: EpochResult = {
    weights: newWeights,
    optimizer: { step, firstMoment: readFlat(ms), secondMoment: readFlat(vs) },
    meanLoss: lossSum / batches,
  };
  tf.dispose([...vars, ...ms, ...vs]);
  return result;
}
