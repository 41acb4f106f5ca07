/**
 * Writing results to stdout with back-pressure, so a long stream piped into `head` or a slow
 * consumer stays in constant memory. A consumer that stops reading (EPIPE) rejects the write;
 * main() then ends quietly with the status reached so far.
 */

/** Makes write errors (EPIPE) reach the write callbacks instead of crashing as an unhandled 'error' event. */
export function expectWriteErrorsInCallbacks(stream: NodeJS.WritableStream): void {
  if (stream.listenerCount('error') === 0) stream.on('error', () => undefined);
}

/** Writes text or bytes, resolving when the stream can take more, rejecting on a write error. */
export function writeOut(
  data: string | Uint8Array,
  stream: NodeJS.WritableStream = process.stdout,
): Promise<void> {
  expectWriteErrorsInCallbacks(stream);
  return new Promise((resolve, reject) => {
    const ok = stream.write(data, (err) => {
      if (err) reject(err);
    });
    if (ok) resolve();
    else stream.once('drain', () => resolve());
  });
}
