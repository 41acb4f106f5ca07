import { afterAll, describe, expect, it } from 'vitest';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { loadConjectureFile, selectConjecture } from '../../src/conjecture/load.js';
import { evaluateConjecture } from '../../src/conjecture/evaluate.js';
import { defineConjecture } from '../../src/conjecture/define.js';
import { ConjectureFileError } from '../../src/conjecture/errors.js';
import { InputError } from '../../src/errors.js';
import { path as pathGraph, star } from '../../src/graph/families.js';
import { scratchFolder } from './conjecture-files.js';

const scratch = scratchFolder();
afterAll(() => scratch.remove());

async function loadError(file: string): Promise<Error> {
  try {
    await loadConjectureFile(file);
  } catch (err) {
    return err as Error;
  }
  throw new Error(`expected loading ${file} to fail`);
}

const GOOD = `import { defineConjecture, families } from 'refute';
import type { GraphView } from 'refute';
import { excess } from './helpers/excess';
import { basename } from 'node:path';

(globalThis as Record<string, unknown>).__refuteProbe = { defineConjecture, families, file: basename(__filename), url: import.meta.url };

export default defineConjecture({
  name: 'max-degree-bound',
  statement: 'For every graph, maxDegree <= 2',
  vertices: 8,
  score: (g: GraphView) => excess(g.maxDegree, 2),
});
`;

