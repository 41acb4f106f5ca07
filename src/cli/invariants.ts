/**
 * `refute invariants [G6...] [--stdin] [--json] [--only a,b]`: every invariant of each graph,
 * as a table per graph or as JSON lines (keys as in shared/INVARIANTS.md).
 */
import { type Command } from 'commander';
import { InputError, InvariantDomainError } from '../errors.js';
import { INVARIANTS, InvariantMemo, invariantNames, type InvariantValue } from '../invariants/registry.js';
import { formatInvariant, invariantToJson } from '../invariants/encode.js';
import { readGraphInputs } from './graph-input.js';
import { nearestName } from './nearest-name.js';
import { type CommandOutcome } from './main.js';
import { writeOut } from './output.js';

interface InvariantsOptions {
  stdin?: boolean;
  json?: boolean;
  only?: string;
}

function selectedNames(only: string | undefined): string[] {
  if (only === undefined) return invariantNames();
  const names = only
    .split(',')
    .map((s) => s.trim())
    .filter((s) => s !== '');
  for (const name of names) {
    if (!INVARIANTS.has(name)) {
      const hint = nearestName(name, invariantNames());
      throw new InputError(
        `--only: unknown invariant '${name}'${hint ? `; did you mean '${hint}'?` : ''} (see 'refute invariants --help')`,
      );
    }
  }
  return names;
}

/** Value of an invariant, or the reason it is undefined here (distance spectra of disconnected graphs). */
function valueOrReason(memo: InvariantMemo, name: string): InvariantValue | InvariantDomainError {
  try {
    return memo.get(name);
  } catch (err) {
    if (err instanceof InvariantDomainError) return err;
    throw err;
  }
}

export function addInvariantsCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('invariants')
    .description('print the invariants of graphs given as graph6 (arguments or --stdin)')
    .argument('[graph6...]', 'graphs in graph6')
    .option('--stdin', 'also read graph6 lines from standard input')
    .option('--json', 'one JSON object per graph and line')
    .option('--only <names>', 'comma-separated invariant names')
    .action(async (graphs: string[], opts: InvariantsOptions) => {
      const names = selectedNames(opts.only);
      if (graphs.length === 0 && !opts.stdin) {
        throw new InputError(
          "no graphs given: pass graph6 strings as arguments or use --stdin (example: refute invariants 'IheA@GUAo')",
        );
      }
      const width = Math.max(...names.map((n) => n.length));
      let first = true;
      for await (const input of readGraphInputs(graphs, opts.stdin === true)) {
        const memo = new InvariantMemo(input.graph);
        if (opts.json) {
          const record: Record<string, unknown> = { graph6: input.graph6 };
          for (const name of names) {
            const v = valueOrReason(memo, name);
            record[name] = v instanceof InvariantDomainError ? null : invariantToJson(v);
          }
          await writeOut(JSON.stringify(record) + '\n');
        } else {
          let text = first ? '' : '\n';
          text += `graph ${input.graph6}\n`;
          for (const name of names) {
            const v = valueOrReason(memo, name);
            const shown =
              v instanceof InvariantDomainError ? '(undefined: connected graphs only)' : formatInvariant(v);
            text += `  ${name.padEnd(width)}  ${shown}\n`;
          }
          await writeOut(text);
        }
        first = false;
      }
      outcome.status = 0;
    });
}
