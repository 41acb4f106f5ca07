import { describe, expect, test } from 'vitest';
import { complete, completeBipartite, cycle, path, petersen, emptyGraph } from '../../src/graph/families.js';
import { fromEdges } from '../../src/graph/builders.js';
import { isMatching, matchingNumber, maximumMatching } from '../../src/invariants/matching.js';
import { atlasEntries } from './atlas.js';
import { bruteMatchingNumber } from './brute-force.js';
import { randomGraphs } from './random-graphs.js';

describe('matchingNumber()', () => {
  test('is ⌊n/2⌋ on complete graphs, paths and cycles (closed form, common practice)', () => {
    for (let n = 1; n <= 15; n++) {
      expect(matchingNumber(complete(n))).toBe(Math.floor(n / 2));
      expect(matchingNumber(path(n))).toBe(Math.floor(n / 2));
      if (n >= 3) expect(matchingNumber(cycle(n))).toBe(Math.floor(n / 2));
    }
  });

  test('is min(a, b) on K_{a,b} (König 1931)', () => {
    for (let a = 1; a <= 6; a++)
      for (let b = 1; b <= 6; b++) expect(matchingNumber(completeBipartite(a, b))).toBe(Math.min(a, b));
  });

  test('is 5 on the Petersen graph (it has a perfect matching; Petersen 1891, from memory)', () => {
    expect(matchingNumber(petersen())).toBe(5);
  });

  test('is 0 without edges', () => {
    expect(matchingNumber(emptyGraph(5))).toBe(0);
  });

  test('needs blossom contraction: two triangles joined by a path (value by hand: 4 disjoint edges)', () => {
    // Triangles 0-1-2 and 5-6-7 joined by 2-3-4-5: a greedy search from the wrong edge gets stuck.
    const g = fromEdges(8, [
      [0, 1],
      [1, 2],
      [0, 2],
      [2, 3],
      [3, 4],
      [4, 5],
      [5, 6],
      [6, 7],
      [5, 7],
    ]);
    expect(matchingNumber(g)).toBe(4);
  });

  test('matches networkx max_weight_matching(maxcardinality=True) on every graph with at most 7 vertices', () => {
    for (const { graph, ref } of atlasEntries())
      expect(matchingNumber(graph), ref.graph6).toBe(ref.matchingNumber);
  });

  test('matches a brute-force search over edge subsets on seeded random graphs of 8..13 vertices', () => {
    for (const g of randomGraphs('matching', 100, 8, 13))
      expect(matchingNumber(g)).toBe(bruteMatchingNumber(g));
  });
});

describe('maximumMatching()', () => {
  test('returns a matching of size ν on seeded random graphs up to 60 vertices', () => {
    for (const g of randomGraphs('matching-witness', 60, 10, 60, [0.03, 0.08, 0.2, 0.5])) {
      const m = maximumMatching(g);
      expect(isMatching(g, m)).toBe(true);
      expect(m.length).toBe(matchingNumber(g));
    }
  });
});

describe('isMatching()', () => {
  test('rejects non-edges, shared vertices and out-of-range vertices', () => {
    const g = path(4);
    expect(
      isMatching(g, [
        [0, 1],
        [2, 3],
      ]),
    ).toBe(true);
    expect(isMatching(g, [[0, 2]])).toBe(false);
    expect(
      isMatching(g, [
        [0, 1],
        [1, 2],
      ]),
    ).toBe(false);
    expect(isMatching(g, [[3, 4]])).toBe(false);
  });
});
