/**
 * Second, independent computations of the NP-hard integer invariants, for certification: plain
 * exhaustive methods over vertex subsets (bitmasks), deliberately unlike the branch-and-bound,
 * blossom and flow algorithms of src/invariants/, and each close to its definition.
 *
 * - α, ω, vertex cover: the independent sets of every subset, by one pass over the 2^n masks.
 * - γ: the closed neighbourhood union of every subset.
 * - χ: inclusion–exclusion over the independent sets (A. Björklund, T. Husfeldt and
 *   M. Koivisto, "Set partitioning via inclusion–exclusion", SIAM J. Comput. 39 (2009)
 *   546–563): the number of k-tuples of independent sets covering V is
 *   c_k = sum over S ⊆ V of (-1)^(n-|S|) i(S)^k, i(S) the number of independent subsets of S,
 *   and χ is the least k with c_k > 0. c_k is computed modulo two primes; c_k = 0 is then
 *   exact, and a c_k > 0 that vanishes modulo both primes (an overestimate, which could only
 *   make the check fail, never pass wrongly unless the registry errs identically) has
 *   probability negligible next to a hardware fault.
 * - ν: dynamic programming over vertex subsets (the lowest vertex is unmatched or matched to a
 *   neighbour); above the exhaustive limit, the rank of the Tutte matrix at random points
 *   modulo a prime (L. Lovász, "On determinants, matchings, and random algorithms",
 *   Fundamentals of Computation Theory 1979, 565–574): rank = 2ν with probability at least
 *   1 - n/p per trial, and never above 2ν; the maximum over three seeded trials is taken.
 * - κ: the smallest vertex set whose deletion disconnects the graph (K_n: n - 1), by subsets in
 *   increasing size; λ': the smallest edge cut over all vertex bipartitions, and above the
 *   exhaustive limit the Stoer–Wagner minimum cut (M. Stoer and F. Wagner, "A simple min-cut
 *   algorithm", J. ACM 44 (1997) 585–591), where the registry uses maximum flows.
 *
 * - α and ω above the exhaustive limit: the plain two-way branching α(G) = max(α(G - v),
 *   1 + α(G - N[v])) on a vertex v of largest degree, pruned only by |chosen| + |candidates|
 *   (no colouring bounds, unlike the registry's branch and bound), within a node budget.
 *
 * @remarks Exhaustive methods run up to {@link EXHAUSTIVE_MAX_ORDER} vertices (2^20 masks, well
 * under a second); the branching for α, ω up to {@link BRANCHING_MAX_ORDER} vertices and
 * {@link BRANCHING_NODE_BUDGET} nodes. Beyond, they return undefined and certification reports
 * the invariant as not independently confirmed.
 */
import seedrandom from 'seedrandom';
import { type Graph, hasEdge } from '../../graph/graph.js';

/** Largest order for the subset methods. */
export const EXHAUSTIVE_MAX_ORDER = 20;

function adjacencyMasks(g: Graph): Int32Array {
  const adj = new Int32Array(g.order);
  for (let u = 0; u < g.order; u++)
    for (let v = 0; v < g.order; v++) if (u !== v && hasEdge(g, u, v)) adj[u] |= 1 << v;
  return adj;
}

function lowestBit(mask: number): number {
  return 31 - Math.clz32(mask & -mask);
}

function popcounts(n: number): Uint8Array {
  const pc = new Uint8Array(1 << n);
  for (let mask = 1; mask < 1 << n; mask++) pc[mask] = pc[mask & (mask - 1)] + 1;
  return pc;
}

/** independent[mask] = 1 when mask is an independent set. */
function independentTable(adj: Int32Array, n: number): Uint8Array {
  const ind = new Uint8Array(1 << n);
  ind[0] = 1;
  for (let mask = 1; mask < 1 << n; mask++) {
    const v = lowestBit(mask);
    const rest = mask & (mask - 1);
    ind[mask] = ind[rest] === 1 && (adj[v] & rest) === 0 ? 1 : 0;
  }
  return ind;
}

