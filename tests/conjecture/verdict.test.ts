import { describe, expect, it } from 'vitest';
import { judge, checkExitStatus, ROUNDING_MARGIN } from '../../src/conjecture/verdict.js';
import { defineConjecture } from '../../src/conjecture/define.js';
import { evaluateConjecture } from '../../src/conjecture/evaluate.js';
import { complete, path, star } from '../../src/graph/families.js';
import { type Conjecture } from '../../src/conjecture/types.js';
import { type Graph } from '../../src/graph/graph.js';

const verdictOf = (c: Conjecture, g: Graph) => judge(c, g, evaluateConjecture(c, g));

describe('judge()', () => {
  it('calls a certified positive score a refutation', () => {
    // Δ(P3) = 2 > 1.5: a false claim with an exact integer margin.
    const c = defineConjecture({ name: 'x', statement: 's', vertices: 3, score: (g) => g.maxDegree - 1.5 });
    expect(verdictOf(c, path(3))).toEqual({ kind: 'refutes', certification: 'certified' });
  });

  it('calls a positive float score on an equality case tight, never a refutation', () => {
    // The star K_{1,n-1} has spectrum ±sqrt(n-1) and 0 (Cvetković–Rowlinson–Simić 2010, §1.1), so
    // λ1^2 - (n-1) is 0 exactly; in floating point it is +4.4e-16 on the star with 8 vertices.
    const c = defineConjecture({
      name: 'star-radius',
      statement: 's',
      vertices: 8,
      score: (g) => g.spectralRadius * g.spectralRadius - (g.n - 1),
    });
    const evaluation = evaluateConjecture(c, star(8));
    expect(evaluation.inDomain && evaluation.score).toBeGreaterThan(0);
    expect(judge(c, star(8), evaluation)).toEqual({ kind: 'tight', certification: null });
  });

  it('calls a positive score that uses an uncertifiable invariant numerical only', () => {
    // estradaIndex(K_3) = e^2 + 2e^-1 ≈ 8.13 (closed form from the spectrum 2, -1, -1).
    const c = defineConjecture({ name: 'e', statement: 's', vertices: 3, score: (g) => g.estradaIndex - 8 });
    expect(verdictOf(c, complete(3))).toEqual({ kind: 'numerical-only', certification: 'numerical' });
  });

  it('labels a non-positive score within the margin tight, a lower one holds, and the outside of the domain so', () => {
    const at = (value: number) =>
      defineConjecture({ name: 'k', statement: 's', vertices: 3, score: () => value });
    expect(verdictOf(at(0), path(3)).kind).toBe('tight');
    expect(verdictOf(at(-ROUNDING_MARGIN), path(3)).kind).toBe('tight');
    expect(verdictOf(at(-1), path(3))).toEqual({ kind: 'holds', certification: null });
    expect(verdictOf(at(-Infinity), path(3)).kind).toBe('holds');
    const connectedOnly = defineConjecture({
      name: 'c',
      statement: 's',
      vertices: 3,
      connected: true,
      score: () => 1,
    });
    expect(judge(connectedOnly, path(3), { inDomain: false })).toEqual({
      kind: 'outside-domain',
      certification: null,
    });
  });
});

describe('checkExitStatus()', () => {
  it('is 0 (grep convention: found) with a refutation and 1 without', () => {
    expect(checkExitStatus(3)).toBe(0);
    expect(checkExitStatus(0)).toBe(1);
  });
});
