/**
 * Durable file writes for the run directory: a file is replaced by writing a temporary file
 * beside it, fsyncing it, renaming it over the old one and fsyncing the folder (the usual
 * POSIX recipe: rename is atomic within a file system), so a reader or a crash sees either the
 * old content or the new, never a mix. Appends are fsynced before returning.
 */
import { closeSync, fsyncSync, openSync, renameSync, rmSync, writeSync } from 'node:fs';
import { dirname } from 'node:path';
import { InputError } from '../errors.js';

/**
 * Runs a file operation, turning a system error (full disk, no permission, folder gone) into a
 * one-line InputError that names the file; earlier files are left as they were.
 */
function guarded<T>(path: string, what: string, op: () => T): T {
  try {
    return op();
  } catch (err) {
    const code = (err as NodeJS.ErrnoException).code;
    if (code === undefined) throw err;
    const hint =
      code === 'ENOSPC'
        ? 'the disk is full'
        : code === 'EACCES' || code === 'EPERM'
          ? 'permission denied'
          : code;
    throw new InputError(`${path}: cannot ${what} (${hint}); earlier results in the folder are intact`);
  }
}

/** fsync a folder so that a rename inside it is durable. */
export function fsyncFolder(path: string): void {
  guarded(path, 'sync the folder', () => {
    const fd = openSync(path, 'r');
    try {
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
  });
}

/** Writes data to path, creating or truncating it, and fsyncs it. */
export function writeDurably(path: string, data: string | Uint8Array): void {
  guarded(path, 'write', () => {
    const fd = openSync(path, 'w');
    try {
      if (typeof data === 'string') writeSync(fd, data);
      else writeSync(fd, data);
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
  });
}

/** Replaces path's content atomically. */
export function replaceAtomically(path: string, data: string | Uint8Array): void {
  const temporary = `${path}.tmp`;
  try {
    writeDurably(temporary, data);
    guarded(path, 'replace', () => renameSync(temporary, path));
  } catch (err) {
    // A half-written temporary file (full disk) must not be left behind.
    rmSync(temporary, { force: true });
    throw err;
  }
  fsyncFolder(dirname(path));
}

/** Appends text to path (creating it) and fsyncs it. */
export function appendDurably(path: string, text: string): void {
  guarded(path, 'append to', () => {
    const fd = openSync(path, 'a');
    try {
      writeSync(fd, text);
      fsyncSync(fd);
    } finally {
      closeSync(fd);
    }
  });
}
