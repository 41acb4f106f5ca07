/**
 * Univariate polynomials with integer (BigInt) coefficients: arithmetic, exact sign at a
 * rational point, pseudo-division, greatest common divisors and square-free decomposition.
 *
 * A polynomial is the array of its coefficients in increasing degree, `p[i]` the coefficient of
 * x^i, with no trailing zeros (the zero polynomial is `[]`).
 *
 * GCDs use the primitive polynomial remainder sequence (D. E. Knuth, "The Art of Computer
 * Programming", vol. 2, 3rd ed., Addison-Wesley 1997, §4.6.1, Algorithm E). Square-free
 * decomposition uses the repeated-gcd method with the derivative, as surveyed in D. Y. Y. Yun,
 * "On square-free decomposition algorithms", Proc. ACM SYMSAC 1976, 26–35.
 * By Gauss's lemma a primitive divisor b of an integer polynomial a leaves an integer quotient,
 * so every division here is exact over the integers.
 */
import { type Rational, rational } from './rational.js';

/** Coefficients in increasing degree, no trailing zeros. */
export type IntPolynomial = readonly bigint[];

function trim(c: bigint[]): bigint[] {
  let k = c.length;
  while (k > 0 && c[k - 1] === 0n) k--;
  c.length = k;
  return c;
}

/** The polynomial with these coefficients (increasing degree), trailing zeros removed. */
export function polynomial(coefficients: ReadonlyArray<bigint | number>): IntPolynomial {
  return trim(coefficients.map((c) => BigInt(c)));
}

/** Degree; -1 for the zero polynomial. */
export function degree(p: IntPolynomial): number {
  return p.length - 1;
}

export function leadingCoefficient(p: IntPolynomial): bigint {
  return p.length === 0 ? 0n : p[p.length - 1];
}

export function polyEquals(a: IntPolynomial, b: IntPolynomial): boolean {
  return a.length === b.length && a.every((c, i) => c === b[i]);
}

export function polyAdd(a: IntPolynomial, b: IntPolynomial): IntPolynomial {
  const out = new Array<bigint>(Math.max(a.length, b.length)).fill(0n);
  for (let i = 0; i < a.length; i++) out[i] += a[i];
  for (let i = 0; i < b.length; i++) out[i] += b[i];
  return trim(out);
}

export function polyScale(a: IntPolynomial, k: bigint): IntPolynomial {
  return trim(a.map((c) => c * k));
}

export function polySub(a: IntPolynomial, b: IntPolynomial): IntPolynomial {
  return polyAdd(a, polyScale(b, -1n));
}

export function polyMul(a: IntPolynomial, b: IntPolynomial): IntPolynomial {
  if (a.length === 0 || b.length === 0) return [];
  const out = new Array<bigint>(a.length + b.length - 1).fill(0n);
  for (let i = 0; i < a.length; i++) {
    if (a[i] === 0n) continue;
    for (let j = 0; j < b.length; j++) out[i + j] += a[i] * b[j];
  }
  return trim(out);
}

/** p^k for k >= 0. */
export function polyPow(p: IntPolynomial, k: number): IntPolynomial {
  let out: IntPolynomial = [1n];
  for (let i = 0; i < k; i++) out = polyMul(out, p);
  return out;
}

export function derivative(p: IntPolynomial): IntPolynomial {
  const out: bigint[] = [];
  for (let i = 1; i < p.length; i++) out.push(BigInt(i) * p[i]);
  return trim(out);
}

/** p(x) at an integer. */
export function evaluateAtInteger(p: IntPolynomial, x: bigint): bigint {
  let acc = 0n;
  for (let i = p.length - 1; i >= 0; i--) acc = acc * x + p[i];
  return acc;
}

/**
 * den^deg(p) * p(num/den), an integer with the sign of p at the rational (den > 0): Horner's
 * rule on the homogenised polynomial, so the sign is exact.
 */
export function homogenisedValue(p: IntPolynomial, x: Rational): bigint {
  let acc = 0n;
  let denPower = 1n;
  for (let i = p.length - 1; i >= 0; i--) {
    acc = acc * x.num + p[i] * denPower;
    denPower *= x.den;
  }
  return acc;
}

/** Sign (-1, 0, 1) of p at a rational point, exactly. */
export function signAt(p: IntPolynomial, x: Rational): number {
  const v = homogenisedValue(p, x);
  return v < 0n ? -1 : v > 0n ? 1 : 0;
}

/** p at a rational point, exactly. */
export function evaluateAt(p: IntPolynomial, x: Rational): Rational {
  return rational(homogenisedValue(p, x), x.den ** BigInt(Math.max(0, p.length - 1)));
}

function gcdBig(a: bigint, b: bigint): bigint {
  if (a < 0n) a = -a;
  if (b < 0n) b = -b;
  while (b !== 0n) [a, b] = [b, a % b];
  return a;
}

/** Positive gcd of the coefficients (0 for the zero polynomial). */
export function content(p: IntPolynomial): bigint {
  let g = 0n;
  for (const c of p) {
    g = gcdBig(g, c);
    if (g === 1n) break;
  }
  return g;
}

