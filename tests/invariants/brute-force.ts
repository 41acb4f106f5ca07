/**
 * Slow, obviously correct oracles for the exact invariants, straight from the definitions:
 * exhaustive search over vertex subsets, edge subsets or colour assignments. Only for small
 * graphs (subset enumeration is 2^n).
 */
import { type Graph, edgeList, hasEdge } from '../../src/graph/graph.js';

function bitCount(x: number): number {
  let c = 0;
  for (; x !== 0; x &= x - 1) c++;
  return c;
}

/** Whether the vertices of `keep` (a bitmask) induce a connected graph (true for 0 or 1 vertices). */
export function inducesConnected(g: Graph, keep: number): boolean {
  if (keep === 0) return true;
  const start = 31 - Math.clz32(keep & -keep);
  let seen = 1 << start;
  const stack = [start];
  while (stack.length > 0) {
    const u = stack.pop()!;
    for (let v = 0; v < g.order; v++) {
      if ((keep >> v) & 1 && !((seen >> v) & 1) && hasEdge(g, u, v)) {
        seen |= 1 << v;
        stack.push(v);
      }
    }
  }
  return seen === keep;
}

/** Largest k such that some k-subset of vertices satisfies pred (bitmask argument). */
function largestSubset(g: Graph, pred: (mask: number) => boolean): number {
  let best = 0;
  for (let mask = 0; mask < 1 << g.order; mask++)
    if (bitCount(mask) > best && pred(mask)) best = bitCount(mask);
  return best;
}

/** Smallest k such that some k-subset of vertices satisfies pred. */
function smallestSubset(g: Graph, pred: (mask: number) => boolean): number {
  let best = Infinity;
  for (let mask = 0; mask < 1 << g.order; mask++)
    if (bitCount(mask) < best && pred(mask)) best = bitCount(mask);
  return best;
}

function pairwise(g: Graph, mask: number, adjacent: boolean): boolean {
  for (let u = 0; u < g.order; u++) {
    if (!((mask >> u) & 1)) continue;
    for (let v = u + 1; v < g.order; v++) if ((mask >> v) & 1 && hasEdge(g, u, v) !== adjacent) return false;
  }
  return true;
}

/** α by checking every vertex subset. */
export function bruteIndependenceNumber(g: Graph): number {
  return largestSubset(g, (m) => pairwise(g, m, false));
}

/** ω by checking every vertex subset. */
export function bruteCliqueNumber(g: Graph): number {
  return largestSubset(g, (m) => pairwise(g, m, true));
}

/** γ by checking every vertex subset. */
export function bruteDominationNumber(g: Graph): number {
  return smallestSubset(g, (m) => {
    for (let u = 0; u < g.order; u++) {
      if ((m >> u) & 1) continue;
      let ok = false;
      for (let v = 0; v < g.order; v++) if ((m >> v) & 1 && hasEdge(g, u, v)) ok = true;
      if (!ok) return false;
    }
    return true;
  });
}

/** ν: the largest set of pairwise disjoint edges, by recursion over the edge list. */
export function bruteMatchingNumber(g: Graph): number {
  const edges = edgeList(g);
  const go = (i: number, used: number): number => {
    if (i === edges.length) return 0;
    const [u, v] = edges[i];
    const skip = go(i + 1, used);
    if ((used >> u) & 1 || (used >> v) & 1) return skip;
    return Math.max(skip, 1 + go(i + 1, used | (1 << u) | (1 << v)));
  };
  return go(0, 0);
}

/**
 * Whether g has a proper colouring with k colours, trying every assignment in vertex order.
 * Colours are renamed in order of first use (any colouring can be), so vertex v only tries
 * colours up to one more than the largest used before it.
 */
export function bruteColourable(g: Graph, k: number): boolean {
  const colour = new Array<number>(g.order).fill(-1);
  const go = (v: number, used: number): boolean => {
    if (v === g.order) return true;
    for (let c = 0; c < Math.min(k, used + 1); c++) {
      let ok = true;
      for (let u = 0; u < v; u++) if (colour[u] === c && hasEdge(g, u, v)) ok = false;
      if (!ok) continue;
      colour[v] = c;
      if (go(v + 1, Math.max(used, c + 1))) return true;
    }
    colour[v] = -1;
    return false;
  };
  return go(0, 0);
}

/** χ: the least k for which {@link bruteColourable} succeeds. */
export function bruteChromaticNumber(g: Graph): number {
  let k = 0;
  while (!bruteColourable(g, k)) k++;
  return k;
}

/**
 * κ from the definition: the fewest vertices whose removal leaves a disconnected graph or at
 * most one vertex (so K_n gives n − 1, n = 1 gives 0).
 */
export function bruteVertexConnectivity(g: Graph): number {
  const all = (1 << g.order) - 1;
  if (g.order === 1) return 0;
  return smallestSubset(g, (removed) => {
    const keep = all & ~removed;
    return bitCount(keep) <= 1 || !inducesConnected(g, keep);
  });
}

/** λ' from the definition: the fewest edges leaving a non-empty proper vertex subset. */
export function bruteEdgeConnectivity(g: Graph): number {
  if (g.order === 1) return 0;
  let best = Infinity;
  const all = (1 << g.order) - 1;
  // Subsets containing vertex 0 cover every cut once.
  for (let s = 1; s < all; s += 2) {
    let crossing = 0;
    for (const [u, v] of edgeList(g)) if (((s >> u) & 1) !== ((s >> v) & 1)) crossing++;
    if (crossing < best) best = crossing;
  }
  return best;
}

function componentCountOf(
  order: number,
  edges: ReadonlyArray<readonly [number, number]>,
  skipVertex = -1,
): number {
  const parent = Array.from({ length: order }, (_, i) => i);
  const find = (x: number): number => (parent[x] === x ? x : (parent[x] = find(parent[x])));
  for (const [u, v] of edges) if (u !== skipVertex && v !== skipVertex) parent[find(u)] = find(v);
  let c = 0;
  for (let v = 0; v < order; v++) if (v !== skipVertex && find(v) === v) c++;
  return c;
}

/** Bridges: edges whose deletion increases the number of components. */
export function bruteBridgeCount(g: Graph): number {
  const edges = edgeList(g);
  const base = componentCountOf(g.order, edges);
  let count = 0;
  for (let i = 0; i < edges.length; i++) {
    if (
      componentCountOf(
        g.order,
        edges.filter((_, j) => j !== i),
      ) > base
    )
      count++;
  }
  return count;
}

/** Cut vertices: vertices whose deletion increases the number of components. */
export function bruteCutVertexCount(g: Graph): number {
  const edges = edgeList(g);
  const base = componentCountOf(g.order, edges);
  let count = 0;
  for (let v = 0; v < g.order; v++) if (componentCountOf(g.order, edges, v) > base) count++;
  return count;
}

/** τ: every (n−1)-edge subset that connects all vertices (hence a tree). Tiny graphs only. */
export function bruteSpanningTreeCount(g: Graph): number {
  const edges = edgeList(g);
  const need = g.order - 1;
  let count = 0;
  const chosen: Array<readonly [number, number]> = [];
  const go = (i: number): void => {
    if (chosen.length === need) {
      if (componentCountOf(g.order, chosen) === 1) count++;
      return;
    }
    if (edges.length - i < need - chosen.length) return;
    chosen.push(edges[i]);
    go(i + 1);
    chosen.pop();
    go(i + 1);
  };
  go(0);
  return count;
}