describe('loadConjectureFile()', () => {
  it('loads a TypeScript file outside the project whose imports from refute resolve to the running tool', async () => {
    scratch.write(
      'helpers/excess.ts',
      'export const excess = (x: number, bound: number): number => x - bound;\n',
    );
    const file = scratch.write('good.ts', GOOD);
    const loaded = await loadConjectureFile(file);
    expect(path.isAbsolute(loaded.path)).toBe(true);
    expect(loaded.path).toBe(file);
    expect(loaded.sha256).toBe(createHash('sha256').update(readFileSync(file)).digest('hex'));
    expect(loaded.conjectures.map((c) => c.name)).toEqual(['max-degree-bound']);
    const probe = (globalThis as Record<string, unknown>).__refuteProbe as Record<string, unknown>;
    // The very functions of this running tool (src/index.ts under the tests), not a copy.
    expect(probe.defineConjecture).toBe(defineConjecture);
    expect(probe.families).toEqual(await import('../../src/graph/families.js'));
    expect(probe.file).toBe('good.ts');
    expect(probe.url).toBe(`file://${file}`);
    // K_{1,4} has maximum degree 4: score 4 - 2.
    expect(evaluateConjecture(loaded.conjectures[0], star(5))).toEqual({ inDomain: true, score: 2 });
  });

  it('loads an exported array, in order', async () => {
    const file = scratch.write(
      'two.ts',
      `import { defineConjecture } from 'refute';
export default [
  defineConjecture({ name: 'first', statement: 'a', vertices: 5, score: (g) => g.size - 10 }),
  defineConjecture({ name: 'second', statement: 'b', vertices: 6, connected: true, score: (g) => -g.order }),
];
`,
    );
    const loaded = await loadConjectureFile(file);
    expect(loaded.conjectures.map((c) => [c.name, c.vertices, c.connected])).toEqual([
      ['first', 5, false],
      ['second', 6, true],
    ]);
    expect(selectConjecture(loaded, 'second').name).toBe('second');
    expect(() => selectConjecture(loaded)).toThrow(
      'exports 2 conjectures (first, second); choose one with --conjecture NAME',
    );
    expect(() => selectConjecture(loaded, 'secnd')).toThrow(
      "has no conjecture 'secnd'; did you mean 'second'? (it has: first, second)",
    );
  });

  it('reports a syntax error as file:line:column', async () => {
    const text =
      "import { defineConjecture } from 'refute';\nexport default defineConjecture({\n  name: 'x',\n  score: (g) => g.maxDegree -* 2,\n});\n";
    const file = scratch.write('syntax.ts', text);
    const line4 = text.split('\n')[3];
    const column = line4.indexOf('*') + 1; // 1-based column of the unexpected token
    const err = await loadError(file);
    expect(err).toBeInstanceOf(InputError);
    expect(err.message).toBe(`${file}:4:${column}: syntax error: Unexpected "*"`);
  });

  it('reports top-level await, which conjecture files cannot use, at its position', async () => {
    const line2 = 'const k = await Promise.resolve(2);';
    const file = scratch.write(
      'await.ts',
      `import { defineConjecture } from 'refute';\n${line2}\nexport default defineConjecture({ name: 'a', statement: 's', vertices: 3, score: (g) => g.n - k });\n`,
    );
    expect((await loadError(file)).message).toBe(
      `${file}:2:${line2.indexOf('await') + 1}: top-level await is not supported in a conjecture file (compute the value without await)`,
    );
  });

  it('reports an import that cannot be resolved, with its position', async () => {
    const file = scratch.write(
      'missing-import.ts',
      "import { nothing } from './nowhere';\nexport default nothing;\n",
    );
    const err = await loadError(file);
    expect(err.message).toMatch(
      new RegExp(
        `^${file.replace(/[.*+?^${}()|[\]\\/]/g, '\\$&')}:1:\\d+: cannot import: Could not resolve "./nowhere"`,
      ),
    );
  });

  it('reports a missing default export, naming what the file does export', async () => {
    const file = scratch.write(
      'named.ts',
      "import { defineConjecture } from 'refute';\nexport const c = defineConjecture({ name: 'a', statement: 's', vertices: 3, score: () => 0 });\n",
    );
    const err = await loadError(file);
    expect(err).toBeInstanceOf(ConjectureFileError);
    expect(err.message).toBe(
      `${file}: no default export (it exports 'c' by name); write 'export default defineConjecture({ ... })'`,
    );
  });

  it('reports an invalid field with the file, the conjecture and the field', async () => {
    const file = scratch.write(
      'field.ts',
      "import { defineConjecture } from 'refute';\nexport default defineConjecture({ name: 'a', statement: 's', vertices: 2.5, score: () => 0 });\n",
    );
    const err = await loadError(file);
    expect(err).toBeInstanceOf(ConjectureFileError);
    expect(err.message).toBe(
      `${file}: conjecture 'a': field 'vertices': expected an integer in 1..1024 (the default order for hunt) but found 2.5`,
    );
  });

  it('validates a plain object exported without defineConjecture, and array members by position', async () => {
    const plain = scratch.write('plain.ts', "export default { name: 'a', statement: 's', vertices: 3 };\n");
    expect((await loadError(plain)).message).toBe(
      `${plain}: conjecture 'a': field 'score': expected a function (g) => number but found undefined`,
    );
    const arr = scratch.write(
      'array.ts',
      "export default [{ name: 'a', statement: 's', vertices: 3, score: () => 0 }, 7];\n",
    );
    expect((await loadError(arr)).message).toContain(
      `${arr}: conjecture 2 of the exported array: field '(all)': expected an object`,
    );
    const empty = scratch.write('empty.ts', 'export default [];\n');
    expect((await loadError(empty)).message).toContain('the default export is an empty array');
    const twice = scratch.write(
      'twice.ts',
      "const c = { name: 'a', statement: 's', vertices: 3, score: () => 0 };\nexport default [c, c];\n",
    );
    expect((await loadError(twice)).message).toContain("two conjectures are named 'a'");
  });

  it('reports an error thrown while the file runs at the line of the file that threw', async () => {
    const file = scratch.write(
      'throws.ts',
      "import { defineConjecture } from 'refute';\nconst limit: number = 3;\nif (limit > 2) throw new Error('limit too high');\nexport default defineConjecture({ name: 'a', statement: 's', vertices: 3, score: () => 0 });\n",
    );
    const err = await loadError(file);
    expect(err.message).toBe(`${file}:3:22: error while loading the conjecture file: Error: limit too high`);
  });

  it('reports a file that cannot be read or is not TypeScript', async () => {
    const missing = path.join(scratch.dir, 'absent.ts');
    expect((await loadError(missing)).message).toBe(
      `${missing}: cannot read the conjecture file: no such file (check the path)`,
    );
    expect((await loadError(scratch.dir)).message).toContain('it is a directory');
    const text = scratch.write('notes.txt', 'hello');
    expect((await loadError(text)).message).toContain('a conjecture file must end in .ts');
  });

  it('makes a misspelt invariant an error naming the closest one and the line', async () => {
    const text =
      "import { defineConjecture } from 'refute';\nexport default defineConjecture({\n  name: 'typo',\n  statement: 's',\n  vertices: 3,\n  score: (g) => (g as any).maxDegre - 1,\n});\n";
    const file = scratch.write('typo.ts', text);
    const column = text.split('\n')[5].indexOf('maxDegre') + 1; // the property read, 1-based
    const loaded = await loadConjectureFile(file);
    let message = '';
    try {
      evaluateConjecture(loaded.conjectures[0], pathGraph(3));
    } catch (err) {
      message = (err as Error).message;
    }
    expect(message).toContain(
      `conjecture 'typo': score (at ${file}:6:${column}): g.maxDegre is not an invariant; did you mean g.maxDegree?`,
    );
  });

  it('makes a NaN score an error naming the conjecture and the graph', async () => {
    const file = scratch.write(
      'nan.ts',
      "import { defineConjecture } from 'refute';\nexport default defineConjecture({ name: 'ratio', statement: 's', vertices: 3, score: (g) => g.size / (g.order - 3) - 0 / 0 });\n",
    );
    const loaded = await loadConjectureFile(file);
    // graph6 of P3: 'Bg' (see evaluate.test.ts).
    expect(() => evaluateConjecture(loaded.conjectures[0], pathGraph(3))).toThrow(
      /^conjecture 'ratio': score returned NaN on graph 'Bg' \(graph6\); /,
    );
  });
});
