/**
 * The run's result files: best.g6 (the best-ever distinct graphs, best first, one canonical
 * graph6 per line, replaced atomically), counterexamples.g6 (append-only, one key per line, never a
 * duplicate even across a crash and resume) and summary.json (the same graphs with their scores,
 * certification and a few key invariants, replaced atomically).
 */
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { fromUpperTriangleBits } from '../graph/builders.js';
import { decodeGraph6 } from '../graph/graph6.js';
import { type Graph } from '../graph/graph.js';
import { componentCount } from '../invariants/components.js';
import { type CounterexampleRecord, type HuntState } from '../search/hunt.js';
import { appendDurably, replaceAtomically } from './atomic-files.js';
import { nearMissRecord } from '../search/polish/hunt-bridge.js';

export function bestPath(dir: string): string {
  return join(dir, 'best.g6');
}

export function counterexamplesPath(dir: string): string {
  return join(dir, 'counterexamples.g6');
}

export function summaryPath(dir: string): string {
  return join(dir, 'summary.json');
}

/**
 * Rewrites best.g6 from the state's best-ever list, each graph by its key (canonical graph6),
 * so that a graph reads the same in best.g6, counterexamples.g6 and summary.json.
 */
export function writeBest(dir: string, state: HuntState): void {
  const lines = state.best.map((c) => c.key + '\n');
  replaceAtomically(bestPath(dir), lines.join(''));
}

/** The lines already in counterexamples.g6. */
export function readCounterexampleLines(dir: string): string[] {
  const path = counterexamplesPath(dir);
  if (!existsSync(path)) return [];
  return readFileSync(path, 'utf8')
    .split('\n')
    .filter((l) => l !== '');
}

/** Appends the records not yet in counterexamples.g6 (by key) and returns those appended. */
export function appendCounterexamples(
  dir: string,
  records: readonly CounterexampleRecord[],
): CounterexampleRecord[] {
  if (records.length === 0) return [];
  const present = new Set(readCounterexampleLines(dir));
  const fresh = records.filter((r) => !present.has(r.key));
  if (fresh.length > 0) appendDurably(counterexamplesPath(dir), fresh.map((r) => r.key + '\n').join(''));
  return fresh;
}

function keyInvariants(g: Graph): Record<string, number> {
  let minDegree = g.order > 0 ? Infinity : 0;
  let maxDegree = 0;
  for (const d of g.degrees) {
    if (d < minDegree) minDegree = d;
    if (d > maxDegree) maxDegree = d;
  }
  return { order: g.order, size: g.size, minDegree, maxDegree, componentCount: componentCount(g) };
}

function jsonScore(x: number): number | string {
  return Number.isFinite(x) ? x : String(x);
}

export interface SummaryContext {
  readonly conjecture: { readonly name: string; readonly path: string; readonly sha256: string };
  readonly iterations: number;
  readonly perturbations: number;
  readonly restarts: number;
}

/** Rewrites summary.json. */
export function writeSummary(dir: string, state: HuntState, context: SummaryContext): void {
  const order = state.weights.shape.order;
  const summary = {
    conjecture: context.conjecture,
    iterations: context.iterations,
    collapse: { perturbations: context.perturbations, restarts: context.restarts },
    counterexamples: state.counterexamples.map((c) => ({
      graph6: c.key,
      score: jsonScore(c.score),
      certification: c.certification,
      ...keyInvariants(decodeGraph6(c.key)),
    })),
    best: state.best.map((c) => {
      const g = fromUpperTriangleBits(order, c.bits);
      return { graph6: c.key, score: jsonScore(c.score), ...keyInvariants(g) };
    }),
    // Polishing's best graph at each other order (a counterexample at n+1 still refutes).
    nearMisses: state.nearMisses.map((s) => ({
      ...nearMissRecord(s, order, s.counterexample),
      ...keyInvariants(s.graph),
    })),
  };
  replaceAtomically(summaryPath(dir), JSON.stringify(summary, null, 2) + '\n');
}
