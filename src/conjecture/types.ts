/**
 * The types a conjecture file is written against: the graph view handed to `score` and
 * `where`, and the shape of a conjecture. Exported by the package so that an editor completes
 * invariant names and checks the score's arithmetic; the loader itself does not type-check.
 *
 * Every name and convention below is that of shared/INVARIANTS.md.
 */
import { type Graph } from '../graph/graph.js';
import { type InvariantKind } from '../invariants/registry.js';

/**
 * Every invariant of a graph, as a read-only property computed on first use and cached (each is
 * computed at most once per graph, whoever asks for it). Infinity stands for "infinite"
 * (diameter of a disconnected graph, girth of a forest); lists are sorted non-increasing.
 */
export interface GraphInvariants {
  /** n, number of vertices. */
  readonly order: number;
  /** m, number of edges. */
  readonly size: number;
  /** δ, the minimum degree. */
  readonly minDegree: number;
  /** Δ, the maximum degree. */
  readonly maxDegree: number;
  /** 2m/n. */
  readonly averageDegree: number;
  /** The degrees, non-increasing. */
  readonly degreeSequence: readonly number[];
  /** Number of connected components. */
  readonly componentCount: number;
  /** One component (n = 1 is connected). */
  readonly isConnected: boolean;
  /** No odd cycle. */
  readonly isBipartite: boolean;
  /** Connected and acyclic. */
  readonly isTree: boolean;
  /** Acyclic. */
  readonly isForest: boolean;
  /** Largest distance; Infinity if disconnected, 0 for n = 1. */
  readonly diameter: number;
  /** Smallest eccentricity; Infinity if disconnected. */
  readonly radius: number;
  /** Length of a shortest cycle; Infinity for forests. */
  readonly girth: number;
  /** Sum of d(u,v) over unordered pairs; Infinity if disconnected. */
  readonly wienerIndex: number;
  /** wienerIndex / C(n,2); Infinity if disconnected, 0 for n = 1. */
  readonly averageDistance: number;
  /** Per vertex, the sum of its distances to all others (Infinity entries if disconnected). */
  readonly transmissions: readonly number[];
  /** min over v of transmission(v)/(n-1); Infinity if disconnected, 0 for n = 1. */
  readonly proximity: number;
  /** max over v of transmission(v)/(n-1); Infinity if disconnected, 0 for n = 1. */
  readonly remoteness: number;
  /** Eigenvalues of the adjacency matrix A, non-increasing. */
  readonly adjacencySpectrum: readonly number[];
  /** λ1, the largest eigenvalue of A. */
  readonly spectralRadius: number;
  /** λ2 (n >= 2). */
  readonly secondLargestEigenvalue: number;
  /** λn, the smallest eigenvalue of A. */
  readonly smallestEigenvalue: number;
  /** Sum of |λi|. */
  readonly energy: number;
  /** Sum of exp(λi). */
  readonly estradaIndex: number;
  /** Eigenvalues of L = D - A. */
  readonly laplacianSpectrum: readonly number[];
  /** μ1, the largest Laplacian eigenvalue. */
  readonly laplacianSpectralRadius: number;
  /** μ(n-1), the second smallest Laplacian eigenvalue; 0 if disconnected and for n = 1. */
  readonly algebraicConnectivity: number;
  /** Eigenvalues of Q = D + A. */
  readonly signlessLaplacianSpectrum: readonly number[];
  /** q1, the largest eigenvalue of Q. */
  readonly signlessLaplacianSpectralRadius: number;
  /** Eigenvalues of I - D^-1/2 A D^-1/2 (an isolated vertex contributes 0). */
  readonly normalizedLaplacianSpectrum: readonly number[];
  /** Eigenvalues of the distance matrix; connected graphs only (else an error). */
  readonly distanceSpectrum: readonly number[];
  /** ∂1, the largest distance eigenvalue; connected graphs only. */
  readonly distanceSpectralRadius: number;
  /** Eigenvalues of Tr - D (Tr: diagonal of transmissions); connected graphs only. */
  readonly distanceLaplacianSpectrum: readonly number[];
  /** ν, size of a maximum matching. */
  readonly matchingNumber: number;
  /** α, size of a maximum independent set. */
  readonly independenceNumber: number;
  /** ω, size of a maximum clique. */
  readonly cliqueNumber: number;
  /** χ, the chromatic number. */
  readonly chromaticNumber: number;
  /** γ, size of a minimum dominating set. */
  readonly dominationNumber: number;
  /** n - α. */
  readonly vertexCoverNumber: number;
  /** κ; K_n: n-1, disconnected: 0, n = 1: 0. */
  readonly vertexConnectivity: number;
  /** λ'; disconnected: 0, n = 1: 0. */
  readonly edgeConnectivity: number;
  /** Number of triangles. */
  readonly triangleCount: number;
  /** τ, number of spanning trees (0 if disconnected): a number below 2^53, a bigint above. */
  readonly spanningTreeCount: number | bigint;
  /** Number of bridges. */
  readonly bridgeCount: number;
  /** Number of articulation points. */
  readonly cutVertexCount: number;
  /** Sum over edges of 1/sqrt(d(u)d(v)). */
  readonly randicIndex: number;
  /** Sum over edges of 2/(d(u)+d(v)). */
  readonly harmonicIndex: number;
  /** Sum over vertices of d(v)^2. */
  readonly firstZagrebIndex: number;
  /** Sum over edges of d(u)d(v). */
  readonly secondZagrebIndex: number;
}

