/**
 * Canonical labelling of graphs: a relabelling that depends only on the isomorphism class, so
 * two graphs are isomorphic exactly when their canonical forms (and canonical graph6 strings)
 * are equal. The automorphism group comes out of the same search.
 *
 * Method: the individualisation-refinement search tree of
 * @see B. D. McKay, "Practical graph isomorphism", Congressus Numerantium 30 (1981) 45–87, and
 * @see B. D. McKay and A. Piperno, "Practical graph isomorphism, II", J. Symbolic Computation
 *   60 (2014) 94–112 (the framework of node invariants and automorphism pruning used here).
 *
 * The root of the tree is the equitable refinement of the unit partition. A node with a
 * non-discrete partition has one child per vertex w of its target cell (the first non-singleton
 * cell): individualise w, then refine. Each leaf (a discrete partition) orders the vertices
 * and so gives a relabelled graph. Each node carries an invariant: the refinement trace hash
 * and the number of cells. The canonical leaf is the one whose (invariant sequence from the
 * root, relabelled adjacency matrix) is lexicographically greatest; since the tree, the traces
 * and the matrices all transform with the graph, this leaf's matrix is a canonical form.
 *
 * Pruning (as in the papers above): a node whose invariant sequence is below the best leaf's
 * and differs from the first leaf's cannot lead to the canonical leaf nor to an automorphism
 * image of the first leaf; a leaf with the same matrix as the first or the best leaf yields an
 * automorphism, after which the current subtree is an automorphic image of one already
 * explored and is abandoned; at nodes on the first path, children in the same orbit (under
 * the automorphisms found so far that fix the path's individualised vertices) as an explored
 * child are skipped. The automorphisms found generate the full group; its order is the
 * product over the first path of the orbit length of the chosen vertex in its target cell.
 *
 * @remarks Worst cases are graphs with huge automorphism groups that refinement cannot split
 * (large disjoint unions of the same strongly regular graph, for example). The search counts
 * tree nodes and throws {@link CanonicalLabellingLimitError} beyond a budget rather than run
 * for hours; graphs produced by a search on up to 64 vertices stay far below it.
 */
import { type Graph } from './graph.js';
import { graphFromRows } from './builders.js';
import { encodeGraph6 } from './graph6.js';
import { PartitionRefiner } from './partition-refinement.js';

/** Default budget of search-tree nodes for one canonical labelling. */
export const DEFAULT_MAX_SEARCH_NODES = 2_000_000;

/** The search tree grew beyond its budget: the graph is too symmetric for this method's pruning. */
export class CanonicalLabellingLimitError extends Error {
  constructor(
    readonly order: number,
    readonly maxNodes: number,
  ) {
    super(
      `canonical labelling of a graph on ${order} vertices gave up after ${maxNodes} search-tree nodes; ` +
        'the graph is too symmetric for this search (raise maxNodes to try longer)',
    );
    this.name = 'CanonicalLabellingLimitError';
  }
}

/** Options of {@link canonicalSearch}. */
export interface CanonicalSearchOptions {
  /** Budget of search-tree nodes before giving up (default {@link DEFAULT_MAX_SEARCH_NODES}). */
  readonly maxNodes?: number;
}

/** Everything the canonical labelling search finds about a graph. */
export interface CanonicalSearchResult {
  /** labelling[v] = the canonical position of vertex v; `relabel(g, labelling)` is the canonical form. */
  readonly labelling: Int32Array;
  /** canonicalOrder[i] = the vertex at canonical position i (the inverse of labelling). */
  readonly canonicalOrder: Int32Array;
  /** Adjacency rows of the canonical form (wordsForOrder(order) words per row). */
  readonly canonicalRows: Uint32Array;
  /** orbits[v] = the least vertex of v's orbit under the automorphism group. */
  readonly orbits: Int32Array;
  /** Automorphisms found (gen[v] = image of v); they generate the automorphism group. */
  readonly generators: Int32Array[];
  /** Order of the automorphism group. */
  readonly groupSize: bigint;
  /** Search-tree nodes visited. */
  readonly nodes: number;
}

