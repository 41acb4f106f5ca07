/**
 * What the hunt needs to polish inside its loop (`--polish-every K`): when a polish is due, the
 * polishing of the batch's best distinct graphs at the hunt's order, the improved graphs as
 * edge decisions (graph6 pair order, the order in which the policy decides edges) so they can
 * join the carried pool and the elite, and the finds at other orders as near-miss records for
 * summary.json. Order-changing finds never come back as decisions: a fixed-order hunt's pool
 * holds graphs of its order only.
 */
import { pairBitsOfGraph } from '../pair-bits.js';
import { fromUpperTriangleBits } from '../../graph/builders.js';
import { type Graph } from '../../graph/graph.js';
import { type Evaluation } from '../../conjecture/types.js';
import { graphKey } from '../graph-key.js';
import { type Candidate, takeTop } from '../selection.js';
import { encodeGraph6 } from '../../graph/graph6.js';
import { polishGraphs } from './polish-graphs.js';
import { type Evaluate, type ScoredGraph } from './vns.js';

/** How the hunt polishes. */
export interface HuntPolishSettings {
  /** Polish after every `every`-th iteration (0: never). */
  readonly every: number;
  /** How many of the batch's best distinct in-domain graphs to polish. */
  readonly graphs: number;
  /** Graphs scored per polished graph. */
  readonly steps: number;
}

/**
 * Chosen by measurement (tests/bench/polish.bench.ts, hunt at batch 300, at most 150 iterations,
 * 8 seeds, on scores/second-eigenvalue-vs-matching.ts at n = 14): without polishing 5/8 runs
 * found a certified counterexample (median iteration 57, 5.1 s); polishing 4 graphs x 300 every
 * 10 or 20 iterations did no better (4/8, 3/8); 2 graphs x 3000 every 10 found it in 8/8 (median
 * 29, 2.7 s), every 5 in 8/8 (median 16.5, 1.8 s), every 2 in 8/8 (5, 1.3 s), every 1 in 8/8
 * (1, 0.7 s). A few long polishes beat many short ones: a short one only reaches the nearest
 * local optimum, which then crowds the pool. The default stays at every 5: 6000 extra scored
 * graphs per polish cost about 0.5 s at n = 14, so polishing more often would dominate the
 * iteration time (DESIGN.md's 0.3 s target); on the two quick examples every 5 changes nothing
 * (8/8 at median iteration 2 and 1.5, as without polishing).
 */
export const HUNT_POLISH_DEFAULTS: HuntPolishSettings = Object.freeze({ every: 5, graphs: 2, steps: 3000 });

/** Whether iteration t (0-based) ends with a polish. */
export function polishDue(iteration: number, every: number): boolean {
  return every > 0 && (iteration + 1) % every === 0;
}

/** A polished graph the hunt can take back: at its order and strictly better than where it started. */
export interface ImprovedGraph {
  readonly graph: Graph;
  readonly bits: Uint8Array;
  readonly score: number;
  /** Index of the start graph it came from. */
  readonly from: number;
}

export interface HuntPolishResult {
  readonly improved: readonly ImprovedGraph[];
  /** Best graph found at each other order, by increasing order. */
  readonly nearMisses: readonly ScoredGraph[];
  /** Graphs scored in all. */
  readonly evaluations: number;
}

/**
 * Polishes `starts` (graphs of the hunt's order, best first) in fixed-order mode with the stream
 * keyed by (seed, iteration), so a resumed hunt polishes exactly as an uninterrupted one.
 */
export function polishForHunt(
  evaluate: Evaluate,
  starts: readonly Graph[],
  startScores: readonly number[],
  seed: string,
  iteration: number,
  settings: HuntPolishSettings,
  connected: boolean,
): HuntPolishResult {
  const batch = polishGraphs(evaluate, starts, {
    seed: `${seed}/hunt-polish/${iteration}`,
    steps: settings.steps,
    fixedOrder: true,
    connected,
  });
  const improved: ImprovedGraph[] = [];
  let evaluations = 0;
  batch.outcomes.forEach((o, i) => {
    evaluations += o.evaluations;
    if (o.best !== undefined && o.best.score > startScores[i]) {
      improved.push({
        graph: o.best.graph,
        bits: pairBitsOfGraph(o.best.graph),
        score: o.best.score,
        from: i,
      });
    }
  });
  return { improved, nearMisses: batch.otherOrders, evaluations };
}

