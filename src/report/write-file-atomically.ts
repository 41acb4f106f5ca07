/**
 * Writes a file so that it is either absent-or-old or complete: the bytes go to a temporary file
 * in the same folder, are fsynced, then renamed over the target (rename is atomic on POSIX file
 * systems). A failure (full disk, unwritable folder) becomes a one-line InputError and leaves any
 * earlier file in place.
 */
import { closeSync, fsyncSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
import { basename, dirname, join } from 'node:path';
import { InputError } from '../errors.js';

export function writeFileAtomically(path: string, data: string | Uint8Array): void {
  const temporary = join(dirname(path), `.${basename(path)}.${process.pid}.tmp`);
  try {
    const fd = openSync(temporary, 'w');
    try {
      writeSync(fd, typeof data === 'string' ? Buffer.from(data, 'utf8') : data);
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
    renameSync(temporary, path);
  } catch (err) {
    rmSync(temporary, { force: true });
    const code = (err as NodeJS.ErrnoException).code ?? 'error';
    throw new InputError(
      `cannot write ${path} (${code}): check that the folder exists, is writable and has space`,
    );
  }
}
