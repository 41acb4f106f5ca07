/**
 * `npm run bench`: runs every tests/bench/*.bench.ts (each default-exports an async function
 * that prints its own figures), or only those whose file name contains an argument:
 * `npm run bench -- invariants`. Not part of `npm test`: timings are never asserted.
 */
import { readdirSync } from 'node:fs';
import { fileURLToPath, pathToFileURL } from 'node:url';
import { join } from 'node:path';

const dir = fileURLToPath(new URL('.', import.meta.url));
const filters = process.argv.slice(2);
const files = readdirSync(dir)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => filters.length === 0 || filters.some((x) => f.includes(x)))
  .sort();

for (const file of files) {
  console.log(`\n## ${file}`);
  const mod = (await import(pathToFileURL(join(dir, file)).href)) as { default: () => Promise<void> };
  await mod.default();
}
