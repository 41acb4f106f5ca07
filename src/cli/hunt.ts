/**
 * `refute hunt FILE`: the search. Loads the conjecture, creates the run folder (run.json
 * first), and runs the cross-entropy search until --iterations, --minutes, --until-found or
 * Ctrl-C; see src/run/hunt-run.ts for what is written when, and src/search/hunt.ts for the
 * method.
 */
import { type Command } from 'commander';
import { join } from 'node:path';
import { InputError } from '../errors.js';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { evaluateConjecture } from '../conjecture/evaluate.js';
import { type Conjecture } from '../conjecture/types.js';
import { type LoadedConjectureFile } from '../conjecture/load.js';
import { judgeCounterexample } from '../search/counterexample.js';
import { graphKey } from '../search/graph-key.js';
import { certifyCounterexample } from '../certify/certify.js';
import { HUNT_DEFAULTS } from '../search/hunt.js';
import { type HuntTarget, type StopConditions, createRun, freshState } from '../run/hunt-run.js';
import { type RunOptions } from '../run/manifest.js';
import { type CommandOutcome } from './main.js';
import { runSession } from './hunt-session.js';
import { integerOption, layersOption, numberOption } from './option-values.js';

/** Largest order hunt accepts: N = n(n-1)/2 decisions per graph grows fast. */
export const HUNT_MAX_VERTICES = 64;

interface HuntFlags {
  vertices?: string;
  seed?: string;
  batch?: string;
  elite?: string;
  keep?: string;
  layers?: string;
  learningRate?: string;
  trainGraphs?: string;
  iterations?: string;
  minutes?: string;
  untilFound?: boolean;
  threads?: string;
  out?: string;
  report?: boolean;
  conjecture?: string;
  plain?: boolean;
  polishEvery?: string;
}

/**
 * The hunt's view of a loaded conjecture. A graph counts as a counterexample only when exact
 * certification confirms it (src/certify); a positive float score that certification does not
 * confirm ("numerical only", an equality case) stays among the best graphs but is never written
 * to counterexamples.g6. Verdicts are remembered per isomorphism class, since a converging
 * policy samples the same graph many times.
 */
export function huntTarget(file: LoadedConjectureFile, c: Conjecture): HuntTarget {
  const verdicts = new Map<string, 'certified' | null>();
  return {
    name: c.name,
    path: file.path,
    sha256: file.sha256,
    connected: c.connected,
    evaluate: (g) => evaluateConjecture(c, g),
    judge: (g, evaluation) => {
      if (judgeCounterexample(g, evaluation) === null) return null;
      const key = graphKey(g);
      let verdict = verdicts.get(key);
      if (verdict === undefined) {
        verdict = certifyCounterexample(c, g).certified ? 'certified' : null;
        if (verdicts.size >= 100_000) verdicts.clear();
        verdicts.set(key, verdict);
      }
      return verdict;
    },
  };
}

/** Stop conditions shared by hunt and resume. */
export function stopConditions(flags: {
  iterations?: string;
  minutes?: string;
  untilFound?: boolean;
}): StopConditions {
  return {
    iterations: integerOption('--iterations', flags.iterations, 0, 1e12),
    minutes: numberOption('--minutes', flags.minutes, 0, 1e7, true),
    untilFound: flags.untilFound === true,
  };
}

export function threadsOption(text: string | undefined): number {
  return integerOption('--threads', text, 1, 64) ?? 1;
}

function runName(name: string, seed: string): string {
  const stamp = new Date().toISOString().replace(/[-:]/g, '').replace(/\..*$/, '');
  const safeSeed = seed.replace(/[^A-Za-z0-9_-]/g, '_').slice(0, 32);
  return `${name}-seed${safeSeed}-${stamp}`;
}

