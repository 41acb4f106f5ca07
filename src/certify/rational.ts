/**
 * Exact rational numbers over BigInt, and the exact conversions between rationals and IEEE-754
 * doubles that certification needs (every double is a dyadic rational, so `fromDouble` is
 * exact; `toDoubleBelow` / `toDoubleAbove` round outward, so an interval of rationals always
 * converts to a double interval that still contains it).
 *
 * A {@link Rational} is kept in lowest terms with a positive denominator, so equal values have
 * equal representations. Arithmetic follows the textbook definitions (D. E. Knuth, "The Art of
 * Computer Programming", vol. 2, 3rd ed., Addison-Wesley 1997, §4.5.1).
 */

/** num / den in lowest terms, den > 0. */
export interface Rational {
  readonly num: bigint;
  readonly den: bigint;
}

function gcdBig(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

/** The rational num / den, reduced. Throws RangeError on a zero denominator. */
export function rational(num: bigint | number, den: bigint | number = 1n): Rational {
  let n = BigInt(num);
  let d = BigInt(den);
  if (d === 0n) throw new RangeError('Expected a non-zero denominator but found 0');
  if (d < 0n) {
    n = -n;
    d = -d;
  }
  if ((d & (d - 1n)) === 0n) {
    // Dyadic (every bisection point is): the gcd is the lowest set bit of n, capped by d.
    if (n === 0n) return { num: 0n, den: 1n };
    const low = n & -n;
    const g = low < d ? low : d;
    return g === 1n ? { num: n, den: d } : { num: n / g, den: d / g };
  }
  const g = gcdBig(n, d);
  return g === 1n || g === 0n ? { num: n, den: d } : { num: n / g, den: d / g };
}

export const ZERO: Rational = { num: 0n, den: 1n };
export const ONE: Rational = { num: 1n, den: 1n };

export function add(a: Rational, b: Rational): Rational {
  if (a.den === b.den) return rational(a.num + b.num, a.den);
  return rational(a.num * b.den + b.num * a.den, a.den * b.den);
}

export function sub(a: Rational, b: Rational): Rational {
  return add(a, neg(b));
}

export function mul(a: Rational, b: Rational): Rational {
  return rational(a.num * b.num, a.den * b.den);
}

export function div(a: Rational, b: Rational): Rational {
  if (b.num === 0n) throw new RangeError('Expected a non-zero divisor but found 0');
  return rational(a.num * b.den, a.den * b.num);
}

export function neg(a: Rational): Rational {
  return { num: -a.num, den: a.den };
}

export function abs(a: Rational): Rational {
  return a.num < 0n ? neg(a) : a;
}

/** -1, 0 or 1 as a < b, a = b, a > b. */
export function compare(a: Rational, b: Rational): number {
  const l = a.num * b.den;
  const r = b.num * a.den;
  return l < r ? -1 : l > r ? 1 : 0;
}

export function sign(a: Rational): number {
  return a.num < 0n ? -1 : a.num > 0n ? 1 : 0;
}

export function min(a: Rational, b: Rational): Rational {
  return compare(a, b) <= 0 ? a : b;
}

export function max(a: Rational, b: Rational): Rational {
  return compare(a, b) >= 0 ? a : b;
}

/** (a + b) / 2. */
export function midpoint(a: Rational, b: Rational): Rational {
  return mul(add(a, b), { num: 1n, den: 2n });
}

export function isInteger(a: Rational): boolean {
  return a.den === 1n;
}

/** Largest integer <= a. */
export function floor(a: Rational): bigint {
  const q = a.num / a.den; // truncates toward zero
  return a.num < 0n && q * a.den !== a.num ? q - 1n : q;
}

/** Smallest integer >= a. */
export function ceil(a: Rational): bigint {
  return -floor(neg(a));
}

/** 2^k as a rational (k may be negative). */
export function powerOfTwo(k: number): Rational {
  return k >= 0 ? { num: 1n << BigInt(k), den: 1n } : { num: 1n, den: 1n << BigInt(-k) };
}

const scratch = new DataView(new ArrayBuffer(8));

/** The exact rational value of a finite double. Throws RangeError on NaN or ±Infinity. */
export function fromDouble(x: number): Rational {
  if (!Number.isFinite(x)) throw new RangeError(`Expected a finite number but found ${x}`);
  if (Number.isInteger(x)) return { num: BigInt(x), den: 1n };
  scratch.setFloat64(0, x);
  const hi = scratch.getUint32(0);
  const lo = scratch.getUint32(4);
  const negative = hi >>> 31 === 1;
  const exponent = (hi >>> 20) & 0x7ff;
  let mantissa = (BigInt(hi & 0xfffff) << 32n) | BigInt(lo);
  let e: number;
  if (exponent === 0) e = -1074;
  else {
    mantissa |= 1n << 52n;
    e = exponent - 1075;
  }
  const r = e >= 0 ? rational(mantissa << BigInt(e), 1n) : rational(mantissa, 1n << BigInt(-e));
  return negative ? neg(r) : r;
}

/** The next double above x (x finite). */
function nextUp(x: number): number {
  if (x === 0) return Number.MIN_VALUE;
  scratch.setFloat64(0, x);
  let bits = scratch.getBigUint64(0);
  bits = x > 0 ? bits + 1n : bits - 1n;
  scratch.setBigUint64(0, bits);
  return scratch.getFloat64(0);
}

function nextDown(x: number): number {
  return -nextUp(-x);
}

/** A double within a few units in the last place of a (not yet directed). */
function approximateDouble(a: Rational): number {
  if (a.num === 0n) return 0;
  // Scale so that the integer quotient carries about 64 significant bits; apply 2^-shift in two
  // halves so that neither factor underflows or overflows on its own (subnormal results).
  const shift = 64 - (bitLength(a.num) - bitLength(a.den));
  const q = shift >= 0 ? (a.num << BigInt(shift)) / a.den : a.num / (a.den << BigInt(-shift));
  const half = Math.trunc(shift / 2);
  return Number(q) * 2 ** -half * 2 ** -(shift - half);
}

function bitLength(x: bigint): number {
  if (x < 0n) x = -x;
  return x === 0n ? 0 : x.toString(2).length;
}

/** The largest double <= a (-Infinity when a is below -Number.MAX_VALUE). */
export function toDoubleBelow(a: Rational): number {
  let d = approximateDouble(a);
  if (d === Infinity) d = Number.MAX_VALUE;
  else if (d === -Infinity) d = -Number.MAX_VALUE;
  while (compare(fromDouble(d), a) > 0) {
    if (d === -Number.MAX_VALUE) return -Infinity;
    d = nextDown(d);
  }
  for (;;) {
    if (d === Number.MAX_VALUE) return d;
    const up = nextUp(d);
    if (compare(fromDouble(up), a) > 0) return d;
    d = up;
  }
}

/** The smallest double >= a. */
export function toDoubleAbove(a: Rational): number {
  return -toDoubleBelow(neg(a));
}

/** The double nearest to a (ties resolved toward the lower one; used for display only). */
export function toDouble(a: Rational): number {
  const lo = toDoubleBelow(a);
  const hi = toDoubleAbove(a);
  if (lo === hi || !Number.isFinite(lo) || !Number.isFinite(hi)) return Number.isFinite(lo) ? lo : hi;
  return compare(sub(a, fromDouble(lo)), sub(fromDouble(hi), a)) <= 0 ? lo : hi;
}

/** "p/q", or "p" for an integer. */
export function formatRational(a: Rational): string {
  return a.den === 1n ? a.num.toString() : `${a.num}/${a.den}`;
}

/** Exact decimal expansion truncated toward -Infinity after `digits` places, for display. */
export function formatDecimalBelow(a: Rational, digits: number): string {
  const scale = 10n ** BigInt(digits);
  const scaled = floor(mul(a, { num: scale, den: 1n }));
  return scaledToDecimal(scaled, digits);
}

/** Exact decimal expansion rounded toward +Infinity after `digits` places. */
export function formatDecimalAbove(a: Rational, digits: number): string {
  const scale = 10n ** BigInt(digits);
  const scaled = ceil(mul(a, { num: scale, den: 1n }));
  return scaledToDecimal(scaled, digits);
}

function scaledToDecimal(scaled: bigint, digits: number): string {
  const negative = scaled < 0n;
  const s = (negative ? -scaled : scaled).toString().padStart(digits + 1, '0');
  const whole = s.slice(0, s.length - digits);
  const frac = s.slice(s.length - digits);
  return `${negative ? '-' : ''}${whole}${digits > 0 ? '.' + frac : ''}`;
}
