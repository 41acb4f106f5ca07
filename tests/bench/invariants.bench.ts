/**
 * Invariant throughput on 1000 seeded random graphs G(20, 0.3) (DESIGN.md targets: all invariants
 * <= 2 s, spectral radius alone <= 20 ms), and the eigen-solver choice: refute's Householder + QL
 * (eigenvalues only) against ml-matrix's EigenvalueDecomposition on the same matrices, measured
 * in the same run and printed as a ratio.
 */
import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { InvariantMemo, invariantNames } from '../../src/invariants/registry.js';
import { graphMatrix } from '../../src/invariants/spectra.js';
import { symmetricEigenvalues } from '../../src/invariants/symmetric-eigenvalues.js';
import { randomGraph, seededRng } from '../support/random-graph.js';
import { bestOfMs, row } from './timing.js';

export default async function bench(): Promise<void> {
  const rng = seededRng('bench-invariants');
  const graphs = Array.from({ length: 1000 }, () => randomGraph(20, 0.3, rng));
  const names = invariantNames();

  const all = bestOfMs(3, () => {
    for (const g of graphs) {
      const memo = new InvariantMemo(g);
      for (const name of names) {
        try {
          memo.get(name);
        } catch {
          // Distance spectra of disconnected graphs are undefined; they still count as asked.
        }
      }
    }
  });
  const radius = bestOfMs(5, () => {
    for (const g of graphs) new InvariantMemo(g).get('spectralRadius');
  });
  console.log(`1000 graphs G(20, 0.3), ${names.length} invariants`);
  console.log(
    `  all invariants:       ${all.toFixed(1)} ms  (target <= 2000 ms: ${(2000 / all).toFixed(2)}x headroom)`,
  );
  console.log(
    `  spectralRadius alone: ${radius.toFixed(1)} ms  (target <= 20 ms: ${(20 / radius).toFixed(2)}x headroom)`,
  );

  // Per-invariant cost, each from a fresh memo but with its dependencies' cost included.
  console.log('\n  per invariant (ms per 1000 graphs, dependencies included)');
  const costs = names.map((name) => {
    const ms = bestOfMs(2, () => {
      for (const g of graphs) {
        try {
          new InvariantMemo(g).get(name);
        } catch {
          // As above.
        }
      }
    });
    return [name, ms] as const;
  });
  for (const [name, ms] of costs.sort((a, b) => b[1] - a[1]))
    console.log(`  ${name.padEnd(34)} ${ms.toFixed(2).padStart(9)}`);

  // Eigen-solver choice, on the adjacency matrices of the same graphs.
  const matrices = graphs.map((g) => graphMatrix(g, 'adjacency'));
  const ours = bestOfMs(5, () => {
    for (const a of matrices) symmetricEigenvalues(a, 20);
  });
  const ml = bestOfMs(3, () => {
    for (const a of matrices) {
      const m = new Matrix(20, 20);
      for (let i = 0; i < 20; i++) for (let j = 0; j < 20; j++) m.set(i, j, a[i * 20 + j]);
      new EigenvalueDecomposition(m, { assumeSymmetric: true }).realEigenvalues.sort((x, y) => y - x);
    }
  });
  console.log('\n  eigenvalues of 1000 adjacency matrices, n = 20');
  console.log(row(['solver', 'ms', 'ratio'], [34, 9, 7]));
  console.log(row(['Householder + QL (refute)', ours.toFixed(1), '1.00'], [34, 9, 7]));
  console.log(row(['ml-matrix EigenvalueDecomposition', ml.toFixed(1), (ml / ours).toFixed(2)], [34, 9, 7]));
  for (const n of [50, 100, 200]) {
    const g = randomGraph(n, 0.3, rng);
    const a = graphMatrix(g, 'adjacency');
    const t1 = bestOfMs(3, () => symmetricEigenvalues(a, n));
    const t2 = bestOfMs(3, () => {
      const m = new Matrix(n, n);
      for (let i = 0; i < n; i++) for (let j = 0; j < n; j++) m.set(i, j, a[i * n + j]);
      void new EigenvalueDecomposition(m, { assumeSymmetric: true }).realEigenvalues;
    });
    console.log(
      `  n = ${n}: refute ${t1.toFixed(2)} ms, ml-matrix ${t2.toFixed(2)} ms (ratio ${(t2 / t1).toFixed(2)})`,
    );
  }
}
