import { describe, expect, test } from 'vitest';
import {
  complete,
  completeBipartite,
  cycle,
  emptyGraph,
  hypercube,
  path,
  petersen,
  turan,
  wheel,
} from '../../src/graph/families.js';
import { cliqueNumber } from '../../src/invariants/cliques.js';
import { chromaticNumber, isProperColouring, minimumColouring } from '../../src/invariants/colouring.js';
import { atlasEntries } from './atlas.js';
import { bruteChromaticNumber, bruteColourable } from './brute-force.js';
import { mycielskian } from './mycielski.js';
import { randomGraphs } from './random-graphs.js';

function coloursUsed(c: Int32Array): number {
  return new Set(c).size;
}

describe('chromaticNumber()', () => {
  test('closed forms: χ(K_n) = n, χ(C_n) = 2 or 3 by parity, bipartite graphs 2, T(n, r) = r, edgeless 1', () => {
    for (let n = 1; n <= 10; n++) {
      expect(chromaticNumber(complete(n))).toBe(n);
      expect(chromaticNumber(emptyGraph(n))).toBe(1);
      if (n >= 2) expect(chromaticNumber(path(n))).toBe(2);
      if (n >= 3) expect(chromaticNumber(cycle(n))).toBe(n % 2 === 0 ? 2 : 3);
    }
    expect(chromaticNumber(completeBipartite(3, 5))).toBe(2);
    for (let d = 1; d <= 5; d++) expect(chromaticNumber(hypercube(d))).toBe(2);
    for (let r = 1; r <= 6; r++) expect(chromaticNumber(turan(14, r))).toBe(r);
  });

  test('wheels: χ = 3 with an even rim, 4 with an odd rim (common practice)', () => {
    // wheel(n) has n vertices: a hub and a rim cycle of n − 1.
    for (let n = 4; n <= 12; n++) expect(chromaticNumber(wheel(n))).toBe((n - 1) % 2 === 0 ? 3 : 4);
  });

  test('is 3 on the Petersen graph (Holton and Sheehan, "The Petersen Graph", CUP 1993; from memory)', () => {
    expect(chromaticNumber(petersen())).toBe(3);
  });

  test('Mycielski graphs: ω = 2 while χ = 3, 4, 5 on C_5, Grötzsch (11 vertices), 23 vertices (Mycielski 1955)', () => {
    const c5 = mycielskian(complete(2));
    const grotzsch = mycielskian(c5);
    const m5 = mycielskian(grotzsch);
    expect([c5.order, grotzsch.order, m5.order]).toEqual([5, 11, 23]);
    expect([c5, grotzsch, m5].map(cliqueNumber)).toEqual([2, 2, 2]);
    expect([c5, grotzsch, m5].map(chromaticNumber)).toEqual([3, 4, 5]);
    expect(bruteColourable(grotzsch, 3)).toBe(false); // independent confirmation of χ > 3
  });

  test('matches the brute-force colouring search on every graph with at most 7 vertices', () => {
    for (const { graph, ref } of atlasEntries())
      expect(chromaticNumber(graph), ref.graph6).toBe(bruteChromaticNumber(graph));
  });

  test('matches the brute-force colouring search on seeded random graphs of 8..15 vertices', () => {
    for (const g of randomGraphs('colouring', 150, 8, 15))
      expect(chromaticNumber(g)).toBe(bruteChromaticNumber(g));
  });
});

describe('minimumColouring()', () => {
  test('is a proper colouring with exactly χ colours, and no proper colouring has one fewer', () => {
    for (const g of randomGraphs('colouring-witness', 40, 10, 16, [0.2, 0.4, 0.6, 0.8])) {
      const c = minimumColouring(g);
      expect(isProperColouring(g, c)).toBe(true);
      const k = coloursUsed(c);
      expect(k).toBe(chromaticNumber(g));
      expect(bruteColourable(g, k - 1)).toBe(false);
    }
  });

  test('is proper on larger seeded random graphs (35..45 vertices)', () => {
    for (const g of randomGraphs('colouring-large', 12, 35, 45, [0.1, 0.3, 0.5, 0.8])) {
      const c = minimumColouring(g);
      expect(isProperColouring(g, c)).toBe(true);
      expect(coloursUsed(c)).toBeGreaterThanOrEqual(cliqueNumber(g));
    }
  });
});

describe('isProperColouring()', () => {
  test('rejects a monochromatic edge, a wrong length and a negative colour', () => {
    expect(isProperColouring(path(3), [0, 1, 0])).toBe(true);
    expect(isProperColouring(path(3), [0, 0, 1])).toBe(false);
    expect(isProperColouring(path(3), [0, 1])).toBe(false);
    expect(isProperColouring(path(3), [0, -1, 0])).toBe(false);
  });
});
