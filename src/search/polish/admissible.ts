/**
 * Which graphs the polisher may stand on: an order inside the allowed range and, when the
 * conjecture requires it, connected. Checked before a graph is scored, so that the cheap
 * bitset test spares the conjecture's score function the graphs outside its domain.
 */
import { type Graph } from '../../graph/graph.js';
import { isConnectedGraph } from './connectivity.js';

export interface Admissibility {
  readonly minOrder: number;
  readonly maxOrder: number;
  readonly connected: boolean;
}

export function isAdmissible(g: Graph, a: Admissibility): boolean {
  if (g.order < a.minOrder || g.order > a.maxOrder) return false;
  return !a.connected || isConnectedGraph(g);
}
