/**
 * Root isolation: intervals contain the known eigenvalues, are as narrow as asked, and carry the
 * right multiplicities. Known spectra (Cvetković–Rowlinson–Simić 2010; common knowledge):
 * P_n: 2cos(πj/(n+1)), j = 1..n; C_n: 2cos(2πj/n); Laplacian of P_n: 2 - 2cos(πj/n), j = 0..n-1;
 * hypercube Q_d: d - 2k with multiplicity C(d, k).
 */
import { describe, expect, test } from 'vitest';
import * as F from '../../src/graph/families.js';
import { characteristicPolynomial } from '../../src/certify/characteristic-polynomial.js';
import { integerGraphMatrix } from '../../src/certify/graph-matrices.js';
import { polyMul, polyPow, polynomial } from '../../src/certify/polynomial.js';
import { isolateRealRoots, kthLargestRoot, rootsWithMultiplicity } from '../../src/certify/root-isolation.js';
import { certifiedSpectrum } from '../../src/certify/spectral-enclosures.js';
import {
  compare,
  powerOfTwo,
  rational,
  sub,
  toDoubleAbove,
  toDoubleBelow,
} from '../../src/certify/rational.js';

function expectContains(
  e: { lo: ReturnType<typeof rational>; hi: ReturnType<typeof rational> },
  value: number,
  label: string,
): void {
  // value is a double within 1e-15 of the true eigenvalue; the interval is 2^-bits wide.
  expect(toDoubleBelow(e.lo), label).toBeLessThanOrEqual(value + 1e-14);
  expect(toDoubleAbove(e.hi), label).toBeGreaterThanOrEqual(value - 1e-14);
}

describe('isolateRealRoots()', () => {
  test('(x^2 - 2)(x - 1)^3 (x + 4)^2: roots, order and multiplicities', () => {
    const p = polyMul(
      polyMul(polynomial([-2, 0, 1]), polyPow(polynomial([-1, 1]), 3)),
      polyPow(polynomial([4, 1]), 2),
    );
    const iso = isolateRealRoots(p, 50);
    expect(iso.roots.map((r) => r.multiplicity)).toEqual([1, 3, 1, 2]);
    expect(iso.roots[1]).toMatchObject({ exact: true, lo: rational(1), hi: rational(1) });
    expect(iso.roots[3]).toMatchObject({ exact: true, lo: rational(-4) });
    expectContains(iso.roots[0], Math.SQRT2, '√2');
    expectContains(iso.roots[2], -Math.SQRT2, '-√2');
    expect(compare(sub(iso.roots[0].hi, iso.roots[0].lo), powerOfTwo(-50))).toBeLessThanOrEqual(0);
  });

  test('isolates close roots of a non-monic polynomial: (1000x - 1)(1000x - 2)(x - 5)', () => {
    const p = polyMul(polyMul(polynomial([-1, 1000]), polynomial([-2, 1000])), polynomial([-5, 1]));
    const iso = isolateRealRoots(p, 40);
    expect(iso.roots.length).toBe(3);
    expect(iso.roots[0]).toMatchObject({ exact: true, lo: rational(5) });
    expectContains(iso.roots[1], 0.002, '2/1000');
    expectContains(iso.roots[2], 0.001, '1/1000');
  });

  test('kthLargestRoot() counts multiplicity: Petersen λ1 = 3, λ2..λ6 = 1, λ7..λ10 = -2', () => {
    const p = characteristicPolynomial(integerGraphMatrix(F.petersen(), 'adjacency'));
    const at = (k: number) => kthLargestRoot(p, k).lo;
    expect([1, 2, 6, 7, 10].map((k) => Number(at(k).num))).toEqual([3, 1, 1, -2, -2]);
    expect(() => kthLargestRoot(p, 11)).toThrow(RangeError);
    // λ2(P_6) = 2cos(2π/7) = 1.2469796037174670...
    const r = kthLargestRoot(characteristicPolynomial(integerGraphMatrix(F.path(6), 'adjacency')), 2, 60);
    expectContains(r, 2 * Math.cos((2 * Math.PI) / 7), 'λ2(P_6)');
  });

  test('x^2 + 1 has no real roots; a constant has none', () => {
    expect(isolateRealRoots(polynomial([1, 0, 1])).roots).toEqual([]);
    expect(isolateRealRoots(polynomial([7])).roots).toEqual([]);
  });

  test('intervals of width 2^-bits for several bits, each holding the root', () => {
    const p = polynomial([-2, 0, 1]);
    for (const bits of [1, 10, 64, 200]) {
      const r = isolateRealRoots(p, bits).roots[0];
      expect(compare(sub(r.hi, r.lo), powerOfTwo(-bits))).toBeLessThanOrEqual(0);
      // lo^2 < 2 < hi^2, exactly.
      expect(compare(rational(r.lo.num * r.lo.num, r.lo.den * r.lo.den), rational(2))).toBe(-1);
      expect(compare(rational(r.hi.num * r.hi.num, r.hi.den * r.hi.den), rational(2))).toBe(1);
    }
  });
});