function maxIndependentSize(adj: Int32Array, n: number): number {
  const ind = independentTable(adj, n);
  const pc = popcounts(n);
  let best = 0;
  for (let mask = 0; mask < 1 << n; mask++) if (ind[mask] === 1 && pc[mask] > best) best = pc[mask];
  return best;
}

export function independenceNumberExhaustive(g: Graph): number | undefined {
  if (g.order > EXHAUSTIVE_MAX_ORDER) return independenceNumberByBranching(g, false);
  return maxIndependentSize(adjacencyMasks(g), g.order);
}

/** Largest order for the branching method of α and ω. */
export const BRANCHING_MAX_ORDER = 64;
/** Search nodes after which the branching gives up (undefined: not confirmed). */
export const BRANCHING_NODE_BUDGET = 400_000;

function popcountBig(x: bigint): number {
  let c = 0;
  while (x !== 0n) {
    x &= x - 1n;
    c++;
  }
  return c;
}

/** α (or ω, on the complement when `ofComplement`) by plain branching; undefined past the budget. */
export function independenceNumberByBranching(g: Graph, ofComplement: boolean): number | undefined {
  const n = g.order;
  if (n > BRANCHING_MAX_ORDER) return undefined;
  const adj: bigint[] = [];
  for (let u = 0; u < n; u++) {
    let row = 0n;
    for (let v = 0; v < n; v++) if (u !== v && hasEdge(g, u, v) !== ofComplement) row |= 1n << BigInt(v);
    adj.push(row);
  }
  let best = 0;
  let nodes = 0;
  const search = (candidates: bigint, size: number): boolean => {
    if (++nodes > BRANCHING_NODE_BUDGET) return false;
    const left = popcountBig(candidates);
    if (size + left <= best) return true;
    let v = -1;
    let dv = -1;
    for (let u = 0; u < n; u++) {
      if (((candidates >> BigInt(u)) & 1n) === 0n) continue;
      const d = popcountBig(adj[u] & candidates);
      if (d > dv) {
        dv = d;
        v = u;
      }
    }
    if (dv <= 0) {
      // No edges among the candidates: they are all independent.
      best = Math.max(best, size + left);
      return true;
    }
    const bit = 1n << BigInt(v);
    if (!search(candidates & ~adj[v] & ~bit, size + 1)) return false;
    return search(candidates & ~bit, size);
  };
  return search((1n << BigInt(n)) - 1n, 0) ? best : undefined;
}

export function cliqueNumberExhaustive(g: Graph): number | undefined {
  if (g.order > EXHAUSTIVE_MAX_ORDER) return independenceNumberByBranching(g, true);
  const adj = adjacencyMasks(g);
  const all = g.order === 32 ? -1 : (1 << g.order) - 1;
  const co = adj.map((row, v) => all & ~row & ~(1 << v));
  return maxIndependentSize(co, g.order);
}

export function vertexCoverNumberExhaustive(g: Graph): number | undefined {
  const alpha = independenceNumberExhaustive(g);
  // A set is a vertex cover exactly when its complement is independent.
  return alpha === undefined ? undefined : g.order - alpha;
}

export function dominationNumberExhaustive(g: Graph): number | undefined {
  const n = g.order;
  if (n > EXHAUSTIVE_MAX_ORDER) return undefined;
  const adj = adjacencyMasks(g);
  const full = (1 << n) - 1;
  const covered = new Int32Array(1 << n);
  const pc = popcounts(n);
  let best = n;
  for (let mask = 1; mask < 1 << n; mask++) {
    const v = lowestBit(mask);
    covered[mask] = covered[mask & (mask - 1)] | adj[v] | (1 << v);
    if (covered[mask] === full && pc[mask] < best) best = pc[mask];
  }
  return best;
}

const PRIMES = [2147483647, 2147483629];

