/**
 * The `--part i/k` option of generate and sweep: which of k shares of a stream to produce,
 * written 1-based on the command line (1/4 .. 4/4) and 0-based in the library.
 */
import { InputError } from '../errors.js';
import { type EnumerationPart } from './graph-enumerator.js';

/** Parses "i/k" (1 <= i <= k) into a 0-based part. */
export function parsePartSpec(text: string, option = '--part'): EnumerationPart {
  const match = /^\s*(\d+)\s*\/\s*(\d+)\s*$/.exec(text);
  if (match === null) {
    throw new InputError(`${option}: expected i/k with 1 <= i <= k (for example 2/4) but found '${text}'`);
  }
  const index = Number(match[1]);
  const count = Number(match[2]);
  if (count < 1 || index < 1 || index > count || !Number.isSafeInteger(count)) {
    throw new InputError(`${option}: expected i/k with 1 <= i <= k (for example 2/4) but found '${text}'`);
  }
  return { index: index - 1, count };
}

/** Formats a 0-based part as the command line writes it ("2/4"). */
export function formatPartSpec(part: EnumerationPart): string {
  return `${part.index + 1}/${part.count}`;
}
