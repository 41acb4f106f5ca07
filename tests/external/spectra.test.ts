/**
 * Spectra of standard families against closed forms from the standard tables:
 * D. Cvetković, P. Rowlinson, S. Simić, "An Introduction to the Theory of Graph Spectra",
 * CUP 2010, §1.1 and §7.1 (K_n, C_n, P_n, K_{a,b}, Q_d, Petersen; Laplacians via L = rI - A for
 * r-regular graphs); A. E. Brouwer and W. H. Haemers, "Spectra of Graphs", Springer 2012, §1.4.
 */
import { describe, test } from 'vitest';
import { computeInvariant } from '../../src/invariants/registry.js';
import * as F from '../../src/graph/families.js';
import { descending, expectAllClose, expectClose } from '../support/assert-close.js';
import { type Graph } from '../../src/graph/graph.js';

const spectrum = (g: Graph, name = 'adjacencySpectrum') => computeInvariant(g, name) as number[];
const range = (a: number, b: number) => Array.from({ length: b - a + 1 }, (_, i) => a + i);

describe('adjacency spectra of families', () => {
  test('adjacencySpectrum(K_n) is n-1 once and -1 n-1 times', () => {
    for (const n of [1, 2, 5, 12, 40])
      expectAllClose(spectrum(F.complete(n)), [n - 1, ...new Array(n - 1).fill(-1)], 1e-10);
  });
  test('adjacencySpectrum(C_n) is 2cos(2πk/n), k = 0..n-1', () => {
    for (const n of [3, 4, 7, 10, 33]) {
      expectAllClose(
        spectrum(F.cycle(n)),
        descending(range(0, n - 1).map((k) => 2 * Math.cos((2 * Math.PI * k) / n))),
        1e-10,
      );
    }
  });
  test('adjacencySpectrum(P_n) is 2cos(πk/(n+1)), k = 1..n', () => {
    for (const n of [1, 2, 6, 19, 50]) {
      expectAllClose(
        spectrum(F.path(n)),
        descending(range(1, n).map((k) => 2 * Math.cos((Math.PI * k) / (n + 1)))),
        1e-10,
      );
    }
  });
  test('adjacencySpectrum(K_{a,b}) is ±sqrt(ab) and 0 (a+b-2 times)', () => {
    for (const [a, b] of [
      [1, 1],
      [2, 3],
      [4, 4],
      [3, 9],
    ]) {
      const r = Math.sqrt(a * b);
      expectAllClose(spectrum(F.completeBipartite(a, b)), [r, ...new Array(a + b - 2).fill(0), -r], 1e-10);
    }
  });
  test('adjacencySpectrum(Q_d) is d - 2i with multiplicity C(d, i)', () => {
    for (const d of [1, 3, 5]) {
      const expected: number[] = [];
      let binom = 1;
      for (let i = 0; i <= d; i++) {
        for (let k = 0; k < binom; k++) expected.push(d - 2 * i);
        binom = (binom * (d - i)) / (i + 1);
      }
      expectAllClose(spectrum(F.hypercube(d)), expected, 1e-10);
    }
  });
  test('adjacencySpectrum(Petersen) is 3, 1 five times, -2 four times', () => {
    expectAllClose(spectrum(F.petersen()), [3, 1, 1, 1, 1, 1, -2, -2, -2, -2], 1e-10);
  });
  test('energy(Petersen) = 3 + 5 + 8 = 16 and estradaIndex = e^3 + 5e + 4e^-2', () => {
    expectClose(computeInvariant(F.petersen(), 'energy') as number, 16, 1e-10);
    expectClose(
      computeInvariant(F.petersen(), 'estradaIndex') as number,
      Math.exp(3) + 5 * Math.E + 4 * Math.exp(-2),
      1e-9,
    );
  });
});

describe('Laplacian-type spectra', () => {
  test('laplacianSpectrum(K_n) is n (n-1 times) and 0', () => {
    for (const n of [1, 2, 6, 25])
      expectAllClose(spectrum(F.complete(n), 'laplacianSpectrum'), [...new Array(n - 1).fill(n), 0], 1e-10);
  });
  test('laplacianSpectrum(C_n) is 2 - 2cos(2πk/n)', () => {
    const n = 9;
    expectAllClose(
      spectrum(F.cycle(n), 'laplacianSpectrum'),
      descending(range(0, n - 1).map((k) => 2 - 2 * Math.cos((2 * Math.PI * k) / n))),
      1e-10,
    );
  });
  test('algebraicConnectivity(P_n) = 2 - 2cos(π/n)', () => {
    for (const n of [2, 5, 30])
      expectClose(
        computeInvariant(F.path(n), 'algebraicConnectivity') as number,
        2 - 2 * Math.cos(Math.PI / n),
        1e-10,
      );
  });
  test('algebraicConnectivity is exactly 0 on a disconnected graph', () => {
    expectClose(computeInvariant(F.emptyGraph(3), 'algebraicConnectivity') as number, 0, 0);
  });
  test('signlessLaplacianSpectrum(Petersen) is 3 + λ: 6, 4 five times, 1 four times', () => {
    expectAllClose(
      spectrum(F.petersen(), 'signlessLaplacianSpectrum'),
      [6, 4, 4, 4, 4, 4, 1, 1, 1, 1],
      1e-10,
    );
  });
  test('normalizedLaplacianSpectrum(K_{a,b}) is 2, 1 (a+b-2 times), 0', () => {
    expectAllClose(
      spectrum(F.completeBipartite(3, 5), 'normalizedLaplacianSpectrum'),
      [2, 1, 1, 1, 1, 1, 1, 0],
      1e-10,
    );
  });
});
