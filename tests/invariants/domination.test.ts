import { describe, expect, test } from 'vitest';
import {
  complete,
  completeBipartite,
  cycle,
  emptyGraph,
  path,
  petersen,
  star,
} from '../../src/graph/families.js';
import { dominationNumber, isDominatingSet, minimumDominatingSet } from '../../src/invariants/domination.js';
import { atlasEntries } from './atlas.js';
import { bruteDominationNumber } from './brute-force.js';
import { randomGraphs } from './random-graphs.js';

describe('dominationNumber()', () => {
  test('γ(P_n) = γ(C_n) = ⌈n/3⌉ (Haynes, Hedetniemi, Slater, "Fundamentals of Domination in Graphs", 1998)', () => {
    for (let n = 1; n <= 30; n++) {
      expect(dominationNumber(path(n))).toBe(Math.ceil(n / 3));
      if (n >= 3) expect(dominationNumber(cycle(n))).toBe(Math.ceil(n / 3));
    }
  });

  test('closed forms: γ(K_n) = γ(star) = 1, γ(K_{a,b}) = 2 for a, b ≥ 2, edgeless n', () => {
    for (let n = 1; n <= 10; n++) {
      expect(dominationNumber(complete(n))).toBe(1);
      expect(dominationNumber(emptyGraph(n))).toBe(n);
      if (n >= 2) expect(dominationNumber(star(n))).toBe(1);
    }
    for (let a = 2; a <= 5; a++)
      for (let b = 2; b <= 5; b++) expect(dominationNumber(completeBipartite(a, b))).toBe(2);
  });

  test('is 3 on the Petersen graph (Holton and Sheehan, "The Petersen Graph", CUP 1993; from memory)', () => {
    expect(dominationNumber(petersen())).toBe(3);
  });

  test('matches the subset brute force on every graph with at most 7 vertices', () => {
    for (const { graph, ref } of atlasEntries())
      expect(dominationNumber(graph), ref.graph6).toBe(bruteDominationNumber(graph));
  });

  test('matches the subset brute force on seeded random graphs of 8..14 vertices', () => {
    for (const g of randomGraphs('domination', 150, 8, 14, [0.08, 0.15, 0.3, 0.5, 0.8])) {
      expect(dominationNumber(g)).toBe(bruteDominationNumber(g));
    }
  });
});

describe('minimumDominatingSet()', () => {
  test('dominates and has size γ on seeded random graphs of 10..60 vertices', () => {
    for (const g of randomGraphs('domination-witness', 40, 10, 60, [0.1, 0.2, 0.4, 0.8])) {
      const d = minimumDominatingSet(g);
      expect(isDominatingSet(g, d)).toBe(true);
      expect(d.length).toBe(dominationNumber(g));
    }
  });
});

describe('isDominatingSet()', () => {
  test('rejects a set that leaves a vertex undominated, and repeated vertices', () => {
    expect(isDominatingSet(path(4), [1, 2])).toBe(true);
    expect(isDominatingSet(path(4), [0, 1])).toBe(false);
    expect(isDominatingSet(path(3), [1, 1])).toBe(false);
  });
});
