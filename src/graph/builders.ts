/**
 * Constructors and structural transformations of the compact {@link Graph} type.
 *
 * Every function returns a fresh graph and leaves its inputs untouched. Invalid input (a loop,
 * a vertex out of range, an asymmetric matrix) throws a RangeError that says what was expected
 * and what was found; duplicate edges are merged, since a simple graph has no multi-edges.
 */
import { type Graph, MAX_ORDER, popcount32, wordsForOrder } from './graph.js';

function checkOrder(order: number): void {
  if (!Number.isInteger(order) || order < 0 || order > MAX_ORDER) {
    throw new RangeError(`Expected the order to be an integer in 0..${MAX_ORDER} but found ${order}`);
  }
}

/**
 * Wraps bitset rows (already symmetric, zero diagonal) into a Graph, computing degrees and size.
 * The rows array is adopted, not copied.
 */
export function graphFromRows(order: number, rows: Uint32Array): Graph {
  const wordsPerRow = wordsForOrder(order);
  if (rows.length !== order * wordsPerRow) {
    throw new RangeError(
      `Expected ${order * wordsPerRow} row words for order ${order} but found ${rows.length}`,
    );
  }
  const degrees = new Int32Array(order);
  let twiceSize = 0;
  for (let v = 0; v < order; v++) {
    let d = 0;
    for (let w = 0; w < wordsPerRow; w++) d += popcount32(rows[v * wordsPerRow + w]);
    degrees[v] = d;
    twiceSize += d;
  }
  return { order, size: twiceSize >>> 1, wordsPerRow, rows, degrees };
}

/** The graph on vertices 0..order-1 with the given edges. */
export function fromEdges(order: number, edges: Iterable<readonly [number, number]>): Graph {
  checkOrder(order);
  const wordsPerRow = wordsForOrder(order);
  const rows = new Uint32Array(order * wordsPerRow);
  for (const [u, v] of edges) {
    if (!Number.isInteger(u) || !Number.isInteger(v) || u < 0 || v < 0 || u >= order || v >= order) {
      throw new RangeError(`Expected edge endpoints in 0..${order - 1} but found ${u}-${v}`);
    }
    if (u === v) throw new RangeError(`Expected a simple graph but found a loop at vertex ${u}`);
    rows[u * wordsPerRow + (v >>> 5)] |= 1 << (v & 31);
    rows[v * wordsPerRow + (u >>> 5)] |= 1 << (u & 31);
  }
  return graphFromRows(order, rows);
}

/** The graph whose adjacency matrix is given (0/1 or boolean entries, symmetric, zero diagonal). */
export function fromAdjacencyMatrix(matrix: ReadonlyArray<ReadonlyArray<number | boolean>>): Graph {
  const order = matrix.length;
  checkOrder(order);
  const edges: Array<[number, number]> = [];
  for (let i = 0; i < order; i++) {
    if (matrix[i].length !== order) {
      throw new RangeError(
        `Expected row ${i} of the adjacency matrix to have ${order} entries but found ${matrix[i].length}`,
      );
    }
    for (let j = 0; j < order; j++) {
      const a = Number(matrix[i][j]);
      const b = Number(matrix[j][i]);
      if ((a !== 0 && a !== 1) || a !== b) {
        throw new RangeError(
          `Expected a symmetric 0/1 matrix but found entries ${a} at (${i},${j}) and ${b} at (${j},${i})`,
        );
      }
      if (i === j && a === 1)
        throw new RangeError(`Expected a zero diagonal but found a loop at vertex ${i}`);
      if (j > i && a === 1) edges.push([i, j]);
    }
  }
  return fromEdges(order, edges);
}

/**
 * The graph whose pairs, in graph6 order (column by column of the upper triangle:
 * 01, 02, 12, 03, 13, 23, ...), are edges exactly where `bits[k]` is non-zero.
 * This is the order in which the hunt decides edges.
 */