export function chromaticNumberExhaustive(g: Graph): number | undefined {
  const n = g.order;
  if (n > EXHAUSTIVE_MAX_ORDER) return undefined;
  const adj = adjacencyMasks(g);
  // i(S): number of independent subsets of S, by the subset-sum (zeta) transform.
  const count = new Float64Array(1 << n);
  const ind = independentTable(adj, n);
  for (let mask = 0; mask < 1 << n; mask++) count[mask] = ind[mask];
  for (let bit = 0; bit < n; bit++)
    for (let mask = 0; mask < 1 << n; mask++) if (mask & (1 << bit)) count[mask] += count[mask ^ (1 << bit)];
  const pc = popcounts(n);
  const powers = PRIMES.map(() => new Float64Array(1 << n).fill(1));
  for (let k = 1; k <= n; k++) {
    let nonZero = false;
    for (let pi = 0; pi < PRIMES.length; pi++) {
      const p = PRIMES[pi];
      const pw = powers[pi];
      let sum = 0;
      for (let mask = 0; mask < 1 << n; mask++) {
        // count < 2^21 and pw < 2^31: the product is below 2^53, so exact.
        pw[mask] = (pw[mask] * count[mask]) % p;
        sum = (n - pc[mask]) % 2 === 0 ? (sum + pw[mask]) % p : (sum - pw[mask] + p) % p;
      }
      if (sum !== 0) nonZero = true;
    }
    if (nonZero) return k;
  }
  return n;
}

export function matchingNumberSecondMethod(g: Graph): number {
  return g.order <= EXHAUSTIVE_MAX_ORDER ? matchingNumberExhaustive(g) : matchingNumberByTutteRank(g);
}

/** ν by dynamic programming over subsets: ν(S) = max(ν(S - v), 1 + ν(S - u - v) for u ~ v in S), v = min S. */
export function matchingNumberExhaustive(g: Graph): number {
  const n = g.order;
  const adj = adjacencyMasks(g);
  const nu = new Uint8Array(1 << n);
  for (let mask = 1; mask < 1 << n; mask++) {
    const v = lowestBit(mask);
    const rest = mask & (mask - 1);
    let best = nu[rest];
    let partners = adj[v] & rest;
    while (partners !== 0) {
      const u = lowestBit(partners);
      partners &= partners - 1;
      const value = 1 + nu[rest & ~(1 << u)];
      if (value > best) best = value;
    }
    nu[mask] = best;
  }
  return nu[(1 << n) - 1];
}

/** Prime below 2^26, so that products of two residues stay below 2^53. */
const TUTTE_PRIME = 67108859;

/** ν as half the rank of the Tutte matrix at seeded random points mod a prime (max of 3 trials). */
export function matchingNumberByTutteRank(g: Graph): number {
  const n = g.order;
  const p = TUTTE_PRIME;
  const rng = seedrandom('refute-certify-tutte-matrix');
  let bestRank = 0;
  for (let trial = 0; trial < 3; trial++) {
    const t = new Float64Array(n * n);
    for (let u = 0; u < n; u++)
      for (let v = u + 1; v < n; v++) {
        if (!hasEdge(g, u, v)) continue;
        const x = 1 + Math.floor(rng() * (p - 1));
        t[u * n + v] = x;
        t[v * n + u] = p - x;
      }
    bestRank = Math.max(bestRank, rankModP(t, n, p));
  }
  return bestRank / 2;
}

function modPow(b: number, e: number, p: number): number {
  let result = 1;
  let base = b % p;
  while (e > 0) {
    if (e & 1) result = (result * base) % p;
    base = (base * base) % p;
    e = Math.floor(e / 2);
  }
  return result;
}

function rankModP(a: Float64Array, n: number, p: number): number {
  let rank = 0;
  for (let col = 0; col < n && rank < n; col++) {
    let pivot = -1;
    for (let r = rank; r < n; r++)
      if (a[r * n + col] !== 0) {
        pivot = r;
        break;
      }
    if (pivot === -1) continue;
    if (pivot !== rank)
      for (let c = 0; c < n; c++) [a[pivot * n + c], a[rank * n + c]] = [a[rank * n + c], a[pivot * n + c]];
    const inv = modPow(a[rank * n + col], p - 2, p);
    for (let r = rank + 1; r < n; r++) {
      const f = (a[r * n + col] * inv) % p;
      if (f === 0) continue;
      for (let c = col; c < n; c++) a[r * n + c] = (a[r * n + c] - ((f * a[rank * n + c]) % p) + p) % p;
    }
    rank++;
  }
  return rank;
}

