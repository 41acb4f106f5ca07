/**
 * The degree-preserving double-edge swap: edges ab and cd (four distinct vertices) are replaced
 * by ac and bd, when those are non-edges. Every graph with a given degree sequence is reachable
 * from every other by such swaps (V. Havel, "A remark on the existence of finite graphs",
 * Časopis pro pěstování matematiky 80 (1955) 477–480; S. L. Hakimi, "On realizability of a set of
 * integers as degrees of the vertices of a linear graph. I", J. SIAM 10 (1962) 496–506).
 */
import { graphFromRows } from '../../../graph/builders.js';
import { type Graph, edgeList, hasEdge } from '../../../graph/graph.js';
import { type Move, type MoveFamily, SAMPLE_ATTEMPTS } from './move-family.js';
import { randomOrientedEdge } from './random-edge.js';
import { addPair, copyRows, removePair } from './rows.js';

/** g with the edges ab, cd replaced by ac, bd. */
export function swapEdges(g: Graph, a: number, b: number, c: number, d: number): Graph {
  if (new Set([a, b, c, d]).size !== 4) {
    throw new RangeError(`Expected four distinct vertices but found ${a},${b},${c},${d}`);
  }
  if (!hasEdge(g, a, b) || !hasEdge(g, c, d)) {
    throw new RangeError(`Expected ${a}-${b} and ${c}-${d} to be edges`);
  }
  if (hasEdge(g, a, c) || hasEdge(g, b, d)) {
    throw new RangeError(`Expected ${a}-${c} and ${b}-${d} to be non-edges`);
  }
  const e = copyRows(g);
  removePair(e, a, b);
  removePair(e, c, d);
  addPair(e, a, c);
  addPair(e, b, d);
  return graphFromRows(e.order, e.rows);
}

/**
 * Moves [a, b, c, d] for each unordered pair of disjoint edges {ab, cd} (a < b, c < d, ab before
 * cd) in both of its rewirings: ac + bd, and ad + bc (written [a, b, d, c]).
 */
export const DOUBLE_EDGE_SWAP: MoveFamily = {
  name: 'double-edge-swap',
  orderDelta: 0,
  candidates(g: Graph): Move[] {
    const edges = edgeList(g);
    const out: Move[] = [];
    for (let i = 0; i < edges.length; i++) {
      const [a, b] = edges[i];
      for (let j = i + 1; j < edges.length; j++) {
        const [c, d] = edges[j];
        if (c === a || c === b || d === a || d === b) continue;
        if (!hasEdge(g, a, c) && !hasEdge(g, b, d)) out.push([a, b, c, d]);
        if (!hasEdge(g, a, d) && !hasEdge(g, b, c)) out.push([a, b, d, c]);
      }
    }
    return out;
  },
  apply: (g, [a, b, c, d]) => swapEdges(g, a, b, c, d),
  sample(g: Graph, rng: () => number): Move | undefined {
    for (let attempt = 0; attempt < SAMPLE_ATTEMPTS; attempt++) {
      const e1 = randomOrientedEdge(g, rng);
      const e2 = randomOrientedEdge(g, rng);
      if (e1 === undefined || e2 === undefined) return undefined;
      const [a, b] = e1;
      const [c, d] = e2;
      // Random orientations make both rewirings of the pair reachable.
      if (a === c || a === d || b === c || b === d) continue;
      if (!hasEdge(g, a, c) && !hasEdge(g, b, d)) return [a, b, c, d];
    }
    return undefined;
  },
};
