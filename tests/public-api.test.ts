import { describe, expect, test } from 'vitest';
import * as refute from '../src/index.js';

describe('the package barrel', () => {
  // Petersen graph: ν = 5, α = 4, χ = 3, γ = 3 (Holton and Sheehan, "The Petersen Graph", CUP 1993;
  // from memory, and the same values tests/external/exact-invariants.test.ts checks).
  test('exports witnesses that its verifiers accept, of the published sizes on the Petersen graph', () => {
    const g = refute.decodeGraph6('IheA@GUAo');
    const matching = refute.maximumMatching(g);
    const independent = refute.maximumIndependentSet(g);
    const colouring = refute.minimumColouring(g);
    const dominating = refute.minimumDominatingSet(g);
    expect([matching.length, refute.isMatching(g, matching)]).toEqual([5, true]);
    expect([independent.length, refute.isIndependentSet(g, independent)]).toEqual([4, true]);
    expect([Math.max(...colouring) + 1, refute.isProperColouring(g, colouring)]).toEqual([3, true]);
    expect([dominating.length, refute.isDominatingSet(g, dominating)]).toEqual([3, true]);
    expect(refute.isVertexCover(g, refute.minimumVertexCover(g))).toBe(true);
    expect(refute.isClique(g, refute.maximumClique(g))).toBe(true);
  });
  test('exports defineConjecture and the certifier', () => {
    const c = refute.defineConjecture({
      name: 'p',
      statement: 's',
      vertices: 3,
      score: (v) => v.maxDegree - 1.5,
    });
    expect(refute.isCertifiedCounterexample(c, refute.decodeGraph6('Bw'))).toBe(true);
  });
});
