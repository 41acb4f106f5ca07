/**
 * Spectral invariants of the adjacency matrix A, the Laplacian L = D - A, the signless
 * Laplacian Q = D + A and the normalized Laplacian I - D^-1/2 A D^-1/2.
 *
 * Definitions: D. Cvetković, P. Rowlinson and S. Simić, "An Introduction to the Theory of Graph
 * Spectra", LMS Student Texts 75, CUP 2010 (A, L, Q; energy after I. Gutman 1978; the Estrada
 * index after E. Estrada, Chem. Phys. Lett. 319 (2000) 713–718); the normalized Laplacian after
 * F. R. K. Chung, "Spectral Graph Theory", CBMS 92, AMS 1997, where an isolated vertex has
 * diagonal entry 0 (so it contributes the eigenvalue 0).
 *
 * Eigenvalues come from {@link symmetricEigenvalues}. Where the multiplicity of 0 is known from
 * the structure (L: one per component; Q: one per bipartite component; normalized L: one per
 * component), those eigenvalues are set to exactly 0 instead of the solver's ±1e-16, so that
 * algebraicConnectivity is exactly 0 on disconnected graphs as INVARIANTS.md requires.
 */
import { type Graph } from '../graph/graph.js';
import { InvariantDomainError } from '../errors.js';
import { componentStructure } from './components.js';
import { type InvariantDefinition, type InvariantMemo } from './registry.js';
import { symmetricEigenvalues } from './symmetric-eigenvalues.js';
import { spectralRadius } from './spectral-radius.js';

/** Which symmetric matrix of the graph. */
export type GraphMatrixKind = 'adjacency' | 'laplacian' | 'signlessLaplacian' | 'normalizedLaplacian';

/** The matrix as a dense row-major Float64Array. */
export function graphMatrix(g: Graph, kind: GraphMatrixKind): Float64Array {
  const n = g.order;
  const a = new Float64Array(n * n);
  const offDiagonal = kind === 'laplacian' ? -1 : 1;
  const inverseRootDegree = new Float64Array(n);
  if (kind === 'normalizedLaplacian')
    for (let v = 0; v < n; v++) inverseRootDegree[v] = g.degrees[v] > 0 ? 1 / Math.sqrt(g.degrees[v]) : 0;
  for (let u = 0; u < n; u++) {
    const base = u * g.wordsPerRow;
    for (let w = 0; w < g.wordsPerRow; w++) {
      let word = g.rows[base + w];
      while (word !== 0) {
        const low = word & -word;
        const v = (w << 5) | (31 - Math.clz32(low));
        word ^= low;
        a[u * n + v] =
          kind === 'normalizedLaplacian' ? -inverseRootDegree[u] * inverseRootDegree[v] : offDiagonal;
      }
    }
    if (kind === 'laplacian' || kind === 'signlessLaplacian') a[u * n + u] = g.degrees[u];
    else if (kind === 'normalizedLaplacian') a[u * n + u] = g.degrees[u] > 0 ? 1 : 0;
  }
  return a;
}

/** Number of eigenvalues known to be exactly 0, from the graph's structure. */
function structuralZeroCount(g: Graph, kind: GraphMatrixKind): number {
  if (kind === 'adjacency') return 0;
  const { bipartite } = componentStructure(g);
  // L and the normalized L: one zero per component. Q: one per bipartite component
  // (Cvetković–Rowlinson–Simić 2010, Prop. 7.8.1, from memory).
  return kind === 'signlessLaplacian' ? bipartite.filter((b) => b).length : bipartite.length;
}

/** Eigenvalues of the chosen matrix, non-increasing, structural zeros exact. */
export function graphSpectrum(g: Graph, kind: GraphMatrixKind): number[] {
  const values = Array.from(symmetricEigenvalues(graphMatrix(g, kind), g.order));
  // Laplacian-type matrices are positive semidefinite: the structural zeros are the smallest ones.
  const zeros = structuralZeroCount(g, kind);
  for (let i = values.length - zeros; i < values.length; i++) values[i] = 0;
  return values;
}

function spectrum(memo: InvariantMemo, name: string): number[] {
  return memo.get(name) as number[];
}

export const SPECTRAL_INVARIANTS: InvariantDefinition[] = [
  {
    name: 'adjacencySpectrum',
    kind: 'real-list',
    description: 'eigenvalues of A, non-increasing',
    compute: (g) => graphSpectrum(g, 'adjacency'),
  },
  {
    name: 'spectralRadius',
    kind: 'real',
    description: 'λ1, largest eigenvalue of A',
    compute: spectralRadius,
  },
  {
    name: 'secondLargestEigenvalue',
    kind: 'real',
    description: 'λ2 of A (n >= 2)',
    compute: (g, memo) => {
      if (g.order < 2)
        throw new InvariantDomainError('secondLargestEigenvalue', 'the graph needs at least 2 vertices');
      return spectrum(memo, 'adjacencySpectrum')[1];
    },
  },
  {
    name: 'smallestEigenvalue',
    kind: 'real',
    description: 'λn, smallest eigenvalue of A',
    compute: (g, memo) => spectrum(memo, 'adjacencySpectrum')[g.order - 1],
  },
  {
    name: 'energy',
    kind: 'real',
    description: 'sum of |λi|',
    compute: (_g, memo) => spectrum(memo, 'adjacencySpectrum').reduce((s, x) => s + Math.abs(x), 0),
  },
  {
    name: 'estradaIndex',
    kind: 'real',
    description: 'sum of exp(λi)',
    compute: (_g, memo) => spectrum(memo, 'adjacencySpectrum').reduce((s, x) => s + Math.exp(x), 0),
  },
  {
    name: 'laplacianSpectrum',
    kind: 'real-list',
    description: 'eigenvalues of L = D - A, non-increasing',
    compute: (g) => graphSpectrum(g, 'laplacian'),
  },
  {
    name: 'laplacianSpectralRadius',
    kind: 'real',
    description: 'μ1, largest eigenvalue of L',
    compute: (_g, memo) => spectrum(memo, 'laplacianSpectrum')[0],
  },
  {
    name: 'algebraicConnectivity',
    kind: 'real',
    description: 'μ(n-1), second smallest eigenvalue of L (0 if disconnected or n = 1)',
    compute: (g, memo) => (g.order < 2 ? 0 : spectrum(memo, 'laplacianSpectrum')[g.order - 2]),
  },
  {
    name: 'signlessLaplacianSpectrum',
    kind: 'real-list',
    description: 'eigenvalues of Q = D + A, non-increasing',
    compute: (g) => graphSpectrum(g, 'signlessLaplacian'),
  },
  {
    name: 'signlessLaplacianSpectralRadius',
    kind: 'real',
    description: 'q1, largest eigenvalue of Q',
    compute: (_g, memo) => spectrum(memo, 'signlessLaplacianSpectrum')[0],
  },
  {
    name: 'normalizedLaplacianSpectrum',
    kind: 'real-list',
    description: 'eigenvalues of I - D^-1/2 A D^-1/2 (an isolated vertex contributes 0)',
    compute: (g) => graphSpectrum(g, 'normalizedLaplacian'),
  },
];
