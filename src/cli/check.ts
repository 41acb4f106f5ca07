/**
 * `refute check FILE [G6...] [--stdin] [--families [--max-vertices N]] [--conjecture NAME] [--json]`:
 * evaluates a conjecture file's conjectures on the given graphs, on a graph6 stream read line by
 * line (constant memory, any length), and on every built-in family at every order 1..N.
 *
 * Output, one line per graph and conjecture: graph6, score, verdict (refutes / holds / tight /
 * outside the conjecture's domain) and where the graph came from; then a summary per
 * conjecture. With --json, one JSON object per line instead, and no summary. Exit 0 when some
 * graph refutes a conjecture, 1 when none does, 2 on bad input (see conjecture/verdict.ts for
 * what counts as refuting: certified counterexamples only).
 */
import { type Command } from 'commander';
import { InputError } from '../errors.js';
import { type Graph } from '../graph/graph.js';
import { encodeGraph6 } from '../graph/graph6.js';
import { formatNumber, invariantToJson } from '../invariants/encode.js';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { evaluateOnView } from '../conjecture/evaluate.js';
import { createGraphView } from '../conjecture/view.js';
import { familyMembers } from '../conjecture/family-graphs.js';
import {
  checkExitStatus,
  describeVerdict,
  judge,
  ROUNDING_MARGIN,
  type VerdictKind,
} from '../conjecture/verdict.js';
import { type Conjecture } from '../conjecture/types.js';
import { readGraphInputs } from './graph-input.js';
import { type CommandOutcome } from './main.js';
import { writeOut } from './output.js';

/** --max-vertices when --families is given alone: every family member up to this order. */
export const DEFAULT_FAMILY_MAX_VERTICES = 12;
/** Largest --max-vertices accepted (families grow with n; hard invariants on big graphs are slow). */
const MAX_FAMILY_VERTICES = 64;

interface CheckOptions {
  stdin?: boolean;
  families?: boolean;
  maxVertices?: string;
  conjecture?: string;
  json?: boolean;
}

/** A graph to check and where it came from. */
interface Candidate {
  readonly graph: Graph;
  readonly graph6: string;
  readonly source: string;
}

async function* candidates(
  graphs: string[],
  opts: CheckOptions,
  maxVertices: number,
): AsyncGenerator<Candidate> {
  for await (const input of readGraphInputs(graphs, opts.stdin === true)) {
    yield { graph: input.graph, graph6: input.graph6, source: input.where };
  }
  if (opts.families) {
    for (const member of familyMembers(maxVertices)) {
      yield { graph: member.graph, graph6: encodeGraph6(member.graph), source: member.label };
    }
  }
}

function parseMaxVertices(opts: CheckOptions): number {
  if (opts.maxVertices === undefined) return DEFAULT_FAMILY_MAX_VERTICES;
  if (!opts.families)
    throw new InputError(
      '--max-vertices applies to --families; add --families (example: --families --max-vertices 10)',
    );
  const text = opts.maxVertices.trim();
  const n = /^\d+$/.test(text) ? Number(text) : NaN;
  if (!Number.isInteger(n) || n < 1 || n > MAX_FAMILY_VERTICES) {
    throw new InputError(
      `--max-vertices: expected an integer in 1..${MAX_FAMILY_VERTICES} but found '${opts.maxVertices}'`,
    );
  }
  return n;
}

/** Counts per conjecture for the summary. */
class Tally {
  readonly counts: Record<VerdictKind, number> = {
    refutes: 0,
    'numerical-only': 0,
    holds: 0,
    tight: 0,
    'outside-domain': 0,
  };
  firstRefutation: Candidate | undefined = undefined;
  best: { score: number; candidate: Candidate } | undefined = undefined;

  add(kind: VerdictKind, candidate: Candidate, score: number | undefined): void {
    this.counts[kind]++;
    if (kind === 'refutes' && this.firstRefutation === undefined) this.firstRefutation = candidate;
    if (score !== undefined && (this.best === undefined || score > this.best.score))
      this.best = { score, candidate };
  }

  summary(c: Conjecture): string {
    const k = this.counts;
    const total = k.refutes + k['numerical-only'] + k.holds + k.tight + k['outside-domain'];
    const parts = [
      `${k.refutes} refute${k.refutes === 1 ? 's' : ''} it (certified)`,
      ...(k['numerical-only'] > 0
        ? [`${k['numerical-only']} numerical only (score > 0, not certified)`]
        : []),
      `${k.holds} hold`,
      `${k.tight} tight`,
      `${k['outside-domain']} outside the domain`,
    ];
    let text = `${c.name}: ${total} graph${total === 1 ? '' : 's'}: ${parts.join(', ')}`;
    if (this.firstRefutation !== undefined)
      text += `; first counterexample ${this.firstRefutation.graph6} (${this.firstRefutation.source})`;
    else if (this.best !== undefined)
      text += `; best score ${formatNumber(this.best.score)} on ${this.best.candidate.graph6} (${this.best.candidate.source})`;
    return text + '\n';
  }
}

/** One line of the human output: [conjecture (when several)], graph6, score, verdict, source. */
type Row = string[];

/** Least widths of the columns (name, graph6, score, verdict); a wider cell widens its column. */
const MIN_WIDTHS = { name: 0, graph6: 12, score: 14, verdict: 19 };

