/**
 * Chromatic number χ(G), with an optimal proper colouring as witness.
 *
 * DSATUR-based branch and bound. The upper bound starts from Brélaz's DSATUR heuristic, the
 * lower bound is ω(G); a maximum clique is precoloured 0..ω−1 (which also breaks the colour
 * symmetry there). The search then always branches on an uncoloured vertex of largest
 * saturation (number of distinct colours among its neighbours; ties by degree), trying each
 * colour already used that no neighbour has, and one new colour, and prunes every branch that
 * would need as many colours as the best colouring found. It stops as soon as the best colouring
 * uses ω colours.
 *
 * @remarks Exact at every order, but the worst case is exponential (the problem is NP-hard), so
 * the order matters. Measured by tests/bench/hard-invariants.bench.ts (seeded G(n, p)): for
 * n ≤ 40 at densities 0.1–0.8, a mean of at most 1 ms and a worst case of 2 ms per graph on a
 * quiet machine (up to 15–35 ms with both shared cores busy); 20–130 ms at n = 50, p = 0.5;
 * 0.6–1.5 s at n = 60, p = 0.5 and 0.3–1.1 s at n = 60, p = 0.8; 14–19 s at n = 70, p = 0.5.
 * So: well under a second up to 50 vertices at any density; expect seconds beyond 60.
 * Mid-density graphs, where χ exceeds ω by several colours, are the hard ones.
 *
 * @see D. Brélaz, "New methods to color the vertices of a graph", Communications of the ACM 22(4)
 *   (1979) 251–256.
 * @see P. San Segundo, "A new DSATUR-based algorithm for exact vertex coloring", Computers &
 *   Operations Research 39(7) (2012) 1724–1733.
 */
import { type Graph, hasEdge, neighbors } from '../graph/graph.js';
import { maximumClique } from './cliques.js';
import { type InvariantDefinition } from './registry.js';

/**
 * Saturation bookkeeping shared by the heuristic and the exact search: for each vertex, how many
 * neighbours carry each colour, and how many distinct colours that is.
 */
class Saturation {
  readonly colour: Int32Array;
  readonly sat: Int32Array;
  private readonly count: Int32Array;

  constructor(
    private readonly n: number,
    private readonly adj: Int32Array[],
  ) {
    this.colour = new Int32Array(n).fill(-1);
    this.sat = new Int32Array(n);
    this.count = new Int32Array(n * n);
  }

  isFree(v: number, c: number): boolean {
    return this.count[v * this.n + c] === 0;
  }

  assign(v: number, c: number): void {
    this.colour[v] = c;
    for (const u of this.adj[v]) if (this.count[u * this.n + c]++ === 0) this.sat[u]++;
  }

  unassign(v: number): void {
    const c = this.colour[v];
    this.colour[v] = -1;
    for (const u of this.adj[v]) if (--this.count[u * this.n + c] === 0) this.sat[u]--;
  }

  /**
   * An uncoloured vertex of largest saturation, ties by degree then label; -1 when none is left.
   * (Breaking ties by degree among uncoloured vertices instead was measured: no gain, so the
   * static degree stays.)
   */
  pick(): number {
    let best = -1;
    for (let v = 0; v < this.n; v++) {
      if (this.colour[v] !== -1) continue;
      if (
        best === -1 ||
        this.sat[v] > this.sat[best] ||
        (this.sat[v] === this.sat[best] && this.adj[v].length > this.adj[best].length)
      ) {
        best = v;
      }
    }
    return best;
  }
}

/**
 * A proper colouring of g with χ(G) colours 0..χ−1 (colour per vertex).
 *
 * @param clique a maximum clique of g (computed when not given; pass one to reuse it).
 */
export function minimumColouring(g: Graph, clique: ReadonlyArray<number> = maximumClique(g)): Int32Array {
  const n = g.order;
  if (n === 0) return new Int32Array(0);
  const adj: Int32Array[] = [];
  for (let v = 0; v < n; v++) adj.push(neighbors(g, v));
  const lower = clique.length;

  // DSATUR heuristic (Brélaz 1979): the initial upper bound.
  const h = new Saturation(n, adj);
  let used = 0;
  for (let k = 0; k < n; k++) {
    const v = h.pick();
    let c = 0;
    while (!h.isFree(v, c)) c++;
    h.assign(v, c);
    if (c + 1 > used) used = c + 1;
  }
  let best = Int32Array.from(h.colour);
  let upper = used;
  if (upper === lower) return best;

  // Exact search from the precoloured clique.
  const s = new Saturation(n, adj);
  for (let i = 0; i < clique.length; i++) s.assign(clique[i], i);
  const search = (coloured: number, usedColours: number): boolean => {
    if (coloured === n) {
      best = Int32Array.from(s.colour);
      upper = usedColours;
      return upper === lower;
    }
    const v = s.pick();
    // Colours 0..usedColours-1 if free, then one new colour; all must stay below upper - 1.
    // upper may fall while the loop runs, so the limit is re-read each time.
    for (let c = 0; c <= usedColours && c <= upper - 2; c++) {
      if (!s.isFree(v, c)) continue;
      s.assign(v, c);
      const done = search(coloured + 1, c === usedColours ? usedColours + 1 : usedColours);
      s.unassign(v);
      if (done) return true;
    }
    return false;
  };
  search(clique.length, lower);
  return best;
}

/** χ(G), the least number of colours of a proper vertex colouring (0 only when n = 0). */
export function chromaticNumber(g: Graph): number {
  let k = 0;
  for (const c of minimumColouring(g)) if (c + 1 > k) k = c + 1;
  return k;
}

/**
 * Whether `colouring` gives each vertex of g a non-negative integer colour with no edge
 * joining two vertices of the same colour.
 */
export function isProperColouring(g: Graph, colouring: ArrayLike<number>): boolean {
  if (colouring.length !== g.order) return false;
  for (let v = 0; v < g.order; v++) if (!Number.isInteger(colouring[v]) || colouring[v] < 0) return false;
  for (let u = 0; u < g.order; u++) {
    for (let v = u + 1; v < g.order; v++) if (colouring[u] === colouring[v] && hasEdge(g, u, v)) return false;
  }
  return true;
}

export const COLOURING_INVARIANTS: InvariantDefinition[] = [
  {
    name: 'chromaticNumber',
    kind: 'integer',
    description: 'χ, least number of colours of a proper colouring',
    compute: (g, memo) => {
      const colouring = memo.shared('minimumColouring', () =>
        minimumColouring(
          g,
          memo.shared('maximumClique', () => maximumClique(g)),
        ),
      );
      let k = 0;
      for (const c of colouring) if (c + 1 > k) k = c + 1;
      return k;
    },
  },
];
