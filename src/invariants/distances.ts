/**
 * Distance invariants: diameter, radius, girth, Wiener index, average distance, transmissions,
 * proximity and remoteness.
 *
 * All-pairs distances by breadth-first search from every vertex (Moore 1959), expanding a whole
 * BFS layer at once as the OR of the frontier's bitset rows. Girth by BFS from every vertex,
 * taking the shortest closed walk through a non-tree edge (A. Itai and M. Rodeh, "Finding a
 * minimum circuit in a graph", SIAM J. Comput. 7 (1978) 413–423). Proximity and remoteness as
 * defined by M. Aouchiche and P. Hansen, "Proximity and remoteness in graphs: results and
 * conjectures", Networks 58 (2011) 95–102. Conventions for disconnected graphs and n = 1:
 * shared/INVARIANTS.md.
 */
import { type Graph } from '../graph/graph.js';
import { type InvariantDefinition, type InvariantMemo } from './registry.js';

/** Marker for an unreachable pair in a distance matrix. */
export const UNREACHABLE = -1;

/** Distances d(u, v), row-major n*n; UNREACHABLE (-1) where there is no path. */
export function distanceMatrix(g: Graph): Int32Array {
  const n = g.order;
  const W = g.wordsPerRow;
  const dist = new Int32Array(n * n).fill(UNREACHABLE);
  const visited = new Uint32Array(W);
  const frontier = new Uint32Array(W);
  const next = new Uint32Array(W);
  for (let s = 0; s < n; s++) {
    visited.fill(0);
    frontier.fill(0);
    visited[s >>> 5] |= 1 << (s & 31);
    frontier[s >>> 5] |= 1 << (s & 31);
    dist[s * n + s] = 0;
    for (let level = 1; ; level++) {
      next.fill(0);
      for (let w = 0; w < W; w++) {
        let word = frontier[w];
        while (word !== 0) {
          const low = word & -word;
          const u = (w << 5) | (31 - Math.clz32(low));
          word ^= low;
          const base = u * W;
          for (let x = 0; x < W; x++) next[x] |= g.rows[base + x];
        }
      }
      let any = 0;
      for (let w = 0; w < W; w++) {
        next[w] &= ~visited[w];
        visited[w] |= next[w];
        frontier[w] = next[w];
        any |= next[w];
        let word = next[w];
        while (word !== 0) {
          const low = word & -word;
          dist[s * n + ((w << 5) | (31 - Math.clz32(low)))] = level;
          word ^= low;
        }
      }
      if (any === 0) break;
    }
  }
  return dist;
}

/** The distance matrix of g through the memo, shared by every distance-based invariant. */
export function sharedDistances(g: Graph, memo: InvariantMemo): Int32Array {
  return memo.shared('distanceMatrix', () => distanceMatrix(g));
}

/** Transmission (sum of distances to all others) of each vertex; Infinity when some vertex is unreachable. */
export function transmissionsFromDistances(dist: Int32Array, n: number): number[] {
  const out = new Array<number>(n);
  for (let u = 0; u < n; u++) {
    let t = 0;
    for (let v = 0; v < n; v++) {
      const d = dist[u * n + v];
      if (d === UNREACHABLE) {
        t = Infinity;
        break;
      }
      t += d;
    }
    out[u] = t;
  }
  return out;
}

/** Eccentricity of each vertex; Infinity when some vertex is unreachable. */
export function eccentricitiesFromDistances(dist: Int32Array, n: number): number[] {
  const out = new Array<number>(n);
  for (let u = 0; u < n; u++) {
    let e = 0;
    for (let v = 0; v < n; v++) {
      const d = dist[u * n + v];
      if (d === UNREACHABLE) {
        e = Infinity;
        break;
      }
      if (d > e) e = d;
    }
    out[u] = e;
  }
  return out;
}

/** Length of a shortest cycle; Infinity for forests. */
export function girth(g: Graph): number {
  const n = g.order;
  const level = new Int32Array(n);
  const parent = new Int32Array(n);
  const queue = new Int32Array(n);
  let best = Infinity;
  for (let s = 0; s < n; s++) {
    level.fill(-1);
    level[s] = 0;
    parent[s] = -1;
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    while (head < tail) {
      const u = queue[head++];
      // A cycle through s found at this depth cannot beat the best one already known.
      if (2 * level[u] + 1 >= best) break;
      const base = u * g.wordsPerRow;
      for (let w = 0; w < g.wordsPerRow; w++) {
        let word = g.rows[base + w];
        while (word !== 0) {
          const low = word & -word;
          const v = (w << 5) | (31 - Math.clz32(low));
          word ^= low;
          if (level[v] === -1) {
            level[v] = level[u] + 1;
            parent[v] = u;
            queue[tail++] = v;
          } else if (v !== parent[u]) {
            const len = level[u] + level[v] + 1;
            if (len < best) best = len;
          }
        }
      }
    }
  }
  return best;
}

function transmissionsOf(g: Graph, memo: InvariantMemo): number[] {
  return memo.get('transmissions') as number[];
}

export const DISTANCE_INVARIANTS: InvariantDefinition[] = [
  {
    name: 'diameter',
    kind: 'integer',
    description: 'max distance (Infinity if disconnected)',
    compute: (g, memo) =>
      Math.max(
        0,
        ...memo.shared('eccentricities', () =>
          eccentricitiesFromDistances(sharedDistances(g, memo), g.order),
        ),
      ),
  },
  {
    name: 'radius',
    kind: 'integer',
    description: 'min eccentricity (Infinity if disconnected)',
    compute: (g, memo) =>
      Math.min(
        ...memo.shared('eccentricities', () =>
          eccentricitiesFromDistances(sharedDistances(g, memo), g.order),
        ),
      ),
  },
  {
    name: 'girth',
    kind: 'integer',
    description: 'shortest cycle length (Infinity for forests)',
    compute: girth,
  },
  {
    name: 'wienerIndex',
    kind: 'integer',
    description: 'sum of distances over unordered pairs (Infinity if disconnected)',
    compute: (g, memo) => transmissionsOf(g, memo).reduce((a, b) => a + b, 0) / 2,
  },
  {
    name: 'averageDistance',
    kind: 'real',
    description: 'Wiener index / C(n,2) (Infinity if disconnected; 0 for n = 1)',
    compute: (g, memo) =>
      g.order === 1 ? 0 : (memo.get('wienerIndex') as number) / ((g.order * (g.order - 1)) / 2),
  },
  {
    name: 'transmissions',
    kind: 'integer-list',
    description: 'per vertex, sum of distances to all others',
    compute: (g, memo) => transmissionsFromDistances(sharedDistances(g, memo), g.order),
  },
  {
    name: 'proximity',
    kind: 'real',
    description: 'min transmission / (n-1) (Infinity if disconnected; 0 for n = 1)',
    compute: (g, memo) => (g.order === 1 ? 0 : Math.min(...transmissionsOf(g, memo)) / (g.order - 1)),
  },
  {
    name: 'remoteness',
    kind: 'real',
    description: 'max transmission / (n-1) (Infinity if disconnected; 0 for n = 1)',
    compute: (g, memo) => (g.order === 1 ? 0 : Math.max(...transmissionsOf(g, memo)) / (g.order - 1)),
  },
];
