/**
 * The certificate: whether a graph refutes a conjecture beyond any doubt from rounding.
 *
 * `certifyCounterexample(conjecture, graph)` is the one function hunt, check, sweep and polish
 * call. It proceeds in four steps.
 *
 * 1. Trace. The conjecture is evaluated through a {@link substitutedView} with no overrides,
 *    which records every invariant `where` and `score` read (and the float score).
 * 2. Certify the inputs. Each invariant read is recomputed exactly (certified-invariants.ts):
 *    integers, booleans and integer lists by an independent second algorithm, and compared with
 *    the registry (a mismatch is a "disagreement" and is never certified); rationals exactly;
 *    real numbers as rational intervals of width <= 2^-64 from exact characteristic
 *    polynomials, and the registry's float must lie in its interval (to 1e-6 relative, else a
 *    disagreement). An invariant with no exact method is "numerical" and named in the result.
 * 3. Evaluate on a box. Every certified real input x (each entry of a list too) ranges over the
 *    box B = [lo - ρs, hi + ρs], s = max(1, |x|), ρ = 2^-36, in doubles rounded outward. The
 *    conjecture is evaluated at the centre, at every corner when there are at most 6 real
 *    inputs, and always at the corner that one-at-a-time perturbation shows to minimise (and
 *    the one to maximise) the score. Integer and boolean inputs take their exact values.
 * 4. Decide. Let lower / upper be the least / greatest score over those points and
 *    τ = 2^-43 · S, S = max(1, |every finite input and score value seen|).
 *    certified  ⇔ every point lies in the domain and lower > τ (and nothing was numerical);
 *    holds      ⇔ upper < -τ;
 *    otherwise the margin is within what rounding can explain: "numerical only" when the float
 *    score is > 0, "holds (equality)" when it is <= 0 — an equality case is never certified.
 *
 * Why this bound is sound (under a stated model of the score). Let x* be the true input vector;
 * by step 2 it lies in the certified enclosure, well inside B (ρs exceeds the enclosure width
 * and the double rounding by a factor > 2^15). Model: (i) the score is a floating-point program
 * of at most K = 2^10 operations whose rounding is equivalent to a relative perturbation of
 * its real inputs by at most K·u = 2^-43 (u = 2^-53; backward stability, N. J. Higham,
 * "Accuracy and Stability of Numerical Algorithms", 2nd ed., SIAM 2002, §1.5 and §3.1) plus an
 * absolute error at most τ = K·u·S for the operations on exact inputs; (ii) on B the score is
 * monotone in each real input (B is a relative 2^-36 neighbourhood, so this fails only at a
 * stationary point or a discontinuity of the score). Under (ii) the least value of the exact
 * score over B is taken at the corner c* whose coordinates sit on the decreasing side of each
 * input, and the one-at-a-time evaluations identify that side. The float value at c* is, by
 * (i), the exact score at a point c~ within K·u·|c*| of c*; c~ still lies beyond x* in every
 * coordinate (2^-43 ≪ 2^-36), so by (ii) score(x*) >= score(c~) >= fl(score(c*)) - τ >= lower - τ.
 * Hence lower > τ proves score(x*) > 0. At an equality graph of a tight inequality the exact
 * score is 0 and its value across B changes sign (or stays within τ of 0 when it depends on
 * exact inputs only), so lower <= τ and it is not certified, whatever sign the float score
 * has. A genuine counterexample is certified when its margin exceeds about ρ·|∇score|·s + τ
 * (≈ 1e-11 for a score like λ1 - c).
 *
 * Near a stationary point of the score (where (ii) fails) the exact score varies over B only to
 * second order, about H (ρs)^2 / 2 for curvature H, which τ still absorbs while H s^2 < 2^29.
 *
 * What the model does not cover: a score that computes its own real quantities from g.graph,
 * g.edges or g.degree (only τ covers their rounding), or that scales a difference of exact
 * values by a huge constant. Such scores should read registry invariants instead.
 */
import { type Graph, edgeList } from '../graph/graph.js';
import { complement } from '../graph/builders.js';
import { encodeGraph6 } from '../graph/graph6.js';
import { type InvariantValue } from '../invariants/registry.js';
import { type Conjecture, type Evaluation, type GraphView } from '../conjecture/types.js';
import { evaluateOnView } from '../conjecture/evaluate.js';
import { createGraphView } from '../conjecture/view.js';
import { type CertifiedInvariant, ExactContext, certifyInvariant } from './certified-invariants.js';
import { type Enclosure } from './spectral-enclosures.js';
import { substitutedView } from './substituted-view.js';
import { midpoint, toDouble, toDoubleAbove, toDoubleBelow } from './rational.js';

