/**
 * The certified (second) computations of every invariant: agreement with the registry on the
 * atlas of small graphs, and published or closed-form values for the hard ones.
 *
 * Values: Petersen graph α = 4, ω = 2, χ = 3, γ = 3, ν = 5, κ = λ' = 3, girth 5, diameter 2,
 * τ = 2000 (D. A. Holton and J. Sheehan, "The Petersen Graph", CUP 1993; τ from memory);
 * Cayley's formula τ(K_n) = n^(n-2); τ(K_(p,q)) = p^(q-1) q^(p-1) (Scoins 1962); τ(C_n) = n;
 * ν(P_n) = ν(C_n) = ⌊n/2⌋; ν(K_(p,q)) = min(p, q); χ(C_n) = 2 or 3 by parity; κ(K_n) = n - 1.
 */
import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import * as F from '../../src/graph/families.js';
import { complement } from '../../src/graph/builders.js';
import { InvariantMemo, invariantNames } from '../../src/invariants/registry.js';
import {
  ExactContext,
  certifiableInvariantNames,
  certifyInvariant,
} from '../../src/certify/certified-invariants.js';
import {
  chromaticNumberExhaustive,
  cliqueNumberExhaustive,
  dominationNumberExhaustive,
  edgeConnectivityExhaustive,
  edgeConnectivityStoerWagner,
  independenceNumberByBranching,
  independenceNumberExhaustive,
  matchingNumberByTutteRank,
  matchingNumberExhaustive,
  vertexConnectivityExhaustive,
} from '../../src/certify/independent/exhaustive.js';
import { toDoubleAbove, toDoubleBelow } from '../../src/certify/rational.js';
import { randomGraph, seededRng } from '../support/random-graph.js';

function exactValue(g: ReturnType<typeof decodeGraph6>, name: string): unknown {
  const c = certifyInvariant(new ExactContext(g, 50), name);
  if (c.status !== 'exact') throw new Error(`${name}: expected an exact value but found ${c.status}`);
  return c.value;
}

describe('certifyInvariant() against the registry', () => {
  const lines = readFileSync(new URL('../fixtures/atlas-1-7.g6', import.meta.url), 'utf8')
    .trim()
    .split('\n');
  // Every graph on 1..6 vertices and every 5th on 7: the registry's algorithms are independent of these.
  const sample = lines.filter((l, i) => decodeGraph6(l).order < 7 || i % 5 === 0);

  test('every registry invariant has a certification entry', () => {
    const certifiable = new Set(certifiableInvariantNames());
    expect(invariantNames().filter((n) => !certifiable.has(n))).toEqual([]);
  });

  test('exact values equal the registry, enclosures contain its floats (1e-9)', () => {
    let exactCount = 0;
    let enclosedCount = 0;
    for (const line of sample) {
      const g = decodeGraph6(line);
      const memo = new InvariantMemo(g);
      const ctx = new ExactContext(g, 50);
      for (const name of invariantNames()) {
        let registry: unknown;
        try {
          registry = memo.get(name);
        } catch {
          continue; // outside the invariant's domain (distance spectra of disconnected graphs)
        }
        const c = certifyInvariant(ctx, name);
        if (c.status === 'exact') {
          const norm = (v: unknown) =>
            JSON.stringify(v, (_k, x) => (typeof x === 'bigint' ? x.toString() : x));
          expect(norm(c.value), `${name} of ${line}`).toBe(norm(registry));
          exactCount++;
        } else if (c.status === 'enclosed') {
          const floats = c.isList ? (registry as number[]) : [registry as number];
          expect(floats.length, `${name} of ${line}`).toBe(c.enclosures.length);
          c.enclosures.forEach((e, i) => {
            expect(floats[i], `${name}[${i}] of ${line}`).toBeGreaterThanOrEqual(toDoubleBelow(e.lo) - 1e-9);
            expect(floats[i], `${name}[${i}] of ${line}`).toBeLessThanOrEqual(toDoubleAbove(e.hi) + 1e-9);
          });
          enclosedCount++;
        } else {
          expect(name, `${name} of ${line} unconfirmed: ${c.reason}`).toBe('estradaIndex');
        }
      }
    }
    expect(exactCount).toBeGreaterThan(1000);
    expect(enclosedCount).toBeGreaterThan(1000);
  });
});

