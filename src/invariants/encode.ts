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

/** The human form of an invariant value. */
export function formatInvariant(value: InvariantValue): string {
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  if (typeof value === 'bigint') return value.toString();
  if (typeof value === 'number') return formatNumber(value);
  return (value as number[]).map(formatNumber).join(' ');
}
