/**
 * How often and how fast the polisher alone refutes false claims from random starts, against
 * random sampling with the same budget: `npm run bench -- polish`.
 *
 * First the example conjectures of scores/ (Hong's bound is a true theorem with tight cases: its
 * row must stay at 0), then claims of this file, each false with counterexamples of a different
 * shape: stars (spectral gap), complete bipartite graphs (energy against edges), long paths
 * (Wiener index), two dense halves joined thinly (second eigenvalue), near-complete graphs
 * (triangles against edges: t <= (sqrt 2 / 3) m^(3/2) is a theorem, tight for cliques, and
 * 0.4 < sqrt 2 / 3 makes K_11 and K_12 counterexamples).
 *
 * Each start is a seeded G(n, 0.3); each run gets BUDGET scored graphs (BENCH_POLISH_BUDGET,
 * default 3000). Reported per claim: runs that refuted (verdict.ts), and the medians over the
 * refuting runs of graphs scored and milliseconds until the first refutation.
 */
import seedrandom from 'seedrandom';
import { fileURLToPath } from 'node:url';
import { readdirSync } from 'node:fs';
import { join } from 'node:path';
import { defineConjecture } from '../../src/conjecture/define.js';
import { loadConjectureFile } from '../../src/conjecture/load.js';
import { judge } from '../../src/conjecture/verdict.js';
import { evaluateConjecture } from '../../src/conjecture/evaluate.js';
import { type Conjecture, type Evaluation } from '../../src/conjecture/types.js';
import { type Graph } from '../../src/graph/graph.js';
import { polishGraph, POLISH_DEFAULTS } from '../../src/search/polish/vns.js';
import { polishStream } from '../../src/search/polish/polish-graphs.js';
import { randomGraph } from '../support/random-graph.js';
import { startTensorflow, tf } from '../../src/search/backend.js';
import { judgeCounterexample } from '../../src/search/counterexample.js';
import { isCertifiedCounterexample } from '../../src/certify/certify.js';
import { HUNT_DEFAULTS, type HuntOptions, initialHuntState, runIteration } from '../../src/search/hunt.js';
import { localBatchSource } from '../../src/search/local-source.js';
import { row } from './timing.js';

const BUDGET = Number(process.env.BENCH_POLISH_BUDGET ?? 3000);
const RUNS = 10;

const CLAIMS: readonly Conjecture[] = [
  defineConjecture({
    name: 'triangle-free-spectral-gap',
    statement: 'For connected triangle-free G: spectralRadius <= averageDegree + 1',
    vertices: 12,
    connected: true,
    where: (g) => g.triangleCount === 0,
    score: (g) => g.spectralRadius - g.averageDegree - 1,
  }),
  defineConjecture({
    name: 'energy-above-edges',
    statement: 'For connected G: energy >= 2 sqrt(size) + 1/2',
    vertices: 12,
    connected: true,
    score: (g) => 2 * Math.sqrt(g.size) + 0.5 - g.energy,
  }),
  defineConjecture({
    name: 'wiener-cubic',
    statement: 'For connected G: wienerIndex <= order^3 / 8',
    vertices: 14,
    connected: true,
    score: (g) => g.wienerIndex - g.order ** 3 / 8,
  }),
  defineConjecture({
    name: 'second-eigenvalue-half',
    statement: 'For connected G: secondLargestEigenvalue <= order/2 - 1.5',
    vertices: 12,
    connected: true,
    score: (g) => g.secondLargestEigenvalue - g.order / 2 + 1.5,
  }),
  defineConjecture({
    name: 'triangles-against-edges',
    statement: 'For connected G: triangleCount <= 0.4 size^(3/2)',
    vertices: 12,
    connected: true,
    score: (g) => g.triangleCount - 0.4 * g.size ** 1.5,
  }),
];

interface RunResult {
  readonly refuted: boolean;
  readonly scored: number;
  readonly ms: number;
}

/** evaluate wrapped to note when (graphs scored, ms) the first refutation (verdict.ts) appears. */
function watched(c: Conjecture): { evaluate: (g: Graph) => Evaluation; first: () => RunResult } {
  let count = 0;
  let hit: RunResult | undefined;
  const t0 = performance.now();
  return {
    evaluate: (g) => {
      const ev = evaluateConjecture(c, g);
      count++;
      if (hit === undefined && judge(c, g, ev).kind === 'refutes') {
        hit = { refuted: true, scored: count, ms: performance.now() - t0 };
      }
      return ev;
    },
    first: () => hit ?? { refuted: false, scored: count, ms: performance.now() - t0 },
  };
}

function polishRun(c: Conjecture, seed: number): RunResult {
  const start = randomGraph(c.vertices, 0.3, seedrandom(`bench-start-${seed}`));
  const w = watched(c);
  polishGraph(w.evaluate, start, polishStream(`bench-${seed}`, 0), {
    ...POLISH_DEFAULTS,
    steps: BUDGET,
    fixedOrder: true,
    connected: c.connected,
  });
  return w.first();
}

/** The baseline: BUDGET independent G(n, p) graphs, p uniform in (0, 1) per graph. */
function samplingRun(c: Conjecture, seed: number): RunResult {
  const rng = seedrandom(`bench-sample-${seed}`);
  const w = watched(c);
  for (let i = 0; i < BUDGET && !w.first().refuted; i++) w.evaluate(randomGraph(c.vertices, rng(), rng));
  return w.first();
}

