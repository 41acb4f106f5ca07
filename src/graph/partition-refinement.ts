/**
 * Equitable refinement of ordered vertex partitions, the workhorse of canonical labelling.
 *
 * An ordered partition of the vertices is equitable when, for any two cells X and W, every
 * vertex of X has the same number of neighbours in W. Starting from any ordered partition, the
 * procedure below splits cells by neighbour counts into a splitting cell until no split is
 * possible, which yields the coarsest equitable ordered partition finer than the start.
 *
 * @see B. D. McKay, "Practical graph isomorphism", Congressus Numerantium 30 (1981) 45–87:
 * the refinement procedure (Algorithm 2.5), including the rule that when a cell that is not
 * waiting to be used as a splitter breaks into fragments, all fragments but one largest need
 * to be queued (the idea of J. E. Hopcroft's partition refinement, 1971).
 *
 * @remarks Every decision depends only on cell positions and neighbour counts, never on vertex
 * names, so refining the image of a partition under an isomorphism gives the image of the
 * refined partition, and the same trace value. That is what makes the trace usable as a node
 * invariant in the search tree of canonical.ts. Cells split in place: a fragment sorted by
 * increasing count takes the positions of the cell it came from, so the order of cells is
 * preserved (the first refinement of the unit partition sorts vertices by increasing degree).
 */

/** Mixes a value into a 32-bit trace hash (FNV-1a style multiply-xor). */
function mix(h: number, x: number): number {
  return Math.imul(h ^ x, 0x01000193) >>> 0;
}

/**
 * An ordered partition of 0..order-1 with the working storage to refine it. The partition is
 * `lab` (the vertex at each position), `cellStart` (for each position, where its cell starts)
 * and `cellSize` (indexed by a cell's start position: the size of that cell).
 */
export class PartitionRefiner {
  readonly order: number;
  readonly lab: Int32Array;
  readonly cellStart: Int32Array;
  readonly cellSize: Int32Array;
  /** Number of cells of the partition. */
  cells = 0;

  private readonly queue: Int32Array;
  private queueHead = 0;
  private queueLength = 0;
  private readonly inQueue: Uint8Array;
  private readonly counts: Int32Array;
  private readonly splitter: Uint32Array;
  private readonly scratchVertex: Int32Array;
  private readonly scratchCount: Int32Array;

  constructor(order: number, wordsPerRow: number) {
    this.order = order;
    this.lab = new Int32Array(order);
    this.cellStart = new Int32Array(order);
    this.cellSize = new Int32Array(order);
    this.queue = new Int32Array(Math.max(1, order));
    this.inQueue = new Uint8Array(order);
    this.counts = new Int32Array(order);
    this.splitter = new Uint32Array(wordsPerRow);
    this.scratchVertex = new Int32Array(order);
    this.scratchCount = new Int32Array(order);
  }

  /** Resets to the unit partition (one cell holding every vertex, in increasing order), queued as splitter. */
  setUnit(): void {
    const n = this.order;
    for (let i = 0; i < n; i++) {
      this.lab[i] = i;
      this.cellStart[i] = 0;
      this.cellSize[i] = 0;
      this.inQueue[i] = 0;
    }
    this.queueHead = 0;
    this.queueLength = 0;
    this.cells = n > 0 ? 1 : 0;
    if (n > 0) {
      this.cellSize[0] = n;
      this.push(0);
    }
  }

  /** Copies the partition (not the queue, which is empty between refinements) into the given arrays. */
  saveTo(lab: Int32Array, cellStart: Int32Array, cellSize: Int32Array): number {
    lab.set(this.lab);
    cellStart.set(this.cellStart);
    cellSize.set(this.cellSize);
    return this.cells;
  }

  /** Restores a partition saved by {@link saveTo}. */
  loadFrom(lab: Int32Array, cellStart: Int32Array, cellSize: Int32Array, cells: number): void {
    this.lab.set(lab);
    this.cellStart.set(cellStart);
    this.cellSize.set(cellSize);
    this.cells = cells;
  }

  private push(start: number): void {
    if (this.inQueue[start]) return;
    this.inQueue[start] = 1;
    this.queue[(this.queueHead + this.queueLength) % this.queue.length] = start;
    this.queueLength++;
  }

