/**
 * Second, independent computations of the distance invariants, for certification.
 *
 * All-pairs distances by the Floyd–Warshall recurrence (R. W. Floyd, "Algorithm 97: Shortest
 * path", Comm. ACM 5 (1962) 345; S. Warshall, J. ACM 9 (1962) 11–12), where the registry uses
 * breadth-first search; girth as the minimum over edges uv of 1 + d(u, v) in G - uv (a shortest
 * cycle through uv is uv plus a shortest u–v path avoiding uv), where the registry runs BFS from
 * every vertex (Itai–Rodeh). Ratios (average distance, proximity, remoteness) are exact
 * rationals. Conventions: shared/INVARIANTS.md.
 */
import { type Graph, hasEdge } from '../../graph/graph.js';
import { type Rational, rational } from '../rational.js';
import { pairEdges } from './structure.js';

/** Distances, row-major; Infinity where unreachable. */
export function floydWarshallDistances(g: Graph): Float64Array {
  const n = g.order;
  const d = new Float64Array(n * n).fill(Infinity);
  for (let u = 0; u < n; u++) {
    d[u * n + u] = 0;
    for (let v = 0; v < n; v++) if (u !== v && hasEdge(g, u, v)) d[u * n + v] = 1;
  }
  for (let k = 0; k < n; k++)
    for (let i = 0; i < n; i++) {
      const dik = d[i * n + k];
      if (dik === Infinity) continue;
      for (let j = 0; j < n; j++) {
        const via = dik + d[k * n + j];
        if (via < d[i * n + j]) d[i * n + j] = via;
      }
    }
  return d;
}

/** Distance facts derived from one Floyd–Warshall table. */
export interface DistanceFacts {
  readonly diameter: number;
  readonly radius: number;
  readonly wienerIndex: number;
  readonly transmissions: number[];
  /** Infinity when disconnected. */
  readonly averageDistance: Rational | number;
  readonly proximity: Rational | number;
  readonly remoteness: Rational | number;
}

export function distanceFacts(g: Graph): DistanceFacts {
  const n = g.order;
  const d = floydWarshallDistances(g);
  const transmissions = new Array<number>(n).fill(0);
  const eccentricity = new Array<number>(n).fill(0);
  for (let u = 0; u < n; u++)
    for (let v = 0; v < n; v++) {
      transmissions[u] += d[u * n + v];
      eccentricity[u] = Math.max(eccentricity[u], d[u * n + v]);
    }
  const connected = transmissions.every(Number.isFinite);
  const diameter = Math.max(0, ...eccentricity);
  const radius = n === 0 ? 0 : Math.min(...eccentricity);
  const wienerIndex = connected ? transmissions.reduce((s, t) => s + t, 0) / 2 : Infinity;
  if (!connected) {
    return {
      diameter,
      radius,
      wienerIndex,
      transmissions,
      averageDistance: Infinity,
      proximity: Infinity,
      remoteness: Infinity,
    };
  }
  if (n === 1)
    return {
      diameter,
      radius,
      wienerIndex,
      transmissions,
      averageDistance: rational(0),
      proximity: rational(0),
      remoteness: rational(0),
    };
  const pairs = (n * (n - 1)) / 2;
  return {
    diameter,
    radius,
    wienerIndex,
    transmissions,
    averageDistance: rational(wienerIndex, pairs),
    proximity: rational(Math.min(...transmissions), n - 1),
    remoteness: rational(Math.max(...transmissions), n - 1),
  };
}

/** Girth by deleting each edge and measuring the distance between its ends; Infinity for forests. */
export function girthByEdgeDeletion(g: Graph): number {
  const n = g.order;
  let best = Infinity;
  for (const [u, v] of pairEdges(g)) {
    // BFS from u in G - uv.
    const dist = new Int32Array(n).fill(-1);
    const queue = [u];
    dist[u] = 0;
    for (let head = 0; head < queue.length; head++) {
      const x = queue[head];
      if (dist[x] + 2 >= best) break; // cannot improve
      for (let y = 0; y < n; y++) {
        if (dist[y] !== -1 || !hasEdge(g, x, y) || (x === u && y === v)) continue;
        dist[y] = dist[x] + 1;
        queue.push(y);
      }
    }
    if (dist[v] !== -1) best = Math.min(best, dist[v] + 1);
  }
  return best;
}
