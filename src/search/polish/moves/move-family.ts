/**
 * The shape every move family of the polisher has: a name, how it changes the order, the list
 * of moves applicable to a graph (each a short tuple of vertex numbers), and a pure function
 * applying one of them. Listing moves as tuples, not as graphs, lets the search visit a
 * neighbourhood in a seeded random order and build only the graphs it actually scores.
 */
import { type Graph } from '../../../graph/graph.js';

/** One move: the vertices it names, in the order its family documents. */
export type Move = readonly number[];

export interface MoveFamily {
  /** Kebab-case name, used in statistics and messages. */
  readonly name: string;
  /** Order of the result minus order of the input. */
  readonly orderDelta: -1 | 0 | 1;
  /** Every move applicable to g, in a fixed (deterministic) order. */
  candidates(g: Graph): Move[];
  /** The graph reached by one move from candidates(g). */
  apply(g: Graph, move: Move): Graph;
  /**
   * A random applicable move (undefined when none was found), drawn without listing them all:
   * what the sampled descent uses for the large neighbourhoods. Not necessarily uniform.
   */
  sample?(g: Graph, rng: () => number): Move | undefined;
}

/** Draws before a sampler gives up (a random pick is rejected when it names no valid move). */
export const SAMPLE_ATTEMPTS = 32;
