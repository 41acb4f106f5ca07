/**
 * `refute generate --vertices N [--connected] [--part i/k]`: every graph on N vertices, one per
 * isomorphism class, as a graph6 stream on stdout in a fixed order and constant memory.
 */
import { type Command } from 'commander';
import { InputError } from '../errors.js';
import { GraphEnumerator, MAX_ENUMERATION_ORDER } from '../enumerate/graph-enumerator.js';
import { graph6LineLength, writeGraph6Line } from '../enumerate/graph6-bytes.js';
import { parsePartSpec } from '../enumerate/part-spec.js';
import { type CommandOutcome } from './main.js';
import { writeOut } from './output.js';

interface GenerateOptions {
  vertices?: string;
  connected?: boolean;
  part?: string;
}

/** Bytes gathered before each write to stdout. */
const CHUNK_BYTES = 1 << 16;

/** Parses an order option: an integer in 1..max. */
export function parseOrderOption(
  text: string | undefined,
  option: string,
  max = MAX_ENUMERATION_ORDER,
): number {
  if (text === undefined) throw new InputError(`${option} is required (for example ${option} 7)`);
  const n = /^\s*\d+\s*$/.test(text) ? Number(text) : NaN;
  if (!Number.isInteger(n) || n < 1 || n > max) {
    throw new InputError(`${option}: expected an integer in 1..${max} but found '${text}'`);
  }
  return n;
}

export function addGenerateCommand(program: Command, outcome: CommandOutcome): void {
  program
    .command('generate')
    .description('print every graph on N vertices, one per isomorphism class, as graph6 lines')
    .option('--vertices <N>', `number of vertices, 1..${MAX_ENUMERATION_ORDER}`)
    .option('--connected', 'only connected graphs')
    .option('--part <i/k>', 'only part i of k (1 <= i <= k): the k parts together give every graph once')
    .action(async (opts: GenerateOptions) => {
      const order = parseOrderOption(opts.vertices, '--vertices');
      const part = opts.part === undefined ? undefined : parsePartSpec(opts.part);
      const enumerator = new GraphEnumerator(order, { connected: opts.connected === true, part });
      const lineLength = graph6LineLength(order);
      let buffer = new Uint8Array(CHUNK_BYTES + lineLength);
      let used = 0;
      while (enumerator.next()) {
        used = writeGraph6Line(order, enumerator.rows, buffer, used);
        if (used >= CHUNK_BYTES) {
          await writeOut(buffer.subarray(0, used));
          // The stream may still hold the written chunk: fill a fresh buffer.
          buffer = new Uint8Array(CHUNK_BYTES + lineLength);
          used = 0;
        }
      }
      if (used > 0) await writeOut(buffer.subarray(0, used));
      outcome.status = 0;
    });
}
