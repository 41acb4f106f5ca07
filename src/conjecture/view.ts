/**
 * The lazy graph view handed to a conjecture's `score` and `where`.
 *
 * Every registered invariant is a getter on one shared prototype, defined once from the
 * INVARIANTS map when this module loads; a getter asks the view's {@link InvariantMemo}, so each
 * invariant (and each shared intermediate product) is computed at most once per graph, whether
 * score or where or another invariant asks first. A view is a small object (graph, memo, a few
 * caches): creating one per graph costs little in a search scoring ~10^4 graphs/s.
 *
 * A name that is not an invariant is caught without slowing the known names down: the
 * prototype's own prototype is a Proxy, which property lookup reaches only after missing on the
 * view and on the prototype, and which throws an {@link UnknownInvariantError} naming the
 * closest known invariant. Symbol keys and the probes made by `await`, JSON.stringify and
 * `console.log` (then, toJSON, constructor) answer undefined instead.
 *
 * Tracing: a view created with `trace` records each invariant read directly by the conjecture
 * (reads made by `g.complement` as "complement.<name>"), which certification re-checks.
 */
import { inspect } from 'node:util';
import {
  type Graph,
  hasEdge as graphHasEdge,
  neighbors as graphNeighbors,
  edgeList,
} from '../graph/graph.js';
import { complement as complementGraph } from '../graph/builders.js';
import { encodeGraph6 } from '../graph/graph6.js';
import { INVARIANTS, InvariantMemo, invariantNames } from '../invariants/registry.js';
import { nearestName } from '../cli/nearest-name.js';
import { UnknownInvariantError } from './errors.js';
import { type GraphView } from './types.js';

/** Names the miss path answers with undefined rather than an error (probes by the language and by Node). */
const PROBED_NAMES = new Set(['then', 'toJSON', 'constructor', 'asymmetricMatch', 'nodeType', '$$typeof']);

/** The non-invariant members of a view. */
const STRUCTURE_NAMES = [
  'n',
  'm',
  'complement',
  'edges',
  'graph6',
  'graph',
  'hasEdge',
  'neighbors',
  'degree',
];

const missTarget = Object.create(null) as object;
const MISSING_NAME_TRAP = new Proxy(missTarget, {
  get(_target, key) {
    if (typeof key === 'symbol' || PROBED_NAMES.has(key)) return undefined;
    throw new UnknownInvariantError(key, nearestName(key, [...invariantNames(), ...STRUCTURE_NAMES]));
  },
  has() {
    return false;
  },
});

/** The state of one view; the invariant getters live on the prototype. */
class GraphViewState {
  _complement: GraphViewState | undefined = undefined;
  _edges: ReadonlyArray<readonly [number, number]> | undefined = undefined;
  _graph6: string | undefined = undefined;

  constructor(
    readonly graph: Graph,
    readonly _memo: InvariantMemo,
    /** Where reads are recorded (null: not traced) and the prefix of this view's names. */
    readonly _reads: Set<string> | null,
    readonly _prefix: string,
  ) {}

  get n(): number {
    return this.graph.order;
  }

  get m(): number {
    return this.graph.size;
  }

  get complement(): GraphViewState {
    if (this._complement === undefined) {
      const c = complementGraph(this.graph);
      const prefix = this._prefix === '' ? 'complement.' : '';
      this._complement = new GraphViewState(c, new InvariantMemo(c), this._reads, prefix);
      // The complement of the complement is this graph: keep its memo rather than recompute.
      this._complement._complement = this;
    }
    return this._complement;
  }

  get edges(): ReadonlyArray<readonly [number, number]> {
    if (this._edges === undefined) this._edges = Object.freeze(edgeList(this.graph));
    return this._edges;
  }

  get graph6(): string {
    if (this._graph6 === undefined) this._graph6 = encodeGraph6(this.graph);
    return this._graph6;
  }

  hasEdge(u: number, v: number): boolean {
    this.checkVertex(u, 'hasEdge');
    this.checkVertex(v, 'hasEdge');
    return graphHasEdge(this.graph, u, v);
  }

  neighbors(v: number): readonly number[] {
    this.checkVertex(v, 'neighbors');
    return Array.from(graphNeighbors(this.graph, v));
  }

  degree(v: number): number {
    this.checkVertex(v, 'degree');
    return this.graph.degrees[v];
  }

  toString(): string {
    return `GraphView(${this.graph6})`;
  }

  [inspect.custom](): string {
    return this.toString();
  }

  private checkVertex(v: number, method: string): void {
    if (!Number.isInteger(v) || v < 0 || v >= this.graph.order) {
      throw new RangeError(`g.${method}: expected a vertex in 0..${this.graph.order - 1} but found ${v}`);
    }
  }
}

for (const name of INVARIANTS.keys()) {
  Object.defineProperty(GraphViewState.prototype, name, {
    get(this: GraphViewState) {
      if (this._reads !== null) this._reads.add(this._prefix + name);
      return this._memo.get(name);
    },
    enumerable: true,
    configurable: false,
  });
}
Object.setPrototypeOf(GraphViewState.prototype, MISSING_NAME_TRAP);

/** A fresh view of g (its own memo: nothing computed yet). */
export function createGraphView(g: Graph): GraphView {
  return new GraphViewState(g, new InvariantMemo(g), null, '') as unknown as GraphView;
}

/** A view of g that records the invariants read through it (and through its complement). */
export function createTracingGraphView(g: Graph): { view: GraphView; reads: ReadonlySet<string> } {
  const reads = new Set<string>();
  return { view: new GraphViewState(g, new InvariantMemo(g), reads, '') as unknown as GraphView, reads };
}

/** The memo behind a view created here (tests count computations through it). */
export function memoOfView(view: GraphView): InvariantMemo {
  return (view as unknown as GraphViewState)._memo;
}
