import { describe, expect, test } from 'vitest';
import { fromEdges } from '../../src/graph/builders.js';
import { barbell, complete, cycle, path, petersen, star } from '../../src/graph/families.js';
import { bridgeCount, cutStructure, cutVertexCount } from '../../src/invariants/cut-structure.js';
import { atlasEntries } from './atlas.js';
import { bruteBridgeCount, bruteCutVertexCount } from './brute-force.js';
import { randomGraphs } from './random-graphs.js';

describe('bridgeCount() and cutVertexCount()', () => {
  test('trees: every edge is a bridge, every non-leaf a cut vertex (common practice)', () => {
    for (let n = 2; n <= 12; n++) {
      expect(bridgeCount(path(n))).toBe(n - 1);
      expect(cutVertexCount(path(n))).toBe(Math.max(0, n - 2));
      expect(bridgeCount(star(n))).toBe(n - 1);
      expect(cutVertexCount(star(n))).toBe(n >= 3 ? 1 : 0);
    }
  });

  test('2-connected graphs have neither: cycles, complete graphs, Petersen', () => {
    for (const g of [cycle(7), complete(6), petersen()])
      expect([bridgeCount(g), cutVertexCount(g)]).toEqual([0, 0]);
  });

  test('barbell: two K_5 joined by a path of 3 vertices has 4 bridges and 5 cut vertices (by hand)', () => {
    expect([bridgeCount(barbell(5, 3)), cutVertexCount(barbell(5, 3))]).toEqual([4, 5]);
  });

  test('match networkx bridges / articulation_points on every graph with at most 7 vertices', () => {
    for (const { graph, ref } of atlasEntries()) {
      expect(bridgeCount(graph), ref.graph6).toBe(ref.bridgeCount);
      expect(cutVertexCount(graph), ref.graph6).toBe(ref.cutVertexCount);
    }
  });

  test('match deletion brute force on seeded random graphs of 8..30 vertices, including disconnected ones', () => {
    for (const g of randomGraphs('cuts', 150, 8, 30, [0.05, 0.1, 0.15, 0.25, 0.5])) {
      expect(bridgeCount(g)).toBe(bruteBridgeCount(g));
      expect(cutVertexCount(g)).toBe(bruteCutVertexCount(g));
    }
  });

  test('handle a path of 20000 vertices without overflowing the stack (iterative search)', () => {
    const g = path(20000);
    expect([bridgeCount(g), cutVertexCount(g)]).toEqual([19999, 19998]);
  });
});

describe('cutStructure()', () => {
  test('lists the bridges and cut vertices themselves (by hand: a triangle with a pendant path)', () => {
    const g = fromEdges(5, [
      [0, 1],
      [1, 2],
      [0, 2],
      [2, 3],
      [3, 4],
    ]);
    expect(cutStructure(g)).toEqual({
      bridges: [
        [2, 3],
        [3, 4],
      ],
      cutVertices: [2, 3],
    });
  });
});
