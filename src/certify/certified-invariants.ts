/**
 * Certified values of the registry's invariants: for each name, a second computation that does
 * not share code with src/invariants/ and that is exact — an integer, boolean or list recomputed
 * by an independent algorithm, a rational computed exactly, or a real number enclosed in a
 * rational interval derived from an exact characteristic polynomial.
 *
 * An invariant that no exact method here covers (estradaIndex, whose value is a sum of
 * exponentials of algebraic numbers), or a hard invariant on a graph above the exhaustive
 * limit, is "unconfirmed": certification then reports the value as numerical.
 */
import { type Graph } from '../graph/graph.js';
import { type InvariantValue } from '../invariants/registry.js';
import { characteristicPolynomial } from './characteristic-polynomial.js';
import { type IntegerGraphMatrix, integerGraphMatrix, isConnectedByBfs } from './graph-matrices.js';
import { distanceFacts, girthByEdgeDeletion, type DistanceFacts } from './independent/distances.js';
import {
  chromaticNumberExhaustive,
  cliqueNumberExhaustive,
  dominationNumberExhaustive,
  edgeConnectivitySecondMethod,
  EXHAUSTIVE_MAX_ORDER,
  independenceNumberExhaustive,
  matchingNumberSecondMethod,
  vertexConnectivityExhaustive,
  vertexCoverNumberExhaustive,
} from './independent/exhaustive.js';
import {
  bridgeCountByDeletion,
  componentCountByUnionFind,
  countedDegrees,
  cutVertexCountByDeletion,
  firstZagrebByCounting,
  isBipartiteByCharacteristicPolynomial,
  pairEdges,
  secondZagrebByCounting,
  triangleCountByTriples,
} from './independent/structure.js';
import { type IntPolynomial } from './polynomial.js';
import { type Rational, ZERO, add, rational } from './rational.js';
import {
  type CertifiedSpectrum,
  type Enclosure,
  type SpectrumEvidence,
  absoluteEnclosure,
  certifiedSpectrum,
  sumEnclosure,
} from './spectral-enclosures.js';

/** How a value was certified. */
export type CertifiedInvariant =
  | {
      readonly name: string;
      readonly status: 'exact';
      /** The value, in the registry's representation (number, boolean, bigint or list). */
      readonly value: InvariantValue;
      readonly method: string;
      readonly evidence?: SpectrumEvidence;
    }
  | {
      readonly name: string;
      readonly status: 'enclosed';
      /** One enclosure for a real invariant, one per entry for a real list. */
      readonly enclosures: readonly Enclosure[];
      readonly isList: boolean;
      readonly method: string;
      readonly evidence?: SpectrumEvidence;
    }
  | { readonly name: string; readonly status: 'unconfirmed'; readonly reason: string };

/** Per-graph cache of the exact computations several invariants share. */
export class ExactContext {
  private readonly spectra = new Map<string, CertifiedSpectrum>();
  private distances: DistanceFacts | undefined;
  private degreesCache: number[] | undefined;
  private components: number | undefined;
  private laplacianPolynomial: IntPolynomial | undefined;

  /** bits: each enclosure of an eigenvalue is at most 2^-bits wide. */
  constructor(
    readonly graph: Graph,
    readonly bits: number,
  ) {}

  spectrum(kind: IntegerGraphMatrix | 'normalizedLaplacian'): CertifiedSpectrum {
    let s = this.spectra.get(kind);
    if (s === undefined) {
      s = certifiedSpectrum(this.graph, kind, this.bits);
      this.spectra.set(kind, s);
    }
    return s;
  }

  distanceFacts(): DistanceFacts {
    return (this.distances ??= distanceFacts(this.graph));
  }

  degrees(): number[] {
    return (this.degreesCache ??= countedDegrees(this.graph));
  }

  componentCount(): number {
    return (this.components ??= componentCountByUnionFind(this.graph));
  }

  laplacianCharacteristicPolynomial(): IntPolynomial {
    if (this.laplacianPolynomial === undefined) {
      const cached = this.spectra.get('laplacian');
      this.laplacianPolynomial =
        cached?.evidence.characteristicPolynomial ??
        characteristicPolynomial(integerGraphMatrix(this.graph, 'laplacian'));
    }
    return this.laplacianPolynomial;
  }
}

