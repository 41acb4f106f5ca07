/**
 * The example conjecture files of scores/ against values computed independently with
 * networkx/numpy (tests/scripts/make_score_references.py -> tests/fixtures/score-references.json)
 * and against closed forms.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { loadConjectureFile } from '../../src/conjecture/load.js';
import { evaluateConjecture } from '../../src/conjecture/evaluate.js';
import { judge } from '../../src/conjecture/verdict.js';
import { familyMembers } from '../../src/conjecture/family-graphs.js';
import { type Conjecture } from '../../src/conjecture/types.js';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { star } from '../../src/graph/families.js';

const root = path.resolve(import.meta.dirname, '../..');
const atlas = readFileSync(path.join(root, 'tests/fixtures/atlas-1-7.g6'), 'utf8').trim().split('\n');
const reference = JSON.parse(
  readFileSync(path.join(root, 'tests/fixtures/score-references.json'), 'utf8'),
) as {
  scoreNames: string[];
  atlasScores: Array<Array<number | null> | null>;
  familyMaxima: Record<string, { score: number; graph6: string }>;
  twoStarTrees: Array<{
    leaves: [number, number];
    graph6: string;
    secondLargestEigenvalue: number;
    matchingNumber: number;
  }>;
  completeMinusStar: Array<{
    order: number;
    starLeaves: number;
    graph6: string;
    secondLargestEigenvalue: number;
  }>;
  completeMinus4Cycle: Array<{ order: number; graph6: string; secondLargestEigenvalue: number }>;
};

const conjectures = new Map<string, Conjecture>();
beforeAll(async () => {
  for (const name of reference.scoreNames) {
    const file = await loadConjectureFile(path.join(root, 'scores', `${name}.ts`));
    expect(file.conjectures.map((c) => c.name)).toEqual([name]);
    conjectures.set(name, file.conjectures[0]);
  }
});

function scoreOf(c: Conjecture, g6: string): number | undefined {
  const e = evaluateConjecture(c, decodeGraph6(g6));
  return e.inDomain ? e.score : undefined;
}

describe('scores/ examples on every graph with at most 7 vertices (networkx atlas)', () => {
  it.each([0, 1, 2, 3])(
    '%i: scores equal the networkx/numpy values within 1e-9, and no graph refutes',
    (index) => {
      const name = reference.scoreNames[index];
      const c = conjectures.get(name)!;
      expect(atlas.length).toBe(reference.atlasScores.length);
      atlas.forEach((g6, i) => {
        const expected = reference.atlasScores[i];
        const graph = decodeGraph6(g6);
        const evaluation = evaluateConjecture(c, graph);
        const value = expected === null ? null : expected[index];
        if (value === null) {
          // Disconnected (outside every example's domain), or K1 (no λ2; excluded by where).
          expect(evaluation.inDomain, g6).toBe(false);
          return;
        }
        expect(evaluation.inDomain, g6).toBe(true);
        if (!evaluation.inDomain) return;
        expect(Math.abs(evaluation.score - value), `${name} on ${g6}`).toBeLessThanOrEqual(1e-9);
        expect(judge(c, graph, evaluation).kind, `${name} on ${g6}`).not.toBe('refutes');
      });
    },
  );
});

describe('scores/spectral-radius-near-average-degree.ts', () => {
  it('is refuted by the built-in families first on 9 vertices, by the star among others', () => {
    const c = conjectures.get('spectral-radius-near-average-degree')!;
    const refuting = [...familyMembers(12)].filter(
      (m) => judge(c, m.graph, evaluateConjecture(c, m.graph)).kind === 'refutes',
    );
    expect(Math.min(...refuting.map((m) => m.graph.order))).toBe(9);
    expect(refuting.map((m) => m.label)).toContain('star(9)');
    // K_{1,8}: λ1 = √8 (closed form for stars), average degree 16/9.
    expect(scoreOf(c, 'HsaCCA?')).toBeCloseTo(Math.sqrt(8) - 16 / 9 - 1, 12);
    const e = evaluateConjecture(c, star(9));
    expect(e.inDomain && e.score).toBeCloseTo(Math.sqrt(8) - 16 / 9 - 1, 12);
  });
});

describe('scores/second-eigenvalue-vs-matching.ts (the hunt demo)', () => {
  it('holds on every built-in family up to 20 vertices (networkx agrees: largest score below 0)', () => {
    const c = conjectures.get('second-eigenvalue-vs-matching')!;
    let best = -Infinity;
    for (const m of familyMembers(20)) {
      const e = evaluateConjecture(c, m.graph);
      if (e.inDomain) best = Math.max(best, e.score);
    }
    expect(best).toBeLessThan(0);
    // Our families are a subset of the networkx builds, up to isomorphism.
    expect(best).toBeLessThanOrEqual(reference.familyMaxima['second-eigenvalue-vs-matching'].score + 1e-9);
    expect(reference.familyMaxima['second-eigenvalue-vs-matching'].score).toBeLessThan(0);
  });

  it('is refuted by the two-star trees T(5,4), T(5,5), T(6,5) and tight on T(4,4), as the header proves', () => {
    const c = conjectures.get('second-eigenvalue-vs-matching')!;
    for (const t of reference.twoStarTrees) {
      const s = scoreOf(c, t.graph6)!;
      expect(Math.abs(s - (t.secondLargestEigenvalue - t.matchingNumber)), t.graph6).toBeLessThanOrEqual(
        1e-9,
      );
      const [a, b] = t.leaves;
      const verdict = judge(c, decodeGraph6(t.graph6), { inDomain: true, score: s }).kind;
      expect(verdict, t.graph6).toBe(a === 4 && b === 4 ? 'tight' : 'refutes');
      // λ2(T(k,k)) >= √k by the eigenvector of the header, ν = 2.
      if (a === b) expect(s).toBeGreaterThanOrEqual(Math.sqrt(a) - 2 - 1e-9);
    }
  });
});

describe('scores/hong-spectral-radius-bound.ts (a true theorem)', () => {
  it('is refuted by no built-in family up to 20 vertices, and is tight exactly on complete graphs and stars', () => {
    const c = conjectures.get('hong-spectral-radius-bound')!;
    let tightCount = 0;
    for (const m of familyMembers(20)) {
      const g = m.graph;
      const verdict = judge(c, g, evaluateConjecture(c, g)).kind;
      expect(verdict, m.label).not.toBe('refutes');
      // Hong 1988: equality exactly for K_n (m = C(n,2)) and K_{1,n-1} (m = n-1, Δ = n-1).
      const n = g.order;
      const isCompleteOrStar =
        g.size === (n * (n - 1)) / 2 || (g.size === n - 1 && Math.max(...g.degrees) === n - 1);
      if (verdict !== 'outside-domain') expect(verdict === 'tight', m.label).toBe(isCompleteOrStar);
      if (verdict === 'tight') tightCount++;
    }
    // K1, K2, P3, K3, then star(n) and complete(n) for n = 4..20.
    expect(tightCount).toBe(4 + 2 * 17);
  });
});

describe('scores/second-eigenvalue-vs-complement-degree.ts (the quick hunt demo)', () => {
  it('holds on every built-in family up to 20 vertices', () => {
    const c = conjectures.get('second-eigenvalue-vs-complement-degree')!;
    for (const m of familyMembers(20))
      expect(judge(c, m.graph, evaluateConjecture(c, m.graph)).kind, m.label).not.toBe('refutes');
    expect(reference.familyMaxima['second-eigenvalue-vs-complement-degree'].score).toBeLessThan(0);
  });

  it('is refuted by K_10 minus a star K_{1,3}: λ2 is the middle root of x³ − 7x² − 14x + 12 (header)', () => {
    const c = conjectures.get('second-eigenvalue-vs-complement-degree')!;
    // The middle root by bisection on (0.6, 0.7), where f changes sign; no eigen-solver involved.
    const f = (x: number) => x ** 3 - 7 * x ** 2 - 14 * x + 12;
    let [lo, hi] = [0.6, 0.7];
    expect(f(lo)).toBeGreaterThan(0);
    expect(f(hi)).toBeLessThan(0);
    for (let i = 0; i < 60; i++) {
      const mid = (lo + hi) / 2;
      if (f(mid) > 0) lo = mid;
      else hi = mid;
    }
    const s = scoreOf(c, 'IJ~~~~~~w')!;
    expect(s).toBeCloseTo(lo - 0.6, 9);
    for (const t of reference.completeMinusStar) {
      const expected = t.secondLargestEigenvalue - (2 * t.starLeaves) / t.order;
      expect(scoreOf(c, t.graph6), t.graph6).toBeCloseTo(expected, 9);
      expect(judge(c, decodeGraph6(t.graph6), { inDomain: true, score: expected }).kind).toBe(
        t.order >= 10 ? 'refutes' : 'holds',
      );
    }
  });

  it('is refuted by K_n minus a 4-cycle for n >= 9 and tight at n = 8: λ2 = 1 against 8/n (header)', () => {
    const c = conjectures.get('second-eigenvalue-vs-complement-degree')!;
    for (const t of reference.completeMinus4Cycle) {
      // numpy agrees that λ2 = 1 (the eigenvector of the header).
      expect(t.secondLargestEigenvalue).toBeCloseTo(1, 12);
      const s = scoreOf(c, t.graph6)!;
      expect(s, t.graph6).toBeCloseTo(1 - 8 / t.order, 12);
      expect(judge(c, decodeGraph6(t.graph6), { inDomain: true, score: s }).kind).toBe(
        t.order === 8 ? 'tight' : 'refutes',
      );
    }
  });
});
