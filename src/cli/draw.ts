/**
 * `refute draw G6 --out FILE.svg|FILE.png [--layout ...] [--colour ...] [--seed S]
 * [--file FILE [--conjecture NAME]]`: a drawing of one graph; with a conjecture file, the
 * caption adds its score.
 */
import { type Command } from 'commander';
import { InputError } from '../errors.js';
import { decodeGraph6 } from '../graph/graph6.js';
import { graphToSvg, type VertexColouring } from '../report/svg-graph.js';
import { type LayoutKind } from '../report/layout.js';
import { svgToPng } from '../report/png.js';
import { writeFileAtomically } from '../report/write-file-atomically.js';
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
}

function oneOf<T extends string>(option: string, value: string, allowed: ReadonlyArray<T>): T {
  if (!(allowed as ReadonlyArray<string>).includes(value)) {
    throw new InputError(`${option}: expected one of ${allowed.join(', ')} but found '${value}'`);
  }
  return value as T;
}

export function addDrawCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('draw')
    .description('draw a graph (graph6) as SVG, or PNG when --out ends in .png')
    .argument('<graph6>', 'the graph, in graph6')
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
      writeFileAtomically(opts.out, /\.png$/i.test(opts.out) ? await svgToPng(svg) : svg);
      outcome.status = 0;
    });
}
