import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { canonicalGraph6 } from '../../src/graph/canonical.js';
import { loadConjectureFile, selectConjecture } from '../../src/conjecture/load.js';
import { runSweep, type SweepOrderSummary, type SweepRequest } from '../../src/enumerate/sweep.js';

const fixture = (name: string): string =>
  fileURLToPath(new URL(`../fixtures/sweep/${name}`, import.meta.url));

/** Counterexamples decided by networkx on its graph atlas (tests/scripts/make_sweep_counterexamples.py). */
const reference = JSON.parse(
  readFileSync(new URL('../fixtures/sweep-counterexamples.json', import.meta.url), 'utf8'),
) as { claims: Record<string, Record<string, string[]>> };

// OEIS A001349: connected graphs on n = 1..7 vertices.
const A001349 = [1, 1, 2, 6, 21, 112, 853];

interface Recorded {
  lines: string[];
  summaries: SweepOrderSummary[];
  refuted: boolean;
}

async function sweepFile(
  file: string,
  name: string | undefined,
  options: Partial<SweepRequest> & { minOrder: number; maxOrder: number },
): Promise<Recorded> {
  const loaded = await loadConjectureFile(file);
  const conjecture = selectConjecture(loaded, name);
  const lines: string[] = [];
  const summaries: SweepOrderSummary[] = [];
  const refuted = await runSweep(
    { conjecture, file: loaded.path, sha256: loaded.sha256, conjectureName: name, threads: 1, ...options },
    {
      counterexample: async (order, found) => {
        lines.push(`${order} ${found.graph6} ${found.score}`);
      },
      orderDone: async (summary) => {
        summaries.push(summary);
      },
    },
  );
  return { lines, summaries, refuted };
}

function byOrder(lines: string[]): Map<number, Set<string>> {
  const out = new Map<number, Set<string>>();
  for (const line of lines) {
    const [order, g6] = line.split(' ');
    const set = out.get(Number(order)) ?? new Set<string>();
    set.add(g6);
    out.set(Number(order), set);
  }
  return out;
}

describe('runSweep() against counterexamples found independently by networkx', () => {
  for (const [file, name] of [
    ['diameter-radius.ts', 'diameter-below-twice-radius'],
    ['triangle-free.ts', 'triangle-free-is-bipartite'],
  ]) {
    test(`runSweep() finds exactly the counterexamples of '${name}' on 1..7 vertices`, async () => {
      const r = await sweepFile(fixture(file), name, { minOrder: 1, maxOrder: 7 });
      const found = byOrder(r.lines);
      for (let n = 1; n <= 7; n++) {
        const expected = new Set(
          reference.claims[name][String(n)].map((s) => canonicalGraph6(decodeGraph6(s))),
        );
        expect(found.get(n) ?? new Set(), `order ${n}`).toEqual(expected);
        // One line per isomorphism class: no repeats.
        expect(r.lines.filter((l) => l.startsWith(`${n} `)).length).toBe(expected.size);
      }
      expect(r.refuted).toBe(true);
      expect(r.summaries.map((s) => s.counterexamples)).toEqual(
        Array.from({ length: 7 }, (_, i) => reference.claims[name][String(i + 1)].length),
      );
    });
  }

  test('runSweep() counts only connected graphs for a connected conjecture (OEIS A001349)', async () => {
    const r = await sweepFile(fixture('diameter-radius.ts'), undefined, { minOrder: 1, maxOrder: 7 });
    expect(r.summaries.map((s) => s.graphs)).toEqual(A001349);
    // where: order >= 2 leaves out the single vertex.
    expect(r.summaries.map((s) => s.inDomain)).toEqual([0, ...A001349.slice(1)]);
  });

  test('runSweep() finds nothing for a theorem (Mantel) and reports the best score per order', async () => {
    const r = await sweepFile(fixture('triangle-free.ts'), 'mantel-bound', { minOrder: 1, maxOrder: 8 });
    expect(r.refuted).toBe(false);
    expect(r.lines).toEqual([]);
    // Mantel's extremal graphs K_{n/2,n/2} reach size - n^2/4 = 0 for even n, -1/4 for odd n.
    expect(r.summaries.map((s) => s.best?.score)).toEqual([-0.25, 0, -0.25, 0, -0.25, 0, -0.25, 0]);
  });
});

describe('runSweep() determinism', () => {
  test('runSweep() gives the same results in 1 thread and in 2 worker threads', async () => {
    const file = fixture('triangle-free.ts');
    const one = await sweepFile(file, 'triangle-free-is-bipartite', { minOrder: 6, maxOrder: 8, threads: 1 });
    const two = await sweepFile(file, 'triangle-free-is-bipartite', { minOrder: 6, maxOrder: 8, threads: 2 });
    expect(two).toEqual(one);
  });

  test('runSweep() parts 1/2 and 2/2 together give the whole sweep', async () => {
    const file = fixture('diameter-radius.ts');
    const whole = await sweepFile(file, undefined, { minOrder: 8, maxOrder: 8 });
    const a = await sweepFile(file, undefined, { minOrder: 8, maxOrder: 8, part: { index: 0, count: 2 } });
    const b = await sweepFile(file, undefined, { minOrder: 8, maxOrder: 8, part: { index: 1, count: 2 } });
    expect(new Set([...a.lines, ...b.lines])).toEqual(new Set(whole.lines));
    expect(a.lines.length + b.lines.length).toBe(whole.lines.length);
    expect(a.summaries[0].graphs + b.summaries[0].graphs).toBe(11117); // OEIS A001349(8)
  });
});