/** A near miss at another order as summary.json records it. */
export interface NearMissRecord {
  readonly graph6: string;
  readonly order: number;
  /** "n+1", "n-1", ...: where it stands relative to the hunt's order. */
  readonly offset: string;
  readonly score: number | string;
  /** The hunt's counterexample decision on it: "numerical", "certified", or null (not one). */
  readonly counterexample: 'numerical' | 'certified' | null;
}

/** The record of near miss s of a hunt at order huntOrder, given the hunt's decision on it. */
export function nearMissRecord(
  s: ScoredGraph,
  huntOrder: number,
  counterexample: 'numerical' | 'certified' | null,
): NearMissRecord {
  const d = s.graph.order - huntOrder;
  return {
    graph6: encodeGraph6(s.graph),
    order: s.graph.order,
    offset: `n${d >= 0 ? '+' : '-'}${Math.abs(d)}`,
    score: Number.isFinite(s.score) ? s.score : String(s.score),
    counterexample,
  };
}

/** Merges near misses: the best per order, by increasing order. */
export function mergeNearMisses<T extends ScoredGraph>(
  held: readonly T[],
  found: readonly ScoredGraph[],
): Array<T | ScoredGraph> {
  const byOrder = new Map<number, T | ScoredGraph>();
  for (const s of [...held, ...found]) {
    const h = byOrder.get(s.graph.order);
    if (h === undefined || s.score > h.score) byOrder.set(s.graph.order, s);
  }
  return [...byOrder.entries()].sort((a, b) => a[0] - b[0]).map(([, s]) => s);
}

/** A near miss as the hunt keeps it: the graph, its score, and the hunt's counterexample decision. */
export interface HuntNearMiss extends ScoredGraph {
  readonly counterexample: 'numerical' | 'certified' | null;
}

/** What one polish inside an iteration hands back to the hunt loop. */
export interface IterationPolish {
  /** Improved graphs as candidates for ranking (pool, elite, best-ever), best first. */
  readonly candidates: readonly Candidate[];
  /** The same graphs, for the counterexample decision. */
  readonly graphs: readonly Graph[];
  /** The run's near misses at other orders, updated. */
  readonly nearMisses: readonly HuntNearMiss[];
  readonly improved: number;
  readonly evaluations: number;
}

/**
 * The polish of iteration t of a hunt: the `settings.graphs` best distinct candidates
 * of `ranked` are polished at the hunt's order; the improved ones come back as candidates and
 * the finds at other orders are merged into `held` (best per order, judged by `judge`).
 */
export function polishIteration(
  evaluate: Evaluate,
  judge: (g: Graph, evaluation: Evaluation) => 'numerical' | 'certified' | null,
  ranked: readonly Candidate[],
  held: readonly HuntNearMiss[],
  order: number,
  seed: string,
  iteration: number,
  settings: HuntPolishSettings,
  connected: boolean,
): IterationPolish {
  // The best distinct candidates, in the domain first; a batch with none inside the domain is
  // polished too (the polisher's restarts look for the domain, and any graph found there counts
  // as an improvement over -Infinity).
  const starts = takeTop(ranked, settings.graphs, true);
  const graphs = starts.map((c) => fromUpperTriangleBits(order, c.bits));
  const r = polishForHunt(
    evaluate,
    graphs,
    starts.map((c) => c.score),
    seed,
    iteration,
    settings,
    connected,
  );
  const candidates = r.improved.map((i): Candidate => ({
    bits: i.bits,
    key: graphKey(i.graph),
    inDomain: true,
    score: i.score,
  }));
  const merged = mergeNearMisses(held, r.nearMisses);
  const nearMisses = merged.map((s): HuntNearMiss => {
    const known = held.find((h) => h.graph === s.graph);
    return known ?? { ...s, counterexample: judge(s.graph, { inDomain: true, score: s.score }) };
  });
  return {
    candidates,
    graphs: r.improved.map((i) => i.graph),
    nearMisses,
    improved: r.improved.length,
    evaluations: r.evaluations,
  };
}
