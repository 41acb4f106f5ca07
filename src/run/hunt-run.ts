/**
 * Driving a run: creating or reopening its directory, running iterations until a stop
 * condition, and after each one writing, in this order, new counterexamples (appended),
 * best.g6, summary.json, the checkpoint and a log line. That order makes a crash at any point
 * harmless: a resumed run redoes the iteration in progress and rewrites the same files (the
 * counterexample file is deduplicated against its own content).
 */
import { existsSync, mkdirSync, readdirSync, readFileSync } from 'node:fs';
import { createHash, randomUUID } from 'node:crypto';
import { InputError } from '../errors.js';
import { type Graph } from '../graph/graph.js';
import { TOOL_VERSION } from '../version.js';
import { type TfModule } from '../search/backend.js';
import {
  type BatchSource,
  type CounterexampleJudge,
  type CounterexampleRecord,
  type Evaluation,
  HUNT_DEFAULTS,
  type HuntOptions,
  type HuntState,
  type IterationReport,
  initialHuntState,
  runIteration,
} from '../search/hunt.js';
import { writeCheckpoint, readCheckpoint } from './checkpoint.js';
import { type RunLogger, openRunLog } from './log.js';
import { type RunManifest, type RunOptions, readManifest, writeManifest } from './manifest.js';
import { appendCounterexamples, writeBest, writeSummary } from './results.js';

/** The conjecture as the run needs it. */
export interface HuntTarget {
  readonly name: string;
  readonly path: string;
  readonly sha256: string;
  readonly connected: boolean;
  readonly evaluate: (g: Graph) => Evaluation;
  readonly judge: CounterexampleJudge;
}

export interface StopConditions {
  /** Iterations to run in this invocation. */
  readonly iterations?: number;
  readonly minutes?: number;
  readonly untilFound?: boolean;
}

/** Set `requested` to stop after the iteration in progress (signal handlers do). */
export interface StopFlag {
  requested: boolean;
}

export function huntOptionsOf(options: RunOptions, connected: boolean): HuntOptions {
  return {
    ...HUNT_DEFAULTS,
    seed: options.seed,
    order: options.vertices,
    hidden: options.layers,
    batch: options.batch,
    elite: options.elite,
    keep: options.keep,
    learningRate: options.learningRate,
    trainGraphs: options.trainGraphs,
    explore: options.explore,
    connected,
    polish: { ...HUNT_DEFAULTS.polish, every: options.polishEvery ?? 0 },
  };
}

/** sha256 of a file's bytes, or an InputError naming it. */
export function fileSha256(path: string): string {
  try {
    return createHash('sha256').update(readFileSync(path)).digest('hex');
  } catch {
    throw new InputError(`${path}: cannot read the conjecture file`);
  }
}

/** Creates the run directory (which must not exist or be empty) and its manifest. */
export function createRun(
  dir: string,
  target: HuntTarget,
  options: RunOptions,
  backend: string,
): RunManifest {
  if (existsSync(dir) && readdirSync(dir).length > 0) {
    throw new InputError(
      `${dir}: the output folder exists and is not empty; choose another --out, or continue that run with 'refute resume ${dir}'`,
    );
  }
  try {
    mkdirSync(dir, { recursive: true });
  } catch (err) {
    throw new InputError(
      `${dir}: cannot create the output folder (${(err as NodeJS.ErrnoException).code ?? String(err)})`,
    );
  }
  const manifest: RunManifest = {
    format: 'refute-run',
    version: 1,
    runId: randomUUID(),
    toolVersion: TOOL_VERSION,
    conjecture: { path: target.path, sha256: target.sha256, name: target.name, connected: target.connected },
    options,
    backend,
    startedAt: new Date().toISOString(),
  };
  writeManifest(dir, manifest);
  return manifest;
}

/** Reads a run's manifest and checkpoint for resuming; refuses a changed conjecture file. */
export function reopenRun(dir: string): { manifest: RunManifest; state: HuntState } {
  const manifest = readManifest(dir);
  const now = fileSha256(manifest.conjecture.path);
  if (now !== manifest.conjecture.sha256) {
    throw new InputError(
      `${manifest.conjecture.path}: the conjecture file changed since the run started (sha256 ${now.slice(0, 12)}... vs ${manifest.conjecture.sha256.slice(0, 12)}... in run.json); restore it or start a new run with 'refute hunt'`,
    );
  }
  return { manifest, state: readCheckpoint(dir, manifest.runId) };
}

export interface DriveContext {
  readonly tf: TfModule;
  readonly dir: string;
  readonly manifest: RunManifest;
  readonly target: HuntTarget;
  readonly source: BatchSource;
  readonly stop: StopConditions;
  readonly flag: StopFlag;
  /** Called after each iteration, once its files are written (progress line, report); awaited. */
  readonly onIteration?: (
    report: IterationReport,
    state: HuntState,
    elapsedMs: number,
  ) => void | Promise<void>;
  /** Called with each counterexample newly written to counterexamples.g6. */
  readonly onCounterexample?: (record: CounterexampleRecord) => void | Promise<void>;
  readonly resumed: boolean;
}

