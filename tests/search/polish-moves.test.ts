/**
 * Property tests (fast-check) of the polisher's move families: every move yields a simple graph
 * whose edge set is the one the move's definition gives (computed here on plain edge lists and
 * rebuilt with fromEdges), degree-preserving swaps keep every degree, the connectivity-safe
 * families keep a connected graph connected, and the admissibility filter lets through only
 * connected graphs. The registry's isConnected invariant is the connectivity oracle.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { fromEdges } from '../../src/graph/builders.js';
import { cycle, path, star } from '../../src/graph/families.js';
import { encodeGraph6 } from '../../src/graph/graph6.js';
import { edgeList, type Graph, graphsEqual, hasEdge, wordsForOrder } from '../../src/graph/graph.js';
import { computeInvariant } from '../../src/invariants/registry.js';
import { ALL_FAMILIES } from '../../src/search/polish/catalogue.js';
import { isAdmissible } from '../../src/search/polish/admissible.js';
import { isConnectedGraph } from '../../src/search/polish/connectivity.js';
import { ATTACH_PENDANT } from '../../src/search/polish/moves/attach-pendant.js';
import { DELETE_VERTEX } from '../../src/search/polish/moves/delete-vertex.js';
import { DOUBLE_EDGE_SWAP } from '../../src/search/polish/moves/double-edge-swap.js';
import { type Move, type MoveFamily } from '../../src/search/polish/moves/move-family.js';
import { MOVE_LEAF, moveLeaf } from '../../src/search/polish/moves/move-leaf.js';
import {
  LENGTHEN_PENDANT_PATH,
  pendantPaths,
  SHORTEN_PENDANT_PATH,
} from '../../src/search/polish/moves/pendant-path.js';
import { randomRewire, rewireNeighbourhood } from '../../src/search/polish/moves/rewire-neighbourhood.js';
import { ROTATE_EDGE, rotateEdge } from '../../src/search/polish/moves/rotate-edge.js';
import { SUBDIVIDE_EDGE } from '../../src/search/polish/moves/subdivide-edge.js';
import { TOGGLE_PAIR, togglePair } from '../../src/search/polish/moves/toggle-pair.js';
import { randomSpanningTree } from '../../src/search/polish/random-spanning-tree.js';
import { randomGraph, seededRng } from '../support/random-graph.js';

type Edge = readonly [number, number];

/** What is wrong with g's representation (row length, symmetry, diagonal, stray bits, degrees, size), or ''. */
function representationProblem(g: Graph): string {
  if (g.wordsPerRow !== wordsForOrder(g.order)) return `wordsPerRow ${g.wordsPerRow}`;
  if (g.rows.length !== g.order * g.wordsPerRow) return `rows length ${g.rows.length}`;
  let twice = 0;
  for (let v = 0; v < g.order; v++) {
    let d = 0;
    for (let bit = 0; bit < g.wordsPerRow * 32; bit++) {
      if (((g.rows[v * g.wordsPerRow + (bit >>> 5)] >>> (bit & 31)) & 1) === 0) continue;
      if (bit >= g.order) return `stray bit ${bit} in row ${v}`;
      if (bit === v) return `loop at ${v}`;
      if (!hasEdge(g, bit, v)) return `asymmetric pair ${v}-${bit}`;
      d++;
    }
    if (g.degrees[v] !== d) return `degree of ${v} is ${g.degrees[v]}, row has ${d}`;
    twice += d;
  }
  return g.size * 2 === twice ? '' : `size ${g.size}, rows have ${twice / 2} edges`;
}

function expectSimpleGraph(g: Graph): void {
  expect(representationProblem(g)).toBe('');
}

function key([u, v]: Edge): string {
  return u < v ? `${u}-${v}` : `${v}-${u}`;
}

/** The graph on `order` vertices with g's edges minus `removed` plus `added` (plain set arithmetic). */
function edited(g: Graph, order: number, removed: Edge[], added: Edge[]): Graph {
  const drop = new Set(removed.map(key));
  const edges: Edge[] = edgeList(g).filter((e) => !drop.has(key(e)));
  return fromEdges(order, [...edges, ...added]);
}

