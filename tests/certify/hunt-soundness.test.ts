/**
 * Soundness of the real hunt: on a true identity whose float score is positive on many graphs
 * by rounding alone, `refute hunt` must report no certified counterexample (exit 1), while the
 * float score by itself would have "refuted" it.
 *
 * The identity: Σ λi² = trace(A²) = 2m for every graph, since trace(A²) counts the closed walks
 * of length 2, two per edge (Cvetković, Rowlinson and Simić, "An Introduction to the Theory of
 * Graph Spectra", CUP 2010, §1.1; a common textbook fact). Every graph is an equality case.
 */
import { describe, expect, test } from 'vitest';
import { mkdtempSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { runCli } from '../support/run-cli.js';

const work = mkdtempSync(join(tmpdir(), 'refute-hunt-soundness-'));
const file = join(work, 'trace-identity.ts');
writeFileSync(
  file,
  `import { defineConjecture } from 'refute';
export default defineConjecture({
  name: 'trace-identity',
  statement: 'For every graph G: the sum of the squared adjacency eigenvalues is at most 2m.',
  vertices: 9,
  score: (g) => g.adjacencySpectrum.reduce((s, x) => s + x * x, 0) - 2 * g.m,
});
`,
);

describe('hunt + certification', () => {
  test('a hunt on a true identity finds positive float scores but certifies none (exit 1)', async () => {
    const out = join(work, 'run');
    const r = await runCli([
      'hunt',
      file,
      '--batch',
      '80',
      '--layers',
      '32,16,4',
      '--iterations',
      '3',
      '--out',
      out,
    ]);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(1);
    expect(r.stdout).toBe('');
    const counterexamples = join(out, 'counterexamples.g6');
    expect(existsSync(counterexamples) ? readFileSync(counterexamples, 'utf8') : '').toBe('');
    // What the float score alone would have reported: the run's best graphs score above 0.
    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8')) as {
      best: Array<{ score: number }>;
    };
    expect(summary.best.filter((b) => b.score > 0).length).toBeGreaterThan(0);
  });
});
