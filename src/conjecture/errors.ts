/**
 * Errors of conjecture files: loading and validating a file, and evaluating a conjecture on a
 * graph. All are {@link InputError}s (exit status 2) whose one-line message says what is wrong,
 * where (the file, the field, the conjecture, the graph in graph6) and, when it can, what to do.
 */
import { InputError } from '../errors.js';

/** A conjecture file that cannot be used: unreadable, a syntax error, a bad export or field. */
export class ConjectureFileError extends InputError {
  constructor(
    /** The file as shown to the user (relative to the working directory when inside it). */
    readonly file: string,
    readonly problem: string,
  ) {
    super(`${file}: ${problem}`);
    this.name = 'ConjectureFileError';
  }
}

/**
 * A field of a conjecture that does not have the required form, raised by defineConjecture
 * (the loader adds the file's name when it is raised while a file is loaded).
 */
export class ConjectureFieldError extends InputError {
  constructor(
    /** The conjecture's name when it is known, else a description such as "conjecture 2". */
    readonly conjecture: string,
    readonly field: string,
    readonly problem: string,
  ) {
    super(`${conjecture}: field '${field}': ${problem}`);
    this.name = 'ConjectureFieldError';
  }
}

/** A property of the graph view that is not a known invariant (`g.spectralRadious`). */
export class UnknownInvariantError extends InputError {
  constructor(
    readonly property: string,
    /** The closest known name, when one is plausibly meant. */
    readonly suggestion: string | undefined,
  ) {
    super(
      `g.${property} is not an invariant` +
        (suggestion === undefined ? '' : `; did you mean g.${suggestion}?`) +
        " (the known names: the GraphView type, or 'refute invariants' on any graph)",
    );
    this.name = 'UnknownInvariantError';
  }
}

/**
 * A conjecture's `where` or `score` failed on a graph: it threw, returned NaN, or returned
 * something that is not a number (or, for `where`, not a boolean). The message names the
 * conjecture and the graph in graph6 so that the user can reproduce it with `refute check`.
 */
export class ScoreEvaluationError extends InputError {
  constructor(
    readonly conjecture: string,
    /** Which function failed. */
    readonly part: 'score' | 'where',
    readonly graph6: string,
    readonly problem: string,
    /** What to do about it, when there is something to suggest. */
    hint?: string,
  ) {
    super(
      `conjecture '${conjecture}': ${part} ${problem} on graph '${graph6}' (graph6)${hint === undefined ? '' : `; ${hint}`}`,
    );
    this.name = 'ScoreEvaluationError';
  }
}
