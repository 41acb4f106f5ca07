/**
 * The fast sampler: builds a batch of graphs pair by pair with the policy, in N sequential
 * steps of one batched forward pass each.
 *
 * A plain implementation feeds the whole 2N-entry input to the model at every step. But from
 * one step to the next the input changes in two places only (the bit just decided, and the
 * one-hot position), so the first layer's pre-activation is kept per graph and updated
 * incrementally: after deciding pair j it gains row j of the first kernel when the pair became an
 * edge, and the position term is the precomputed row N+i (plus the bias). This turns the first
 * layer, by far the largest (2N x h1), into one rank-one update per step; the remaining layers are
 * small batched matrix products (tfjs fused matMul, XNNPACK on the wasm backend).
 *
 * Randomness: graph e of iteration t draws its decisions from its own stream episodeRng(seed,
 * t, e), so any split of a batch across threads or calls yields the same graphs.
 *
 * @remarks Probabilities equal the tfjs model's `predict` on the same states up to float32
 * summation order (checked within 1e-5 by tests/search/sampler.test.ts).
 */
import { type TfModule } from './backend.js';
import { type PolicyWeights, layerSizes, pairCount } from './policy.js';
import { episodeRng } from './random.js';
import type * as tfTypes from '@tensorflow/tfjs';

export interface SampleRequest {
  readonly seed: string;
  readonly iteration: number;
  /** Episodes firstEpisode .. firstEpisode + count - 1 are sampled. */
  readonly firstEpisode: number;
  readonly count: number;
  /**
   * Sampling probabilities are clamped to [clamp, 1 - clamp] (0 = off), so that a saturated
   * policy still tries every pair now and then.
   */
  readonly clamp: number;
  /** Also return the policy's (unclamped) probability of every decision. */
  readonly recordProbabilities?: boolean;
}

export interface SampledBatch {
  readonly order: number;
  readonly count: number;
  /** count x N decisions, graph after graph, pairs in graph6 order. */
  readonly bits: Uint8Array;
  /** Mean binary entropy (bits) of the clamped decision probabilities: 1 = uniform, 0 = deterministic. */
  readonly meanEntropy: number;
  /**
   * Per graph, the sum of its decisions' entropies. meanEntropy is their sum, in episode order,
   * over count x N, so batches split across threads combine to the same value.
   */
  readonly entropySums: Float64Array;
  /** count x N probabilities when requested. */
  readonly probabilities?: Float32Array;
}

/** Binary entropy in bits. */
export function binaryEntropy(p: number): number {
  if (p <= 0 || p >= 1) return 0;
  return -(p * Math.log2(p) + (1 - p) * Math.log2(1 - p));
}

/** Sum of per-graph entropy sums, in order, divided by the number of decisions. */
export function meanOfSums(entropySums: Float64Array, pairs: number): number {
  let total = 0;
  for (const x of entropySums) total += x;
  return entropySums.length * pairs > 0 ? total / (entropySums.length * pairs) : 0;
}

/** The policy's weights uploaded once as tensors, ready to sample many batches. */
export class FastSampler {
  private readonly order: number;
  private readonly pairs: number;
  private readonly width: number;
  /** Rows 0..N-1 of the first kernel, one tensor each: the contribution of each decided edge. */
  private readonly edgeRows: tfTypes.Tensor1D[];
  /** Rows N..2N-1 of the first kernel plus the first bias, one tensor each: the position term. */
  private readonly positionRows: tfTypes.Tensor1D[];
  private readonly kernels: tfTypes.Tensor2D[] = [];
  private readonly biases: tfTypes.Tensor1D[] = [];

  constructor(
    private readonly tf: TfModule,
    weights: PolicyWeights,
  ) {
    const s = layerSizes(weights.shape);
    this.order = weights.shape.order;
    this.pairs = pairCount(this.order);
    this.width = s[1];
    const n = this.pairs;
    const w1 = weights.kernels[0];
    // One tensor per row, made once, so that no step pays for slicing.
    this.edgeRows = Array.from({ length: n }, (_, i) =>
      tf.tensor1d(w1.subarray(i * this.width, (i + 1) * this.width)),
    );
    const pos = new Float32Array(n * this.width);
    const b1 = weights.biases[0];
    for (let i = 0; i < n; i++) {
      for (let h = 0; h < this.width; h++) pos[i * this.width + h] = w1[(n + i) * this.width + h] + b1[h];
    }
    this.positionRows = Array.from({ length: n }, (_, i) =>
      tf.tensor1d(pos.subarray(i * this.width, (i + 1) * this.width)),
    );
    for (let k = 1; k + 1 < s.length; k++) {
      this.kernels.push(tf.tensor2d(weights.kernels[k], [s[k], s[k + 1]]));
      this.biases.push(tf.tensor1d(weights.biases[k]));
    }
  }

  /** Samples the requested episodes. */
  sample(req: SampleRequest): SampledBatch {
    const { tf, pairs: n, width } = this;
    const count = req.count;
    const bits = new Uint8Array(count * n);
    const probabilities = req.recordProbabilities ? new Float32Array(count * n) : undefined;
    const rngs = Array.from({ length: count }, (_, b) =>
      episodeRng(req.seed, req.iteration, req.firstEpisode + b),
    );
    const column = new Float32Array(count);
    const lo = req.clamp;
    const hi = 1 - req.clamp;
    const entropySums = new Float64Array(count);
    let pre: tfTypes.Tensor2D = tf.zeros([count, width]);
    for (let i = 0; i < n; i++) {
      const p = tf.tidy(() => {
        let h = tf.relu(tf.add(pre, this.positionRows[i])) as tfTypes.Tensor2D;
        const last = this.kernels.length - 1;
        for (let k = 0; k <= last; k++) {
          h = tf.fused.matMul({
            a: h,
            b: this.kernels[k],
            bias: this.biases[k],
            activation: k === last ? 'sigmoid' : 'relu',
          }) as tfTypes.Tensor2D;
        }
        return h;
      });
      const probs = p.dataSync();
      p.dispose();
      let any = false;
      for (let b = 0; b < count; b++) {
        let q = probs[b];
        if (probabilities) probabilities[b * n + i] = q;
        if (q < lo) q = lo;
        else if (q > hi) q = hi;
        entropySums[b] += binaryEntropy(q);
        const bit = rngs[b]() < q ? 1 : 0;
        bits[b * n + i] = bit;
        column[b] = bit;
        if (bit) any = true;
      }
      if (any && i + 1 < n) {
        const next = tf.tidy(
          () => tf.add(pre, tf.mul(tf.tensor2d(column, [count, 1]), this.edgeRows[i])) as tfTypes.Tensor2D,
        );
        pre.dispose();
        pre = next;
      }
    }
    pre.dispose();
    return {
      order: this.order,
      count,
      bits,
      meanEntropy: meanOfSums(entropySums, n),
      entropySums,
      probabilities,
    };
  }

  /** Frees the tensors. */
  dispose(): void {
    this.tf.dispose([...this.edgeRows, ...this.positionRows, ...this.kernels, ...this.biases]);
  }
}
