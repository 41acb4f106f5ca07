/**
 * `refute certify` end to end: exit statuses, the human certificate (graph, inputs with their
 * characteristic polynomials, margin, verdict) and the JSON form with exact rational endpoints.
 * Values: λ1(P_5) = √3 = 1.7320508075688772935... and the characteristic polynomial of P_5 is
 * x^5 - 4x^3 + 3x (path recurrence); Petersen graph: (x - 3)(x - 1)^5 (x + 2)^4.
 */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { runCli } from '../support/run-cli.js';

const dir = mkdtempSync(path.join(tmpdir(), 'refute-certify-'));
const tinyMargin = path.join(dir, 'tiny-margin.ts');
writeFileSync(
  tinyMargin,
  `import { defineConjecture } from 'refute';
export default defineConjecture({
  name: 'tiny-margin',
  statement: 'graphs of maximum degree at most 2 have spectral radius at most 1.732050807',
  vertices: 5,
  where: (g) => g.maxDegree <= 2,
  score: (g) => g.spectralRadius - 1.732050807,
});
`,
);
const regularBound = path.join(dir, 'regular-bound.ts');
writeFileSync(
  regularBound,
  `import { defineConjecture } from 'refute';
export default defineConjecture({
  name: 'spectral-radius-at-most-max-degree',
  statement: 'spectralRadius <= maxDegree (true; equality for regular graphs)',
  vertices: 10,
  score: (g) => g.spectralRadius - g.maxDegree,
});
`,
);

describe('refute certify (end to end)', () => {
  test('a genuine counterexample with margin 5.7e-10 is certified: exit 0, polynomial and interval shown', async () => {
    const r = await runCli(['certify', tinyMargin, 'DhC']);
    expect(r.stderr).toBe('');
    expect(r.status).toBe(0);
    expect(r.stdout).toContain('verdict   CERTIFIED COUNTEREXAMPLE');
    expect(r.stdout).toContain('edges     0-1 1-2 2-3 3-4');
    expect(r.stdout).toContain('x^5 - 4*x^3 + 3*x');
    expect(r.stdout).toMatch(/spectralRadius ∈ \[1\.7320508075688772935\d, 1\.7320508075688772935\d\]/);
  });

  test('--json gives exact rational endpoints that bracket √3', async () => {
    const r = await runCli(['certify', tinyMargin, 'DhC', '--json']);
    expect(r.status).toBe(0);
    const cert = JSON.parse(r.stdout.trim());
    expect(cert).toMatchObject({ verdict: 'certified', certified: true, graph6: 'DhC', order: 5, size: 4 });
    const radius = cert.inputs.find((i: { key: string }) => i.key === 'spectralRadius');
    const [ln, ld] = radius.enclosure.lo.split('/').map(BigInt);
    const [hn, hd] = radius.enclosure.hi.split('/').map(BigInt);
    // lo^2 < 3 < hi^2, exactly.
    expect(ln * ln < 3n * ld * ld).toBe(true);
    expect(hn * hn > 3n * hd * hd).toBe(true);
    expect(radius.characteristicPolynomial.coefficients).toEqual(['0', '3', '0', '-4', '0', '1']);
  });

  test('an equality case of a true bound is not certified: exit 1, the Petersen polynomial factorised', async () => {
    const r = await runCli(['certify', regularBound, 'IheA@GUAo', 'DhC']);
    expect(r.status).toBe(1);
    expect(r.stdout).toContain('holds (equality, to within rounding) — not certified');
    expect(r.stdout).toContain('(x - 3) * (x + 2)^4 * (x - 1)^5');
    expect(r.stdout).toContain('holds (not a counterexample)'); // the path P_5: √3 < 2
  });

  test('bad input: a malformed graph6 argument is exit 2 with one line and nothing on stdout', async () => {
    const r = await runCli(['certify', tinyMargin, 'DhC', 'D!!']);
    expect(r.status).toBe(2);
    expect(r.stdout).toBe('');
    expect(r.stderr.trim().split('\n')).toHaveLength(1);
    expect(r.stderr).toMatch(/^refute: graph6 argument 3/);
  });

  test('bad input: no graphs, or a missing file, is exit 2', async () => {
    const none = await runCli(['certify', tinyMargin]);
    expect(none.status).toBe(2);
    expect(none.stderr).toMatch(/no graphs given/);
    const missing = await runCli(['certify', path.join(dir, 'nope.ts'), 'DhC']);
    expect(missing.status).toBe(2);
    expect(missing.stdout).toBe('');
  });
});
