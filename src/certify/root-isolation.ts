/**
 * Real-root isolation of integer polynomials in rational intervals, with multiplicities.
 *
 * Method: Sturm's theorem (C. Sturm, "Mémoire sur la résolution des équations numériques",
 * Bull. Sci. Férussac 11 (1829) 419–422; as stated in S. Basu, R. Pollack and M.-F. Roy,
 * "Algorithms in Real Algebraic Geometry", 2nd ed., Springer 2006, Thm. 2.50) applied to the
 * square-free part s of p: for a < b, neither a root of s, the number of distinct real roots of
 * s in (a, b) is V(a) - V(b), V the number of sign changes in the Sturm chain
 * s, s', -rem(s, s'), ... (each remainder replaced by a positive multiple of its primitive part,
 * which keeps the signs and the integers small). Starting from (-B, B), B a power of two above
 * Cauchy's bound 1 + max|c_i / c_d|, intervals are bisected until each holds one root; then the
 * root is refined by bisection on the sign of s alone. Once an interval is at most 1 wide, the
 * one integer it may contain is tested exactly: the rational roots of a monic integer
 * polynomial (every characteristic polynomial, and each of its primitive factors, is monic by
 * Gauss's lemma) are integers, so integer eigenvalues come out exact.
 *
 * Multiplicities come from the square-free decomposition p = c f_1 f_2^2 f_3^3 ...: a root of s
 * isolated in (lo, hi) has multiplicity i exactly when f_i changes sign over the interval (or
 * vanishes there, for an exact root), because the f_i are square-free and pairwise coprime.
 */
import {
  type IntPolynomial,
  degree,
  derivative,
  leadingCoefficient,
  primitivePart,
  pseudoRemainder,
  signAt,
  squareFreeDecomposition,
} from './polynomial.js';
import { type Rational, ONE, ceil, compare, midpoint, neg, powerOfTwo, rational, sub } from './rational.js';

/** A real root in [lo, hi]: lo = hi when exact; otherwise the only root of p in (lo, hi). */
export interface IsolatedRoot {
  readonly lo: Rational;
  readonly hi: Rational;
  readonly exact: boolean;
  readonly multiplicity: number;
}

/** Distinct real roots of p, largest first, and the polynomials the isolation used. */
export interface RootIsolation {
  /** The primitive square-free part s = f_1 f_2 f_3 ... whose sign changes bracket each root. */
  readonly squareFree: IntPolynomial;
  /** Square-free decomposition f_1, f_2, ... of p (f_i: the roots of multiplicity i). */
  readonly factors: readonly IntPolynomial[];
  readonly roots: readonly IsolatedRoot[];
}

/** How narrow refined intervals must be: hi - lo <= 2^-bits. */
export const DEFAULT_ISOLATION_BITS = 64;

/** The Sturm chain of a square-free polynomial (positive multiples of the classical one). */
export function sturmChain(s: IntPolynomial): IntPolynomial[] {
  const chain: IntPolynomial[] = [s, derivative(s)];
  while (degree(chain[chain.length - 1]) > 0) {
    const a = chain[chain.length - 2];
    const b = chain[chain.length - 1];
    const r = pseudoRemainder(a, b);
    if (r.length === 0) break;
    // prem = lc(b)^(δ+1) * rem; -rem is a positive multiple of -sign(lc(b))^(δ+1) * prem.
    const delta = degree(a) - degree(b) + 1;
    const flip = leadingCoefficient(b) < 0n && delta % 2 === 1;
    const pp = primitivePart(r); // positive leading coefficient
    const sameSignAsR = leadingCoefficient(r) > 0n;
    // want: next = -rem up to a positive factor = (flip ? +1 : -1) * r up to a positive factor.
    const wantSignOfR = flip ? 1 : -1;
    const next = (sameSignAsR ? 1 : -1) * wantSignOfR > 0 ? pp : pp.map((c) => -c);
    chain.push(next);
  }
  return chain;
}

/** Sign changes of the chain at x, zeros skipped. */
export function signVariations(chain: readonly IntPolynomial[], x: Rational): number {
  let changes = 0;
  let previous = 0;
  for (const p of chain) {
    const s = signAt(p, x);
    if (s === 0) continue;
    if (previous !== 0 && s !== previous) changes++;
    previous = s;
  }
  return changes;
}

/** A power of two strictly above every |root| of p (Cauchy's bound). */
export function rootBound(p: IntPolynomial): bigint {
  const lc = leadingCoefficient(p) < 0n ? -leadingCoefficient(p) : leadingCoefficient(p);
  let maxAbs = 0n;
  for (let i = 0; i < p.length - 1; i++) {
    const c = p[i] < 0n ? -p[i] : p[i];
    if (c > maxAbs) maxAbs = c;
  }
  const m = (maxAbs + lc - 1n) / lc + 1n; // ceil(maxAbs / lc) + 1 >= Cauchy's bound
  return 1n << BigInt(m.toString(2).length); // 2^bitlength(m) > m
}

interface Pending {
  lo: Rational;
  hi: Rational;
  vlo: number;
  vhi: number;
}

/**
 * Isolates every distinct real root of p (non-zero), largest first, each refined to width
 * <= 2^-bits (exact roots have width 0).
 */