export function fromUpperTriangleBits(order: number, bits: ArrayLike<number>): Graph {
  checkOrder(order);
  const pairs = (order * (order - 1)) / 2;
  if (bits.length !== pairs)
    throw new RangeError(`Expected ${pairs} pair bits for order ${order} but found ${bits.length}`);
  const wordsPerRow = wordsForOrder(order);
  const rows = new Uint32Array(order * wordsPerRow);
  let k = 0;
  for (let j = 1; j < order; j++) {
    for (let i = 0; i < j; i++, k++) {
      if (bits[k] !== 0) {
        rows[i * wordsPerRow + (j >>> 5)] |= 1 << (j & 31);
        rows[j * wordsPerRow + (i >>> 5)] |= 1 << (i & 31);
      }
    }
  }
  return graphFromRows(order, rows);
}

/** The complement: uv is an edge of the result exactly when u != v and uv is not an edge of g. */
export function complement(g: Graph): Graph {
  const { order, wordsPerRow } = g;
  const rows = new Uint32Array(order * wordsPerRow);
  const tailBits = order & 31;
  const lastMask = tailBits === 0 ? 0xffffffff : (1 << tailBits) - 1;
  for (let v = 0; v < order; v++) {
    const base = v * wordsPerRow;
    for (let w = 0; w < wordsPerRow; w++) {
      const mask = w === wordsPerRow - 1 ? lastMask : 0xffffffff;
      rows[base + w] = ~g.rows[base + w] & mask;
    }
    rows[base + (v >>> 5)] &= ~(1 << (v & 31));
  }
  return graphFromRows(order, rows);
}

/**
 * The subgraph induced on the given vertices; vertex `vertices[i]` of g becomes vertex i.
 */
export function inducedSubgraph(g: Graph, vertices: ReadonlyArray<number>): Graph {
  const seen = new Set<number>();
  for (const v of vertices) {
    if (!Number.isInteger(v) || v < 0 || v >= g.order) {
      throw new RangeError(`Expected vertices in 0..${g.order - 1} but found ${v}`);
    }
    if (seen.has(v)) throw new RangeError(`Expected distinct vertices but found ${v} twice`);
    seen.add(v);
  }
  const k = vertices.length;
  const wordsPerRow = wordsForOrder(k);
  const rows = new Uint32Array(k * wordsPerRow);
  for (let i = 0; i < k; i++) {
    const base = vertices[i] * g.wordsPerRow;
    for (let j = 0; j < k; j++) {
      const u = vertices[j];
      if ((g.rows[base + (u >>> 5)] >>> (u & 31)) & 1) rows[i * wordsPerRow + (j >>> 5)] |= 1 << (j & 31);
    }
  }
  return graphFromRows(k, rows);
}

/**
 * Relabels g by the permutation `perm`: vertex v of g becomes vertex perm[v] of the result.
 */
export function relabel(g: Graph, perm: ReadonlyArray<number>): Graph {
  if (perm.length !== g.order) {
    throw new RangeError(`Expected a permutation of ${g.order} vertices but found ${perm.length} entries`);
  }
  const seen = new Uint8Array(g.order);
  for (const p of perm) {
    if (!Number.isInteger(p) || p < 0 || p >= g.order || seen[p]) {
      throw new RangeError(`Expected a permutation of 0..${g.order - 1} but found ${perm.join(',')}`);
    }
    seen[p] = 1;
  }
  const { order, wordsPerRow } = g;
  const rows = new Uint32Array(order * wordsPerRow);
  for (let u = 0; u < order; u++) {
    const pu = perm[u];
    const base = u * wordsPerRow;
    for (let w = 0; w < wordsPerRow; w++) {
      let word = g.rows[base + w];
      while (word !== 0) {
        const low = word & -word;
        const v = (w << 5) | (31 - Math.clz32(low));
        const pv = perm[v];
        rows[pu * wordsPerRow + (pv >>> 5)] |= 1 << (pv & 31);
        word ^= low;
      }
    }
  }
  return graphFromRows(order, rows);
}
