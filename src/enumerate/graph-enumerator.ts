/**
 * Isomorph-free exhaustive generation of all graphs of a given order, one per isomorphism
 * class, in a fixed order and constant memory.
 *
 * Method: canonical construction path, adding one vertex at a time.
 * @see B. D. McKay, "Isomorph-free exhaustive generation", J. Algorithms 26 (1998) 306–324.
 *
 * A graph H on m vertices has a canonical parent: H minus its canonical last vertex m(H), the
 * vertex that the canonical labelling of canonical.ts puts at position m-1. (Its first
 * refinement of the unit partition sorts vertices by increasing degree and cells only split in
 * place, so m(H) always has maximum degree.) A child H = G + v of a
 * graph G on m-1 vertices, made by joining a new vertex v to a subset S of G's vertices, is
 * accepted exactly when v lies in the automorphism-group orbit of m(H), that is, when G is
 * H's canonical parent up to isomorphism. Then every isomorphism class on m vertices is
 * accepted from exactly one class on m-1 vertices; two subsets give isomorphic accepted
 * children of the same G only when an automorphism of G maps one onto the other. So children
 * of a G with a trivial group need no further check; for a G with a group of at most
 * {@link MAX_LISTED_GROUP} elements, only subsets that are the least (as bit masks) of their
 * orbit under the group are tried; for a larger group, accepted children are deduplicated by
 * canonical form among the siblings (at most 2^(m-1) of them in memory).
 *
 * The acceptance test is done in increasing cost: the new vertex must have maximum degree
 * (else reject); if it is the only such vertex, accept; else it must lie in the last cell of
 * the equitable refinement of the unit partition, and if that cell is {v}, accept; only then
 * run the full search for the orbits.
 *
 * Splitting into parts (`part`): the graphs of order max(1, n - 2) are dealt out round-robin in
 * generation order, so part i of k generates the descendants of every k-th of them. The parts
 * partition the output; their union, in part order, is not the order of the whole stream.
 */
import { type Graph } from '../graph/graph.js';
import { graphFromRows } from '../graph/builders.js';
import { canonicalSearchRows, type CanonicalSearchResult } from '../graph/canonical.js';
import { PartitionRefiner } from '../graph/partition-refinement.js';

/**
 * Largest order generate accepts: graphs are one 32-bit word per row and subsets 16-bit masks;
 * order 16 already has about 6.4e22 classes (OEIS A000088, from memory), far beyond any run.
 */
export const MAX_ENUMERATION_ORDER = 16;

/** Largest automorphism group of a parent whose elements are listed to test subset orbits. */
export const MAX_LISTED_GROUP = 2048;

/** Which share of the stream to produce: part `index` (0-based) of `count`. */
export interface EnumerationPart {
  readonly index: number;
  readonly count: number;
}

/** Options of {@link GraphEnumerator}. */
export interface EnumerationOptions {
  /** Only connected graphs. */
  readonly connected?: boolean;
  /** Produce only this part of the stream. */
  readonly part?: EnumerationPart;
}

/** Counters kept while generating, for progress and benchmarks. */
export interface EnumerationStats {
  /** Candidate children considered (subsets tried). */
  candidates: number;
  /** Candidates that needed the full canonical search for the acceptance test. */
  fullSearches: number;
  /** Canonical searches run to deduplicate siblings (parents with groups over MAX_LISTED_GROUP). */
  dedupSearches: number;
}

function popcount(x: number): number {
  x = x - ((x >>> 1) & 0x55555555);
  x = (x & 0x33333333) + ((x >>> 2) & 0x33333333);
  return (Math.imul((x + (x >>> 4)) & 0x0f0f0f0f, 0x01010101) >>> 24) | 0;
}

/** Whether the graph on `order` vertices with single-word rows is connected (n <= 1 is). */
function rowsConnected(order: number, rows: Uint32Array): boolean {
  if (order <= 1) return true;
  const all = order === 32 ? 0xffffffff : (1 << order) - 1;
  let seen = 1;
  let frontier = 1;
  while (frontier !== 0) {
    let next = 0;
    let f = frontier;
    while (f !== 0) {
      const low = f & -f;
      next |= rows[31 - Math.clz32(low)];
      f ^= low;
    }
    frontier = next & ~seen;
    seen |= frontier;
  }
  return (seen & all) >>> 0 === all >>> 0;
}

/** Key identifying a canonical form on <= 16 vertices (rows fit in 16 bits). */
function canonicalKey(result: CanonicalSearchResult): string {
  return String.fromCharCode(...result.canonicalRows);
}

