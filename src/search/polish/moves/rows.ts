/**
 * Row-level helpers shared by the move files: copying a graph's bitset rows (at its own order or
 * a larger one) and setting or clearing one pair in place, on the fresh copy only.
 * The graph handed in is never written to; each move wraps its copy with graphFromRows.
 */
import { type Graph, wordsForOrder } from '../../../graph/graph.js';

/** Bitset rows being edited for a graph of `order` vertices. */
export interface EditableRows {
  readonly order: number;
  readonly wordsPerRow: number;
  readonly rows: Uint32Array;
}

/**
 * A copy of g's rows at order `order` >= g.order; the vertices past g's order are isolated.
 * (Removing vertices goes through inducedSubgraph, which relabels.)
 */
export function copyRows(g: Graph, order: number = g.order): EditableRows {
  if (order < g.order) throw new RangeError(`Expected an order of at least ${g.order} but found ${order}`);
  const wordsPerRow = wordsForOrder(order);
  const rows = new Uint32Array(order * wordsPerRow);
  if (wordsPerRow === g.wordsPerRow) {
    rows.set(g.rows);
  } else {
    for (let v = 0; v < g.order; v++) {
      rows.set(g.rows.subarray(v * g.wordsPerRow, (v + 1) * g.wordsPerRow), v * wordsPerRow);
    }
  }
  return { order, wordsPerRow, rows };
}

/** Adds the edge uv (u != v) to the rows. */
export function addPair(e: EditableRows, u: number, v: number): void {
  e.rows[u * e.wordsPerRow + (v >>> 5)] |= 1 << (v & 31);
  e.rows[v * e.wordsPerRow + (u >>> 5)] |= 1 << (u & 31);
}

/** Removes the edge uv from the rows. */
export function removePair(e: EditableRows, u: number, v: number): void {
  e.rows[u * e.wordsPerRow + (v >>> 5)] &= ~(1 << (v & 31));
  e.rows[v * e.wordsPerRow + (u >>> 5)] &= ~(1 << (u & 31));
}

/** Whether the pair uv is set in the rows. */
export function hasPair(e: EditableRows, u: number, v: number): boolean {
  return ((e.rows[u * e.wordsPerRow + (v >>> 5)] >>> (v & 31)) & 1) === 1;
}
