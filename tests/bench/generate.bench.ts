/**
 * Isomorph-free generation rates (DESIGN.md targets: all 274,668 graphs on 9 vertices in <= 30 s,
 * all 12,005,168 on 10 in <= 20 min), with the counts checked against OEIS A000088 (all graphs)
 * and A001349 (connected ones) at n = 8, 9, 10, and the canonical labelling rate on random graphs.
 * n = 10 takes a few minutes; `npm run bench -- generate` runs this file alone.
 */
import { GraphEnumerator } from '../../src/enumerate/graph-enumerator.js';
import { canonicalGraph6 } from '../../src/graph/canonical.js';
import { randomGraph, seededRng } from '../support/random-graph.js';
import { bestOfMs } from './timing.js';

const A000088: Record<number, number> = { 8: 12346, 9: 274668, 10: 12005168 };
const A001349: Record<number, number> = { 8: 11117, 9: 261080, 10: 11716571 };
const TARGET_SECONDS: Record<number, number> = { 9: 30, 10: 1200 };

/** Connectivity of single-word rows by BFS over bitsets (kept apart from the enumerator's own test). */
function connected(order: number, rows: Uint32Array): boolean {
  let seen = 1;
  let frontier = 1;
  while (frontier !== 0) {
    let next = 0;
    for (let v = 0; v < order; v++) if ((frontier >>> v) & 1) next |= rows[v];
    frontier = next & ~seen;
    seen |= frontier;
  }
  return seen === (1 << order) - 1;
}

export default async function bench(): Promise<void> {
  for (const n of [8, 9, 10]) {
    const t0 = process.hrtime.bigint();
    const e = new GraphEnumerator(n);
    let all = 0;
    let conn = 0;
    while (e.next()) {
      all++;
      if (connected(n, e.rows)) conn++;
    }
    const seconds = Number(process.hrtime.bigint() - t0) / 1e9;
    const target = TARGET_SECONDS[n];
    const verdict =
      target === undefined ? '' : `  (target <= ${target} s: ${(target / seconds).toFixed(1)}x headroom)`;
    console.log(
      `n = ${n}: ${all} graphs (A000088: ${A000088[n]} ${all === A000088[n] ? 'ok' : 'MISMATCH'}), ` +
        `${conn} connected (A001349: ${A001349[n]} ${conn === A001349[n] ? 'ok' : 'MISMATCH'}) ` +
        `in ${seconds.toFixed(2)} s = ${Math.round(all / seconds)} graphs/s${verdict}`,
    );
    console.log(
      `        ${e.stats.candidates} candidates, ${e.stats.fullSearches} full searches to accept, ` +
        `${e.stats.dedupSearches} to deduplicate`,
    );
  }
  for (const [n, p] of [
    [20, 0.3],
    [64, 0.1],
  ] as const) {
    const rng = seededRng(`bench-canonical-${n}`);
    const graphs = Array.from({ length: 1000 }, () => randomGraph(n, p, rng));
    const ms = bestOfMs(3, () => {
      for (const g of graphs) canonicalGraph6(g);
    });
    console.log(`canonicalGraph6 on 1000 G(${n}, ${p}): ${ms.toFixed(1)} ms, ${ms.toFixed(1)} us per graph`);
  }
}