/**
 * Pull-style generator of all graphs of an order up to isomorphism. Call {@link next} until it
 * returns false; after each true, {@link rows} holds the current graph (row v is the word
 * rows[v]; valid until the next call).
 *
 * @example
 *   const e = new GraphEnumerator(4); let k = 0; while (e.next()) k++;  // k === 11 (OEIS A000088)
 */
export class GraphEnumerator {
  readonly order: number;
  readonly connected: boolean;
  readonly part: EnumerationPart;
  /** Order whose graphs are dealt out to the parts. */
  readonly splitOrder: number;
  readonly stats: EnumerationStats = { candidates: 0, fullSearches: 0, dedupSearches: 0 };

  private readonly levelRows: Uint32Array[] = [];
  private readonly levelDegrees: Int32Array[] = [];
  private readonly maxDegree: Int32Array;
  private readonly nextMask: Float64Array;
  private readonly siblings: Array<Set<string> | null> = [];
  /**
   * Per level, for each non-identity automorphism of the parent, the images of subset masks:
   * entries [512 e, 512 e + 256) map the low byte, [512 e + 256, 512 e + 512) the high byte.
   */
  private readonly subsetImages: Array<Uint16Array | null> = [];
  private readonly refiners: PartitionRefiner[] = [];
  private top: number;
  private splitCounter = 0;
  private done = false;

  constructor(order: number, options: EnumerationOptions = {}) {
    if (!Number.isInteger(order) || order < 1 || order > MAX_ENUMERATION_ORDER) {
      throw new RangeError(`Expected an order in 1..${MAX_ENUMERATION_ORDER} but found ${order}`);
    }
    const part = options.part ?? { index: 0, count: 1 };
    if (
      !Number.isInteger(part.count) ||
      part.count < 1 ||
      !Number.isInteger(part.index) ||
      part.index < 0 ||
      part.index >= part.count
    ) {
      throw new RangeError(`Expected a part index in 0..count-1 but found ${part.index} of ${part.count}`);
    }
    this.order = order;
    this.connected = options.connected === true;
    this.part = part;
    this.splitOrder = Math.max(1, order - 2);
    for (let m = 0; m <= order; m++) {
      this.levelRows.push(new Uint32Array(order));
      this.levelDegrees.push(new Int32Array(order));
      this.siblings.push(null);
      this.subsetImages.push(null);
      this.refiners.push(new PartitionRefiner(m, 1));
    }
    this.maxDegree = new Int32Array(order + 1);
    this.nextMask = new Float64Array(order + 1);
    // Start from the single-vertex graph, which is dealt to part 0 if order 1 is the split order.
    this.top = 1;
    if (this.splitOrder === 1) {
      this.splitCounter = 1;
      if (part.index !== 0) this.done = true;
    }
    this.firstPending = true;
  }

  private firstPending: boolean;

  /** Rows of the current graph (order words). */
  get rows(): Uint32Array {
    return this.levelRows[this.order];
  }

  /** A copy of the current graph as a {@link Graph}. */
  currentGraph(): Graph {
    return graphFromRows(this.order, this.levelRows[this.order].slice());
  }

  /** Advances to the next graph of the stream; false when the stream is over. */
  next(): boolean {
    if (this.done) return false;
    const n = this.order;
    if (this.firstPending) {
      this.firstPending = false;
      if (n === 1) {
        this.top = 1;
        return true;
      }
      this.prepareParent(1, null);
    }
    for (;;) {
      const k = this.top;
      if (k === n) {
        this.top = n - 1;
        continue;
      }
      if (k === 0 || (k === 1 && n === 1)) {
        this.done = true;
        return false;
      }
      const mask = this.nextMask[k];
      if (mask >= 2 ** k) {
        this.siblings[k] = null;
        this.top = k - 1;
        continue;
      }
      this.nextMask[k] = mask + 1;
      const m = k + 1;
      const result = this.tryChild(k, mask);
      if (result === false) continue;
      if (m === this.splitOrder) {
        const index = this.splitCounter++ % this.part.count;
        if (index !== this.part.index) continue;
      }
      if (m === n) {
        if (this.connected && !rowsConnected(n, this.levelRows[n])) continue;
        this.top = n;
        return true;
      }
      this.prepareParent(m, result === true ? null : result);
      this.top = m;
    }
  }

