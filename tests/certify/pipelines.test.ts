/**
 * Certification behind the project's own pipelines, on true theorems whose float scores are
 * positive on equality graphs (see certify.test.ts for the citations): the isomorph-free sweep
 * (src/enumerate/sweep-part.ts) and the built-in family list of `refute check --families`
 * (src/conjecture/family-graphs.ts) report float "counterexamples"; certification rejects all.
 */
import { describe, expect, test } from 'vitest';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { defineConjecture } from '../../src/conjecture/define.js';
import { evaluateConjecture } from '../../src/conjecture/evaluate.js';
import { familyMembers } from '../../src/conjecture/family-graphs.js';
import { sweepPart } from '../../src/enumerate/sweep-part.js';
import { certifyCounterexample } from '../../src/certify/certify.js';

const TRUE_THEOREMS = [
  // Hong 1988.
  defineConjecture({
    name: 'hong',
    statement: 'connected G: λ1 <= √(2m − n + 1)',
    vertices: 7,
    connected: true,
    score: (g) => g.spectralRadius - Math.sqrt(2 * g.m - g.n + 1),
  }),
  // μ1 <= n (L(G) + L(Ḡ) = nI − J).
  defineConjecture({
    name: 'laplacian-at-most-order',
    statement: 'μ1 <= n',
    vertices: 7,
    score: (g) => g.laplacianSpectralRadius - g.n,
  }),
  // Σ λi² = 2m.
  defineConjecture({
    name: 'trace-identity',
    statement: 'Σ λi² <= 2m',
    vertices: 6,
    score: (g) => g.adjacencySpectrum.reduce((s, x) => s + x * x, 0) - 2 * g.m,
  }),
];

describe('sweep + certification', () => {
  test('sweepPart() reports float counterexamples to true theorems on 1..7 vertices; none is certified', () => {
    let numerical = 0;
    for (const c of TRUE_THEOREMS) {
      for (let order = 1; order <= c.vertices; order++) {
        for (const found of sweepPart(c, order, { index: 0, count: 1 }).counterexamples) {
          numerical++;
          expect(found.certified, `${c.name} on ${found.graph6}`).toBe(false);
          const cert = certifyCounterexample(c, decodeGraph6(found.graph6));
          expect(cert.certified, `${c.name} on ${found.graph6}: ${cert.reason}`).toBe(false);
        }
      }
    }
    expect(numerical).toBeGreaterThan(0); // the sweep alone would have refuted true theorems
  });
});

describe('check --families + certification', () => {
  test('family members with a positive float score are never certified', () => {
    let numerical = 0;
    for (const c of TRUE_THEOREMS) {
      for (const member of familyMembers(12)) {
        const e = evaluateConjecture(c, member.graph);
        if (!e.inDomain || e.score <= 0) continue;
        numerical++;
        expect(certifyCounterexample(c, member.graph).certified, `${c.name} on ${member.label}`).toBe(false);
      }
    }
    expect(numerical).toBeGreaterThan(0);
  });
});
