/**
 * Certified spectra: each eigenvalue of an integer graph matrix as a rational interval (or an
 * exact integer), from the exact characteristic polynomial (Berkowitz) and Sturm isolation.
 * Also the normalized Laplacian (through the integer matrix ℓ D^-1 L, whose eigenvalues are ℓ
 * times the normalized ones) and sums of absolute values (energy).
 *
 * The matrices are symmetric (or similar to symmetric ones), so every root is real and the
 * multiplicities add up to n: checked, as a guard against a wrong polynomial.
 */
import { type Graph } from '../graph/graph.js';
import { characteristicPolynomial } from './characteristic-polynomial.js';
import { type IntegerGraphMatrix, integerGraphMatrix, scaledNormalizedLaplacian } from './graph-matrices.js';
import { type IntPolynomial } from './polynomial.js';
import { type RootIsolation, isolateRealRoots } from './root-isolation.js';
import { type Rational, ZERO, add, compare, max, neg, rational, sign } from './rational.js';

/** A closed rational interval [lo, hi]; lo = hi when the value is known exactly. */
export interface Enclosure {
  readonly lo: Rational;
  readonly hi: Rational;
}

/** The polynomial evidence a referee needs to re-check a spectrum by hand. */
export interface SpectrumEvidence {
  /** Which matrix: 'adjacency', ..., or 'normalizedLaplacian' (then `scale` is ℓ). */
  readonly matrix: IntegerGraphMatrix | 'normalizedLaplacian';
  /** det(xI - M) of the integer matrix M (for the normalized Laplacian, M = ℓ D^-1 L on the non-isolated vertices). */
  readonly characteristicPolynomial: IntPolynomial;
  /** f_1, f_2, ...: the roots of f_i have multiplicity i. */
  readonly squareFreeFactors: readonly IntPolynomial[];
  /** Eigenvalues of the invariant are the roots divided by this (1 except for the normalized Laplacian). */
  readonly scale: bigint;
  /** Eigenvalue 0 added this many times (isolated vertices, normalized Laplacian only). */
  readonly extraZeros: number;
}

/** A certified spectrum: enclosures, non-increasing, one per eigenvalue (with multiplicity). */
export interface CertifiedSpectrum {
  readonly eigenvalues: readonly Enclosure[];
  readonly evidence: SpectrumEvidence;
  readonly isolation: RootIsolation;
}

function expand(isolation: RootIsolation, scale: bigint, extraZeros: number): Enclosure[] {
  const out: Enclosure[] = [];
  const div = (r: Rational): Rational => rational(r.num, r.den * scale);
  let zerosPlaced = extraZeros === 0;
  for (const root of isolation.roots) {
    // Insert the extra zeros at their place in non-increasing order.
    if (!zerosPlaced && compare(root.hi, ZERO) < 0) {
      for (let k = 0; k < extraZeros; k++) out.push({ lo: ZERO, hi: ZERO });
      zerosPlaced = true;
    }
    for (let k = 0; k < root.multiplicity; k++) out.push({ lo: div(root.lo), hi: div(root.hi) });
  }
  if (!zerosPlaced) for (let k = 0; k < extraZeros; k++) out.push({ lo: ZERO, hi: ZERO });
  return out;
}

/** The certified spectrum of an integer matrix of g, each eigenvalue within 2^-bits. */
export function certifiedSpectrum(
  g: Graph,
  matrix: IntegerGraphMatrix | 'normalizedLaplacian',
  bits: number,
): CertifiedSpectrum {
  let poly: IntPolynomial;
  let scale = 1n;
  let extraZeros = 0;
  let size = g.order;
  if (matrix === 'normalizedLaplacian') {
    const scaled = scaledNormalizedLaplacian(g);
    poly = characteristicPolynomial(scaled.matrix);
    scale = scaled.scale;
    extraZeros = scaled.isolated;
    size = scaled.matrix.n;
  } else {
    poly = characteristicPolynomial(integerGraphMatrix(g, matrix));
  }
  // Refine ℓ-times-wider roots a little more so that the scaled intervals still meet 2^-bits.
  const extraBits = scale.toString(2).length;
  const isolation =
    size === 0 ? { squareFree: [1n], factors: [], roots: [] } : isolateRealRoots(poly, bits + extraBits);
  const total = isolation.roots.reduce((s, r) => s + r.multiplicity, 0);
  if (total !== size) {
    throw new Error(
      `certified spectrum of the ${matrix} matrix: found ${total} real roots for order ${size} (internal error)`,
    );
  }
  const eigenvalues = expand(isolation, scale, extraZeros);
  return {
    eigenvalues,
    evidence: {
      matrix,
      characteristicPolynomial: poly,
      squareFreeFactors: isolation.factors,
      scale,
      extraZeros,
    },
    isolation,
  };
}

/** An enclosure of |x| for x in e. */
export function absoluteEnclosure(e: Enclosure): Enclosure {
  if (sign(e.lo) >= 0) return e;
  if (sign(e.hi) <= 0) return { lo: neg(e.hi), hi: neg(e.lo) };
  return { lo: ZERO, hi: max(neg(e.lo), e.hi) };
}

/** An enclosure of the sum. */
export function sumEnclosure(list: readonly Enclosure[]): Enclosure {
  let lo = ZERO;
  let hi = ZERO;
  for (const e of list) {
    lo = add(lo, e.lo);
    hi = add(hi, e.hi);
  }
  return { lo, hi };
}

/** Whether the enclosure is a single point. */
export function isPoint(e: Enclosure): boolean {
  return compare(e.lo, e.hi) === 0;
}
