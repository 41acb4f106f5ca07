/**
 * Loading a conjecture file (TypeScript or JavaScript, anywhere on disk) at run time.
 *
 * The file's bytes are read once, hashed (sha256, recorded by runs so a changed file is noticed)
 * and bundled from memory by esbuild into one CommonJS function, with `refute` left external;
 * that function is then run with a `require` that answers `refute` with the running tool's own
 * module (src/index.ts under the tests, dist/index.js when installed), so
 * `import { defineConjecture } from 'refute'` works wherever the file lives, with no install
 * next to it. Other imports (relative files, packages near the file) are bundled; Node built-ins
 * are required normally. No type-checking is done (that is the editor's job), so loading stays
 * fast: esbuild's transform takes milliseconds.
 *
 * Errors say where: a syntax error as file:line:column, an error thrown while the file runs
 * with the file's own line (mapped back through the bundle's source map), a bad export or
 * field with the conjecture and field named.
 */
import { readFile } from 'node:fs/promises';
import { createHash } from 'node:crypto';
import { createRequire, SourceMap } from 'node:module';
import path from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';
import vm from 'node:vm';
import type { Message } from 'esbuild';
import { ConjectureFieldError, ConjectureFileError } from './errors.js';
import { validateConjecture } from './define.js';
import { registerLocator } from './source-locations.js';
import { type Conjecture } from './types.js';
import { nearestName } from '../cli/nearest-name.js';
import { InputError } from '../errors.js';

/** A loaded conjecture file. */
export interface LoadedConjectureFile {
  /** Absolute path of the file. */
  readonly path: string;
  /** sha256 of the file's bytes, lower-case hex. */
  readonly sha256: string;
  /** Its conjectures, in export order (one, or the elements of an exported array). */
  readonly conjectures: readonly Conjecture[];
}

const LOADERS: Readonly<Record<string, 'ts' | 'js'>> = {
  '.ts': 'ts',
  '.mts': 'ts',
  '.cts': 'ts',
  '.js': 'js',
  '.mjs': 'js',
  '.cjs': 'js',
};

/** The path as the user will recognise it: relative to the working directory when inside it. */
export function displayPath(absolute: string): string {
  const rel = path.relative(process.cwd(), absolute);
  return rel !== '' && !rel.startsWith('..') && !path.isAbsolute(rel) ? rel : absolute;
}

function readProblem(err: unknown): string {
  const code = (err as { code?: string }).code;
  if (code === 'ENOENT') return 'cannot read the conjecture file: no such file (check the path)';
  if (code === 'EISDIR') return 'cannot read the conjecture file: it is a directory (give a .ts file)';
  if (code === 'EACCES') return 'cannot read the conjecture file: permission denied';
  return `cannot read the conjecture file: ${(err as Error).message}`;
}

/** file:line:column of an esbuild message (column 1-based), relative to the file's folder. */
function esbuildLocation(m: Message, dir: string, shownMain: string, mainPath: string): string {
  if (m.location === null) return shownMain;
  const file = path.resolve(dir, m.location.file);
  const shown = file === mainPath ? shownMain : displayPath(file);
  return `${shown}:${m.location.line}:${m.location.column + 1}`;
}

interface Bundle {
  code: string;
  map: SourceMap | undefined;
}

async function bundle(source: string, absolute: string, shown: string): Promise<Bundle> {
  const loader = LOADERS[path.extname(absolute).toLowerCase()];
  if (loader === undefined) {
    throw new ConjectureFileError(shown, 'a conjecture file must end in .ts (or .mts, .js, .mjs)');
  }
  const dir = path.dirname(absolute);
  // Imported here, not at the top: esbuild's module costs ~0.1 s, which commands that load no
  // conjecture file (invariants, draw, --help) should not pay.
  const { build } = await import('esbuild');
  try {
    const result = await build({
      stdin: { contents: source, loader, resolveDir: dir, sourcefile: absolute },
      absWorkingDir: dir,
      bundle: true,
      platform: 'node',
      format: 'cjs',
      target: 'node20',
      external: ['refute'],
      write: false,
      sourcemap: 'external',
      outfile: path.join(dir, '__refute_bundle.js'),
      define: { 'import.meta.url': JSON.stringify(pathToFileURL(absolute).href) },
      logLevel: 'silent',
    });
    let code = '';
    let map: SourceMap | undefined;
    for (const out of result.outputFiles) {
      if (out.path.endsWith('.map')) map = new SourceMap(JSON.parse(out.text));
      else code = out.text;
    }
    return { code, map };
  } catch (err) {
    const errors = (err as { errors?: Message[] }).errors;
    if (errors === undefined || errors.length === 0) throw err;
    const first = errors[0];
    const more =
      errors.length > 1 ? ` (and ${errors.length - 1} more error${errors.length > 2 ? 's' : ''})` : '';
    const where = esbuildLocation(first, dir, shown, absolute);
    if (first.text.startsWith('Top-level await')) {
      throw new InputError(
        `${where}: top-level await is not supported in a conjecture file (compute the value without await)`,
      );
    }
    const kind = first.text.startsWith('Could not resolve') ? 'cannot import' : 'syntax error';
    throw new InputError(`${where}: ${kind}: ${first.text}${more}`);
  }
}

/**
 * file:line:column in the original sources of the first stack frame of err inside the bundle,
 * through the bundle's source map (whose sources are relative to the file's folder).
 */
