/**
 * The verdict on one graph, and the exit status of a check: the single place that decides what
 * counts as a counterexample until exact certification (src/certify) replaces it.
 *
 * For now a score is judged numerically: |score| <= ROUNDING_MARGIN is "tight" (an equality
 * case as far as floating point can tell: a true theorem that is tight on g may give +1e-15 by
 * rounding), score > ROUNDING_MARGIN "refutes" with certification "numerical", a lower score
 * "holds". The margin is absolute, a common-practice tolerance for scores of moderate size; it
 * is not a proof, which is why the certification field says "numerical".
 */
import { type Graph } from '../graph/graph.js';
import { type Conjecture, type Evaluation } from './types.js';

/** Scores within this distance of 0 are treated as equality cases. */
export const ROUNDING_MARGIN = 1e-9;

export type VerdictKind = 'refutes' | 'holds' | 'tight' | 'outside-domain';

export interface Verdict {
  readonly kind: VerdictKind;
  /** How a refutation is known: "numerical" (float score) until the certifier lands; null otherwise. */
  readonly certification: 'numerical' | null;
}

/** The verdict on g given its evaluation (c and g are for the exact certifier that will replace this). */
export function judge(_c: Conjecture, _g: Graph, evaluation: Evaluation): Verdict {
  if (!evaluation.inDomain) return { kind: 'outside-domain', certification: null };
  if (evaluation.score > ROUNDING_MARGIN) return { kind: 'refutes', certification: 'numerical' };
  if (evaluation.score >= -ROUNDING_MARGIN) return { kind: 'tight', certification: null };
  return { kind: 'holds', certification: null };
}

/** How a verdict reads in the human output. */
export function describeVerdict(v: Verdict): string {
  switch (v.kind) {
    case 'refutes':
      return `refutes (${v.certification})`;
    case 'tight':
      return 'holds (tight)';
    case 'holds':
      return 'holds';
    case 'outside-domain':
      return 'outside the domain';
  }
}

/** Exit status of a check: 0 when some graph refutes the conjecture, 1 when none does. */
export function checkExitStatus(refutations: number): 0 | 1 {
  return refutations > 0 ? 0 : 1;
}
