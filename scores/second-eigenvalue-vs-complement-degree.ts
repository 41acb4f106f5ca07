/**
 * A false claim that a short search refutes: the quick demo for `refute hunt`.
 *
 * Claim: the second largest adjacency eigenvalue λ2 of a connected graph is at most the average
 * degree of its complement, n − 1 − 2m/n. It holds for every regular graph (there λ2(G) =
 * −1 − λn(Ḡ), and −λn(Ḡ) <= λ1(Ḡ) = n − 1 − d), on every connected graph with at most 7 vertices
 * (largest λ2 − d̄(Ḡ) is −0.1429) and on every built-in family up to 20 vertices (largest −0.1),
 * computed with networkx/numpy by tests/scripts/make_score_references.py.
 *
 * Why it is false. Remove from K_10 the three edges of a star K_{1,3} (centre 0, leaves 1, 2, 3):
 * 'IJ~~~~~~w'. The partition {0}, {1,2,3}, {4..9} is equitable with quotient matrix
 * [[0,0,6],[0,2,6],[1,3,5]], whose characteristic polynomial is f(x) = x³ − 7x² − 14x + 12; the
 * other seven eigenvalues are −1. f(0) = 12 > 0 > f(1) = −8 puts the middle root, λ2, in (0, 1),
 * and f(0.6) = 1.296 > 0 > f(0.7) = −0.887 puts it in (0.6, 0.7); the complement (the star plus
 * six isolated vertices) has average degree 6/10 = 0.6 < λ2 ≈ 0.6599. The same construction on
 * 9 vertices does not refute it (−0.0199); on 10 to 20 vertices it does for several star sizes,
 * and in a one-off experiment a plain cross-entropy search with independent edge probabilities
 * found a counterexample on 11 vertices within 10 iterations.
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
