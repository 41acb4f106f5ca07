/**
 * The characteristic polynomial det(xI - M) of a square integer matrix, exactly, over BigInt.
 *
 * Main method: Berkowitz's division-free algorithm (S. J. Berkowitz, "On computing the
 * determinant in small parallel time using a small number of processors", Information
 * Processing Letters 18 (1984) 147–150), in the Toeplitz-matrix form of M. Soltys and S. Cook,
 * "The proof complexity of linear algebra", Annals of Pure and Applied Logic 130 (2004) 277–323.
 * For the leading principal submatrices M_r = [[M_(r-1), C], [R, a]] one has
 *   p_r = T_r p_(r-1),  T_r lower-triangular Toeplitz (r+1) x r with first column
 *   (1, -a, -R C, -R M_(r-1) C, ..., -R M_(r-1)^(r-2) C),
 * p_r the coefficient vector of det(xI - M_r) in decreasing degree. Only ring operations are
 * used, so every intermediate is an integer: O(n^4) BigInt operations.
 *
 * Second, independent method (for cross-checks): the Faddeev–LeVerrier recurrence
 * (D. K. Faddeev and V. N. Faddeeva, "Computational Methods of Linear Algebra", Freeman 1963,
 * §37; U. J. J. Le Verrier, J. Math. Pures Appl. 5 (1840) 220–254): M_0 = 0, c_n = 1,
 * M_k = M M_(k-1) + c_(n-k+1) I, c_(n-k) = -tr(M M_k) / k; the divisions are exact for
 * integer matrices (the c_i are integers).
 */
import { type IntPolynomial, polynomial } from './polynomial.js';

/** A square integer matrix, row-major. */
export interface IntMatrix {
  readonly n: number;
  readonly entries: readonly bigint[];
}

/** The n x n integer matrix with these rows. */
export function intMatrix(rows: ReadonlyArray<ReadonlyArray<number | bigint>>): IntMatrix {
  const n = rows.length;
  const entries: bigint[] = [];
  for (const row of rows) {
    if (row.length !== n)
      throw new RangeError(`Expected a square matrix but found a row of length ${row.length} in ${n} rows`);
    for (const x of row) entries.push(BigInt(x));
  }
  return { n, entries };
}

/** det(xI - M), coefficients in increasing degree (monic of degree n), by Berkowitz's algorithm. */
export function characteristicPolynomial(m: IntMatrix): IntPolynomial {
  const n = m.n;
  const a = m.entries;
  // p holds det(xI - M_r) in decreasing degree: p[0] = 1.
  let p: bigint[] = [1n];
  const w = new Array<bigint>(n).fill(0n);
  const next = new Array<bigint>(n).fill(0n);
  for (let r = 1; r <= n; r++) {
    const last = r - 1; // index of the new row/column
    // First column of T_r: t[0] = 1, t[1] = -a_rr, t[k + 2] = -R M^k C for k = 0..r-2.
    const t = new Array<bigint>(r + 1).fill(0n);
    t[0] = 1n;
    t[1] = -a[last * n + last];
    for (let i = 0; i < last; i++) w[i] = a[i * n + last]; // C
    for (let k = 0; k + 2 <= r; k++) {
      let dot = 0n;
      for (let j = 0; j < last; j++) dot += a[last * n + j] * w[j]; // R w
      t[k + 2] = -dot;
      if (k + 3 > r) break;
      for (let i = 0; i < last; i++) {
        let s = 0n;
        for (let j = 0; j < last; j++) {
          const e = a[i * n + j];
          if (e !== 0n) s += e * w[j];
        }
        next[i] = s;
      }
      for (let i = 0; i < last; i++) w[i] = next[i];
    }
    const q = new Array<bigint>(r + 1).fill(0n);
    for (let i = 0; i <= r; i++) {
      let s = 0n;
      for (let j = Math.max(0, i - r); j <= Math.min(i, r - 1); j++) s += t[i - j] * p[j];
      q[i] = s;
    }
    p = q;
  }
  return polynomial(p.reverse());
}

/** det(xI - M) by the Faddeev–LeVerrier recurrence (the independent second method). */
export function characteristicPolynomialFaddeevLeVerrier(m: IntMatrix): IntPolynomial {
  const n = m.n;
  const a = m.entries;
  const c = new Array<bigint>(n + 1).fill(0n);
  c[n] = 1n;
  let mk = new Array<bigint>(n * n).fill(0n); // M_0 = 0
  for (let k = 1; k <= n; k++) {
    // M_k = A M_(k-1) + c_(n-k+1) I
    const prod = new Array<bigint>(n * n).fill(0n);
    for (let i = 0; i < n; i++)
      for (let l = 0; l < n; l++) {
        const e = a[i * n + l];
        if (e === 0n) continue;
        for (let j = 0; j < n; j++) prod[i * n + j] += e * mk[l * n + j];
      }
    for (let i = 0; i < n; i++) prod[i * n + i] += c[n - k + 1];
    mk = prod;
    // c_(n-k) = -tr(A M_k) / k
    let trace = 0n;
    for (let i = 0; i < n; i++) for (let l = 0; l < n; l++) trace += a[i * n + l] * mk[l * n + i];
    if (trace % BigInt(k) !== 0n)
      throw new Error(`Faddeev–LeVerrier: trace not divisible by ${k} (not an integer matrix?)`);
    c[n - k] = -trace / BigInt(k);
  }
  return polynomial(c);
}
