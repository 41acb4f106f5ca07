/**
 * `refute resume DIR`: continues a run from its checkpoint, bit-identically to a run that never
 * stopped. Refuses (exit 2, one line) when the conjecture file changed since the run started,
 * and when the checkpoint is corrupt or belongs to another run.
 */
import { type Command } from 'commander';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { reopenRun } from '../run/hunt-run.js';
import { type CommandOutcome } from './main.js';
import { runSession } from './hunt-session.js';
import { huntTarget, stopConditions, threadsOption } from './hunt.js';

interface ResumeFlags {
  iterations?: string;
  minutes?: string;
  untilFound?: boolean;
  threads?: string;
  report?: boolean;
}

export function addResumeCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('resume')
    .description('continue a hunt from its checkpoint')
    .argument('<dir>', 'run folder made by refute hunt')
    .option('--iterations <k>', 'stop after k more iterations')
    .option('--minutes <m>', 'stop after m minutes')
    .option('--until-found', 'stop at the first counterexample')
    .option('--threads <t>', 'worker threads for sampling and scoring (same results for any t; default 1)')
    .option('--report', 'keep DIR/report.html up to date while the hunt runs')
    .action(async (dir: string, flags: ResumeFlags) => {
      const stop = stopConditions(flags);
      const threads = threadsOption(flags.threads);
      const { manifest, state } = reopenRun(dir);
      const loaded = await loadConjectureFile(manifest.conjecture.path);
      const target = huntTarget(loaded, selectConjecture(loaded, manifest.conjecture.name));
      const { startTensorflow, tf } = await import('../search/backend.js');
      await startTensorflow(1);
      const report = flags.report === true;
      const { status } = await runSession({
        tf,
        dir,
        manifest,
        target,
        state,
        stop,
        threads,
        resumed: true,
        report,
      });
      outcome.status = status;
    });
}
