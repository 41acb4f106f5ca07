/**
 * Independence number α(G) and vertex cover number β(G) = n − α(G), with witnesses.
 *
 * A set is independent in G exactly when it is a clique of the complement, so α(G) = ω(Ḡ) and a
 * maximum independent set is a maximum clique of Ḡ, found by the bit-parallel branch and bound
 * of `cliques.ts` (San Segundo et al. 2011). The complement of a maximum independent set is a
 * minimum vertex cover (Gallai 1959).
 *
 * @remarks Exact at every order; the cost is that of a maximum clique of the complement, so sparse
 * graphs are the hard side. Measured by tests/bench/hard-invariants.bench.ts (seeded G(n, p)):
 * under 0.05 ms per graph for n ≤ 40 at densities 0.1–0.8; 4–20 ms at n = 100, p = 0.1 (worst of 5)
 * but 65–95 ms on other seeds, 0.2 s at n = 120, p = 0.1, 2.5–3.3 s at n = 150, p = 0.1, and
 * minutes at n = 200, p = 0.1. Well under a second up to about 120 vertices; sparse graphs of 150
 * or more vertices can take seconds to minutes.
 *
 * @see P. San Segundo, D. Rodríguez-Losada, A. Jiménez, "An exact bit-parallel algorithm for the
 *   maximum clique problem", Computers & Operations Research 38(2) (2011) 571–581.
 * @see T. Gallai, "Über extreme Punkt- und Kantenmengen", Ann. Univ. Sci. Budapest. Eötvös Sect.
 *   Math. 2 (1959) 133–138.
 */
import { complement } from '../graph/builders.js';
import { type Graph, hasEdge } from '../graph/graph.js';
import { maximumClique } from './cliques.js';
import { type InvariantDefinition } from './registry.js';

/** A maximum independent set of g, vertices in increasing order. */
export function maximumIndependentSet(g: Graph): number[] {
  return maximumClique(complement(g));
}

/** α(G), the size of a largest independent set. */
export function independenceNumber(g: Graph): number {
  return maximumIndependentSet(g).length;
}

/** A minimum vertex cover of g (the vertices outside a maximum independent set), increasing. */
export function minimumVertexCover(g: Graph): number[] {
  const inSet = new Uint8Array(g.order);
  for (const v of maximumIndependentSet(g)) inSet[v] = 1;
  const out: number[] = [];
  for (let v = 0; v < g.order; v++) if (!inSet[v]) out.push(v);
  return out;
}

/** β(G) = n − α(G), the size of a smallest vertex cover. */
export function vertexCoverNumber(g: Graph): number {
  return g.order - independenceNumber(g);
}

/** Whether `vertices` are distinct vertices of g, pairwise non-adjacent. */
export function isIndependentSet(g: Graph, vertices: ReadonlyArray<number>): boolean {
  const seen = new Set<number>();
  for (const v of vertices) {
    if (!Number.isInteger(v) || v < 0 || v >= g.order || seen.has(v)) return false;
    seen.add(v);
  }
  for (let i = 0; i < vertices.length; i++) {
    for (let j = i + 1; j < vertices.length; j++) if (hasEdge(g, vertices[i], vertices[j])) return false;
  }
  return true;
}

/** Whether every edge of g has an end in `vertices` (which must be distinct vertices of g). */
export function isVertexCover(g: Graph, vertices: ReadonlyArray<number>): boolean {
  const inCover = new Uint8Array(g.order);
  for (const v of vertices) {
    if (!Number.isInteger(v) || v < 0 || v >= g.order || inCover[v]) return false;
    inCover[v] = 1;
  }
  for (let u = 0; u < g.order; u++) {
    for (let v = u + 1; v < g.order; v++) if (!inCover[u] && !inCover[v] && hasEdge(g, u, v)) return false;
  }
  return true;
}

export const INDEPENDENCE_INVARIANTS: InvariantDefinition[] = [
  {
    name: 'independenceNumber',
    kind: 'integer',
    description: 'α, size of a largest independent set',
    compute: (g, memo) => memo.shared('maximumIndependentSet', () => maximumIndependentSet(g)).length,
  },
];

export const VERTEX_COVER_INVARIANTS: InvariantDefinition[] = [
  {
    name: 'vertexCoverNumber',
    kind: 'integer',
    description: 'n − α, size of a smallest vertex cover',
    compute: (g, memo) => g.order - (memo.get('independenceNumber') as number),
  },
];
