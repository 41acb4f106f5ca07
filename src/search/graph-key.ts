/**
 * The key under which the hunt tells graphs apart in its pools, best-ever list and
 * counterexample file: the canonical graph6 (src/graph/canonical.ts), equal exactly for
 * isomorphic graphs, so a pool "distinct by key" holds one copy per isomorphism class.
 *
 * Canonical labelling costs about 0.15 ms per graph at n = 19, too much for every sample of
 * every batch, so candidates compute their key lazily ({@link lazyKey}): only the graphs that
 * selection actually visits (the top of the ranking) pay for it. The collapse signal "distinct
 * graphs in the batch" uses the labelled graph6 instead, which is what a collapsed policy
 * repeats.
 */
import { CanonicalLabellingLimitError, canonicalGraph6 } from '../graph/canonical.js';
import { encodeGraph6 } from '../graph/graph6.js';
import { type Graph } from '../graph/graph.js';

/** Canonical graph6 of g; in the (not expected) case that the search gives up, its labelled graph6. */
export function graphKey(g: Graph): string {
  try {
    return canonicalGraph6(g);
  } catch (err) {
    if (err instanceof CanonicalLabellingLimitError) return encodeGraph6(g);
    throw err;
  }
}

/** A memoised graphKey(g), computed on first call. */
export function lazyKey(g: Graph): () => string {
  let key: string | undefined;
  return () => (key ??= graphKey(g));
}