/** Whether the vertices of `keep` induce a connected graph (BFS on masks). */
function inducesConnected(adj: Int32Array, keep: number): boolean {
  if (keep === 0) return true;
  let seen = keep & -keep;
  let frontier = seen;
  while (frontier !== 0) {
    let next = 0;
    let f = frontier;
    while (f !== 0) {
      next |= adj[lowestBit(f)];
      f &= f - 1;
    }
    next &= keep & ~seen;
    seen |= next;
    frontier = next;
  }
  return seen === keep;
}

export function vertexConnectivityExhaustive(g: Graph): number | undefined {
  const n = g.order;
  if (n > EXHAUSTIVE_MAX_ORDER) return undefined;
  if (n === 1) return 0;
  const adj = adjacencyMasks(g);
  const full = (1 << n) - 1;
  for (let k = 0; k <= n - 2; k++) {
    // Every k-subset S by Gosper's hack; G - S has n - k >= 2 vertices.
    if (k === 0) {
      if (!inducesConnected(adj, full)) return 0;
      continue;
    }
    let s = (1 << k) - 1;
    while (s <= full) {
      if (!inducesConnected(adj, full & ~s)) return k;
      const c = s & -s;
      const r = s + c;
      s = (((r ^ s) >>> 2) / c) | r;
    }
  }
  return n - 1;
}

export function edgeConnectivityExhaustive(g: Graph): number | undefined {
  const n = g.order;
  if (n > EXHAUSTIVE_MAX_ORDER) return undefined;
  if (n === 1) return 0;
  const adj = adjacencyMasks(g);
  const full = (1 << n) - 1;
  let best = Infinity;
  // S contains vertex 0 and is a proper subset: every cut once.
  for (let rest = 0; rest < 1 << (n - 1); rest++) {
    const s = 1 | (rest << 1);
    if (s === full) continue;
    let cut = 0;
    for (let v = 0; v < n; v++) if (s & (1 << v)) cut += popcount(adj[v] & ~s & full);
    if (cut < best) best = cut;
  }
  return best;
}

/** λ' by exhaustive cuts up to the limit, by Stoer–Wagner above it. */
export function edgeConnectivitySecondMethod(g: Graph): number {
  return g.order <= EXHAUSTIVE_MAX_ORDER ? edgeConnectivityExhaustive(g)! : edgeConnectivityStoerWagner(g);
}

/**
 * The global minimum edge cut by Stoer–Wagner: repeated maximum-adjacency orderings; the last
 * vertex's attachment weight is a cut of the phase, and the two last vertices are merged.
 * 0 for n = 1 (the convention of INVARIANTS.md).
 */
export function edgeConnectivityStoerWagner(g: Graph): number {
  const n = g.order;
  if (n <= 1) return 0;
  const w: number[][] = Array.from({ length: n }, (_, u) =>
    Array.from({ length: n }, (_, v) => (u !== v && hasEdge(g, u, v) ? 1 : 0)),
  );
  let alive = Array.from({ length: n }, (_, i) => i);
  let best = Infinity;
  while (alive.length > 1) {
    const weight = new Map<number, number>(alive.map((v) => [v, 0]));
    const added = new Set<number>();
    let previous = -1;
    let last = -1;
    for (let k = 0; k < alive.length; k++) {
      let pick = -1;
      for (const v of alive)
        if (!added.has(v) && (pick === -1 || weight.get(v)! > weight.get(pick)!)) pick = v;
      added.add(pick);
      previous = last;
      last = pick;
      for (const v of alive) if (!added.has(v)) weight.set(v, weight.get(v)! + w[pick][v]);
    }
    best = Math.min(best, weight.get(last)!);
    // Merge last into previous.
    for (const v of alive) {
      w[previous][v] += w[last][v];
      w[v][previous] = w[previous][v];
    }
    w[previous][previous] = 0;
    alive = alive.filter((v) => v !== last);
  }
  return best;
}

function popcount(x: number): number {
  let c = 0;
  while (x !== 0) {
    x &= x - 1;
    c++;
  }
  return c;
}
