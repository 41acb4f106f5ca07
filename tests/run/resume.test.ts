import { beforeAll, describe, expect, test } from 'vitest';
import { copyFileSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { loadConjectureFile, selectConjecture } from '../../src/conjecture/load.js';
import { startTensorflow } from '../../src/search/backend.js';
import { huntTarget } from '../../src/cli/hunt.js';
import { type HuntTarget, reopenRun } from '../../src/run/hunt-run.js';
import { type RunOptions } from '../../src/run/manifest.js';
import { readCheckpoint, writeCheckpoint } from '../../src/run/checkpoint.js';
import { driveHunt } from '../support/drive-hunt.js';

const fixture = new URL('../fixtures/conjectures/max-degree-7.ts', import.meta.url).pathname;
const work = mkdtempSync(join(tmpdir(), 'refute-resume-'));
const conjectureFile = join(work, 'max-degree-7.ts');
copyFileSync(fixture, conjectureFile);
let target: HuntTarget;

beforeAll(async () => {
  await startTensorflow(1);
  const loaded = await loadConjectureFile(conjectureFile);
  target = huntTarget(loaded, selectConjecture(loaded));
});

const options: RunOptions = {
  vertices: 7,
  seed: 'r',
  batch: 60,
  elite: 0.1,
  keep: 0.05,
  layers: [32, 16, 4],
  learningRate: 0.003,
  trainGraphs: 4,
  explore: true,
};

const run = (dir: string, iterations: number, resume: boolean): Promise<void> =>
  driveHunt(dir, target, options, iterations, resume);

const files = ['best.g6', 'counterexamples.g6', 'checkpoint/weights.bin', 'checkpoint/optimizer.bin'];

describe('resume', () => {
  test('hunt 2K iterations == hunt K + resume K, byte for byte (best.g6, counterexamples.g6, weights, optimizer)', async () => {
    const whole = join(work, 'whole');
    const split = join(work, 'split');
    await run(whole, 6, false);
    await run(split, 3, false);
    await run(split, 3, true);
    for (const f of files)
      expect(readFileSync(join(split, f)).equals(readFileSync(join(whole, f))), f).toBe(true);
    // The claim is false and easy, so the comparison covers a non-empty counterexample file.
    expect(readFileSync(join(whole, 'counterexamples.g6'), 'utf8').split('\n').length).toBeGreaterThan(2);
    expect(
      readCheckpoint(whole, JSON.parse(readFileSync(join(whole, 'run.json'), 'utf8')).runId).iteration,
    ).toBe(6);
  });

  test('reopenRun() refuses a changed conjecture file, naming it', async () => {
    const dir = join(work, 'changed');
    await run(dir, 1, false);
    writeFileSync(conjectureFile, readFileSync(conjectureFile, 'utf8') + '\n// edited\n');
    expect(() => reopenRun(dir)).toThrow(/the conjecture file changed since the run started/);
    copyFileSync(fixture, conjectureFile);
    expect(() => reopenRun(dir)).not.toThrow();
  });

  test('readCheckpoint() refuses flipped weight bytes, a foreign run id and garbage state.json', async () => {
    const dir = join(work, 'corrupt');
    await run(dir, 1, false);
    const runId = JSON.parse(readFileSync(join(dir, 'run.json'), 'utf8')).runId as string;
    const good = readCheckpoint(dir, runId);
    expect(() => readCheckpoint(dir, 'another-run')).toThrow(/belongs to another run/);
    const weights = join(dir, 'checkpoint', 'weights.bin');
    const bytes = readFileSync(weights);
    bytes[100] ^= 0xff;
    writeFileSync(weights, bytes);
    expect(() => readCheckpoint(dir, runId)).toThrow(
      /corrupt checkpoint \(weights.bin does not match its recorded sha256\)/,
    );
    writeCheckpoint(dir, runId, good);
    writeFileSync(join(dir, 'checkpoint', 'state.json'), '{"format": "refute-checkpoint", "vers');
    expect(() => readCheckpoint(dir, runId)).toThrow(/corrupt checkpoint/);
  });

  test('writeCheckpoint() then readCheckpoint() gives back the same state', async () => {
    const dir = join(work, 'roundtrip');
    await run(dir, 2, false);
    const runId = JSON.parse(readFileSync(join(dir, 'run.json'), 'utf8')).runId as string;
    const a = readCheckpoint(dir, runId);
    writeCheckpoint(dir, runId, a);
    const b = readCheckpoint(dir, runId);
    expect(b.iteration).toBe(a.iteration);
    expect(b.pool.map((c) => [c.key, c.score, c.inDomain, Array.from(c.bits).join('')])).toEqual(
      a.pool.map((c) => [c.key, c.score, c.inDomain, Array.from(c.bits).join('')]),
    );
    expect(b.best.map((c) => c.key)).toEqual(a.best.map((c) => c.key));
    expect(b.counterexamples).toEqual(a.counterexamples);
    expect(b.collapse).toEqual(a.collapse);
    expect(b.optimizer.step).toBe(a.optimizer.step);
  });
});
