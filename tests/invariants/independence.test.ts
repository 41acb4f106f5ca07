import { describe, expect, test } from 'vitest';
import {
  completeBipartite,
  complete,
  cycle,
  emptyGraph,
  hypercube,
  path,
  petersen,
} from '../../src/graph/families.js';
import {
  independenceNumber,
  isIndependentSet,
  isVertexCover,
  maximumIndependentSet,
  minimumVertexCover,
  vertexCoverNumber,
} from '../../src/invariants/independence.js';
import { atlasEntries } from './atlas.js';
import { bruteIndependenceNumber } from './brute-force.js';
import { randomGraphs } from './random-graphs.js';

describe('independenceNumber()', () => {
  test('closed forms: α(K_n) = 1, α(C_n) = α(P_n)... = ⌊n/2⌋ / ⌈n/2⌉, α(K_{a,b}) = max(a, b), α(Q_d) = 2^(d−1)', () => {
    for (let n = 1; n <= 12; n++) {
      expect(independenceNumber(complete(n))).toBe(1);
      expect(independenceNumber(path(n))).toBe(Math.ceil(n / 2));
      expect(independenceNumber(emptyGraph(n))).toBe(n);
      if (n >= 3) expect(independenceNumber(cycle(n))).toBe(Math.floor(n / 2));
    }
    for (let a = 1; a <= 5; a++)
      for (let b = 1; b <= 5; b++) expect(independenceNumber(completeBipartite(a, b))).toBe(Math.max(a, b));
    for (let d = 1; d <= 6; d++) expect(independenceNumber(hypercube(d))).toBe(2 ** (d - 1));
  });

  test('is 4 on the Petersen graph (Holton and Sheehan, "The Petersen Graph", CUP 1993; from memory)', () => {
    expect(independenceNumber(petersen())).toBe(4);
  });

  test('matches networkx (clique number of the complement) on every graph with at most 7 vertices', () => {
    for (const { graph, ref } of atlasEntries())
      expect(independenceNumber(graph), ref.graph6).toBe(ref.independenceNumber);
  });

  test('matches the subset brute force on seeded random graphs of 8..13 vertices', () => {
    for (const g of randomGraphs('independence', 120, 8, 13))
      expect(independenceNumber(g)).toBe(bruteIndependenceNumber(g));
  });
});

describe('maximumIndependentSet() and minimumVertexCover()', () => {
  test('return an independent set of size α and a vertex cover of size n − α', () => {
    for (const g of randomGraphs('independence-witness', 40, 10, 60, [0.05, 0.2, 0.5, 0.8])) {
      const s = maximumIndependentSet(g);
      expect(isIndependentSet(g, s)).toBe(true);
      expect(s.length).toBe(independenceNumber(g));
      const c = minimumVertexCover(g);
      expect(isVertexCover(g, c)).toBe(true);
      expect(c.length).toBe(vertexCoverNumber(g));
      expect(vertexCoverNumber(g)).toBe(g.order - s.length);
    }
  });
});

describe('isIndependentSet() and isVertexCover()', () => {
  test('reject an edge inside the set and an uncovered edge', () => {
    expect(isIndependentSet(path(3), [0, 2])).toBe(true);
    expect(isIndependentSet(path(3), [0, 1])).toBe(false);
    expect(isVertexCover(path(3), [1])).toBe(true);
    expect(isVertexCover(path(3), [0])).toBe(false);
  });
});
