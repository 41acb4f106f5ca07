/**
 * A true published theorem, which no graph may refute: a check of the tool itself.
 *
 * Y. Hong, "A bound on the spectral radius of graphs", Linear Algebra and its Applications 108
 * (1988) 135–139 (citation from memory): for a connected graph with n vertices and m edges,
 * λ1 <= √(2m − n + 1), with equality exactly for the complete graphs K_n and the stars K_{1,n−1}.
 *
 * The equality cases make it a test of rounding: on K_n and K_{1,n−1} the floating-point score
 * is within about 1e-15 of 0 and may come out positive. `refute check` reports such graphs as
 * "holds (tight)", never as counterexamples; certification settles them exactly. Of the 11,117
 * connected graphs on 8 vertices (refute generate --vertices 8 --connected | refute check FILE
 * --stdin) exactly two are tight, K_8 and K_{1,7}, as the theorem says.
 *
 *   refute check scores/hong-spectral-radius-bound.ts --families --max-vertices 20
 *
 * The example order, 10, is that of a hunt that should run without finding anything.
 */
import { defineConjecture } from 'refute';

export default defineConjecture({
  name: 'hong-spectral-radius-bound',
  statement:
    'For every connected graph G with n vertices and m edges: spectralRadius(G) <= sqrt(2m - n + 1) (Hong 1988)',
  vertices: 10,
  connected: true,
  score: (g) => g.spectralRadius - Math.sqrt(2 * g.m - g.n + 1),
});
