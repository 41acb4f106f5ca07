import { describe, expect, test } from 'vitest';
import * as F from '../../src/graph/families.js';
import { type Graph } from '../../src/graph/graph.js';

// Orders and sizes by closed formulas (Bondy and Murty, "Graph Theory", 2008, §1.1 and exercises;
// hypercube: n = 2^d, m = d 2^(d-1); friendship graph: 2k+1 vertices, 3k edges; Turán graph
// T(n, r): m = (1 - 1/r) n^2 / 2 when r divides n).
const cases: Array<[string, Graph, number, number]> = [
  ['P_6', F.path(6), 6, 5],
  ['C_7', F.cycle(7), 7, 7],
  ['K_{1,5}', F.star(6), 6, 5],
  ['K_6', F.complete(6), 6, 15],
  ['K_{3,4}', F.completeBipartite(3, 4), 7, 12],
  ['K_{2,2,3}', F.completeMultipartite([2, 2, 3]), 7, 16],
  ['T(9,3)', F.turan(9, 3), 9, 27],
  ['W_6', F.wheel(6), 6, 10],
  ['Q_4', F.hypercube(4), 16, 32],
  ['Petersen', F.petersen(), 10, 15],
  ['F_3', F.friendship(3), 7, 9],
  ['lollipop(4,3)', F.lollipop(4, 3), 7, 9],
  ['barbell(3,2)', F.barbell(3, 2), 8, 9],
  ['broom(4,3)', F.broom(4, 3), 7, 6],
  ['prism(5)', F.prism(5), 10, 15],
  ['ladder(4)', F.ladder(4), 8, 10],
  ['empty(5)', F.emptyGraph(5), 5, 0],
];

describe('families', () => {
  for (const [name, g, n, m] of cases) {
    test(`${name} has ${n} vertices and ${m} edges`, () => {
      expect(g.order).toBe(n);
      expect(g.size).toBe(m);
    });
  }
  test('the Petersen graph is 3-regular', () => {
    expect(Array.from(F.petersen().degrees)).toEqual(new Array(10).fill(3));
  });
  test('families reject orders outside their domain with the expected range', () => {
    expect(() => F.cycle(2)).toThrow('Expected n to be an integer >= 3 but found 2');
    expect(() => F.wheel(3)).toThrow('Expected n to be an integer >= 4 but found 3');
    expect(() => F.turan(3, 4)).toThrow('Expected r <= n');
  });
});
