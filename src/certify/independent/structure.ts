/**
 * Second, independent computations of the structural integer and boolean invariants, for
 * certification. Each reads the graph only through `hasEdge` (never the degree array or the
 * registry's code) and uses a different method from src/invariants/:
 * - degrees, Zagreb indices: counting hasEdge over all pairs;
 * - components: union–find over the edge set (R. E. Tarjan, "Efficiency of a good but not
 *   linear set union algorithm", J. ACM 22 (1975) 215–225), where the registry uses BFS;
 * - bipartiteness: the coefficient theorem for the characteristic polynomial — G is bipartite
 *   iff its adjacency spectrum is symmetric about 0, iff det(xI - A) = (-1)^n det(-xI - A),
 *   i.e. only coefficients of x^(n-2k) are non-zero (D. M. Cvetković, M. Doob and H. Sachs,
 *   "Spectra of Graphs", Academic Press 1980, Thm. 3.11);
 * - triangles: all vertex triples;
 * - bridges and cut vertices: delete the edge (vertex) and recount components, the definition.
 */
import { type Graph, hasEdge } from '../../graph/graph.js';
import { type IntPolynomial } from '../polynomial.js';

/** Degrees by counting hasEdge(v, u) over all u. */
export function countedDegrees(g: Graph): number[] {
  const out = new Array<number>(g.order).fill(0);
  for (let u = 0; u < g.order; u++)
    for (let v = 0; v < g.order; v++) if (u !== v && hasEdge(g, u, v)) out[u]++;
  return out;
}

/** Edges u < v found by testing every pair. */
export function pairEdges(g: Graph): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  for (let u = 0; u < g.order; u++)
    for (let v = u + 1; v < g.order; v++) if (hasEdge(g, u, v)) out.push([u, v]);
  return out;
}

/** Number of components of the graph on n vertices with these edges, by union–find. */
export function unionFindComponents(
  n: number,
  edges: ReadonlyArray<readonly [number, number]>,
  skipEdge = -1,
): number {
  const parent = Array.from({ length: n }, (_, i) => i);
  const find = (x: number): number => {
    while (parent[x] !== x) {
      parent[x] = parent[parent[x]];
      x = parent[x];
    }
    return x;
  };
  let components = n;
  for (let i = 0; i < edges.length; i++) {
    if (i === skipEdge) continue;
    const a = find(edges[i][0]);
    const b = find(edges[i][1]);
    if (a !== b) {
      parent[a] = b;
      components--;
    }
  }
  return components;
}

export function componentCountByUnionFind(g: Graph): number {
  return unionFindComponents(g.order, pairEdges(g));
}

/** Bipartite iff the characteristic polynomial of A has non-zero coefficients only at x^(n-2k). */
export function isBipartiteByCharacteristicPolynomial(adjacencyCharPoly: IntPolynomial, n: number): boolean {
  for (let i = 0; i < adjacencyCharPoly.length; i++)
    if ((n - i) % 2 === 1 && adjacencyCharPoly[i] !== 0n) return false;
  return true;
}

export function triangleCountByTriples(g: Graph): number {
  let t = 0;
  for (let a = 0; a < g.order; a++)
    for (let b = a + 1; b < g.order; b++) {
      if (!hasEdge(g, a, b)) continue;
      for (let c = b + 1; c < g.order; c++) if (hasEdge(g, a, c) && hasEdge(g, b, c)) t++;
    }
  return t;
}

/** Edges whose deletion increases the number of components. */
export function bridgeCountByDeletion(g: Graph): number {
  const edges = pairEdges(g);
  const base = unionFindComponents(g.order, edges);
  let count = 0;
  for (let i = 0; i < edges.length; i++) if (unionFindComponents(g.order, edges, i) > base) count++;
  return count;
}

/** Vertices whose deletion increases the number of components. */
export function cutVertexCountByDeletion(g: Graph): number {
  const edges = pairEdges(g);
  const base = unionFindComponents(g.order, edges);
  let count = 0;
  for (let v = 0; v < g.order; v++) {
    const kept = edges.filter(([a, b]) => a !== v && b !== v);
    // G - v has n - 1 vertices; v itself would count as a component of its own here, so subtract it.
    if (unionFindComponents(g.order, kept) - 1 > base) count++;
  }
  return count;
}

export function firstZagrebByCounting(g: Graph): number {
  return countedDegrees(g).reduce((s, d) => s + d * d, 0);
}

export function secondZagrebByCounting(g: Graph): number {
  const d = countedDegrees(g);
  return pairEdges(g).reduce((s, [u, v]) => s + d[u] * d[v], 0);
}