function originalLocation(
  err: unknown,
  bundleName: string,
  b: Bundle,
  absolute: string,
  shown: string,
): string | undefined {
  if (b.map === undefined || !(err instanceof Error) || typeof err.stack !== 'string') return undefined;
  for (const line of err.stack.split('\n')) {
    const at = line.indexOf(bundleName + ':');
    if (at < 0) continue;
    const m = /^:(\d+):(\d+)/.exec(line.slice(at + bundleName.length));
    if (m === null) continue;
    const entry = b.map.findEntry(Number(m[1]) - 1, Number(m[2]) - 1) as {
      originalSource?: string;
      originalLine?: number;
      originalColumn?: number;
    };
    if (
      entry.originalSource === undefined ||
      entry.originalLine === undefined ||
      entry.originalColumn === undefined
    )
      continue;
    const source = entry.originalSource.startsWith('file:')
      ? fileURLToPath(entry.originalSource)
      : path.resolve(path.dirname(absolute), entry.originalSource);
    return `${source === absolute ? shown : displayPath(source)}:${entry.originalLine + 1}:${entry.originalColumn + 1}`;
  }
  return undefined;
}

/** Runs the bundle with `refute` mapped to the running tool; returns module.exports. */
async function run(
  b: Bundle,
  absolute: string,
  shown: string,
  bundleName: string,
): Promise<Record<string, unknown>> {
  const tool = (await import('../index.js')) as Record<string, unknown>;
  const nodeRequire = createRequire(absolute);
  const requireForFile = (id: string): unknown => (id === 'refute' ? tool : nodeRequire(id));
  const module = { exports: {} as Record<string, unknown> };
  try {
    const wrapper = vm.runInThisContext(
      `(function (module, exports, require, __filename, __dirname) {${b.code}\n})`,
      { filename: bundleName },
    ) as (m: object, e: object, r: (id: string) => unknown, f: string, d: string) => void;
    wrapper(module, module.exports, requireForFile, absolute, path.dirname(absolute));
  } catch (err) {
    if (err instanceof ConjectureFieldError) throw new ConjectureFileError(shown, err.message);
    const where = originalLocation(err, bundleName, b, absolute, shown) ?? shown;
    const what = err instanceof Error ? `${err.name}: ${err.message}` : String(err);
    throw new InputError(`${where}: error while loading the conjecture file: ${what}`);
  }
  return module.exports;
}

/** The conjectures a file's default export holds. */
function conjecturesOf(exports: Record<string, unknown>, shown: string): Conjecture[] {
  if (!('default' in exports) || exports.default === undefined) {
    const named = Object.keys(exports).filter((k) => k !== 'default' && k !== '__esModule');
    const hint = named.length > 0 ? ` (it exports ${named.map((k) => `'${k}'`).join(', ')} by name)` : '';
    throw new ConjectureFileError(
      shown,
      `no default export${hint}; write 'export default defineConjecture({ ... })'`,
    );
  }
  const value = exports.default;
  const list = Array.isArray(value) ? value : [value];
  if (list.length === 0)
    throw new ConjectureFileError(
      shown,
      'the default export is an empty array; export at least one conjecture',
    );
  const conjectures: Conjecture[] = [];
  const seen = new Set<string>();
  list.forEach((spec, i) => {
    let c: Conjecture;
    try {
      c = validateConjecture(
        spec,
        Array.isArray(value) ? `conjecture ${i + 1} of the exported array` : 'the default export',
      );
    } catch (err) {
      if (err instanceof ConjectureFieldError) throw new ConjectureFileError(shown, err.message);
      throw err;
    }
    if (seen.has(c.name))
      throw new ConjectureFileError(shown, `two conjectures are named '${c.name}'; names must be distinct`);
    seen.add(c.name);
    conjectures.push(c);
  });
  return conjectures;
}

/** Reads, bundles and runs a conjecture file; see the module comment. */
export async function loadConjectureFile(file: string): Promise<LoadedConjectureFile> {
  const absolute = path.resolve(file);
  const shown = displayPath(absolute);
  let bytes: Buffer;
  try {
    bytes = await readFile(absolute);
  } catch (err) {
    throw new ConjectureFileError(shown, readProblem(err));
  }
  const sha256 = createHash('sha256').update(bytes).digest('hex');
  const b = await bundle(bytes.toString('utf8'), absolute, shown);
  const bundleName = `${absolute} (bundled)`;
  const exports = await run(b, absolute, shown, bundleName);
  const conjectures = conjecturesOf(exports, shown);
  const locate = (err: unknown): string | undefined => originalLocation(err, bundleName, b, absolute, shown);
  for (const c of conjectures) {
    registerLocator(c.score, locate);
    if (c.where !== undefined) registerLocator(c.where, locate);
  }
  return Object.freeze({ path: absolute, sha256, conjectures: Object.freeze(conjectures) });
}

/**
 * The conjecture called `name`, or the file's only conjecture when no name is given. An unknown
 * name, or no name for a file with several, is an error listing the names.
 */
export function selectConjecture(file: LoadedConjectureFile, name?: string): Conjecture {
  const names = file.conjectures.map((c) => c.name);
  const shown = displayPath(file.path);
  if (name === undefined) {
    if (file.conjectures.length === 1) return file.conjectures[0];
    throw new ConjectureFileError(
      shown,
      `exports ${names.length} conjectures (${names.join(', ')}); choose one with --conjecture NAME`,
    );
  }
  const found = file.conjectures.find((c) => c.name === name);
  if (found !== undefined) return found;
  const hint = nearestName(name, names);
  throw new ConjectureFileError(
    shown,
    `has no conjecture '${name}'${hint ? `; did you mean '${hint}'?` : ''} (it has: ${names.join(', ')})`,
  );
}
