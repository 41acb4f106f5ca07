/**
 * The compact graph type every hot path of refute works on.
 *
 * A simple undirected graph on vertices 0..order-1, stored as bitset rows: row v occupies
 * `rows[v * wordsPerRow .. (v + 1) * wordsPerRow)`, and bit u of that row (word u >>> 5,
 * bit u & 31) is set exactly when uv is an edge. Rows are symmetric and the diagonal is zero.
 *
 * @remarks Values of this type are treated as immutable by every function of the project:
 * functions that "change" a graph return a new one. Build graphs with the functions of
 * `builders.ts`, which keep the degree array and edge count consistent with the rows.
 */
export interface Graph {
  /** n, the number of vertices. */
  readonly order: number;
  /** m, the number of edges. */
  readonly size: number;
  /** 32-bit words per adjacency row: ceil(order / 32), at least 1. */
  readonly wordsPerRow: number;
  /** Adjacency bitsets, `order * wordsPerRow` words. */
  readonly rows: Uint32Array;
  /** Degree of each vertex. */
  readonly degrees: Int32Array;
}

/** Largest order the graph type accepts; bounded only to keep a typo from allocating gigabytes. */
export const MAX_ORDER = 1 << 16;

/** Words per bitset row for a graph of this order. */
export function wordsForOrder(order: number): number {
  return Math.max(1, (order + 31) >>> 5);
}

/** Whether uv is an edge. */
export function hasEdge(g: Graph, u: number, v: number): boolean {
  return ((g.rows[u * g.wordsPerRow + (v >>> 5)] >>> (v & 31)) & 1) === 1;
}

/** Neighbours of v in increasing order. */
export function neighbors(g: Graph, v: number): Int32Array {
  const out = new Int32Array(g.degrees[v]);
  let k = 0;
  const base = v * g.wordsPerRow;
  for (let w = 0; w < g.wordsPerRow; w++) {
    let word = g.rows[base + w];
    while (word !== 0) {
      const low = word & -word;
      out[k++] = (w << 5) | (31 - Math.clz32(low));
      word ^= low;
    }
  }
  return out;
}

/** Edges as [u, v] pairs with u < v, in lexicographic order. */
export function edgeList(g: Graph): Array<[number, number]> {
  const out: Array<[number, number]> = [];
  for (let u = 0; u < g.order; u++) {
    for (const v of neighbors(g, u)) if (v > u) out.push([u, v]);
  }
  return out;
}

/** Whether two graphs are equal as labelled graphs (same order, same edge set). */
export function graphsEqual(a: Graph, b: Graph): boolean {
  if (a.order !== b.order || a.size !== b.size) return false;
  for (let i = 0; i < a.rows.length; i++) if (a.rows[i] !== b.rows[i]) return false;
  return true;
}

/** Number of set bits of a 32-bit word (the classic SWAR popcount). */
export function popcount32(x: number): number {
  x = x - ((x >>> 1) & 0x55555555);
  x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
  x = (x + (x >>> 4)) & 0x0f0f0f0f;
  return Math.imul(x, 0x01010101) >>> 24;
}
