import { describe, expect, test } from 'vitest';
import { copyFileSync, mkdtempSync, readFileSync, writeFileSync, existsSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { XMLValidator } from 'fast-xml-parser';
import { runCli } from '../support/run-cli.js';
import { downsampleSeries } from '../../src/report/html-report.js';

const fixtures = fileURLToPath(new URL('../fixtures/conjectures/', import.meta.url));
const work = mkdtempSync(join(tmpdir(), 'refute-report-cli-'));
const falseClaim = join(work, 'max-degree-7.ts');
copyFileSync(join(fixtures, 'max-degree-7.ts'), falseClaim);
const small = ['--batch', '60', '--layers', '32,16,4', '--seed', 'report'];

describe('refute hunt --report / refute report (end to end)', () => {
  test('hunt --report leaves a self-contained report.html that names the claim, its counterexamples and how to rerun', async () => {
    const out = join(work, 'run');
    const r = await runCli(['hunt', falseClaim, ...small, '--iterations', '3', '--out', out, '--report']);
    expect(r.status).toBe(0);
    const html = readFileSync(join(out, 'report.html'), 'utf8');
    expect(html).toContain('Every graph on 7 vertices has maximum degree at most 5.');
    // No external resources: nothing fetched over a network or from other files.
    expect(html).not.toMatch(/(src|href)\s*=\s*"(?!#)/);
    const counterexamples = readFileSync(join(out, 'counterexamples.g6'), 'utf8').trim().split('\n');
    for (const g6 of counterexamples) expect(html).toContain(`<code>${g6.replace(/&/g, '&amp;')}</code>`);
    expect(html).toContain(
      `refute hunt ${falseClaim} --conjecture max-degree-7 --vertices 7 --seed report --batch 60`,
    );
    // Every inline SVG (plot, drawings) is well-formed on its own.
    const svgs = html.match(/<svg[\s\S]*?<\/svg>/g) ?? [];
    expect(svgs.length).toBeGreaterThanOrEqual(2);
    for (const svg of svgs) expect(XMLValidator.validate(svg)).toBe(true);
  });
  test('report on a folder that is not a run exits 2 and writes nothing', async () => {
    const r = await runCli(['report', work]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/^refute: .*no run\.json here; give a run directory made by 'refute hunt'\n$/);
    expect(existsSync(join(work, 'report.html'))).toBe(false);
  });
  test('report says when the conjecture file has changed since the run', async () => {
    const out = join(work, 'changed');
    const copy = join(work, 'copy.ts');
    copyFileSync(falseClaim, copy);
    expect((await runCli(['hunt', copy, ...small, '--iterations', '1', '--out', out])).status).toBe(0);
    writeFileSync(copy, readFileSync(copy, 'utf8') + '\n// edited\n');
    expect((await runCli(['report', out])).status).toBe(0);
    expect(readFileSync(join(out, 'report.html'), 'utf8')).toContain('has changed since the run started');
  });
});

describe('downsampleSeries()', () => {
  test('downsampleSeries() keeps short series and buckets long ones by their best score', () => {
    const series = Array.from({ length: 10 }, (_, i) => ({ iteration: i, best: i % 3, eliteMean: -i }));
    expect(downsampleSeries(series, 20)).toEqual(series);
    const down = downsampleSeries(series, 5);
    expect(down.map((p) => p.iteration)).toEqual([1, 3, 5, 7, 9]);
    expect(down.map((p) => p.best)).toEqual([1, 2, 2, 1, 2]);
    expect(down.map((p) => p.eliteMean)).toEqual([-0.5, -2.5, -4.5, -6.5, -8.5]);
  });
});
