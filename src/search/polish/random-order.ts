/**
 * Visiting 0..length-1 in a uniformly random order, one index at a time: an incremental
 * Fisher–Yates shuffle (R. A. Fisher and F. Yates, "Statistical tables for biological,
 * agricultural and medical research", Oliver & Boyd 1938; in the in-place form of R. Durstenfeld,
 * "Algorithm 235: Random permutation", Comm. ACM 7 (1964) 420). A first-improvement descent
 * usually stops early, so only the indices it visits cost a random draw.
 */
export function* randomOrder(length: number, rng: () => number): Generator<number> {
  const perm = new Int32Array(length);
  for (let i = 0; i < length; i++) perm[i] = i;
  for (let i = 0; i < length; i++) {
    const j = i + Math.floor(rng() * (length - i));
    const pick = perm[j];
    perm[j] = perm[i];
    perm[i] = pick;
    yield pick;
  }
}

/** A uniform index in 0..length-1 (length >= 1). */
export function randomIndex(length: number, rng: () => number): number {
  return Math.floor(rng() * length);
}
