/** Seeded Erdős–Rényi graphs G(n, p) for tests (seedrandom, so every run sees the same graphs). */
import seedrandom from 'seedrandom';
import { fromEdges } from '../../src/graph/builders.js';
import { type Graph } from '../../src/graph/graph.js';

/** `count` graphs G(n, p), n drawn uniformly from [minOrder, maxOrder], p from `densities` in turn. */
export function randomGraphs(
  seed: string,
  count: number,
  minOrder: number,
  maxOrder: number,
  densities: ReadonlyArray<number> = [0.15, 0.3, 0.5, 0.7, 0.85],
): Graph[] {
  const rng = seedrandom(seed);
  const out: Graph[] = [];
  for (let i = 0; i < count; i++) {
    const n = minOrder + Math.floor(rng() * (maxOrder - minOrder + 1));
    out.push(gnp(n, densities[i % densities.length], rng));
  }
  return out;
}

/** One G(n, p) from the given stream. */
export function gnp(n: number, p: number, rng: () => number): Graph {
  const edges: Array<[number, number]> = [];
  for (let u = 0; u < n; u++) for (let v = u + 1; v < n; v++) if (rng() < p) edges.push([u, v]);
  return fromEdges(n, edges);
}
