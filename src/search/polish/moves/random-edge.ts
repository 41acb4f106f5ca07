/**
 * A uniformly random edge, oriented at random: an endpoint slot r in 0..2m-1 is drawn and found
 * by walking the degree prefix sums (O(n)), so no edge list is built.
 */
import { type Graph } from '../../../graph/graph.js';

/** [u, v] with uv an edge, each of the 2m orientations equally likely; undefined for no edges. */
export function randomOrientedEdge(g: Graph, rng: () => number): [number, number] | undefined {
  if (g.size === 0) return undefined;
  let r = Math.floor(rng() * 2 * g.size);
  let u = 0;
  while (r >= g.degrees[u]) r -= g.degrees[u++];
  const base = u * g.wordsPerRow;
  for (let w = 0; w < g.wordsPerRow; w++) {
    let word = g.rows[base + w];
    while (word !== 0) {
      const low = word & -word;
      if (r-- === 0) return [u, (w << 5) | (31 - Math.clz32(low))];
      word ^= low;
    }
  }
  throw new Error('unreachable: degrees and rows disagree');
}
