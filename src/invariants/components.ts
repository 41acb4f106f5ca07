/**
 * Connectivity predicates: components, connectedness, bipartiteness, trees and forests.
 * Breadth-first search over bitset rows (E. F. Moore, "The shortest path through a maze",
 * Proc. Int. Symp. Switching Theory, 1959); bipartiteness by 2-colouring the BFS layers
 * (König 1936: bipartite iff no odd cycle).
 */
import { type Graph } from '../graph/graph.js';
import { type InvariantDefinition } from './registry.js';

/** Components and a BFS 2-colouring, from one breadth-first search. */
export interface ComponentStructure {
  /** Component index of each vertex (0, 1, ... in order of their smallest vertex). */
  readonly labels: Int32Array;
  /** BFS layer parity of each vertex: a proper 2-colouring of every bipartite component. */
  readonly colour: Int8Array;
  /** Whether each component is bipartite (has no odd cycle). */
  readonly bipartite: boolean[];
}

export function componentStructure(g: Graph): ComponentStructure {
  const n = g.order;
  const labels = new Int32Array(n).fill(-1);
  const colour = new Int8Array(n);
  const bipartite: boolean[] = [];
  const queue = new Int32Array(n);
  for (let s = 0; s < n; s++) {
    if (labels[s] !== -1) continue;
    const c = bipartite.length;
    let odd = false;
    let head = 0;
    let tail = 0;
    queue[tail++] = s;
    labels[s] = c;
    while (head < tail) {
      const u = queue[head++];
      const base = u * g.wordsPerRow;
      for (let w = 0; w < g.wordsPerRow; w++) {
        let word = g.rows[base + w];
        while (word !== 0) {
          const low = word & -word;
          const v = (w << 5) | (31 - Math.clz32(low));
          word ^= low;
          if (labels[v] === -1) {
            labels[v] = c;
            colour[v] = 1 - colour[u];
            queue[tail++] = v;
          } else if (colour[v] === colour[u]) odd = true;
        }
      }
    }
    bipartite.push(!odd);
  }
  return { labels, colour, bipartite };
}

/** Component index of each vertex (0, 1, ... in order of their smallest vertex). */
export function componentLabels(g: Graph): Int32Array {
  return componentStructure(g).labels;
}

/** Number of connected components. */
export function componentCount(g: Graph): number {
  return componentStructure(g).bipartite.length;
}

/** Whether g has one component (n = 1 is connected). */
export function isConnected(g: Graph): boolean {
  return componentCount(g) === 1;
}

/** A proper 2-colouring (0/1 per vertex) or null when g has an odd cycle. */
export function bipartition(g: Graph): Int8Array | null {
  const { colour, bipartite } = componentStructure(g);
  return bipartite.every((b) => b) ? colour : null;
}

export const COMPONENT_INVARIANTS: InvariantDefinition[] = [
  {
    name: 'componentCount',
    kind: 'integer',
    description: 'number of connected components',
    compute: componentCount,
  },
  {
    name: 'isConnected',
    kind: 'boolean',
    description: 'one component (n = 1 is connected)',
    compute: (_g, memo) => memo.get('componentCount') === 1,
  },
  {
    name: 'isBipartite',
    kind: 'boolean',
    description: 'no odd cycle',
    compute: (g) => bipartition(g) !== null,
  },
  {
    name: 'isTree',
    kind: 'boolean',
    description: 'connected and acyclic',
    compute: (g, memo) => memo.get('componentCount') === 1 && g.size === g.order - 1,
  },
  {
    name: 'isForest',
    kind: 'boolean',
    description: 'acyclic',
    compute: (g, memo) => g.size === g.order - (memo.get('componentCount') as number),
  },
];
