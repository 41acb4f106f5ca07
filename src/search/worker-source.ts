/**
 * The batch source spread over worker threads (`--threads T`): each batch is cut into T
 * contiguous episode ranges, sampled and scored in parallel, and put back together in episode
 * order. Because every episode draws from its own stream and the sampler's arithmetic for one
 * graph does not depend on the other graphs of its batch (checked by tests/search), the batch is
 * identical whatever T.
 */
import { Worker } from 'node:worker_threads';
import { InputError } from '../errors.js';
import { type BatchSource, type Evaluation } from './hunt.js';
import { type PolicyWeights, flattenWeights, pairCount } from './policy.js';
import { type SampledBatch, meanOfSums } from './sampler.js';
import { type WorkerInit } from './batch-worker.js';

interface Reply {
  id?: number;
  ready?: boolean;
  fatal?: string;
  error?: string;
  inputError?: boolean;
  bits?: Uint8Array;
  entropySums?: Float64Array;
  evaluations?: Evaluation[];
}

/**
 * A worker running batch-worker beside this module: the compiled .js in dist; under tsx (tests,
 * benches) the .ts source, through a small bootstrap that registers tsx's loader inside the
 * worker first (loader hooks given to the parent process do not reach worker threads).
 */
function startWorker(data: WorkerInit): Worker {
  const self = import.meta.url;
  if (!self.endsWith('.ts')) return new Worker(new URL('./batch-worker.js', self), { workerData: data });
  const tsxApi = import.meta.resolve('tsx/esm/api');
  const script = new URL('./batch-worker.ts', self).href;
  const bootstrap = `import(${JSON.stringify(tsxApi)}).then((m) => { m.register(); return import(${JSON.stringify(script)}); });`;
  return new Worker(bootstrap, { eval: true, workerData: data });
}

class WorkerHandle {
  private next = 0;
  private readonly pending = new Map<number, { resolve: (r: Reply) => void; reject: (e: Error) => void }>();
  readonly ready: Promise<void>;

  constructor(readonly worker: Worker) {
    this.ready = new Promise((resolve, reject) => {
      worker.on('message', (r: Reply) => {
        if (r.ready) return resolve();
        if (r.fatal !== undefined) return reject(new InputError(`worker thread could not start: ${r.fatal}`));
        const p = this.pending.get(r.id ?? -1);
        if (p === undefined) return;
        this.pending.delete(r.id ?? -1);
        if (r.error !== undefined) p.reject(r.inputError ? new InputError(r.error) : new Error(r.error));
        else p.resolve(r);
      });
      worker.on('error', (e) => {
        reject(e);
        for (const p of this.pending.values()) p.reject(e);
        this.pending.clear();
      });
    });
  }

  request(message: Record<string, unknown>, transfer: ArrayBuffer[] = []): Promise<Reply> {
    const id = this.next++;
    return new Promise((resolve, reject) => {
      this.pending.set(id, { resolve, reject });
      this.worker.postMessage({ ...message, id }, transfer);
    });
  }
}

/** Contiguous ranges [start, start + size) cutting `count` into `parts` near-equal pieces. */
export function splitRange(count: number, parts: number): Array<{ start: number; size: number }> {
  const out: Array<{ start: number; size: number }> = [];
  let start = 0;
  for (let k = 0; k < parts; k++) {
    const size = Math.floor(count / parts) + (k < count % parts ? 1 : 0);
    if (size > 0) out.push({ start, size });
    start += size;
  }
  return out;
}

export async function workerBatchSource(
  threads: number,
  seed: string,
  conjecturePath: string,
  conjectureName: string,
): Promise<BatchSource> {
  const data: WorkerInit = { seed, conjecturePath, conjectureName };
  const handles = Array.from({ length: threads }, () => new WorkerHandle(startWorker(data)));
  await Promise.all(handles.map((h) => h.ready));
  return {
    async sample(
      weights: PolicyWeights,
      iteration: number,
      count: number,
      clamp: number,
    ): Promise<SampledBatch> {
      const n = pairCount(weights.shape.order);
      const flat = flattenWeights(weights);
      const ranges = splitRange(count, handles.length);
      const replies = await Promise.all(
        ranges.map((r, k) =>
          handles[k].request({
            kind: 'sample',
            shape: weights.shape,
            weights: flat,
            iteration,
            firstEpisode: r.start,
            count: r.size,
            clamp,
          }),
        ),
      );
      const bits = new Uint8Array(count * n);
      const entropySums = new Float64Array(count);
      ranges.forEach((r, k) => {
        bits.set(replies[k].bits as Uint8Array, r.start * n);
        entropySums.set(replies[k].entropySums as Float64Array, r.start);
      });
      return {
        order: weights.shape.order,
        count,
        bits,
        entropySums,
        meanEntropy: meanOfSums(entropySums, n),
      };
    },
    async evaluate(order: number, bits: Uint8Array, count: number): Promise<Evaluation[]> {
      const n = pairCount(order);
      const ranges = splitRange(count, handles.length);
      const replies = await Promise.all(
        ranges.map((r, k) =>
          handles[k].request({
            kind: 'evaluate',
            order,
            bits: bits.slice(r.start * n, (r.start + r.size) * n),
            count: r.size,
          }),
        ),
      );
      return replies.flatMap((r) => r.evaluations as Evaluation[]);
    },
    async close(): Promise<void> {
      await Promise.all(handles.map((h) => h.worker.terminate()));
    },
  };
}
