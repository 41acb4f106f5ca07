import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import {
  decodeGraph6,
  decodeOrder,
  encodeGraph6,
  encodeOrder,
  Graph6ParseError,
  GRAPH6_MAX_ORDER,
} from '../../src/graph/graph6.js';
import { fromEdges } from '../../src/graph/builders.js';
import { edgeList, graphsEqual } from '../../src/graph/graph.js';
import { complete, petersen } from '../../src/graph/families.js';
import fixture from '../fixtures/random-invariants.json' with { type: 'json' };

describe('graph6 against the specification', () => {
  // B. D. McKay, "Description of graph6, sparse6 and digraph6 encodings", worked example:
  // n = 5 with edges 0-2 0-4 1-3 3-4 is written "DQc".
  test('encodeGraph6() gives the specification example DQc', () => {
    expect(
      encodeGraph6(
        fromEdges(5, [
          [0, 2],
          [0, 4],
          [1, 3],
          [3, 4],
        ]),
      ),
    ).toBe('DQc');
  });
  test('decodeGraph6() reads the specification example DQc', () => {
    expect(edgeList(decodeGraph6('DQc'))).toEqual([
      [0, 2],
      [0, 4],
      [1, 3],
      [3, 4],
    ]);
  });
  // The specification's N(n) examples: N(30) = 93; N(12345) = 126 66 63 120;
  // N(460175067) = 126 126 63 90 90 90 90 90.
  test('encodeOrder() matches the specification examples of N(n)', () => {
    const codes = (s: string) => [...s].map((c) => c.charCodeAt(0));
    expect(codes(encodeOrder(30))).toEqual([93]);
    expect(codes(encodeOrder(12345))).toEqual([126, 66, 63, 120]);
    expect(codes(encodeOrder(460175067))).toEqual([126, 126, 63, 90, 90, 90, 90, 90]);
  });
  test('encodeOrder()/decodeOrder() round trip at every boundary of the three forms', () => {
    for (const n of [0, 1, 62, 63, 64, 258047, 258048, 258049, 2 ** 32, GRAPH6_MAX_ORDER]) {
      const s = encodeOrder(n);
      expect(s.length).toBe(n <= 62 ? 1 : n <= 258047 ? 4 : 8);
      expect(decodeOrder(s)).toEqual({ order: n, offset: s.length });
    }
  });
  // Petersen graph in graph6 (from memory; it is also what networkx writes for its petersen_graph()).
  test('encodeGraph6() of the Petersen graph is IheA@GUAo', () => {
    expect(encodeGraph6(petersen())).toBe('IheA@GUAo');
  });
  test('decodeGraph6() accepts the >>graph6<< header', () => {
    expect(edgeList(decodeGraph6('>>graph6<<DQc'))).toEqual([
      [0, 2],
      [0, 4],
      [1, 3],
      [3, 4],
    ]);
  });
});

describe('graph6 against networkx', () => {
  // Fixture strings were written by networkx.to_graph6_bytes (tests/scripts/make_random_invariants.py).
  test('decodeGraph6() gives the edge lists networkx wrote, and encodeGraph6() the same strings', () => {
    for (const rec of fixture.graphs) {
      const g = decodeGraph6(rec.graph6);
      expect(g.order).toBe(rec.order);
      expect(edgeList(g)).toEqual(rec.edges);
      expect(encodeGraph6(g)).toBe(rec.graph6);
    }
  });
});

describe('graph6 round trips', () => {
  const arbitraryGraph = fc.integer({ min: 1, max: 100 }).chain((n) =>
    fc
      .array(fc.tuple(fc.integer({ min: 0, max: n - 1 }), fc.integer({ min: 0, max: n - 1 })), {
        maxLength: 300,
      })
      .map((pairs) =>
        fromEdges(
          n,
          pairs.filter(([u, v]) => u !== v),
        ),
      ),
  );
  test('decodeGraph6(encodeGraph6(g)) equals g for random graphs up to n = 100', () => {
    fc.assert(
      fc.property(arbitraryGraph, (g) => {
        const s = encodeGraph6(g);
        // Length formula of the specification: |N(n)| + ceil(n(n-1)/12).
        expect(s.length).toBe((g.order <= 62 ? 1 : 4) + Math.ceil((g.order * (g.order - 1)) / 12));
        expect(graphsEqual(decodeGraph6(s), g)).toBe(true);
      }),
      { numRuns: 300, seed: 42 },
    );
  });
  test('the long N(n) form round trips a graph on 200 vertices', () => {
    const g = fromEdges(200, [
      [0, 199],
      [63, 64],
      [100, 150],
    ]);
    const s = encodeGraph6(g);
    expect(s.charCodeAt(0)).toBe(126);
    expect(graphsEqual(decodeGraph6(s), g)).toBe(true);
  });
  test('encodeGraph6() of K_n is all ~ bytes when n(n-1)/2 is a multiple of 6', () => {
    // K_4: 6 pairs, one byte 63 + 63 = '~' (the specification's bit packing).
    expect(encodeGraph6(complete(4))).toBe('C~');
  });
});

describe('graph6 rejects malformed input', () => {
  const cases: Array<[string, RegExp]> = [
    ['D Qc', /byte 2 is ' ', outside the graph6 range|code 32/],
    ['D\u00e9c', /outside the graph6 range 63\.\.126/],
    ['DQ', /expected 2 data bytes for n=5 but found 1/],
    ['DQcc', /expected 2 data bytes for n=5 but found 3/],
    ['DQd', /padding bits must be zero/],
    ['', /empty string/],
    ['~?', /the 3 bytes that follow are missing/],
    ['~??}', /4-byte form, which is for n > 62/],
    [':Fa@x^', /this is sparse6, not graph6/],
  ];
  for (const [text, message] of cases) {
    test(`decodeGraph6(${JSON.stringify(text)}) throws ${message}`, () => {
      expect(() => decodeGraph6(text, 'stdin line 7')).toThrow(Graph6ParseError);
      expect(() => decodeGraph6(text, 'stdin line 7')).toThrow(/^graph6 stdin line 7: /);
      expect(() => decodeGraph6(text, 'stdin line 7')).toThrow(message);
    });
  }
});
