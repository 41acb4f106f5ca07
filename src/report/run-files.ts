/**
 * What the pictures need from a run directory (DESIGN.md "Run directory"): the manifest, the
 * summary, the score series of log.jsonl and the graph6 files. Read-only; a missing or corrupt
 * file is a one-line InputError naming it.
 */
import { existsSync, readFileSync, createReadStream } from 'node:fs';
import { createInterface } from 'node:readline';
import { join } from 'node:path';
import { InputError } from '../errors.js';

export interface RunScorePoint {
  readonly iteration: number;
  readonly best: number;
  readonly eliteMean: number;
}

export interface RunSummaryGraph {
  readonly graph6: string;
  readonly score: number | string;
  readonly [key: string]: unknown;
}

export interface RunFiles {
  readonly dir: string;
  readonly manifest: Record<string, unknown>;
  readonly summary: Record<string, unknown> | null;
  readonly best: RunSummaryGraph[];
  readonly counterexamples: RunSummaryGraph[];
}

function readJson(path: string): Record<string, unknown> {
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    throw new InputError(`${path}: cannot read it; is the folder a run directory made by 'refute hunt'?`);
  }
  try {
    return JSON.parse(text) as Record<string, unknown>;
  } catch {
    throw new InputError(`${path}: not valid JSON (corrupt or half-written file)`);
  }
}

function g6Lines(path: string): string[] {
  if (!existsSync(path)) return [];
  return readFileSync(path, 'utf8')
    .split('\n')
    .map((l) => l.trim())
    .filter((l) => l !== '');
}

/** Reads run.json, summary.json (if any) and the graph6 files of a run directory. */
export function readRunFiles(dir: string): RunFiles {
  if (!existsSync(join(dir, 'run.json'))) {
    throw new InputError(`${dir}: no run.json here; give a run directory made by 'refute hunt'`);
  }
  const manifest = readJson(join(dir, 'run.json'));
  const summary = existsSync(join(dir, 'summary.json')) ? readJson(join(dir, 'summary.json')) : null;
  const fromSummary = (key: string): RunSummaryGraph[] | null =>
    summary && Array.isArray(summary[key]) ? (summary[key] as RunSummaryGraph[]) : null;
  const best =
    fromSummary('best') ?? g6Lines(join(dir, 'best.g6')).map((graph6) => ({ graph6, score: 'unknown' }));
  const counterexamples =
    fromSummary('counterexamples') ??
    g6Lines(join(dir, 'counterexamples.g6')).map((graph6) => ({ graph6, score: 'unknown' }));
  return { dir, manifest, summary, best, counterexamples };
}

function asNumber(x: unknown): number {
  if (typeof x === 'number') return x;
  if (x === 'Infinity') return Infinity;
  if (x === '-Infinity') return -Infinity;
  return NaN;
}

/** The per-iteration best and elite-mean scores of log.jsonl, streamed (the log can be long). */
export async function readScoreSeries(dir: string): Promise<RunScorePoint[]> {
  const path = join(dir, 'log.jsonl');
  if (!existsSync(path)) return [];
  const out: RunScorePoint[] = [];
  const lines = createInterface({ input: createReadStream(path, 'utf8'), crlfDelay: Infinity });
  let lineNumber = 0;
  for await (const line of lines) {
    lineNumber++;
    if (line.trim() === '') continue;
    let rec: Record<string, unknown>;
    try {
      rec = JSON.parse(line) as Record<string, unknown>;
    } catch {
      // A crash can leave the last line half-written; every earlier line must be whole.
      continue;
    }
    if (rec.event !== 'iteration') continue;
    const iteration = asNumber(rec.iteration);
    if (!Number.isFinite(iteration))
      throw new InputError(`${path} line ${lineNumber}: an iteration record without an iteration number`);
    out.push({ iteration, best: asNumber(rec.best), eliteMean: asNumber(rec.eliteMean) });
  }
  return out;
}
