import { UndirectedGraph } from 'graphology';
import { singleSourceLength } from 'graphology-shortest-path/unweighted.js';
import { describe, expect, test } from 'vitest';
import { InvariantDomainError } from '../../src/errors.js';
import { fromEdges } from '../../src/graph/builders.js';
import { type Graph as CompactGraph, edgeList } from '../../src/graph/graph.js';
import { complete, completeBipartite, emptyGraph, path, petersen, star } from '../../src/graph/families.js';
import {
  distanceLaplacianSpectrum,
  distanceSpectralRadius,
  distanceSpectrum,
} from '../../src/invariants/distance-spectra.js';
import { computeInvariant, InvariantMemo } from '../../src/invariants/registry.js';
import { expectAllClose, expectClose } from '../support/assert-close.js';
import { atlasEntries } from './atlas.js';
import { randomGraphs } from './random-graphs.js';

const repeat = (x: number, k: number): number[] => new Array<number>(k).fill(x);

describe('distanceSpectrum()', () => {
  test('K_n: D = J − I has eigenvalues n − 1 and −1 (n − 1 times)', () => {
    for (let n = 1; n <= 12; n++)
      expectAllClose(distanceSpectrum(complete(n)), [n - 1, ...repeat(-1, n - 1)], 1e-12);
  });

  test('K_{a,b}: a + b − 2 ± √(a² − ab + b²) and −2 (a + b − 2 times) (from memory; checked with numpy)', () => {
    for (const [a, b] of [
      [1, 4],
      [2, 3],
      [3, 5],
      [4, 4],
    ]) {
      const r = Math.sqrt(a * a - a * b + b * b);
      expectAllClose(
        distanceSpectrum(completeBipartite(a, b)),
        [a + b - 2 + r, a + b - 2 - r, ...repeat(-2, a + b - 2)],
        1e-12,
      );
    }
  });

  test('Petersen: D = 2(J − I) − A, so 15, 0 (4 times), −3 (5 times) from the adjacency spectrum 3, 1^5, (−2)^4', () => {
    expectAllClose(distanceSpectrum(petersen()), [15, ...repeat(0, 4), ...repeat(-3, 5)], 1e-12);
  });

  test('trees: one positive eigenvalue and det D = (−1)^(n−1) (n − 1) 2^(n−2) (Graham and Pollak 1971)', () => {
    for (const g of [
      path(9),
      star(9),
      path(2),
      fromEdges(7, [
        [0, 1],
        [1, 2],
        [1, 3],
        [3, 4],
        [3, 5],
        [5, 6],
      ]),
    ]) {
      const n = g.order;
      const values = distanceSpectrum(g);
      expect(values.filter((x) => x > 1e-9).length).toBe(1);
      const det = values.reduce((p, x) => p * x, 1);
      expectClose(det, (-1) ** (n - 1) * (n - 1) * 2 ** (n - 2), 1e-9 * 2 ** n * n);
    }
  });

  test('matches numpy eigvalsh of networkx floyd_warshall_numpy on every connected graph with at most 7 vertices', () => {
    for (const { graph, ref } of atlasEntries()) {
      if (ref.distanceSpectrum === null) continue;
      expectAllClose(distanceSpectrum(graph), ref.distanceSpectrum, 1e-9, ref.graph6);
      expectAllClose(distanceLaplacianSpectrum(graph), ref.distanceLaplacianSpectrum!, 1e-9, ref.graph6);
    }
  });

  test('throws InvariantDomainError on a disconnected graph, naming the invariant', () => {
    expect(() => distanceSpectrum(emptyGraph(2))).toThrow(InvariantDomainError);
    expect(() => distanceSpectralRadius(emptyGraph(2))).toThrow(
      'distanceSpectralRadius is not defined here: the graph is disconnected',
    );
    expect(() => computeInvariant(emptyGraph(3), 'distanceLaplacianSpectrum')).toThrow(InvariantDomainError);
    expect(() => computeInvariant(emptyGraph(3), 'distanceSpectralRadius')).toThrow(
      'distanceSpectralRadius is not defined here',
    );
  });
});

/** The same graph as a graphology object, for graphology-shortest-path. */
function toGraphology(g: CompactGraph): UndirectedGraph {
  const h = new UndirectedGraph();
  for (let v = 0; v < g.order; v++) h.addNode(String(v));
  for (const [u, v] of edgeList(g)) h.addEdge(String(u), String(v));
  return h;
}

describe('distance spectra against graphology-shortest-path distances (trace identities)', () => {
  test('Σ∂ = tr D = 0, Σ∂² = Σ d(u,v)², Σ∂^L = Σ transmissions on seeded random connected graphs', () => {
    let checked = 0;
    for (const g of randomGraphs('distance-spectra', 60, 5, 40, [0.2, 0.4, 0.7])) {
      const h = toGraphology(g);
      let squares = 0;
      let total = 0;
      let connected = true;
      for (let u = 0; u < g.order; u++) {
        const lengths = singleSourceLength(h, String(u));
        if (Object.keys(lengths).length !== g.order) connected = false;
        for (const d of Object.values(lengths)) {
          squares += d * d;
          total += d;
        }
      }
      if (!connected) continue;
      checked++;
      const memo = new InvariantMemo(g);
      const spectrum = memo.get('distanceSpectrum') as number[];
      const laplacian = memo.get('distanceLaplacianSpectrum') as number[];
      const scale = g.order * g.order;
      expectClose(
        spectrum.reduce((s, x) => s + x, 0),
        0,
        1e-9 * scale,
      );
      expectClose(
        spectrum.reduce((s, x) => s + x * x, 0),
        squares,
        1e-9 * squares,
      );
      expectClose(
        laplacian.reduce((s, x) => s + x, 0),
        total,
        1e-9 * total,
      );
      expect(memo.get('distanceSpectralRadius')).toBe(spectrum[0]);
    }
    expect(checked).toBeGreaterThan(30);
  });
});

describe('distanceLaplacianSpectrum()', () => {
  test('K_n: n (n − 1 times) and 0, like the Laplacian (Aouchiche and Hansen 2013)', () => {
    for (let n = 1; n <= 10; n++)
      expectAllClose(distanceLaplacianSpectrum(complete(n)), [...repeat(n, n - 1), 0], 1e-12);
  });

  test('diameter ≤ 2: 2n − μ_i for the Laplacian eigenvalues μ_1..μ_(n−1), and 0 (Aouchiche and Hansen 2013)', () => {
    let checked = 0;
    for (const g of randomGraphs('distance-laplacian', 40, 6, 30, [0.7, 0.85])) {
      if (computeInvariant(g, 'diameter') !== 2) continue;
      checked++;
      const mu = computeInvariant(g, 'laplacianSpectrum') as number[];
      const expected = mu
        .slice(0, g.order - 1)
        .map((x) => 2 * g.order - x)
        .sort((a, b) => b - a);
      expectAllClose(distanceLaplacianSpectrum(g), [...expected, 0], 1e-9);
    }
    expect(checked).toBeGreaterThan(20);
  });

  test('the smallest eigenvalue is exactly 0', () => {
    for (const g of [petersen(), path(7), star(5)]) expect(distanceLaplacianSpectrum(g).at(-1)).toBe(0);
  });
});