describe('certifyInvariant() against the registry on larger random graphs', () => {
  const HARD = [
    'matchingNumber',
    'independenceNumber',
    'cliqueNumber',
    'chromaticNumber',
    'dominationNumber',
    'vertexCoverNumber',
    'vertexConnectivity',
    'edgeConnectivity',
    'spanningTreeCount',
    'bridgeCount',
    'cutVertexCount',
    'girth',
    'triangleCount',
  ];
  test('hard integer invariants agree on seeded G(n, p), n = 12..18 and n = 24 (Tutte rank, Stoer–Wagner)', () => {
    const rng = seededRng('certify-vs-registry-large');
    const graphs = [
      ...Array.from({ length: 8 }, () => randomGraph(12 + Math.floor(rng() * 7), 0.15 + 0.6 * rng(), rng)),
      randomGraph(24, 0.2, rng),
    ];
    for (const g of graphs) {
      const memo = new InvariantMemo(g);
      const ctx = new ExactContext(g, 50);
      for (const name of HARD) {
        const c = certifyInvariant(ctx, name);
        if (c.status === 'unconfirmed') {
          expect(g.order, `${name} unconfirmed at n = ${g.order}`).toBeGreaterThan(20);
          continue;
        }
        expect(c.status).toBe('exact');
        if (c.status === 'exact')
          expect(String(c.value), `${name}, n = ${g.order}`).toBe(String(memo.get(name)));
      }
    }
  });
});

describe("certifyInvariant() outside an invariant's domain", () => {
  test('secondLargestEigenvalue of K_1 and distance spectra of disconnected graphs are unconfirmed, not wrong', () => {
    expect(certifyInvariant(new ExactContext(F.complete(1), 50), 'secondLargestEigenvalue').status).toBe(
      'unconfirmed',
    );
    expect(certifyInvariant(new ExactContext(F.emptyGraph(3), 50), 'distanceSpectralRadius').status).toBe(
      'unconfirmed',
    );
    expect(certifyInvariant(new ExactContext(F.path(3), 50), 'noSuchInvariant').status).toBe('unconfirmed');
  });
});

describe('second algorithms on named graphs', () => {
  test('Petersen graph values', () => {
    const p = F.petersen();
    expect(independenceNumberExhaustive(p)).toBe(4);
    expect(cliqueNumberExhaustive(p)).toBe(2);
    expect(chromaticNumberExhaustive(p)).toBe(3);
    expect(dominationNumberExhaustive(p)).toBe(3);
    expect(matchingNumberExhaustive(p)).toBe(5);
    expect(vertexConnectivityExhaustive(p)).toBe(3);
    expect(edgeConnectivityExhaustive(p)).toBe(3);
    expect(exactValue(p, 'girth')).toBe(5);
    expect(exactValue(p, 'diameter')).toBe(2);
    expect(exactValue(p, 'spanningTreeCount')).toBe(2000);
  });

  test('spanning trees: Cayley n^(n-2), K_(p,q): p^(q-1) q^(p-1), C_n: n, disconnected: 0', () => {
    for (let n = 1; n <= 12; n++)
      expect(BigInt(exactValue(F.complete(n), 'spanningTreeCount') as number)).toBe(
        BigInt(n) ** BigInt(Math.max(0, n - 2)),
      );
    // K_20: 20^18 > 2^53, returned as a bigint.
    expect(exactValue(F.complete(20), 'spanningTreeCount')).toBe(20n ** 18n);
    for (let p = 1; p <= 5; p++)
      for (let q = 1; q <= 5; q++)
        expect(exactValue(F.completeBipartite(p, q), 'spanningTreeCount')).toBe(p ** (q - 1) * q ** (p - 1));
    for (let n = 3; n <= 12; n++) expect(exactValue(F.cycle(n), 'spanningTreeCount')).toBe(n);
    expect(exactValue(F.emptyGraph(3), 'spanningTreeCount')).toBe(0);
  });

  test('chromatic numbers of cycles, complete and complete multipartite graphs', () => {
    for (let n = 3; n <= 15; n++) expect(chromaticNumberExhaustive(F.cycle(n))).toBe(n % 2 === 0 ? 2 : 3);
    for (let n = 1; n <= 12; n++) expect(chromaticNumberExhaustive(F.complete(n))).toBe(n);
    expect(chromaticNumberExhaustive(F.completeMultipartite([2, 3, 4, 1]))).toBe(4);
    expect(chromaticNumberExhaustive(F.emptyGraph(5))).toBe(1);
  });

  test('connectivity conventions: K_n gives n - 1, disconnected 0, n = 1 gives 0', () => {
    for (let n = 2; n <= 10; n++) {
      expect(vertexConnectivityExhaustive(F.complete(n))).toBe(n - 1);
      expect(edgeConnectivityExhaustive(F.complete(n))).toBe(n - 1);
    }
    expect(vertexConnectivityExhaustive(F.emptyGraph(4))).toBe(0);
    expect(edgeConnectivityExhaustive(F.emptyGraph(4))).toBe(0);
    expect(vertexConnectivityExhaustive(F.complete(1))).toBe(0);
    expect(vertexConnectivityExhaustive(F.star(6))).toBe(1);
    expect(edgeConnectivityExhaustive(F.cycle(9))).toBe(2);
  });

  test("identities: α(G) = ω(Ḡ); Whitney κ <= λ' <= δ (seeded random graphs)", () => {
    const rng = seededRng('certify-identities');
    for (let t = 0; t < 25; t++) {
      const g = randomGraph(5 + Math.floor(rng() * 9), 0.2 + 0.6 * rng(), rng);
      expect(independenceNumberExhaustive(g)).toBe(cliqueNumberExhaustive(complement(g)));
      const kappa = vertexConnectivityExhaustive(g)!;
      const lambda = edgeConnectivityExhaustive(g)!;
      expect(kappa).toBeLessThanOrEqual(lambda);
      expect(lambda).toBeLessThanOrEqual(Math.min(...g.degrees));
    }
  });
});

