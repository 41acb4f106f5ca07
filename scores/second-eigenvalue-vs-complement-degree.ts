/**
 * A false claim that a short search refutes: the quick demo for `refute hunt` and `refute sweep`.
 *
 * Claim: the second largest adjacency eigenvalue λ2 of a connected graph is at most the average
 * degree of its complement, n − 1 − 2m/n. It holds for every regular graph (there λ2(G) =
 * −1 − λn(Ḡ), and −λn(Ḡ) <= λ1(Ḡ) = n − 1 − d), on every connected graph with at most 7 vertices
 * (largest λ2 − d̄(Ḡ) is −0.1429) and on every built-in family up to 20 vertices (largest −0.1),
 * computed with networkx/numpy by tests/scripts/make_score_references.py.
 *
 * Why it is false. Remove from K_n the four edges of a 4-cycle 0-1-2-3-0. The vector x that is
 * +1, −1, +1, −1 on 0, 1, 2, 3 and 0 elsewhere sums to zero, so A(G)x = (J − I − A(C4))x =
 * −x + 2x = x: 1 is an eigenvalue, and since λ1 >= 2m/n > 1, λ2 >= 1. The complement (the 4-cycle
 * and n − 4 isolated vertices) has average degree 8/n, so the graph refutes the claim for every
 * n >= 9; n = 8 is an equality case. The smallest is K_9 minus a 4-cycle, 'HQ~~~~~' (score
 * 1/9 numerically). Checking every connected graph on 8 vertices (11,117) and on 9 (261,080) with
 * `refute generate --vertices N --connected | refute check FILE --stdin` finds no counterexample on
 * 8 and exactly three on 9: 'HQ~~~~~', 'HQj~~~~' and 'HQz~~~~'. Another family: K_10 minus the
 * three edges of a star K_{1,3}, 'IJ~~~~~~w', whose λ2 is the middle root of x³ − 7x² − 14x + 12
 * (quotient of the equitable partition {0}, {1,2,3}, {4..9}; the other eigenvalues are −1), in
 * (0.6, 0.7) by the signs of f(0.6) and f(0.7), above the complement's 6/10.
 *
 * In a one-off experiment a plain cross-entropy search with independent edge probabilities found
 * a counterexample on 11 vertices within 10 iterations.
 *
 * A scenario of our own invention, written as an example of a conjecture file.
 */
import { defineConjecture } from 'refute';

export default defineConjecture({
  name: 'second-eigenvalue-vs-complement-degree',
  statement: 'For every connected graph G: secondLargestEigenvalue(G) <= averageDegree(complement of G)',
  vertices: 12,
  connected: true,
  where: (g) => g.n >= 2, // λ2 needs two eigenvalues
  score: (g) => g.secondLargestEigenvalue - g.complement.averageDegree,
});
