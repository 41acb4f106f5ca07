/**
 * The graph-atlas fixtures are complete: per order, the number of graphs equals the number of
 * isomorphism classes of graphs on n vertices, OEIS A000088 (1, 1, 2, 4, 11, 34, 156, 1044 for
 * n = 0..7), and the invariant fixture covers the same graphs in the same order.
 */
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { atlasEntries } from '../invariants/atlas.js';

const A000088 = [1, 1, 2, 4, 11, 34, 156, 1044];

describe('tests/fixtures/atlas-invariants.json', () => {
  test('has as many graphs of each order 1..7 as OEIS A000088 counts', () => {
    const counts = new Array<number>(8).fill(0);
    for (const { graph } of atlasEntries()) counts[graph.order]++;
    expect(counts.slice(1)).toEqual(A000088.slice(1));
  });

  test('lists exactly the graphs of atlas-1-7.g6, in order', () => {
    const path = fileURLToPath(new URL('../fixtures/atlas-1-7.g6', import.meta.url));
    const lines = readFileSync(path, 'utf8')
      .split('\n')
      .filter((l) => l !== '');
    expect(atlasEntries().map((e) => e.ref.graph6)).toEqual(lines);
  });
});
