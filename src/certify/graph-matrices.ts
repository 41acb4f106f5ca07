/**
 * The integer matrices of a graph whose characteristic polynomials certification uses:
 * adjacency A, Laplacian L = D - A, signless Laplacian Q = D + A, distance matrix 𝒟 and
 * distance Laplacian Tr - 𝒟 (M. Aouchiche and P. Hansen, "Two Laplacians for the distance
 * matrix of a graph", Linear Algebra Appl. 439 (2013) 21–33), plus the integer matrix whose
 * spectrum is a multiple of the normalized Laplacian's.
 *
 * Distances come from a plain queue-based breadth-first search over neighbour lists (Moore
 * 1959), written here independently of src/invariants/distances.ts so that certified distance
 * values do not rest on the code being checked.
 */
import { type Graph, hasEdge, neighbors } from '../graph/graph.js';
import { type IntMatrix } from './characteristic-polynomial.js';

/** Which integer matrix of the graph. */
export type IntegerGraphMatrix =
  'adjacency' | 'laplacian' | 'signlessLaplacian' | 'distance' | 'distanceLaplacian';

/** All-pairs distances by BFS from each vertex, row-major; -1 where unreachable. */
export function bfsDistances(g: Graph): Int32Array {
  const n = g.order;
  const dist = new Int32Array(n * n).fill(-1);
  const adjacency = Array.from({ length: n }, (_, v) => neighbors(g, v));
  const queue = new Int32Array(n);
  for (let s = 0; s < n; s++) {
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    dist[s * n + s] = 0;
    while (head < tail) {
      const u = queue[head++];
      for (const v of adjacency[u]) {
        if (dist[s * n + v] === -1) {
          dist[s * n + v] = dist[s * n + u] + 1;
          queue[tail++] = v;
        }
      }
    }
  }
  return dist;
}

/** Whether every pair is joined by a path (by the BFS above). */
export function isConnectedByBfs(g: Graph): boolean {
  if (g.order === 0) return true;
  const d = bfsDistances(g);
  for (let v = 0; v < g.order; v++) if (d[v] < 0) return false;
  return true;
}

/**
 * The chosen integer matrix. Distance matrices need a connected graph: a RangeError otherwise
 * (callers check connectivity first and report the domain error themselves).
 */
export function integerGraphMatrix(g: Graph, kind: IntegerGraphMatrix): IntMatrix {
  const n = g.order;
  const entries = new Array<bigint>(n * n).fill(0n);
  if (kind === 'distance' || kind === 'distanceLaplacian') {
    const d = bfsDistances(g);
    for (let i = 0; i < n * n; i++)
      if (d[i] < 0)
        throw new RangeError('Expected a connected graph for a distance matrix but found a disconnected one');
    for (let u = 0; u < n; u++) {
      let transmission = 0n;
      for (let v = 0; v < n; v++) {
        const duv = BigInt(d[u * n + v]);
        transmission += duv;
        entries[u * n + v] = kind === 'distance' ? duv : -duv;
      }
      if (kind === 'distanceLaplacian') entries[u * n + u] = transmission;
    }
    return { n, entries };
  }
  const off = kind === 'laplacian' ? -1n : 1n;
  for (let u = 0; u < n; u++) {
    for (let v = 0; v < n; v++) if (u !== v && hasEdge(g, u, v)) entries[u * n + v] = off;
    if (kind !== 'adjacency') entries[u * n + u] = BigInt(g.degrees[u]);
  }
  return { n, entries };
}

/**
 * For the graph with isolated vertices removed (degrees d_v > 0), the integer matrix
 * N = ℓ D^-1 L with ℓ = lcm(d_v): it is similar to ℓ (I - D^-1/2 A D^-1/2), so its eigenvalues
 * are ℓ times those of the normalized Laplacian. Returns the matrix, ℓ and the number of
 * isolated vertices (each contributes the eigenvalue 0 by the convention of INVARIANTS.md).
 */
export function scaledNormalizedLaplacian(g: Graph): { matrix: IntMatrix; scale: bigint; isolated: number } {
  const kept: number[] = [];
  for (let v = 0; v < g.order; v++) if (g.degrees[v] > 0) kept.push(v);
  let scale = 1n;
  for (const v of kept) scale = lcm(scale, BigInt(g.degrees[v]));
  const k = kept.length;
  const entries = new Array<bigint>(k * k).fill(0n);
  for (let i = 0; i < k; i++) {
    const u = kept[i];
    const factor = scale / BigInt(g.degrees[u]);
    for (let j = 0; j < k; j++) {
      if (i === j) entries[i * k + j] = scale;
      else if (hasEdge(g, u, kept[j])) entries[i * k + j] = -factor;
    }
  }
  return { matrix: { n: k, entries }, scale, isolated: g.order - k };
}

function lcm(a: bigint, b: bigint): bigint {
  let x = a;
  let y = b;
  while (y !== 0n) [x, y] = [y, x % y];
  return (a / x) * b;
}
