/**
 * Standard graph families, the graphs conjectures are first tested on.
 *
 * Definitions follow J. A. Bondy and U. S. R. Murty, "Graph Theory", GTM 244, Springer 2008,
 * and the Harary–Palmer conventions for the named families. Vertex numbering is fixed and
 * documented per family, since tests and reports rely on it.
 *
 * Beyond the usual families the module has the ones extremal results are typically tight on:
 * friendship (windmill) graphs, lollipops, barbells, brooms, Turán graphs, complete multipartite
 * graphs, prisms and ladders.
 */
import { type Graph } from './graph.js';
import { fromEdges } from './builders.js';

type Edge = [number, number];

function checkCount(what: string, value: number, least: number): void {
  if (!Number.isInteger(value) || value < least) {
    throw new RangeError(`Expected ${what} to be an integer >= ${least} but found ${value}`);
  }
}

/** The edgeless graph on n vertices (n >= 1). */
export function emptyGraph(n: number): Graph {
  checkCount('n', n, 1);
  return fromEdges(n, []);
}

/** P_n: vertices 0..n-1 joined in a row. */
export function path(n: number): Graph {
  checkCount('n', n, 1);
  const edges: Edge[] = [];
  for (let i = 0; i + 1 < n; i++) edges.push([i, i + 1]);
  return fromEdges(n, edges);
}

/** C_n (n >= 3): the path 0..n-1 closed by the edge (n-1)0. */
export function cycle(n: number): Graph {
  checkCount('n', n, 3);
  const edges: Edge[] = [];
  for (let i = 0; i < n; i++) edges.push([i, (i + 1) % n]);
  return fromEdges(n, edges);
}

/** The star K_{1,n-1} on n vertices, centre 0. */
export function star(n: number): Graph {
  checkCount('n', n, 1);
  const edges: Edge[] = [];
  for (let i = 1; i < n; i++) edges.push([0, i]);
  return fromEdges(n, edges);
}

/** K_n. */
export function complete(n: number): Graph {
  checkCount('n', n, 1);
  const edges: Edge[] = [];
  for (let j = 1; j < n; j++) for (let i = 0; i < j; i++) edges.push([i, j]);
  return fromEdges(n, edges);
}

/** Complete multipartite graph with the given part sizes; parts are consecutive vertex ranges. */
export function completeMultipartite(parts: ReadonlyArray<number>): Graph {
  if (parts.length === 0) throw new RangeError('Expected at least one part but found none');
  parts.forEach((p) => checkCount('each part size', p, 1));
  const start: number[] = [];
  let n = 0;
  for (const p of parts) {
    start.push(n);
    n += p;
  }
  const edges: Edge[] = [];
  for (let a = 0; a < parts.length; a++)
    for (let b = a + 1; b < parts.length; b++)
      for (let i = 0; i < parts[a]; i++)
        for (let j = 0; j < parts[b]; j++) edges.push([start[a] + i, start[b] + j]);
  return fromEdges(n, edges);
}

/** K_{a,b}: parts 0..a-1 and a..a+b-1. */
export function completeBipartite(a: number, b: number): Graph {
  return completeMultipartite([a, b]);
}

/** Turán graph T(n, r): complete r-partite on n vertices with parts as equal as possible. */
export function turan(n: number, r: number): Graph {
  checkCount('n', n, 1);
  checkCount('r', r, 1);
  if (r > n) throw new RangeError(`Expected r <= n but found r = ${r}, n = ${n}`);
  const parts: number[] = [];
  for (let i = 0; i < r; i++) parts.push(Math.floor(n / r) + (i < n % r ? 1 : 0));
  return completeMultipartite(parts);
}

/** The wheel W_n on n >= 4 vertices: hub 0 joined to the cycle 1..n-1. */
export function wheel(n: number): Graph {
  checkCount('n', n, 4);
  const edges: Edge[] = [];
  for (let i = 1; i < n; i++) {
    edges.push([0, i]);
    edges.push([i, i === n - 1 ? 1 : i + 1]);
  }
  return fromEdges(n, edges);
}

