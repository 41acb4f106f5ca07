/**
 * The key under which the hunt tells graphs apart in its pools, best-ever list and
 * counterexample file. Distinct keys should mean non-isomorphic graphs; until canonical
 * labelling (src/graph/canonical.ts) is available the key is the labelled graph6, which may
 * keep two isomorphic copies apart. This is the one line to change.
 */
import { encodeGraph6 } from '../graph/graph6.js';
import { type Graph } from '../graph/graph.js';

export function graphKey(g: Graph): string {
  return encodeGraph6(g);
}
