import { readFileSync } from 'node:fs';
import { describe, expect, test } from 'vitest';
import { type Graph } from '../../src/graph/graph.js';
import { graphFromRows } from '../../src/graph/builders.js';
import { decodeGraph6, encodeGraph6 } from '../../src/graph/graph6.js';
import { canonicalGraph6 } from '../../src/graph/canonical.js';
import { isConnected } from '../../src/invariants/components.js';
import { GraphEnumerator, MAX_ENUMERATION_ORDER } from '../../src/enumerate/graph-enumerator.js';
import { graph6LineLength, writeGraph6Line } from '../../src/enumerate/graph6-bytes.js';
import { formatPartSpec, parsePartSpec } from '../../src/enumerate/part-spec.js';

// OEIS A000088 (graphs on n unlabelled vertices) and A001349 (connected ones), n = 1..9.
const A000088 = [1, 2, 4, 11, 34, 156, 1044, 12346, 274668];
const A001349 = [1, 1, 2, 6, 21, 112, 853, 11117, 261080];

function collect(order: number, options: ConstructorParameters<typeof GraphEnumerator>[1] = {}): Graph[] {
  const out: Graph[] = [];
  const e = new GraphEnumerator(order, options);
  while (e.next()) out.push(e.currentGraph());
  return out;
}

/** Breadth-first search from vertex 0 over single-word rows: whether all rows.length vertices are reached. */
function rowsConnected(rows: Uint32Array): boolean {
  const n = rows.length;
  const reached = [0];
  const seen = new Set([0]);
  for (let i = 0; i < reached.length; i++) {
    for (let u = 0; u < n; u++) {
      if ((rows[reached[i]] >>> u) & 1 && !seen.has(u)) {
        seen.add(u);
        reached.push(u);
      }
    }
  }
  return seen.size === n;
}

const atlas = readFileSync(new URL('../fixtures/atlas-1-7.g6', import.meta.url), 'utf8')
  .split('\n')
  .filter((line) => line !== '')
  .map((line) => decodeGraph6(line));

describe('GraphEnumerator counts', () => {
  for (let n = 1; n <= 8; n++) {
    test(`GraphEnumerator(${n}) yields A000088(${n}) = ${A000088[n - 1]} graphs, A001349(${n}) = ${A001349[n - 1]} connected`, () => {
      expect(collect(n).length).toBe(A000088[n - 1]);
      expect(collect(n, { connected: true }).length).toBe(A001349[n - 1]);
    });
  }

  test('GraphEnumerator(9) yields A000088(9) = 274668 graphs, of which A001349(9) = 261080 connected', () => {
    // One pass: count all graphs and, with a connectivity test of the test's own, the connected ones.
    const e = new GraphEnumerator(9);
    let all = 0;
    let connected = 0;
    while (e.next()) {
      all++;
      if (rowsConnected(e.rows)) connected++;
    }
    expect(all).toBe(274668);
    expect(connected).toBe(261080);
  });
});

describe('GraphEnumerator output', () => {
  test('GraphEnumerator(n) for n = 1..7 gives exactly the networkx atlas graphs up to isomorphism', () => {
    for (let n = 1; n <= 7; n++) {
      const generated = collect(n).map((g) => canonicalGraph6(g));
      const expected = atlas.filter((g) => g.order === n).map((g) => canonicalGraph6(g));
      expect(new Set(generated).size).toBe(generated.length);
      expect(new Set(generated)).toEqual(new Set(expected));
    }
  });

  test('GraphEnumerator(8) gives pairwise non-isomorphic graphs', () => {
    const strings = collect(8).map((g) => canonicalGraph6(g));
    expect(new Set(strings).size).toBe(12346);
  });

  test('GraphEnumerator(n, {connected}) gives exactly the connected graphs of the full stream', () => {
    for (let n = 1; n <= 7; n++) {
      const expected = collect(n)
        .filter((g) => isConnected(g))
        .map(encodeGraph6);
      expect(collect(n, { connected: true }).map(encodeGraph6)).toEqual(expected);
    }
  });

  test('GraphEnumerator order is deterministic', () => {
    expect(collect(7).map(encodeGraph6)).toEqual(collect(7).map(encodeGraph6));
  });

  test('GraphEnumerator parts partition the stream', () => {
    for (const [n, k] of [
      [7, 3],
      [8, 5],
      [3, 2],
      [1, 2],
    ]) {
      const whole = new Set(collect(n).map(encodeGraph6));
      const seen = new Set<string>();
      let total = 0;
      for (let i = 0; i < k; i++) {
        for (const g of collect(n, { part: { index: i, count: k } })) {
          const s = encodeGraph6(g);
          expect(whole.has(s)).toBe(true);
          seen.add(s);
          total++;
        }
      }
      expect(total).toBe(whole.size);
      expect(seen.size).toBe(whole.size);
    }
  });

  test('GraphEnumerator rejects orders and parts out of range', () => {
    expect(() => new GraphEnumerator(0)).toThrow(RangeError);
    expect(() => new GraphEnumerator(MAX_ENUMERATION_ORDER + 1)).toThrow(RangeError);
    expect(() => new GraphEnumerator(5, { part: { index: 2, count: 2 } })).toThrow(RangeError);
  });
});

describe('writeGraph6Line()', () => {
  test('writeGraph6Line() writes what encodeGraph6() writes, plus a newline', () => {
    for (const n of [1, 2, 5, 6, 7, 8]) {
      const buffer = new Uint8Array(graph6LineLength(n));
      for (const g of collect(n).slice(0, 300)) {
        const end = writeGraph6Line(n, g.rows, buffer, 0);
        expect(end).toBe(graph6LineLength(n));
        expect(Buffer.from(buffer).toString('latin1')).toBe(encodeGraph6(g) + '\n');
      }
    }
    // A complete graph on 16 vertices: every pair bit set (120 bits, 20 bytes of '~').
    const rows = new Uint32Array(16).map((_, v) => 0xffff & ~(1 << v));
    const buffer = new Uint8Array(graph6LineLength(16));
    writeGraph6Line(16, rows, buffer, 0);
    expect(Buffer.from(buffer).toString('latin1')).toBe(encodeGraph6(graphFromRows(16, rows)) + '\n');
  });
});

describe('parsePartSpec()', () => {
  test('parsePartSpec() reads 1-based i/k into a 0-based part and back', () => {
    expect(parsePartSpec('2/4')).toEqual({ index: 1, count: 4 });
    expect(formatPartSpec({ index: 1, count: 4 })).toBe('2/4');
  });
  test('parsePartSpec() rejects malformed parts with a message naming the option', () => {
    for (const bad of ['0/4', '5/4', '1/0', 'a/b', '3', '']) {
      expect(() => parsePartSpec(bad)).toThrow(/--part: expected i\/k/);
    }
  });
});
