/**
 * The public surface of the `refute` package: what a conjecture file imports
 * (`import { defineConjecture } from 'refute'`) and what a script may use as a library.
 */
export type { Graph } from './graph/graph.js';
export { hasEdge, neighbors, edgeList, graphsEqual } from './graph/graph.js';
export {
  fromEdges,
  fromAdjacencyMatrix,
  fromUpperTriangleBits,
  complement,
  inducedSubgraph,
  relabel,
} from './graph/builders.js';
export * as families from './graph/families.js';
export { encodeGraph6, decodeGraph6, Graph6ParseError } from './graph/graph6.js';
export {
  INVARIANTS,
  InvariantMemo,
  invariantNames,
  computeInvariant,
  type InvariantKind,
  type InvariantValue,
  type InvariantDefinition,
} from './invariants/registry.js';
export { InputError, InvariantDomainError } from './errors.js';
export {
  canonicalLabelling,
  canonicalForm,
  canonicalGraph6,
  canonicalSearch,
  CanonicalLabellingLimitError,
  type CanonicalSearchResult,
  type CanonicalSearchOptions,
} from './graph/canonical.js';
export { defineConjecture } from './conjecture/define.js';
export type {
  Conjecture,
  ConjectureSpec,
  GraphView,
  GraphInvariants,
  Evaluation,
} from './conjecture/types.js';
export {
  certifyCounterexample,
  isCertifiedCounterexample,
  type Certificate,
  type CertifiedInput,
  type Verdict,
} from './certify/certify.js';
// Witnesses of the exact invariants, and the verifiers that check them (for scripts and papers).
export { maximumMatching, isMatching } from './invariants/matching.js';
export { maximumClique, isClique } from './invariants/cliques.js';
export {
  maximumIndependentSet,
  minimumVertexCover,
  isIndependentSet,
  isVertexCover,
} from './invariants/independence.js';
export { minimumColouring, isProperColouring } from './invariants/colouring.js';
export { minimumDominatingSet, isDominatingSet } from './invariants/domination.js';
