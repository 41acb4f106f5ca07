/**
 * Evaluating a conjecture on one graph: the domain first (`connected`, then `where`), then the
 * score. A score that throws, returns NaN or returns a non-number, and a `where` that throws or
 * returns a non-boolean, is a {@link ScoreEvaluationError} naming the conjecture and the graph
 * (graph6); ±Infinity are ordinary scores. A misspelt invariant is reported as such, with the
 * conjecture's name, whatever the graph.
 */
import { type Graph } from '../graph/graph.js';
import { encodeGraph6 } from '../graph/graph6.js';
import { InputError, InvariantDomainError } from '../errors.js';
import { ScoreEvaluationError, UnknownInvariantError } from './errors.js';
import { locateError } from './source-locations.js';
import { type Conjecture, type Evaluation, type GraphView } from './types.js';
import { createGraphView, createTracingGraphView } from './view.js';

const OUTSIDE: Evaluation = Object.freeze({ inDomain: false });

const DOMAIN_HINT =
  "restrict the conjecture's domain (connected: true, or where) to graphs where the score is defined";

/**
 * An evaluation together with the invariants read on the way: by `where` and `score`
 * ("complement.x" for the complement's), and isConnected when the conjecture asks for connected graphs.
 */
export type TracedEvaluation = Evaluation & { readonly used: readonly string[] };

function describeValue(x: unknown): string {
  if (typeof x === 'bigint') return `the bigint ${x}n (convert it with Number(...))`;
  if (typeof x === 'string') return `the string ${JSON.stringify(x)}`;
  if (x === undefined) return 'undefined (does the arrow function body lack a return?)';
  if (x === null) return 'null';
  if (typeof x === 'object' && typeof (x as { then?: unknown }).then === 'function') {
    return 'a Promise (score and where must be synchronous)';
  }
  return typeof x === 'object' ? 'an object' : `${typeof x} ${String(x)}`;
}

function failure(c: Conjecture, g: Graph, part: 'score' | 'where', err: unknown): InputError {
  const fn = part === 'score' ? c.score : (c.where as object);
  const at = locateError(fn, err);
  const atText = at === undefined ? '' : ` (at ${at})`;
  if (err instanceof UnknownInvariantError)
    return new InputError(`conjecture '${c.name}': ${part}${atText}: ${err.message}`);
  const what =
    err instanceof Error ? `${err.name === 'Error' ? '' : err.name + ': '}${err.message}` : String(err);
  const hint = err instanceof InvariantDomainError ? DOMAIN_HINT : undefined;
  return new ScoreEvaluationError(c.name, part, encodeGraph6(g), `threw ${what}${atText}`, hint);
}

/** Evaluates c on an existing view (of graph g). */
export function evaluateOnView(c: Conjecture, g: Graph, view: GraphView): Evaluation {
  if (c.connected) {
    // isConnected cannot throw: a registry invariant defined on every graph.
    if (!view.isConnected) return OUTSIDE;
  }
  if (c.where !== undefined) {
    let inside: unknown;
    try {
      inside = c.where(view);
    } catch (err) {
      throw failure(c, g, 'where', err);
    }
    if (inside === false) return OUTSIDE;
    if (inside !== true) {
      throw new ScoreEvaluationError(
        c.name,
        'where',
        encodeGraph6(g),
        `returned ${describeValue(inside)} instead of true or false`,
      );
    }
  }
  let score: unknown;
  try {
    score = c.score(view);
  } catch (err) {
    throw failure(c, g, 'score', err);
  }
  if (typeof score !== 'number') {
    throw new ScoreEvaluationError(
      c.name,
      'score',
      encodeGraph6(g),
      `returned ${describeValue(score)} instead of a number`,
    );
  }
  if (Number.isNaN(score)) {
    throw new ScoreEvaluationError(
      c.name,
      'score',
      encodeGraph6(g),
      'returned NaN',
      `NaN often comes from 0/0, Infinity - Infinity or 0 * Infinity; ${DOMAIN_HINT}`,
    );
  }
  return { inDomain: true, score };
}

/** Whether g is in c's domain and, if so, its score. */
export function evaluateConjecture(c: Conjecture, g: Graph): Evaluation {
  return evaluateOnView(c, g, createGraphView(g));
}

/** As {@link evaluateConjecture}, also listing the invariants that where and score read. */
export function evaluateWithTrace(c: Conjecture, g: Graph): TracedEvaluation {
  const { view, reads } = createTracingGraphView(g);
  const evaluation = evaluateOnView(c, g, view);
  return { ...evaluation, used: [...reads] };
}