describe('certifiedSpectrum()', () => {
  test('paths: adjacency eigenvalues 2cos(πj/(n+1)) lie in their intervals', () => {
    for (let n = 1; n <= 16; n++) {
      const s = certifiedSpectrum(F.path(n), 'adjacency', 60);
      for (let j = 1; j <= n; j++)
        expectContains(s.eigenvalues[j - 1], 2 * Math.cos((Math.PI * j) / (n + 1)), `P_${n} λ${j}`);
    }
  });

  test('cycles: eigenvalues 2cos(2πj/n), sorted', () => {
    for (let n = 3; n <= 16; n++) {
      const expected = Array.from({ length: n }, (_, j) => 2 * Math.cos((2 * Math.PI * j) / n)).sort(
        (a, b) => b - a,
      );
      const s = certifiedSpectrum(F.cycle(n), 'adjacency', 60);
      expected.forEach((v, i) => expectContains(s.eigenvalues[i], v, `C_${n} λ${i + 1}`));
    }
  });

  test('Laplacian of paths: 2 - 2cos(πj/n)', () => {
    for (let n = 2; n <= 14; n++) {
      const expected = Array.from({ length: n }, (_, j) => 2 - 2 * Math.cos((Math.PI * j) / n)).sort(
        (a, b) => b - a,
      );
      const s = certifiedSpectrum(F.path(n), 'laplacian', 60);
      expected.forEach((v, i) => expectContains(s.eigenvalues[i], v, `L(P_${n}) μ${i + 1}`));
    }
  });

  test('hypercubes: d - 2k exactly, multiplicity C(d, k)', () => {
    for (let d = 1; d <= 5; d++) {
      const iso = isolateRealRoots(characteristicPolynomial(integerGraphMatrix(F.hypercube(d), 'adjacency')));
      expect(iso.roots.map((r) => [Number(r.lo.num), r.exact, r.multiplicity])).toEqual(
        Array.from({ length: d + 1 }, (_, k) => [d - 2 * k, true, binomial(d, k)]),
      );
    }
  });

  test('Petersen graph: 3, 1 (x5), -2 (x4), all exact', () => {
    const all = rootsWithMultiplicity(
      isolateRealRoots(characteristicPolynomial(integerGraphMatrix(F.petersen(), 'adjacency'))),
    );
    expect(all.map((r) => (r.exact ? Number(r.lo.num) : NaN))).toEqual([3, 1, 1, 1, 1, 1, -2, -2, -2, -2]);
  });

  test('normalized Laplacian of K_n: 0 and n/(n-1) (x n-1), exact rationals; isolated vertices add 0', () => {
    // Chung, "Spectral Graph Theory" (1997), §1.2: K_n has eigenvalues 0 and n/(n-1).
    for (let n = 2; n <= 7; n++) {
      const s = certifiedSpectrum(F.complete(n), 'normalizedLaplacian', 50);
      expect(
        s.eigenvalues
          .slice(0, n - 1)
          .every((e) => compare(e.lo, rational(n, n - 1)) === 0 && compare(e.hi, e.lo) === 0),
      ).toBe(true);
      expect(s.eigenvalues[n - 1]).toEqual({ lo: rational(0), hi: rational(0) });
    }
    const withIsolated = certifiedSpectrum(F.emptyGraph(3), 'normalizedLaplacian', 50);
    expect(withIsolated.eigenvalues).toEqual([0, 0, 0].map(() => ({ lo: rational(0), hi: rational(0) })));
    // Star K_(1,3): 2, 1, 1, 0 (Chung §1.2: the star has eigenvalues 0, 1 (n-2 times), 2).
    const star = certifiedSpectrum(F.star(4), 'normalizedLaplacian', 50);
    expect(star.eigenvalues.map((e) => Number(e.lo.num) / Number(e.lo.den))).toEqual([2, 1, 1, 0]);
  });
});

function binomial(n: number, k: number): number {
  let r = 1;
  for (let i = 1; i <= k; i++) r = (r * (n - k + i)) / i;
  return r;
}
