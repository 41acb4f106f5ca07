/**
 * The polisher's search (variable neighbourhood search over the move families): it reaches a
 * counterexample a few moves away, keeps the domain, keeps other orders apart in fixed-order
 * mode, stays within its step budget, and is deterministic for a seed. Every result is checked
 * by evaluating the conjecture again on the returned graph, and against closed forms.
 *
 * The test conjecture is a scenario of our own: "for every connected triangle-free graph,
 * spectralRadius <= averageDegree + 1". It is false: the star K_{1,n-1} has spectral radius
 * sqrt(n-1) (a standard fact, e.g. D. Cvetković, P. Rowlinson and S. Simić, "An Introduction to
 * the Theory of Graph Spectra", CUP 2010, §1.1) and average degree 2(n-1)/n, so its score
 * sqrt(n-1) - 2(n-1)/n - 1 is -0.1042 at n = 8, 0.0506 at n = 9 and 0.2 at n = 10.
 */
import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { fromEdges } from '../../src/graph/builders.js';
import { star } from '../../src/graph/families.js';
import { encodeGraph6 } from '../../src/graph/graph6.js';
import { type Graph, graphsEqual } from '../../src/graph/graph.js';
import { defineConjecture } from '../../src/conjecture/define.js';
import { evaluateConjecture } from '../../src/conjecture/evaluate.js';
import { ScoreEvaluationError } from '../../src/conjecture/errors.js';
import { type Conjecture, type Evaluation } from '../../src/conjecture/types.js';
import { computeInvariant } from '../../src/invariants/registry.js';
import { moveLeaf } from '../../src/search/polish/moves/move-leaf.js';
import { polishGraphs, polishStream } from '../../src/search/polish/polish-graphs.js';
import { polishGraph, POLISH_DEFAULTS, type PolishOutcome } from '../../src/search/polish/vns.js';
import { judge } from '../../src/conjecture/verdict.js';
import { isCertifiedCounterexample } from '../../src/certify/certify.js';
import { randomGraph, seededRng } from '../support/random-graph.js';
import { SPECTRAL_GAP, SPIDER } from '../support/spectral-gap-claim.js';

const starScore = (n: number): number => Math.sqrt(n - 1) - (2 * (n - 1)) / n - 1;

/** evaluateConjecture for c, recording every graph it is asked about. */
function recordingEvaluator(c: Conjecture): { evaluate: (g: Graph) => Evaluation; seen: Graph[] } {
  const seen: Graph[] = [];
  return {
    seen,
    evaluate: (g) => {
      seen.push(g);
      return evaluateConjecture(c, g);
    },
  };
}

/** Re-evaluates a polished graph independently of the search and checks the reported score. */
function expectGenuine(c: Conjecture, g: Graph, reported: number): number {
  const ev = evaluateConjecture(c, g);
  expect(ev.inDomain).toBe(true);
  if (!ev.inDomain) return NaN;
  expect(ev.score).toBe(reported);
  return ev.score;
}

