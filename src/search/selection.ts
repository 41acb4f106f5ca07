/**
 * Ranking a batch and picking the elite (trained on) and the carried-over pool (kept unchanged
 * for the next batch), the selection step of the cross-entropy method (R. Y. Rubinstein, "The
 * cross-entropy method for combinatorial and continuous optimization", Methodology and
 * Computing in Applied Probability 1 (1999) 127-190).
 *
 * Graphs outside the conjecture's domain rank below every graph inside it, whatever its score
 * (-Infinity included); ties keep batch order, so the ranking is deterministic.
 */

/** One candidate of a batch. */
export interface Candidate {
  /** Its N decisions in graph6 order. */
  readonly bits: Uint8Array;
  /** Key telling graphs apart (graphKey). */
  readonly key: string;
  readonly inDomain: boolean;
  /** The score when in the domain, -Infinity otherwise. */
  readonly score: number;
}

/** Candidates best first: in-domain before out-of-domain, then by score, then by batch position. */
export function rankCandidates(candidates: readonly Candidate[]): Candidate[] {
  const idx = candidates.map((_, i) => i);
  idx.sort((a, b) => {
    const ca = candidates[a];
    const cb = candidates[b];
    if (ca.inDomain !== cb.inDomain) return ca.inDomain ? -1 : 1;
    if (ca.score !== cb.score) return ca.score > cb.score ? -1 : 1;
    return a - b;
  });
  return idx.map((i) => candidates[i]);
}

/**
 * The first `count` of a ranked list; with `distinct`, each key at most once (the first, best,
 * copy), so that a batch full of one near miss does not fill the pool with copies of it.
 */
export function takeTop(ranked: readonly Candidate[], count: number, distinct: boolean): Candidate[] {
  const out: Candidate[] = [];
  const seen = new Set<string>();
  for (const c of ranked) {
    if (out.length >= count) break;
    if (distinct) {
      if (seen.has(c.key)) continue;
      seen.add(c.key);
    }
    out.push(c);
  }
  return out;
}

/** Number of distinct keys. */
export function distinctCount(candidates: readonly Candidate[]): number {
  return new Set(candidates.map((c) => c.key)).size;
}

/**
 * The best-ever list after a batch: in-domain graphs only, distinct keys, best first, at most
 * `capacity`. Earlier entries win ties, so the list does not churn between equal graphs.
 */
export function mergeBest(
  best: readonly Candidate[],
  batch: readonly Candidate[],
  capacity: number,
): Candidate[] {
  const merged = rankCandidates([...best, ...batch.filter((c) => c.inDomain)]);
  return takeTop(merged, capacity, true);
}
