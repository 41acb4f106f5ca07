/**
 * The float pre-check of a counterexample: in the conjecture's domain and a score above a
 * rounding margin, labelled "numerical". The margin is an absolute tolerance of common practice
 * for scores of moderate size (the same as `refute check` uses): an equality case of a tight
 * theorem may score +1e-15 by rounding. `refute hunt` then asks exact certification
 * (src/certify, wired in src/cli/hunt.ts huntTarget) and records only certified graphs; tests of
 * the search core use this pre-check alone.
 */
import { type Graph } from '../graph/graph.js';
import { type Evaluation } from './hunt.js';

export const COUNTEREXAMPLE_MARGIN = 1e-9;

export function judgeCounterexample(_g: Graph, evaluation: Evaluation): 'numerical' | 'certified' | null {
  return evaluation.inDomain && evaluation.score > COUNTEREXAMPLE_MARGIN ? 'numerical' : null;
}
