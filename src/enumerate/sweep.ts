/**
 * Sweep: evaluate a conjecture on every graph (up to isomorphism) of a range of orders, in
 * parallel over worker threads, with a result that does not depend on the thread count.
 *
 * Each order is cut into a fixed number of units (parts of the enumerator's stream; see
 * graph-enumerator.ts), the number depending only on the order. Workers take units in any
 * order; results are emitted strictly in unit order, so the stream of counterexamples and the
 * per-order summaries (best score: the first unit, in unit order, reaching the maximum) are the
 * same bytes with 1 thread or 8. A user part `i/k` (for spreading a sweep over machines) is cut
 * into the same units: unit j of part i is enumerator part i + k*j of k*units, which deals the
 * split-order graphs of part i round-robin again (c mod k*units = i + k*j exactly when
 * c mod k = i and floor(c/k) mod units = j).
 *
 * Each worker loads the conjecture file itself (functions do not cross threads) and checks that
 * its sha256 is the one the main thread loaded, so a file changed during a sweep is an error.
 */
import { Worker } from 'node:worker_threads';
import { InputError } from '../errors.js';
import { type Conjecture } from '../conjecture/types.js';
import { type EnumerationPart } from './graph-enumerator.js';
import { type SweepCounterexample, type SweepPartResult, sweepPart } from './sweep-part.js';

/** Units per order: orders up to 7 are a few milliseconds, larger ones are cut for load balance. */
export function unitsForOrder(order: number): number {
  return order >= 8 ? 32 : 1;
}

/** What the sweep is asked to do. */
export interface SweepRequest {
  /** The conjecture, already loaded (used when running in this thread). */
  readonly conjecture: Conjecture;
  /** Path of its file and its sha256, for workers to load it again. */
  readonly file: string;
  readonly sha256: string;
  /** Name to select in a file with several conjectures. */
  readonly conjectureName?: string;
  readonly minOrder: number;
  readonly maxOrder: number;
  /** Only this part of each order (default: all). */
  readonly part?: EnumerationPart;
  /** Worker threads; 1 runs everything in the calling thread. */
  readonly threads: number;
}

/** Totals of one order (over the requested part). */
export interface SweepOrderSummary {
  readonly order: number;
  readonly part: EnumerationPart;
  readonly graphs: number;
  readonly inDomain: number;
  /** Certified counterexamples. */
  readonly counterexamples: number;
  /** Graphs with a positive float score that certification did not confirm. */
  readonly numericalOnly: number;
  readonly best: SweepCounterexample | null;
}

/** Where results go, in deterministic order; each call is awaited (back-pressure). */
export interface SweepSink {
  counterexample(order: number, found: SweepCounterexample): Promise<void>;
  orderDone(summary: SweepOrderSummary): Promise<void>;
}

interface Unit {
  readonly id: number;
  readonly order: number;
  readonly unitIndex: number;
  readonly units: number;
  readonly part: EnumerationPart;
}

function planUnits(request: SweepRequest): Unit[] {
  const user = request.part ?? { index: 0, count: 1 };
  const plan: Unit[] = [];
  for (let order = request.minOrder; order <= request.maxOrder; order++) {
    const units = unitsForOrder(order);
    for (let j = 0; j < units; j++) {
      plan.push({
        id: plan.length,
        order,
        unitIndex: j,
        units,
        part: { index: user.index + user.count * j, count: user.count * units },
      });
    }
  }
  return plan;
}

/** Folds unit results, in unit order, into per-order totals and hands everything to the sink. */
class OrderedEmitter {
  private graphs = 0;
  private inDomain = 0;
  private counterexamples = 0;
  private numericalOnly = 0;
  private best: SweepCounterexample | null = null;
  anyCounterexample = false;

  constructor(
    private readonly sink: SweepSink,
    private readonly userPart: EnumerationPart,
  ) {}

  async emit(unit: Unit, result: SweepPartResult): Promise<void> {
    this.graphs += result.graphs;
    this.inDomain += result.inDomain;
    for (const found of result.counterexamples) {
      if (found.certified) this.counterexamples++;
      else this.numericalOnly++;
    }
    if (result.best !== null && (this.best === null || result.best.score > this.best.score))
      this.best = result.best;
    for (const found of result.counterexamples) {
      if (found.certified) this.anyCounterexample = true;
      await this.sink.counterexample(unit.order, found);
    }
    if (unit.unitIndex === unit.units - 1) {
      await this.sink.orderDone({
        order: unit.order,
        part: this.userPart,
        graphs: this.graphs,
        inDomain: this.inDomain,
        counterexamples: this.counterexamples,
        numericalOnly: this.numericalOnly,
        best: this.best,
      });
      this.graphs = 0;
      this.inDomain = 0;
      this.counterexamples = 0;
      this.numericalOnly = 0;
      this.best = null;
    }
  }
}