/** g - v with vertices above v shifted down, from the edge list. */
function withoutVertex(g: Graph, v: number): Graph {
  const shift = (u: number): number => (u > v ? u - 1 : u);
  const edges = edgeList(g)
    .filter(([a, b]) => a !== v && b !== v)
    .map(([a, b]): Edge => [shift(a), shift(b)]);
  return fromEdges(g.order - 1, edges);
}

/** What each family's move must produce, by its definition. */
const EXPECTED: ReadonlyMap<MoveFamily, (g: Graph, m: Move) => Graph> = new Map<
  MoveFamily,
  (g: Graph, m: Move) => Graph
>([
  [
    TOGGLE_PAIR,
    (g, [u, v]) => (hasEdge(g, u, v) ? edited(g, g.order, [[u, v]], []) : edited(g, g.order, [], [[u, v]])),
  ],
  [ROTATE_EDGE, (g, [u, v, w]) => edited(g, g.order, [[u, v]], [[u, w]])],
  [
    MOVE_LEAF,
    (g, [leaf, t]) => {
      const parent = edgeList(g).find(([a, b]) => a === leaf || b === leaf)!;
      return edited(g, g.order, [parent], [[leaf, t]]);
    },
  ],
  [
    DOUBLE_EDGE_SWAP,
    (g, [a, b, c, d]) =>
      edited(
        g,
        g.order,
        [
          [a, b],
          [c, d],
        ],
        [
          [a, c],
          [b, d],
        ],
      ),
  ],
  [ATTACH_PENDANT, (g, [v]) => edited(g, g.order + 1, [], [[v, g.order]])],
  [LENGTHEN_PENDANT_PATH, (g, [leaf]) => edited(g, g.order + 1, [], [[leaf, g.order]])],
  [
    SUBDIVIDE_EDGE,
    (g, [u, v]) =>
      edited(
        g,
        g.order + 1,
        [[u, v]],
        [
          [u, g.order],
          [v, g.order],
        ],
      ),
  ],
  [SHORTEN_PENDANT_PATH, (g, [leaf]) => withoutVertex(g, leaf)],
  [DELETE_VERTEX, (g, [v]) => withoutVertex(g, v)],
]);

/** Families that never disconnect a connected graph (by their definitions; checked below). */
const CONNECTIVITY_SAFE = [
  MOVE_LEAF,
  ATTACH_PENDANT,
  LENGTHEN_PENDANT_PATH,
  SUBDIVIDE_EDGE,
  SHORTEN_PENDANT_PATH,
];

/** Random graphs on 1..40 vertices (past 32 the rows take two words), sparse and dense. */
const arbitraryGraph = fc
  .record({
    n: fc.integer({ min: 1, max: 40 }),
    p: fc.double({ min: 0, max: 1, noNaN: true }),
    seed: fc.integer({ min: 0, max: 1_000_000 }),
  })
  .map(({ n, p, seed }) => randomGraph(n, n > 14 ? Math.min(p, 0.25) : p, seededRng(`moves-${seed}`)));

/** Random graphs on 1..12 vertices, for checks that list whole neighbourhoods. */
const arbitrarySmallGraph = fc
  .record({
    n: fc.integer({ min: 1, max: 12 }),
    p: fc.double({ min: 0, max: 1, noNaN: true }),
    seed: fc.integer({ min: 0, max: 1_000_000 }),
  })
  .map(({ n, p, seed }) => randomGraph(n, p, seededRng(`small-${seed}`)));

/** A random connected graph: a random tree (each vertex joins an earlier one) plus random edges. */
const arbitraryConnectedGraph = fc
  .record({
    n: fc.integer({ min: 1, max: 36 }),
    extra: fc.double({ min: 0, max: 0.3, noNaN: true }),
    seed: fc.integer({ min: 0, max: 1_000_000 }),
  })
  .map(({ n, extra, seed }) => {
    const rng = seededRng(`connected-${seed}`);
    const edges: Edge[] = [];
    for (let v = 1; v < n; v++) edges.push([Math.floor(rng() * v), v]);
    for (let v = 1; v < n; v++) for (let u = 0; u < v; u++) if (rng() < extra) edges.push([u, v]);
    return fromEdges(n, edges);
  });

