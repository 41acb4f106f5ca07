/**
 * Whether a graph is connected, by a breadth-first search on the bitset rows (whole words at a
 * time), so that the polisher can drop disconnected neighbours before scoring them. The
 * registry's isConnected invariant is the independent oracle in the tests.
 */
import { type Graph } from '../../graph/graph.js';

/** One component; the graphs on 0 and 1 vertices count as connected. */
export function isConnectedGraph(g: Graph): boolean {
  const { order, wordsPerRow, rows } = g;
  if (order <= 1) return true;
  for (let v = 0; v < order; v++) if (g.degrees[v] === 0) return false;
  const seen = new Uint32Array(wordsPerRow);
  const stack = new Int32Array(order);
  let top = 0;
  seen[0] = 1;
  stack[top++] = 0;
  let reached = 1;
  while (top > 0) {
    const v = stack[--top];
    const base = v * wordsPerRow;
    for (let w = 0; w < wordsPerRow; w++) {
      let fresh = rows[base + w] & ~seen[w];
      if (fresh === 0) continue;
      seen[w] |= fresh;
      while (fresh !== 0) {
        const low = fresh & -fresh;
        stack[top++] = (w << 5) | (31 - Math.clz32(low));
        reached++;
        fresh ^= low;
      }
    }
  }
  return reached === order;
}
