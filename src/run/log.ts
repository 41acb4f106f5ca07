/**
 * log.jsonl: one JSON object per line, written by pino (synchronously, so a line is on disk
 * when the iteration is over): one "iteration" line per iteration (iteration, best, elite mean,
 * graphs per second, distinct fraction, entropy, collapse action, phase timings) and lines for
 * the run's events (start, resume, counterexample, stop).
 */
import { join } from 'node:path';
import pino from 'pino';

export type RunLogger = pino.Logger;

export function openRunLog(dir: string): RunLogger {
  const destination = pino.destination({
    dest: join(dir, 'log.jsonl'),
    sync: true,
    append: true,
    mkdir: false,
  });
  return pino({ base: null, timestamp: pino.stdTimeFunctions.isoTime }, destination);
}
