/**
 * Whole-iteration benchmark (DESIGN.md "Performance targets": <= 0.3 s at n = 19, batch 1000):
 * one hunt iteration split into its phases (generate = sample + connected repair, score,
 * select, train one epoch, checkpoint + result files), on a connected spectral conjecture, plus
 * the training epoch through the dense model formulation for comparison with the prefix-sum one
 * that the hunt uses (both tfjs).
 */
import { mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import type * as tfTypes from '@tensorflow/tfjs';
import { loadConjectureFile, selectConjecture } from '../../src/conjecture/load.js';
import { evaluateConjecture } from '../../src/conjecture/evaluate.js';
import { startTensorflow, tf } from '../../src/search/backend.js';
import { judgeCounterexample } from '../../src/search/counterexample.js';
import { HUNT_DEFAULTS, type HuntOptions, initialHuntState, runIteration } from '../../src/search/hunt.js';
import { localBatchSource } from '../../src/search/local-source.js';
import { workerBatchSource } from '../../src/search/worker-source.js';
import { pairCount } from '../../src/search/policy.js';
import {
  ADAM_DEFAULTS,
  denseLogits,
  denseTrainingInputs,
  meanCrossEntropy,
  trainEpoch,
} from '../../src/search/training.js';
import { iterationRng } from '../../src/search/random.js';
import { writeCheckpoint } from '../../src/run/checkpoint.js';
import { writeBest, writeSummary } from '../../src/run/results.js';

const file = fileURLToPath(new URL('../fixtures/conjectures/hong-bound-19.ts', import.meta.url));

/** One epoch through the dense 2N-input formulation (what a plain tfjs model.fit would compute). */
function denseEpoch(
  eliteBits: Uint8Array,
  order: number,
  graphsPerBatch: number,
  params: tfTypes.Variable[],
): void {
  const n = pairCount(order);
  const optimizer = tf.train.adam(ADAM_DEFAULTS.learningRate);
  const graphs = eliteBits.length / n;
  for (let from = 0; from < graphs; from += graphsPerBatch) {
    const count = Math.min(graphsPerBatch, graphs - from);
    const { x, y } = denseTrainingInputs(order, eliteBits.subarray(from * n, (from + count) * n));
    tf.tidy(() => {
      const xs = tf.tensor2d(x, [count * n, 2 * n]);
      const ys = tf.tensor2d(y, [count * n, 1]);
      optimizer.minimize(() => meanCrossEntropy(tf, denseLogits(tf, params, xs), ys), false, params);
    });
  }
  optimizer.dispose();
}

export default async function iterationBench(): Promise<void> {
  await startTensorflow(1);
  const loaded = await loadConjectureFile(file);
  const conjecture = selectConjecture(loaded);
  const o: HuntOptions = { ...HUNT_DEFAULTS, seed: 'bench', order: 19, connected: true };
  const dir = mkdtempSync(join(tmpdir(), 'refute-iteration-bench-'));
  for (const threads of [1, 2]) {
    const source =
      threads === 1
        ? localBatchSource(tf, o.seed, (g) => evaluateConjecture(conjecture, g))
        : await workerBatchSource(2, o.seed, file, conjecture.name);
    let state = initialHuntState(o);
    const rows: number[][] = [];
    for (let it = 0; it < 4; it++) {
      const { state: next, report } = await runIteration(tf, o, state, source, judgeCounterexample);
      const t0 = performance.now();
      writeBest(dir, next);
      writeSummary(dir, next, {
        conjecture: { name: 'b', path: file, sha256: '' },
        iterations: it,
        perturbations: 0,
        restarts: 0,
      });
      writeCheckpoint(dir, 'bench', next);
      const checkpoint = performance.now() - t0;
      const t = report.timings;
      rows.push([
        t.generate,
        t.score,
        t.select,
        t.train,
        checkpoint,
        t.generate + t.score + t.select + t.train + checkpoint,
      ]);
      state = next;
    }
    await source.close?.();
    // The first iteration includes warm-up (kernel compilation); report the best of the others.
    const best = rows.slice(1).reduce((a, b) => (b[5] < a[5] ? b : a));
    const f = (x: number): string => x.toFixed(0).padStart(6);
    console.log(
      `n = 19, batch 1000, layers 128,64,4, connected repair, ${threads === 1 ? 'in-process' : '2 worker threads'}; best of 3 iterations (ms):`,
    );
    console.log(
      `  generate ${f(best[0])}  score ${f(best[1])}  select ${f(best[2])}  train ${f(best[3])}  checkpoint ${f(best[4])}  total ${f(best[5])}   (target <= 300)`,
    );
  }
  // Training: the same epoch (70 elite graphs x 171 decisions) through both formulations.
  const n = pairCount(19);
  const elite = Uint8Array.from({ length: 70 * n }, (_, i) =>
    iterationRng('bench', 'elite', 0)() < 0.3 || i % 7 === 0 ? 1 : 0,
  );
  const state = initialHuntState(o);
  const times: number[] = [];
  for (let r = 0; r < 3; r++) {
    const t0 = performance.now();
    trainEpoch(
      tf,
      state.weights,
      state.optimizer,
      elite,
      ADAM_DEFAULTS,
      o.trainGraphs,
      iterationRng('bench', 'train', r),
    );
    times.push(performance.now() - t0);
  }
  const params = state.weights.kernels.flatMap((k, i) => {
    const out = state.weights.biases[i].length;
    return [
      tf.variable(tf.tensor2d(k, [k.length / out, out])),
      tf.variable(tf.tensor1d(state.weights.biases[i])),
    ];
  });
  const dense: number[] = [];
  for (let r = 0; r < 3; r++) {
    const t0 = performance.now();
    denseEpoch(elite, 19, o.trainGraphs, params);
    dense.push(performance.now() - t0);
  }
  tf.dispose(params);
  console.log(
    `training one epoch on 70 elite graphs (11970 decisions), ${o.trainGraphs} graphs per minibatch, best of 3:`,
  );
  console.log(
    `  prefix-sum first layer (hunt) ${Math.min(...times)
      .toFixed(0)
      .padStart(6)} ms`,
  );
  console.log(
    `  dense 2N-input formulation    ${Math.min(...dense)
      .toFixed(0)
      .padStart(6)} ms   (${(Math.min(...dense) / Math.min(...times)).toFixed(1)}x slower)`,
  );
}
