/**
 * The one place the hunt decides whether a graph is a counterexample. Until the exact
 * certifier (src/certify) plugs in here, a graph counts when it is in the conjecture's domain
 * and its float score exceeds a rounding margin, and it is labelled "numerical", never
 * "certified". The margin is an absolute tolerance of common practice for scores of moderate
 * size (the same as `refute check` uses): an equality case of a tight theorem may score +1e-15
 * by rounding and must not be reported.
 */
import { type Graph } from '../graph/graph.js';
import { type Evaluation } from './hunt.js';

export const COUNTEREXAMPLE_MARGIN = 1e-9;

export function judgeCounterexample(_g: Graph, evaluation: Evaluation): 'numerical' | 'certified' | null {
  return evaluation.inDomain && evaluation.score > COUNTEREXAMPLE_MARGIN ? 'numerical' : null;
}