describe('independenceNumberByBranching()', () => {
  test('agrees with the exhaustive subset pass on seeded random graphs (α and ω)', () => {
    const rng = seededRng('branching-vs-subsets');
    for (let t = 0; t < 30; t++) {
      const g = randomGraph(3 + Math.floor(rng() * 15), 0.1 + 0.8 * rng(), rng);
      expect(independenceNumberByBranching(g, false)).toBe(independenceNumberExhaustive(g));
      expect(independenceNumberByBranching(g, true)).toBe(cliqueNumberExhaustive(g));
    }
  });

  test('closed forms above the exhaustive limit: α(C_n) = ⌊n/2⌋, α(K_(p,q)) = max(p, q), ω(K_n) = n', () => {
    for (const n of [21, 33, 48]) {
      expect(independenceNumberByBranching(F.cycle(n), false)).toBe(Math.floor(n / 2));
      expect(independenceNumberByBranching(F.complete(n), true)).toBe(n);
      expect(independenceNumberByBranching(F.path(n), false)).toBe(Math.ceil(n / 2));
    }
    expect(independenceNumberByBranching(F.completeBipartite(9, 15), false)).toBe(15);
    expect(independenceNumberByBranching(F.completeBipartite(9, 15), true)).toBe(2);
  });
});

describe('edgeConnectivityStoerWagner()', () => {
  test('agrees with the exhaustive cut on seeded random graphs, and gives n - 1 on K_n, 2 on C_n', () => {
    const rng = seededRng('stoer-wagner');
    for (let t = 0; t < 30; t++) {
      const g = randomGraph(2 + Math.floor(rng() * 12), 0.1 + 0.7 * rng(), rng);
      expect(edgeConnectivityStoerWagner(g)).toBe(edgeConnectivityExhaustive(g));
    }
    expect(edgeConnectivityStoerWagner(F.complete(25))).toBe(24);
    expect(edgeConnectivityStoerWagner(F.cycle(30))).toBe(2);
    expect(edgeConnectivityStoerWagner(F.hypercube(5))).toBe(5); // Q_d is d-edge-connected (from memory)
    expect(edgeConnectivityStoerWagner(F.emptyGraph(22))).toBe(0);
  });
});

describe('matchingNumberByTutteRank()', () => {
  test('agrees with the subset dynamic programme on seeded random graphs', () => {
    const rng = seededRng('tutte-vs-dp');
    for (let t = 0; t < 30; t++) {
      const g = randomGraph(4 + Math.floor(rng() * 12), 0.05 + 0.5 * rng(), rng);
      expect(matchingNumberByTutteRank(g)).toBe(matchingNumberExhaustive(g));
    }
  });

  test('closed forms above the exhaustive limit: ⌊n/2⌋ for paths and cycles, min(p, q) for K_(p,q)', () => {
    for (const n of [21, 30, 41]) {
      expect(matchingNumberByTutteRank(F.path(n))).toBe(Math.floor(n / 2));
      expect(matchingNumberByTutteRank(F.cycle(n))).toBe(Math.floor(n / 2));
    }
    expect(matchingNumberByTutteRank(F.completeBipartite(7, 19))).toBe(7);
    expect(matchingNumberByTutteRank(F.star(30))).toBe(1);
  });
});
