/**
 * Lengthening and shortening pendant paths. A pendant path is a maximal path x0 x1 ... xk whose
 * end x0 is a leaf and whose inner vertices x1..x(k-1) have degree 2; xk is its root (degree
 * other than 2). Lengthening adds a new vertex beyond x0; shortening deletes x0.
 *
 * Up to isomorphism these are attach-pendant at a leaf and delete-vertex of a leaf, but as
 * neighbourhoods they are far smaller (one move per pendant path instead of one per vertex),
 * which is why the search tries them first, and shortening never disconnects a graph.
 */
import { type Graph, neighbors } from '../../../graph/graph.js';
import { attachPendant } from './attach-pendant.js';
import { deleteVertex } from './delete-vertex.js';
import { type Move, type MoveFamily } from './move-family.js';

/** A pendant path, listed from its leaf to its root. */
export interface PendantPath {
  readonly vertices: readonly number[];
}

/** The pendant path that ends in `leaf` (a vertex of degree 1). */
export function pendantPathFrom(g: Graph, leaf: number): PendantPath {
  if (g.degrees[leaf] !== 1) {
    throw new RangeError(`Expected vertex ${leaf} to be a leaf but found degree ${g.degrees[leaf]}`);
  }
  const vertices = [leaf];
  let previous = leaf;
  let current = neighbors(g, leaf)[0];
  // Degree-2 vertices cannot close a cycle here: the walk entered them from a leaf.
  while (g.degrees[current] === 2) {
    vertices.push(current);
    const [a, b] = neighbors(g, current);
    const next = a === previous ? b : a;
    previous = current;
    current = next;
  }
  vertices.push(current);
  return { vertices };
}

/** Every pendant path, one per leaf, in increasing order of the leaf (a path graph gives two). */
export function pendantPaths(g: Graph): PendantPath[] {
  const out: PendantPath[] = [];
  for (let v = 0; v < g.order; v++) if (g.degrees[v] === 1) out.push(pendantPathFrom(g, v));
  return out;
}

/** g with the pendant path ending in `leaf` made one edge longer (new vertex g.order beyond the leaf). */
export function lengthenPendantPath(g: Graph, leaf: number): Graph {
  if (g.degrees[leaf] !== 1) {
    throw new RangeError(`Expected vertex ${leaf} to be a leaf but found degree ${g.degrees[leaf]}`);
  }
  return attachPendant(g, leaf);
}

/** g with the pendant path ending in `leaf` made one edge shorter (the leaf deleted). */
export function shortenPendantPath(g: Graph, leaf: number): Graph {
  if (g.degrees[leaf] !== 1) {
    throw new RangeError(`Expected vertex ${leaf} to be a leaf but found degree ${g.degrees[leaf]}`);
  }
  return deleteVertex(g, leaf);
}

function leaves(g: Graph): Move[] {
  const out: Move[] = [];
  for (let v = 0; v < g.order; v++) if (g.degrees[v] === 1) out.push([v]);
  return out;
}

/** Moves [leaf]. */
export const LENGTHEN_PENDANT_PATH: MoveFamily = {
  name: 'lengthen-pendant-path',
  orderDelta: 1,
  candidates: leaves,
  apply: (g, [leaf]) => lengthenPendantPath(g, leaf),
};

/** Moves [leaf], when g has at least three vertices (so that a graph remains with an edge or more). */
export const SHORTEN_PENDANT_PATH: MoveFamily = {
  name: 'shorten-pendant-path',
  orderDelta: -1,
  candidates: (g) => (g.order < 3 ? [] : leaves(g)),
  apply: (g, [leaf]) => shortenPendantPath(g, leaf),
};
