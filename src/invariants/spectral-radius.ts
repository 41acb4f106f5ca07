/**
 * Spectral radius λ1 of the adjacency matrix, without the full spectrum: power iteration on
 * A + I, stopped by two-sided bounds. For symmetric nonnegative A and positive x, the Rayleigh
 * quotient xᵀAx / xᵀx <= λ1 (Courant–Fischer) and λ1 <= max_i (Ax)_i / x_i (Collatz–Wielandt:
 * L. Collatz, Math. Z. 48 (1942) 221–226; H. Wielandt, Math. Z. 52 (1950) 642–648). Iteration
 * stops when the bounds meet to a relative 1e-14; the shift by I keeps bipartite graphs (where
 * -λ1 is also an eigenvalue) from oscillating.
 *
 * @remarks Converges like (λ2+1)/(λ1+1) per step; when the gap is too small to converge in
 * MAX_STEPS it falls back to the full symmetric eigen-solver, so the result is always accurate.
 * Typically 5-10x faster than the full spectrum at n = 20 (tests/bench/invariants.bench.ts).
 * The value never depends on whether the spectrum was computed before.
 */
import { type Graph } from '../graph/graph.js';
import { graphMatrix } from './spectra.js';
import { symmetricEigenvalues } from './symmetric-eigenvalues.js';

const MAX_STEPS = 400;
const RELATIVE_TOLERANCE = 1e-14;

export function spectralRadius(g: Graph): number {
  const n = g.order;
  if (g.size === 0) return 0;
  // Neighbour lists in CSR form: the iteration runs over them hundreds of times.
  const start = new Int32Array(n + 1);
  for (let v = 0; v < n; v++) start[v + 1] = start[v] + g.degrees[v];
  const adj = new Int32Array(start[n]);
  for (let u = 0, k = 0; u < n; u++) {
    const base = u * g.wordsPerRow;
    for (let w = 0; w < g.wordsPerRow; w++) {
      let word = g.rows[base + w];
      while (word !== 0) {
        const low = word & -word;
        adj[k++] = (w << 5) | (31 - Math.clz32(low));
        word ^= low;
      }
    }
  }
  // Start from the degree vector plus one: positive, and already close for near-regular graphs.
  let x = new Float64Array(n);
  let y = new Float64Array(n);
  for (let v = 0; v < n; v++) x[v] = g.degrees[v] + 1;
  for (let step = 0; step < MAX_STEPS; step++) {
    let xx = 0;
    let xy = 0;
    let upper = 0;
    let scale = 0;
    for (let u = 0; u < n; u++) {
      let s = x[u];
      for (let k = start[u]; k < start[u + 1]; k++) s += x[adj[k]];
      y[u] = s;
      xx += x[u] * x[u];
      xy += x[u] * s;
      const ratio = s / x[u];
      if (ratio > upper) upper = ratio;
      if (s > scale) scale = s;
    }
    const lower = xy / xx;
    if (upper - lower <= RELATIVE_TOLERANCE * upper) return lower - 1;
    for (let u = 0; u < n; u++) y[u] /= scale;
    const t = x;
    x = y;
    y = t;
  }
  return symmetricEigenvalues(graphMatrix(g, 'adjacency'), n)[0];
}
