/**
 * Attaching a pendant vertex: a new vertex n joins the graph as a leaf of an existing vertex v.
 * Raises the order by one and keeps a connected graph connected.
 */
import { graphFromRows } from '../../../graph/builders.js';
import { type Graph } from '../../../graph/graph.js';
import { type Move, type MoveFamily } from './move-family.js';
import { addPair, copyRows } from './rows.js';

/** g plus a new vertex g.order adjacent to v only. */
export function attachPendant(g: Graph, v: number): Graph {
  if (!Number.isInteger(v) || v < 0 || v >= g.order) {
    throw new RangeError(`Expected a vertex in 0..${g.order - 1} but found ${v}`);
  }
  const e = copyRows(g, g.order + 1);
  addPair(e, v, g.order);
  return graphFromRows(e.order, e.rows);
}

/** Moves [v]: every vertex. */
export const ATTACH_PENDANT: MoveFamily = {
  name: 'attach-pendant',
  orderDelta: 1,
  candidates: (g) => Array.from({ length: g.order }, (_, v): Move => [v]),
  apply: (g, [v]) => attachPendant(g, v),
};