/**
 * Output held back (finite input) or written as it comes (a stream), with back-pressure. Rows
 * held back together are aligned together; a streamed row is aligned to the least widths.
 */
class OutputBuffer {
  private pending: Array<string | Row> = [];

  constructor(private readonly holdBack: boolean) {}

  add(item: string | Row): void {
    this.pending.push(item);
  }

  async flushIfStreaming(): Promise<void> {
    if (!this.holdBack) await this.flush();
  }

  async flush(): Promise<void> {
    const rows = this.pending.filter((x): x is Row => Array.isArray(x));
    const width = (k: number, least: number) => Math.max(least, ...rows.map((r) => r[k].length));
    const w = [
      width(0, MIN_WIDTHS.name),
      width(1, MIN_WIDTHS.graph6),
      width(2, MIN_WIDTHS.score),
      width(3, MIN_WIDTHS.verdict),
    ];
    const text = this.pending
      .map((x) => {
        if (!Array.isArray(x)) return x;
        const [name, graph6, score, verdict, source] = x;
        return `${name === '' ? '' : name.padEnd(w[0]) + '  '}${graph6.padEnd(w[1])}  ${score.padStart(w[2])}  ${verdict.padEnd(w[3])}  ${source}\n`;
      })
      .join('');
    this.pending = [];
    if (text !== '') await writeOut(text);
  }
}

export function addCheckCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('check')
    .description('evaluate a conjecture file on given graphs, a graph6 stream, or the built-in families')
    .argument('<file>', 'conjecture file (.ts)')
    .argument('[graph6...]', 'graphs in graph6')
    .option('--stdin', 'also read graph6 lines from standard input (any length, constant memory)')
    .option(
      '--families',
      'also check every built-in family (paths, cycles, stars, complete, ...) at every order 1..N',
    )
    .option('--max-vertices <n>', `largest order for --families (default ${DEFAULT_FAMILY_MAX_VERTICES})`)
    .option('--conjecture <name>', 'check only this conjecture of the file (default: all of them)')
    .option('--json', 'one JSON object per graph and conjecture, per line')
    .addHelpText(
      'after',
      `
Verdicts: "refutes (certified)" (score > 0, confirmed by exact arithmetic: see 'refute certify'),
"score > 0, numerical only (not certified)" (a value that cannot be certified, or a margin within
rounding), "holds", "holds (tight)" (an equality case: certification puts the score at 0 within
rounding, or -${ROUNDING_MARGIN} <= score <= 0),
"outside the domain" (not connected when the conjecture asks for it, or 'where' is false).
Exit status: 0 when some graph refutes a conjecture, 1 when none does, 2 on bad input.

Examples:
  refute check scores/spectral-radius-near-average-degree.ts --families
  refute check scores/second-eigenvalue-vs-complement-degree.ts 'IJ~~~~~~w'
  refute generate --vertices 7 | refute check my-claim.ts --stdin --json`,
    )
    .action(async (file: string, graphs: string[], opts: CheckOptions) => {
      const maxVertices = parseMaxVertices(opts);
      if (graphs.length === 0 && !opts.stdin && !opts.families) {
        throw new InputError(
          `nothing to check: give graphs in graph6 after the file, --stdin, or --families (example: refute check ${file} --families)`,
        );
      }
      const loaded = await loadConjectureFile(file);
      const conjectures =
        opts.conjecture === undefined ? loaded.conjectures : [selectConjecture(loaded, opts.conjecture)];
      const tallies = conjectures.map(() => new Tally());
      const withName = conjectures.length > 1;
      // Without --stdin the input is finite and small: the whole output is held back until every
      // graph has been evaluated, so that bad input leaves stdout empty. A stream is written as it
      // goes (constant memory); an error then stops it after the last complete line.
      const output = new OutputBuffer(opts.stdin !== true);
      if (!opts.json) output.add(conjectures.map((c) => `${c.name}: ${c.statement}\n`).join(''));
      for await (const candidate of candidates(graphs, opts, maxVertices)) {
        const view = createGraphView(candidate.graph);
        conjectures.forEach((c, i) => {
          const evaluation = evaluateOnView(c, candidate.graph, view);
          const verdict = judge(c, candidate.graph, evaluation);
          const score = evaluation.inDomain ? evaluation.score : undefined;
          tallies[i].add(verdict.kind, candidate, score);
          if (opts.json) {
            output.add(
              JSON.stringify({
                conjecture: c.name,
                graph6: candidate.graph6,
                source: candidate.source,
                score: score === undefined ? null : invariantToJson(score),
                verdict: verdict.kind,
                certification: verdict.certification,
              }) + '\n',
            );
          } else {
            const shownScore = score === undefined ? '-' : formatNumber(score);
            output.add([
              withName ? c.name : '',
              candidate.graph6,
              shownScore,
              describeVerdict(verdict),
              candidate.source,
            ]);
          }
        });
        await output.flushIfStreaming();
      }
      if (!opts.json) output.add(tallies.map((t, i) => t.summary(conjectures[i])).join(''));
      await output.flush();
      const refutations = tallies.reduce((sum, t) => sum + t.counts.refutes, 0);
      outcome.status = checkExitStatus(refutations);
    });
}
