import { describe, expect, test } from 'vitest';
import { spawn } from 'node:child_process';
import { copyFileSync, existsSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { runCli } from '../support/run-cli.js';

const fixtures = fileURLToPath(new URL('../fixtures/conjectures/', import.meta.url));
const work = mkdtempSync(join(tmpdir(), 'refute-hunt-cli-'));
const falseClaim = join(work, 'max-degree-7.ts');
copyFileSync(join(fixtures, 'max-degree-7.ts'), falseClaim);
const small = ['--batch', '60', '--layers', '32,16,4', '--seed', 'cli'];
const same = (a: string, b: string, f: string): boolean =>
  readFileSync(join(a, f)).equals(readFileSync(join(b, f)));

describe('refute hunt / resume / dump (end to end)', () => {
  test('hunt exits 0 on a false claim, prints its counterexamples as graph6 and writes the run folder', async () => {
    const out = join(work, 'found');
    const r = await runCli(['hunt', falseClaim, ...small, '--iterations', '2', '--out', out]);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const printed = r.stdout.split('\n').filter((l) => l !== '');
    expect(printed.length).toBeGreaterThan(0);
    // Each printed graph really refutes the claim: a vertex of degree 6 (checked on the decoded graph).
    for (const line of printed) expect(Math.max(...decodeGraph6(line).degrees)).toBe(6);
    expect(readFileSync(join(out, 'counterexamples.g6'), 'utf8')).toBe(printed.map((l) => l + '\n').join(''));
    for (const f of [
      'run.json',
      'best.g6',
      'summary.json',
      'log.jsonl',
      'checkpoint/state.json',
      'checkpoint/weights.bin',
    ]) {
      expect(existsSync(join(out, f)), f).toBe(true);
    }
    const log = readFileSync(join(out, 'log.jsonl'), 'utf8')
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    expect(log.filter((l) => l.event === 'iteration').map((l) => l.iteration)).toEqual([0, 1]);
    const summary = JSON.parse(readFileSync(join(out, 'summary.json'), 'utf8'));
    // maxDegree is an integer invariant: the certifier recomputes it exactly, so the graphs are certified.
    expect(summary.counterexamples[0].certification).toBe('certified');

    const dump = await runCli(['dump', out, '--counterexamples', '--top', '1']);
    expect(dump.status).toBe(0);
    expect(dump.stdout).toBe(printed[0] + '\n');
    const edges = await runCli(['dump', out, '--top', '1', '--format', 'edges']);
    const best = readFileSync(join(out, 'best.g6'), 'utf8').split('\n')[0];
    expect(edges.stdout.split('\n')[0]).toBe(`7 ${decodeGraph6(best).size}`);
    const json = await runCli(['dump', out, '--top', '2', '--format', 'json']);
    expect(
      json.stdout
        .trim()
        .split('\n')
        .map((l) => JSON.parse(l).graph6),
    ).toEqual(readFileSync(join(out, 'best.g6'), 'utf8').split('\n').slice(0, 2));
  });

  test('hunt exits 1 on a true claim', async () => {
    const r = await runCli([
      'hunt',
      join(fixtures, 'max-degree-true-7.ts'),
      ...small,
      '--iterations',
      '2',
      '--out',
      join(work, 'none'),
    ]);
    expect(r.status).toBe(1);
    expect(r.stdout).toBe('');
    expect(readFileSync(join(work, 'none', 'best.g6'), 'utf8').split('\n').length).toBeGreaterThan(2);
  });

  test('hunt exits 2 with one line on bad input: an option value, a missing file, a used output folder', async () => {
    const bad = await runCli(['hunt', falseClaim, '--batch', 'many']);
    expect(bad.status).toBe(2);
    expect(bad.stderr).toBe("refute: --batch: expected an integer in 2..1000000 but found 'many'\n");
    const missing = await runCli(['hunt', join(work, 'nope.ts'), '--iterations', '1']);
    expect(missing.status).toBe(2);
    expect(missing.stderr.split('\n').length).toBe(2);
    const used = join(work, 'used');
    mkdirSync(used);
    writeFileSync(join(used, 'x'), 'earlier');
    const r = await runCli(['hunt', falseClaim, '--iterations', '1', '--out', used]);
    expect(r.status).toBe(2);
    expect(r.stderr).toMatch(/the output folder exists and is not empty/);
    expect(readFileSync(join(used, 'x'), 'utf8')).toBe('earlier');
  });

  test('--threads 2 gives the same files as --threads 1', async () => {
    const one = join(work, 't1');
    const two = join(work, 't2');
    await runCli(['hunt', falseClaim, ...small, '--iterations', '2', '--out', one, '--threads', '1']);
    const r = await runCli([
      'hunt',
      falseClaim,
      ...small,
      '--iterations',
      '2',
      '--out',
      two,
      '--threads',
      '2',
    ]);
    expect(r.stderr).toBe('');
    for (const f of ['best.g6', 'counterexamples.g6', 'checkpoint/weights.bin', 'checkpoint/optimizer.bin'])
      expect(same(one, two, f), f).toBe(true);
  });

  test('resume refuses a changed conjecture file and a corrupt checkpoint (exit 2, one line)', async () => {
    const file = join(work, 'edited.ts');
    copyFileSync(join(fixtures, 'max-degree-7.ts'), file);
    const dir = join(work, 'edited');
    await runCli(['hunt', file, ...small, '--iterations', '1', '--out', dir]);
    writeFileSync(file, readFileSync(file, 'utf8').replace('5.5', '5.25'));
    const changed = await runCli(['resume', dir, '--iterations', '1']);
    expect(changed.status).toBe(2);
    expect(changed.stderr).toMatch(
      /^refute: .*edited\.ts: the conjecture file changed since the run started .*\n$/,
    );
    copyFileSync(join(fixtures, 'max-degree-7.ts'), file);
    writeFileSync(join(dir, 'checkpoint', 'optimizer.bin'), 'garbage');
    const corrupt = await runCli(['resume', dir, '--iterations', '1']);
    expect(corrupt.status).toBe(2);
    expect(corrupt.stderr).toMatch(
      /^refute: .*corrupt checkpoint \(optimizer\.bin does not match its recorded sha256\).*\n$/,
    );
  });

  test('a hunt killed with SIGKILL resumes from its last checkpoint and ends as an uninterrupted run', async () => {
    const whole = join(work, 'k-whole');
    const killed = join(work, 'k-killed');
    const total = 8;
    await runCli(['hunt', falseClaim, ...small, '--iterations', String(total), '--out', whole]);
    const bin = fileURLToPath(new URL('../../bin/refute', import.meta.url));
    const child = spawn(
      process.execPath,
      [bin, 'hunt', falseClaim, ...small, '--iterations', String(total), '--out', killed],
      { stdio: 'ignore' },
    );
    const iterationsLogged = (): number =>
      existsSync(join(killed, 'log.jsonl'))
        ? (readFileSync(join(killed, 'log.jsonl'), 'utf8').match(/"event":"iteration"/g) ?? []).length
        : 0;
    while (iterationsLogged() < 3) await new Promise((r) => setTimeout(r, 20));
    child.kill('SIGKILL');
    await new Promise((r) => child.on('close', r));
    const at = JSON.parse(readFileSync(join(killed, 'checkpoint', 'state.json'), 'utf8')).iteration as number;
    expect(at).toBeGreaterThanOrEqual(3);
    expect(at).toBeLessThan(total);
    const r = await runCli(['resume', killed, '--iterations', String(total - at)]);
    expect(r.status).toBe(0);
    for (const f of ['best.g6', 'counterexamples.g6', 'checkpoint/weights.bin', 'checkpoint/optimizer.bin'])
      expect(same(whole, killed, f), f).toBe(true);
  });

  test('SIGTERM stops a hunt without limits after the iteration in progress, with its checkpoint written', async () => {
    const dir = join(work, 'term');
    const bin = fileURLToPath(new URL('../../bin/refute', import.meta.url));
    const child = spawn(process.execPath, [bin, 'hunt', falseClaim, ...small, '--out', dir], {
      stdio: 'ignore',
    });
    const logText = (): string =>
      existsSync(join(dir, 'log.jsonl')) ? readFileSync(join(dir, 'log.jsonl'), 'utf8') : '';
    while ((logText().match(/"event":"iteration"/g) ?? []).length < 2)
      await new Promise((r) => setTimeout(r, 20));
    child.kill('SIGTERM');
    // Never leave a hunt running if the signal is ignored: the test then fails on the status.
    const guard = setTimeout(() => child.kill('SIGKILL'), 20_000);
    const status = await new Promise((r) => child.on('close', r));
    clearTimeout(guard);
    expect(status).toBe(0);
    const lines = logText()
      .trim()
      .split('\n')
      .map((l) => JSON.parse(l));
    const last = lines[lines.length - 1];
    expect(last.event).toBe('stop');
    expect(last.reason).toBe('signal');
    const ran = lines.filter((l) => l.event === 'iteration').length;
    expect(JSON.parse(readFileSync(join(dir, 'checkpoint', 'state.json'), 'utf8')).iteration).toBe(ran);
  });
});
