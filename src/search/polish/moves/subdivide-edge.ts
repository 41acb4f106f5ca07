/**
 * Subdividing an edge: the edge uv is replaced by the path u - x - v through a new vertex x
 * (numbered g.order). Raises the order and the size by one, keeps connectivity, and lengthens
 * every cycle through uv by one (so it never lowers the girth).
 */
import { graphFromRows } from '../../../graph/builders.js';
import { type Graph, edgeList, hasEdge } from '../../../graph/graph.js';
import { type MoveFamily } from './move-family.js';
import { addPair, copyRows, removePair } from './rows.js';

/** g with the edge uv subdivided by a new vertex g.order. */
export function subdivideEdge(g: Graph, u: number, v: number): Graph {
  if (!hasEdge(g, u, v)) throw new RangeError(`Expected ${u}-${v} to be an edge but found a non-edge`);
  const e = copyRows(g, g.order + 1);
  removePair(e, u, v);
  addPair(e, u, g.order);
  addPair(e, v, g.order);
  return graphFromRows(e.order, e.rows);
}

/** Moves [u, v] with u < v: every edge. */
export const SUBDIVIDE_EDGE: MoveFamily = {
  name: 'subdivide-edge',
  orderDelta: 1,
  candidates: (g) => edgeList(g),
  apply: (g, [u, v]) => subdivideEdge(g, u, v),
};
