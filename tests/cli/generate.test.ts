import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { describe, expect, test } from 'vitest';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { canonicalGraph6 } from '../../src/graph/canonical.js';
import { runCli } from '../support/run-cli.js';

const BIN = fileURLToPath(new URL('../../bin/refute', import.meta.url));

describe('refute generate (end to end)', () => {
  test('generate --vertices 7 prints A000088(7) = 1044 pairwise non-isomorphic graph6 lines', async () => {
    const r = await runCli(['generate', '--vertices', '7']);
    expect(r.status).toBe(0);
    expect(r.stderr).toBe('');
    const lines = r.stdout.trimEnd().split('\n');
    expect(lines.length).toBe(1044); // OEIS A000088
    expect(new Set(lines.map((l) => canonicalGraph6(decodeGraph6(l)))).size).toBe(1044);
  });

  test('generate --vertices 4 prints the 11 graphs on 4 vertices in a fixed order', async () => {
    const r = await runCli(['generate', '--vertices', '4']);
    expect(r.status).toBe(0);
    // The order is the enumerator's (vertex-addition order, subsets in increasing bit order),
    // pinned so a change of order is noticed; the set is checked against the atlas elsewhere.
    expect(r.stdout).toBe(['C?', 'CC', 'CE', 'CF', 'CQ', 'CU', 'CT', 'CV', 'C]', 'C^', 'C~', ''].join('\n'));
  });

  test('generate --connected prints A001349(8) = 11117 graphs', async () => {
    const r = await runCli(['generate', '--vertices', '8', '--connected']);
    expect(r.status).toBe(0);
    expect(r.stdout.trimEnd().split('\n').length).toBe(11117);
  });

  test('generate --part i/k: the parts of order 7 together are the whole stream', async () => {
    const whole = (await runCli(['generate', '--vertices', '7'])).stdout.trimEnd().split('\n');
    const parts: string[] = [];
    for (const p of ['1/3', '2/3', '3/3']) {
      const r = await runCli(['generate', '--vertices', '7', '--part', p]);
      expect(r.status).toBe(0);
      parts.push(...r.stdout.trimEnd().split('\n'));
    }
    expect(parts.length).toBe(whole.length);
    expect(new Set(parts)).toEqual(new Set(whole));
  });

  test('generate with a bad order or part exits 2 with a one-line message', async () => {
    for (const [args, message] of [
      [['generate'], 'refute: --vertices is required (for example --vertices 7)\n'],
      [['generate', '--vertices', '17'], "refute: --vertices: expected an integer in 1..16 but found '17'\n"],
      [['generate', '--vertices', 'x'], "refute: --vertices: expected an integer in 1..16 but found 'x'\n"],
      [
        ['generate', '--vertices', '5', '--part', '4/3'],
        "refute: --part: expected i/k with 1 <= i <= k (for example 2/4) but found '4/3'\n",
      ],
    ] as const) {
      const r = await runCli(args);
      expect(r.status).toBe(2);
      expect(r.stderr).toBe(message);
      expect(r.stdout).toBe('');
    }
  });

  test('generate stops quietly with status 0 when the reader closes the pipe early', async () => {
    const result = await new Promise<{ status: number | null; stderr: string }>((resolve, reject) => {
      const child = spawn(process.execPath, [BIN, 'generate', '--vertices', '9'], {
        stdio: ['ignore', 'pipe', 'pipe'],
      });
      let stderr = '';
      child.stderr.setEncoding('utf8').on('data', (d: string) => (stderr += d));
      child.stdout.once('data', () => child.stdout.destroy());
      child.on('error', reject);
      child.on('close', (status) => resolve({ status, stderr }));
    });
    expect(result.stderr).toBe('');
    expect(result.status).toBe(0);
  });
});
