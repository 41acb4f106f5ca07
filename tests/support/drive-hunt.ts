/** Runs a hunt in-process for tests: a fresh run of `iterations`, or `iterations` more on resume. */
import { type HuntTarget, createRun, driveRun, freshState, reopenRun } from '../../src/run/hunt-run.js';
import { type RunOptions } from '../../src/run/manifest.js';
import { tf } from '../../src/search/backend.js';
import { localBatchSource } from '../../src/search/local-source.js';

export async function driveHunt(
  dir: string,
  target: HuntTarget,
  options: RunOptions,
  iterations: number,
  resume: boolean,
): Promise<void> {
  const opened = resume
    ? reopenRun(dir)
    : (() => {
        const manifest = createRun(dir, target, options, 'wasm');
        return { manifest, state: freshState(manifest) };
      })();
  await driveRun(
    {
      tf,
      dir,
      manifest: opened.manifest,
      target,
      source: localBatchSource(tf, opened.manifest.options.seed, target.evaluate),
      stop: { iterations },
      flag: { requested: false },
      resumed: resume,
    },
    opened.state,
  );
}
