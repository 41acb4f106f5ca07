/**
 * The exact (hard) invariants on seeded random graphs G(n, p), n = 20, 30, 40, p = 0.1, 0.3,
 * 0.5, 0.8: mean and worst milliseconds per graph over GRAPHS_PER_CELL graphs each. Then a
 * scaling probe at larger orders for the exponential ones, to find where they stop being well
 * under a second. Run: `npm run bench -- hard-invariants`.
 */
import { type Graph } from '../../src/graph/graph.js';
import { chromaticNumber } from '../../src/invariants/colouring.js';
import { cliqueNumber } from '../../src/invariants/cliques.js';
import { edgeConnectivity, vertexConnectivity } from '../../src/invariants/connectivity.js';
import { cutStructure } from '../../src/invariants/cut-structure.js';
import { distanceLaplacianSpectrum, distanceSpectrum } from '../../src/invariants/distance-spectra.js';
import { dominationNumber } from '../../src/invariants/domination.js';
import { independenceNumber } from '../../src/invariants/independence.js';
import { isConnected } from '../../src/invariants/components.js';
import { matchingNumber } from '../../src/invariants/matching.js';
import { spanningTreeCountBareiss, spanningTreeCountModular } from '../../src/invariants/spanning-trees.js';
import { randomGraph, seededRng } from '../support/random-graph.js';
import { bestOfMs, row } from './timing.js';

const ORDERS = [20, 30, 40];
const DENSITIES = [0.1, 0.3, 0.5, 0.8];
const GRAPHS_PER_CELL = 30;

const SOLVERS: ReadonlyArray<readonly [string, (g: Graph) => unknown]> = [
  ['matchingNumber', matchingNumber],
  ['independenceNumber', independenceNumber],
  ['cliqueNumber', cliqueNumber],
  ['chromaticNumber', chromaticNumber],
  ['dominationNumber', dominationNumber],
  ['vertexConnectivity', vertexConnectivity],
  ['edgeConnectivity', edgeConnectivity],
  ['spanningTreeCount (modular)', spanningTreeCountModular],
  ['spanningTreeCount (Bareiss)', spanningTreeCountBareiss],
  ['bridges + cut vertices', cutStructure],
  ['distanceSpectrum', (g) => (isConnected(g) ? distanceSpectrum(g) : null)],
  ['distanceLaplacianSpectrum', (g) => (isConnected(g) ? distanceLaplacianSpectrum(g) : null)],
];

/**
 * Mean and worst wall time (ms) of fn over the graphs, after one warm-up pass; each graph's time
 * is its best of `repeats` runs, so that a garbage collection or another process on the shared
 * machine does not pass for a hard instance.
 */
function perGraph(
  graphs: ReadonlyArray<Graph>,
  fn: (g: Graph) => unknown,
  repeats = 3,
): { mean: number; worst: number } {
  for (const g of graphs) fn(g);
  let total = 0;
  let worst = 0;
  for (const g of graphs) {
    const ms = bestOfMs(repeats, () => fn(g));
    total += ms;
    if (ms > worst) worst = ms;
  }
  return { mean: total / graphs.length, worst };
}

const fmt = (x: number): string => (x < 0.1 ? x.toFixed(3) : x < 10 ? x.toFixed(2) : x.toFixed(1));

export default async function bench(): Promise<void> {
  const cells = ORDERS.flatMap((n) => DENSITIES.map((p) => [n, p] as const));
  const graphsOf = new Map<string, Graph[]>();
  for (const [n, p] of cells) {
    const rng = seededRng(`hard-invariants-${n}-${p}`);
    graphsOf.set(
      `${n}/${p}`,
      Array.from({ length: GRAPHS_PER_CELL }, () => randomGraph(n, p, rng)),
    );
  }
  console.log(`ms per graph, mean / worst of ${GRAPHS_PER_CELL} seeded G(n, p) per column`);
  const widths = [28, ...cells.map(() => 13)];
  console.log(row(['n', ...cells.map(([n]) => n)], widths));
  console.log(row(['p', ...cells.map(([, p]) => p)], widths));
  for (const [name, fn] of SOLVERS) {
    const out = cells.map(([n, p]) => {
      const { mean, worst } = perGraph(graphsOf.get(`${n}/${p}`)!, fn);
      return `${fmt(mean)}/${fmt(worst)}`;
    });
    console.log(row([name, ...out], widths));
  }

  // Scaling probe: the exponential solvers at larger orders, worst density for each, 5 graphs.
  console.log('\nscaling probe: worst ms of 5 seeded G(n, p)');
  const probes: ReadonlyArray<readonly [string, (g: Graph) => unknown, number, number[]]> = [
    ['chromaticNumber', chromaticNumber, 0.5, [50, 60, 70]],
    ['dominationNumber', dominationNumber, 0.1, [50, 60, 70]],
    ['independenceNumber', independenceNumber, 0.1, [60, 80, 100]],
    ['cliqueNumber', cliqueNumber, 0.8, [60, 80, 100]],
  ];
  for (const [name, fn, p, orders] of probes) {
    const out: string[] = [];
    for (const n of orders) {
      const rng = seededRng(`hard-invariants-probe-${n}-${p}`);
      const graphs = Array.from({ length: 5 }, () => randomGraph(n, p, rng));
      out.push(`n=${n}: ${fmt(perGraph(graphs, fn, 1).worst)}`);
    }
    console.log(`  ${name.padEnd(20)} p=${p}  ${out.join('   ')}`);
  }
}

if (import.meta.url === `file://${process.argv[1]}`) await bench();
