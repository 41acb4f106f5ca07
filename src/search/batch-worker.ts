/**
 * A worker thread of the hunt: samples episode ranges with its own tfjs instance and scores
 * graphs with its own copy of the conjecture (loaded from the same file), for worker-source.ts.
 * Results depend only on the episode numbers and the graphs, never on which worker ran them.
 */
import { parentPort, workerData } from 'node:worker_threads';
import { InputError } from '../errors.js';
import { fromUpperTriangleBits } from '../graph/builders.js';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { evaluateConjecture } from '../conjecture/evaluate.js';
import { startTensorflow, tf } from './backend.js';
import { type PolicyShape, pairCount, unflattenWeights } from './policy.js';
import { FastSampler } from './sampler.js';

export interface WorkerInit {
  readonly seed: string;
  readonly conjecturePath: string;
  readonly conjectureName: string;
}

export type WorkerRequest =
  | {
      kind: 'sample';
      id: number;
      shape: PolicyShape;
      weights: Float32Array;
      iteration: number;
      firstEpisode: number;
      count: number;
      clamp: number;
    }
  | { kind: 'evaluate'; id: number; order: number; bits: Uint8Array; count: number };

const init = workerData as WorkerInit;
const port = parentPort;

async function start(): Promise<void> {
  if (port === null) return;
  await startTensorflow(1);
  const file = await loadConjectureFile(init.conjecturePath);
  const conjecture = selectConjecture(file, init.conjectureName);
  port.on('message', (req: WorkerRequest) => {
    try {
      if (req.kind === 'sample') {
        const sampler = new FastSampler(tf, unflattenWeights(req.shape, req.weights));
        const out = sampler.sample({
          seed: init.seed,
          iteration: req.iteration,
          firstEpisode: req.firstEpisode,
          count: req.count,
          clamp: req.clamp,
        });
        sampler.dispose();
        port.postMessage({ id: req.id, bits: out.bits, entropySums: out.entropySums }, [
          out.bits.buffer as ArrayBuffer,
          out.entropySums.buffer as ArrayBuffer,
        ]);
      } else {
        const n = pairCount(req.order);
        const evaluations = [];
        for (let b = 0; b < req.count; b++) {
          evaluations.push(
            evaluateConjecture(
              conjecture,
              fromUpperTriangleBits(req.order, req.bits.subarray(b * n, (b + 1) * n)),
            ),
          );
        }
        port.postMessage({ id: req.id, evaluations });
      }
    } catch (err) {
      port.postMessage({
        id: req.id,
        error: err instanceof Error ? err.message : String(err),
        inputError: err instanceof InputError,
      });
    }
  });
  port.postMessage({ ready: true });
}

start().catch((err: unknown) => {
  port?.postMessage({ fatal: err instanceof Error ? err.message : String(err) });
});