/** At most `limit` of the family's moves on g, spread over the list (all of them when few). */
function sampleMoves(f: MoveFamily, g: Graph, limit = 60): Move[] {
  const all = f.candidates(g);
  if (all.length <= limit) return all;
  const step = all.length / limit;
  return Array.from({ length: limit }, (_, i) => all[Math.floor(i * step)]);
}

describe('move families', () => {
  test('the catalogue holds each family once, with distinct names', () => {
    expect(new Set(ALL_FAMILIES).size).toBe(ALL_FAMILIES.length);
    expect(new Set(ALL_FAMILIES.map((f) => f.name)).size).toBe(ALL_FAMILIES.length);
    expect(new Set(ALL_FAMILIES)).toEqual(new Set(EXPECTED.keys()));
  });

  for (const f of ALL_FAMILIES) {
    test(`${f.name}: every move yields a simple graph with the edge set of its definition`, () => {
      fc.assert(
        fc.property(arbitraryGraph, (g) => {
          for (const m of sampleMoves(f, g)) {
            const h = f.apply(g, m);
            expectSimpleGraph(h);
            expect(h.order).toBe(g.order + f.orderDelta);
            expect(graphsEqual(h, EXPECTED.get(f)!(g, m)), `${f.name} ${m.join(',')}`).toBe(true);
          }
        }),
        { numRuns: 40, seed: 6 },
      );
    });
  }

  for (const f of ALL_FAMILIES.filter((x) => x.sample !== undefined)) {
    test(`${f.name}: sample() reaches only graphs that candidates() reaches, and none when it lists none`, () => {
      fc.assert(
        fc.property(arbitrarySmallGraph, fc.nat(), (g, s) => {
          // Compared by the graphs reached: a sampled swap may name its edges in another orientation.
          const listed = new Set(f.candidates(g).map((m) => encodeGraph6(f.apply(g, m))));
          const rng = seededRng(`sample-${s}`);
          let found = 0;
          for (let i = 0; i < 20; i++) {
            const m = f.sample!(g, rng);
            if (m === undefined) continue;
            found++;
            expect(listed.has(encodeGraph6(f.apply(g, m))), `${f.name} ${m.join(',')}`).toBe(true);
          }
          if (listed.size === 0) expect(found).toBe(0);
        }),
        { numRuns: 60, seed: 15 },
      );
    });
  }

  test('the input graph is never modified', () => {
    fc.assert(
      fc.property(arbitraryGraph, (g) => {
        const before = Uint32Array.from(g.rows);
        const degrees = Int32Array.from(g.degrees);
        for (const f of ALL_FAMILIES) for (const m of sampleMoves(f, g, 10)) f.apply(g, m);
        expect(g.rows).toEqual(before);
        expect(g.degrees).toEqual(degrees);
      }),
      { numRuns: 40, seed: 7 },
    );
  });

  test('double-edge-swap keeps every vertex degree (Havel–Hakimi swap)', () => {
    fc.assert(
      fc.property(arbitraryGraph, (g) => {
        for (const m of sampleMoves(DOUBLE_EDGE_SWAP, g)) {
          expect(DOUBLE_EDGE_SWAP.apply(g, m).degrees).toEqual(g.degrees);
        }
      }),
      { numRuns: 60, seed: 8 },
    );
  });

  test('candidate counts match their closed forms on small graphs', () => {
    // toggle: C(n,2); attach: n; subdivide: m; delete: n; leaf moves on the star K_{1,n-1}:
    // (n-1) leaves times (n-2) targets; rotations of C_n: each of 2n (pivot, end) pairs times the
    // n-3 non-neighbours of the pivot; swaps of C_n (n >= 5): each of the n(n-3)/2 pairs of disjoint
    // edges has 2 rewirings, minus those creating an existing edge (one rewiring for each of the n
    // pairs of edges at distance one: it joins their adjacent ends), so n(n-3) - n.
    expect(TOGGLE_PAIR.candidates(path(7)).length).toBe(21);
    expect(ATTACH_PENDANT.candidates(path(7)).length).toBe(7);
    expect(SUBDIVIDE_EDGE.candidates(cycle(7)).length).toBe(7);
    expect(DELETE_VERTEX.candidates(cycle(7)).length).toBe(7);
    expect(MOVE_LEAF.candidates(star(8)).length).toBe(7 * 6);
    expect(ROTATE_EDGE.candidates(cycle(8)).length).toBe(2 * 8 * 5);
    expect(DOUBLE_EDGE_SWAP.candidates(cycle(8)).length).toBe(8 * 5 - 8);
    expect(LENGTHEN_PENDANT_PATH.candidates(star(6)).length).toBe(5);
  });

  test('pendantPaths lists each maximal pendant path from leaf to root', () => {
    // A spider: root 0 with legs 0-1-2 and 0-3, and a triangle 0-4-5 so the root has degree 4.
    const g = fromEdges(6, [
      [0, 1],
      [1, 2],
      [0, 3],
      [0, 4],
      [4, 5],
      [0, 5],
    ]);
    expect(pendantPaths(g).map((p) => p.vertices)).toEqual([
      [2, 1, 0],
      [3, 0],
    ]);
    // A path is its own pendant path from either end.
    expect(pendantPaths(path(4)).map((p) => p.vertices)).toEqual([
      [0, 1, 2, 3],
      [3, 2, 1, 0],
    ]);
  });

  test('moves given an impossible argument throw a RangeError saying what was expected', () => {
    expect(() => togglePair(path(3), 1, 1)).toThrow(/two distinct vertices/);
    expect(() => rotateEdge(path(3), 0, 2, 1)).toThrow(/0-2 to be an edge/);
    expect(() => moveLeaf(path(3), 1, 0)).toThrow(/to be a leaf but found degree 2/);
    expect(() => rewireNeighbourhood(path(3), 1, [1])).toThrow(/other than 1/);
  });
});

