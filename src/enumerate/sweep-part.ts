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
import { isCertifiedCounterexample } from '../certify/certify.js';
import { GraphEnumerator, type EnumerationPart } from './graph-enumerator.js';

/**
 * A graph whose float score is > 0: canonical graph6, score, and whether exact certification
 * (src/certify, DESIGN.md "Certification") confirmed it. Only certified ones are counterexamples;
 * the others are within rounding of an equality case (or use an invariant that cannot be
 * certified) and are reported as "numerical only".
 */
export interface SweepCounterexample {
  readonly graph6: string;
  readonly score: number;
  readonly certified: boolean;
}

/** What one part of one order gave. */
export interface SweepPartResult {
  readonly order: number;
  readonly part: EnumerationPart;
  /** Graphs generated (only connected ones when the conjecture asks for connected graphs). */
  readonly graphs: number;
  /** Graphs in the conjecture's domain. */
  readonly inDomain: number;
  /** Graphs with a positive float score in generation order, canonical graph6, certified or not. */
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
    if (score > 0) {
      counterexamples.push({
        graph6: canonicalGraph6(g),
        score,
        certified: isCertifiedCounterexample(conjecture, g),
      });
    }
    if (bestGraph === null || score > bestScore) {
      bestScore = score;
      bestGraph = g;
    }
  }
  const best =
    bestGraph === null
      ? null
      : {
          graph6: canonicalGraph6(bestGraph),
          score: bestScore,
          certified: counterexamples.some((c) => c.certified && c.score === bestScore),
        };
  return { order, part, graphs, inDomain, counterexamples, best };
}
