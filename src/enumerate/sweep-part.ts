/**
 * One unit of a sweep: evaluate a conjecture on every graph of one part of one order, as the
 * isomorph-free enumerator produces them. The unit is pure given (conjecture, order, part), so
 * units can run in any thread in any order and be merged in part order for a deterministic
 * result (see sweep.ts).
 */
import { canonicalGraph6 } from '../graph/canonical.js';
import { type Graph } from '../graph/graph.js';
import { evaluateConjecture } from '../conjecture/evaluate.js';
import { type Conjecture } from '../conjecture/types.js';
import { GraphEnumerator, type EnumerationPart } from './graph-enumerator.js';

/**
 * Whether a score refutes the claim. NUMERICAL ONLY: it trusts the float score's sign. Exact
 * certification (DESIGN.md, "Certification") is a later stage; until it lands, every
 * counterexample the sweep reports is numerical, and this is the one place that decides it.
 */
export function isNumericalCounterexample(score: number): boolean {
  return score > 0;
}

/** A graph that refutes the claim numerically: canonical graph6 and score. */
export interface SweepCounterexample {
  readonly graph6: string;
  readonly score: number;
}

/** What one part of one order gave. */
export interface SweepPartResult {
  readonly order: number;
  readonly part: EnumerationPart;
  /** Graphs generated (only connected ones when the conjecture asks for connected graphs). */
  readonly graphs: number;
  /** Graphs in the conjecture's domain. */
  readonly inDomain: number;
  /** Counterexamples in generation order, each in canonical graph6. */
  readonly counterexamples: SweepCounterexample[];
  /** Highest score in the domain (the first graph reaching it), or null if the domain was empty here. */
  readonly best: SweepCounterexample | null;
}

/** Sweeps part `part` of the graphs on `order` vertices. Errors of the score propagate (they name the graph). */
export function sweepPart(conjecture: Conjecture, order: number, part: EnumerationPart): SweepPartResult {
  const enumerator = new GraphEnumerator(order, { connected: conjecture.connected, part });
  let graphs = 0;
  let inDomain = 0;
  const counterexamples: SweepCounterexample[] = [];
  let bestScore = -Infinity;
  let bestGraph: Graph | null = null;
  while (enumerator.next()) {
    graphs++;
    const g = enumerator.currentGraph();
    const evaluation = evaluateConjecture(conjecture, g);
    if (!evaluation.inDomain) continue;
    inDomain++;
    const score = evaluation.score;
    if (isNumericalCounterexample(score)) counterexamples.push({ graph6: canonicalGraph6(g), score });
    if (bestGraph === null || score > bestScore) {
      bestScore = score;
      bestGraph = g;
    }
  }
  const best = bestGraph === null ? null : { graph6: canonicalGraph6(bestGraph), score: bestScore };
  return { order, part, graphs, inDomain, counterexamples, best };
}
