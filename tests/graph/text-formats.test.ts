import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import {
  formatAdjacencyList,
  formatEdgeList,
  parseAdjacencyList,
  parseEdgeList,
  TextFormatError,
} from '../../src/graph/text-formats.js';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { graphsEqual } from '../../src/graph/graph.js';
import { randomGraph, seededRng } from '../support/random-graph.js';

// The graph6 specification's example DQc: edges 0-2 0-4 1-3 3-4.
const example = decodeGraph6('DQc');

describe('edge list', () => {
  test('formatEdgeList() writes the header n m then one edge a line', () => {
    expect(formatEdgeList(example)).toBe('5 4\n0 2\n0 4\n1 3\n3 4\n');
  });
  test('parseEdgeList() reads several graphs, comments and blank lines', () => {
    const gs = parseEdgeList('# two graphs\n5 4\n0 2\n0 4\n1 3\n3 4\n\n2 0\n');
    expect(gs.length).toBe(2);
    expect(graphsEqual(gs[0], example)).toBe(true);
    expect(gs[1].order).toBe(2);
    expect(gs[1].size).toBe(0);
  });
  test('parseEdgeList() names the line of each malformed case', () => {
    expect(() => parseEdgeList('3 1\n0 3\n', 'f.txt')).toThrow(
      'edge list f.txt line 2: vertex 3 is out of range 0..2',
    );
    expect(() => parseEdgeList('3 2\n0 1\n')).toThrow(/announces 2 edges but 1 follow/);
    expect(() => parseEdgeList('3 1\n1 1\n')).toThrow(/line 2: loop at vertex 1/);
    expect(() => parseEdgeList('3 2\n0 1\n1 0\n')).toThrow(/line 3: edge 1 0 is listed twice/);
    expect(() => parseEdgeList('x\n')).toThrow(TextFormatError);
  });
});

describe('adjacency list', () => {
  test('formatAdjacencyList() writes one line per vertex, isolated vertices included', () => {
    expect(formatAdjacencyList(decodeGraph6('DQc'))).toBe('0: 2 4\n1: 3\n2: 0\n3: 1 4\n4: 0 3\n');
    expect(formatAdjacencyList(decodeGraph6('B?'))).toBe('0:\n1:\n2:\n');
  });
  test('parseAdjacencyList() rejects asymmetric lists and misnumbered lines', () => {
    expect(() => parseAdjacencyList('0: 1\n1:\n')).toThrow(
      'adjacency list input line 1: 0 lists 1 but 1 does not list 0',
    );
    expect(() => parseAdjacencyList('0: 1\n2: 0\n')).toThrow(
      /line 2: expected the line of vertex 1 but found vertex 2/,
    );
  });
});

describe('round trips', () => {
  test('both formats round trip random graphs', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 40 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer(),
        (n, p, seed) => {
          const g = randomGraph(n, p, seededRng(String(seed)));
          expect(graphsEqual(parseEdgeList(formatEdgeList(g))[0], g)).toBe(true);
          expect(graphsEqual(parseAdjacencyList(formatAdjacencyList(g))[0], g)).toBe(true);
        },
      ),
      { numRuns: 100, seed: 11 },
    );
  });
});
