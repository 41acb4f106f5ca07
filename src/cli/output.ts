/**
 * Writing results to stdout with back-pressure, so a long stream piped into `head` or a slow
 * consumer stays in constant memory.
 */
export function writeOut(text: string, stream: NodeJS.WritableStream = process.stdout): Promise<void> {
  return new Promise((resolve, reject) => {
    const ok = stream.write(text, (err) => {
      if (err) reject(err);
    });
    if (ok) resolve();
    else stream.once('drain', () => resolve());
  });
}
