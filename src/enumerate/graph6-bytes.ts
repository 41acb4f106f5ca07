/**
 * graph6 written straight into a byte buffer from single-word bitset rows, for the streams of
 * `generate` and `sweep` where building a string per graph would dominate the cost.
 *
 * Same encoding as src/graph/graph6.ts (B. D. McKay, "Description of graph6, sparse6 and
 * digraph6 encodings"): N(n) = n + 63 for n <= 62, then the upper triangle column by column
 * (x(0,1), x(0,2), x(1,2), x(0,3), ...) in big-endian groups of six bits, each plus 63.
 */

/** Bytes of the graph6 line (with its newline) of a graph of this order, order <= 32. */
export function graph6LineLength(order: number): number {
  return 2 + Math.ceil((order * (order - 1)) / 12);
}

/**
 * Writes the graph6 line (with a trailing newline) of the graph of `order` <= 32 vertices whose
 * row v is the word rows[v], into out at offset; returns the offset after the newline.
 */
export function writeGraph6Line(order: number, rows: Uint32Array, out: Uint8Array, offset: number): number {
  out[offset++] = order + 63;
  let acc = 0;
  let bits = 0;
  for (let j = 1; j < order; j++) {
    const row = rows[j];
    for (let i = 0; i < j; i++) {
      acc = (acc << 1) | ((row >>> i) & 1);
      if (++bits === 6) {
        out[offset++] = acc + 63;
        acc = 0;
        bits = 0;
      }
    }
  }
  if (bits > 0) out[offset++] = (acc << (6 - bits)) + 63;
  out[offset++] = 10;
  return offset;
}
