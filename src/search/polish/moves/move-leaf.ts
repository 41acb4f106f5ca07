/**
 * Moving a leaf: a vertex of degree 1 is detached from its neighbour and attached to another
 * vertex. The hand move of tree and near-tree constructions (shifting pendant vertices towards
 * a hub raises the spectral radius, for instance); it keeps a connected graph connected.
 */
import { graphFromRows } from '../../../graph/builders.js';
import { type Graph, neighbors } from '../../../graph/graph.js';
import { type Move, type MoveFamily } from './move-family.js';
import { addPair, copyRows, removePair } from './rows.js';

/** g with the leaf `leaf` re-attached to `target` (neither the leaf nor its neighbour). */
export function moveLeaf(g: Graph, leaf: number, target: number): Graph {
  if (g.degrees[leaf] !== 1) {
    throw new RangeError(`Expected vertex ${leaf} to be a leaf but found degree ${g.degrees[leaf]}`);
  }
  const parent = neighbors(g, leaf)[0];
  if (target === leaf || target === parent) {
    throw new RangeError(`Expected a target other than the leaf ${leaf} and its neighbour ${parent}`);
  }
  const e = copyRows(g);
  removePair(e, leaf, parent);
  addPair(e, leaf, target);
  return graphFromRows(e.order, e.rows);
}

/** Moves [leaf, target]. */
export const MOVE_LEAF: MoveFamily = {
  name: 'move-leaf',
  orderDelta: 0,
  candidates(g: Graph): Move[] {
    const out: Move[] = [];
    for (let leaf = 0; leaf < g.order; leaf++) {
      if (g.degrees[leaf] !== 1) continue;
      const parent = neighbors(g, leaf)[0];
      for (let t = 0; t < g.order; t++) if (t !== leaf && t !== parent) out.push([leaf, t]);
    }
    return out;
  },
  apply: (g, [leaf, target]) => moveLeaf(g, leaf, target),
};
