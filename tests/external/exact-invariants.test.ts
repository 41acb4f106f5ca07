/**
 * The exact combinatorial invariants against published values.
 *
 * - Petersen graph: ν = 5, α = 4, ω = 2, χ = 3, γ = 3, κ = λ' = 3, τ = 2000 (D. A. Holton and
 *   J. Sheehan, "The Petersen Graph", Cambridge University Press 1993; from memory). τ also
 *   follows from Kirchhoff's theorem and the Laplacian spectrum 0, 2^5, 5^4: 2^5·5^4/10 = 2000.
 * - Cayley's formula τ(K_n) = n^(n−2) (A. Cayley, "A theorem on trees", Quart. J. Pure Appl.
 *   Math. 23 (1889) 376–378); τ(K_{a,b}) = a^(b−1) b^(a−1) (H. I. Scoins, "The number of trees
 *   with nodes of alternate parity", Proc. Cambridge Philos. Soc. 58 (1962) 12–16); τ(C_n) = n;
 *   τ(Q_3) = 384 and τ(Q_4) = 42467328 from the hypercube formula
 *   τ(Q_d) = 2^(2^d − d − 1) ∏_k k^C(d,k) (from memory; Q_3: 2^4·2^3·3 = 384).
 * - Mycielski graphs (J. Mycielski, "Sur le coloriage des graphes", Colloq. Math. 3 (1955)
 *   161–162): the Grötzsch graph on 11 vertices has χ = 4 and ω = 2.
 */
import { describe, expect, test } from 'vitest';
import { complete, completeBipartite, cycle, hypercube, petersen } from '../../src/graph/families.js';
import { computeInvariant } from '../../src/invariants/registry.js';
import { mycielskian } from '../invariants/mycielski.js';

describe('Petersen graph (Holton and Sheehan 1993)', () => {
  test('ν = 5, α = 4, ω = 2, χ = 3, γ = 3, κ = 3, λ = 3, τ = 2000', () => {
    const g = petersen();
    const names = [
      'matchingNumber',
      'independenceNumber',
      'cliqueNumber',
      'chromaticNumber',
      'dominationNumber',
      'vertexConnectivity',
      'edgeConnectivity',
      'spanningTreeCount',
      'vertexCoverNumber',
    ];
    expect(names.map((name) => computeInvariant(g, name))).toEqual([5, 4, 2, 3, 3, 3, 3, 2000, 6]);
  });
});

describe('spanning tree counts', () => {
  test("Cayley's formula τ(K_n) = n^(n−2), as a number below 2^53 and a bigint above", () => {
    for (let n = 2; n <= 25; n++) {
      const exact = BigInt(n) ** BigInt(n - 2);
      const expected = exact <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(exact) : exact;
      expect(computeInvariant(complete(n), 'spanningTreeCount')).toBe(expected);
    }
  });

  test('τ(K_{a,b}) = a^(b−1) b^(a−1) (Scoins 1962), τ(C_n) = n, τ(Q_3) = 384 and τ(Q_4) = 42467328 (hypercube formula)', () => {
    for (let a = 1; a <= 7; a++) {
      for (let b = 1; b <= 7; b++) {
        expect(computeInvariant(completeBipartite(a, b), 'spanningTreeCount')).toBe(
          a ** (b - 1) * b ** (a - 1),
        );
      }
    }
    for (let n = 3; n <= 20; n++) expect(computeInvariant(cycle(n), 'spanningTreeCount')).toBe(n);
    expect(computeInvariant(hypercube(3), 'spanningTreeCount')).toBe(384);
    expect(computeInvariant(hypercube(4), 'spanningTreeCount')).toBe(42467328);
  });
});

describe('Mycielski graphs (Mycielski 1955)', () => {
  test('the Grötzsch graph (11 vertices, 20 edges) has χ = 4 and ω = 2', () => {
    const grotzsch = mycielskian(mycielskian(complete(2)));
    expect([grotzsch.order, grotzsch.size]).toEqual([11, 20]);
    expect(computeInvariant(grotzsch, 'chromaticNumber')).toBe(4);
    expect(computeInvariant(grotzsch, 'cliqueNumber')).toBe(2);
  });
});
