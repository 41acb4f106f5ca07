import { describe, expect, it, vi } from 'vitest';
import { evaluateConjecture, evaluateWithTrace } from '../../src/conjecture/evaluate.js';
import { defineConjecture } from '../../src/conjecture/define.js';
import { ScoreEvaluationError } from '../../src/conjecture/errors.js';
import { type ConjectureSpec } from '../../src/conjecture/types.js';
import { emptyGraph, path, star } from '../../src/graph/families.js';
import { InputError } from '../../src/errors.js';

const base: ConjectureSpec = { name: 'probe', statement: 's', vertices: 4, score: (g) => g.maxDegree - 2 };

function errorOf(run: () => unknown): Error {
  try {
    run();
  } catch (err) {
    return err as Error;
  }
  throw new Error('expected an error');
}

describe('evaluateConjecture()', () => {
  it('scores a graph in the domain (star K_{1,3}: maxDegree 3)', () => {
    expect(evaluateConjecture(defineConjecture(base), star(4))).toEqual({ inDomain: true, score: 1 });
  });

  it('checks connectedness first: neither where nor score runs on a disconnected graph', () => {
    const where = vi.fn(() => true);
    const score = vi.fn(() => 1);
    const c = defineConjecture({ ...base, connected: true, where, score });
    expect(evaluateConjecture(c, emptyGraph(3))).toEqual({ inDomain: false });
    expect(where).not.toHaveBeenCalled();
    expect(score).not.toHaveBeenCalled();
    expect(evaluateConjecture(c, path(3))).toEqual({ inDomain: true, score: 1 });
    expect(where).toHaveBeenCalledTimes(1);
  });

  it('checks where before score', () => {
    const score = vi.fn(() => 1);
    const c = defineConjecture({ ...base, where: (g) => g.maxDegree >= 3, score });
    expect(evaluateConjecture(c, path(4))).toEqual({ inDomain: false });
    expect(score).not.toHaveBeenCalled();
    expect(evaluateConjecture(c, star(4))).toEqual({ inDomain: true, score: 1 });
  });

  it('computes an invariant once when where and score both read it', () => {
    let reads = 0;
    const c = defineConjecture({
      ...base,
      where: (g) => (reads++, g.degreeSequence.length > 0),
      score: (g) => (reads++, g.degreeSequence[0] - 3),
    });
    expect(evaluateConjecture(c, star(4))).toEqual({ inDomain: true, score: 0 });
    expect(reads).toBe(2);
  });

  it('accepts ±Infinity as ordinary scores', () => {
    expect(evaluateConjecture(defineConjecture({ ...base, score: () => Infinity }), path(2))).toEqual({
      inDomain: true,
      score: Infinity,
    });
    expect(evaluateConjecture(defineConjecture({ ...base, score: () => -Infinity }), path(2))).toEqual({
      inDomain: true,
      score: -Infinity,
    });
  });

  // graph6 of P3 by hand: n = 3 -> 'B'; bits x01 x02 x12 = 1 0 1, padded 101000 = 40 -> 'g'.
  it('reports NaN with the conjecture and the graph in graph6', () => {
    const err = errorOf(() =>
      evaluateConjecture(defineConjecture({ ...base, score: (g) => 0 / (g.size - 2) }), path(3)),
    );
    expect(err).toBeInstanceOf(ScoreEvaluationError);
    expect(err).toBeInstanceOf(InputError);
    expect(err.message).toMatch(
      /^conjecture 'probe': score returned NaN on graph 'Bg' \(graph6\); NaN often comes from 0\/0, .*; restrict the conjecture's domain/,
    );
  });

  it.each([
    [() => 'big', 'the string "big"'],
    [() => undefined, 'undefined'],
    [() => 3n, 'bigint 3n'],
    [() => Promise.resolve(1), 'a Promise'],
    [() => ({}), 'an object'],
  ])('reports a non-number score (%s) saying what it was', (score, what) => {
    const err = errorOf(() =>
      evaluateConjecture(defineConjecture({ ...base, score: score as never }), path(3)),
    );
    expect(err).toBeInstanceOf(ScoreEvaluationError);
    expect(err.message).toContain(what);
    expect(err.message).toContain("on graph 'Bg'");
  });

  it('reports a score that throws, with the thrown message and the graph', () => {
    const c = defineConjecture({
      ...base,
      score: () => {
        throw new RangeError('no such thing');
      },
    });
    const err = errorOf(() => evaluateConjecture(c, path(3)));
    expect(err).toBeInstanceOf(ScoreEvaluationError);
    expect(err.message).toBe(
      "conjecture 'probe': score threw RangeError: no such thing on graph 'Bg' (graph6)",
    );
  });

  it('reports a where that returns a non-boolean or throws', () => {
    const c1 = defineConjecture({ ...base, where: (() => 1) as never });
    expect(errorOf(() => evaluateConjecture(c1, path(3))).message).toContain(
      'where returned number 1 instead of true or false',
    );
    const c2 = defineConjecture({
      ...base,
      where: () => {
        throw new Error('bad');
      },
    });
    expect(errorOf(() => evaluateConjecture(c2, path(3))).message).toBe(
      "conjecture 'probe': where threw bad on graph 'Bg' (graph6)",
    );
  });

  it('reports an invariant undefined on the graph, suggesting to restrict the domain', () => {
    // λ2 needs two eigenvalues: K1 ('@', graph6 of the one-vertex graph) has one.
    const c = defineConjecture({ ...base, score: (g) => g.secondLargestEigenvalue });
    const err = errorOf(() => evaluateConjecture(c, emptyGraph(1)));
    expect(err).toBeInstanceOf(ScoreEvaluationError);
    expect(err.message).toMatch(
      /^conjecture 'probe': score threw InvariantDomainError: secondLargestEigenvalue .* on graph '@' \(graph6\); restrict the conjecture's domain/,
    );
  });

  it('reports a misspelt invariant with the conjecture and the closest name', () => {
    const c = defineConjecture({ ...base, score: (g) => (g as unknown as { minDegre: number }).minDegre });
    const err = errorOf(() => evaluateConjecture(c, path(3)));
    expect(err).toBeInstanceOf(InputError);
    expect(err.message).toContain(
      "conjecture 'probe': score: g.minDegre is not an invariant; did you mean g.minDegree?",
    );
  });
});

describe('evaluateWithTrace()', () => {
  it('lists the invariants where and score read', () => {
    const c = defineConjecture({
      ...base,
      where: (g) => g.isTree,
      score: (g) => g.maxDegree - g.complement.minDegree,
    });
    const t = evaluateWithTrace(c, star(4));
    // K_{1,3}: Δ = 3; its complement is K3 plus an isolated vertex, δ = 0.
    expect(t.inDomain).toBe(true);
    expect(t.inDomain && t.score).toBe(3);
    expect([...t.used].sort()).toEqual(['complement.minDegree', 'isTree', 'maxDegree']);
  });
});
