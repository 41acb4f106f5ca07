/** Exact rationals and the outward conversions to doubles. Expected values by hand from the definitions. */
import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import {
  add,
  ceil,
  compare,
  div,
  floor,
  formatDecimalAbove,
  formatDecimalBelow,
  fromDouble,
  mul,
  rational,
  sub,
  toDouble,
  toDoubleAbove,
  toDoubleBelow,
} from '../../src/certify/rational.js';

describe('rational()', () => {
  test('rational() reduces and moves the sign to the numerator', () => {
    expect(rational(6, -4)).toEqual({ num: -3n, den: 2n });
    expect(rational(0, 7)).toEqual({ num: 0n, den: 1n });
    expect(rational(12, 16)).toEqual({ num: 3n, den: 4n }); // dyadic fast path
    expect(rational(-10, 8)).toEqual({ num: -5n, den: 4n });
  });

  test('rational() rejects a zero denominator', () => {
    expect(() => rational(1, 0)).toThrow(RangeError);
  });

  test('arithmetic matches the definitions on small fractions', () => {
    // 1/2 + 1/3 = 5/6; 1/2 - 1/3 = 1/6; (2/3)(9/4) = 3/2; (2/3)/(4/9) = 3/2
    expect(add(rational(1, 2), rational(1, 3))).toEqual(rational(5, 6));
    expect(sub(rational(1, 2), rational(1, 3))).toEqual(rational(1, 6));
    expect(mul(rational(2, 3), rational(9, 4))).toEqual(rational(3, 2));
    expect(div(rational(2, 3), rational(4, 9))).toEqual(rational(3, 2));
    expect(compare(rational(1, 3), rational(1, 2))).toBe(-1);
    expect(floor(rational(-7, 2))).toBe(-4n);
    expect(ceil(rational(-7, 2))).toBe(-3n);
    expect(floor(rational(7, 2))).toBe(3n);
  });
});

describe('double conversions', () => {
  test('fromDouble() is exact: 0.1 is 3602879701896397 / 2^55 (IEEE-754 binary64)', () => {
    expect(fromDouble(0.1)).toEqual({ num: 3602879701896397n, den: 2n ** 55n });
    expect(fromDouble(-2.5)).toEqual(rational(-5, 2));
    expect(fromDouble(Number.MIN_VALUE)).toEqual({ num: 1n, den: 2n ** 1074n });
  });

  test('toDoubleBelow() / toDoubleAbove() bracket 1/3 by adjacent doubles', () => {
    const third = rational(1, 3);
    const lo = toDoubleBelow(third);
    const hi = toDoubleAbove(third);
    expect(compare(fromDouble(lo), third)).toBe(-1);
    expect(compare(fromDouble(hi), third)).toBe(1);
    // Adjacent: nothing representable in between (1/3 in binary64 is 0x3FD5555555555555).
    expect(lo).toBe(1 / 3);
    expect(hi).toBe(0.33333333333333337);
  });

  test('toDouble*() round-trip every double exactly (property)', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true }), (x) => {
        const r = fromDouble(x);
        return toDoubleBelow(r) === x && toDoubleAbove(r) === x && toDouble(r) === (x === 0 ? 0 : x);
      }),
      { numRuns: 300 },
    );
  });

  test('toDoubleBelow() <= r <= toDoubleAbove() for random fractions (property)', () => {
    fc.assert(
      fc.property(
        fc.bigInt({ min: -(10n ** 30n), max: 10n ** 30n }),
        fc.bigInt({ min: 1n, max: 10n ** 25n }),
        (n, d) => {
          const r = rational(n, d);
          return (
            compare(fromDouble(toDoubleBelow(r)), r) <= 0 && compare(fromDouble(toDoubleAbove(r)), r) >= 0
          );
        },
      ),
      { numRuns: 300 },
    );
  });

  test('formatDecimalBelow/Above() round outward', () => {
    expect(formatDecimalBelow(rational(2, 3), 4)).toBe('0.6666');
    expect(formatDecimalAbove(rational(2, 3), 4)).toBe('0.6667');
    expect(formatDecimalBelow(rational(-2, 3), 4)).toBe('-0.6667');
    expect(formatDecimalAbove(rational(-2, 3), 4)).toBe('-0.6666');
    expect(formatDecimalBelow(rational(5), 2)).toBe('5.00');
  });
});
