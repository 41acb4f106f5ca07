import { describe, expect, test } from 'vitest';
import { mkdtempSync, readFileSync, existsSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { XMLValidator } from 'fast-xml-parser';
import { runCli } from '../support/run-cli.js';

describe('refute draw (end to end)', () => {
  const dir = mkdtempSync(join(tmpdir(), 'refute-draw-'));
  test('draw writes a well-formed SVG with the Petersen graph', async () => {
    const out = join(dir, 'p.svg');
    const r = await runCli(['draw', 'IheA@GUAo', '--out', out, '--colour', 'degree']);
    expect(r.status).toBe(0);
    const svg = readFileSync(out, 'utf8');
    expect(XMLValidator.validate(svg)).toBe(true);
    expect(svg.match(/<circle/g)?.length).toBe(10);
  });
  test('draw writes a PNG when --out ends in .png', async () => {
    const out = join(dir, 'p.png');
    const r = await runCli(['draw', 'DQc', '--out', out]);
    expect(r.status).toBe(0);
    // PNG signature (ISO/IEC 15948, §5.2): 89 50 4E 47 0D 0A 1A 0A.
    expect([...readFileSync(out).subarray(0, 8)]).toEqual([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]);
  });
  test('draw DIR --top 2 draws the two best graphs of a run side by side', async () => {
    const claim = fileURLToPath(new URL('../fixtures/conjectures/max-degree-7.ts', import.meta.url));
    const run = join(dir, 'run');
    const hunt = await runCli([
      'hunt',
      claim,
      '--batch',
      '60',
      '--layers',
      '32,16,4',
      '--iterations',
      '2',
      '--out',
      run,
    ]);
    expect(hunt.status).toBe(0);
    const out = join(dir, 'top.svg');
    const r = await runCli(['draw', run, '--top', '2', '--out', out]);
    expect(r.status).toBe(0);
    const svg = readFileSync(out, 'utf8');
    expect(XMLValidator.validate(svg)).toBe(true);
    // Two drawings of 7-vertex graphs (the claim's order): 14 vertex discs.
    expect(svg.match(/<circle/g)?.length).toBe(14);
    const best = readFileSync(join(run, 'best.g6'), 'utf8').split('\n');
    expect(svg).toContain(best[0]);
    expect(svg).toContain(best[1]);
  });
  test('a bad layout name exits 2 and leaves an earlier file untouched', async () => {
    const out = join(dir, 'keep.svg');
    writeFileSync(out, 'earlier');
    const r = await runCli(['draw', 'DQc', '--out', out, '--layout', 'spiral']);
    expect(r.status).toBe(2);
    expect(r.stderr).toBe("refute: --layout: expected one of auto, force, tree, circle but found 'spiral'\n");
    expect(readFileSync(out, 'utf8')).toBe('earlier');
  });
  test('an unwritable folder exits 2 with a one-line message', async () => {
    const r = await runCli(['draw', 'DQc', '--out', join(dir, 'missing', 'x.svg')]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(
      /^refute: .*x\.svg\.tmp: cannot write \(ENOENT\); earlier results in the folder are intact\n$/,
    );
    expect(existsSync(join(dir, 'missing'))).toBe(false);
  });
});
