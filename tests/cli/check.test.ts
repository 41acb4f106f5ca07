/**
 * `refute check` end to end: the compiled CLI in a child process (tests/support/run-cli.ts), one
 * run per exit status and per input mode.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import path from 'node:path';
import { scratchFolder } from '../conjecture/conjecture-files.js';
import { runCli, type CliResult } from '../support/run-cli.js';

const root = path.resolve(import.meta.dirname, '../..');
const scratch = scratchFolder();
afterAll(() => scratch.remove());

function refute(args: string[], stdin?: string): Promise<CliResult> {
  return runCli(args, { cwd: root, stdin });
}

// Every graph on 6 vertices: the atlas lines whose first byte is N(6) = 6 + 63 = 'E'; networkx's
// connectedness and maximum degree of each (tests/scripts/make_score_references.py).
const atlas = readFileSync(path.join(root, 'tests/fixtures/atlas-1-7.g6'), 'utf8').trim().split('\n');
const reference = JSON.parse(
  readFileSync(path.join(root, 'tests/fixtures/score-references.json'), 'utf8'),
) as {
  atlasScores: Array<unknown[] | null>;
  atlasMaxDegrees: number[];
};
const sixVertexGraphs = atlas.filter((line) => line.startsWith('E'));
const disconnectedSix = atlas.filter((line, i) => line.startsWith('E') && reference.atlasScores[i] === null);
const dominatedSix = atlas.filter((line, i) => line.startsWith('E') && reference.atlasMaxDegrees[i] === 5);

const TWO_CLAIMS = scratch.write(
  'two-claims.ts',
  `import { defineConjecture } from 'refute';
export default [
  defineConjecture({ name: 'always-connected', statement: 'Every graph is connected', vertices: 6, score: (g) => (g.isConnected ? -1 : 1) }),
  defineConjecture({ name: 'no-dominating-vertex', statement: 'maxDegree <= n - 2', vertices: 6, score: (g) => g.maxDegree - (g.n - 2) }),
];
`,
);

describe('refute check', () => {
  it('streams every graph on 6 vertices and finds exactly the known counterexamples (exit 0)', async () => {
    // A000088(6) = 156 graphs on 6 vertices (OEIS), of which A001349(6) = 112 are connected:
    // 44 refute "always connected". A graph on n vertices with a vertex of degree n-1 is the
    // cone over any graph on n-1 vertices, one per isomorphism class: A000088(5) = 34 refute
    // "no dominating vertex".
    expect(sixVertexGraphs.length).toBe(156);
    const r = await refute(['check', TWO_CLAIMS, '--stdin', '--json'], sixVertexGraphs.join('\n') + '\n');
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    const records = r.stdout
      .trim()
      .split('\n')
      .map(
        (line) =>
          JSON.parse(line) as {
            conjecture: string;
            graph6: string;
            verdict: string;
            certification: string | null;
            source: string;
          },
      );
    expect(records.length).toBe(2 * 156);
    const refuting = (name: string) =>
      records.filter((x) => x.conjecture === name && x.verdict === 'refutes');
    expect(refuting('always-connected').length).toBe(44);
    expect(refuting('no-dominating-vertex').length).toBe(34);
    // And exactly the graphs networkx finds disconnected / with a vertex of degree 5.
    expect(refuting('always-connected').map((x) => x.graph6)).toEqual(disconnectedSix);
    expect(refuting('no-dominating-vertex').map((x) => x.graph6)).toEqual(dominatedSix);
    expect(new Set(refuting('always-connected').map((x) => x.certification))).toEqual(new Set(['certified']));
    expect(records[0].source).toBe('stdin line 1');
  });

  it('prints a line per graph and a summary, and checks one conjecture of a file with --conjecture', async () => {
    // C5 ('Dhc') is connected with maximum degree 2; the empty graph on 3 vertices ('B?') is not connected.
    const r = await refute(['check', TWO_CLAIMS, 'Dhc', 'B?', '--conjecture', 'always-connected']);
    expect(r.status).toBe(0);
    const lines = r.stdout.trim().split('\n');
    expect(lines[0]).toBe('always-connected: Every graph is connected');
    expect(lines[1]).toMatch(/^Dhc\s+-1\s+holds\s+argument 1$/);
    expect(lines[2]).toMatch(/^B\?\s+1\s+refutes \(certified\)\s+argument 2$/);
    expect(lines[3]).toBe(
      'always-connected: 2 graphs: 1 refutes it (certified), 1 hold, 0 tight, 0 outside the domain; first counterexample B? (argument 2)',
    );
  });

  it('--families refutes the first example at once (exit 0) and finds nothing against the true theorem (exit 1)', async () => {
    const refuted = await refute(['check', 'scores/spectral-radius-near-average-degree.ts', '--families']);
    expect(refuted.status).toBe(0);
    expect(refuted.stdout).toMatch(/first counterexample \S+ \(\w+\(9(,\d+)?\)\)\n$/);
    const theorem = await refute([
      'check',
      'scores/hong-spectral-radius-bound.ts',
      '--families',
      '--max-vertices',
      '16',
      '--json',
    ]);
    expect(theorem.stderr).toBe('');
    expect(theorem.status).toBe(1);
    const verdicts = theorem.stdout
      .trim()
      .split('\n')
      .map((line) => (JSON.parse(line) as { verdict: string }).verdict);
    expect(verdicts).not.toContain('refutes');
    expect(verdicts).toContain('tight');
  });

  it('--families finds nothing against the quick hunt demo (exit 1); its known counterexample refutes it (exit 0)', async () => {
    const file = 'scores/second-eigenvalue-vs-complement-degree.ts';
    const families = await refute(['check', file, '--families', '--max-vertices', '14']);
    expect(families.stderr).toBe('');
    expect(families.status).toBe(1);
    // K_10 minus the edges of a star K_{1,3} (see the file's header).
    const known = await refute(['check', file, 'IJ~~~~~~w', '--json']);
    expect(known.status).toBe(0);
    expect(JSON.parse(known.stdout)).toMatchObject({
      graph6: 'IJ~~~~~~w',
      verdict: 'refutes',
      certification: 'certified',
    });
  });

  it('--families finds nothing against the hunt demo (exit 1)', async () => {
    const r = await refute([
      'check',
      'scores/second-eigenvalue-vs-matching.ts',
      '--families',
      '--max-vertices',
      '14',
    ]);
    expect(r.status).toBe(1);
    expect(r.stdout).toMatch(/: \d+ graphs: 0 refute it \(certified\), .*; best score -\S+ on /);
  });

  it.each([
    [
      ['check', 'nowhere.ts', 'Dhc'],
      'refute: nowhere.ts: cannot read the conjecture file: no such file (check the path)',
    ],
    [
      ['check', 'scores/hong-spectral-radius-bound.ts'],
      'refute: nothing to check: give graphs in graph6 after the file, --stdin, or --families',
    ],
    [['check', 'scores/hong-spectral-radius-bound.ts', 'D?'], 'refute: graph6 argument 1:'],
    [
      ['check', 'scores/hong-spectral-radius-bound.ts', '--max-vertices', '5', 'Dhc'],
      'refute: --max-vertices applies to --families',
    ],
    [
      ['check', 'scores/hong-spectral-radius-bound.ts', '--families', '--max-vertices', 'ten'],
      "refute: --max-vertices: expected an integer in 1..64 but found 'ten'",
    ],
    [
      ['check', TWO_CLAIMS, 'Dhc', '--conjecture', 'always-conected'],
      `refute: ${TWO_CLAIMS}: has no conjecture 'always-conected'; did you mean 'always-connected'?`,
    ],
  ])('exits 2 with a one-line message on bad input: %j', async (args, message) => {
    const r = await refute(args);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.startsWith(message)).toBe(true);
    expect(r.stderr.trim().split('\n').length).toBe(1);
  });

  it('exits 2 on an unknown option, a syntax error and a NaN score, saying where', async () => {
    expect((await refute(['check', TWO_CLAIMS, '--familes'])).status).toBe(2);
    const line2 = "export default defineConjecture({ name: 'b', score: (g) => g.n +* 1 });";
    const broken = scratch.write('broken.ts', `import { defineConjecture } from 'refute';\n${line2}\n`);
    const syntax = await refute(['check', broken, 'Dhc']);
    expect(syntax.status).toBe(2);
    expect(syntax.stderr).toBe(
      `refute: ${broken}:2:${line2.indexOf('*') + 1}: syntax error: Unexpected "*"\n`,
    );
    const nan = scratch.write(
      'nan.ts',
      "import { defineConjecture } from 'refute';\nexport default defineConjecture({ name: 'ratio', statement: 's', vertices: 5, score: (g) => (g.m - 5) / (g.n - 5) });\n",
    );
    const r = await refute(['check', nan, 'Dhc']);
    expect(r.status).toBe(2);
    // C5: m = n = 5, so the score is 0/0.
    expect(r.stderr).toMatch(
      /^refute: conjecture 'ratio': score returned NaN on graph 'Dhc' \(graph6\); [^\n]*\n$/,
    );
  });
});