describe('polishGraph()', () => {
  test('the spider is three leaf moves from the star K_{1,9}, which refutes the test conjecture', () => {
    // The premise of the next test, checked with the move functions and the closed form.
    const star10 = moveLeaf(moveLeaf(moveLeaf(SPIDER, 7, 0), 8, 0), 9, 0);
    expect(graphsEqual(star10, star(10))).toBe(true);
    const atStar = evaluateConjecture(SPECTRAL_GAP, star10);
    expect(atStar.inDomain && atStar.score).toBeCloseTo(starScore(10), 9);
    const atSpider = evaluateConjecture(SPECTRAL_GAP, SPIDER);
    expect(atSpider.inDomain && atSpider.score).toBeLessThan(0);
  });

  test('from the spider, polishing reaches a counterexample within 300 scored graphs (seed "1")', () => {
    const { evaluate, seen } = recordingEvaluator(SPECTRAL_GAP);
    const o = polishGraph(evaluate, SPIDER, polishStream('1', 0), {
      ...POLISH_DEFAULTS,
      steps: 300,
      fixedOrder: true,
      connected: true,
    });
    expect(o.best).toBeDefined();
    const score = expectGenuine(SPECTRAL_GAP, o.best!.graph, o.best!.score);
    expect(judge(SPECTRAL_GAP, o.best!.graph, { inDomain: true, score }).kind).toBe('refutes');
    // And exactly: the certifier (src/certify) confirms it.
    expect(isCertifiedCounterexample(SPECTRAL_GAP, o.best!.graph)).toBe(true);
    expect(computeInvariant(o.best!.graph, 'triangleCount')).toBe(0);
    expect(computeInvariant(o.best!.graph, 'isConnected')).toBe(true);
    expect(o.best!.graph.order).toBe(10);
    // The budget bounds the scored graphs, and every scored graph went through evaluate.
    expect(o.evaluations).toBeLessThanOrEqual(300);
    expect(seen.length).toBe(o.evaluations);
  });

  test('with connected, no disconnected graph is ever scored (start included)', () => {
    const { evaluate, seen } = recordingEvaluator(SPECTRAL_GAP);
    polishGraph(evaluate, SPIDER, polishStream('2', 0), {
      ...POLISH_DEFAULTS,
      steps: 400,
      connected: true,
    });
    expect(seen.length).toBeGreaterThan(100);
    for (const g of seen) expect(computeInvariant(g, 'isConnected'), encodeGraph6(g)).toBe(true);
  });

  test('fixed-order mode stays at the start order and keeps the counterexample at n+1 apart', () => {
    // From K_{1,7} (score -0.104 < 0), one pendant vertex at the centre gives K_{1,8} (0.0506 > 0).
    const { evaluate, seen } = recordingEvaluator(SPECTRAL_GAP);
    const o = polishGraph(evaluate, star(8), polishStream('3', 0), {
      ...POLISH_DEFAULTS,
      steps: 300,
      fixedOrder: true,
      connected: true,
    });
    expect(o.startEvaluation).toEqual({ inDomain: true, score: expect.closeTo(starScore(8), 12) });
    expect(o.best!.graph.order).toBe(8);
    expect(o.otherOrders.every((s) => s.graph.order === 7 || s.graph.order === 9)).toBe(true);
    const at9 = o.otherOrders.find((s) => s.graph.order === 9);
    expect(at9).toBeDefined();
    const score9 = expectGenuine(SPECTRAL_GAP, at9!.graph, at9!.score);
    expect(score9).toBeGreaterThanOrEqual(starScore(9) - 1e-9);
    expect(judge(SPECTRAL_GAP, at9!.graph, { inDomain: true, score: score9 }).kind).toBe('refutes');
    // Orders scored: 8 for the walk, 7 and 9 only as looks at the order-changing neighbours.
    expect(new Set(seen.map((g) => g.order))).toEqual(new Set([7, 8, 9]));
  });

  test('free-order mode walks across orders within start ± orderSlack and reaches a counterexample', () => {
    const { evaluate, seen } = recordingEvaluator(SPECTRAL_GAP);
    const o = polishGraph(evaluate, star(8), polishStream('4', 0), {
      ...POLISH_DEFAULTS,
      steps: 300,
      fixedOrder: false,
      connected: true,
      orderSlack: 2,
    });
    for (const g of seen) {
      expect(g.order).toBeGreaterThanOrEqual(6);
      expect(g.order).toBeLessThanOrEqual(10);
    }
    const best = o.otherOrders.reduce((a, b) => (b.score > a.score ? b : a));
    const score = expectGenuine(SPECTRAL_GAP, best.graph, best.score);
    // K_{1,9} at order 10 scores 0.2; the walk must at least beat K_{1,8} (0.0506).
    expect(score).toBeGreaterThanOrEqual(starScore(9) - 1e-9);
  });

  test('a start outside the domain (disconnected) still leads into the domain', () => {
    // Two disjoint stars K_{1,4}: disconnected, so outside; one toggle joins them.
    const g = fromEdges(10, [
      [0, 1],
      [0, 2],
      [0, 3],
      [0, 4],
      [5, 6],
      [5, 7],
      [5, 8],
      [5, 9],
    ]);
    const o = polishGraph((h) => evaluateConjecture(SPECTRAL_GAP, h), g, polishStream('5', 0), {
      ...POLISH_DEFAULTS,
      steps: 200,
      fixedOrder: true,
      connected: true,
    });
    expect(o.startEvaluation.inDomain).toBe(false);
    expect(o.best).toBeDefined();
    expectGenuine(SPECTRAL_GAP, o.best!.graph, o.best!.score);
  });

  test('a score that returns NaN stops the polish with the error naming conjecture and graph', () => {
    const bad = defineConjecture({
      name: 'nan-on-triangles',
      statement: 'test',
      vertices: 4,
      score: (g) => (g.triangleCount > 0 ? NaN : g.size),
    });
    // Raising the size of a 4-vertex graph soon makes a triangle.
    const run = (): PolishOutcome =>
      polishGraph((h) => evaluateConjecture(bad, h), fromEdges(4, [[0, 1]]), polishStream('6', 0), {
        ...POLISH_DEFAULTS,
        steps: 50,
        fixedOrder: true,
      });
    expect(run).toThrow(ScoreEvaluationError);
    expect(run).toThrow(/conjecture 'nan-on-triangles': score returned NaN/);
  });

  test('bad settings are refused with a RangeError', () => {
    const ev = (h: Graph): Evaluation => evaluateConjecture(SPECTRAL_GAP, h);
    expect(() => polishGraph(ev, SPIDER, polishStream('7', 0), { ...POLISH_DEFAULTS, steps: 0 })).toThrow(
      /steps to be an integer >= 1 but found 0/,
    );
  });

  test('any start and budget: every scored graph is simple, within the orders, and the budget holds', () => {
    const sizeScore = defineConjecture({
      name: 'size-vs-order',
      statement: 'test',
      vertices: 6,
      score: (g) => g.size - 2 * g.order + g.maxDegree,
    });
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 12 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 1, max: 60 }),
        fc.boolean(),
        fc.integer({ min: 0, max: 1000 }),
        (n, p, steps, fixedOrder, seed) => {
          const start = randomGraph(n, p, seededRng(`start-${seed}`));
          const { evaluate, seen } = recordingEvaluator(sizeScore);
          const o = polishGraph(evaluate, start, polishStream(String(seed), 0), {
            ...POLISH_DEFAULTS,
            steps,
            fixedOrder,
            orderSlack: 2,
          });
          expect(o.evaluations).toBeLessThanOrEqual(steps);
          expect(seen.length).toBe(o.evaluations);
          const lo = fixedOrder ? n - 1 : n - 2;
          const hi = fixedOrder ? n + 1 : n + 2;
          for (const g of seen) {
            expect(g.order).toBeGreaterThanOrEqual(Math.max(1, lo));
            expect(g.order).toBeLessThanOrEqual(hi);
            expect(g.degrees.reduce((a, b) => a + b, 0)).toBe(2 * g.size);
          }
          if (o.best !== undefined) expect(o.best.graph.order).toBe(n);
        },
      ),
      { numRuns: 40, seed: 13 },
    );
  });
});

