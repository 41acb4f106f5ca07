/**
 * Errors that end a command with exit status 2: bad input of any kind (a malformed graph6
 * line, an unknown option value, a broken conjecture file). Their message is one line that
 * says what is wrong, where, and what to do; the CLI prints it prefixed with "refute: ".
 */
export class InputError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'InputError';
  }
}

/** An invariant asked of a graph outside its domain (a distance spectrum of a disconnected graph). */
export class InvariantDomainError extends InputError {
  constructor(
    readonly invariant: string,
    reason: string,
  ) {
    super(`${invariant} is not defined here: ${reason}`);
    this.name = 'InvariantDomainError';
  }
}
