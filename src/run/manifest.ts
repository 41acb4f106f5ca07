/**
 * run.json, the run's manifest: what ran (tool version, conjecture file path and sha256,
 * conjecture name), with which options and seed, on which tfjs backend, since when. It is
 * written once when the run starts; `refute resume` reads its options back and refuses to go
 * on when the conjecture file's content no longer matches the recorded sha256.
 */
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { InputError } from '../errors.js';
import { replaceAtomically } from './atomic-files.js';

export const MANIFEST_FORMAT = 'refute-run';
export const MANIFEST_VERSION = 1;

/** The options that determine a run's results (stop conditions are not among them). */
export interface RunOptions {
  readonly vertices: number;
  readonly seed: string;
  readonly batch: number;
  readonly elite: number;
  readonly keep: number;
  readonly layers: readonly number[];
  readonly learningRate: number;
  readonly trainGraphs: number;
  readonly explore: boolean;
  /** Polish every k-th iteration (0: never); absent in runs made before polishing existed (= 0). */
  readonly polishEvery?: number;
}

export interface RunManifest {
  readonly format: typeof MANIFEST_FORMAT;
  readonly version: typeof MANIFEST_VERSION;
  /** Random id tying the checkpoint to this run. */
  readonly runId: string;
  readonly toolVersion: string;
  readonly conjecture: {
    readonly path: string;
    readonly sha256: string;
    readonly name: string;
    readonly connected: boolean;
  };
  readonly options: RunOptions;
  readonly backend: string;
  readonly startedAt: string;
}

export function manifestPath(dir: string): string {
  return join(dir, 'run.json');
}

export function writeManifest(dir: string, manifest: RunManifest): void {
  replaceAtomically(manifestPath(dir), JSON.stringify(manifest, null, 2) + '\n');
}

function isNumberArray(x: unknown): x is number[] {
  return Array.isArray(x) && x.every((v) => typeof v === 'number' && Number.isInteger(v) && v > 0);
}

/** Reads and checks run.json; any problem is a one-line InputError naming the file. */
export function readManifest(dir: string): RunManifest {
  const path = manifestPath(dir);
  let text: string;
  try {
    text = readFileSync(path, 'utf8');
  } catch {
    throw new InputError(
      `${path}: cannot read the run manifest; is '${dir}' a run directory made by 'refute hunt'?`,
    );
  }
  let m: Partial<RunManifest>;
  try {
    m = JSON.parse(text) as Partial<RunManifest>;
  } catch {
    throw new InputError(
      `${path}: the run manifest is not valid JSON (corrupt file); start a new run with 'refute hunt'`,
    );
  }
  const o = m.options as Partial<RunOptions> | undefined;
  const c = m.conjecture;
  const ok =
    m.format === MANIFEST_FORMAT &&
    m.version === MANIFEST_VERSION &&
    typeof m.runId === 'string' &&
    typeof m.backend === 'string' &&
    c !== undefined &&
    typeof c.path === 'string' &&
    typeof c.sha256 === 'string' &&
    typeof c.name === 'string' &&
    typeof c.connected === 'boolean' &&
    o !== undefined &&
    Number.isInteger(o.vertices) &&
    typeof o.seed === 'string' &&
    Number.isInteger(o.batch) &&
    typeof o.elite === 'number' &&
    typeof o.keep === 'number' &&
    isNumberArray(o.layers) &&
    typeof o.learningRate === 'number' &&
    Number.isInteger(o.trainGraphs) &&
    typeof o.explore === 'boolean' &&
    (o.polishEvery === undefined || (Number.isInteger(o.polishEvery) && o.polishEvery >= 0));
  if (!ok)
    throw new InputError(
      `${path}: not a refute run manifest of version ${MANIFEST_VERSION} (missing or malformed fields)`,
    );
  return m as RunManifest;
}
