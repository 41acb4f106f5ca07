/**
 * Entry point of the CLI: builds the commander program, runs it, and maps outcomes to exit
 * statuses (grep convention): 0 = a certified counterexample was found (or, for commands that
 * only report, success), 1 = none found, 2 = usage or input error.
 */
import { Command, CommanderError } from 'commander';
import { InputError } from '../errors.js';
import { addInvariantsCommand } from './invariants.js';
import { addCertifyCommand } from './certify.js';
import { addCheckCommand } from './check.js';
import { addGenerateCommand } from './generate.js';
import { addSweepCommand } from './sweep.js';
import { addHuntCommand } from './hunt.js';
import { addResumeCommand } from './resume.js';
import { addDumpCommand } from './dump.js';
import { addDrawCommand } from './draw.js';
import { addReportCommand } from './report.js';
import { addPolishCommand } from './polish.js';
import { TOOL_VERSION } from '../version.js';

/** What a command's action returns: the process's exit status. */
export type ExitStatus = 0 | 1 | 2;

/** Holder through which command actions hand their exit status back to main(). */
export interface CommandOutcome {
  status: ExitStatus;
}

export function buildProgram(outcome: CommandOutcome): Command {
  const program = new Command();
  program
    .name('refute')
    .description('Hunt certified counterexamples to conjectured graph inequalities.')
    .version(TOOL_VERSION)
    .showHelpAfterError('(run with --help for usage)')
    .exitOverride()
    .configureOutput({ writeErr: (s) => process.stderr.write(s) });
  addCheckCommand(program, outcome);
  addSweepCommand(program, outcome);
  addHuntCommand(program, outcome);
  addResumeCommand(program, outcome);
  addDumpCommand(program, outcome);
  addPolishCommand(program, outcome);
  addCertifyCommand(program, outcome);
  addInvariantsCommand(program, outcome);
  addGenerateCommand(program, outcome);
  addDrawCommand(program, outcome);
  addReportCommand(program, outcome);
  return program;
}

/** Runs the CLI on argv (as process.argv) and resolves to the exit status. */
export async function main(argv: string[]): Promise<number> {
  const outcome: CommandOutcome = { status: 0 };
  const program = buildProgram(outcome);
  try {
    await program.parseAsync(argv);
    return outcome.status;
  } catch (err) {
    if (err instanceof CommanderError) {
      // --help and --version end through here with exit code 0.
      return err.exitCode === 0 ? 0 : 2;
    }
    if (err instanceof InputError) {
      process.stderr.write(`refute: ${err.message}\n`);
      return 2;
    }
    if (isBrokenPipe(err)) return outcome.status;
    // Not the user's fault, but never exit 1 ("nothing found") on a crash.
    const message = err instanceof Error ? err.message : String(err);
    process.stderr.write(`refute: internal error: ${message} (set REFUTE_DEBUG=1 for the stack trace)\n`);
    if (process.env.REFUTE_DEBUG) process.stderr.write(`${(err as Error).stack ?? ''}\n`);
    return 2;
  }
}

function isBrokenPipe(err: unknown): boolean {
  return typeof err === 'object' && err !== null && (err as { code?: string }).code === 'EPIPE';
}
