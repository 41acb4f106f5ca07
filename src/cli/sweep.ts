/**
 * `refute sweep FILE --max-vertices N [--min-vertices K] [--json] [--conjecture NAME]
 * [--threads T] [--part i/k]`: the conjecture on every graph of orders K..N, one per
 * isomorphism class. Counterexamples go to stdout (canonical graph6, one line each, or JSON
 * lines with --json), one summary line per order to stderr. Exit 0 when a graph refutes the
 * claim, 1 when none does, 2 on bad input.
 *
 * Resuming: the summary of an order is printed when the order is complete, so a stopped sweep
 * is continued with --min-vertices set to the first order without a summary; --part splits
 * every order into k shares for separate processes or machines.
 */
import { availableParallelism } from 'node:os';
import { type Command } from 'commander';
import { InputError } from '../errors.js';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { MAX_ENUMERATION_ORDER } from '../enumerate/graph-enumerator.js';
import { formatPartSpec, parsePartSpec } from '../enumerate/part-spec.js';
import { runSweep, type SweepOrderSummary } from '../enumerate/sweep.js';
import { type SweepCounterexample } from '../enumerate/sweep-part.js';
import { parseOrderOption } from './generate.js';
import { type CommandOutcome } from './main.js';
import { writeOut } from './output.js';

interface SweepOptions {
  maxVertices?: string;
  minVertices?: string;
  json?: boolean;
  conjecture?: string;
  threads?: string;
  part?: string;
}

/** A score as JSON: ±Infinity as strings, as everywhere in refute's JSON. */
function scoreToJson(score: number): number | string {
  return Number.isFinite(score) ? score : String(score);
}

function summaryLine(name: string, s: SweepOrderSummary, connectedOnly: boolean): string {
  const part = s.part.count > 1 ? ` part ${formatPartSpec(s.part)}` : '';
  const kind = connectedOnly ? 'connected graphs' : 'graphs';
  const best = s.best === null ? 'no graph in the domain' : `best score ${s.best.score} (${s.best.graph6})`;
  return (
    `order ${s.order}${part}: ${s.graphs} ${kind}, ${s.inDomain} in the domain, ` +
    `${s.counterexamples} certified counterexamples to '${name}'` +
    (s.numericalOnly > 0
      ? `, ${s.numericalOnly} numerical only (score > 0 within rounding, not certified)`
      : '') +
    `, ${best}\n`
  );
}

function parseThreads(text: string | undefined): number {
  if (text === undefined) return Math.max(1, Math.min(2, availableParallelism()));
  const t = /^\s*\d+\s*$/.test(text) ? Number(text) : NaN;
  if (!Number.isInteger(t) || t < 1 || t > 256) {
    throw new InputError(`--threads: expected an integer in 1..256 but found '${text}'`);
  }
  return t;
}

export function addSweepCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('sweep')
    .description('evaluate a conjecture on every graph of the given orders, one per isomorphism class')
    .argument('<file>', 'conjecture file (.ts)')
    .option('--max-vertices <N>', `largest order, 1..${MAX_ENUMERATION_ORDER}`)
    .option('--min-vertices <K>', 'smallest order (default 1)')
    .option('--json', 'JSON lines on stdout: each counterexample, then a summary per order')
    .option('--conjecture <name>', 'which conjecture of a file that exports several')
    .option('--threads <T>', 'worker threads (default: 2, or 1 on a one-core machine)')
    .option('--part <i/k>', 'only part i of k of each order (1 <= i <= k)')
    .action(async (file: string, opts: SweepOptions) => {
      const maxOrder = parseOrderOption(opts.maxVertices, '--max-vertices');
      const minOrder =
        opts.minVertices === undefined ? 1 : parseOrderOption(opts.minVertices, '--min-vertices');
      if (minOrder > maxOrder) {
        throw new InputError(`--min-vertices ${minOrder} is above --max-vertices ${maxOrder}; give K <= N`);
      }
      const threads = parseThreads(opts.threads);
      const part = opts.part === undefined ? undefined : parsePartSpec(opts.part);
      const loaded = await loadConjectureFile(file);
      const conjecture = selectConjecture(loaded, opts.conjecture);
      const json = opts.json === true;
      const refuted = await runSweep(
        {
          conjecture,
          file: loaded.path,
          sha256: loaded.sha256,
          conjectureName: opts.conjecture,
          minOrder,
          maxOrder,
          part,
          threads,
        },
        {
          counterexample: async (order: number, found: SweepCounterexample) => {
            // Plain output lists certified counterexamples only; JSON lists both, flagged.
            if (!json && !found.certified) return;
            const line = json
              ? JSON.stringify({
                  type: 'counterexample',
                  order,
                  graph6: found.graph6,
                  score: scoreToJson(found.score),
                  certified: found.certified,
                })
              : found.graph6;
            await writeOut(line + '\n');
          },
          orderDone: async (summary: SweepOrderSummary) => {
            process.stderr.write(summaryLine(conjecture.name, summary, conjecture.connected));
            if (json) {
              await writeOut(
                JSON.stringify({
                  type: 'order',
                  order: summary.order,
                  part: formatPartSpec(summary.part),
                  graphs: summary.graphs,
                  inDomain: summary.inDomain,
                  counterexamples: summary.counterexamples,
                  numericalOnly: summary.numericalOnly,
                  bestScore: summary.best === null ? null : scoreToJson(summary.best.score),
                  bestGraph6: summary.best === null ? null : summary.best.graph6,
                }) + '\n',
              );
            }
          },
        },
      );
      outcome.status = refuted ? 0 : 1;
    });
}
