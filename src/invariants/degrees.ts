/**
 * Degree invariants: order, size, minimum / maximum / average degree, degree sequence.
 * Definitions: Bondy and Murty, "Graph Theory", Springer 2008, §1.1.
 */
import { type Graph } from '../graph/graph.js';
import { type InvariantDefinition } from './registry.js';

/** δ(G). */
export function minDegree(g: Graph): number {
  let d = Infinity;
  for (let v = 0; v < g.order; v++) if (g.degrees[v] < d) d = g.degrees[v];
  return g.order === 0 ? 0 : d;
}

/** Δ(G). */
export function maxDegree(g: Graph): number {
  let d = 0;
  for (let v = 0; v < g.order; v++) if (g.degrees[v] > d) d = g.degrees[v];
  return d;
}

/** Degrees in non-increasing order. */
export function degreeSequence(g: Graph): number[] {
  return Array.from(g.degrees).sort((a, b) => b - a);
}

export const DEGREE_INVARIANTS: InvariantDefinition[] = [
  { name: 'order', kind: 'integer', description: 'n, number of vertices', compute: (g) => g.order },
  { name: 'size', kind: 'integer', description: 'm, number of edges', compute: (g) => g.size },
  { name: 'minDegree', kind: 'integer', description: 'δ, minimum degree', compute: minDegree },
  { name: 'maxDegree', kind: 'integer', description: 'Δ, maximum degree', compute: maxDegree },
  {
    name: 'averageDegree',
    kind: 'real',
    description: '2m/n',
    compute: (g) => (g.order === 0 ? 0 : (2 * g.size) / g.order),
  },
  {
    name: 'degreeSequence',
    kind: 'integer-list',
    description: 'degrees, non-increasing',
    compute: degreeSequence,
  },
];