/** p divided by its content, with a positive leading coefficient. */
export function primitivePart(p: IntPolynomial): IntPolynomial {
  if (p.length === 0) return [];
  let c = content(p);
  if (leadingCoefficient(p) < 0n) c = -c;
  return p.map((x) => x / c);
}

/**
 * Pseudo-remainder: the r with lc(b)^(deg a - deg b + 1) * a = q * b + r and deg r < deg b
 * (Knuth §4.6.1, Algorithm R). b must be non-zero.
 */
export function pseudoRemainder(a: IntPolynomial, b: IntPolynomial): IntPolynomial {
  if (b.length === 0) throw new RangeError('Expected a non-zero divisor polynomial but found 0');
  const r = a.slice();
  const db = b.length - 1;
  const lb = b[db];
  for (let k = r.length - 1; k >= db; k--) {
    const lead = r[k];
    for (let i = 0; i <= k; i++) r[i] *= lb;
    if (lead !== 0n) for (let i = 0; i <= db; i++) r[k - db + i] -= lead * b[i];
  }
  r.length = Math.min(r.length, db);
  // Each of the (deg a - deg b + 1) steps multiplied by lb exactly once, as the definition asks.
  return trim(r);
}

/** Exact quotient a / b over the integers; throws if b does not divide a. */
export function exactQuotient(a: IntPolynomial, b: IntPolynomial): IntPolynomial {
  if (b.length === 0) throw new RangeError('Expected a non-zero divisor polynomial but found 0');
  const r = a.slice();
  const db = b.length - 1;
  const lb = b[db];
  if (r.length < b.length) {
    if (r.length === 0) return [];
    throw new RangeError('Expected an exact polynomial division but the degree is too small');
  }
  const q = new Array<bigint>(r.length - db).fill(0n);
  for (let k = r.length - 1; k >= db; k--) {
    if (r[k] % lb !== 0n) throw new RangeError('Expected an exact polynomial division but found a remainder');
    const c = r[k] / lb;
    q[k - db] = c;
    if (c !== 0n) for (let i = 0; i <= db; i++) r[k - db + i] -= c * b[i];
  }
  for (let i = 0; i < db; i++)
    if (r[i] !== 0n) throw new RangeError('Expected an exact polynomial division but found a remainder');
  return trim(q);
}

/** Primitive gcd of a and b (positive leading coefficient); gcd(0, 0) = 0. */
export function polyGcd(a: IntPolynomial, b: IntPolynomial): IntPolynomial {
  let u = primitivePart(a);
  let v = primitivePart(b);
  if (u.length < v.length) [u, v] = [v, u];
  while (v.length > 0) {
    const r = primitivePart(pseudoRemainder(u, v));
    u = v;
    v = r;
  }
  return u;
}

/**
 * Square-free decomposition: primitive, pairwise coprime, square-free f_1, f_2, ... with
 * p = c * f_1 * f_2^2 * f_3^3 ... for a rational constant c; `factors[i]` is f_(i+1) (the
 * constant polynomial [1n] where no root has that multiplicity). Repeated gcd with the
 * derivative: g_0 = p, g_(i+1) = gcd(g_i, g_i'); h_i = g_(i-1) / g_i is the product of the
 * factors of multiplicity >= i, and f_i = h_i / h_(i+1).
 */
export function squareFreeDecomposition(p: IntPolynomial): IntPolynomial[] {
  if (p.length === 0) throw new RangeError('Expected a non-zero polynomial but found 0');
  const g: IntPolynomial[] = [primitivePart(p)];
  while (degree(g[g.length - 1]) > 0) {
    const last = g[g.length - 1];
    g.push(polyGcd(last, derivative(last)));
  }
  const h: IntPolynomial[] = [];
  for (let i = 1; i < g.length; i++) h.push(exactQuotient(g[i - 1], g[i]));
  h.push([1n]);
  const factors: IntPolynomial[] = [];
  for (let i = 0; i + 1 < h.length; i++) factors.push(primitivePart(exactQuotient(h[i], h[i + 1])));
  return factors;
}

/** The square-free part (product of the distinct irreducible factors), primitive. */
export function squareFreePart(p: IntPolynomial): IntPolynomial {
  const g = polyGcd(p, derivative(p));
  return primitivePart(exactQuotient(primitivePart(p), g));
}

/** Human form in decreasing degree, e.g. "x^3 - 2*x + 1". */
export function formatPolynomial(p: IntPolynomial, variable = 'x'): string {
  if (p.length === 0) return '0';
  const parts: string[] = [];
  for (let i = p.length - 1; i >= 0; i--) {
    const c = p[i];
    if (c === 0n) continue;
    const magnitude = c < 0n ? -c : c;
    const power = i === 0 ? '' : i === 1 ? variable : `${variable}^${i}`;
    const body = i === 0 ? `${magnitude}` : magnitude === 1n ? power : `${magnitude}*${power}`;
    if (parts.length === 0) parts.push(c < 0n ? `-${body}` : body);
    else parts.push(c < 0n ? `- ${body}` : `+ ${body}`);
  }
  return parts.join(' ');
}
