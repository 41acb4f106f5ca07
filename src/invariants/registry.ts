/**
 * The invariant registry: every name of shared/INVARIANTS.md mapped to its compute function
 * and kind, plus the per-graph memo through which invariants reuse each other's work.
 *
 * An invariant's compute function receives the graph and an {@link InvariantMemo}; it asks the
 * memo for other invariants (`memo.get('wienerIndex')`) or for shared intermediate products
 * (`memo.shared('distances', () => ...)`), so that, for one graph, each is computed at most once
 * whatever order they are asked in.
 */
import { type Graph } from '../graph/graph.js';
import { DEGREE_INVARIANTS } from './degrees.js';
import { COMPONENT_INVARIANTS } from './components.js';
import { DISTANCE_INVARIANTS } from './distances.js';
import { SPECTRAL_INVARIANTS } from './spectra.js';
import { TRIANGLE_INVARIANTS } from './triangles.js';
import { DEGREE_INDEX_INVARIANTS } from './degree-indices.js';
import { DISTANCE_SPECTRAL_INVARIANTS } from './distance-spectra.js';
import { MATCHING_INVARIANTS } from './matching.js';
import { INDEPENDENCE_INVARIANTS, VERTEX_COVER_INVARIANTS } from './independence.js';
import { CLIQUE_INVARIANTS } from './cliques.js';
import { COLOURING_INVARIANTS } from './colouring.js';
import { DOMINATION_INVARIANTS } from './domination.js';
import { CONNECTIVITY_INVARIANTS } from './connectivity.js';
import { SPANNING_TREE_INVARIANTS } from './spanning-trees.js';
import { CUT_STRUCTURE_INVARIANTS } from './cut-structure.js';

/** What sort of value an invariant has; decides JSON encoding, printing and certification. */
export type InvariantKind = 'integer' | 'real' | 'boolean' | 'integer-list' | 'real-list';

/** Values an invariant may take. Integers may be Infinity (diameter of a disconnected graph). */
export type InvariantValue = number | boolean | bigint | readonly number[];

export interface InvariantDefinition {
  readonly name: string;
  readonly kind: InvariantKind;
  /** One line for `refute invariants` and reports. */
  readonly description: string;
  readonly compute: (g: Graph, memo: InvariantMemo) => InvariantValue;
}

/** Per-graph cache of invariants and of shared intermediate results. */
export class InvariantMemo {
  private readonly values = new Map<string, unknown>();

  constructor(readonly graph: Graph) {}

  /** The value of a registered invariant, computed on first use. */
  get(name: string): InvariantValue {
    if (this.values.has(name)) return this.values.get(name) as InvariantValue;
    const def = INVARIANTS.get(name);
    if (def === undefined) throw new RangeError(`Expected a known invariant name but found '${name}'`);
    const value = def.compute(this.graph, this);
    this.values.set(name, value);
    return value;
  }

  /** A shared intermediate result (not an invariant) under a private key, computed once. */
  shared<T>(key: string, compute: () => T): T {
    const k = `#${key}`;
    if (this.values.has(k)) return this.values.get(k) as T;
    const value = compute();
    this.values.set(k, value);
    return value;
  }

  /** Whether an invariant has already been computed (for tests of the at-most-once rule). */
  has(name: string): boolean {
    return this.values.has(name);
  }
}

/**
 * Every invariant, in the order of shared/INVARIANTS.md. Each family file exports its
 * definitions; add a new family by importing its array here.
 */
const DEFINITIONS: ReadonlyArray<InvariantDefinition> = [
  ...DEGREE_INVARIANTS,
  ...COMPONENT_INVARIANTS,
  ...DISTANCE_INVARIANTS,
  ...SPECTRAL_INVARIANTS,
  ...DISTANCE_SPECTRAL_INVARIANTS,
  ...MATCHING_INVARIANTS,
  ...INDEPENDENCE_INVARIANTS,
  ...CLIQUE_INVARIANTS,
  ...COLOURING_INVARIANTS,
  ...DOMINATION_INVARIANTS,
  ...VERTEX_COVER_INVARIANTS,
  ...CONNECTIVITY_INVARIANTS,
  ...TRIANGLE_INVARIANTS,
  ...SPANNING_TREE_INVARIANTS,
  ...CUT_STRUCTURE_INVARIANTS,
  ...DEGREE_INDEX_INVARIANTS,
];

/** Name -> definition. */
export const INVARIANTS: ReadonlyMap<string, InvariantDefinition> = new Map(
  DEFINITIONS.map((d) => [d.name, d]),
);

/** All invariant names, in registry order. */
export function invariantNames(): string[] {
  return DEFINITIONS.map((d) => d.name);
}

/** The value of one invariant of g (a fresh memo; use InvariantMemo to compute several). */
export function computeInvariant(g: Graph, name: string): InvariantValue {
  return new InvariantMemo(g).get(name);
}
