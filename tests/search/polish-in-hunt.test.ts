/**
 * Polishing inside the hunt (--polish-every): improved graphs join the ranking and the carried
 * pool, finds at other orders are kept apart as near misses (checkpoint and summary.json), and a
 * run with polishing stays deterministic and resumable byte for byte.
 *
 * The claim (a scenario of our own, as in polish-search.test.ts): "for connected triangle-free
 * G, spectralRadius <= averageDegree + 1", false for stars K_{1,n-1}, n >= 9 (sqrt(n-1) against
 * 3 - 2/n).
 */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { beforeAll, describe, expect, test } from 'vitest';
import { evaluateConjecture } from '../../src/conjecture/evaluate.js';
import { loadConjectureFile, selectConjecture } from '../../src/conjecture/load.js';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { type Graph } from '../../src/graph/graph.js';
import { huntTarget } from '../../src/cli/hunt.js';
import { type HuntTarget } from '../../src/run/hunt-run.js';
import { type RunOptions } from '../../src/run/manifest.js';
import { startTensorflow, tf } from '../../src/search/backend.js';
import { judgeCounterexample } from '../../src/search/counterexample.js';
import {
  HUNT_DEFAULTS,
  type HuntOptions,
  type HuntState,
  initialHuntState,
  runIteration,
} from '../../src/search/hunt.js';
import { localBatchSource } from '../../src/search/local-source.js';
import { SPECTRAL_GAP as GAP } from '../support/spectral-gap-claim.js';
import { driveHunt } from '../support/drive-hunt.js';

const evaluate = (g: Graph) => evaluateConjecture(GAP, g);

beforeAll(async () => {
  await startTensorflow(1);
});

const options: HuntOptions = {
  ...HUNT_DEFAULTS,
  seed: 'polish',
  order: 10,
  hidden: [16, 8, 4],
  batch: 40,
  connected: true,
  polish: { every: 1, graphs: 2, steps: 150 },
};

async function iterate(o: HuntOptions, k: number, withPolish: boolean) {
  const source = localBatchSource(tf, o.seed, evaluate);
  let state: HuntState = initialHuntState(o);
  const reports = [];
  for (let i = 0; i < k; i++) {
    const r = await runIteration(
      tf,
      o,
      state,
      source,
      judgeCounterexample,
      withPolish ? evaluate : undefined,
    );
    state = r.state;
    reports.push(r.report);
  }
  return { state, reports };
}

describe('runIteration() with polishing', () => {
  test('improved graphs join the pool; near misses stay at other orders; without a scorer nothing is polished', async () => {
    const { state, reports } = await iterate(options, 2, true);
    expect(reports.every((r) => r.polish !== null)).toBe(true);
    expect(reports.some((r) => r.polish!.improved > 0)).toBe(true);
    for (const r of reports) expect(r.polish!.evaluations).toBeLessThanOrEqual(2 * 150);
    // Every graph of the pool and best list is at the hunt order; near misses never are.
    for (const c of [...state.pool, ...state.best]) expect(decodeGraph6(c.key).order).toBe(10);
    expect(state.nearMisses.length).toBeGreaterThan(0);
    for (const s of state.nearMisses) {
      expect(Math.abs(s.graph.order - 10)).toBe(1);
      const ev = evaluate(s.graph);
      expect(ev.inDomain && ev.score).toBe(s.score);
    }
    // Polishing the best of a random batch of 40 reaches a certified counterexample here.
    expect(state.counterexamples.length).toBeGreaterThan(0);

    const plain = await iterate(options, 2, false);
    expect(plain.reports.every((r) => r.polish === null)).toBe(true);
    expect(plain.state.nearMisses).toEqual([]);
  });

  test('is deterministic: the same seed gives the same pool, best list and near misses', async () => {
    const a = await iterate(options, 3, true);
    const b = await iterate(options, 3, true);
    const key = (s: HuntState) => [
      s.pool.map((c) => c.key),
      s.best.map((c) => [c.key, c.score]),
      s.nearMisses.map((n) => [n.graph.order, n.score]),
    ];
    expect(key(b.state)).toEqual(key(a.state));
  });
});

describe('a run with --polish-every', () => {
  let target: HuntTarget;
  const work = mkdtempSync(join(tmpdir(), 'refute-polish-hunt-'));
  const file = join(work, 'gap.ts');
  const runOptions: RunOptions = {
    vertices: 10,
    seed: 'p',
    batch: 40,
    elite: 0.1,
    keep: 0.05,
    layers: [16, 8, 4],
    learningRate: 0.003,
    trainGraphs: 4,
    explore: true,
    polishEvery: 1,
  };

  beforeAll(async () => {
    writeFileSync(
      file,
      `import { defineConjecture } from 'refute';
export default defineConjecture({
  name: 'triangle-free-spectral-gap',
  statement: 'For connected triangle-free G: spectralRadius <= averageDegree + 1',
  vertices: 10,
  connected: true,
  where: (g) => g.triangleCount === 0,
  score: (g) => g.spectralRadius - g.averageDegree - 1,
});
`,
    );
    const loaded = await loadConjectureFile(file);
    target = huntTarget(loaded, selectConjecture(loaded));
  });

  const run = (dir: string, iterations: number, resume: boolean): Promise<void> =>
    driveHunt(dir, target, runOptions, iterations, resume);

  test('summary.json lists near misses at n±1, and 2K iterations == K + resume K byte for byte', async () => {
    const whole = join(work, 'whole');
    const split = join(work, 'split');
    await run(whole, 4, false);
    await run(split, 2, false);
    await run(split, 2, true);
    for (const f of ['best.g6', 'counterexamples.g6', 'checkpoint/weights.bin', 'checkpoint/optimizer.bin']) {
      expect(readFileSync(join(split, f)).equals(readFileSync(join(whole, f))), f).toBe(true);
    }
    // state.json names its run (runId), so compare its content without that.
    const state = (dir: string) => {
      const s = JSON.parse(readFileSync(join(dir, 'checkpoint/state.json'), 'utf8'));
      delete s.runId;
      return s;
    };
    expect(state(split)).toEqual(state(whole));
    const summary = JSON.parse(readFileSync(join(whole, 'summary.json'), 'utf8'));
    expect(summary.nearMisses.length).toBeGreaterThan(0);
    for (const m of summary.nearMisses) {
      expect(['n-1', 'n+1']).toContain(m.offset);
      expect(decodeGraph6(m.graph6).order).toBe(m.order);
    }
    const splitSummary = JSON.parse(readFileSync(join(split, 'summary.json'), 'utf8'));
    expect(splitSummary.nearMisses).toEqual(summary.nearMisses);
  });
});
