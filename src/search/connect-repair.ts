/**
 * Repair of disconnected samples for conjectures restricted to connected graphs.
 *
 * Sparse graphs are mostly disconnected, so with `connected: true` most samples of a fresh
 * policy would fall outside the domain and give the search nothing to learn from. We repair
 * instead of penalising: the components, taken in order of their smallest vertex, are chained
 * by the edge joining the smallest vertices of consecutive components (c - 1 edges, the fewest
 * that connect c components). The repaired graph's decisions, not the sampled ones, then enter
 * selection and training, so the policy learns to produce connected graphs itself.
 */
import { pairIndex } from './pair-bits.js';

/**
 * Adds the chaining edges to the decisions `bits` (N entries, graph6 order) in place and
 * returns how many were added (0 when already connected).
 */
export function connectComponentsInPlace(order: number, bits: Uint8Array, offset = 0): number {
  const parent = new Int32Array(order);
  for (let v = 0; v < order; v++) parent[v] = v;
  const find = (v: number): number => {
    while (parent[v] !== v) {
      parent[v] = parent[parent[v]];
      v = parent[v];
    }
    return v;
  };
  let k = offset;
  for (let j = 1; j < order; j++) {
    for (let i = 0; i < j; i++, k++) {
      if (bits[k] !== 0) {
        const a = find(i);
        const b = find(j);
        // Union towards the smaller vertex so that each root is its component's smallest vertex.
        if (a < b) parent[b] = a;
        else if (b < a) parent[a] = b;
      }
    }
  }
  let previousRoot = -1;
  let added = 0;
  for (let v = 0; v < order; v++) {
    if (find(v) !== v) continue;
    if (previousRoot >= 0) {
      bits[offset + pairIndex(previousRoot, v)] = 1;
      added++;
    }
    previousRoot = v;
  }
  return added;
}