  /**
   * Builds the child of the level-k graph joined to subset `mask` into level k+1 and tests it.
   * Returns false if rejected or a duplicate sibling, otherwise the canonical search result if
   * one was computed, or true.
   */
  private tryChild(k: number, mask: number): boolean | CanonicalSearchResult {
    this.stats.candidates++;
    const d = popcount(mask);
    if (d < this.maxDegree[k]) return false;
    const parentDegrees = this.levelDegrees[k];
    let maxOthers = 0;
    for (let u = 0; u < k; u++) {
      const du = parentDegrees[u] + ((mask >>> u) & 1);
      if (du > maxOthers) maxOthers = du;
    }
    if (d < maxOthers) return false;
    const images = this.subsetImages[k];
    if (images !== null) {
      // Try S only if no automorphism of the parent maps it to a smaller mask.
      const lo = mask & 255;
      const hi = (mask >>> 8) + 256;
      for (let e = 0; e < images.length; e += 512) if ((images[e + lo] | images[e + hi]) < mask) return false;
    }
    const m = k + 1;
    const parentRows = this.levelRows[k];
    const childRows = this.levelRows[m];
    const childDegrees = this.levelDegrees[m];
    for (let u = 0; u < k; u++) {
      const bit = (mask >>> u) & 1;
      childRows[u] = parentRows[u] | (bit << k);
      childDegrees[u] = parentDegrees[u] + bit;
    }
    childRows[k] = mask;
    childDegrees[k] = d;
    const siblings = this.siblings[k];
    let search: CanonicalSearchResult | null = null;
    if (d === maxOthers) {
      const refiner = this.refiners[m];
      refiner.setUnit();
      refiner.refine(childRows, 1);
      const lastStart = refiner.cellStart[m - 1];
      let inLast = false;
      for (let p = lastStart; p < m; p++) if (refiner.lab[p] === k) inLast = true;
      if (!inLast) return false;
      if (lastStart !== m - 1) {
        this.stats.fullSearches++;
        search = canonicalSearchRows(m, childRows, 1);
        if (search.orbits[k] !== search.orbits[search.canonicalOrder[m - 1]]) return false;
      }
    }
    if (siblings !== null) {
      if (search === null) {
        this.stats.dedupSearches++;
        search = canonicalSearchRows(m, childRows, 1);
      }
      const key = canonicalKey(search);
      if (siblings.has(key)) return false;
      siblings.add(key);
    }
    return search ?? true;
  }

  /**
   * Sets up the level-m graph (just built) as a parent: its maximum degree, and how its
   * children are kept apart under its automorphism group (see the module comment).
   */
  private prepareParent(m: number, search: CanonicalSearchResult | null): void {
    const rows = this.levelRows[m];
    const degrees = this.levelDegrees[m];
    let maxDegree = 0;
    for (let u = 0; u < m; u++) if (degrees[u] > maxDegree) maxDegree = degrees[u];
    this.maxDegree[m] = maxDegree;
    this.nextMask[m] = 0;
    this.siblings[m] = null;
    this.subsetImages[m] = null;
    if (search === null) {
      const refiner = this.refiners[m];
      refiner.setUnit();
      refiner.refine(rows, 1);
      if (refiner.cells === m) return; // discrete equitable partition: trivial group
      search = canonicalSearchRows(m, rows, 1);
    }
    if (search.generators.length === 0) return;
    if (search.groupSize <= BigInt(MAX_LISTED_GROUP))
      this.subsetImages[m] = subsetImageTables(m, search.generators);
    else this.siblings[m] = new Set<string>();
  }
}

/** Every element of the permutation group generated by `generators` (on 0..m-1), by closure. */
function groupElements(m: number, generators: ReadonlyArray<Int32Array>): Int32Array[] {
  const identity = Int32Array.from({ length: m }, (_, i) => i);
  const elements: Int32Array[] = [identity];
  // Key: the permutation as a string of char codes (m <= 16), much cheaper than join(',').
  const seen = new Set<string>([String.fromCharCode(...identity)]);
  for (let i = 0; i < elements.length; i++) {
    const element = elements[i];
    for (const gen of generators) {
      const product = new Int32Array(m);
      for (let v = 0; v < m; v++) product[v] = gen[element[v]];
      const key = String.fromCharCode(...product);
      if (!seen.has(key)) {
        seen.add(key);
        elements.push(product);
      }
    }
  }
  return elements;
}

/** Byte-wise subset image tables (layout of GraphEnumerator.subsetImages) for the non-identity elements. */
function subsetImageTables(m: number, generators: ReadonlyArray<Int32Array>): Uint16Array {
  const elements = groupElements(m, generators).slice(1);
  const tables = new Uint16Array(elements.length * 512);
  elements.forEach((perm, e) => {
    for (let byte = 0; byte < 256; byte++) {
      let low = 0;
      let high = 0;
      for (let b = 0; b < 8; b++) {
        if ((byte >>> b) & 1) {
          if (b < m) low |= 1 << perm[b];
          if (b + 8 < m) high |= 1 << perm[b + 8];
        }
      }
      tables[e * 512 + byte] = low;
      tables[e * 512 + 256 + byte] = high;
    }
  });
  return tables;
}
