/**
 * Time to the first counterexample on false claims whose counterexamples are known, over
 * several seeds, for the hunt as shipped (collapse handling on) and the plain cross-entropy
 * method (no distinct pool, no clamping, no perturbation or restart), in the same run and with
 * the same budget (DESIGN.md "A search that keeps exploring").
 *
 * Claims (scenarios of our own; the counterexamples are known independently):
 *  - mantel-10: "a triangle-free graph on 10 vertices has at most 24 edges"; false by Mantel's
 *    theorem (W. Mantel, Wiskundige Opgaven 10 (1907) 60-61): K_{5,5} has 25.
 *  - mantel-12: the same on 12 vertices with 35 edges; K_{6,6} has 36.
 *  - star-radius-12: "a connected graph on 12 vertices has spectral radius <= average degree + 1";
 *    the star K_{1,11} has sqrt(11) = 3.317 > 2 * 11 / 12 + 1 = 2.833.
 *  - lambda2-matching-13 (only when the registry has matchingNumber): "a connected graph has
 *    second largest eigenvalue <= matching number" on 13 vertices; refuted by two stars K_{1,5}
 *    whose centres are joined through a middle vertex (lambda2 = sqrt 5 > 2 = matching number;
 *    the argument is in scores/second-eigenvalue-vs-matching.ts).
 * Environment: BENCH_SEEDS (default 3), BENCH_ITERATIONS (budget per run, default 200), BENCH_BATCH (default 500).
 */
import { startTensorflow, tf } from '../../src/search/backend.js';
import { type Graph } from '../../src/graph/graph.js';
import { INVARIANTS, InvariantMemo } from '../../src/invariants/registry.js';
import { judgeCounterexample } from '../../src/search/counterexample.js';
import {
  type Evaluation,
  HUNT_DEFAULTS,
  type HuntOptions,
  initialHuntState,
  runIteration,
} from '../../src/search/hunt.js';
import { localBatchSource } from '../../src/search/local-source.js';

interface Claim {
  readonly name: string;
  readonly order: number;
  readonly connected: boolean;
  readonly evaluate: (g: Graph) => Evaluation;
}

const mantel = (order: number): Claim => ({
  name: `mantel-${order}`,
  order,
  connected: false,
  evaluate: (g) =>
    new InvariantMemo(g).get('triangleCount') !== 0
      ? { inDomain: false }
      : { inDomain: true, score: g.size - Math.floor((order * order) / 4) + 0.5 },
});

const CLAIMS: Claim[] = [
  mantel(10),
  mantel(12),
  {
    name: 'star-radius-12',
    order: 12,
    connected: true,
    evaluate: (g) => {
      const memo = new InvariantMemo(g);
      if (memo.get('isConnected') !== true) return { inDomain: false };
      return { inDomain: true, score: (memo.get('spectralRadius') as number) - (2 * g.size) / g.order - 1 };
    },
  },
];
if (INVARIANTS.has('matchingNumber')) {
  CLAIMS.push({
    name: 'lambda2-matching-13',
    order: 13,
    connected: true,
    evaluate: (g) => {
      const memo = new InvariantMemo(g);
      if (memo.get('isConnected') !== true) return { inDomain: false };
      return {
        inDomain: true,
        score: (memo.get('secondLargestEigenvalue') as number) - (memo.get('matchingNumber') as number),
      };
    },
  });
}

async function firstFound(
  claim: Claim,
  seed: string,
  explore: boolean,
  budget: number,
  batch: number,
): Promise<{ iteration: number | null; seconds: number; restarts: number; perturbations: number }> {
  const o: HuntOptions = {
    ...HUNT_DEFAULTS,
    seed,
    order: claim.order,
    batch,
    connected: claim.connected,
    explore,
  };
  const source = localBatchSource(tf, seed, claim.evaluate);
  let state = initialHuntState(o);
  const t0 = performance.now();
  for (let i = 0; i < budget; i++) {
    state = (await runIteration(tf, o, state, source, judgeCounterexample)).state;
    if (state.counterexamples.length > 0) {
      return {
        iteration: i,
        seconds: (performance.now() - t0) / 1000,
        restarts: state.collapse.restarts,
        perturbations: state.collapse.perturbations,
      };
    }
  }
  return {
    iteration: null,
    seconds: (performance.now() - t0) / 1000,
    restarts: state.collapse.restarts,
    perturbations: state.collapse.perturbations,
  };
}

export default async function huntComparisonBench(): Promise<void> {
  await startTensorflow(1);
  const seeds = Number(process.env.BENCH_SEEDS ?? 3);
  const budget = Number(process.env.BENCH_ITERATIONS ?? 200);
  const batch = Number(process.env.BENCH_BATCH ?? 500);
  console.log(
    `first counterexample: iteration (seconds); '-' = none within ${budget} iterations; batch ${batch}`,
  );
  console.log(`claim            seed  with collapse handling            plain method`);
  for (const claim of CLAIMS) {
    for (let s = 1; s <= seeds; s++) {
      const a = await firstFound(claim, String(s), true, budget, batch);
      const b = await firstFound(claim, String(s), false, budget, batch);
      const show = (r: typeof a, extra: boolean): string =>
        (r.iteration === null
          ? `-  (${r.seconds.toFixed(0)} s)`
          : `${r.iteration}  (${r.seconds.toFixed(1)} s)`) +
        (extra ? `  perturb ${r.perturbations} restart ${r.restarts}` : '');
      console.log(
        `${claim.name.padEnd(16)} ${String(s).padStart(4)}  ${show(a, true).padEnd(32)}  ${show(b, false)}`,
      );
    }
  }
}
