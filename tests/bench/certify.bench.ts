/**
 * Cost of certification on seeded random graphs G(n, 0.3), n = 10, 20, 30, 40 (5 graphs each,
 * best of 3): the exact characteristic polynomial by Berkowitz against the Faddeev–LeVerrier
 * recurrence (ratio printed), the isolation of every eigenvalue to 2^-64, and a whole
 * certificate for a score reading the spectral radius. Certification runs only on graphs
 * whose float score is > 0, so these figures bound its cost per candidate counterexample.
 */
import {
  characteristicPolynomial,
  characteristicPolynomialFaddeevLeVerrier,
} from '../../src/certify/characteristic-polynomial.js';
import { integerGraphMatrix } from '../../src/certify/graph-matrices.js';
import { isolateRealRoots } from '../../src/certify/root-isolation.js';
import { certifyCounterexample } from '../../src/certify/certify.js';
import { defineConjecture } from '../../src/conjecture/define.js';
import { randomGraph, seededRng } from '../support/random-graph.js';
import { bestOfMs, row } from './timing.js';

export default async function bench(): Promise<void> {
  const rng = seededRng('bench-certify');
  const conjecture = defineConjecture({
    name: 'bench-spectral-radius',
    statement: 'spectralRadius <= maxDegree',
    vertices: 20,
    score: (g) => g.spectralRadius - g.maxDegree,
  });
  const widths = [4, 16, 16, 10, 18, 18];
  console.log(
    row(['n', 'Berkowitz ms', 'Faddeev-LV ms', 'ratio', 'all roots 2^-64 ms', 'certificate ms'], widths),
  );
  for (const n of [10, 20, 30, 40]) {
    const graphs = Array.from({ length: 5 }, () => randomGraph(n, 0.3, rng));
    const matrices = graphs.map((g) => integerGraphMatrix(g, 'adjacency'));
    const berkowitz = bestOfMs(3, () => matrices.forEach((m) => characteristicPolynomial(m))) / graphs.length;
    const faddeev =
      bestOfMs(3, () => matrices.forEach((m) => characteristicPolynomialFaddeevLeVerrier(m))) / graphs.length;
    const polys = matrices.map((m) => characteristicPolynomial(m));
    const roots = bestOfMs(3, () => polys.forEach((p) => isolateRealRoots(p, 64))) / graphs.length;
    const certificate =
      bestOfMs(3, () => graphs.forEach((g) => certifyCounterexample(conjecture, g))) / graphs.length;
    console.log(
      row(
        [
          n,
          berkowitz.toFixed(2),
          faddeev.toFixed(2),
          (faddeev / berkowitz).toFixed(1) + 'x',
          roots.toFixed(1),
          certificate.toFixed(1),
        ],
        widths,
      ),
    );
  }
}
