import { describe, expect, test } from 'vitest';
import fixture from '../fixtures/random-invariants.json' with { type: 'json' };
import { spectralRadius } from '../../src/invariants/spectral-radius.js';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { fromEdges } from '../../src/graph/builders.js';
import * as F from '../../src/graph/families.js';
import { expectClose } from '../support/assert-close.js';

describe('spectralRadius() by bounded power iteration', () => {
  // λ1 from numpy.linalg.eigvalsh (tests/fixtures/random-invariants.json).
  test('spectralRadius() equals numpy λ1 on 240 random graphs, disconnected ones included', () => {
    for (const rec of fixture.graphs) {
      const expected = rec.adjacencySpectrum.length ? rec.adjacencySpectrum[0] : 0;
      expectClose(spectralRadius(decodeGraph6(rec.graph6)), expected, 1e-11, rec.graph6);
    }
  });
  // Closed forms (Cvetković–Rowlinson–Simić 2010, §1.1): K_{a,b}: sqrt(ab) (bipartite, ±λ1 both
  // eigenvalues); two disjoint K_5: 4 with multiplicity 2; star: sqrt(n-1); P_n: 2cos(π/(n+1)).
  test('spectralRadius() is right where power iteration is hardest', () => {
    expectClose(spectralRadius(F.completeBipartite(3, 7)), Math.sqrt(21), 1e-12);
    const twoK5: Array<[number, number]> = [];
    for (let j = 1; j < 5; j++) for (let i = 0; i < j; i++) twoK5.push([i, j], [i + 5, j + 5]);
    expectClose(spectralRadius(fromEdges(10, twoK5)), 4, 1e-12);
    expectClose(spectralRadius(F.star(17)), 4, 1e-12);
    expectClose(spectralRadius(F.path(200)), 2 * Math.cos(Math.PI / 201), 1e-12);
    expect(spectralRadius(F.emptyGraph(4))).toBe(0);
  });
  test('spectralRadius() of a barbell with a long bar (tiny spectral gap) matches the full solver', async () => {
    const { graphSpectrum } = await import('../../src/invariants/spectra.js');
    const g = F.barbell(8, 6);
    expectClose(spectralRadius(g), graphSpectrum(g, 'adjacency')[0], 1e-12);
  });
});
