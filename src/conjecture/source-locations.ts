/**
 * Where in its file a conjecture's code failed. The loader registers, for each loaded `score`
 * and `where` function, a locator that maps an error's stack back through the bundle's source
 * map to file:line:column; the evaluator asks it when such a function throws, so the message
 * points at the user's own line.
 */
type Locator = (err: unknown) => string | undefined;

const LOCATORS = new WeakMap<object, Locator>();

/** Records how to locate errors thrown by fn (called by the loader). */
export function registerLocator(fn: object, locate: Locator): void {
  LOCATORS.set(fn, locate);
}

/** file:line:column of the frame of err inside fn's file, when fn came from a loaded file. */
export function locateError(fn: object, err: unknown): string | undefined {
  return LOCATORS.get(fn)?.(err);
}
