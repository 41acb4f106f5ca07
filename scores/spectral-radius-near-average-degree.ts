/**
 * A false claim that `refute check --families` refutes at once.
 *
 * The spectral radius is never below the average degree (L. Collatz and U. Sinogowitz,
 * "Spektren endlicher Grafen", Abh. Math. Sem. Univ. Hamburg 21 (1957) 63–77), and for
 * regular graphs the two are equal. The claim below says it never exceeds it by more than 1.
 * It holds on every connected graph with at most 7 vertices (largest score −0.2648, on 'F??Fw')
 * and on all 11,117 connected graphs with 8 (refute generate | refute check), which makes it look
 * safe, but the star K_{1,8} breaks it: λ1 = √8 ≈ 2.8284 while the average degree plus one is
 * 16/9 + 1 ≈ 2.7778. So does every larger star (√(n−1) grows, 3 − 2/n does not).
 *
 *   refute check scores/spectral-radius-near-average-degree.ts --families
 *
 * finds it among the built-in families on 9 vertices: the star K_{1,8} and the lollipop(6,3)
 * (K6 with a path of 3 vertices hung from it); more stars, lollipops and brooms follow.
 * A scenario of our own invention, written as an example of a conjecture file.
 */
import { defineConjecture } from 'refute';

export default defineConjecture({
  name: 'spectral-radius-near-average-degree',
  statement: 'For every connected graph G: spectralRadius(G) <= averageDegree(G) + 1',
  vertices: 12,
  connected: true,
  score: (g) => g.spectralRadius - g.averageDegree - 1,
});