describe('connectivity', () => {
  test('isConnectedGraph() agrees with the registry invariant isConnected', () => {
    fc.assert(
      fc.property(arbitraryGraph, (g) => {
        expect(isConnectedGraph(g)).toBe(computeInvariant(g, 'isConnected'));
      }),
      { numRuns: 300, seed: 9 },
    );
  });

  for (const f of CONNECTIVITY_SAFE) {
    test(`${f.name} keeps a connected graph connected`, () => {
      fc.assert(
        fc.property(arbitraryConnectedGraph, (g) => {
          for (const m of sampleMoves(f, g))
            expect(computeInvariant(f.apply(g, m), 'isConnected')).toBe(true);
        }),
        { numRuns: 60, seed: 10 },
      );
    });
  }

  test('with connected required, the filter lets through exactly the connected results of every family', () => {
    fc.assert(
      fc.property(arbitraryConnectedGraph, (g) => {
        const rule = { minOrder: 1, maxOrder: g.order + 1, connected: true };
        for (const f of ALL_FAMILIES) {
          for (const m of sampleMoves(f, g, 30)) {
            const h = f.apply(g, m);
            expect(isAdmissible(h, rule)).toBe(computeInvariant(h, 'isConnected'));
          }
        }
      }),
      { numRuns: 40, seed: 11 },
    );
  });

  test('randomRewire keeps the rewired vertex degree and yields a simple graph', () => {
    fc.assert(
      fc.property(arbitraryGraph, fc.integer({ min: 0, max: 1000 }), (g, s) => {
        const h = randomRewire(g, seededRng(`rewire-${s}`));
        if (g.order < 2) {
          expect(h).toBeUndefined();
          return;
        }
        expectSimpleGraph(h!);
        expect(h!.order).toBe(g.order);
        // Exactly one vertex's neighbourhood was replaced: the size changes by at most one
        // (an isolated vertex gets one neighbour), never more.
        expect(Math.abs(h!.size - g.size)).toBeLessThanOrEqual(1);
      }),
      { numRuns: 100, seed: 12 },
    );
  });
});

describe('randomSpanningTree()', () => {
  test('is a tree on all vertices (registry isTree), using only edges of g when g is connected', () => {
    fc.assert(
      fc.property(arbitraryGraph, fc.integer({ min: 0, max: 1000 }), (g, s) => {
        const t = randomSpanningTree(g, seededRng(`tree-${s}`));
        expect(t.order).toBe(g.order);
        expect(computeInvariant(t, 'isTree')).toBe(true);
        if (computeInvariant(g, 'isConnected')) {
          for (const [u, v] of edgeList(t)) expect(hasEdge(g, u, v)).toBe(true);
        }
      }),
      { numRuns: 100, seed: 14 },
    );
  });
});