/** Per-order working storage, reused between calls (the search is synchronous, so never shared). */
class Workspace {
  readonly refiner: PartitionRefiner;
  readonly labs: Int32Array[] = [];
  readonly cellStarts: Int32Array[] = [];
  readonly cellSizes: Int32Array[] = [];
  readonly cellCounts: Int32Array;
  readonly position: Int32Array;
  readonly leafRows: Uint32Array;
  readonly targets: Int32Array[] = [];

  constructor(
    readonly order: number,
    readonly wordsPerRow: number,
  ) {
    this.refiner = new PartitionRefiner(order, wordsPerRow);
    for (let l = 0; l <= order; l++) {
      this.labs.push(new Int32Array(order));
      this.cellStarts.push(new Int32Array(order));
      this.cellSizes.push(new Int32Array(order));
      this.targets.push(new Int32Array(order));
    }
    this.cellCounts = new Int32Array(order + 1);
    this.position = new Int32Array(order);
    this.leafRows = new Uint32Array(order * wordsPerRow);
  }
}

const workspaces = new Map<number, Workspace>();

function workspaceFor(order: number, wordsPerRow: number): Workspace {
  const key = order * 64 + wordsPerRow;
  let ws = workspaces.get(key);
  if (ws === undefined) {
    ws = new Workspace(order, wordsPerRow);
    // Keep the cache small: orders met in one process are few, but do not grow without bound.
    if (workspaces.size > 64) workspaces.clear();
    workspaces.set(key, ws);
  }
  return ws;
}

/** Union-find root with path halving. */
function findRoot(parent: Int32Array, v: number): number {
  while (parent[v] !== v) {
    parent[v] = parent[parent[v]];
    v = parent[v];
  }
  return v;
}

/** Orbits (as union-find parents whose roots are least elements) of the group generated by `gens`. */
function orbitsOf(order: number, gens: ReadonlyArray<Int32Array>): Int32Array {
  const parent = new Int32Array(order);
  for (let v = 0; v < order; v++) parent[v] = v;
  for (const gen of gens) {
    for (let v = 0; v < order; v++) {
      const a = findRoot(parent, v);
      const b = findRoot(parent, gen[v]);
      if (a < b) parent[b] = a;
      else if (b < a) parent[a] = b;
    }
  }
  for (let v = 0; v < order; v++) parent[v] = findRoot(parent, v);
  return parent;
}

/**
 * Runs the canonical labelling search on a graph given as raw bitset rows (the form the
 * enumerator works on, without building a Graph object per candidate).
 */