describe('determinism', () => {
  function trace(seed: string): { outcome: PolishOutcome; scored: string[] } {
    const { evaluate, seen } = recordingEvaluator(SPECTRAL_GAP);
    const outcome = polishGraph(evaluate, SPIDER, polishStream(seed, 0), {
      ...POLISH_DEFAULTS,
      steps: 250,
      connected: true,
    });
    return { outcome, scored: seen.map(encodeGraph6) };
  }

  test('the same seed scores the same graphs in the same order and returns the same results', () => {
    const a = trace('42');
    const b = trace('42');
    expect(b.scored).toEqual(a.scored);
    expect(encodeGraph6(b.outcome.best!.graph)).toBe(encodeGraph6(a.outcome.best!.graph));
    expect(b.outcome.best!.score).toBe(a.outcome.best!.score);
    expect(b.outcome.otherOrders.map((s) => [encodeGraph6(s.graph), s.score])).toEqual(
      a.outcome.otherOrders.map((s) => [encodeGraph6(s.graph), s.score]),
    );
  });

  test('another seed takes another walk', () => {
    expect(trace('43').scored).not.toEqual(trace('42').scored);
  });

  test("polishGraphs(): a graph's result depends only on the seed, the settings and its place", () => {
    const ev = (h: Graph): Evaluation => evaluateConjecture(SPECTRAL_GAP, h);
    const options = { seed: 's', steps: 120, connected: true, fixedOrder: true };
    const both = polishGraphs(ev, [star(10), SPIDER], options);
    const other = polishGraphs(ev, [SPIDER, SPIDER], options);
    const alone = polishGraph(ev, SPIDER, polishStream('s', 1), { ...POLISH_DEFAULTS, ...options });
    for (const o of [both.outcomes[1], other.outcomes[1]]) {
      expect(encodeGraph6(o.best!.graph)).toBe(encodeGraph6(alone.best!.graph));
      expect(o.evaluations).toBe(alone.evaluations);
    }
    // The batch's other-order list holds the best of each order over its outcomes.
    for (const s of both.otherOrders) {
      const candidates = both.outcomes
        .flatMap((o) => o.otherOrders)
        .filter((t) => t.graph.order === s.graph.order);
      expect(s.score).toBe(Math.max(...candidates.map((t) => t.score)));
    }
  });
});
