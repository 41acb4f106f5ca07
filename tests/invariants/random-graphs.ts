/** Batches of seeded Erdős–Rényi graphs of varying order and density for the invariant tests. */
import { type Graph } from '../../src/graph/graph.js';
import { randomGraph, seededRng } from '../support/random-graph.js';

/** `count` graphs G(n, p), n drawn uniformly from [minOrder, maxOrder], p from `densities` in turn. */
export function randomGraphs(
  seed: string,
  count: number,
  minOrder: number,
  maxOrder: number,
  densities: ReadonlyArray<number> = [0.15, 0.3, 0.5, 0.7, 0.85],
): Graph[] {
  const rng = seededRng(seed);
  const out: Graph[] = [];
  for (let i = 0; i < count; i++) {
    const n = minOrder + Math.floor(rng() * (maxOrder - minOrder + 1));
    out.push(randomGraph(n, densities[i % densities.length], rng));
  }
  return out;
}