export function canonicalSearchRows(
  order: number,
  rows: Uint32Array,
  wordsPerRow: number,
  options: CanonicalSearchOptions = {},
): CanonicalSearchResult {
  const maxNodes = options.maxNodes ?? DEFAULT_MAX_SEARCH_NODES;
  const n = order;
  const wpr = wordsPerRow;
  const ws = workspaceFor(n, wpr);
  const { refiner, labs, cellStarts, cellSizes, cellCounts, position, leafRows, targets } = ws;

  // Invariants along the current path, the first path and the best path: trace and cell count.
  const curTrace = new Int32Array(n + 1);
  const firstTrace = new Int32Array(n + 1);
  const bestTrace = new Int32Array(n + 1);
  const firstCells = new Int32Array(n + 1);
  const bestCells = new Int32Array(n + 1);
  // Vertices individualised along the current, first and best paths.
  const curPath = new Int32Array(n);
  const firstPath = new Int32Array(n);
  const bestPath = new Int32Array(n);
  let firstDepth = -1;
  let bestDepth = -1;
  const firstLab = new Int32Array(n);
  const bestLab = new Int32Array(n);
  const firstRows = new Uint32Array(n * wpr);
  const bestRows = new Uint32Array(n * wpr);
  const generators: Int32Array[] = [];
  // For each level of the first path: orbit length of the first-path vertex in its target cell,
  // under the generators fixing the path above it (computed when that node's loop ends).
  const firstPathOrbitLength = new Float64Array(n + 1).fill(1);
  let nodes = 0;

  /** Fills leafRows with the graph relabelled by the discrete partition at this level. */
  function buildLeafRows(lab: Int32Array): void {
    for (let i = 0; i < n; i++) position[lab[i]] = i;
    leafRows.fill(0);
    for (let i = 0; i < n; i++) {
      const base = lab[i] * wpr;
      const out = i * wpr;
      for (let k = 0; k < wpr; k++) {
        let word = rows[base + k];
        while (word !== 0) {
          const low = word & -word;
          const u = (k << 5) | (31 - Math.clz32(low));
          const p = position[u];
          leafRows[out + (p >>> 5)] |= 1 << (p & 31);
          word ^= low;
        }
      }
    }
  }

  function compareRows(a: Uint32Array, b: Uint32Array): number {
    for (let i = 0; i < a.length; i++) {
      if (a[i] !== b[i]) return a[i] >>> 0 > b[i] >>> 0 ? 1 : -1;
    }
    return 0;
  }

  /** Compares the current invariant sequence up to `level` with the best one. */
  function compareWithBest(level: number): number {
    for (let l = 0; l <= level; l++) {
      const ca = cellCounts[l];
      const cb = bestCells[l];
      if (ca !== cb) return ca > cb ? 1 : -1;
      if (curTrace[l] !== bestTrace[l]) return curTrace[l] >>> 0 > bestTrace[l] >>> 0 ? 1 : -1;
    }
    return 0;
  }

  function equalsFirst(level: number): boolean {
    if (level > firstDepth) return false;
    return cellCounts[level] === firstCells[level] && curTrace[level] === firstTrace[level];
  }

  function recordAutomorphism(fromLab: Int32Array, toLab: Int32Array): void {
    const gen = new Int32Array(n);
    for (let i = 0; i < n; i++) gen[fromLab[i]] = toLab[i];
    generators.push(gen);
  }

  function commonPrefix(path: Int32Array, depth: number, level: number): number {
    let j = 0;
    while (j < level && j < depth && path[j] === curPath[j]) j++;
    return j;
  }

  function becomeBest(level: number, lab: Int32Array): void {
    bestDepth = level;
    for (let l = 0; l <= level; l++) {
      bestTrace[l] = curTrace[l];
      bestCells[l] = cellCounts[l];
    }
    bestPath.set(curPath.subarray(0, level));
    bestLab.set(lab);
    bestRows.set(leafRows);
  }

  /**
   * Explores the node at `level` (its partition saved in labs[level] etc.). Returns the level
   * whose child loop should continue: level - 1 normally, less to abandon a whole subtree.
   */
  function visit(level: number, onFirstPath: boolean, eqFirst: boolean): number {
    if (++nodes > maxNodes) throw new CanonicalLabellingLimitError(n, maxNodes);
    const lab = labs[level];
    if (cellCounts[level] === n) {
      buildLeafRows(lab);
      if (firstDepth < 0) {
        firstDepth = level;
        for (let l = 0; l <= level; l++) {
          firstTrace[l] = curTrace[l];
          firstCells[l] = cellCounts[l];
        }
        firstPath.set(curPath.subarray(0, level));
        firstLab.set(lab);
        firstRows.set(leafRows);
        becomeBest(level, lab);
        return level - 1;
      }
      if (eqFirst && compareRows(leafRows, firstRows) === 0) {
        recordAutomorphism(firstLab, lab);
        return commonPrefix(firstPath, firstDepth, level);
      }
      const cmp = compareWithBest(level);
      if (cmp > 0) {
        becomeBest(level, lab);
      } else if (cmp === 0) {
        const rowCmp = compareRows(leafRows, bestRows);
        if (rowCmp > 0) becomeBest(level, lab);
        else if (rowCmp === 0) {
          recordAutomorphism(bestLab, lab);
          return commonPrefix(bestPath, bestDepth, level);
        }
      }
      return level - 1;
    }

    // Target cell: the first non-singleton cell. Copy its vertices, sorted, before descending.
    const cellSize = cellSizes[level];
    let t = 0;
    while (cellSize[t] === 1) t++;
    const targetSize = cellSize[t];
    const target = targets[level];
    for (let i = 0; i < targetSize; i++) target[i] = lab[t + i];
    target.subarray(0, targetSize).sort();

    let generatorsSeen = -1;
    let stabilizerOrbits: Int32Array | null = null;
    let firstChild = true;
    for (let i = 0; i < targetSize; i++) {
      const w = target[i];
      if (onFirstPath && !firstChild) {
        // Skip w when an automorphism fixing the path above maps an explored child onto it.
        if (generatorsSeen !== generators.length) {
          const fixing = generators.filter((gen) => {
            for (let l = 0; l < level; l++) if (gen[firstPath[l]] !== firstPath[l]) return false;
            return true;
          });
          stabilizerOrbits = orbitsOf(n, fixing);
          generatorsSeen = generators.length;
        }
        if (stabilizerOrbits !== null && stabilizerOrbits[w] !== w) continue;
      }
      refiner.loadFrom(lab, cellStarts[level], cellSizes[level], cellCounts[level]);
      refiner.individualize(w);
      curTrace[level + 1] = refiner.refine(rows, wpr);
      cellCounts[level + 1] = refiner.saveTo(labs[level + 1], cellStarts[level + 1], cellSizes[level + 1]);
      curPath[level] = w;
      const childEqFirst = eqFirst && equalsFirst(level + 1);
      const childOnFirstPath = onFirstPath && firstChild;
      firstChild = false;
      if (!childEqFirst && !childOnFirstPath && compareWithBest(level + 1) < 0) continue;
      const back = visit(level + 1, childOnFirstPath, childEqFirst || childOnFirstPath);
      if (back < level) return back;
    }
    if (onFirstPath) {
      const fixing = generators.filter((gen) => {
        for (let l = 0; l < level; l++) if (gen[firstPath[l]] !== firstPath[l]) return false;
        return true;
      });
      const orbits = orbitsOf(n, fixing);
      const rep = orbits[firstPath[level]];
      let length = 0;
      for (let i = 0; i < targetSize; i++) if (orbits[target[i]] === rep) length++;
      firstPathOrbitLength[level] = length;
    }
    return level - 1;
  }

  if (n === 0) {
    return {
      labelling: new Int32Array(0),
      canonicalOrder: new Int32Array(0),
      canonicalRows: new Uint32Array(0),
      orbits: new Int32Array(0),
      generators: [],
      groupSize: 1n,
      nodes: 0,
    };
  }
  refiner.setUnit();
  curTrace[0] = refiner.refine(rows, wpr);
  cellCounts[0] = refiner.saveTo(labs[0], cellStarts[0], cellSizes[0]);
  visit(0, true, true);

  const labelling = new Int32Array(n);
  for (let i = 0; i < n; i++) labelling[bestLab[i]] = i;
  let groupSize = 1n;
  for (let l = 0; l < firstDepth; l++) groupSize *= BigInt(firstPathOrbitLength[l]);
  return {
    labelling,
    canonicalOrder: bestLab.slice(),
    canonicalRows: bestRows.slice(),
    orbits: orbitsOf(n, generators),
    generators,
    groupSize,
    nodes,
  };
}

