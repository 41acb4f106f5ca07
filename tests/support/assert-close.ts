/** Float comparisons with an explicit tolerance, for spectra and real invariants. */
import { expect } from 'vitest';

export function expectClose(actual: number, expected: number, tolerance = 1e-9, label = ''): void {
  if (!Number.isFinite(expected)) {
    expect(actual, label).toBe(expected);
    return;
  }
  expect(Math.abs(actual - expected), `${label}: ${actual} vs ${expected}`).toBeLessThanOrEqual(tolerance);
}

export function expectAllClose(
  actual: ArrayLike<number>,
  expected: ArrayLike<number>,
  tolerance = 1e-9,
  label = '',
): void {
  expect(actual.length, `${label}: length`).toBe(expected.length);
  for (let i = 0; i < expected.length; i++) expectClose(actual[i], expected[i], tolerance, `${label}[${i}]`);
}

/** Sorted non-increasing copy. */
export function descending(xs: ReadonlyArray<number>): number[] {
  return [...xs].sort((a, b) => b - a);
}
