import { describe, expect, test } from 'vitest';
import { complement } from '../../src/graph/builders.js';
import { type Graph, hasEdge } from '../../src/graph/graph.js';
import { complete, cycle, emptyGraph, hypercube, petersen, turan } from '../../src/graph/families.js';
import { cliqueNumber, isClique, maximumClique } from '../../src/invariants/cliques.js';
import { atlasEntries } from './atlas.js';
import { bruteCliqueNumber } from './brute-force.js';
import { randomGraphs } from './random-graphs.js';

/**
 * A second exact algorithm as oracle for larger graphs: Bron–Kerbosch enumeration of all maximal
 * cliques (C. Bron, J. Kerbosch, "Algorithm 457", CACM 16(9) 1973) with Tomita's pivot rule
 * (E. Tomita, A. Tanaka, H. Takahashi, TCS 363(1) 2006), without any size bound.
 */
function bronKerboschCliqueNumber(g: Graph): number {
  let best = 0;
  const go = (r: number, p: number[], x: number[]): void => {
    if (p.length === 0 && x.length === 0) {
      best = Math.max(best, r);
      return;
    }
    let pivot = -1;
    let pivotScore = -1;
    for (const u of [...p, ...x]) {
      const score = p.filter((w) => hasEdge(g, u, w)).length;
      if (score > pivotScore) [pivot, pivotScore] = [u, score];
    }
    for (const v of p.filter((w) => !hasEdge(g, pivot, w))) {
      go(
        r + 1,
        p.filter((u) => hasEdge(g, u, v)),
        x.filter((u) => hasEdge(g, u, v)),
      );
      p.splice(p.indexOf(v), 1);
      x.push(v);
    }
  };
  go(
    0,
    Array.from({ length: g.order }, (_, v) => v),
    [],
  );
  return best;
}

describe('cliqueNumber()', () => {
  test('is n on K_n, r on the Turán graph T(n, r), 2 on Petersen and hypercubes (closed forms)', () => {
    for (let n = 1; n <= 12; n++) expect(cliqueNumber(complete(n))).toBe(n);
    for (let r = 1; r <= 6; r++) expect(cliqueNumber(turan(13, r))).toBe(r);
    expect(cliqueNumber(petersen())).toBe(2);
    for (let d = 1; d <= 5; d++) expect(cliqueNumber(hypercube(d))).toBe(2);
    expect(cliqueNumber(cycle(3))).toBe(3);
    expect(cliqueNumber(emptyGraph(4))).toBe(1);
  });

  test('matches networkx (largest of find_cliques) on every graph with at most 7 vertices', () => {
    for (const { graph, ref } of atlasEntries())
      expect(cliqueNumber(graph), ref.graph6).toBe(ref.cliqueNumber);
  });

  test('matches the subset brute force on seeded random graphs of 8..13 vertices', () => {
    for (const g of randomGraphs('clique', 120, 8, 13)) expect(cliqueNumber(g)).toBe(bruteCliqueNumber(g));
  });

  test('matches Bron–Kerbosch on seeded random graphs of 20..48 vertices (crossing a 32-bit word)', () => {
    for (const g of randomGraphs('clique-large', 60, 20, 48, [0.3, 0.5, 0.7, 0.85])) {
      expect(cliqueNumber(g)).toBe(bronKerboschCliqueNumber(g));
    }
  });
});

describe('maximumClique()', () => {
  test('returns a clique of size ω, also on complements of sparse graphs', () => {
    for (const g of randomGraphs('clique-witness', 40, 10, 70, [0.1, 0.5, 0.9])) {
      for (const h of [g, complement(g)]) {
        const c = maximumClique(h);
        expect(isClique(h, c)).toBe(true);
        expect(c.length).toBe(cliqueNumber(h));
      }
    }
  });
});

describe('isClique()', () => {
  test('rejects a non-adjacent pair and repeated vertices', () => {
    expect(isClique(complete(4), [0, 1, 2, 3])).toBe(true);
    expect(isClique(cycle(4), [0, 1, 2])).toBe(false);
    expect(isClique(complete(4), [0, 0])).toBe(false);
  });
});
