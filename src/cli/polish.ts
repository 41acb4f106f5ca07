/**
 * `refute polish FILE [G6...] [--stdin] [--conjecture NAME] [--steps K] [--seed S]
 * [--fixed-order] [--order-slack K] [--max-seconds S] [--json]`: polishes each given graph by
 * variable neighbourhood search over structured local edits (src/search/polish/) and prints,
 * per input, the best graph reached at its order and at each other order it visited, with the
 * score and the verdict: a positive score goes to the exact certifier (src/certify), and only a
 * certified graph refutes. Exit 0 when some result is a certified counterexample, 1 when none,
 * 2 on bad input. All inputs are read and checked before the first is polished, so a malformed
 * line costs nothing and prints nothing.
 */
import { type Command } from 'commander';
import { InputError } from '../errors.js';
import { type Graph } from '../graph/graph.js';
import { encodeGraph6 } from '../graph/graph6.js';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { evaluateConjecture } from '../conjecture/evaluate.js';
import { formatNumber } from '../invariants/encode.js';
import { polishStream } from '../search/polish/polish-graphs.js';
import {
  polishGraph,
  POLISH_DEFAULTS,
  type PolishOutcome,
  type PolishSettings,
  type ScoredGraph,
} from '../search/polish/vns.js';
import { describeVerdict, judge, type Verdict } from '../conjecture/verdict.js';
import { type Conjecture } from '../conjecture/types.js';
import { type GraphInput, readGraphInputs } from './graph-input.js';
import { type CommandOutcome } from './main.js';
import { writeOut } from './output.js';

interface PolishCliOptions {
  stdin?: boolean;
  conjecture?: string;
  steps: string;
  seed: string;
  fixedOrder?: boolean;
  orderSlack: string;
  maxSeconds?: string;
  json?: boolean;
}

function integerOption(name: string, text: string, min: number, max: number): number {
  const x = Number(text);
  if (!/^\s*\d+\s*$/.test(text) || !Number.isSafeInteger(x) || x < min || x > max) {
    throw new InputError(`${name}: expected an integer in ${min}..${max} but found '${text}'`);
  }
  return x;
}

function secondsOption(text: string): number {
  const x = Number(text);
  if (text.trim() === '' || !Number.isFinite(x) || x <= 0) {
    throw new InputError(`--max-seconds: expected a positive number of seconds but found '${text}'`);
  }
  return x;
}

/** A score as JSON: a number, or "Infinity" / "-Infinity" as everywhere in refute's JSON. */
function scoreToJson(x: number): number | string {
  return Number.isFinite(x) ? x : String(x);
}

/** The results worth printing for one input: its order first, then the other orders by order. */
function resultsOf(o: PolishOutcome): ScoredGraph[] {
  return [...(o.best === undefined ? [] : [o.best]), ...o.otherOrders];
}

function describeStart(input: GraphInput, o: PolishOutcome): string {
  const ev = o.startEvaluation;
  const scoreText = ev.inDomain ? `score ${formatNumber(ev.score)}` : 'outside the domain';
  return `from ${input.graph6} (${input.where}): n=${input.graph.order}, m=${input.graph.size}, ${scoreText}`;
}

/** What a polished graph says about the conjecture. */
/** As in `check` (conjecture/verdict.ts): refutes only when exact certification confirms it. */
type PolishVerdict = Verdict;

/** The project's one verdict (shared with check): a positive score refutes only when certified. */
function verdictOf(c: Conjecture, s: ScoredGraph): PolishVerdict {
  return judge(c, s.graph, { inDomain: true, score: s.score });
}

function textBlock(input: GraphInput, o: PolishOutcome, verdicts: readonly PolishVerdict[]): string {
  const lines = [describeStart(input, o)];
  if (o.best === undefined) lines.push(`  best at n=${input.graph.order}: no graph in the domain found`);
  resultsOf(o).forEach((s, i) => {
    const g: Graph = s.graph;
    lines.push(
      `  best at n=${g.order}: ${encodeGraph6(g)}  m=${g.size}  score ${formatNumber(s.score)}  ` +
        describeVerdict(verdicts[i]),
    );
  });
  lines.push(`  ${o.evaluations} graphs scored`);
  return lines.join('\n') + '\n';
}