type Certifier = (ctx: ExactContext, name: string) => CertifiedInvariant;

const exact =
  (method: string, compute: (ctx: ExactContext) => InvariantValue | undefined, why?: string): Certifier =>
  (ctx, name) => {
    const value = compute(ctx);
    if (value === undefined) {
      return { name, status: 'unconfirmed', reason: why ?? `no second algorithm for ${name} on this graph` };
    }
    return { name, status: 'exact', value, method };
  };

function point(r: Rational): Enclosure {
  return { lo: r, hi: r };
}

/** A rational-or-Infinity value: Infinity is exact, a rational is a point enclosure. */
const rationalValued =
  (method: string, compute: (ctx: ExactContext) => Rational | number): Certifier =>
  (ctx, name) => {
    const v = compute(ctx);
    if (typeof v === 'number') return { name, status: 'exact', value: v, method };
    return { name, status: 'enclosed', enclosures: [point(v)], isList: false, method };
  };

const SPECTRAL_METHOD = (matrix: string): string =>
  `exact characteristic polynomial of the ${matrix} matrix (Berkowitz), roots isolated by Sturm sequences`;

function spectral(
  matrix: IntegerGraphMatrix | 'normalizedLaplacian',
  pick: 'all' | ((eigenvalues: readonly Enclosure[], n: number) => Enclosure),
  connectedOnly = false,
): Certifier {
  return (ctx, name) => {
    if (connectedOnly && !isConnectedByBfs(ctx.graph)) {
      return { name, status: 'unconfirmed', reason: `${name} is defined on connected graphs only` };
    }
    const s = ctx.spectrum(matrix);
    const method = SPECTRAL_METHOD(matrix);
    if (pick === 'all')
      return {
        name,
        status: 'enclosed',
        enclosures: s.eigenvalues,
        isList: true,
        method,
        evidence: s.evidence,
      };
    const picked = pick(s.eigenvalues, ctx.graph.order) as Enclosure | undefined;
    if (picked === undefined) {
      return {
        name,
        status: 'unconfirmed',
        reason: `${name} is not defined on a graph of order ${ctx.graph.order}`,
      };
    }
    return {
      name,
      status: 'enclosed',
      enclosures: [picked],
      isList: false,
      method,
      evidence: s.evidence,
    };
  };
}

const first = (e: readonly Enclosure[]): Enclosure => e[0];
const last = (e: readonly Enclosure[]): Enclosure => e[e.length - 1];

/** Randić index Σ 1/sqrt(d(u)d(v)): each term enclosed through an integer square root. */
function randicEnclosure(ctx: ExactContext): Enclosure {
  const d = ctx.degrees();
  const p = BigInt(ctx.bits + 8);
  let lo = ZERO;
  let hi = ZERO;
  for (const [u, v] of pairEdges(ctx.graph)) {
    const product = BigInt(d[u] * d[v]);
    const s = isqrt(product << (2n * p)); // s <= sqrt(N) 2^p < s + 1
    if (s * s === product << (2n * p)) {
      const term = rational(1n << p, s);
      lo = add(lo, term);
      hi = add(hi, term);
    } else {
      lo = add(lo, rational(1n << p, s + 1n));
      hi = add(hi, rational(1n << p, s));
    }
  }
  return { lo, hi };
}

/** floor(sqrt(n)) by Newton's iteration from above (exact over BigInt). */
function isqrt(n: bigint): bigint {
  if (n < 2n) return n;
  let x = 1n << BigInt(Math.ceil(n.toString(2).length / 2)); // x >= sqrt(n)
  for (;;) {
    const y = (x + n / x) >> 1n;
    if (y >= x) return x;
    x = y;
  }
}

function harmonicIndex(ctx: ExactContext): Rational {
  const d = ctx.degrees();
  let sum = ZERO;
  for (const [u, v] of pairEdges(ctx.graph)) sum = add(sum, rational(2, d[u] + d[v]));
  return sum;
}