/** Relative half-width of the box around each certified real input (ρ). */
export const BOX_RADIUS = 2 ** -36;
/** Relative rounding allowance of the score's own arithmetic (K·u, K = 2^10 operations). */
export const ROUNDING_ALLOWANCE = 2 ** -43;
/** Every corner is evaluated up to this many real inputs; above, the extreme corners only. */
export const MAX_FULL_CORNER_INPUTS = 6;
/** Width of eigenvalue enclosures: 2^-bits. */
export const DEFAULT_CERTIFICATION_BITS = 64;
/** Relative tolerance within which a registry float must agree with its certified interval. */
const FLOAT_AGREEMENT = 1e-6;

export type Verdict =
  'certified' | 'holds' | 'equality' | 'numerical-only' | 'outside-domain' | 'disagreement';

/** One input of the score, as certified, with the registry's float value beside it. */
export type CertifiedInput = CertifiedInvariant & {
  /** "name" or "complement.name". */
  readonly key: string;
  /** What the registry computed (the value the search saw). */
  readonly floatValue: InvariantValue | undefined;
};

export interface Certificate {
  readonly conjecture: string;
  readonly statement: string;
  readonly graph6: string;
  readonly order: number;
  readonly size: number;
  readonly edges: ReadonlyArray<readonly [number, number]>;
  readonly verdict: Verdict;
  /** verdict === 'certified'. */
  readonly certified: boolean;
  /** One sentence saying why. */
  readonly reason: string;
  /** The score from the registry's values (null outside the domain). */
  readonly floatScore: number | null;
  /** The score at the centre of the certified box (null outside the domain). */
  readonly centreScore: number | null;
  /** Least and greatest score over the evaluated points (null if some point was outside the domain or failed). */
  readonly lowerScore: number | null;
  readonly upperScore: number | null;
  /** τ. */
  readonly roundingBound: number;
  readonly boxRadius: number;
  readonly pointsEvaluated: number;
  readonly inputs: readonly CertifiedInput[];
  /** Keys of inputs whose value is numerical only. */
  readonly numerical: readonly string[];
  /** Inputs on which the registry and the second computation disagree. */
  readonly disagreements: readonly string[];
}

export interface CertifyOptions {
  /** Eigenvalue enclosures at most 2^-bits wide (default 64). */
  readonly bits?: number;
}

interface RealInput {
  readonly key: string;
  /** Entry of a list, or -1 for a scalar. */
  readonly index: number;
  readonly low: number;
  readonly high: number;
  readonly centre: number;
}

type PointResult = { ok: true; evaluation: Evaluation; magnitude: number } | { ok: false; message: string };

/** A comparable form of a value: bigints below 2^53 as numbers (the registry switches representation there). */
function normalise(v: unknown): string {
  return JSON.stringify(v, (_k, x: unknown) => {
    if (typeof x === 'bigint') return x <= BigInt(Number.MAX_SAFE_INTEGER) ? Number(x) : x.toString();
    if (typeof x === 'number' && !Number.isFinite(x)) return String(x);
    return x;
  });
}

function floatOf(view: GraphView, key: string): InvariantValue | undefined {
  const [target, name] = key.startsWith('complement.') ? [view.complement, key.slice(11)] : [view, key];
  try {
    return (target as unknown as Record<string, InvariantValue>)[name];
  } catch {
    return undefined;
  }
}

function agrees(e: Enclosure, x: number): boolean {
  if (!Number.isFinite(x)) return false;
  const lo = toDouble(e.lo);
  const hi = toDouble(e.hi);
  const tol = FLOAT_AGREEMENT * Math.max(1, Math.abs(lo), Math.abs(hi));
  return x >= lo - tol && x <= hi + tol;
}

function disagreementOf(c: CertifiedInput): string | undefined {
  if (c.status === 'exact') {
    if (normalise(c.value) !== normalise(c.floatValue)) {
      return `${c.key}: the registry gives ${normalise(c.floatValue)} but ${c.method} gives ${normalise(c.value)}`;
    }
  } else if (c.status === 'enclosed') {
    const floats = c.isList ? (c.floatValue as readonly number[]) : [c.floatValue as number];
    if (
      !Array.isArray(floats) ||
      floats.length !== c.enclosures.length ||
      !c.enclosures.every((e, i) => agrees(e, floats[i]))
    ) {
      return `${c.key}: the registry's float value ${normalise(c.floatValue)} lies outside the certified enclosure`;
    }
  }
  return undefined;
}

function realInputsOf(c: CertifiedInput): RealInput[] {
  if (c.status !== 'enclosed') return [];
  return c.enclosures.map((e, i) => {
    const loD = toDoubleBelow(e.lo);
    const hiD = toDoubleAbove(e.hi);
    const r = BOX_RADIUS * Math.max(1, Math.abs(loD), Math.abs(hiD));
    return {
      key: c.key,
      index: c.isList ? i : -1,
      low: loD - r,
      high: hiD + r,
      centre: toDouble(midpoint(e.lo, e.hi)),
    };
  });
}

