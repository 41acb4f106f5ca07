/**
 * Distance spectra of connected graphs: the eigenvalues of the distance matrix D (entries
 * d(u, v)), its largest eigenvalue ∂1 (the distance spectral radius), and the eigenvalues of the
 * distance Laplacian D^L = Tr − D, where Tr is the diagonal matrix of transmissions.
 *
 * The distance matrix comes from the memo (`distanceMatrix`, shared with diameter, Wiener index
 * and the rest); eigenvalues from {@link symmetricEigenvalues}. D^L of a connected graph is the
 * Laplacian of the complete graph weighted by distances, so it has the eigenvalue 0 exactly once
 * (eigenvector 1) and is positive semidefinite: its smallest eigenvalue is set to exactly 0
 * instead of the solver's ±1e-15.
 *
 * @remarks Defined for connected graphs only (shared/INVARIANTS.md): on a disconnected graph each
 * throws an {@link InvariantDomainError}. n = 1 gives [0]. Cost O(n^3) for the eigenvalues.
 *
 * @see R. L. Graham, H. O. Pollak, "On the addressing problem for loop switching", Bell System
 *   Technical Journal 50(8) (1971) 2495–2519 (the distance matrix).
 * @see M. Aouchiche, P. Hansen, "Two Laplacians for the distance matrix of a graph", Linear
 *   Algebra and its Applications 439(1) (2013) 21–33 (the distance Laplacian).
 * @see M. Aouchiche, P. Hansen, "Distance spectra of graphs: a survey", Linear Algebra and its
 *   Applications 458 (2014) 301–386.
 */
import { InvariantDomainError } from '../errors.js';
import { type Graph } from '../graph/graph.js';
import { isConnected } from './components.js';
import { distanceMatrix, sharedDistances } from './distances.js';
import { type InvariantDefinition } from './registry.js';
import { symmetricEigenvalues } from './symmetric-eigenvalues.js';

function requireConnected(name: string, connected: boolean): void {
  if (!connected) {
    throw new InvariantDomainError(
      name,
      'the graph is disconnected; distance spectra need a connected graph',
    );
  }
}

/** D as a Float64Array, from an all-pairs distance matrix without unreachable pairs. */
function distanceMatrixAsReal(dist: Int32Array): Float64Array {
  return Float64Array.from(dist);
}

/** Tr − D from the distance matrix: row sums on the diagonal, −d(u, v) off it. */
function distanceLaplacianMatrix(dist: Int32Array, n: number): Float64Array {
  const m = new Float64Array(n * n);
  for (let u = 0; u < n; u++) {
    let t = 0;
    for (let v = 0; v < n; v++) {
      t += dist[u * n + v];
      m[u * n + v] = -dist[u * n + v];
    }
    m[u * n + u] = t;
  }
  return m;
}

/** Eigenvalues of D, non-increasing, from a connected graph's distance matrix. */
export function distanceSpectrumFromDistances(dist: Int32Array, n: number): number[] {
  return Array.from(symmetricEigenvalues(distanceMatrixAsReal(dist), n));
}

/** Eigenvalues of Tr − D, non-increasing, the last (the structural zero) exactly 0. */
export function distanceLaplacianSpectrumFromDistances(dist: Int32Array, n: number): number[] {
  const values = Array.from(symmetricEigenvalues(distanceLaplacianMatrix(dist, n), n));
  values[n - 1] = 0;
  return values;
}

/**
 * Eigenvalues of the distance matrix of g, non-increasing.
 *
 * @throws InvariantDomainError if g is disconnected.
 * @example distanceSpectrum(complete(4)) // [3, -1, -1, -1] up to rounding: D = J − I
 */
export function distanceSpectrum(g: Graph): number[] {
  requireConnected('distanceSpectrum', isConnected(g));
  return distanceSpectrumFromDistances(distanceMatrix(g), g.order);
}

/**
 * ∂1, the largest eigenvalue of the distance matrix of g.
 *
 * @throws InvariantDomainError if g is disconnected.
 */
export function distanceSpectralRadius(g: Graph): number {
  requireConnected('distanceSpectralRadius', isConnected(g));
  return distanceSpectrumFromDistances(distanceMatrix(g), g.order)[0];
}

/**
 * Eigenvalues of the distance Laplacian Tr − D of g, non-increasing.
 *
 * @throws InvariantDomainError if g is disconnected.
 */
export function distanceLaplacianSpectrum(g: Graph): number[] {
  requireConnected('distanceLaplacianSpectrum', isConnected(g));
  return distanceLaplacianSpectrumFromDistances(distanceMatrix(g), g.order);
}

export const DISTANCE_SPECTRAL_INVARIANTS: InvariantDefinition[] = [
  {
    name: 'distanceSpectrum',
    kind: 'real-list',
    description: 'eigenvalues of the distance matrix (connected graphs only)',
    compute: (g, memo) => {
      requireConnected('distanceSpectrum', memo.get('isConnected') as boolean);
      return distanceSpectrumFromDistances(sharedDistances(g, memo), g.order);
    },
  },
  {
    name: 'distanceSpectralRadius',
    kind: 'real',
    description: '∂1, largest eigenvalue of the distance matrix (connected graphs only)',
    compute: (_g, memo) => {
      requireConnected('distanceSpectralRadius', memo.get('isConnected') as boolean);
      return (memo.get('distanceSpectrum') as number[])[0];
    },
  },
  {
    name: 'distanceLaplacianSpectrum',
    kind: 'real-list',
    description: 'eigenvalues of Tr − D, Tr the diagonal of transmissions (connected graphs only)',
    compute: (g, memo) => {
      requireConnected('distanceLaplacianSpectrum', memo.get('isConnected') as boolean);
      return distanceLaplacianSpectrumFromDistances(sharedDistances(g, memo), g.order);
    },
  },
];