export interface DriveResult {
  readonly state: HuntState;
  readonly iterationsRun: number;
  readonly stoppedBy: 'iterations' | 'minutes' | 'found' | 'signal';
}

function jsonNumber(x: number): number | string {
  return Number.isFinite(x) ? x : String(x);
}

function logIteration(log: RunLogger, r: IterationReport, state: HuntState, batch: number): void {
  const ms = r.timings.generate + r.timings.score + r.timings.select + r.timings.train;
  log.info(
    {
      event: 'iteration',
      iteration: r.iteration,
      best: jsonNumber(r.best),
      eliteMean: jsonNumber(r.eliteMean),
      graphsPerSecond: ms > 0 ? Math.round((batch * 1000) / ms) : null,
      distinct: r.distinctFraction,
      entropy: Number(r.meanEntropy.toFixed(5)),
      inDomain: r.inDomainFraction,
      repaired: r.repaired,
      loss: Number(r.trainingLoss.toFixed(6)),
      collapsed: r.collapsed,
      action: r.action,
      perturbations: state.collapse.perturbations,
      restarts: state.collapse.restarts,
      polish: r.polish,
      nearMisses: state.nearMisses.length,
      ms: {
        generate: Math.round(r.timings.generate),
        score: Math.round(r.timings.score),
        select: Math.round(r.timings.select),
        train: Math.round(r.timings.train),
      },
    },
    'iteration',
  );
}

/** Writes everything that belongs to `state` (used before the first iteration too). */
export function persist(dir: string, manifest: RunManifest, state: HuntState): void {
  writeBest(dir, state);
  writeSummary(dir, state, {
    conjecture: {
      name: manifest.conjecture.name,
      path: manifest.conjecture.path,
      sha256: manifest.conjecture.sha256,
    },
    iterations: state.iteration,
    perturbations: state.collapse.perturbations,
    restarts: state.collapse.restarts,
  });
  writeCheckpoint(dir, manifest.runId, state);
}

/** A fresh state for a new run. */
export function freshState(manifest: RunManifest): HuntState {
  return initialHuntState(huntOptionsOf(manifest.options, manifest.conjecture.connected));
}

/** Runs iterations from `state` until a stop condition holds. */
export async function driveRun(ctx: DriveContext, initial: HuntState): Promise<DriveResult> {
  const { dir, manifest } = ctx;
  const options = huntOptionsOf(manifest.options, manifest.conjecture.connected);
  const log = openRunLog(dir);
  log.info(
    { event: ctx.resumed ? 'resume' : 'start', iteration: initial.iteration, backend: manifest.backend },
    ctx.resumed ? 'resume' : 'start',
  );
  if (!ctx.resumed) persist(dir, manifest, initial);
  let state = initial;
  const started = performance.now();
  let ran = 0;
  let stoppedBy: DriveResult['stoppedBy'] = 'signal';
  for (;;) {
    // Let pending signal callbacks run: an iteration is synchronous work, and without a turn of
    // the event loop a SIGINT would wait for the whole run.
    await new Promise((resolve) => setImmediate(resolve));
    if (ctx.flag.requested) {
      stoppedBy = 'signal';
      break;
    }
    if (ctx.stop.untilFound && state.counterexamples.length > 0) {
      stoppedBy = 'found';
      break;
    }
    if (ctx.stop.iterations !== undefined && ran >= ctx.stop.iterations) {
      stoppedBy = 'iterations';
      break;
    }
    if (ctx.stop.minutes !== undefined && performance.now() - started >= ctx.stop.minutes * 60_000) {
      stoppedBy = 'minutes';
      break;
    }
    const { state: next, report } = await runIteration(
      ctx.tf,
      options,
      state,
      ctx.source,
      ctx.target.judge,
      ctx.target.evaluate,
    );
    const written = appendCounterexamples(dir, report.newCounterexamples);
    persist(dir, manifest, next);
    logIteration(log, report, next, options.batch);
    for (const c of written) {
      log.info(
        {
          event: 'counterexample',
          iteration: report.iteration,
          graph6: c.key,
          score: jsonNumber(c.score),
          certification: c.certification,
        },
        'counterexample',
      );
      await ctx.onCounterexample?.(c);
    }
    state = next;
    ran++;
    await ctx.onIteration?.(report, state, performance.now() - started);
  }
  log.info(
    {
      event: 'stop',
      iteration: state.iteration,
      reason: stoppedBy,
      counterexamples: state.counterexamples.length,
    },
    'stop',
  );
  log.flush();
  return { state, iterationsRun: ran, stoppedBy };
}
