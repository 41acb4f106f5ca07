/**
 * Characteristic polynomials of graph matrices against closed forms, and Berkowitz against the
 * independent Faddeev–LeVerrier recurrence on every atlas graph.
 *
 * Closed forms (D. Cvetković, M. Doob and H. Sachs, "Spectra of Graphs", Academic Press 1980,
 * and D. Cvetković, P. Rowlinson and S. Simić, "An Introduction to the Theory of Graph Spectra",
 * CUP 2010; theorem numbers not recalled):
 * - P_n: p_n = x p_(n-1) - p_(n-2), p_0 = 1, p_1 = x (expansion along the last row);
 * - C_n: p(C_n) = p(P_n) - p(P_(n-2)) - 2 (from memory; Schwenk's formula for a cycle);
 * - K_n: (x - n + 1)(x + 1)^(n-1); K_(p,q): x^(p+q-2)(x^2 - pq);
 * - Petersen graph: (x - 3)(x - 1)^5 (x + 2)^4;
 * - Laplacian of K_n: x (x - n)^(n-1); of the star K_(1,n-1): x (x - 1)^(n-2) (x - n);
 * - distance Laplacian of K_n: x (x - n)^(n-1) (Aouchiche–Hansen 2013: D^L(K_n) = L(K_n));
 * - trees: det of the distance matrix is (-1)^(n-1) (n-1) 2^(n-2) (R. L. Graham and
 *   H. O. Pollak, "On the addressing problem for loop switching", Bell Syst. Tech. J. 50
 *   (1971) 2495–2519), so the constant term of det(xI - D) is (-1)^n det D.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import * as F from '../../src/graph/families.js';
import { fromEdges } from '../../src/graph/builders.js';
import {
  characteristicPolynomial,
  characteristicPolynomialFaddeevLeVerrier,
  intMatrix,
} from '../../src/certify/characteristic-polynomial.js';
import { type IntegerGraphMatrix, integerGraphMatrix } from '../../src/certify/graph-matrices.js';
import { type IntPolynomial, polyMul, polyPow, polySub, polynomial } from '../../src/certify/polynomial.js';
import { seededRng } from '../support/random-graph.js';

const X = polynomial([0, 1]);
const lin = (c: number): IntPolynomial => polynomial([-c, 1]); // x - c
const charpoly = (g: Parameters<typeof integerGraphMatrix>[0], kind: IntegerGraphMatrix = 'adjacency') =>
  characteristicPolynomial(integerGraphMatrix(g, kind));

function pathPolynomial(n: number): IntPolynomial {
  let a: IntPolynomial = [1n];
  let b: IntPolynomial = X;
  if (n === 0) return a;
  for (let k = 2; k <= n; k++) [a, b] = [b, polySub(polyMul(X, b), a)];
  return b;
}

describe('characteristicPolynomial() on generic matrices', () => {
  test('a 2x2 matrix gives x^2 - trace x + det', () => {
    // [[1, 2], [3, 4]]: x^2 - 5x - 2
    expect(
      characteristicPolynomial(
        intMatrix([
          [1, 2],
          [3, 4],
        ]),
      ),
    ).toEqual(polynomial([-2, -5, 1]));
  });

  test('the empty matrix gives 1', () => {
    expect(characteristicPolynomial(intMatrix([]))).toEqual([1n]);
  });

  test('agrees with Faddeev–LeVerrier on seeded random non-symmetric integer matrices', () => {
    const rng = seededRng('charpoly-random');
    for (let trial = 0; trial < 30; trial++) {
      const n = 1 + Math.floor(rng() * 9);
      const rows = Array.from({ length: n }, () =>
        Array.from({ length: n }, () => Math.floor(rng() * 21) - 10),
      );
      expect(characteristicPolynomial(intMatrix(rows))).toEqual(
        characteristicPolynomialFaddeevLeVerrier(intMatrix(rows)),
      );
    }
  });
});

describe('characteristicPolynomial() closed forms', () => {
  test('paths follow p_n = x p_(n-1) - p_(n-2)', () => {
    for (let n = 1; n <= 14; n++) expect(charpoly(F.path(n)), `P_${n}`).toEqual(pathPolynomial(n));
  });

  test('cycles: p(C_n) = p(P_n) - p(P_(n-2)) - 2', () => {
    for (let n = 3; n <= 14; n++) {
      expect(charpoly(F.cycle(n)), `C_${n}`).toEqual(
        polySub(polySub(pathPolynomial(n), pathPolynomial(n - 2)), [2n]),
      );
    }
  });

  test('complete graphs: (x - n + 1)(x + 1)^(n-1)', () => {
    for (let n = 1; n <= 12; n++)
      expect(charpoly(F.complete(n))).toEqual(polyMul(lin(n - 1), polyPow(lin(-1), n - 1)));
  });

  test('complete bipartite graphs: x^(p+q-2)(x^2 - pq)', () => {
    for (let p = 1; p <= 6; p++)
      for (let q = 1; q <= 6; q++)
        expect(charpoly(F.completeBipartite(p, q))).toEqual(
          polyMul(polyPow(X, p + q - 2), polynomial([-p * q, 0, 1])),
        );
  });

  test('Petersen graph: (x - 3)(x - 1)^5 (x + 2)^4', () => {
    expect(charpoly(F.petersen())).toEqual(polyMul(polyMul(lin(3), polyPow(lin(1), 5)), polyPow(lin(-2), 4)));
  });

  test('Laplacian of K_n is x (x - n)^(n-1); distance Laplacian of K_n too', () => {
    for (let n = 1; n <= 10; n++) {
      const expected = polyMul(X, polyPow(lin(n), n - 1));
      expect(charpoly(F.complete(n), 'laplacian')).toEqual(expected);
      expect(charpoly(F.complete(n), 'distanceLaplacian')).toEqual(expected);
    }
  });

  test('Laplacian of the star K_(1,n-1) is x (x - 1)^(n-2) (x - n)', () => {
    for (let n = 2; n <= 12; n++) {
      expect(charpoly(F.star(n), 'laplacian')).toEqual(polyMul(polyMul(X, polyPow(lin(1), n - 2)), lin(n)));
    }
  });

  test('signless Laplacian of a bipartite graph has the Laplacian polynomial (they are similar)', () => {
    for (const g of [F.path(9), F.cycle(10), F.completeBipartite(3, 5), F.hypercube(3)]) {
      expect(charpoly(g, 'signlessLaplacian')).toEqual(charpoly(g, 'laplacian'));
    }
  });

  test('distance matrix of K_n equals its adjacency matrix', () => {
    for (let n = 1; n <= 9; n++) expect(charpoly(F.complete(n), 'distance')).toEqual(charpoly(F.complete(n)));
  });

  test('Graham–Pollak: constant term on trees is (-1)^n (-1)^(n-1) (n-1) 2^(n-2) = -(n-1) 2^(n-2)', () => {
    const rng = seededRng('random-trees');
    for (let n = 2; n <= 14; n++) {
      // A random recursive tree: vertex v joins a uniformly chosen earlier vertex.
      const edges: Array<[number, number]> = [];
      for (let v = 1; v < n; v++) edges.push([Math.floor(rng() * v), v]);
      for (const t of [fromEdges(n, edges), F.path(n), F.star(n)]) {
        expect(charpoly(t, 'distance')[0]).toBe(-BigInt(n - 1) * 2n ** BigInt(n - 2));
      }
    }
  });
});

describe('characteristicPolynomial() against Faddeev–LeVerrier on the atlas', () => {
  const lines = readFileSync(new URL('../fixtures/atlas-1-7.g6', import.meta.url), 'utf8')
    .trim()
    .split('\n');
  for (const kind of [
    'adjacency',
    'laplacian',
    'signlessLaplacian',
    'distance',
    'distanceLaplacian',
  ] as const) {
    test(`${kind}: both methods agree on every graph on 1..7 vertices (every 3rd on 7)`, () => {
      let k = 0;
      for (const line of lines) {
        const g = decodeGraph6(line);
        if (g.order === 7 && k++ % 3 !== 0) continue;
        if ((kind === 'distance' || kind === 'distanceLaplacian') && !isConnected(g)) continue;
        const m = integerGraphMatrix(g, kind);
        expect(characteristicPolynomial(m), `${kind} of ${line}`).toEqual(
          characteristicPolynomialFaddeevLeVerrier(m),
        );
      }
    });
  }
});

function isConnected(g: Parameters<typeof integerGraphMatrix>[0]): boolean {
  try {
    integerGraphMatrix(g, 'distance');
    return true;
  } catch {
    return false;
  }
}
