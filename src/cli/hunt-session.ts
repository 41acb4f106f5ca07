/**
 * What `refute hunt` and `refute resume` share once the run directory is ready: signal
 * handling (SIGINT and SIGTERM stop after the iteration in progress, whose checkpoint is then
 * written), the progress line on stderr (only when it is a terminal), counterexamples printed
 * to stdout as graph6 as they are found, and the exit status (0 when the run holds a
 * counterexample, 1 when not).
 */
import { type TfModule } from '../search/backend.js';
import { type HuntState, type IterationReport } from '../search/hunt.js';
import { localBatchSource } from '../search/local-source.js';
import { workerBatchSource } from '../search/worker-source.js';
import {
  type DriveResult,
  type HuntTarget,
  type StopConditions,
  type StopFlag,
  driveRun,
} from '../run/hunt-run.js';
import { type RunManifest } from '../run/manifest.js';
import { formatNumber } from '../invariants/encode.js';
import { writeOut } from './output.js';
import { writeRunReport } from './report.js';
import { type ExitStatus } from './main.js';

function clock(ms: number): string {
  const s = Math.floor(ms / 1000);
  const h = Math.floor(s / 3600);
  const m = Math.floor((s % 3600) / 60);
  const sec = s % 60;
  return h > 0
    ? `${h}:${String(m).padStart(2, '0')}:${String(sec).padStart(2, '0')}`
    : `${m}:${String(sec).padStart(2, '0')}`;
}

/** The one-line progress report. */
export function progressLine(
  r: IterationReport,
  state: HuntState,
  elapsedMs: number,
  batch: number,
  stop: StopConditions,
  ran: number,
): string {
  const ms = r.timings.generate + r.timings.score + r.timings.select + r.timings.train;
  const rate = ms > 0 ? Math.round((batch * 1000) / ms) : 0;
  let left = '';
  if (stop.minutes !== undefined) left = ` (${clock(Math.max(0, stop.minutes * 60_000 - elapsedMs))} left)`;
  else if (stop.iterations !== undefined && ran > 0)
    left = ` (~${clock(((stop.iterations - ran) * elapsedMs) / ran)} left)`;
  const collapse = r.collapsed ? '  COLLAPSED' : '';
  const event = r.action === 'none' ? '' : `  ${r.action.toUpperCase()}`;
  return (
    `it ${r.iteration}  best ${formatNumber(r.best)}  elite ${formatNumber(Number(r.eliteMean.toPrecision(4)))}` +
    `  ${rate} graphs/s  ${clock(elapsedMs)}${left}  found ${state.counterexamples.length}` +
    `  distinct ${Math.round(r.distinctFraction * 100)}%  H ${r.meanEntropy.toFixed(2)}` +
    `  perturb ${state.collapse.perturbations} restart ${state.collapse.restarts}${collapse}${event}`
  );
}

export interface SessionInput {
  readonly tf: TfModule;
  readonly dir: string;
  readonly manifest: RunManifest;
  readonly target: HuntTarget;
  readonly state: HuntState;
  readonly stop: StopConditions;
  readonly threads: number;
  readonly resumed: boolean;
  /** Keep DIR/report.html up to date (--report). */
  readonly report?: boolean;
}

/**
 * Rewrites report.html after an iteration, but not more often than ten times the time the last
 * report took (and at least 5 s apart), so that on a long run the report costs under 10%.
 */
function reportRefresher(dir: string): { maybe(): Promise<void>; now(): Promise<void> } {
  let nextAt = 0;
  const now = async (): Promise<void> => {
    const t0 = performance.now();
    await writeRunReport(dir);
    const took = performance.now() - t0;
    nextAt = performance.now() + Math.max(5000, 10 * took);
  };
  return { now, maybe: async () => (performance.now() >= nextAt ? now() : undefined) };
}

export async function runSession(input: SessionInput): Promise<{ status: ExitStatus; result: DriveResult }> {
  const flag: StopFlag = { requested: false };
  const onSignal = (): void => {
    flag.requested = true;
  };
  process.on('SIGINT', onSignal);
  process.on('SIGTERM', onSignal);
  const tty = process.stderr.isTTY === true;
  const seed = input.manifest.options.seed;
  const source =
    input.threads > 1
      ? await workerBatchSource(input.threads, seed, input.manifest.conjecture.path, input.target.name)
      : localBatchSource(input.tf, seed, input.target.evaluate);
  let ran = 0;
  const report = input.report ? reportRefresher(input.dir) : null;
  try {
    if (tty) process.stderr.write(`refute: run folder ${input.dir}\n`);
    const result = await driveRun(
      {
        tf: input.tf,
        dir: input.dir,
        manifest: input.manifest,
        target: input.target,
        source,
        stop: input.stop,
        flag,
        resumed: input.resumed,
        onIteration: async (iteration, state, elapsed) => {
          ran++;
          if (tty) {
            const line = progressLine(
              iteration,
              state,
              elapsed,
              input.manifest.options.batch,
              input.stop,
              ran,
            );
            process.stderr.write(`\r\x1b[2K${line.slice(0, (process.stderr.columns ?? 200) - 1)}`);
          }
          await report?.maybe();
        },
        onCounterexample: async (c) => {
          if (tty) process.stderr.write('\n');
          await writeOut(c.key + '\n');
        },
      },
      input.state,
    );
    await report?.now();
    if (tty) {
      const best = result.state.best.length > 0 ? formatNumber(result.state.best[0].score) : 'none';
      process.stderr.write(
        `\nrefute: stopped (${result.stoppedBy}) after iteration ${result.state.iteration - 1}; best score ${best}; ` +
          `${result.state.counterexamples.length} counterexample(s) in ${input.dir}\n`,
      );
    }
    return { status: result.state.counterexamples.length > 0 ? 0 : 1, result };
  } finally {
    process.off('SIGINT', onSignal);
    process.off('SIGTERM', onSignal);
    await source.close?.();
  }
}
