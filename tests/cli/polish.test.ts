/**
 * `refute polish` end to end (bin/refute on dist/): output per start graph, exit statuses,
 * determinism, and bad input. The conjectures are scenarios of our own written to a temporary
 * folder. The claim "spectralRadius <= averageDegree + 1 for connected triangle-free graphs" is
 * false: the star K_{1,9} has spectral radius sqrt(9) = 3 (standard fact, e.g. Cvetković,
 * Rowlinson and Simić, "An Introduction to the Theory of Graph Spectra", CUP 2010, §1.1) and
 * average degree 1.8, so score 0.2 > 0.
 */
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { computeInvariant } from '../../src/invariants/registry.js';
import { runCli } from '../support/run-cli.js';
import { SPECTRAL_GAP_FILE } from '../support/spectral-gap-claim.js';

// The spider: centre 0, leaves 4, 5, 6, legs 0-1-7, 0-2-8, 0-3-9; three leaf moves from K_{1,9}.
const SPIDER = 'IsaCA?_C?';

let dir = '';
let falseClaim = '';
let trueClaim = '';

beforeAll(() => {
  dir = mkdtempSync(join(tmpdir(), 'refute-polish-'));
  falseClaim = SPECTRAL_GAP_FILE;
  trueClaim = join(dir, 'pairs.ts');
  // True for every simple graph: m <= C(n,2); the score is at most -1.
  writeFileSync(
    trueClaim,
    `import { defineConjecture } from 'refute';
export default defineConjecture({
  name: 'pairs-bound',
  statement: 'For every G: size < C(n,2) + 1',
  vertices: 6,
  score: (g) => g.size - (g.order * (g.order - 1)) / 2 - 1,
});
`,
  );
});

afterAll(() => rmSync(dir, { recursive: true, force: true }));

describe('refute polish (end to end)', () => {
  test('from the spider it reaches a certified counterexample at the same order and exits 0', async () => {
    const r = await runCli(['polish', falseClaim, SPIDER, '--steps', '200', '--fixed-order']);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const lines = r.stdout.trim().split('\n');
    expect(lines[0]).toMatch(/^from IsaCA\?_C\? \(argument 1\): n=10, m=9, score -0\.\d+$/);
    const m = /^ {2}best at n=10: (\S+) {2}m=9 {2}score (\S+) {2}refutes \(certified\)$/.exec(lines[1]);
    expect(m).not.toBeNull();
    const g = decodeGraph6(m![1]);
    expect(Number(m![2])).toBeGreaterThan(0);
    expect(computeInvariant(g, 'isConnected')).toBe(true);
    expect(computeInvariant(g, 'triangleCount')).toBe(0);
    expect(lines.at(-1)).toBe('  200 graphs scored');
  });

  test('--json gives one line per start graph; fixed order keeps other orders to n±1 and lists n first', async () => {
    const r = await runCli([
      'polish',
      falseClaim,
      SPIDER,
      'GsaCC?',
      '--steps',
      '150',
      '--fixed-order',
      '--json',
    ]);
    expect(r.status).toBe(0);
    const records = r.stdout
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    expect(records.map((x) => [x.input, x.where, x.start.order])).toEqual([
      [SPIDER, 'argument 1', 10],
      ['GsaCC?', 'argument 2', 8],
    ]);
    for (const rec of records) {
      expect(rec.results[0].order).toBe(rec.start.order);
      for (const res of rec.results) {
        expect(Math.abs(res.order - rec.start.order)).toBeLessThanOrEqual(1);
        // Positive scores go to the certifier; these margins (> 0.01) are far above rounding.
        if (res.score > 0.01) expect([res.verdict, res.certified]).toEqual(['refutes', true]);
        if (res.score < -1e-9) expect([res.verdict, res.certified]).toEqual(['holds', false]);
        expect(decodeGraph6(res.graph6).order).toBe(res.order);
      }
      expect(rec.evaluations).toBeLessThanOrEqual(150);
    }
  });

  test('same seed, same output; --stdin reads the same graphs as arguments', async () => {
    const args = ['polish', falseClaim, '--steps', '120', '--seed', 'abc'];
    const a = await runCli([...args, SPIDER, 'GsaCC?']);
    const b = await runCli([...args, '--stdin'], { stdin: `${SPIDER}\nGsaCC?\n` });
    expect(a.status).toBe(0);
    expect(b.stdout.replace(/stdin line (\d)/g, (_, k) => `argument ${k}`)).toBe(a.stdout);
  });

  test('a true claim exits 1 and says the results hold', async () => {
    const r = await runCli(['polish', trueClaim, 'EhCG', '--steps', '60']);
    expect(r.status).toBe(1);
    expect(r.stdout).toMatch(/^from EhCG \(argument 1\): n=6, m=5, score -11\n/);
    expect(r.stdout).not.toMatch(/refutes/);
    expect(r.stdout).toMatch(/ {2}holds\n/);
  });

  test('a malformed start graph exits 2 with one line, before anything is printed', async () => {
    const r = await runCli(['polish', falseClaim, SPIDER, 'D?Q~x']);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr).toBe('refute: graph6 argument 2: expected 2 data bytes for n=5 but found 4\n');
  });

  test('bad options and missing graphs exit 2 with a one-line message', async () => {
    const steps = await runCli(['polish', falseClaim, SPIDER, '--steps', '0']);
    expect(steps.status).toBe(2);
    expect(steps.stderr).toBe("refute: --steps: expected an integer in 1..1000000000 but found '0'\n");
    const none = await runCli(['polish', falseClaim]);
    expect(none.status).toBe(2);
    expect(none.stderr).toMatch(/^refute: no start graphs given: pass graph6 strings after the file/);
    const missing = await runCli(['polish', join(dir, 'nope.ts'), SPIDER]);
    expect(missing.status).toBe(2);
    expect(missing.stderr).toMatch(/no such file/);
  });
});

describe('refute polish on an equality case', () => {
  // Hong's bound (scores/hong-spectral-radius-bound.ts) is a theorem with equality on stars: the
  // star K_{1,9} scores 0 up to rounding, which must never count as a counterexample.
  test('the star under Hong bound is not certified and the exit status is 1', async () => {
    const r = await runCli(['polish', 'scores/hong-spectral-radius-bound.ts', 'IsaCCA?_?', '--steps', '200']);
    expect(r.status).toBe(1);
    expect(r.stdout).not.toMatch(/refutes/);
    expect(r.stdout).toMatch(/holds \(tight\)/);
  });
});
