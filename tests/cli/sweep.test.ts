import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { canonicalGraph6 } from '../../src/graph/canonical.js';
import { runCli } from '../support/run-cli.js';

const fixture = (name: string): string =>
  fileURLToPath(new URL(`../fixtures/sweep/${name}`, import.meta.url));

/** Counterexamples decided by networkx on its graph atlas (tests/scripts/make_sweep_counterexamples.py). */
const reference = JSON.parse(
  readFileSync(new URL('../fixtures/sweep-counterexamples.json', import.meta.url), 'utf8'),
) as { claims: Record<string, Record<string, string[]>> };

describe('refute sweep (end to end)', () => {
  test('sweep prints exactly the counterexamples networkx finds, in canonical graph6, and exits 0', async () => {
    const r = await runCli(['sweep', fixture('diameter-radius.ts'), '--max-vertices', '7']);
    expect(r.status).toBe(0);
    const expected = Object.values(reference.claims['diameter-below-twice-radius'])
      .flat()
      .map((s) => canonicalGraph6(decodeGraph6(s)));
    const lines = r.stdout.trimEnd().split('\n');
    expect(lines.length).toBe(expected.length);
    expect(new Set(lines)).toEqual(new Set(expected));
    // Counts per order on stderr, one line per order: A001349 connected graphs on 1..7 vertices.
    const summaries = r.stderr.trimEnd().split('\n');
    expect(summaries.length).toBe(7);
    expect(summaries[6]).toBe(
      'order 7: 853 connected graphs, 853 in the domain, 237 certified counterexamples to ' +
        `'diameter-below-twice-radius', best score 1 (${summaries[6].match(/\((\S+)\)$/)?.[1]})`,
    );
  });

  test('sweep --json writes one JSON line per counterexample and per order', async () => {
    const r = await runCli([
      'sweep',
      fixture('triangle-free.ts'),
      '--conjecture',
      'triangle-free-is-bipartite',
      '--min-vertices',
      '5',
      '--max-vertices',
      '6',
      '--json',
    ]);
    expect(r.status).toBe(0);
    const records = r.stdout
      .trimEnd()
      .split('\n')
      .map((l) => JSON.parse(l));
    // C5 is the one counterexample on 5 vertices (networkx fixture); 3 on 6.
    expect(records.filter((x) => x.type === 'counterexample').map((x) => x.order)).toEqual([5, 6, 6, 6]);
    expect(records[0]).toEqual({
      type: 'counterexample',
      order: 5,
      graph6: canonicalGraph6(decodeGraph6(reference.claims['triangle-free-is-bipartite']['5'][0])),
      score: 1,
      certified: true,
    });
    const orders = records.filter((x) => x.type === 'order');
    // Triangle-free graphs on 5 and 6 vertices: 14 and 38 (OEIS A006785, from memory).
    expect(orders.map((x) => [x.order, x.graphs, x.inDomain, x.counterexamples])).toEqual([
      [5, 34, 14, 1],
      [6, 156, 38, 3],
    ]);
  });

  test('sweep exits 1 on a theorem (Mantel) and prints no counterexample', async () => {
    const r = await runCli([
      'sweep',
      fixture('triangle-free.ts'),
      '--conjecture',
      'mantel-bound',
      '--max-vertices',
      '7',
    ]);
    expect(r.status).toBe(1);
    expect(r.stdout).toBe('');
    expect(r.stderr.trimEnd().split('\n').length).toBe(7);
  });

  test('sweep output is the same with 1 and 2 threads', async () => {
    const args = ['sweep', fixture('diameter-radius.ts'), '--min-vertices', '8', '--max-vertices', '8'];
    const one = await runCli([...args, '--threads', '1']);
    const two = await runCli([...args, '--threads', '2']);
    expect(one.status).toBe(0);
    expect(two.stdout).toBe(one.stdout);
    expect(two.stderr).toBe(one.stderr);
  });

  test('sweep --part: the parts together print every counterexample once', async () => {
    const args = ['sweep', fixture('diameter-radius.ts'), '--min-vertices', '7', '--max-vertices', '7'];
    const whole = (await runCli(args)).stdout.trimEnd().split('\n');
    const a = await runCli([...args, '--part', '1/2']);
    const b = await runCli([...args, '--part', '2/2']);
    expect(a.stderr).toMatch(/^order 7 part 1\/2: /);
    const parts = [...a.stdout.trimEnd().split('\n'), ...b.stdout.trimEnd().split('\n')];
    expect(parts.length).toBe(whole.length);
    expect(new Set(parts)).toEqual(new Set(whole));
  });

  test('sweep with bad input exits 2 with a one-line message', async () => {
    const cases: Array<[string[], RegExp]> = [
      [['sweep', fixture('diameter-radius.ts')], /^refute: --max-vertices is required/],
      [
        ['sweep', fixture('diameter-radius.ts'), '--max-vertices', '4', '--min-vertices', '5'],
        /^refute: --min-vertices 5 is above --max-vertices 4/,
      ],
      [['sweep', fixture('missing.ts'), '--max-vertices', '4'], /no such file/],
      [['sweep', fixture('triangle-free.ts'), '--max-vertices', '4'], /choose one with --conjecture NAME/],
      [
        ['sweep', fixture('nan-score.ts'), '--max-vertices', '4', '--threads', '2'],
        /score returned NaN .* '@'/,
      ],
      [
        ['sweep', fixture('diameter-radius.ts'), '--max-vertices', '4', '--threads', '0'],
        /--threads: expected/,
      ],
    ];
    for (const [args, message] of cases) {
      const r = await runCli(args);
      expect(r.status, args.join(' ')).toBe(2);
      expect(r.stderr).toMatch(message);
      expect(r.stderr.trimEnd().split('\n').length).toBe(1);
      expect(r.stdout).toBe('');
    }
  });
});
