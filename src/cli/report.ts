/**
 * `refute report DIR [--top K]`: writes DIR/report.html, the run's self-contained report.
 */
import { type Command } from 'commander';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { InputError } from '../errors.js';
import { readRunFiles, readScoreSeries } from '../report/run-files.js';
import { renderRunReport } from '../report/html-report.js';
import { replaceAtomically } from '../run/atomic-files.js';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { type CommandOutcome } from './main.js';

/** The statement of the run's conjecture, or why it cannot be shown. */
async function statementOf(
  manifest: Record<string, unknown>,
): Promise<{ statement: string | null; note?: string }> {
  const c = manifest.conjecture as { path?: string; sha256?: string; name?: string } | undefined;
  if (!c?.path) return { statement: null, note: 'run.json names no conjecture file' };
  let bytes: Buffer;
  try {
    bytes = readFileSync(c.path);
  } catch {
    return { statement: null, note: `${c.path} cannot be read` };
  }
  if (c.sha256 && createHash('sha256').update(bytes).digest('hex') !== c.sha256) {
    return { statement: null, note: `${c.path} has changed since the run started` };
  }
  try {
    return { statement: selectConjecture(await loadConjectureFile(c.path), c.name).statement };
  } catch (err) {
    return { statement: null, note: err instanceof Error ? err.message : String(err) };
  }
}

/** Writes DIR/report.html; shared by `refute report` and the hunt's --report option. */
export async function writeRunReport(dir: string, top = 6): Promise<string> {
  const run = readRunFiles(dir);
  const series = await readScoreSeries(dir);
  const { statement, note } = await statementOf(run.manifest);
  const path = join(dir, 'report.html');
  replaceAtomically(path, renderRunReport({ run, series, statement, statementNote: note, top }));
  return path;
}

export function addReportCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('report')
    .description('write DIR/report.html: the run at a glance, self-contained (works offline)')
    .argument('<dir>', 'run folder made by refute hunt')
    .option('--top <k>', 'how many of the best graphs to draw', '6')
    .action(async (dir: string, opts: { top: string }) => {
      const top = Number(opts.top);
      if (!Number.isInteger(top) || top < 0)
        throw new InputError(`--top: expected a whole number >= 0 but found '${opts.top}'`);
      const path = await writeRunReport(dir, top);
      process.stdout.write(`${path}\n`);
      outcome.status = 0;
    });
}
