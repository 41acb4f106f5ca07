import { describe, expect, test } from 'vitest';
import { readFileSync } from 'node:fs';
import { fromUpperTriangleBits } from '../../src/graph/builders.js';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { hasEdge } from '../../src/graph/graph.js';
import { componentCount } from '../../src/invariants/components.js';
import { connectComponentsInPlace } from '../../src/search/connect-repair.js';
import { pairBitsOfGraph, pairIndex } from '../../src/search/pair-bits.js';

const atlas = readFileSync(new URL('../fixtures/atlas-1-7.g6', import.meta.url), 'utf8')
  .split('\n')
  .filter((l) => l !== '');

describe('connectComponentsInPlace', () => {
  test('connectComponentsInPlace() connects every graph on 2..7 vertices with c - 1 new edges and keeps the old ones (networkx atlas)', () => {
    let checked = 0;
    for (const line of atlas) {
      const g = decodeGraph6(line);
      if (g.order < 2) continue;
      const c = componentCount(g);
      const bits = pairBitsOfGraph(g);
      const added = connectComponentsInPlace(g.order, bits);
      const h = fromUpperTriangleBits(g.order, bits);
      expect(added).toBe(c - 1);
      expect(h.size).toBe(g.size + c - 1);
      expect(componentCount(h)).toBe(1);
      for (let v = 1; v < g.order; v++)
        for (let u = 0; u < v; u++) if (hasEdge(g, u, v)) expect(hasEdge(h, u, v)).toBe(true);
      checked++;
    }
    expect(checked).toBe(1252 - 1); // all 1252 atlas graphs but K1
  });

  test('pairIndex() follows graph6 order 01, 02, 12, 03, 13, 23', () => {
    expect([
      pairIndex(0, 1),
      pairIndex(0, 2),
      pairIndex(1, 2),
      pairIndex(0, 3),
      pairIndex(3, 1),
      pairIndex(2, 3),
    ]).toEqual([0, 1, 2, 3, 4, 5]);
  });
});
