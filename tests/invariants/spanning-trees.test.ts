import { describe, expect, test } from 'vitest';
import { fromEdges } from '../../src/graph/builders.js';
import {
  complete,
  completeBipartite,
  cycle,
  emptyGraph,
  hypercube,
  path,
  petersen,
  star,
} from '../../src/graph/families.js';
import {
  spanningTreeCount,
  spanningTreeCountBareiss,
  spanningTreeCountModular,
} from '../../src/invariants/spanning-trees.js';
import { atlasEntries } from './atlas.js';
import { bruteSpanningTreeCount } from './brute-force.js';
import { randomGraphs } from './random-graphs.js';

const methods = [
  ['Bareiss', spanningTreeCountBareiss],
  ['modular', spanningTreeCountModular],
] as const;

describe.each(methods)('spanningTreeCount%s()', (_name, count) => {
  test("Cayley's formula τ(K_n) = n^(n−2) up to n = 40, far beyond 2^53 (Cayley 1889)", () => {
    for (let n = 1; n <= 40; n++) expect(count(complete(n))).toBe(n === 1 ? 1n : BigInt(n) ** BigInt(n - 2));
  });

  test('τ(K_{a,b}) = a^(b−1) b^(a−1) (Scoins 1962)', () => {
    for (let a = 1; a <= 9; a++) {
      for (let b = 1; b <= 9; b++)
        expect(count(completeBipartite(a, b))).toBe(BigInt(a) ** BigInt(b - 1) * BigInt(b) ** BigInt(a - 1));
    }
  });

  test('τ(C_n) = n, trees 1, disconnected 0', () => {
    for (let n = 3; n <= 30; n++) expect(count(cycle(n))).toBe(BigInt(n));
    expect(count(path(9))).toBe(1n);
    expect(count(star(9))).toBe(1n);
    expect(count(emptyGraph(3))).toBe(0n);
    expect(
      count(
        fromEdges(4, [
          [0, 1],
          [2, 3],
        ]),
      ),
    ).toBe(0n);
  });

  test('τ(Q_d) = 2^(2^d − d − 1) ∏ k^C(d,k): Q_3 = 384, up to Q_6 (hypercube formula, common practice)', () => {
    const binom = (n: number, k: number): number => (k === 0 ? 1 : (binom(n, k - 1) * (n - k + 1)) / k);
    for (let d = 1; d <= 6; d++) {
      let expected = 2n ** BigInt(2 ** d - d - 1);
      for (let k = 1; k <= d; k++) expected *= BigInt(k) ** BigInt(binom(d, k));
      expect(count(hypercube(d))).toBe(expected);
    }
    expect(count(hypercube(3))).toBe(384n);
  });

  test('τ(Petersen) = 2000 (from memory; also by the matrix-tree theorem on its spectrum 3, 1^5, (−2)^4)', () => {
    // Kirchhoff via eigenvalues: τ = (1/n) ∏ μ_i over the non-zero Laplacian eigenvalues 2^5 · 5^4.
    expect(count(petersen())).toBe(BigInt((2 ** 5 * 5 ** 4) / 10));
  });

  test('matches numpy (determinant of the reduced Laplacian) on every graph with at most 7 vertices', () => {
    for (const { graph, ref } of atlasEntries())
      expect(count(graph), ref.graph6).toBe(BigInt(ref.spanningTreeCount));
  });

  test('matches enumeration of all (n−1)-edge subsets on seeded random graphs of 5..8 vertices', () => {
    for (const g of randomGraphs('trees-brute', 30, 5, 8, [0.3, 0.5, 0.7]))
      expect(count(g)).toBe(BigInt(bruteSpanningTreeCount(g)));
  });
});

describe('spanningTreeCount()', () => {
  test('the two exact methods agree on seeded random graphs of 10..60 vertices', () => {
    for (const g of randomGraphs('trees-cross', 40, 10, 60, [0.1, 0.3, 0.5, 0.9])) {
      expect(spanningTreeCountModular(g)).toBe(spanningTreeCountBareiss(g));
    }
  });

  test('is a number below 2^53 and a bigint from there on', () => {
    expect(spanningTreeCount(complete(14))).toBe(14 ** 12); // 5.7e13 < 2^53
    expect(spanningTreeCount(complete(16))).toBe(16n ** 14n); // 7.2e16 > 2^53
  });
});
