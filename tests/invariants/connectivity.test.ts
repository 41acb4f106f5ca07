import { describe, expect, test } from 'vitest';
import { fromEdges } from '../../src/graph/builders.js';
import {
  barbell,
  complete,
  completeBipartite,
  cycle,
  emptyGraph,
  hypercube,
  path,
  petersen,
  wheel,
} from '../../src/graph/families.js';
import { minDegree } from '../../src/invariants/degrees.js';
import {
  edgeConnectivity,
  localVertexConnectivity,
  vertexConnectivity,
} from '../../src/invariants/connectivity.js';
import { atlasEntries } from './atlas.js';
import { bruteEdgeConnectivity, bruteVertexConnectivity } from './brute-force.js';
import { randomGraphs } from './random-graphs.js';

describe('vertexConnectivity() and edgeConnectivity()', () => {
  test('conventions of INVARIANTS.md: κ(K_n) = λ(K_n) = n − 1, 0 for n = 1 and for disconnected graphs', () => {
    for (let n = 1; n <= 10; n++) {
      expect(vertexConnectivity(complete(n))).toBe(n - 1);
      expect(edgeConnectivity(complete(n))).toBe(n - 1);
    }
    expect(vertexConnectivity(emptyGraph(3))).toBe(0);
    expect(edgeConnectivity(emptyGraph(3))).toBe(0);
    const twoTriangles = fromEdges(6, [
      [0, 1],
      [1, 2],
      [0, 2],
      [3, 4],
      [4, 5],
      [3, 5],
    ]);
    expect(vertexConnectivity(twoTriangles)).toBe(0);
    expect(edgeConnectivity(twoTriangles)).toBe(0);
  });

  test('closed forms: paths 1, cycles 2, K_{a,b} min(a, b), wheels 3, Q_d d (common practice)', () => {
    for (let n = 2; n <= 10; n++)
      expect([vertexConnectivity(path(n)), edgeConnectivity(path(n))]).toEqual([1, 1]);
    for (let n = 3; n <= 10; n++)
      expect([vertexConnectivity(cycle(n)), edgeConnectivity(cycle(n))]).toEqual([2, 2]);
    for (let a = 1; a <= 5; a++) {
      for (let b = 1; b <= 5; b++) {
        const g = completeBipartite(a, b);
        expect([vertexConnectivity(g), edgeConnectivity(g)]).toEqual([Math.min(a, b), Math.min(a, b)]);
      }
    }
    for (let n = 5; n <= 10; n++) expect(vertexConnectivity(wheel(n))).toBe(3);
    for (let d = 1; d <= 6; d++)
      expect([vertexConnectivity(hypercube(d)), edgeConnectivity(hypercube(d))]).toEqual([d, d]);
  });

  test('separate κ from λ: two K_4 sharing a vertex (κ = 1, λ = 3; value by hand)', () => {
    const edges: Array<[number, number]> = [];
    for (const part of [
      [0, 1, 2, 3],
      [3, 4, 5, 6],
    ])
      for (let i = 0; i < 4; i++) for (let j = i + 1; j < 4; j++) edges.push([part[i], part[j]]);
    const g = fromEdges(7, edges);
    expect([vertexConnectivity(g), edgeConnectivity(g)]).toEqual([1, 3]);
    expect([vertexConnectivity(barbell(5, 0)), edgeConnectivity(barbell(5, 0))]).toEqual([1, 1]);
  });

  test('Petersen: κ = λ = 3 (Holton and Sheehan, "The Petersen Graph", CUP 1993; from memory)', () => {
    expect([vertexConnectivity(petersen()), edgeConnectivity(petersen())]).toEqual([3, 3]);
  });

  test('match networkx node_connectivity / edge_connectivity on every graph with at most 7 vertices', () => {
    for (const { graph, ref } of atlasEntries()) {
      expect(vertexConnectivity(graph), ref.graph6).toBe(ref.vertexConnectivity);
      expect(edgeConnectivity(graph), ref.graph6).toBe(ref.edgeConnectivity);
    }
  });

  test('match the definitions by brute force on seeded random graphs of 8..12 vertices', () => {
    for (const g of randomGraphs('connectivity', 120, 8, 12, [0.2, 0.35, 0.5, 0.7, 0.9])) {
      expect(vertexConnectivity(g)).toBe(bruteVertexConnectivity(g));
      expect(edgeConnectivity(g)).toBe(bruteEdgeConnectivity(g));
    }
  });

  test("satisfy Whitney's inequality κ ≤ λ ≤ δ on seeded random graphs of 20..60 vertices (Whitney 1932)", () => {
    for (const g of randomGraphs('whitney', 40, 20, 60, [0.1, 0.3, 0.6, 0.9])) {
      const k = vertexConnectivity(g);
      const l = edgeConnectivity(g);
      expect(k).toBeLessThanOrEqual(l);
      expect(l).toBeLessThanOrEqual(minDegree(g));
    }
  });
});

describe('localVertexConnectivity()', () => {
  test('counts internally disjoint paths: opposite corners of Q_3 have 3 (Menger; value by hand)', () => {
    expect(localVertexConnectivity(hypercube(3), 0, 7)).toBe(3);
    expect(localVertexConnectivity(cycle(6), 0, 3)).toBe(2);
  });

  test('rejects adjacent or equal vertices with a RangeError', () => {
    expect(() => localVertexConnectivity(path(3), 0, 1)).toThrow(RangeError);
    expect(() => localVertexConnectivity(path(3), 1, 1)).toThrow(
      'Expected two distinct non-adjacent vertices but found 1 and 1',
    );
  });
});
