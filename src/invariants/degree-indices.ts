/**
 * Degree-based topological indices.
 *
 * Randić index: M. Randić, "Characterization of molecular branching", J. Am. Chem. Soc. 97
 * (1975) 6609–6615. Harmonic index: S. Fajtlowicz, "On conjectures of Graffiti II", Congr.
 * Numer. 60 (1987) 187–197. Zagreb indices: I. Gutman and N. Trinajstić, Chem. Phys. Lett. 17
 * (1972) 535–538.
 */
import { type Graph } from '../graph/graph.js';
import { type InvariantDefinition } from './registry.js';

/** Calls fn(u, v) once for every edge with u < v. */
function forEachEdge(g: Graph, fn: (u: number, v: number) => void): void {
  for (let u = 0; u < g.order; u++) {
    const base = u * g.wordsPerRow;
    for (let w = u >>> 5; w < g.wordsPerRow; w++) {
      let word = g.rows[base + w];
      while (word !== 0) {
        const low = word & -word;
        const v = (w << 5) | (31 - Math.clz32(low));
        word ^= low;
        if (v > u) fn(u, v);
      }
    }
  }
}

/** Sum over edges of 1/sqrt(d(u)d(v)). */
export function randicIndex(g: Graph): number {
  let s = 0;
  forEachEdge(g, (u, v) => (s += 1 / Math.sqrt(g.degrees[u] * g.degrees[v])));
  return s;
}

/** Sum over edges of 2/(d(u)+d(v)). */
export function harmonicIndex(g: Graph): number {
  let s = 0;
  forEachEdge(g, (u, v) => (s += 2 / (g.degrees[u] + g.degrees[v])));
  return s;
}

/** Sum over vertices of d(v)^2. */
export function firstZagrebIndex(g: Graph): number {
  let s = 0;
  for (let v = 0; v < g.order; v++) s += g.degrees[v] * g.degrees[v];
  return s;
}

/** Sum over edges of d(u)d(v). */
export function secondZagrebIndex(g: Graph): number {
  let s = 0;
  forEachEdge(g, (u, v) => (s += g.degrees[u] * g.degrees[v]));
  return s;
}

export const DEGREE_INDEX_INVARIANTS: InvariantDefinition[] = [
  {
    name: 'randicIndex',
    kind: 'real',
    description: 'sum over edges of 1/sqrt(d(u)d(v))',
    compute: randicIndex,
  },
  {
    name: 'harmonicIndex',
    kind: 'real',
    description: 'sum over edges of 2/(d(u)+d(v))',
    compute: harmonicIndex,
  },
  {
    name: 'firstZagrebIndex',
    kind: 'integer',
    description: 'sum over vertices of d(v)^2',
    compute: firstZagrebIndex,
  },
  {
    name: 'secondZagrebIndex',
    kind: 'integer',
    description: 'sum over edges of d(u)d(v)',
    compute: secondZagrebIndex,
  },
];