export function isolateRealRoots(p: IntPolynomial, bits: number = DEFAULT_ISOLATION_BITS): RootIsolation {
  if (p.length === 0) throw new RangeError('Expected a non-zero polynomial but found 0');
  const factors = squareFreeDecomposition(p);
  let s: IntPolynomial = [1n];
  for (const f of factors) s = multiply(s, f);
  s = primitivePart(s);
  if (degree(s) <= 0) return { squareFree: s, factors, roots: [] };
  const chain = sturmChain(s);
  const bound = rational(rootBound(s));
  const found: Array<{ lo: Rational; hi: Rational; exact: boolean }> = [];
  const stack: Pending[] = [
    { lo: neg(bound), hi: bound, vlo: signVariations(chain, neg(bound)), vhi: signVariations(chain, bound) },
  ];
  while (stack.length > 0) {
    const { lo, hi, vlo, vhi } = stack.pop()!;
    const count = vlo - vhi;
    if (count <= 0) continue;
    if (count === 1) {
      found.push({ lo, hi, exact: false });
      continue;
    }
    const mid = midpoint(lo, hi);
    if (signAt(s, mid) !== 0) {
      const vmid = signVariations(chain, mid);
      stack.push({ lo, hi: mid, vlo, vhi: vmid }, { lo: mid, hi, vlo: vmid, vhi });
      continue;
    }
    // mid is a root: exclude a small neighbourhood holding it alone, then continue on both sides.
    found.push({ lo: mid, hi: mid, exact: true });
    let half = mul2(sub(hi, lo), -2);
    for (;;) {
      const a = sub(mid, half);
      const b = addR(mid, half);
      if (signAt(s, a) !== 0 && signAt(s, b) !== 0) {
        const va = signVariations(chain, a);
        const vb = signVariations(chain, b);
        if (va - vb === 1) {
          stack.push({ lo, hi: a, vlo, vhi: va }, { lo: b, hi, vlo: vb, vhi });
          break;
        }
      }
      half = mul2(half, -1);
    }
  }
  const refined = found.map((r) => (r.exact ? r : refineIsolatingInterval(s, r.lo, r.hi, bits)));
  refined.sort((x, y) => compare(y.lo, x.lo));
  const roots = refined.map((r) => ({ ...r, multiplicity: multiplicityOf(factors, r) }));
  return { squareFree: s, factors, roots };
}

/**
 * Narrows (lo, hi), which holds exactly one root of the square-free s and no root at its
 * ends, to width <= 2^-bits by bisection on the sign of s; returns an exact root if a
 * midpoint is one.
 */
export function refineIsolatingInterval(
  s: IntPolynomial,
  lo: Rational,
  hi: Rational,
  bits: number,
): { lo: Rational; hi: Rational; exact: boolean } {
  const target = powerOfTwo(-bits);
  let a = lo;
  let b = hi;
  const signA = signAt(s, a);
  let integerChecked = false;
  for (;;) {
    const width = sub(b, a);
    if (!integerChecked && compare(width, ONE) <= 0) {
      // At most one integer lies strictly inside; s is monic, so its rational roots are integers.
      integerChecked = true;
      const k = rational(ceil(a));
      if (compare(k, a) > 0 && compare(k, b) < 0 && signAt(s, k) === 0) return { lo: k, hi: k, exact: true };
    }
    if (integerChecked && compare(width, target) <= 0) return { lo: a, hi: b, exact: false };
    const m = midpoint(a, b);
    const sm = signAt(s, m);
    if (sm === 0) return { lo: m, hi: m, exact: true };
    if (sm === signA) a = m;
    else b = m;
  }
}

function multiplicityOf(
  factors: readonly IntPolynomial[],
  r: { lo: Rational; hi: Rational; exact: boolean },
): number {
  for (let i = 0; i < factors.length; i++) {
    const f = factors[i];
    if (degree(f) <= 0) continue;
    if (r.exact ? signAt(f, r.lo) === 0 : signAt(f, r.lo) !== signAt(f, r.hi)) return i + 1;
  }
  throw new Error('root isolation: a root of the square-free part belongs to no factor (internal error)');
}

/**
 * Every real root of p repeated by multiplicity, in non-increasing order (for a characteristic
 * polynomial of a symmetric matrix: the spectrum, each eigenvalue as an interval).
 */
export function rootsWithMultiplicity(isolation: RootIsolation): IsolatedRoot[] {
  const out: IsolatedRoot[] = [];
  for (const r of isolation.roots) for (let k = 0; k < r.multiplicity; k++) out.push(r);
  return out;
}

function multiply(a: IntPolynomial, b: IntPolynomial): IntPolynomial {
  const out = new Array<bigint>(a.length + b.length - 1).fill(0n);
  for (let i = 0; i < a.length; i++) for (let j = 0; j < b.length; j++) out[i + j] += a[i] * b[j];
  return out;
}

function addR(a: Rational, b: Rational): Rational {
  return sub(a, neg(b));
}

/** x * 2^k. */
function mul2(x: Rational, k: number): Rational {
  const f = powerOfTwo(k);
  return rational(x.num * f.num, x.den * f.den);
}

/**
 * The k-th largest real root of p counted with multiplicity (k = 1 the largest), isolated to
 * width <= 2^-bits; for a characteristic polynomial, the k-th largest eigenvalue.
 * Throws RangeError when p has fewer than k real roots.
 */
export function kthLargestRoot(
  p: IntPolynomial,
  k: number,
  bits: number = DEFAULT_ISOLATION_BITS,
): IsolatedRoot {
  const all = rootsWithMultiplicity(isolateRealRoots(p, bits));
  if (!Number.isInteger(k) || k < 1 || k > all.length) {
    throw new RangeError(
      `Expected k in 1..${all.length} (the real roots counted with multiplicity) but found ${k}`,
    );
  }
  return all[k - 1];
}