/**
 * The canonical labelling search on g: canonical labelling, automorphism generators, orbits
 * and group order.
 *
 * @throws CanonicalLabellingLimitError when the search tree exceeds `options.maxNodes`.
 */
export function canonicalSearch(g: Graph, options: CanonicalSearchOptions = {}): CanonicalSearchResult {
  return canonicalSearchRows(g.order, g.rows, g.wordsPerRow, options);
}

/**
 * The canonical labelling of g: labelling[v] is the position of vertex v in the canonical
 * order, so `relabel(g, canonicalLabelling(g))` equals `canonicalForm(g)`.
 *
 * @example canonicalForm(relabel(g, p)) equals canonicalForm(g) for every permutation p.
 */
export function canonicalLabelling(g: Graph, options: CanonicalSearchOptions = {}): Int32Array {
  return canonicalSearch(g, options).labelling;
}

/** The canonical form of g: the representative of g's isomorphism class that the search picks. */
export function canonicalForm(g: Graph, options: CanonicalSearchOptions = {}): Graph {
  return graphFromRows(g.order, canonicalSearch(g, options).canonicalRows);
}

/** graph6 of the canonical form: equal for two graphs exactly when they are isomorphic. */
export function canonicalGraph6(g: Graph, options: CanonicalSearchOptions = {}): string {
  return encodeGraph6(canonicalForm(g, options));
}