export function addHuntCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('hunt')
    .description(
      'search for a counterexample with the cross-entropy method and a neural policy; without --iterations, --minutes or --until-found it runs until Ctrl-C, which stops it cleanly',
    )
    .argument('<file>', 'conjecture file (.ts)')
    .option('--conjecture <name>', 'which conjecture, when the file exports several')
    .option('--vertices <n>', "order of the graphs (default: the conjecture's vertices)")
    .option('--seed <s>', 'seed of every random choice (default 1)')
    .option('--batch <b>', `graphs sampled per iteration (default ${HUNT_DEFAULTS.batch})`)
    .option('--elite <f>', `fraction of the batch trained on (default ${HUNT_DEFAULTS.elite})`)
    .option('--keep <f>', `fraction of the batch carried over unchanged (default ${HUNT_DEFAULTS.keep})`)
    .option('--layers <widths>', `hidden layer widths (default ${HUNT_DEFAULTS.hidden.join(',')})`)
    .option('--learning-rate <r>', `Adam step size (default ${HUNT_DEFAULTS.learningRate})`)
    .option(
      '--train-graphs <k>',
      `whole graphs per training minibatch (default ${HUNT_DEFAULTS.trainGraphs})`,
    )
    .option('--iterations <k>', 'stop after k iterations')
    .option('--minutes <m>', 'stop after m minutes')
    .option('--until-found', 'stop at the first counterexample')
    .option('--threads <t>', 'worker threads for sampling and scoring (same results for any t; default 1)')
    .option('--plain', 'the plain method, without collapse handling (for comparisons)')
    .option(
      '--polish-every <k>',
      `polish the batch's best graphs by local search every k iterations, 0 for never (default ${HUNT_DEFAULTS.polish.every}; 0 with --plain)`,
    )
    .option('--out <dir>', 'run folder (default runs/<name>-seed<s>-<time>)')
    .option('--report', 'keep DIR/report.html up to date while the hunt runs')
    .action(async (file: string, flags: HuntFlags) => {
      const seed = flags.seed ?? '1';
      if (seed === '' || seed.length > 200)
        throw new InputError(`--seed: expected 1..200 characters but found ${seed.length}`);
      const batch = integerOption('--batch', flags.batch, 2, 1_000_000) ?? HUNT_DEFAULTS.batch;
      const elite = numberOption('--elite', flags.elite, 0, 1, true) ?? HUNT_DEFAULTS.elite;
      const keep = numberOption('--keep', flags.keep, 0, 1) ?? HUNT_DEFAULTS.keep;
      const layers = layersOption('--layers', flags.layers) ?? [...HUNT_DEFAULTS.hidden];
      const learningRate =
        numberOption('--learning-rate', flags.learningRate, 0, 10, true) ?? HUNT_DEFAULTS.learningRate;
      const trainGraphs =
        integerOption('--train-graphs', flags.trainGraphs, 1, 100_000) ?? HUNT_DEFAULTS.trainGraphs;
      const polishEvery =
        integerOption('--polish-every', flags.polishEvery, 0, 1_000_000) ??
        (flags.plain === true ? 0 : HUNT_DEFAULTS.polish.every);
      const stop = stopConditions(flags);
      const threads = threadsOption(flags.threads);
      const loaded = await loadConjectureFile(file);
      const conjecture = selectConjecture(loaded, flags.conjecture);
      const vertices =
        integerOption('--vertices', flags.vertices, 2, HUNT_MAX_VERTICES) ?? conjecture.vertices;
      if (vertices < 2 || vertices > HUNT_MAX_VERTICES) {
        throw new InputError(
          `conjecture '${conjecture.name}': hunt needs 2..${HUNT_MAX_VERTICES} vertices but the file says ${vertices}; pass --vertices`,
        );
      }
      const options: RunOptions = {
        vertices,
        seed,
        batch,
        elite,
        keep,
        layers,
        learningRate,
        trainGraphs,
        explore: flags.plain !== true,
        polishEvery,
      };
      const target = huntTarget(loaded, conjecture);
      // tfjs is loaded only by the commands that need it: it costs about a second of start-up.
      const { startTensorflow, tf } = await import('../search/backend.js');
      const backend = await startTensorflow(1);
      const dir = flags.out ?? join('runs', runName(conjecture.name, seed));
      const manifest = createRun(dir, target, options, backend);
      const { status } = await runSession({
        tf,
        dir,
        manifest,
        target,
        state: freshState(manifest),
        stop,
        threads,
        resumed: false,
        report: flags.report === true,
      });
      outcome.status = status;
    });
}
