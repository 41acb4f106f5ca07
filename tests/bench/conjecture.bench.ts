/**
 * Conjecture files: the cost of the lazy graph view in the scoring loop, of loading a file, and
 * of `refute check`'s start-up.
 *
 * - Scoring 10,000 seeded G(19, 0.3) graphs with a cheap score (maxDegree - 2 minDegree: the
 *   view's own overhead dominates) and a realistic one (spectralRadius - averageDegree - 1), by
 *   evaluateConjecture, against a direct InvariantMemo baseline, and against the design not
 *   taken: a Proxy around every view (every property read through a trap).
 * - loadConjectureFile on an example file: the first load (starts esbuild's service) and later ones.
 * - Start-up: `refute --version` against `refute check FILE G6` (compiled CLI, child processes).
 */
import { spawnSync } from 'node:child_process';
import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { defineConjecture } from '../../src/conjecture/define.js';
import { evaluateConjecture, evaluateOnView } from '../../src/conjecture/evaluate.js';
import { loadConjectureFile } from '../../src/conjecture/load.js';
import { createGraphView } from '../../src/conjecture/view.js';
import { type GraphView } from '../../src/conjecture/types.js';
import { InvariantMemo } from '../../src/invariants/registry.js';
import { randomGraph, seededRng } from '../support/random-graph.js';
import { bestOfMs } from './timing.js';

const root = fileURLToPath(new URL('../..', import.meta.url));

function proxiedView(g: Parameters<typeof createGraphView>[0]): GraphView {
  const view = createGraphView(g);
  return new Proxy(view, {
    get(target, key) {
      if (typeof key === 'string' && !(key in target)) throw new Error(`unknown ${key}`);
      return Reflect.get(target, key, target);
    },
  });
}

function spawnMs(args: string[]): number {
  let best = Infinity;
  for (let r = 0; r < 5; r++) {
    const t0 = process.hrtime.bigint();
    spawnSync(process.execPath, [path.join(root, 'bin/refute'), ...args], { cwd: root, encoding: 'utf8' });
    best = Math.min(best, Number(process.hrtime.bigint() - t0) / 1e6);
  }
  return best;
}

export default async function bench(): Promise<void> {
  const rng = seededRng('bench-conjecture');
  const graphs = Array.from({ length: 10_000 }, () => randomGraph(19, 0.3, rng));
  const cheap = defineConjecture({
    name: 'cheap',
    statement: 's',
    vertices: 19,
    score: (g) => g.maxDegree - 2 * g.minDegree,
  });
  const spectral = defineConjecture({
    name: 'spectral',
    statement: 's',
    vertices: 19,
    score: (g) => g.spectralRadius - g.averageDegree - 1,
  });

  console.log('10,000 graphs G(19, 0.3), best of 7 interleaved runs; graphs/s in brackets');
  const rate = (ms: number) =>
    `${ms.toFixed(1)} ms (${Math.round(graphs.length / (ms / 1000)).toLocaleString('en')}/s)`;
  let sink = 0;
  for (const [label, c, direct] of [
    [
      'maxDegree - 2 minDegree',
      cheap,
      (m: InvariantMemo) => (m.get('maxDegree') as number) - 2 * (m.get('minDegree') as number),
    ],
    [
      'spectralRadius - averageDegree - 1',
      spectral,
      (m: InvariantMemo) => (m.get('spectralRadius') as number) - (m.get('averageDegree') as number) - 1,
    ],
  ] as const) {
    // Interleaved, best of 7 each, so that warm-up and the shared machine's noise hit all alike.
    const variants = {
      baseline: () => {
        for (const g of graphs) sink += direct(new InvariantMemo(g));
      },
      view: () => {
        for (const g of graphs) {
          const e = evaluateConjecture(c, g);
          if (e.inDomain) sink += e.score;
        }
      },
      proxied: () => {
        for (const g of graphs) {
          const e = evaluateOnView(c, g, proxiedView(g));
          if (e.inDomain) sink += e.score;
        }
      },
    };
    const best = { baseline: Infinity, view: Infinity, proxied: Infinity };
    for (let r = 0; r < 7; r++) {
      for (const key of ['baseline', 'view', 'proxied'] as const)
        best[key] = Math.min(best[key], bestOfMs(1, variants[key]));
    }
    const { baseline, view, proxied } = best;
    console.log(`  ${label}`);
    console.log(`    InvariantMemo directly:          ${rate(baseline)}`);
    console.log(
      `    evaluateConjecture (the view):   ${rate(view)}  = ${(view / baseline).toFixed(2)}x the direct memo`,
    );
    console.log(
      `    Proxy around every view:         ${rate(proxied)}  = ${(proxied / view).toFixed(2)}x the view`,
    );
  }
  if (sink === 0.5) console.log('');

  const file = path.join(root, 'scores/second-eigenvalue-vs-matching.ts');
  const t0 = process.hrtime.bigint();
  await loadConjectureFile(file);
  const first = Number(process.hrtime.bigint() - t0) / 1e6;
  let later = Infinity;
  for (let r = 0; r < 10; r++) {
    const t = process.hrtime.bigint();
    await loadConjectureFile(file);
    later = Math.min(later, Number(process.hrtime.bigint() - t) / 1e6);
  }
  console.log(
    `loadConjectureFile(scores/second-eigenvalue-vs-matching.ts): first ${first.toFixed(1)} ms, then ${later.toFixed(1)} ms`,
  );

  const bare = spawnMs(['--version']);
  const check = spawnMs(['check', 'scores/hong-spectral-radius-bound.ts', 'Dhc']);
  console.log(
    `start-up, best of 5: refute --version ${bare.toFixed(0)} ms; refute check FILE G6 ${check.toFixed(0)} ms (target < 1000 ms)`,
  );
}
