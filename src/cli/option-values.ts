/**
 * Parsing numeric command-line values with errors that say which option, what was expected and
 * what was found (exit status 2 through InputError).
 */
import { InputError } from '../errors.js';

export function integerOption(
  name: string,
  text: string | undefined,
  min: number,
  max: number,
): number | undefined {
  if (text === undefined) return undefined;
  const x = Number(text);
  if (!/^\s*-?\d+\s*$/.test(text) || !Number.isSafeInteger(x) || x < min || x > max) {
    throw new InputError(`${name}: expected an integer in ${min}..${max} but found '${text}'`);
  }
  return x;
}

export function numberOption(
  name: string,
  text: string | undefined,
  min: number,
  max: number,
  openMin = false,
): number | undefined {
  if (text === undefined) return undefined;
  const x = Number(text);
  if (text.trim() === '' || !Number.isFinite(x) || x < min || x > max || (openMin && x === min)) {
    throw new InputError(
      `${name}: expected a number in ${openMin ? '(' : '['}${min}, ${max}] but found '${text}'`,
    );
  }
  return x;
}

/** A comma-separated list of positive integers, e.g. "128,64,4". */
export function layersOption(name: string, text: string | undefined): number[] | undefined {
  if (text === undefined) return undefined;
  const parts = text.split(',').map((s) => s.trim());
  const out = parts.map((p) => Number(p));
  if (parts.length === 0 || parts.some((p) => !/^\d+$/.test(p)) || out.some((x) => x < 1 || x > 4096)) {
    throw new InputError(
      `${name}: expected comma-separated layer widths in 1..4096 such as 128,64,4 but found '${text}'`,
    );
  }
  return out;
}
