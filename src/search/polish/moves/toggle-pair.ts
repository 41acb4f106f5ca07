/**
 * Toggling one pair: uv becomes an edge if it was not one, and stops being one if it was. The
 * elementary move of every edge-flip local search; its neighbourhood has C(n,2) graphs.
 */
import { graphFromRows } from '../../../graph/builders.js';
import { type Graph, hasEdge } from '../../../graph/graph.js';
import { type Move, type MoveFamily } from './move-family.js';
import { addPair, copyRows, removePair } from './rows.js';

/** g with the pair uv (u != v) toggled. */
export function togglePair(g: Graph, u: number, v: number): Graph {
  if (u === v) throw new RangeError(`Expected two distinct vertices but found ${u} twice`);
  const e = copyRows(g);
  if (hasEdge(g, u, v)) removePair(e, u, v);
  else addPair(e, u, v);
  return graphFromRows(e.order, e.rows);
}

/** Moves [u, v] with u < v: every pair. */
export const TOGGLE_PAIR: MoveFamily = {
  name: 'toggle-pair',
  orderDelta: 0,
  candidates(g: Graph): Move[] {
    const out: Move[] = [];
    for (let v = 1; v < g.order; v++) for (let u = 0; u < v; u++) out.push([u, v]);
    return out;
  },
  apply: (g, [u, v]) => togglePair(g, u, v),
  sample(g: Graph, rng: () => number): Move | undefined {
    if (g.order < 2) return undefined;
    const u = Math.floor(rng() * g.order);
    const v = (u + 1 + Math.floor(rng() * (g.order - 1))) % g.order;
    return u < v ? [u, v] : [v, u];
  },
};
