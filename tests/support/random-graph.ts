/** Seeded Erdős–Rényi G(n, p) graphs for tests and benchmarks. */
import seedrandom from 'seedrandom';
import { fromEdges } from '../../src/graph/builders.js';
import { type Graph } from '../../src/graph/graph.js';

export function randomGraph(n: number, p: number, rng: () => number): Graph {
  const edges: Array<[number, number]> = [];
  for (let j = 1; j < n; j++) for (let i = 0; i < j; i++) if (rng() < p) edges.push([i, j]);
  return fromEdges(n, edges);
}

export function seededRng(seed: string): () => number {
  return seedrandom(seed);
}
