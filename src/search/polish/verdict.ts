/**
 * The one place that decides whether a polished graph refutes the conjecture. Until exact
 * certification is wired in (src/certify/), a positive score inside the domain is a numerical
 * refutation only: float rounding could still make a tight equality case look positive.
 */

/** What a polished graph's score says about the conjecture. */
export type Refutation = 'numerical' | 'none';

/** The refutation status of an in-domain score (the search maximises; > 0 refutes). */
export function refutationOf(score: number): Refutation {
  return score > 0 ? 'numerical' : 'none';
}

/** How a status is printed. */
export function describeRefutation(r: Refutation): string {
  return r === 'numerical' ? 'refutes (numerical, not certified)' : 'does not refute';
}