/** Message a worker sends back. */
type WorkerReply =
  | { readonly kind: 'ready' }
  | { readonly kind: 'result'; readonly id: number; readonly result: SweepPartResult }
  | { readonly kind: 'error'; readonly id?: number; readonly message: string; readonly input: boolean };

/**
 * Memory limits of a worker. A sweep allocates a short-lived graph and view per graph; left
 * alone, V8 grows each worker's young generation to its maximum, which with two workers took
 * the process just past DESIGN.md's 200 MiB for streaming commands. Measured on order 10,
 * part 1/16, 2 threads: 200.7 MiB peak RSS by default, 168 MiB with this limit, same CPU time.
 */
const WORKER_LIMITS = { maxYoungGenerationSizeMb: 8 };

/**
 * Starts a sweep worker. Compiled, it is the .js next to this file. From source (tests and
 * benches run under tsx), the .ts is loaded through tsx's module hooks, registered inside the
 * worker by a small bootstrap, since a worker does not inherit the parent's hooks.
 */
function startWorker(workerData: object): Worker {
  if (!import.meta.url.endsWith('.ts')) {
    return new Worker(new URL('./sweep-worker.js', import.meta.url), {
      workerData,
      resourceLimits: WORKER_LIMITS,
    });
  }
  const entry = new URL('./sweep-worker.ts', import.meta.url).href;
  const bootstrap =
    `import('tsx/esm/api').then((tsx) => { tsx.register(); return import(${JSON.stringify(entry)}); })` +
    `.catch((err) => { throw err; });`;
  return new Worker(bootstrap, { eval: true, workerData, resourceLimits: WORKER_LIMITS });
}

async function runInThisThread(request: SweepRequest, plan: Unit[], emitter: OrderedEmitter): Promise<void> {
  for (const unit of plan) {
    await emitter.emit(unit, sweepPart(request.conjecture, unit.order, unit.part));
  }
}

async function runInWorkers(request: SweepRequest, plan: Unit[], emitter: OrderedEmitter): Promise<void> {
  const workers: Worker[] = [];
  // A unit's result, or the error it raised: both are taken up strictly in unit order, so the
  // error reported (the first one in plan order) does not depend on which worker is faster.
  const done = new Map<number, SweepPartResult | Error>();
  let nextToAssign = 0;
  let nextToEmit = 0;
  let failure: Error | null = null;
  let emitting = Promise.resolve();

  await new Promise<void>((resolve, reject) => {
    let finished = false;
    const fail = (err: Error): void => {
      if (finished) return;
      finished = true;
      failure = err;
      reject(err);
    };
    const assign = (worker: Worker): void => {
      if (nextToAssign < plan.length) {
        const unit = plan[nextToAssign++];
        worker.postMessage({ id: unit.id, order: unit.order, part: unit.part });
      }
    };
    const drain = (): void => {
      emitting = emitting.then(async () => {
        while (!finished && done.has(nextToEmit)) {
          const result = done.get(nextToEmit) as SweepPartResult | Error;
          done.delete(nextToEmit);
          if (result instanceof Error) throw result;
          await emitter.emit(plan[nextToEmit], result);
          nextToEmit++;
        }
        if (!finished && nextToEmit === plan.length) {
          finished = true;
          resolve();
        }
      });
      emitting.catch((err: Error) => fail(err));
    };
    const count = Math.min(request.threads, plan.length);
    for (let w = 0; w < count; w++) {
      const worker = startWorker({
        file: request.file,
        sha256: request.sha256,
        conjectureName: request.conjectureName,
      });
      workers.push(worker);
      worker.on('message', (reply: WorkerReply) => {
        if (reply.kind === 'ready') assign(worker);
        else if (reply.kind === 'result') {
          done.set(reply.id, reply.result);
          assign(worker);
          drain();
        } else {
          const err = reply.input ? new InputError(reply.message) : new Error(reply.message);
          if (reply.id === undefined) fail(err);
          else {
            done.set(reply.id, err);
            drain();
          }
        }
      });
      worker.on('error', (err) => fail(err));
      worker.on('exit', (code) => {
        if (code !== 0) fail(new Error(`a sweep worker stopped with exit code ${code}`));
      });
    }
  }).finally(async () => {
    await Promise.all(workers.map((w) => w.terminate()));
  });
  if (failure !== null) throw failure;
}

/**
 * Runs the sweep; resolves to whether any graph refuted the claim with a certificate.
 */
export async function runSweep(request: SweepRequest, sink: SweepSink): Promise<boolean> {
  const plan = planUnits(request);
  const emitter = new OrderedEmitter(sink, request.part ?? { index: 0, count: 1 });
  if (request.threads <= 1) await runInThisThread(request, plan, emitter);
  else await runInWorkers(request, plan, emitter);
  return emitter.anyCounterexample;
}