function median(xs: number[]): number {
  if (xs.length === 0) return NaN;
  const s = [...xs].sort((a, b) => a - b);
  const mid = s.length >> 1;
  return s.length % 2 === 1 ? s[mid] : (s[mid - 1] + s[mid]) / 2;
}

const HUNT_SEEDS = Number(process.env.BENCH_SEEDS ?? 3);
const HUNT_ITERATIONS = Number(process.env.BENCH_ITERATIONS ?? 60);
const HUNT_BATCH = Number(process.env.BENCH_BATCH ?? 300);
const POLISH_EVERY = (process.env.BENCH_POLISH_EVERY ?? '0,5,1').split(',').map(Number);

/** Iteration (0-based) and seconds to the hunt's first certified counterexample, or null. */
async function huntRun(c: Conjecture, seed: string, every: number) {
  const o: HuntOptions = {
    ...HUNT_DEFAULTS,
    seed,
    order: c.vertices,
    batch: HUNT_BATCH,
    connected: c.connected,
    polish: {
      every,
      graphs: Number(process.env.BENCH_POLISH_GRAPHS ?? HUNT_DEFAULTS.polish.graphs),
      steps: Number(process.env.BENCH_POLISH_STEPS ?? HUNT_DEFAULTS.polish.steps),
    },
  };
  const evaluate = (g: Graph) => evaluateConjecture(c, g);
  const source = localBatchSource(tf, seed, evaluate);
  // As refute hunt decides (src/cli/hunt.ts): the float pre-check, then exact certification.
  const judge = (g: Graph, ev: Evaluation) =>
    judgeCounterexample(g, ev) !== null && isCertifiedCounterexample(c, g) ? ('certified' as const) : null;
  let state = initialHuntState(o);
  const t0 = performance.now();
  for (let i = 0; i < HUNT_ITERATIONS; i++) {
    state = (await runIteration(tf, o, state, source, judge, evaluate)).state;
    if (state.counterexamples.length > 0) return { iteration: i, seconds: (performance.now() - t0) / 1000 };
  }
  return { iteration: null, seconds: (performance.now() - t0) / 1000 };
}

/** The hunt with polishing every K iterations against the hunt without it (K = 0). */
async function huntTable(claims: readonly Conjecture[]): Promise<void> {
  await startTensorflow(1);
  console.log(
    `\nhunt to the first certified counterexample, ${HUNT_SEEDS} seeds, batch ${HUNT_BATCH}, at most ${HUNT_ITERATIONS} iterations;` +
      ` polish: ${process.env.BENCH_POLISH_GRAPHS ?? HUNT_DEFAULTS.polish.graphs} graphs x ${process.env.BENCH_POLISH_STEPS ?? HUNT_DEFAULTS.polish.steps} scored graphs`,
  );
  const widths = [38, 4, 12, 8, 14, 10];
  console.log(row(['claim', 'n', 'polish-every', 'found', 'med iteration', 'med s'], widths));
  for (const c of claims) {
    for (const every of POLISH_EVERY) {
      const rs = [];
      for (let s = 1; s <= HUNT_SEEDS; s++) rs.push(await huntRun(c, String(s), every));
      const hits = rs.filter((r) => r.iteration !== null);
      console.log(
        row(
          [
            c.name,
            c.vertices,
            every === 0 ? 'off' : every,
            `${hits.length}/${rs.length}`,
            hits.length ? median(hits.map((r) => r.iteration!)) : '-',
            hits.length ? median(hits.map((r) => r.seconds)).toFixed(1) : '-',
          ],
          widths,
        ),
      );
    }
  }
}

export default async function polishBench(): Promise<void> {
  console.log(
    `polish from G(n, 0.3) vs random G(n, p) sampling; ${RUNS} seeds, ${BUDGET} scored graphs per run`,
  );
  const widths = [38, 4, 8, 11, 8, 9, 11, 8];
  console.log(
    row(['claim', 'n', 'polish', 'med scored', 'med ms', 'sampling', 'med scored', 'med ms'], widths),
  );
  const scoresDir = fileURLToPath(new URL('../../scores/', import.meta.url));
  const examples: Conjecture[] = [];
  for (const f of readdirSync(scoresDir)
    .filter((x) => x.endsWith('.ts'))
    .sort()) {
    examples.push(...(await loadConjectureFile(join(scoresDir, f))).conjectures);
  }
  for (const c of [...examples, ...CLAIMS]) {
    const polish: RunResult[] = [];
    const sampling: RunResult[] = [];
    for (let s = 0; s < RUNS; s++) {
      polish.push(polishRun(c, s));
      sampling.push(samplingRun(c, s));
    }
    const stats = (rs: RunResult[]): Array<string | number> => {
      const hits = rs.filter((r) => r.refuted);
      return [
        `${hits.length}/${rs.length}`,
        hits.length ? median(hits.map((r) => r.scored)) : '-',
        hits.length ? median(hits.map((r) => r.ms)).toFixed(1) : '-',
      ];
    };
    console.log(row([c.name, c.vertices, ...stats(polish), ...stats(sampling)], widths));
  }
  if (process.env.BENCH_POLISH_HUNT !== '0') {
    const only = process.env.BENCH_CLAIMS?.split(',');
    await huntTable(
      examples.filter(
        (c) => c.name !== 'hong-spectral-radius-bound' && (only === undefined || only.includes(c.name)),
      ),
    );
  }
}
