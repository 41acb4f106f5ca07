/**
 * Rotating an edge about one endpoint: the edge uv is replaced by uw, where w is neither u nor
 * a neighbour of u. The size stays; one unit of degree passes from v to w. Moving a leaf
 * (move-leaf.ts) is the special case whose pivot is the leaf.
 */
import { graphFromRows } from '../../../graph/builders.js';
import { type Graph, hasEdge, neighbors } from '../../../graph/graph.js';
import { type Move, type MoveFamily, SAMPLE_ATTEMPTS } from './move-family.js';
import { randomOrientedEdge } from './random-edge.js';
import { addPair, copyRows, removePair } from './rows.js';

/** g with the edge uv replaced by uw (uv an edge, uw not, w != u). */
export function rotateEdge(g: Graph, u: number, v: number, w: number): Graph {
  if (!hasEdge(g, u, v)) throw new RangeError(`Expected ${u}-${v} to be an edge but found a non-edge`);
  if (w === u || hasEdge(g, u, w)) {
    throw new RangeError(`Expected a vertex other than ${u} and not adjacent to it but found ${w}`);
  }
  const e = copyRows(g);
  removePair(e, u, v);
  addPair(e, u, w);
  return graphFromRows(e.order, e.rows);
}

/** Moves [u, v, w]: pivot u, old end v, new end w; each edge is rotated about both of its endpoints. */
export const ROTATE_EDGE: MoveFamily = {
  name: 'rotate-edge',
  orderDelta: 0,
  candidates(g: Graph): Move[] {
    const out: Move[] = [];
    for (let u = 0; u < g.order; u++) {
      if (g.degrees[u] === 0 || g.degrees[u] === g.order - 1) continue;
      const nu = neighbors(g, u);
      for (let w = 0; w < g.order; w++) {
        if (w === u || hasEdge(g, u, w)) continue;
        for (const v of nu) out.push([u, v, w]);
      }
    }
    return out;
  },
  apply: (g, [u, v, w]) => rotateEdge(g, u, v, w),
  sample(g: Graph, rng: () => number): Move | undefined {
    for (let attempt = 0; attempt < SAMPLE_ATTEMPTS; attempt++) {
      const e = randomOrientedEdge(g, rng);
      if (e === undefined) return undefined;
      const [u, v] = e;
      const w = Math.floor(rng() * g.order);
      if (w !== u && !hasEdge(g, u, w)) return [u, v, w];
    }
    return undefined;
  },
};
