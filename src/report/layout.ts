/**
 * Deterministic vertex layouts for drawings, in the unit square [0, 1]^2.
 *
 * - Force-directed: T. M. J. Fruchterman and E. M. Reingold, "Graph drawing by force-directed
 *   placement", Software: Practice and Experience 21 (1991) 1129–1164, with a linearly cooling
 *   temperature; starting positions from a seeded stream, and only +, *, / and sqrt in the
 *   iteration, so a seed gives the same picture on every run.
 * - Layered, for trees (and forests): each tree hangs from a centre (a vertex of minimum
 *   eccentricity), children ordered by vertex number, leaves spaced evenly and parents centred
 *   over their children, after E. M. Reingold and J. S. Tilford, "Tidier drawings of trees",
 *   IEEE Trans. Software Eng. SE-7 (1981) 223–228 (without their contour compaction).
 * - Circular: vertex v at angle 2πv/n, starting at the top.
 */
import seedrandom from 'seedrandom';
import { type Graph, neighbors } from '../graph/graph.js';
import { componentCount, componentLabels } from '../invariants/components.js';
import { distanceMatrix } from '../invariants/distances.js';

export type LayoutKind = 'auto' | 'force' | 'tree' | 'circle';

export interface Point {
  x: number;
  y: number;
}

const FORCE_ITERATIONS = 400;

/** Positions in [0, 1]^2 for the chosen layout; 'auto' is 'tree' for forests, else 'force'. */
export function layoutGraph(g: Graph, kind: LayoutKind = 'auto', seed = 'refute'): Point[] {
  const isForest = g.size === g.order - componentCount(g);
  const chosen = kind === 'auto' ? (isForest && g.order > 1 ? 'tree' : 'force') : kind;
  if (chosen === 'tree' && !isForest)
    throw new RangeError('Expected a forest for the tree layout but found a cycle');
  const points =
    chosen === 'circle' ? circleLayout(g.order) : chosen === 'tree' ? treeLayout(g) : forceLayout(g, seed);
  return normalise(points);
}

export function circleLayout(n: number): Point[] {
  return Array.from({ length: n }, (_, v) => ({
    x: 0.5 + 0.5 * Math.sin((2 * Math.PI * v) / n),
    y: 0.5 - 0.5 * Math.cos((2 * Math.PI * v) / n),
  }));
}

export function forceLayout(g: Graph, seed: string): Point[] {
  const n = g.order;
  const rng = seedrandom(`layout:${seed}`);
  const x = new Float64Array(n);
  const y = new Float64Array(n);
  for (let v = 0; v < n; v++) {
    x[v] = rng();
    y[v] = rng();
  }
  if (n <= 1) return [{ x: 0.5, y: 0.5 }].slice(0, n);
  const k = Math.sqrt(1 / n); // ideal edge length in the unit square
  const dx = new Float64Array(n);
  const dy = new Float64Array(n);
  const adjacency = Array.from({ length: n }, (_, v) => neighbors(g, v));
  for (let it = 0; it < FORCE_ITERATIONS; it++) {
    const temperature = 0.1 * (1 - it / FORCE_ITERATIONS) + 0.002;
    dx.fill(0);
    dy.fill(0);
    for (let u = 0; u < n; u++) {
      for (let v = u + 1; v < n; v++) {
        let ex = x[u] - x[v];
        let ey = y[u] - y[v];
        let d2 = ex * ex + ey * ey;
        if (d2 < 1e-12) {
          // Coincident points: push apart along a fixed direction depending on the pair only.
          ex = 1e-3 * (((u * 7 + v * 13) % 5) - 2 || 1);
          ey = 1e-3;
          d2 = ex * ex + ey * ey;
        }
        const f = (k * k) / d2; // repulsion k^2/d, along the unit vector (ex, ey)/d
        dx[u] += ex * f;
        dy[u] += ey * f;
        dx[v] -= ex * f;
        dy[v] -= ey * f;
      }
    }
    for (let u = 0; u < n; u++) {
      for (const v of adjacency[u]) {
        if (v <= u) continue;
        const ex = x[u] - x[v];
        const ey = y[u] - y[v];
        const d = Math.sqrt(ex * ex + ey * ey);
        const f = d / k; // attraction d^2/k, along the unit vector
        dx[u] -= ex * f;
        dy[u] -= ey * f;
        dx[v] += ex * f;
        dy[v] += ey * f;
      }
    }
    for (let v = 0; v < n; v++) {
      // Gentle pull to the centre keeps components from drifting apart without bound.
      dx[v] += (0.5 - x[v]) * 0.05;
      dy[v] += (0.5 - y[v]) * 0.05;
      const len = Math.sqrt(dx[v] * dx[v] + dy[v] * dy[v]);
      if (len > 0) {
        const step = Math.min(len, temperature) / len;
        x[v] += dx[v] * step;
        y[v] += dy[v] * step;
      }
    }
  }
  return Array.from({ length: n }, (_, v) => ({ x: x[v], y: y[v] }));
}

export function treeLayout(g: Graph): Point[] {
  const n = g.order;
  const dist = distanceMatrix(g);
  const label = componentLabels(g);
  const points: Point[] = new Array(n);
  const children: number[][] = Array.from({ length: n }, () => []);
  const depth = new Int32Array(n);
  const roots: number[] = [];
  const done = new Uint8Array(n);
  for (let s = 0; s < n; s++) {
    if (done[s]) continue;
    // Root: the vertex of minimum eccentricity in this component (smallest number on ties).
    let root = s;
    let best = Infinity;
    for (let v = 0; v < n; v++) {
      if (label[v] !== label[s]) continue;
      let ecc = 0;
      for (let u = 0; u < n; u++) if (label[u] === label[s] && dist[v * n + u] > ecc) ecc = dist[v * n + u];
      if (ecc < best) {
        best = ecc;
        root = v;
      }
    }
    roots.push(root);
    const queue = [root];
    done[root] = 1;
    for (let i = 0; i < queue.length; i++) {
      const u = queue[i];
      for (const v of neighbors(g, u)) {
        if (done[v]) continue;
        done[v] = 1;
        depth[v] = depth[u] + 1;
        children[u].push(v);
        queue.push(v);
      }
    }
  }
  let nextLeaf = 0;
  const place = (v: number): number => {
    if (children[v].length === 0) {
      points[v] = { x: nextLeaf++, y: depth[v] };
      return points[v].x;
    }
    const xs = children[v].map(place);
    points[v] = { x: (xs[0] + xs[xs.length - 1]) / 2, y: depth[v] };
    return points[v].x;
  };
  for (const r of roots) {
    place(r);
    nextLeaf += 1; // a gap between the trees of a forest
  }
  return points;
}

/** Scales points into [0, 1]^2 keeping the aspect ratio; a single point goes to the centre. */
function normalise(points: Point[]): Point[] {
  if (points.length === 0) return points;
  let minX = Infinity;
  let maxX = -Infinity;
  let minY = Infinity;
  let maxY = -Infinity;
  for (const p of points) {
    minX = Math.min(minX, p.x);
    maxX = Math.max(maxX, p.x);
    minY = Math.min(minY, p.y);
    maxY = Math.max(maxY, p.y);
  }
  const span = Math.max(maxX - minX, maxY - minY);
  if (span === 0) return points.map(() => ({ x: 0.5, y: 0.5 }));
  const ox = (span - (maxX - minX)) / 2;
  const oy = (span - (maxY - minY)) / 2;
  return points.map((p) => ({ x: (p.x - minX + ox) / span, y: (p.y - minY + oy) / span }));
}