/** Override values for one point: `choice[j]` is -1 (low), 0 (centre) or 1 (high) for real input j. */
function overridesAt(
  inputs: readonly CertifiedInput[],
  reals: readonly RealInput[],
  choice: readonly number[],
): Map<string, unknown> {
  const out = new Map<string, unknown>();
  for (const c of inputs) {
    if (c.status === 'exact') out.set(c.key, c.value);
    else if (c.status === 'enclosed' && c.isList) out.set(c.key, new Array<number>(c.enclosures.length));
  }
  reals.forEach((r, j) => {
    const x = choice[j] < 0 ? r.low : choice[j] > 0 ? r.high : r.centre;
    if (r.index < 0) out.set(r.key, x);
    else (out.get(r.key) as number[])[r.index] = x;
  });
  for (const v of out.values()) if (Array.isArray(v)) Object.freeze(v);
  return out;
}

function magnitudeOf(values: Iterable<unknown>, score: number | undefined): number {
  let s = 1;
  const see = (x: unknown): void => {
    if (typeof x === 'number' && Number.isFinite(x)) s = Math.max(s, Math.abs(x));
    else if (typeof x === 'bigint') s = Math.max(s, Math.abs(Number(x)));
    else if (Array.isArray(x)) x.forEach(see);
  };
  for (const v of values) see(v);
  if (score !== undefined) see(score);
  return s;
}

/** The points to evaluate: centre, all corners for few inputs, the extreme corners found one input at a time. */
function evaluatePoints(
  k: number,
  evaluate: (choice: number[]) => PointResult,
): { results: PointResult[]; centre: PointResult } {
  const centre = evaluate(new Array<number>(k).fill(0));
  const results: PointResult[] = [centre];
  if (k === 0) return { results, centre };
  const down = new Array<number>(k).fill(0);
  for (let j = 0; j < k; j++) {
    const at = (side: number): PointResult => {
      const choice = new Array<number>(k).fill(0);
      choice[j] = side;
      return evaluate(choice);
    };
    const lo = at(-1);
    const hi = at(1);
    results.push(lo, hi);
    const sl = lo.ok && lo.evaluation.inDomain ? lo.evaluation.score : NaN;
    const sh = hi.ok && hi.evaluation.inDomain ? hi.evaluation.score : NaN;
    down[j] = sh < sl ? 1 : -1; // the side on which the score decreases
  }
  results.push(evaluate(down), evaluate(down.map((d) => -d)));
  if (k <= MAX_FULL_CORNER_INPUTS) {
    for (let mask = 0; mask < 1 << k; mask++)
      results.push(evaluate(Array.from({ length: k }, (_, j) => ((mask >> j) & 1 ? 1 : -1))));
  }
  return { results, centre };
}

/**
 * The certificate of g against conjecture c: whether g refutes it beyond rounding, with every
 * value a referee needs to check that by hand. Throws the conjecture's own InputError when its
 * score fails on g (as evaluation does).
 */
export function certifyCounterexample(c: Conjecture, g: Graph, options: CertifyOptions = {}): Certificate {
  const bits = options.bits ?? DEFAULT_CERTIFICATION_BITS;
  const base = createGraphView(g);
  const reads = new Set<string>();
  const plain = evaluateOnView(c, g, substitutedView(base, new Map(), reads));
  const contexts = new Map<string, ExactContext>();
  const contextFor = (key: string): ExactContext => {
    const which = key.startsWith('complement.') ? 'complement' : 'graph';
    let ctx = contexts.get(which);
    if (ctx === undefined) {
      ctx = new ExactContext(which === 'graph' ? g : complement(g), bits);
      contexts.set(which, ctx);
    }
    return ctx;
  };
  const inputs: CertifiedInput[] = [];
  const known = new Set<string>();
  let outcome: { results: PointResult[]; centre: PointResult } | undefined;
  let reals: RealInput[] = [];
  // A score with branches may read further invariants at the corners: certify those too and redo.
  for (let round = 0; round < 8; round++) {
    for (const key of [...reads]) {
      if (known.has(key)) continue;
      known.add(key);
      const name = key.startsWith('complement.') ? key.slice(11) : key;
      const certified = certifyInvariant(contextFor(key), name);
      inputs.push({ ...certified, key, floatValue: floatOf(base, key) });
    }
    reals = inputs.flatMap(realInputsOf);
    const before = reads.size;
    outcome = evaluatePoints(reals.length, (choice) => {
      const overrides = overridesAt(inputs, reals, choice);
      try {
        const evaluation = evaluateOnView(c, g, substitutedView(base, overrides, reads));
        return {
          ok: true,
          evaluation,
          magnitude: magnitudeOf(overrides.values(), evaluation.inDomain ? evaluation.score : undefined),
        };
      } catch (err) {
        return { ok: false, message: err instanceof Error ? err.message : String(err) };
      }
    });
    if (reads.size === before) break;
  }
  // Invariants still first read in the last round were evaluated with registry values only.
  for (const key of reads) {
    if (known.has(key)) continue;
    inputs.push({
      name: key,
      status: 'unconfirmed',
      reason: 'read only at some certified points, after every round of certification',
      key,
      floatValue: floatOf(base, key),
    });
  }
  return decide(c, g, plain, inputs, outcome!);
}

