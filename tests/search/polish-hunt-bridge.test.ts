/**
 * The hunt's side of the polisher: decisions in graph6 pair order (checked against the builder
 * fromUpperTriangleBits), when a polish is due, improved graphs at the hunt's order only, and
 * near-miss records for the other orders.
 */
import { pairBitsOfGraph } from '../../src/search/pair-bits.js';
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { fromEdges, fromUpperTriangleBits } from '../../src/graph/builders.js';
import { star } from '../../src/graph/families.js';
import { decodeGraph6, encodeGraph6 } from '../../src/graph/graph6.js';
import { type Graph, graphsEqual } from '../../src/graph/graph.js';
import { evaluateConjecture } from '../../src/conjecture/evaluate.js';
import {
  mergeNearMisses,
  nearMissRecord,
  polishDue,
  polishForHunt,
} from '../../src/search/polish/hunt-bridge.js';
import { randomGraph, seededRng } from '../support/random-graph.js';
import { SPECTRAL_GAP as GAP, SPIDER } from '../support/spectral-gap-claim.js';

const evaluate = (g: Graph) => evaluateConjecture(GAP, g);
const scoreOf = (g: Graph): number => {
  const ev = evaluate(g);
  return ev.inDomain ? ev.score : -Infinity;
};

describe('pairBitsOfGraph()', () => {
  test('is the inverse of fromUpperTriangleBits', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 40 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.nat(),
        (n, p, s) => {
          const g = randomGraph(n, p, seededRng(`bits-${s}`));
          expect(graphsEqual(fromUpperTriangleBits(n, pairBitsOfGraph(g)), g)).toBe(true);
        },
      ),
      { numRuns: 100, seed: 21 },
    );
  });
  test('follows graph6 pair order 01, 02, 12, 03, ...', () => {
    // The path 0-1-2-3 has pairs 01, 12, 23: positions 0, 2 and 5.
    expect([
      ...pairBitsOfGraph(
        fromEdges(4, [
          [0, 1],
          [1, 2],
          [2, 3],
        ]),
      ),
    ]).toEqual([1, 0, 1, 0, 0, 1]);
  });
});

describe('polishDue()', () => {
  test('every K-th iteration, never with K = 0', () => {
    expect([...Array(12).keys()].filter((t) => polishDue(t, 5))).toEqual([4, 9]);
    expect([...Array(12).keys()].filter((t) => polishDue(t, 0))).toEqual([]);
  });
});

describe('polishForHunt()', () => {
  const settings = { every: 1, graphs: 2, steps: 300 };
  const starts = [SPIDER, star(10)];
  const run = (iteration: number) =>
    polishForHunt(evaluate, starts, starts.map(scoreOf), 'hunt-seed', iteration, settings, true);

  test('improved graphs are at the hunt order, strictly better, and their decisions decode to them', () => {
    const r = run(3);
    expect(r.improved.length).toBeGreaterThan(0);
    for (const imp of r.improved) {
      expect(imp.graph.order).toBe(10);
      expect(imp.score).toBeGreaterThan(scoreOf(starts[imp.from]));
      expect(scoreOf(imp.graph)).toBe(imp.score);
      expect(graphsEqual(fromUpperTriangleBits(10, imp.bits), imp.graph)).toBe(true);
    }
    // The spider polishes into a counterexample (see polish-search.test.ts).
    expect(r.improved.some((imp) => imp.from === 0 && imp.score > 0)).toBe(true);
    for (const s of r.nearMisses) expect(s.graph.order).not.toBe(10);
    expect(r.evaluations).toBeLessThanOrEqual(2 * 300);
  });

  test('depends on (seed, iteration) only: the same iteration repeats, another differs', () => {
    const key = (r: ReturnType<typeof run>) => [
      r.evaluations,
      ...r.improved.map((i) => encodeGraph6(i.graph)),
      ...r.nearMisses.map((s) => encodeGraph6(s.graph)),
    ];
    expect(key(run(3))).toEqual(key(run(3)));
    const traces = [3, 4].map((t) => {
      const seen: string[] = [];
      polishForHunt(
        (g) => (seen.push(encodeGraph6(g)), evaluate(g)),
        starts,
        starts.map(scoreOf),
        'hunt-seed',
        t,
        settings,
        true,
      );
      return seen;
    });
    expect(traces[1]).not.toEqual(traces[0]);
  });
});

describe('near misses', () => {
  test("nearMissRecord() names the order offset and carries the hunt's decision", () => {
    const g = star(11);
    const rec = nearMissRecord({ graph: g, score: 0.25 }, 10, 'numerical');
    expect(rec).toEqual({
      graph6: encodeGraph6(g),
      order: 11,
      offset: 'n+1',
      score: 0.25,
      counterexample: 'numerical',
    });
    expect(graphsEqual(decodeGraph6(rec.graph6), g)).toBe(true);
    expect(nearMissRecord({ graph: star(8), score: -Infinity }, 10, null)).toMatchObject({
      offset: 'n-2',
      score: '-Infinity',
      counterexample: null,
    });
  });
  test('mergeNearMisses() keeps the best per order, by increasing order', () => {
    const a = { graph: star(9), score: 0.1 };
    const b = { graph: star(11), score: 0.3 };
    const c = { graph: star(9), score: 0.2 };
    expect(mergeNearMisses([a, b], [c])).toEqual([c, b]);
  });
});