  /**
   * Makes vertex v a singleton cell at the front of its cell (v must lie in a cell of size
   * at least 2) and queues it as a splitter; call {@link refine} next.
   */
  individualize(v: number): void {
    const { lab, cellStart, cellSize } = this;
    let p = 0;
    while (lab[p] !== v) p++;
    const s = cellStart[p];
    const size = cellSize[s];
    lab[p] = lab[s];
    lab[s] = v;
    cellSize[s] = 1;
    cellSize[s + 1] = size - 1;
    for (let i = s + 1; i < s + size; i++) cellStart[i] = s + 1;
    this.cells++;
    this.push(s);
  }

  /**
   * Refines the partition to the coarsest equitable one finer than it, using the queued
   * splitters. Returns a trace hash of the splits performed, which is invariant under
   * relabelling the graph together with the partition.
   */
  refine(rows: Uint32Array, wordsPerRow: number): number {
    const n = this.order;
    const { lab, cellSize, counts, splitter, inQueue, queue } = this;
    let trace = 0x811c9dc5;
    while (this.queueLength > 0 && this.cells < n) {
      const w = queue[this.queueHead];
      this.queueHead = (this.queueHead + 1) % queue.length;
      this.queueLength--;
      inQueue[w] = 0;
      splitter.fill(0);
      const wEnd = w + cellSize[w];
      for (let i = w; i < wEnd; i++) {
        const v = lab[i];
        splitter[v >>> 5] |= 1 << (v & 31);
      }
      trace = mix(trace, w);
      let s = 0;
      while (s < n) {
        const size = cellSize[s];
        if (size > 1) {
          const end = s + size;
          let first = -1;
          let varies = false;
          for (let i = s; i < end; i++) {
            const x = lab[i];
            const base = x * wordsPerRow;
            let c = 0;
            for (let k = 0; k < wordsPerRow; k++) {
              let y = rows[base + k] & splitter[k];
              // Popcount inline: this is the innermost loop of the whole search.
              y = y - ((y >>> 1) & 0x55555555);
              y = (y & 0x33333333) + ((y >>> 2) & 0x33333333);
              c += (Math.imul((y + (y >>> 4)) & 0x0f0f0f0f, 0x01010101) >>> 24) | 0;
            }
            counts[x] = c;
            if (first < 0) first = c;
            else if (c !== first) varies = true;
          }
          if (varies) trace = this.splitCell(s, size, trace);
        }
        s += size;
      }
    }
    // Empty the queue (refinement may stop early once the partition is discrete).
    while (this.queueLength > 0) {
      inQueue[queue[this.queueHead]] = 0;
      this.queueHead = (this.queueHead + 1) % queue.length;
      this.queueLength--;
    }
    return mix(trace, this.cells);
  }

  /** Splits the cell at s by increasing neighbour count (counts already filled), queueing fragments. */
  private splitCell(s: number, size: number, trace: number): number {
    const { lab, cellStart, cellSize, counts, scratchVertex: vs, scratchCount: cs } = this;
    // Insertion sort of the cell's vertices by count; cells are small in the graphs we meet.
    for (let i = 0; i < size; i++) {
      const v = lab[s + i];
      const c = counts[v];
      let j = i - 1;
      while (j >= 0 && cs[j] > c) {
        cs[j + 1] = cs[j];
        vs[j + 1] = vs[j];
        j--;
      }
      cs[j + 1] = c;
      vs[j + 1] = v;
    }
    const wasQueued = this.inQueue[s] === 1;
    let largestStart = s;
    let largestSize = 0;
    let fragStart = s;
    for (let i = 0; i < size; i++) {
      lab[s + i] = vs[i];
      if (i === size - 1 || cs[i + 1] !== cs[i]) {
        const fragEnd = s + i + 1;
        const fragSize = fragEnd - fragStart;
        cellSize[fragStart] = fragSize;
        for (let p = fragStart; p < fragEnd; p++) cellStart[p] = fragStart;
        trace = mix(mix(trace, cs[i]), fragSize);
        if (fragSize > largestSize) {
          largestSize = fragSize;
          largestStart = fragStart;
        }
        if (fragStart !== s) this.cells++;
        fragStart = fragEnd;
      }
    }
    // Queue fragments: all of them if the cell was waiting anyway (its start stays queued),
    // otherwise all but the first largest one.
    for (let p = s; p < s + size; p += cellSize[p]) {
      if (wasQueued ? p !== s : p !== largestStart) this.push(p);
    }
    return trace;
  }
}
