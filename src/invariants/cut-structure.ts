/**
 * Bridges and cut vertices (articulation points), by depth-first search with low points.
 *
 * For the DFS tree, low(v) is the smallest discovery time reachable from v's subtree by one back
 * edge. A tree edge (p, v) is a bridge exactly when low(v) > disc(p); a non-root p is a cut vertex
 * exactly when some child v has low(v) >= disc(p); a root is one when it has two or more children.
 * The search is iterative, so deep graphs (long paths) cannot overflow the call stack.
 *
 * @remarks Linear time, O(n + m); exact at any order.
 *
 * @see R. E. Tarjan, "Depth-first search and linear graph algorithms", SIAM Journal on Computing
 *   1(2) (1972) 146–160.
 * @see J. Hopcroft, R. Tarjan, "Algorithm 447: efficient algorithms for graph manipulation",
 *   Communications of the ACM 16(6) (1973) 372–378.
 */
import { type Graph, neighbors } from '../graph/graph.js';
import { type InvariantDefinition } from './registry.js';

/** Bridges and cut vertices of g, found in one search. */
export interface CutStructure {
  /** Bridges as [u, v] with u < v, sorted. */
  readonly bridges: Array<[number, number]>;
  /** Cut vertices in increasing order. */
  readonly cutVertices: number[];
}

/** The bridges and cut vertices of g. */
export function cutStructure(g: Graph): CutStructure {
  const n = g.order;
  const adj: Int32Array[] = [];
  for (let v = 0; v < n; v++) adj.push(neighbors(g, v));
  const disc = new Int32Array(n).fill(-1);
  const low = new Int32Array(n);
  const parent = new Int32Array(n).fill(-1);
  const nextIndex = new Int32Array(n);
  const isCut = new Uint8Array(n);
  const stack = new Int32Array(n);
  const bridges: Array<[number, number]> = [];
  let time = 0;
  for (let root = 0; root < n; root++) {
    if (disc[root] !== -1) continue;
    let top = 0;
    stack[top++] = root;
    disc[root] = low[root] = time++;
    let rootChildren = 0;
    while (top > 0) {
      const v = stack[top - 1];
      if (nextIndex[v] < adj[v].length) {
        const w = adj[v][nextIndex[v]++];
        if (disc[w] === -1) {
          parent[w] = v;
          disc[w] = low[w] = time++;
          stack[top++] = w;
          if (v === root) rootChildren++;
        } else if (w !== parent[v] && disc[w] < low[v]) {
          low[v] = disc[w];
        }
      } else {
        top--;
        const p = parent[v];
        if (p !== -1) {
          if (low[v] < low[p]) low[p] = low[v];
          if (low[v] > disc[p]) bridges.push(p < v ? [p, v] : [v, p]);
          if (p !== root && low[v] >= disc[p]) isCut[p] = 1;
        }
      }
    }
    if (rootChildren >= 2) isCut[root] = 1;
  }
  bridges.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  const cutVertices: number[] = [];
  for (let v = 0; v < n; v++) if (isCut[v]) cutVertices.push(v);
  return { bridges, cutVertices };
}

/** Number of bridges: edges whose removal increases the number of components. */
export function bridgeCount(g: Graph): number {
  return cutStructure(g).bridges.length;
}

/** Number of cut vertices: vertices whose removal increases the number of components. */
export function cutVertexCount(g: Graph): number {
  return cutStructure(g).cutVertices.length;
}

export const CUT_STRUCTURE_INVARIANTS: InvariantDefinition[] = [
  {
    name: 'bridgeCount',
    kind: 'integer',
    description: 'number of bridges',
    compute: (g, memo) => memo.shared('cutStructure', () => cutStructure(g)).bridges.length,
  },
  {
    name: 'cutVertexCount',
    kind: 'integer',
    description: 'number of cut vertices (articulation points)',
    compute: (g, memo) => memo.shared('cutStructure', () => cutStructure(g)).cutVertices.length,
  },
];
