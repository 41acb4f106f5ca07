/**
 * `refute dump DIR`: the best graphs of a run (best.g6, best first) or its counterexamples
 * (counterexamples.g6), as graph6, adjacency lists, edge lists or JSON lines (from summary.json:
 * graph6, score, certification and key invariants).
 */
import { type Command } from 'commander';
import { readFileSync } from 'node:fs';
import { InputError } from '../errors.js';
import { decodeGraph6 } from '../graph/graph6.js';
import { formatAdjacencyList, formatEdgeList } from '../graph/text-formats.js';
import { readManifest } from '../run/manifest.js';
import { bestPath, counterexamplesPath, summaryPath } from '../run/results.js';
import { type CommandOutcome } from './main.js';
import { integerOption } from './option-values.js';
import { writeOut } from './output.js';

const FORMATS = ['graph6', 'adjacency', 'edges', 'json'] as const;
type DumpFormat = (typeof FORMATS)[number];

interface DumpFlags {
  top?: string;
  counterexamples?: boolean;
  format?: string;
}

function readLines(path: string): string[] {
  try {
    return readFileSync(path, 'utf8')
      .split('\n')
      .filter((l) => l !== '');
  } catch (err) {
    if ((err as NodeJS.ErrnoException).code === 'ENOENT') return [];
    throw new InputError(`${path}: cannot read (${(err as NodeJS.ErrnoException).code ?? String(err)})`);
  }
}

function readSummaryEntries(path: string, which: 'best' | 'counterexamples'): Array<Record<string, unknown>> {
  try {
    const summary = JSON.parse(readFileSync(path, 'utf8')) as Record<string, unknown>;
    const list = summary[which];
    if (!Array.isArray(list)) throw new TypeError('missing list');
    return list as Array<Record<string, unknown>>;
  } catch {
    throw new InputError(`${path}: missing or corrupt summary; the run has not completed an iteration yet`);
  }
}

export function addDumpCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('dump')
    .description('print the best graphs (or the counterexamples) of a run')
    .argument('<dir>', 'run folder made by refute hunt')
    .option('--top <k>', 'only the first k graphs')
    .option('--counterexamples', 'the counterexamples instead of the best graphs')
    .option('--format <f>', `one of ${FORMATS.join(', ')} (default graph6)`)
    .action(async (dir: string, flags: DumpFlags) => {
      const format = (flags.format ?? 'graph6') as DumpFormat;
      if (!FORMATS.includes(format)) {
        throw new InputError(`--format: expected one of ${FORMATS.join(', ')} but found '${flags.format}'`);
      }
      const top = integerOption('--top', flags.top, 0, Number.MAX_SAFE_INTEGER);
      readManifest(dir);
      const which = flags.counterexamples ? 'counterexamples' : 'best';
      const source = which === 'best' ? bestPath(dir) : counterexamplesPath(dir);
      let lines = readLines(source);
      if (top !== undefined) lines = lines.slice(0, top);
      if (format === 'json') {
        const byGraph = new Map(
          readSummaryEntries(summaryPath(dir), which).map((e) => [String(e.graph6), e]),
        );
        for (const line of lines)
          await writeOut(JSON.stringify(byGraph.get(line) ?? { graph6: line }) + '\n');
      } else {
        let first = true;
        for (const [k, line] of lines.entries()) {
          const where = `${source} line ${k + 1}`;
          if (format === 'graph6') {
            decodeGraph6(line, where);
            await writeOut(line + '\n');
          } else {
            const g = decodeGraph6(line, where);
            await writeOut(
              (first ? '' : '\n') + (format === 'adjacency' ? formatAdjacencyList(g) : formatEdgeList(g)),
            );
          }
          first = false;
        }
      }
      outcome.status = 0;
    });
}
