/**
 * checkpoint/: everything a run needs to go on exactly as if it had never stopped: the next
 * iteration, the policy weights, Adam's state, the carried-over pool, the best-ever list, the
 * counterexamples found and the collapse counters.
 *
 * Layout: state.json (the small parts, plus the sha256 of each binary file and the run id),
 * weights.bin (flattenWeights order, float32 little-endian) and optimizer.bin (first then second
 * moments, same order). A new checkpoint is written to checkpoint.tmp/, each file fsynced, then
 * the old checkpoint/ is renamed to checkpoint.old/, checkpoint.tmp/ to checkpoint/, and
 * checkpoint.old/ removed: at every moment one complete checkpoint exists under one of the two
 * names, and reading prefers checkpoint/ and falls back to checkpoint.old/.
 */
import { createHash } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, renameSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { InputError } from '../errors.js';
import { fromUpperTriangleBits } from '../graph/builders.js';
import { decodeGraph6, encodeGraph6 } from '../graph/graph6.js';
import { type CollapseState } from '../search/collapse.js';
import { type CounterexampleRecord, type HuntState } from '../search/hunt.js';
import { pairBitsOfGraph } from '../search/pair-bits.js';
import { type PolicyShape, flattenWeights, parameterCount, unflattenWeights } from '../search/policy.js';
import { type Candidate } from '../search/selection.js';
import { fsyncFolder, writeDurably } from './atomic-files.js';

export const CHECKPOINT_FORMAT = 'refute-checkpoint';
export const CHECKPOINT_VERSION = 1;

interface StoredCandidate {
  graph6: string;
  key: string;
  inDomain: boolean;
  score: number | string;
}

interface StoredState {
  format: string;
  version: number;
  runId: string;
  shape: PolicyShape;
  iteration: number;
  optimizerStep: number;
  pool: StoredCandidate[];
  best: StoredCandidate[];
  counterexamples: Array<{ key: string; score: number | string; certification: string }>;
  collapse: CollapseState;
  /** Absent in checkpoints written before polishing existed. */
  nearMisses?: Array<{ graph6: string; score: number | string; counterexample: string | null }>;
  sha256: { weights: string; optimizer: string };
}

/** JSON has no ±Infinity: they are stored as strings. */
function encodeScore(x: number): number | string {
  return Number.isFinite(x) ? x : String(x);
}

function decodeScore(x: unknown): number {
  if (typeof x === 'number') return x;
  if (x === 'Infinity') return Infinity;
  if (x === '-Infinity') return -Infinity;
  throw new TypeError('bad score');
}

function storeCandidate(order: number, c: Candidate): StoredCandidate {
  return {
    graph6: encodeGraph6(fromUpperTriangleBits(order, c.bits)),
    key: c.key,
    inDomain: c.inDomain,
    score: encodeScore(c.score),
  };
}

function loadCandidate(s: StoredCandidate): Candidate {
  if (typeof s.key !== 'string' || typeof s.inDomain !== 'boolean') throw new TypeError('bad candidate');
  return {
    bits: pairBitsOfGraph(decodeGraph6(s.graph6)),
    key: s.key,
    inDomain: s.inDomain,
    score: decodeScore(s.score),
  };
}

function sha256(data: Uint8Array): string {
  return createHash('sha256').update(data).digest('hex');
}

function bytesOf(a: Float32Array): Uint8Array {
  // Float32Array is little-endian on every platform Node supports (x86, ARM).
  return new Uint8Array(a.buffer, a.byteOffset, a.byteLength);
}

/** Writes the checkpoint of `state` for run `runId` into dir/checkpoint/ (atomically, see above). */
export function writeCheckpoint(dir: string, runId: string, state: HuntState): void {
  const order = state.weights.shape.order;
  const weights = bytesOf(flattenWeights(state.weights));
  const p = state.optimizer.firstMoment.length;
  const moments = new Float32Array(2 * p);
  moments.set(state.optimizer.firstMoment, 0);
  moments.set(state.optimizer.secondMoment, p);
  const optimizer = bytesOf(moments);
  const stored: StoredState = {
    format: CHECKPOINT_FORMAT,
    version: CHECKPOINT_VERSION,
    runId,
    shape: state.weights.shape,
    iteration: state.iteration,
    optimizerStep: state.optimizer.step,
    pool: state.pool.map((c) => storeCandidate(order, c)),
    best: state.best.map((c) => storeCandidate(order, c)),
    counterexamples: state.counterexamples.map((c) => ({
      key: c.key,
      score: encodeScore(c.score),
      certification: c.certification,
    })),
    collapse: state.collapse,
    nearMisses: state.nearMisses.map((s) => ({
      graph6: encodeGraph6(s.graph),
      score: encodeScore(s.score),
      counterexample: s.counterexample,
    })),
    sha256: { weights: sha256(weights), optimizer: sha256(optimizer) },
  };
  const tmp = join(dir, 'checkpoint.tmp');
  const current = join(dir, 'checkpoint');
  const old = join(dir, 'checkpoint.old');
  try {
    rmSync(tmp, { recursive: true, force: true });
    mkdirSync(tmp);
  } catch (err) {
    throw new InputError(
      `${tmp}: cannot create the checkpoint folder (${(err as NodeJS.ErrnoException).code ?? String(err)})`,
    );
  }
  writeDurably(join(tmp, 'weights.bin'), weights);
  writeDurably(join(tmp, 'optimizer.bin'), optimizer);
  writeDurably(join(tmp, 'state.json'), JSON.stringify(stored) + '\n');
  fsyncFolder(tmp);
  rmSync(old, { recursive: true, force: true });
  if (existsSync(current)) renameSync(current, old);
  renameSync(tmp, current);
  fsyncFolder(dir);
  rmSync(old, { recursive: true, force: true });
}

