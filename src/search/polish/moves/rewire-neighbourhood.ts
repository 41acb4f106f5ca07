/**
 * Rewiring a vertex's whole neighbourhood: every edge at v is removed and v is joined to a new
 * set of vertices. A large move, used only for shaking (the escapes of variable neighbourhood
 * search), never in the descent: its neighbourhood is exponential.
 */
import { graphFromRows } from '../../../graph/builders.js';
import { type Graph, neighbors } from '../../../graph/graph.js';
import { addPair, copyRows, removePair } from './rows.js';

/** g with the neighbourhood of v replaced by `newNeighbours` (distinct vertices other than v). */
export function rewireNeighbourhood(g: Graph, v: number, newNeighbours: readonly number[]): Graph {
  const seen = new Set<number>();
  for (const u of newNeighbours) {
    if (!Number.isInteger(u) || u < 0 || u >= g.order || u === v || seen.has(u)) {
      throw new RangeError(`Expected distinct vertices in 0..${g.order - 1} other than ${v} but found ${u}`);
    }
    seen.add(u);
  }
  const e = copyRows(g);
  for (const u of neighbors(g, v)) removePair(e, v, u);
  for (const u of newNeighbours) addPair(e, v, u);
  return graphFromRows(e.order, e.rows);
}

/**
 * A random rewiring of a random vertex: v uniform, its new neighbours a uniform random set of
 * the same size (size 1 for an isolated vertex) among the other vertices. Undefined when g has
 * fewer than 2 vertices.
 */
export function randomRewire(g: Graph, rng: () => number): Graph | undefined {
  if (g.order < 2) return undefined;
  const v = Math.floor(rng() * g.order);
  const size = Math.max(1, g.degrees[v]);
  const others: number[] = [];
  for (let u = 0; u < g.order; u++) if (u !== v) others.push(u);
  // Partial Fisher–Yates: the first `size` entries become a uniform random subset.
  for (let i = 0; i < size; i++) {
    const j = i + Math.floor(rng() * (others.length - i));
    [others[i], others[j]] = [others[j], others[i]];
  }
  return rewireNeighbourhood(g, v, others.slice(0, size));
}
