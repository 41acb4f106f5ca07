/**
 * Distance invariants against closed forms. Wiener index of P_n: (n^3 - n)/6 (H. Wiener,
 * J. Am. Chem. Soc. 69 (1947) 17–20; common textbook exercise); of K_n: C(n,2); of the star
 * K_{1,n-1}: (n-1)^2; of C_n: n^3/8 (n even), n(n^2-1)/8 (n odd) (common practice, e.g. Dobrynin,
 * Entringer, Gutman, Acta Appl. Math. 66 (2001) 211–249, Table 1).
 * Girth: C_n has n, Petersen 5, Q_d (d >= 2) 4, K_n (n >= 3) 3.
 */
import { describe, expect, test } from 'vitest';
import { computeInvariant } from '../../src/invariants/registry.js';
import * as F from '../../src/graph/families.js';

const inv = (g: Parameters<typeof computeInvariant>[0], name: string) => computeInvariant(g, name);

describe('wienerIndex', () => {
  test('wienerIndex(P_n) = (n^3 - n)/6', () => {
    for (const n of [1, 2, 3, 10, 40, 100]) expect(inv(F.path(n), 'wienerIndex')).toBe((n ** 3 - n) / 6);
  });
  test('wienerIndex(K_n) = C(n,2) and wienerIndex(star) = (n-1)^2', () => {
    for (const n of [2, 7, 33]) {
      expect(inv(F.complete(n), 'wienerIndex')).toBe((n * (n - 1)) / 2);
      expect(inv(F.star(n), 'wienerIndex')).toBe((n - 1) ** 2);
    }
  });
  test('wienerIndex(C_n) is n^3/8 or n(n^2-1)/8', () => {
    for (const n of [3, 4, 9, 10, 35])
      expect(inv(F.cycle(n), 'wienerIndex')).toBe(n % 2 === 0 ? n ** 3 / 8 : (n * (n * n - 1)) / 8);
  });
});

describe('diameter, radius, girth and the conventions of INVARIANTS.md', () => {
  test('diameter(P_n) = n-1, radius(P_n) = floor(n/2)', () => {
    for (const n of [1, 2, 5, 8, 70]) {
      expect(inv(F.path(n), 'diameter')).toBe(n - 1);
      expect(inv(F.path(n), 'radius')).toBe(Math.floor(n / 2));
    }
  });
  test('diameter(Q_d) = d across word boundaries (Q_6 has 64 vertices)', () => {
    expect(inv(F.hypercube(6), 'diameter')).toBe(6);
  });
  test('girth of C_n, Petersen, Q_3, K_4, trees', () => {
    expect(inv(F.cycle(11), 'girth')).toBe(11);
    expect(inv(F.petersen(), 'girth')).toBe(5);
    expect(inv(F.hypercube(3), 'girth')).toBe(4);
    expect(inv(F.complete(4), 'girth')).toBe(3);
    expect(inv(F.broom(5, 3), 'girth')).toBe(Infinity);
  });
  test('disconnected graphs have Infinity distances and n = 1 has zeros', () => {
    const g = F.emptyGraph(3);
    for (const name of ['diameter', 'radius', 'wienerIndex', 'averageDistance', 'proximity', 'remoteness']) {
      expect(inv(g, name), name).toBe(Infinity);
    }
    expect(inv(g, 'transmissions')).toEqual([Infinity, Infinity, Infinity]);
    const one = F.emptyGraph(1);
    for (const name of ['diameter', 'radius', 'wienerIndex', 'averageDistance', 'proximity', 'remoteness']) {
      expect(inv(one, name), name).toBe(0);
    }
  });
  test('proximity and remoteness of P_5 (transmissions 10, 7, 6, 7, 10)', () => {
    // Hand computation: transmissions of P_5 are 10,7,6,7,10, so π = 6/4, ρ = 10/4.
    expect(inv(F.path(5), 'proximity')).toBe(1.5);
    expect(inv(F.path(5), 'remoteness')).toBe(2.5);
  });
});

describe('triangles and degree indices', () => {
  test('triangleCount(K_n) = C(n,3), also across word boundaries', () => {
    for (const n of [3, 10, 33, 40])
      expect(inv(F.complete(n), 'triangleCount')).toBe((n * (n - 1) * (n - 2)) / 6);
  });
  test('triangleCount(friendship F_k) = k and of the wheel W_n = n-1 (n >= 5)', () => {
    expect(inv(F.friendship(5), 'triangleCount')).toBe(5);
    expect(inv(F.wheel(8), 'triangleCount')).toBe(7);
  });
  test('randicIndex of an r-regular graph is n/2 and of the star is sqrt(n-1)', () => {
    expect(inv(F.petersen(), 'randicIndex')).toBeCloseTo(5, 12);
    expect(inv(F.star(10), 'randicIndex')).toBeCloseTo(3, 12);
  });
  test('Zagreb indices of K_n: n(n-1)^2 and C(n,2)(n-1)^2', () => {
    const n = 7;
    expect(inv(F.complete(n), 'firstZagrebIndex')).toBe(n * (n - 1) ** 2);
    expect(inv(F.complete(n), 'secondZagrebIndex')).toBe(((n * (n - 1)) / 2) * (n - 1) ** 2);
  });
});
