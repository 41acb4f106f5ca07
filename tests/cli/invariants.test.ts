import { describe, expect, test } from 'vitest';
import { runCli } from '../support/run-cli.js';

describe('refute invariants (end to end)', () => {
  // Petersen graph values: Holton and Sheehan, "The Petersen Graph", CUP 1993, ch. 1 (order 10,
  // size 15, 3-regular, diameter 2, girth 5, spectrum 3, 1^5, (-2)^4); Wiener index 75 follows
  // from 15 adjacent pairs at distance 1 and 30 at distance 2.
  test("invariants 'IheA@GUAo' --json prints the Petersen graph's published values", async () => {
    const r = await runCli(['invariants', 'IheA@GUAo', '--json']);
    expect(r.status).toBe(0);
    const rec = JSON.parse(r.stdout.trim());
    expect(rec).toMatchObject({
      graph6: 'IheA@GUAo',
      order: 10,
      size: 15,
      diameter: 2,
      girth: 5,
      wienerIndex: 75,
      triangleCount: 0,
    });
    expect(rec.spectralRadius).toBeCloseTo(3, 10);
    expect(rec.smallestEigenvalue).toBeCloseTo(-2, 10);
    expect(rec.isConnected).toBe(true);
  });
  test('invariants --stdin reads a stream and writes one JSON line per graph, Infinity as a string', async () => {
    const r = await runCli(['invariants', '--stdin', '--json', '--only', 'order,diameter'], {
      stdin: 'DQc\n\nB?\n',
    });
    expect(r.status).toBe(0);
    expect(
      r.stdout
        .trim()
        .split('\n')
        .map((l) => JSON.parse(l)),
    ).toEqual([
      { graph6: 'DQc', order: 5, diameter: 4 },
      { graph6: 'B?', order: 3, diameter: 'Infinity' },
    ]);
  });
  test('invariants prints a table by default', async () => {
    const r = await runCli(['invariants', 'DQc', '--only', 'size,isTree']);
    expect(r.status).toBe(0);
    expect(r.stdout).toBe('graph DQc\n  size    4\n  isTree  yes\n');
  });
  test('a malformed line on stdin exits 2 with a one-line message naming the line', async () => {
    const r = await runCli(['invariants', '--stdin'], { stdin: 'DQc\nD?Q~x\n' });
    expect(r.status).toBe(2);
    expect(r.stderr).toBe('refute: graph6 stdin line 2: expected 2 data bytes for n=5 but found 4\n');
  });
  test('an unknown --only name exits 2 and suggests the nearest one', async () => {
    const r = await runCli(['invariants', 'DQc', '--only', 'spectralRadious']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/unknown invariant 'spectralRadious'; did you mean 'spectralRadius'\?/);
  });
  test('an unknown option exits 2', async () => {
    const r = await runCli(['invariants', 'DQc', '--frobnicate']);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/unknown option '--frobnicate'/);
  });
});
