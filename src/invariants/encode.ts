/**
 * How invariant values are written: JSON (Infinity as the string "Infinity", integers above
 * 2^53 as decimal strings, per shared/INVARIANTS.md) and the human table.
 */
import { type InvariantValue } from './registry.js';

type JsonScalar = number | string | boolean;

function scalarToJson(x: number | bigint | boolean): JsonScalar {
  if (typeof x === 'bigint')
    return x <= BigInt(Number.MAX_SAFE_INTEGER) && x >= -BigInt(Number.MAX_SAFE_INTEGER)
      ? Number(x)
      : x.toString();
  if (typeof x === 'number' && !Number.isFinite(x))
    return Number.isNaN(x) ? 'NaN' : x > 0 ? 'Infinity' : '-Infinity';
  return x;
}

/** The JSON form of an invariant value. */
export function invariantToJson(value: InvariantValue): JsonScalar | JsonScalar[] {
  if (Array.isArray(value)) return (value as number[]).map(scalarToJson);
  return scalarToJson(value as number | bigint | boolean);
}

/** A number for people: integers exactly, reals to 10 significant digits without trailing zeros. */
export function formatNumber(x: number): string {
  if (Number.isInteger(x) || !Number.isFinite(x)) return String(x);
  const s = x.toPrecision(10);
  if (s.includes('e')) return s;
  return s.replace(/\.?0+$/, '');
}

/** Magnitude below which a list entry is printed as 0 (display only). */
const DISPLAY_ZERO = 1e-12;

/** The human form of an invariant value. */
export function formatInvariant(value: InvariantValue): string {
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'bigint') return value.toString();
  if (typeof value === 'number') return formatNumber(value);
  // In a printed spectrum, a solver residue such as 4.8e-16 stands for 0; JSON keeps the raw value.
  return (value as number[]).map((x) => formatNumber(Math.abs(x) < DISPLAY_ZERO ? 0 : x)).join(' ');
}
