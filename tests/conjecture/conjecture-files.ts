/**
 * Test helper: writes conjecture files into a fresh folder under the system's temporary
 * directory, outside the project, so that loading them exercises `import ... from 'refute'`
 * with no package installed next to the file.
 */
import { mkdirSync, mkdtempSync, writeFileSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';

export interface ScratchFolder {
  readonly dir: string;
  /** Writes `name` (relative to the folder) and returns its absolute path. */
  write(name: string, text: string): string;
  remove(): void;
}

export function scratchFolder(): ScratchFolder {
  const dir = mkdtempSync(path.join(tmpdir(), 'refute-conjecture-test-'));
  return {
    dir,
    write(name, text) {
      const file = path.join(dir, name);
      mkdirSync(path.dirname(file), { recursive: true });
      writeFileSync(file, text);
      return file;
    },
    remove() {
      rmSync(dir, { recursive: true, force: true });
    },
  };
}
