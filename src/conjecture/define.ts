/**
 * defineConjecture: the one function a conjecture file calls. It checks every field and returns
 * a frozen {@link Conjecture}; a field of the wrong form is a {@link ConjectureFieldError} that
 * names the conjecture, the field, what was expected and what was found.
 *
 * @example
 * ```ts
 * import { defineConjecture } from 'refute';
 * export default defineConjecture({
 *   name: 'degree-spread-bound',
 *   statement: 'For connected G: maxDegree <= 2 spectralRadius',
 *   vertices: 16,
 *   connected: true,
 *   score: (g) => g.maxDegree - 2 * g.spectralRadius,
 * });
 * ```
 */
import { nearestName } from '../cli/nearest-name.js';
import { ConjectureFieldError } from './errors.js';
import { type Conjecture, type ConjectureSpec } from './types.js';

/** Largest `vertices` accepted: a bound against typos, well above what a search can reach. */
export const MAX_CONJECTURE_VERTICES = 1024;

const NAME_PATTERN = /^[a-z0-9-]{1,64}$/;
const FIELDS = ['name', 'statement', 'vertices', 'connected', 'where', 'score'] as const;

function describe(x: unknown): string {
  if (x === null) return 'null';
  if (typeof x === 'string') return JSON.stringify(x.length > 40 ? x.slice(0, 40) + '...' : x);
  if (typeof x === 'number' || typeof x === 'boolean') return String(x);
  if (typeof x === 'bigint') return `${x}n`;
  if (typeof x === 'function') return 'a function';
  if (Array.isArray(x)) return 'an array';
  return typeof x === 'object' ? 'an object' : typeof x;
}

/**
 * Checks a value claimed to be a conjecture spec and returns the frozen conjecture. `label`
 * names it in messages until its own name is known ("conjecture 2 of the array").
 */
export function validateConjecture(spec: unknown, label = 'conjecture'): Conjecture {
  if (typeof spec !== 'object' || spec === null || Array.isArray(spec)) {
    throw new ConjectureFieldError(
      label,
      '(all)',
      `expected an object { name, statement, vertices, score, ... } but found ${describe(spec)}`,
    );
  }
  const s = spec as Record<string, unknown>;
  const name = s.name;
  if (typeof name !== 'string' || !NAME_PATTERN.test(name)) {
    throw new ConjectureFieldError(
      label,
      'name',
      `expected 1 to 64 characters from a-z, 0-9 and '-' (e.g. 'degree-spread-bound') but found ${describe(name)}`,
    );
  }
  const who = `conjecture '${name}'`;
  for (const key of Object.keys(s)) {
    if (!(FIELDS as readonly string[]).includes(key)) {
      const hint = nearestName(key, FIELDS);
      throw new ConjectureFieldError(
        who,
        key,
        `unknown field${hint ? `; did you mean '${hint}'?` : ''} (fields: ${FIELDS.join(', ')})`,
      );
    }
  }
  if (typeof s.statement !== 'string' || s.statement.trim() === '') {
    throw new ConjectureFieldError(
      who,
      'statement',
      `expected a non-empty string (the claim in words) but found ${describe(s.statement)}`,
    );
  }
  const vertices = s.vertices;
  if (
    typeof vertices !== 'number' ||
    !Number.isInteger(vertices) ||
    vertices < 1 ||
    vertices > MAX_CONJECTURE_VERTICES
  ) {
    throw new ConjectureFieldError(
      who,
      'vertices',
      `expected an integer in 1..${MAX_CONJECTURE_VERTICES} (the default order for hunt) but found ${describe(vertices)}`,
    );
  }
  if (s.connected !== undefined && typeof s.connected !== 'boolean') {
    throw new ConjectureFieldError(
      who,
      'connected',
      `expected true or false but found ${describe(s.connected)}`,
    );
  }
  if (s.where !== undefined && typeof s.where !== 'function') {
    throw new ConjectureFieldError(
      who,
      'where',
      `expected a function (g) => boolean but found ${describe(s.where)}`,
    );
  }
  if (typeof s.score !== 'function') {
    throw new ConjectureFieldError(
      who,
      'score',
      `expected a function (g) => number but found ${describe(s.score)}`,
    );
  }
  const conjecture: Conjecture = {
    name,
    statement: s.statement,
    vertices,
    connected: s.connected === true,
    ...(s.where === undefined ? {} : { where: s.where as Conjecture['where'] }),
    score: s.score as Conjecture['score'],
  };
  return Object.freeze(conjecture);
}

/** Validates a conjecture written in a conjecture file (see the module comment). */
export function defineConjecture(spec: ConjectureSpec): Conjecture {
  return validateConjecture(spec);
}