function jsonLine(input: GraphInput, o: PolishOutcome, verdicts: readonly PolishVerdict[]): string {
  const ev = o.startEvaluation;
  return (
    JSON.stringify({
      input: input.graph6,
      where: input.where,
      start: { order: input.graph.order, score: ev.inDomain ? scoreToJson(ev.score) : null },
      results: resultsOf(o).map((s, i) => {
        const v = verdicts[i];
        return {
          graph6: encodeGraph6(s.graph),
          order: s.graph.order,
          size: s.graph.size,
          score: scoreToJson(s.score),
          verdict: v.kind,
          certified: v.kind === 'refutes',
        };
      }),
      evaluations: o.evaluations,
    }) + '\n'
  );
}

export function addPolishCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('polish')
    .description(
      'improve graphs by local search (edge toggles and rotations, leaf moves, degree-preserving swaps, ' +
        'pendant vertices, subdivisions, deletions) and report where they refute the conjecture',
    )
    .argument('<file>', 'conjecture file (.ts)')
    .argument('[graph6...]', 'start graphs in graph6')
    .option('--stdin', 'also read start graphs (graph6 lines) from standard input')
    .option('--conjecture <name>', 'which conjecture of the file, when it exports several')
    .option('--steps <k>', 'most graphs scored per start graph', String(POLISH_DEFAULTS.steps))
    .option('--seed <seed>', 'seed of every random choice (same seed, same output)', '1')
    .option('--fixed-order', "stay at each start graph's order (other orders are only looked at)")
    .option(
      '--order-slack <k>',
      'without --fixed-order: orders within start ± k are allowed',
      String(POLISH_DEFAULTS.orderSlack),
    )
    .option('--max-seconds <s>', 'also stop each polish after s seconds (the output then depends on timing)')
    .option('--json', 'one JSON object per start graph and line')
    .action(async (file: string, graphs: string[], opts: PolishCliOptions) => {
      const steps = integerOption('--steps', opts.steps, 1, 1e9);
      const orderSlack = integerOption('--order-slack', opts.orderSlack, 0, 64);
      const seconds = opts.maxSeconds === undefined ? undefined : secondsOption(opts.maxSeconds);
      if (graphs.length === 0 && !opts.stdin) {
        throw new InputError(
          `no start graphs given: pass graph6 strings after the file or use --stdin (example: refute polish ${file} 'IheA@GUAo')`,
        );
      }
      const conjecture = selectConjecture(await loadConjectureFile(file), opts.conjecture);
      const inputs: GraphInput[] = [];
      for await (const input of readGraphInputs(graphs, opts.stdin === true)) inputs.push(input);
      if (inputs.length === 0)
        throw new InputError('no start graphs given: standard input held no graph6 line');

      const evaluate = (g: Graph) => evaluateConjecture(conjecture, g);
      let refuted = false;
      for (let i = 0; i < inputs.length; i++) {
        const settings: PolishSettings = {
          ...POLISH_DEFAULTS,
          steps,
          orderSlack,
          fixedOrder: opts.fixedOrder === true,
          connected: conjecture.connected,
          ...(seconds === undefined ? {} : { deadline: Date.now() + seconds * 1000 }),
        };
        const o = polishGraph(evaluate, inputs[i].graph, polishStream(opts.seed, i), settings);
        const verdicts = resultsOf(o).map((s) => verdictOf(conjecture, s));
        if (verdicts.some((v) => v.kind === 'refutes')) refuted = true;
        await writeOut(opts.json ? jsonLine(inputs[i], o, verdicts) : textBlock(inputs[i], o, verdicts));
      }
      outcome.status = refuted ? 0 : 1;
    });
}
