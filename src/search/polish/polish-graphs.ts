/**
 * Polishing several graphs, the entry point for the hunt and for `refute polish`: each graph is
 * polished by variable neighbourhood search (vns.ts) with its own seeded stream, keyed by
 * (seed, index), so a result depends only on the seed, the settings and that graph's place.
 */
import seedrandom from 'seedrandom';
import { type Graph } from '../../graph/graph.js';
import {
  type Evaluate,
  polishGraph,
  POLISH_DEFAULTS,
  type PolishOutcome,
  type PolishSettings,
  type ScoredGraph,
} from './vns.js';

/** Settings of {@link polishGraphs}: those of one polish (defaults: POLISH_DEFAULTS) and the seed. */
export interface PolishGraphsOptions extends Partial<PolishSettings> {
  /** Seed of every random choice (any string; the hunt passes e.g. `${seed}/${iteration}`). */
  readonly seed: string;
}

/** What {@link polishGraphs} returns. */
export interface PolishedBatch {
  /** One outcome per input graph, in input order. */
  readonly outcomes: readonly PolishOutcome[];
  /**
   * The best graph found at each order other than its input's, over all inputs, by increasing
   * order (the "near misses at order n±k" of a fixed-order hunt).
   */
  readonly otherOrders: readonly ScoredGraph[];
}

/** The random stream of input `index` under `seed`. */
export function polishStream(seed: string, index: number): () => number {
  return seedrandom(`${seed}/polish/${index}`);
}

/** Polishes each graph (see the module comment). */
export function polishGraphs(
  evaluate: Evaluate,
  graphs: readonly Graph[],
  options: PolishGraphsOptions,
): PolishedBatch {
  const settings: PolishSettings = { ...POLISH_DEFAULTS, ...options };
  const outcomes = graphs.map((g, i) => polishGraph(evaluate, g, polishStream(options.seed, i), settings));
  const byOrder = new Map<number, ScoredGraph>();
  for (const o of outcomes) {
    for (const s of o.otherOrders) {
      const held = byOrder.get(s.graph.order);
      if (held === undefined || s.score > held.score) byOrder.set(s.graph.order, s);
    }
  }
  const otherOrders = [...byOrder.entries()].sort((a, b) => a[0] - b[0]).map(([, s]) => s);
  return { outcomes, otherOrders };
}
