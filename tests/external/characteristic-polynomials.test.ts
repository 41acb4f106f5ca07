/**
 * Characteristic polynomials and certified spectra against reference libraries: sympy's exact
 * Matrix.charpoly and numpy's eigvalsh, for every graph on 1..6 vertices and every 4th graph on 7
 * (fixture made by tests/scripts/make_charpoly_fixture.py from the networkx atlas).
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { characteristicPolynomial } from '../../src/certify/characteristic-polynomial.js';
import { type IntegerGraphMatrix, integerGraphMatrix } from '../../src/certify/graph-matrices.js';
import { certifiedSpectrum } from '../../src/certify/spectral-enclosures.js';
import { toDoubleAbove, toDoubleBelow } from '../../src/certify/rational.js';

interface MatrixRecord {
  charpoly: string[];
  eigenvalues: number[];
}
type GraphRecord = { graph6: string; order: number } & Partial<Record<IntegerGraphMatrix, MatrixRecord>>;

const fixture = JSON.parse(
  readFileSync(new URL('../fixtures/charpoly-atlas.json', import.meta.url), 'utf8'),
) as { source: string; graphs: GraphRecord[] };

const MATRICES: IntegerGraphMatrix[] = [
  'adjacency',
  'laplacian',
  'signlessLaplacian',
  'distance',
  'distanceLaplacian',
];

describe('characteristicPolynomial() against sympy (exact)', () => {
  test('the fixture covers the intended graphs', () => {
    // 208 graphs on 1..6 vertices (OEIS A000088: 1, 2, 4, 11, 34, 156) + ceil(1044 / 4) on 7.
    expect(fixture.graphs.length).toBe(208 + 261);
  });

  for (const kind of MATRICES) {
    test(`${kind}: equal coefficients on every fixture graph`, () => {
      let compared = 0;
      for (const rec of fixture.graphs) {
        const ref = rec[kind];
        if (ref === undefined) continue;
        const p = characteristicPolynomial(integerGraphMatrix(decodeGraph6(rec.graph6), kind));
        expect(p.map(String), `${kind} of ${rec.graph6}`).toEqual(ref.charpoly);
        compared++;
      }
      expect(compared).toBeGreaterThan(300);
    });
  }
});

describe('certifiedSpectrum() contains numpy eigenvalues', () => {
  for (const kind of MATRICES) {
    test(`${kind}: each numpy eigenvalue lies in its certified interval (to 1e-9)`, () => {
      for (const rec of fixture.graphs) {
        const ref = rec[kind];
        if (ref === undefined) continue;
        const s = certifiedSpectrum(decodeGraph6(rec.graph6), kind, 40);
        expect(s.eigenvalues.length).toBe(rec.order);
        s.eigenvalues.forEach((e, i) => {
          const lo = toDoubleBelow(e.lo);
          const hi = toDoubleAbove(e.hi);
          // numpy's eigvalsh is backward stable: its error is a small multiple of 1e-16 * ||M||.
          expect(ref.eigenvalues[i], `${kind} of ${rec.graph6}, eigenvalue ${i}`).toBeGreaterThanOrEqual(
            lo - 1e-9,
          );
          expect(ref.eigenvalues[i], `${kind} of ${rec.graph6}, eigenvalue ${i}`).toBeLessThanOrEqual(
            hi + 1e-9,
          );
          expect(hi - lo).toBeLessThanOrEqual(2 ** -39);
        });
      }
    });
  }
});