/** τ from the Laplacian's characteristic polynomial: its x coefficient is (-1)^(n-1) n τ (Kirchhoff). */
function spanningTreeCountByCharPoly(ctx: ExactContext): number | bigint {
  const p = ctx.laplacianCharacteristicPolynomial();
  const n = BigInt(ctx.graph.order);
  const c1 = p.length > 1 ? p[1] : 0n;
  const tau = (c1 < 0n ? -c1 : c1) / n;
  return tau <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(tau) : tau;
}

const HARD = `plain exhaustive search over vertex subsets (orders <= ${EXHAUSTIVE_MAX_ORDER})`;
const HARD_OR_BRANCHING = `${HARD}, else plain two-way branching on a vertex of largest degree (within a node budget)`;
const tooHard = (name: string): string =>
  `${name} could not be confirmed by a second algorithm on this graph (above ${EXHAUSTIVE_MAX_ORDER} vertices the plain branching exceeded its node budget)`;
const tooLarge = (name: string): string =>
  `${name} has no independent second algorithm above ${EXHAUSTIVE_MAX_ORDER} vertices`;

const CERTIFIERS: Record<string, Certifier> = {
  order: exact('the order of the matrix', (c) => c.graph.order),
  size: exact('edges counted over all vertex pairs', (c) => pairEdges(c.graph).length),
  minDegree: exact('degrees counted over all vertex pairs', (c) => Math.min(...c.degrees())),
  maxDegree: exact('degrees counted over all vertex pairs', (c) => Math.max(0, ...c.degrees())),
  averageDegree: rationalValued('2m/n exactly', (c) =>
    rational(2 * pairEdges(c.graph).length, c.graph.order),
  ),
  degreeSequence: exact('degrees counted over all vertex pairs', (c) =>
    [...c.degrees()].sort((a, b) => b - a),
  ),
  componentCount: exact('union–find over the edges', (c) => c.componentCount()),
  isConnected: exact('union–find over the edges', (c) => c.componentCount() === 1),
  isBipartite: exact('symmetry of the exact adjacency characteristic polynomial (Sachs)', (c) =>
    isBipartiteByCharacteristicPolynomial(
      c.spectrum('adjacency').evidence.characteristicPolynomial,
      c.graph.order,
    ),
  ),
  isTree: exact(
    'union–find over the edges',
    (c) => c.componentCount() === 1 && pairEdges(c.graph).length === c.graph.order - 1,
  ),
  isForest: exact(
    'union–find over the edges',
    (c) => pairEdges(c.graph).length === c.graph.order - c.componentCount(),
  ),
  diameter: exact('Floyd–Warshall distances', (c) => c.distanceFacts().diameter),
  radius: exact('Floyd–Warshall distances', (c) => c.distanceFacts().radius),
  girth: exact('shortest cycle through each edge, by deleting it', (c) => girthByEdgeDeletion(c.graph)),
  wienerIndex: exact('Floyd–Warshall distances', (c) => c.distanceFacts().wienerIndex),
  averageDistance: rationalValued(
    'Floyd–Warshall distances, exact ratio',
    (c) => c.distanceFacts().averageDistance,
  ),
  transmissions: exact('Floyd–Warshall distances', (c) => c.distanceFacts().transmissions),
  proximity: rationalValued('Floyd–Warshall distances, exact ratio', (c) => c.distanceFacts().proximity),
  remoteness: rationalValued('Floyd–Warshall distances, exact ratio', (c) => c.distanceFacts().remoteness),
  adjacencySpectrum: spectral('adjacency', 'all'),
  spectralRadius: spectral('adjacency', first),
  secondLargestEigenvalue: spectral('adjacency', (e) => e[1]),
  smallestEigenvalue: spectral('adjacency', last),
  energy: (ctx, name) => {
    const s = ctx.spectrum('adjacency');
    return {
      name,
      status: 'enclosed',
      enclosures: [sumEnclosure(s.eigenvalues.map(absoluteEnclosure))],
      isList: false,
      method: `${SPECTRAL_METHOD('adjacency')}; sum of |λi|`,
      evidence: s.evidence,
    };
  },
  estradaIndex: (_ctx, name) => ({
    name,
    status: 'unconfirmed',
    reason: 'estradaIndex (a sum of exponentials of eigenvalues) has no exact method here',
  }),
  laplacianSpectrum: spectral('laplacian', 'all'),
  laplacianSpectralRadius: spectral('laplacian', first),
  algebraicConnectivity: spectral('laplacian', (e, n) => (n < 2 ? point(ZERO) : e[n - 2])),
  signlessLaplacianSpectrum: spectral('signlessLaplacian', 'all'),
  signlessLaplacianSpectralRadius: spectral('signlessLaplacian', first),
  normalizedLaplacianSpectrum: spectral('normalizedLaplacian', 'all'),
  distanceSpectrum: spectral('distance', 'all', true),
  distanceSpectralRadius: spectral('distance', first, true),
  distanceLaplacianSpectrum: spectral('distanceLaplacian', 'all', true),
  matchingNumber: exact(
    `dynamic programming over vertex subsets (orders <= ${EXHAUSTIVE_MAX_ORDER}), else the rank of the Tutte matrix at seeded random points (Lovász)`,
    (c) => matchingNumberSecondMethod(c.graph),
  ),
  independenceNumber: exact(
    HARD,
    (c) => independenceNumberExhaustive(c.graph),
    tooLarge('independenceNumber'),
  ),
  cliqueNumber: exact(HARD, (c) => cliqueNumberExhaustive(c.graph), tooLarge('cliqueNumber')),
  chromaticNumber: exact(
    `inclusion–exclusion over independent sets (Björklund–Husfeldt–Koivisto; orders <= ${EXHAUSTIVE_MAX_ORDER})`,
    (c) => chromaticNumberExhaustive(c.graph),
    tooLarge('chromaticNumber'),
  ),
  dominationNumber: exact(HARD, (c) => dominationNumberExhaustive(c.graph), tooLarge('dominationNumber')),
  vertexCoverNumber: exact(
    HARD_OR_BRANCHING,
    (c) => vertexCoverNumberExhaustive(c.graph),
    tooHard('vertexCoverNumber'),
  ),
  vertexConnectivity: exact(
    HARD,
    (c) => vertexConnectivityExhaustive(c.graph),
    tooLarge('vertexConnectivity'),
  ),
  edgeConnectivity: exact(
    `smallest edge cut over all vertex bipartitions (orders <= ${EXHAUSTIVE_MAX_ORDER}), else the Stoer–Wagner minimum cut`,
    (c) => edgeConnectivitySecondMethod(c.graph),
  ),
  triangleCount: exact('all vertex triples', (c) => triangleCountByTriples(c.graph)),
  spanningTreeCount: exact(
    "the x coefficient of the Laplacian's exact characteristic polynomial (matrix-tree theorem)",
    (c) => spanningTreeCountByCharPoly(c),
  ),
  bridgeCount: exact('deleting each edge and recounting components', (c) => bridgeCountByDeletion(c.graph)),
  cutVertexCount: exact('deleting each vertex and recounting components', (c) =>
    cutVertexCountByDeletion(c.graph),
  ),
  randicIndex: (ctx, name) => ({
    name,
    status: 'enclosed',
    enclosures: [randicEnclosure(ctx)],
    isList: false,
    method: 'each term 1/sqrt(d(u)d(v)) enclosed by integer square roots',
  }),
  harmonicIndex: rationalValued('exact sum of 2/(d(u)+d(v))', harmonicIndex),
  firstZagrebIndex: exact('degrees counted over all vertex pairs', (c) => firstZagrebByCounting(c.graph)),
  secondZagrebIndex: exact('degrees counted over all vertex pairs', (c) => secondZagrebByCounting(c.graph)),
};

/** Names this module can certify (some only on small or connected graphs). */
export function certifiableInvariantNames(): string[] {
  return Object.keys(CERTIFIERS);
}

/** The certified value of one invariant of ctx.graph (name as in the registry). */
export function certifyInvariant(ctx: ExactContext, name: string): CertifiedInvariant {
  const certifier = CERTIFIERS[name];
  if (certifier === undefined)
    return { name, status: 'unconfirmed', reason: `${name} has no certification method` };
  return certifier(ctx, name);
}
