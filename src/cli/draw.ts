/**
 * `refute draw G6|DIR --out FILE.svg|FILE.png [--top K] [--layout ...] [--colour ...] [--seed S]
 * [--file FILE [--conjecture NAME]]`: a drawing of one graph (with a conjecture file, the
 * caption adds its score), or of a run's K best graphs side by side with their scores.
 */
import { type Command } from 'commander';
import { existsSync, statSync } from 'node:fs';
import { readRunFiles } from '../report/run-files.js';
import { InputError } from '../errors.js';
import { decodeGraph6 } from '../graph/graph6.js';
import { graphToSvg, type VertexColouring } from '../report/svg-graph.js';
import { type LayoutKind } from '../report/layout.js';
import { svgToPng } from '../report/png.js';
import { replaceAtomically } from '../run/atomic-files.js';
import { loadConjectureFile, selectConjecture } from '../conjecture/load.js';
import { evaluateConjecture } from '../conjecture/evaluate.js';
import { formatNumber } from '../invariants/encode.js';
import { componentCount } from '../invariants/components.js';
import { type CommandOutcome } from './main.js';

const LAYOUTS: LayoutKind[] = ['auto', 'force', 'tree', 'circle'];
const COLOURINGS: VertexColouring[] = ['none', 'degree', 'eccentricity', 'transmission'];

interface DrawOptions {
  out: string;
  layout: string;
  colour: string;
  seed: string;
  file?: string;
  conjecture?: string;
  top: string;
}

function oneOf<T extends string>(option: string, value: string, allowed: ReadonlyArray<T>): T {
  if (!(allowed as ReadonlyArray<string>).includes(value)) {
    throw new InputError(`${option}: expected one of ${allowed.join(', ')} but found '${value}'`);
  }
  return value as T;
}

/** The K best graphs of a run in one SVG, side by side, each captioned with its score. */
function runDrawing(
  dir: string,
  top: number,
  options: { layout: LayoutKind; colourBy: VertexColouring; seed: string },
): string {
  const run = readRunFiles(dir);
  const certified = new Set(run.counterexamples.map((c) => c.graph6));
  const chosen = run.best.slice(0, top);
  if (chosen.length === 0) throw new InputError(`${dir}: the run has no graphs yet (best.g6 is empty)`);
  const size = 320;
  const parts = chosen.map((rec, i) => {
    const score = typeof rec.score === 'number' ? formatNumber(rec.score) : String(rec.score);
    const caption = [
      `#${i + 1}  score ${score}${certified.has(rec.graph6) ? '  (certified counterexample)' : ''}`,
    ];
    return graphToSvg(decodeGraph6(rec.graph6, `${dir}/best.g6 line ${i + 1}`), {
      ...options,
      size,
      caption,
    });
  });
  const heights = parts.map((p) => Number(/height="([\d.]+)"/.exec(p)?.[1] ?? size));
  const height = Math.max(...heights);
  const width = size * parts.length;
  const inner = parts.map((p, i) => p.replace(/^<svg /, `<svg x="${i * size}" y="0" `)).join('');
  return `<svg xmlns="http://www.w3.org/2000/svg" width="${width}" height="${height}" viewBox="0 0 ${width} ${height}">\n${inner}</svg>\n`;
}

export function addDrawCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('draw')
    .description('draw a graph (graph6) as SVG, or PNG when --out ends in .png')
    .argument('<graph6-or-dir>', 'a graph in graph6, or a run folder made by refute hunt')
    .option('--top <k>', 'with a run folder: how many of its best graphs to draw', '1')
    .requiredOption('--out <file>', 'output file (.svg or .png)')
    .option(
      '--layout <kind>',
      `vertex placement: ${LAYOUTS.join(', ')} (auto: tree for forests, else force)`,
      'auto',
    )
    .option('--colour <by>', `colour vertices by ${COLOURINGS.join(', ')}`, 'none')
    .option('--seed <seed>', 'seed of the force-directed layout', 'refute')
    .option('--file <conjecture-file>', 'add the score of this conjecture file to the caption')
    .option('--conjecture <name>', 'which conjecture of the file, when it exports several')
    .action(async (graph6: string, opts: DrawOptions) => {
      const layout = oneOf('--layout', opts.layout, LAYOUTS);
      const colourBy = oneOf('--colour', opts.colour, COLOURINGS);
      if (!/\.(svg|png)$/i.test(opts.out))
        throw new InputError(`--out: expected a file name ending in .svg or .png but found '${opts.out}'`);
      if (existsSync(graph6) && statSync(graph6).isDirectory()) {
        const top = Number(opts.top);
        if (!Number.isInteger(top) || top < 1)
          throw new InputError(`--top: expected a whole number >= 1 but found '${opts.top}'`);
        const svg = runDrawing(graph6, top, { layout, colourBy, seed: opts.seed });
        replaceAtomically(opts.out, /\.png$/i.test(opts.out) ? await svgToPng(svg) : svg);
        outcome.status = 0;
        return;
      }
      const g = decodeGraph6(graph6, 'argument 1');
      if (layout === 'tree' && g.size !== g.order - componentCount(g)) {
        throw new InputError('--layout tree: the graph has a cycle; use auto, force or circle');
      }
      const caption: string[] = [];
      if (opts.conjecture !== undefined && opts.file === undefined) {
        throw new InputError('--conjecture names a conjecture of a file: give the file with --file');
      }
      if (opts.file !== undefined) {
        const conjecture = selectConjecture(await loadConjectureFile(opts.file), opts.conjecture);
        const result = evaluateConjecture(conjecture, g);
        caption.push(
          result.inDomain
            ? `${conjecture.name}: score ${formatNumber(result.score)}${result.score > 0 ? ' (refutes, numerically)' : ''}`
            : `${conjecture.name}: outside the conjecture's domain`,
        );
      }
      const svg = graphToSvg(g, { layout, colourBy, seed: opts.seed, caption });
      replaceAtomically(opts.out, /\.png$/i.test(opts.out) ? await svgToPng(svg) : svg);
      outcome.status = 0;
    });
}
