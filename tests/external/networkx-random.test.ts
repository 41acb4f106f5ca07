/**
 * Invariants of 240 seeded random graphs against values computed by networkx and numpy
 * (LAPACK eigvalsh): tests/fixtures/random-invariants.json, written by
 * tests/scripts/make_random_invariants.py with Debian's python3-networkx 2.8.8 and numpy 1.24.
 */
import { describe, expect, test } from 'vitest';
import fixture from '../fixtures/random-invariants.json' with { type: 'json' };
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { InvariantMemo, INVARIANTS } from '../../src/invariants/registry.js';
import { invariantToJson } from '../../src/invariants/encode.js';
import { expectAllClose, expectClose } from '../support/assert-close.js';

const EXACT = [
  'order',
  'size',
  'degreeSequence',
  'componentCount',
  'isConnected',
  'isBipartite',
  'isTree',
  'isForest',
  'diameter',
  'radius',
  'girth',
  'wienerIndex',
  'transmissions',
  'triangleCount',
  'firstZagrebIndex',
  'secondZagrebIndex',
];
const REAL = ['randicIndex', 'harmonicIndex'];
const SPECTRA = [
  'adjacencySpectrum',
  'laplacianSpectrum',
  'signlessLaplacianSpectrum',
  'normalizedLaplacianSpectrum',
];

describe('invariants against networkx/numpy on random graphs', () => {
  test('the fixture has at least 200 graphs and names only registered invariants', () => {
    expect(fixture.graphs.length).toBeGreaterThanOrEqual(200);
    for (const name of [...EXACT, ...REAL, ...SPECTRA]) expect(INVARIANTS.has(name), name).toBe(true);
  });
  for (const name of EXACT) {
    test(`${name} equals networkx's exactly`, () => {
      for (const rec of fixture.graphs) {
        const value = new InvariantMemo(decodeGraph6(rec.graph6)).get(name);
        expect(invariantToJson(value), `${name} of ${rec.graph6}`).toEqual(
          (rec as Record<string, unknown>)[name],
        );
      }
    });
  }
  for (const name of REAL) {
    test(`${name} equals the reference within 1e-9`, () => {
      for (const rec of fixture.graphs) {
        const value = new InvariantMemo(decodeGraph6(rec.graph6)).get(name) as number;
        expectClose(
          value,
          (rec as Record<string, unknown>)[name] as number,
          1e-9,
          `${name} of ${rec.graph6}`,
        );
      }
    });
  }
  for (const name of SPECTRA) {
    test(`${name} equals numpy's eigvalsh within 1e-9`, () => {
      for (const rec of fixture.graphs) {
        const value = new InvariantMemo(decodeGraph6(rec.graph6)).get(name) as number[];
        expectAllClose(
          value,
          (rec as Record<string, unknown>)[name] as number[],
          1e-9,
          `${name} of ${rec.graph6}`,
        );
      }
    });
  }
});
