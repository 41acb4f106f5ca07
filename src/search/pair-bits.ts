/**
 * The hunt's view of a graph: its N = n(n-1)/2 pair decisions in graph6 order (01, 02, 12, 03,
 * 13, 23, ...), one byte each. fromUpperTriangleBits (graph/builders.ts) goes the other way.
 */
import { type Graph, hasEdge } from '../graph/graph.js';

/** Index of pair {u, v} (u != v) in graph6 order: v(v-1)/2 + u for u < v. */
export function pairIndex(u: number, v: number): number {
  return u < v ? (v * (v - 1)) / 2 + u : (u * (u - 1)) / 2 + v;
}

/** The decisions that build g. */
export function pairBitsOfGraph(g: Graph): Uint8Array {
  const n = g.order;
  const bits = new Uint8Array((n * (n - 1)) / 2);
  let k = 0;
  for (let j = 1; j < n; j++) for (let i = 0; i < j; i++, k++) bits[k] = hasEdge(g, i, j) ? 1 : 0;
  return bits;
}