/** The hypercube Q_d on 2^d vertices: u ~ v when their binary labels differ in one bit. */
export function hypercube(d: number): Graph {
  checkCount('d', d, 0);
  if (d > 16) throw new RangeError(`Expected d <= 16 but found ${d}`);
  const n = 1 << d;
  const edges: Edge[] = [];
  for (let v = 0; v < n; v++)
    for (let b = 0; b < d; b++) if (v < (v ^ (1 << b))) edges.push([v, v ^ (1 << b)]);
  return fromEdges(n, edges);
}

/** The Petersen graph: outer 5-cycle 0..4, spokes i-(i+5), inner pentagram 5..9 (i ~ i+2 mod 5). */
export function petersen(): Graph {
  const edges: Edge[] = [];
  for (let i = 0; i < 5; i++) {
    edges.push([i, (i + 1) % 5]);
    edges.push([i, i + 5]);
    edges.push([5 + i, 5 + ((i + 2) % 5)]);
  }
  return fromEdges(10, edges);
}

/** Friendship (windmill) graph F_k: k triangles sharing vertex 0; 2k+1 vertices. */
export function friendship(k: number): Graph {
  checkCount('k', k, 1);
  const edges: Edge[] = [];
  for (let i = 0; i < k; i++) {
    const a = 2 * i + 1;
    edges.push([0, a], [0, a + 1], [a, a + 1]);
  }
  return fromEdges(2 * k + 1, edges);
}

/** Lollipop: K_k on 0..k-1 with a path of p further vertices hung from vertex k-1. */
export function lollipop(k: number, p: number): Graph {
  checkCount('k', k, 1);
  checkCount('p', p, 0);
  const edges: Edge[] = [];
  for (let j = 1; j < k; j++) for (let i = 0; i < j; i++) edges.push([i, j]);
  for (let i = 0; i < p; i++) edges.push([k - 1 + i, k + i]);
  return fromEdges(k + p, edges);
}

/** Barbell: two copies of K_k (0..k-1 and k+p..2k+p-1) joined by a path through p middle vertices. */
export function barbell(k: number, p: number): Graph {
  checkCount('k', k, 1);
  checkCount('p', p, 0);
  const n = 2 * k + p;
  const edges: Edge[] = [];
  for (let j = 1; j < k; j++)
    for (let i = 0; i < j; i++) {
      edges.push([i, j]);
      edges.push([k + p + i, k + p + j]);
    }
  for (let i = k - 1; i < k + p; i++) edges.push([i, i + 1]);
  return fromEdges(n, edges);
}

/** Broom: a path 0..p-1 with l extra leaves attached to vertex p-1; p + l vertices. */
export function broom(p: number, l: number): Graph {
  checkCount('p', p, 1);
  checkCount('l', l, 0);
  const edges: Edge[] = [];
  for (let i = 0; i + 1 < p; i++) edges.push([i, i + 1]);
  for (let i = 0; i < l; i++) edges.push([p - 1, p + i]);
  return fromEdges(p + l, edges);
}

/** Prism C_k x K_2 (k >= 3): cycles 0..k-1 and k..2k-1, rungs i-(i+k). */
export function prism(k: number): Graph {
  checkCount('k', k, 3);
  const edges: Edge[] = [];
  for (let i = 0; i < k; i++) {
    edges.push([i, (i + 1) % k], [k + i, k + ((i + 1) % k)], [i, i + k]);
  }
  return fromEdges(2 * k, edges);
}

/** Ladder P_k x K_2: paths 0..k-1 and k..2k-1, rungs i-(i+k). */
export function ladder(k: number): Graph {
  checkCount('k', k, 1);
  const edges: Edge[] = [];
  for (let i = 0; i < k; i++) {
    edges.push([i, i + k]);
    if (i + 1 < k) edges.push([i, i + 1], [k + i, k + i + 1]);
  }
  return fromEdges(2 * k, edges);
}