/** The weights in a checkpoint folder as raw bytes (what "weights byte for byte" compares). */
export function checkpointWeightBytes(dir: string): Buffer {
  return readFileSync(join(dir, 'checkpoint', 'weights.bin'));
}

function corrupt(where: string, what: string): InputError {
  return new InputError(`${where}: corrupt checkpoint (${what}); the run cannot be resumed from it`);
}

function readFrom(folder: string, runId: string): HuntState {
  let stored: StoredState;
  try {
    stored = JSON.parse(readFileSync(join(folder, 'state.json'), 'utf8')) as StoredState;
  } catch {
    throw corrupt(folder, 'state.json is missing or not valid JSON');
  }
  if (stored.format !== CHECKPOINT_FORMAT || stored.version !== CHECKPOINT_VERSION) {
    throw corrupt(folder, `not a refute checkpoint of version ${CHECKPOINT_VERSION}`);
  }
  if (stored.runId !== runId) {
    throw new InputError(
      `${folder}: the checkpoint belongs to another run (run id ${stored.runId}, run.json says ${runId}); refusing to resume`,
    );
  }
  let weightBytes: Buffer;
  let optimizerBytes: Buffer;
  try {
    weightBytes = readFileSync(join(folder, 'weights.bin'));
    optimizerBytes = readFileSync(join(folder, 'optimizer.bin'));
  } catch {
    throw corrupt(folder, 'weights.bin or optimizer.bin is missing');
  }
  if (sha256(weightBytes) !== stored.sha256?.weights)
    throw corrupt(folder, 'weights.bin does not match its recorded sha256');
  if (sha256(optimizerBytes) !== stored.sha256?.optimizer)
    throw corrupt(folder, 'optimizer.bin does not match its recorded sha256');
  try {
    const shape = stored.shape;
    const p = parameterCount(shape);
    if (weightBytes.length !== 4 * p || optimizerBytes.length !== 8 * p) throw new TypeError('sizes');
    const w = new Float32Array(p);
    new Uint8Array(w.buffer).set(weightBytes);
    const moments = new Float32Array(2 * p);
    new Uint8Array(moments.buffer).set(optimizerBytes);
    if (!Number.isInteger(stored.iteration) || !Number.isInteger(stored.optimizerStep))
      throw new TypeError('iteration');
    return {
      iteration: stored.iteration,
      weights: unflattenWeights(shape, w),
      optimizer: {
        step: stored.optimizerStep,
        firstMoment: moments.slice(0, p),
        secondMoment: moments.slice(p),
      },
      pool: stored.pool.map(loadCandidate),
      best: stored.best.map(loadCandidate),
      counterexamples: stored.counterexamples.map((c): CounterexampleRecord => ({
        key: String(c.key),
        score: decodeScore(c.score),
        certification: c.certification === 'certified' ? 'certified' : 'numerical',
      })),
      collapse: { ...stored.collapse, freshOnly: stored.collapse.freshOnly ?? 0 },
      nearMisses: (stored.nearMisses ?? []).map((s) => ({
        graph: decodeGraph6(String(s.graph6)),
        score: decodeScore(s.score),
        counterexample:
          s.counterexample === 'certified' || s.counterexample === 'numerical' ? s.counterexample : null,
      })),
    };
  } catch {
    throw corrupt(folder, 'state.json has malformed fields');
  }
}

/** Reads the run's checkpoint (falling back to checkpoint.old/ after a crash mid-swap). */
export function readCheckpoint(dir: string, runId: string): HuntState {
  const current = join(dir, 'checkpoint');
  const old = join(dir, 'checkpoint.old');
  if (existsSync(join(current, 'state.json'))) return readFrom(current, runId);
  if (existsSync(join(old, 'state.json'))) return readFrom(old, runId);
  throw new InputError(
    `${dir}: no checkpoint found (checkpoint/ is missing); the run stopped before its first iteration, start it again with 'refute hunt'`,
  );
}
