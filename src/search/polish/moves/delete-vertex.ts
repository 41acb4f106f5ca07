/**
 * Deleting a vertex with its edges; the vertices above it move down by one. Lowers the order.
 * It may disconnect the graph (a cut vertex), so a search that needs connected graphs filters.
 */
import { inducedSubgraph } from '../../../graph/builders.js';
import { type Graph } from '../../../graph/graph.js';
import { type Move, type MoveFamily } from './move-family.js';

/** g - v (g must have at least two vertices). */
export function deleteVertex(g: Graph, v: number): Graph {
  if (g.order < 2) throw new RangeError(`Expected at least 2 vertices but found ${g.order}`);
  if (!Number.isInteger(v) || v < 0 || v >= g.order) {
    throw new RangeError(`Expected a vertex in 0..${g.order - 1} but found ${v}`);
  }
  const keep: number[] = [];
  for (let u = 0; u < g.order; u++) if (u !== v) keep.push(u);
  return inducedSubgraph(g, keep);
}

/** Moves [v]: every vertex, when g has at least two. */
export const DELETE_VERTEX: MoveFamily = {
  name: 'delete-vertex',
  orderDelta: -1,
  candidates: (g) => (g.order < 2 ? [] : Array.from({ length: g.order }, (_, v): Move => [v])),
  apply: (g, [v]) => deleteVertex(g, v),
};