/**
 * The kind of each name of {@link GraphInvariants}, written out so that a test can compare the
 * interface with the registry at run time (`satisfies` makes the compiler reject a name missing
 * here or not in the interface).
 */
export const GRAPH_INVARIANT_KINDS = {
  order: 'integer',
  size: 'integer',
  minDegree: 'integer',
  maxDegree: 'integer',
  averageDegree: 'real',
  degreeSequence: 'integer-list',
  componentCount: 'integer',
  isConnected: 'boolean',
  isBipartite: 'boolean',
  isTree: 'boolean',
  isForest: 'boolean',
  diameter: 'integer',
  radius: 'integer',
  girth: 'integer',
  wienerIndex: 'integer',
  averageDistance: 'real',
  transmissions: 'integer-list',
  proximity: 'real',
  remoteness: 'real',
  adjacencySpectrum: 'real-list',
  spectralRadius: 'real',
  secondLargestEigenvalue: 'real',
  smallestEigenvalue: 'real',
  energy: 'real',
  estradaIndex: 'real',
  laplacianSpectrum: 'real-list',
  laplacianSpectralRadius: 'real',
  algebraicConnectivity: 'real',
  signlessLaplacianSpectrum: 'real-list',
  signlessLaplacianSpectralRadius: 'real',
  normalizedLaplacianSpectrum: 'real-list',
  distanceSpectrum: 'real-list',
  distanceSpectralRadius: 'real',
  distanceLaplacianSpectrum: 'real-list',
  matchingNumber: 'integer',
  independenceNumber: 'integer',
  cliqueNumber: 'integer',
  chromaticNumber: 'integer',
  dominationNumber: 'integer',
  vertexCoverNumber: 'integer',
  vertexConnectivity: 'integer',
  edgeConnectivity: 'integer',
  triangleCount: 'integer',
  spanningTreeCount: 'integer',
  bridgeCount: 'integer',
  cutVertexCount: 'integer',
  randicIndex: 'real',
  harmonicIndex: 'real',
  firstZagrebIndex: 'integer',
  secondZagrebIndex: 'integer',
} as const satisfies { readonly [K in keyof GraphInvariants]: InvariantKind };

/**
 * What `score` and `where` receive: every invariant of {@link GraphInvariants} as a lazily
 * computed, cached property, the complement's view, and the graph's structure. Reading a name
 * that is not an invariant throws an error naming the closest one.
 */
export interface GraphView extends GraphInvariants {
  /** n, number of vertices (same as order). */
  readonly n: number;
  /** m, number of edges (same as size). */
  readonly m: number;
  /** The complement's view, with the same names (computed once, cached). */
  readonly complement: GraphView;
  /** Edges as [u, v] pairs with u < v, in lexicographic order. */
  readonly edges: ReadonlyArray<readonly [number, number]>;
  /** The graph in graph6 (for messages and logging). */
  readonly graph6: string;
  /** The underlying compact graph (for use with the package's builders and functions). */
  readonly graph: Graph;
  /** Whether uv is an edge (u, v in 0..n-1). */
  hasEdge(u: number, v: number): boolean;
  /** The neighbours of v in increasing order. */
  neighbors(v: number): readonly number[];
  /** The degree of v. */
  degree(v: number): number;
}

/** What a conjecture file writes: the argument of `defineConjecture`. */
export interface ConjectureSpec {
  /** Lower-case letters, digits and '-' (used in run names), at most 64 characters. */
  name: string;
  /** The claim in words, shown in reports ("For connected G: ..."). */
  statement: string;
  /** The default order for `refute hunt` (its --vertices overrides it): an integer in 1..MAX_CONJECTURE_VERTICES. */
  vertices: number;
  /** Only connected graphs count (default false). */
  connected?: boolean;
  /** An optional further restriction of the domain; must return true or false. */
  where?: (g: GraphView) => boolean;
  /** A number that is > 0 exactly when g refutes the claim; the search maximises it. */
  score: (g: GraphView) => number;
}

/** A validated conjecture (frozen). */
export interface Conjecture {
  readonly name: string;
  readonly statement: string;
  readonly vertices: number;
  readonly connected: boolean;
  readonly where?: (g: GraphView) => boolean;
  readonly score: (g: GraphView) => number;
}

/** The result of evaluating a conjecture on one graph. */
export type Evaluation = { readonly inDomain: false } | { readonly inDomain: true; readonly score: number };
