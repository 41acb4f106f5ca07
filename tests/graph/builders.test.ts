import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import {
  complement,
  fromAdjacencyMatrix,
  fromEdges,
  fromUpperTriangleBits,
  inducedSubgraph,
  relabel,
} from '../../src/graph/builders.js';
import { edgeList, graphsEqual, hasEdge, neighbors, popcount32 } from '../../src/graph/graph.js';
import { complete, cycle, emptyGraph, path, petersen } from '../../src/graph/families.js';
import { randomGraph, seededRng } from '../support/random-graph.js';

describe('fromEdges()', () => {
  test('fromEdges() merges duplicate edges and keeps degrees and size consistent', () => {
    const g = fromEdges(4, [
      [0, 1],
      [1, 0],
      [1, 2],
      [2, 3],
    ]);
    expect(g.size).toBe(3);
    expect(Array.from(g.degrees)).toEqual([1, 2, 2, 1]);
    expect(hasEdge(g, 1, 0) && hasEdge(g, 0, 1)).toBe(true);
  });
  test('fromEdges() rejects a loop and an endpoint out of range, saying what it found', () => {
    expect(() => fromEdges(3, [[1, 1]])).toThrow('Expected a simple graph but found a loop at vertex 1');
    expect(() => fromEdges(3, [[0, 3]])).toThrow('Expected edge endpoints in 0..2 but found 0-3');
  });
  test('fromEdges() handles rows longer than one word (n = 1000)', () => {
    const g = fromEdges(1000, [
      [0, 999],
      [31, 32],
      [500, 501],
    ]);
    expect(g.wordsPerRow).toBe(32);
    expect(Array.from(neighbors(g, 999))).toEqual([0]);
    expect(edgeList(g)).toEqual([
      [0, 999],
      [31, 32],
      [500, 501],
    ]);
  });
});

describe('fromAdjacencyMatrix()', () => {
  test('fromAdjacencyMatrix() builds the path P3 and rejects asymmetric or looped matrices', () => {
    const g = fromAdjacencyMatrix([
      [0, 1, 0],
      [1, 0, 1],
      [0, 1, 0],
    ]);
    expect(graphsEqual(g, path(3))).toBe(true);
    expect(() =>
      fromAdjacencyMatrix([
        [0, 1],
        [0, 0],
      ]),
    ).toThrow(/symmetric/);
    expect(() => fromAdjacencyMatrix([[1]])).toThrow(/loop at vertex 0/);
  });
});

describe('fromUpperTriangleBits()', () => {
  test('fromUpperTriangleBits() uses graph6 pair order 01, 02, 12, 03, ...', () => {
    // Bits of the graph6 specification example DQc: 0100101001 (pairs 02, 13, 04, 34).
    const g = fromUpperTriangleBits(5, [0, 1, 0, 0, 1, 0, 1, 0, 0, 1]);
    expect(edgeList(g)).toEqual([
      [0, 2],
      [0, 4],
      [1, 3],
      [3, 4],
    ]);
  });
});

describe('complement()', () => {
  test('complement() of K_n is edgeless and of the empty graph is K_n, across word boundaries', () => {
    for (const n of [1, 5, 31, 32, 33, 64, 70]) {
      expect(complement(complete(n)).size).toBe(0);
      expect(graphsEqual(complement(emptyGraph(n)), complete(n))).toBe(true);
    }
  });
  test('complement() is an involution and sizes add up to C(n,2)', () => {
    const rng = seededRng('complement');
    for (let i = 0; i < 50; i++) {
      const g = randomGraph(1 + Math.floor(rng() * 70), rng(), rng);
      const c = complement(g);
      expect(g.size + c.size).toBe((g.order * (g.order - 1)) / 2);
      expect(graphsEqual(complement(c), g)).toBe(true);
    }
  });
});

describe('inducedSubgraph() and relabel()', () => {
  test('inducedSubgraph() of the Petersen graph on the outer vertices is C5', () => {
    expect(graphsEqual(inducedSubgraph(petersen(), [0, 1, 2, 3, 4]), cycle(5))).toBe(true);
  });
  test('inducedSubgraph() rejects repeated vertices', () => {
    expect(() => inducedSubgraph(path(3), [0, 0])).toThrow('Expected distinct vertices but found 0 twice');
  });
  test('relabel() by a random permutation keeps the degree multiset and is undone by the inverse', () => {
    fc.assert(
      fc.property(fc.integer({ min: 1, max: 40 }), fc.integer(), (n, seed) => {
        const rng = seededRng(String(seed));
        const g = randomGraph(n, 0.3, rng);
        const perm = Array.from({ length: n }, (_, i) => i).sort(() => rng() - 0.5);
        const inverse = new Array<number>(n);
        perm.forEach((p, i) => (inverse[p] = i));
        const h = relabel(g, perm);
        for (let v = 0; v < n; v++) expect(h.degrees[perm[v]]).toBe(g.degrees[v]);
        expect(graphsEqual(relabel(h, inverse), g)).toBe(true);
      }),
      { numRuns: 100, seed: 7 },
    );
  });
  test('relabel() rejects a non-permutation', () => {
    expect(() => relabel(path(3), [0, 0, 1])).toThrow(/permutation of 0..2/);
  });
});

describe('popcount32()', () => {
  test('popcount32() agrees with counting bits one by one', () => {
    fc.assert(
      fc.property(fc.integer({ min: 0, max: 0xffffffff }), (x) => {
        let c = 0;
        for (let b = 0; b < 32; b++) c += (x >>> b) & 1;
        expect(popcount32(x)).toBe(c);
      }),
      { seed: 3 },
    );
  });
});
