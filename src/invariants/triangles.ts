/**
 * Number of triangles: for every edge uv with u < v, the common neighbours w > v, counted by
 * popcount of the AND of bitset rows (each triangle u < v < w counted once). Common practice;
 * equivalently trace(A^3)/6 (Biggs, "Algebraic Graph Theory", CUP 1974, Prop. 2.6).
 */
import { type Graph, popcount32 } from '../graph/graph.js';
import { type InvariantDefinition } from './registry.js';

export function triangleCount(g: Graph): number {
  const W = g.wordsPerRow;
  let count = 0;
  for (let u = 0; u < g.order; u++) {
    const bu = u * W;
    for (let w = 0; w < W; w++) {
      let word = g.rows[bu + w];
      while (word !== 0) {
        const low = word & -word;
        const v = (w << 5) | (31 - Math.clz32(low));
        word ^= low;
        if (v <= u) continue;
        // Common neighbours above v: mask off bits 0..v of the first word that can hold them.
        const bv = v * W;
        const first = v >>> 5;
        count += popcount32(g.rows[bu + first] & g.rows[bv + first] & ~(0xffffffff >>> (31 - (v & 31))));
        for (let x = first + 1; x < W; x++) count += popcount32(g.rows[bu + x] & g.rows[bv + x]);
      }
    }
  }
  return count;
}

export const TRIANGLE_INVARIANTS: InvariantDefinition[] = [
  { name: 'triangleCount', kind: 'integer', description: 'number of triangles', compute: triangleCount },
];