function decide(
  c: Conjecture,
  g: Graph,
  plain: Evaluation,
  inputs: CertifiedInput[],
  outcome: { results: PointResult[]; centre: PointResult },
): Certificate {
  const disagreements = inputs.map(disagreementOf).filter((d): d is string => d !== undefined);
  const numerical = inputs.filter((i) => i.status === 'unconfirmed').map((i) => i.key);
  const { results, centre } = outcome;
  const failures = results.filter((r): r is { ok: false; message: string } => !r.ok);
  const evaluations = results.filter(
    (r): r is { ok: true; evaluation: Evaluation; magnitude: number } => r.ok,
  );
  const inDomain = evaluations.filter((r) => r.evaluation.inDomain).length;
  const scores = evaluations.flatMap((r) => (r.evaluation.inDomain ? [r.evaluation.score] : []));
  const tau = ROUNDING_ALLOWANCE * Math.max(1, ...evaluations.map((r) => r.magnitude));
  const allInside = failures.length === 0 && inDomain === results.length;
  const lower = allInside ? Math.min(...scores) : null;
  const upper = allInside ? Math.max(...scores) : null;
  const floatScore = plain.inDomain ? plain.score : null;
  const centreScore = centre.ok && centre.evaluation.inDomain ? centre.evaluation.score : null;

  let verdict: Verdict;
  let reason: string;
  const numericalNote = numerical.length > 0 ? ` (${numerical.join(', ')} numerical only)` : '';
  if (disagreements.length > 0) {
    verdict = 'disagreement';
    reason = `two computations of an invariant disagree: ${disagreements[0]}`;
  } else if (failures.length > 0) {
    verdict = 'numerical-only';
    reason = `the score cannot be evaluated throughout the certified box: ${failures[0].message}`;
  } else if (inDomain === 0) {
    verdict = 'outside-domain';
    reason = "the graph is outside the conjecture's domain (connected / where) at every certified point";
  } else if (inDomain < results.length) {
    verdict = 'numerical-only';
    reason =
      'whether the graph is in the domain (where) depends on rounding: it holds at some certified points and not at others';
  } else if (lower! > tau) {
    verdict = numerical.length > 0 ? 'numerical-only' : 'certified';
    reason =
      numerical.length > 0
        ? `the score is > 0 at every certified point, but ${numerical.join(', ')} could not be certified exactly`
        : `the score is at least ${lower} > τ = ${tau.toExponential(3)} at every point of the certified box`;
  } else if (upper! < -tau) {
    verdict = 'holds';
    reason = `the score is at most ${upper} < 0 at every point of the certified box${numericalNote}`;
  } else if ((floatScore ?? 0) > 0) {
    verdict = 'numerical-only';
    reason = `the float score ${floatScore} is > 0, but over the certified box it ranges over [${lower}, ${upper}], within rounding (τ = ${tau.toExponential(3)}) of 0: an equality case, not a counterexample one can trust`;
  } else {
    verdict = 'equality';
    reason = `holds (equality): over the certified box the score ranges over [${lower}, ${upper}], within rounding (τ = ${tau.toExponential(3)}) of 0`;
  }
  return {
    conjecture: c.name,
    statement: c.statement,
    graph6: encodeGraph6(g),
    order: g.order,
    size: g.size,
    edges: edgeList(g),
    verdict,
    certified: verdict === 'certified',
    reason,
    floatScore,
    centreScore,
    lowerScore: lower,
    upperScore: upper,
    roundingBound: tau,
    boxRadius: BOX_RADIUS,
    pointsEvaluated: results.length,
    inputs,
    numerical,
    disagreements,
  };
}

/** Whether g is a certified counterexample to c (the decision hunt, check, sweep and polish use). */
export function isCertifiedCounterexample(c: Conjecture, g: Graph, options: CertifyOptions = {}): boolean {
  return certifyCounterexample(c, g, options).certified;
}
