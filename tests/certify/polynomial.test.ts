/** Integer polynomials: gcd, exact division, square-free decomposition, exact signs. Products built by hand. */
import { describe, expect, test } from 'vitest';
import {
  derivative,
  exactQuotient,
  formatPolynomial,
  polyGcd,
  polyMul,
  polyPow,
  polySub,
  polynomial,
  polyScale,
  pseudoRemainder,
  signAt,
  squareFreeDecomposition,
  squareFreePart,
  leadingCoefficient,
  degree,
} from '../../src/certify/polynomial.js';
import { rational } from '../../src/certify/rational.js';

const x = (c: number) => polynomial([-c, 1]); // x - c
const X2m2 = polynomial([-2, 0, 1]); // x^2 - 2

describe('polynomial arithmetic', () => {
  test('formatPolynomial() writes decreasing degree', () => {
    expect(formatPolynomial(polynomial([1, -2, 0, 1]))).toBe('x^3 - 2*x + 1');
    expect(formatPolynomial(polynomial([0]))).toBe('0');
  });

  test('derivative() of x^3 - 2x + 1 is 3x^2 - 2', () => {
    expect(derivative(polynomial([1, -2, 0, 1]))).toEqual(polynomial([-2, 0, 3]));
  });

  test('pseudoRemainder() satisfies lc(b)^(deg a - deg b + 1) a - r ≡ 0 mod b', () => {
    const a = polynomial([3, 1, -4, 1, 5, 9]);
    const b = polynomial([2, -6, 5]);
    const r = pseudoRemainder(a, b);
    expect(degree(r)).toBeLessThan(degree(b));
    const lhs = polySub(polyScale(a, leadingCoefficient(b) ** BigInt(degree(a) - degree(b) + 1)), r);
    expect(() => exactQuotient(lhs, b)).not.toThrow();
  });

  test('exactQuotient() divides exactly and refuses a remainder', () => {
    const p = polyMul(x(1), X2m2);
    expect(exactQuotient(p, X2m2)).toEqual(x(1));
    expect(() => exactQuotient(p, x(3))).toThrow(/remainder/);
  });

  test('polyGcd() of (x-1)^2 (x^2-2) and (x-1)(x+3) is x - 1', () => {
    expect(polyGcd(polyMul(polyPow(x(1), 2), X2m2), polyMul(x(1), x(-3)))).toEqual(x(1));
  });
});

describe('squareFreeDecomposition()', () => {
  test('(x^2-2)(x-1)^3(x+2)^3 (x-5)^5 splits by multiplicity', () => {
    const p = polyMul(polyMul(X2m2, polyPow(polyMul(x(1), x(-2)), 3)), polyPow(x(5), 5));
    const f = squareFreeDecomposition(polyScale(p, 6n));
    expect(f.length).toBe(5);
    expect(f[0]).toEqual(X2m2);
    expect(f[1]).toEqual([1n]);
    expect(f[2]).toEqual(polyMul(x(1), x(-2)));
    expect(f[3]).toEqual([1n]);
    expect(f[4]).toEqual(x(5));
    expect(squareFreePart(p)).toEqual(polyMul(polyMul(X2m2, polyMul(x(1), x(-2))), x(5)));
  });
});

describe('signAt()', () => {
  test('x^2 - 2 changes sign between 1.4142 and 1.4143 (√2 = 1.41421356...)', () => {
    expect(signAt(X2m2, rational(14142, 10000))).toBe(-1);
    expect(signAt(X2m2, rational(14143, 10000))).toBe(1);
    expect(signAt(x(3), rational(3))).toBe(0);
  });
});
