/**
 * A false claim that only a search refutes, and a hard one: the demo of a hunt that must keep
 * exploring. (scores/second-eigenvalue-vs-complement-degree.ts is the quick demo.)
 *
 * Claim: in a connected graph the second largest adjacency eigenvalue λ2 never exceeds the
 * matching number ν. It looks safe: it holds on every connected graph with at most 7 vertices
 * (largest λ2 − ν is −0.4738) and on every built-in family up to 20 vertices (largest −0.6095),
 * computed with networkx/numpy by tests/scripts/make_score_references.py.
 *
 * Why it is false. Let T(a, b) be the tree of two stars K_{1,a} and K_{1,b} whose centres c1, c2
 * are joined through one extra vertex w (a + b + 3 vertices; not a built-in family). Every edge
 * touches c1 or c2, so ν = 2. In T(k, k) the vector that is √k on c1, 1 on c1's leaves, −√k on
 * c2, −1 on c2's leaves and 0 on w is an eigenvector for √k; since λ1 >= √Δ = √(k+1) > √k, this
 * gives λ2 >= √k. So T(k, k) refutes the claim for every k >= 5: the smallest, on 13 vertices, is
 * 'LkaCC?_G@?C?G?' (λ2 = √5 ≈ 2.2361 numerically). T(4, 4) on 11 vertices, 'JkaC@?_G@??', is an
 * equality case (λ2 = 2 = ν), and T(5, 4) is a counterexample on 12 vertices, 'KkaCC?_G@?C?'
 * (λ2 ≈ 2.0933). None exists on 10 vertices or fewer: all 11,716,571 connected graphs on 10
 * vertices (and all on 8 and 9) pass `refute generate --vertices N --connected | refute check
 * FILE --stdin`, the best scoring −0.1610 (T(4, 3)); whether one exists on 11 we have not
 * settled. (Vertex numbering: c1 = 0, c2 = 1, w = 2, then c1's leaves, then c2's.)
 *
 * At the default order 14 the best counterexample we know is T(6, 5), 'MkaCCA?G@?C?G?G??',
 * scoring λ2 − ν ≈ 0.3199. The plain cross-entropy method stalls on it: in a one-off experiment
 * with independent edge probabilities (batch 400, elite 30, 150 iterations) it stayed at a star
 * (score −1) on 13 vertices and reached −0.11 on 14, without a counterexample.
 *
 * A scenario of our own invention, written as an example of a conjecture file.
 */
import { defineConjecture } from 'refute';

export default defineConjecture({
  name: 'second-eigenvalue-vs-matching',
  statement: 'For every connected graph G: secondLargestEigenvalue(G) <= matchingNumber(G)',
  vertices: 14,
  connected: true,
  where: (g) => g.n >= 2, // λ2 needs two eigenvalues
  score: (g) => g.secondLargestEigenvalue - g.matchingNumber,
});
