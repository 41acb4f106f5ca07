/**
 * The verdict on one graph, and the exit status of a check: the single place that decides what
 * counts as a counterexample for `check`.
 *
 * A graph with a positive float score is a counterexample only when exact certification
 * (src/certify, DESIGN.md "Certification") confirms it. Otherwise it is an equality case
 * ("tight": a true theorem that is tight on g may give +1e-15 by rounding) or "numerical only"
 * (the score uses a value that cannot be certified exactly, such as estradaIndex, or its margin
 * is within rounding). A non-positive score within ROUNDING_MARGIN of 0 is labelled "tight" too;
 * that label is informational (the claim holds on g either way).
 */
import { type Graph } from '../graph/graph.js';
import { certifyCounterexample } from '../certify/certify.js';
import { type Conjecture, type Evaluation } from './types.js';

/** Non-positive scores within this distance of 0 are labelled as equality cases. */
export const ROUNDING_MARGIN = 1e-9;

export type VerdictKind = 'refutes' | 'numerical-only' | 'holds' | 'tight' | 'outside-domain';

export interface Verdict {
  readonly kind: VerdictKind;
  /** "certified" for a refutation; "numerical" for a positive float score that was not certified; else null. */
  readonly certification: 'certified' | 'numerical' | null;
}

/** The verdict on g given its evaluation. */
export function judge(c: Conjecture, g: Graph, evaluation: Evaluation): Verdict {
  if (!evaluation.inDomain) return { kind: 'outside-domain', certification: null };
  if (evaluation.score > 0) {
    const certificate = certifyCounterexample(c, g);
    switch (certificate.verdict) {
      case 'certified':
        return { kind: 'refutes', certification: 'certified' };
      case 'equality':
        return { kind: 'tight', certification: null };
      case 'holds':
        return { kind: 'holds', certification: null };
      case 'numerical-only':
        // Every input certified, but the score's box straddles 0: an equality case.
        if (certificate.numerical.length === 0) return { kind: 'tight', certification: null };
        return { kind: 'numerical-only', certification: 'numerical' };
      default:
        return { kind: 'numerical-only', certification: 'numerical' };
    }
  }
  if (evaluation.score >= -ROUNDING_MARGIN) return { kind: 'tight', certification: null };
  return { kind: 'holds', certification: null };
}

/** How a verdict reads in the human output. */
export function describeVerdict(v: Verdict): string {
  switch (v.kind) {
    case 'refutes':
      return 'refutes (certified)';
    case 'numerical-only':
      return 'score > 0, numerical only (not certified)';
    case 'tight':
      return 'holds (tight)';
    case 'holds':
      return 'holds';
    case 'outside-domain':
      return 'outside the domain';
  }
}

/** Exit status of a check: 0 when some graph refutes the conjecture (certified), 1 when none does. */
export function checkExitStatus(refutations: number): 0 | 1 {
  return refutations > 0 ? 0 : 1;
}
