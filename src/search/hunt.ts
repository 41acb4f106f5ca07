/**
 * One iteration of the hunt, the cross-entropy method with a neural policy: sample a batch,
 * repair it (connected conjectures), score it, rank it with the carried-over pool, train the
 * policy one epoch on the elite, keep the best for the next batch, and watch for collapse.
 *
 * The iteration is a function of (options, state, iteration number): every random draw comes
 * from a stream keyed by the seed and the iteration (see random.ts), so a run is reproduced by
 * replaying from any saved state, which is what checkpoints and `refute resume` rely on.
 */
import { fromUpperTriangleBits } from '../graph/builders.js';
import { type Graph } from '../graph/graph.js';
import { type TfModule } from './backend.js';
import {
  COLLAPSE_DEFAULTS,
  type CollapseAction,
  type CollapseSettings,
  type CollapseState,
  FRESH_COLLAPSE_STATE,
  collapseStep,
} from './collapse.js';
import { connectComponentsInPlace } from './connect-repair.js';
import { lazyKey } from './graph-key.js';
import { encodeGraph6 } from '../graph/graph6.js';
import {
  type PolicyShape,
  type PolicyWeights,
  initialWeights,
  pairCount,
  parameterCount,
  perturbedWeights,
} from './policy.js';
import { iterationRng } from './random.js';
import { type SampledBatch } from './sampler.js';
import { type Candidate, mergeBest, rankCandidates, takeTop } from './selection.js';
import { ADAM_DEFAULTS, type OptimizerState, freshOptimizerState, trainEpoch } from './training.js';
import {
  HUNT_POLISH_DEFAULTS,
  type HuntNearMiss,
  type HuntPolishSettings,
  polishDue,
  polishIteration,
} from './polish/hunt-bridge.js';

/** The result of evaluating a conjecture on one graph (same shape as the conjecture module's). */
export type Evaluation = { readonly inDomain: false } | { readonly inDomain: true; readonly score: number };

/** How a graph counts: a counterexample of the given certification, or not (null). */
export type CounterexampleJudge = (g: Graph, evaluation: Evaluation) => 'numerical' | 'certified' | null;

/** Where batches come from and how they are scored (in-process, or spread over worker threads). */
export interface BatchSource {
  sample(weights: PolicyWeights, iteration: number, count: number, clamp: number): Promise<SampledBatch>;
  /** Evaluations of `count` graphs given by their decisions (count x N bits). */
  evaluate(order: number, bits: Uint8Array, count: number): Promise<Evaluation[]>;
  /** Releases threads or tensors. */
  close?(): Promise<void>;
}

export interface HuntOptions {
  readonly seed: string;
  readonly order: number;
  readonly hidden: readonly number[];
  /** Fresh samples per iteration. */
  readonly batch: number;
  /** Fraction of the batch trained on. */
  readonly elite: number;
  /** Fraction of the batch carried over unchanged. */
  readonly keep: number;
  readonly learningRate: number;
  /** Whole graphs per training minibatch. */
  readonly trainGraphs: number;
  /** Repair disconnected samples (the conjecture counts connected graphs only). */
  readonly connected: boolean;
  /**
   * Collapse handling: distinct pool, clamped probabilities, perturbation and restart.
   * Off gives the plain method, kept for comparison (tests/bench/iteration.bench.ts).
   */
  readonly explore: boolean;
  /** Length of the best-ever list (best.g6). */
  readonly bestCapacity: number;
  readonly collapse: CollapseSettings;
  /** Polishing of the batch's best graphs every `polish.every` iterations (src/search/polish). */
  readonly polish: HuntPolishSettings;
}

export const HUNT_DEFAULTS = {
  hidden: [128, 64, 4] as readonly number[],
  batch: 1000,
  elite: 0.07,
  keep: 0.06,
  learningRate: 0.003,
  trainGraphs: 8,
  explore: true,
  bestCapacity: 20,
  collapse: COLLAPSE_DEFAULTS,
  polish: HUNT_POLISH_DEFAULTS,
};

/** Probability clamp when exploring: about one off-policy decision every two graphs. */
export function explorationClamp(order: number): number {
  return 0.5 / Math.max(1, pairCount(order));
}

/** A counterexample as the run records it. */
export interface CounterexampleRecord {
  /** graphKey of the graph (canonical graph6 once canonical labelling is in). */
  readonly key: string;
  readonly score: number;
  readonly certification: 'numerical' | 'certified';
}

export interface HuntState {
  /** The next iteration to run (0 for a fresh run). */
  readonly iteration: number;
  readonly weights: PolicyWeights;
  readonly optimizer: OptimizerState;
  /** Carried over into the next batch, best first. */
  readonly pool: readonly Candidate[];
  /** Best in-domain graphs ever seen, distinct, best first. */
  readonly best: readonly Candidate[];
  /** The counterexamples found so far, in order of discovery. */
  readonly counterexamples: readonly CounterexampleRecord[];
  readonly collapse: CollapseState;
  /** Best graph polishing found at each other order ("near misses at order n±k"). */
  readonly nearMisses: readonly HuntNearMiss[];
}

export function policyShape(o: HuntOptions): PolicyShape {
  return { order: o.order, hidden: o.hidden };
}

export function initialHuntState(o: HuntOptions): HuntState {
  const shape = policyShape(o);
  return {
    iteration: 0,
    weights: initialWeights(shape, iterationRng(o.seed, 'init', 0)),
    optimizer: freshOptimizerState(parameterCount(shape)),
    pool: [],
    best: [],
    counterexamples: [],
    collapse: FRESH_COLLAPSE_STATE,
    nearMisses: [],
  };
}

export interface IterationReport {
  readonly iteration: number;
  /** Best score ever (in domain), -Infinity when nothing in the domain was seen yet. */
  readonly best: number;
  /** Mean score of the elite's in-domain graphs. */
  readonly eliteMean: number;
  readonly distinctFraction: number;
  readonly meanEntropy: number;
  readonly inDomainFraction: number;
  readonly repaired: number;
  readonly trainingLoss: number;
  readonly collapsed: boolean;
  readonly action: CollapseAction;
  /** Counterexamples first seen in this iteration, in batch order. */
  readonly newCounterexamples: readonly CounterexampleRecord[];
  /** This iteration's polish: graphs improved and graphs scored (null when none was due). */
  readonly polish: { readonly improved: number; readonly evaluations: number } | null;
  /** Wall-clock milliseconds per phase (not part of the deterministic state). */
  readonly timings: { generate: number; score: number; select: number; train: number };
}

/** Runs iteration `state.iteration` and returns the next state and a report. */
export async function runIteration(
  tf: TfModule,
  o: HuntOptions,
  state: HuntState,
  source: BatchSource,
  judge: CounterexampleJudge,
  /** Synchronous scoring for the polisher; without it no polish runs. */
  polishEvaluate?: (g: Graph) => Evaluation,
): Promise<{ state: HuntState; report: IterationReport }> {
  const t = state.iteration;
  const n = pairCount(o.order);
  const clamp = o.explore ? explorationClamp(o.order) : 0;

  let t0 = performance.now();
  const sampled = await source.sample(state.weights, t, o.batch, clamp);
  const bits = sampled.bits;
  let repaired = 0;
  if (o.connected) {
    for (let b = 0; b < o.batch; b++) if (connectComponentsInPlace(o.order, bits, b * n) > 0) repaired++;
  }
  const tGenerate = performance.now() - t0;

  t0 = performance.now();
  const evaluations = await source.evaluate(o.order, bits, o.batch);
  const fresh: Candidate[] = [];
  const freshGraphs: Graph[] = [];
  const labelled = new Set<string>();
  let inDomain = 0;
  for (let b = 0; b < o.batch; b++) {
    const own = bits.slice(b * n, (b + 1) * n);
    const g = fromUpperTriangleBits(o.order, own);
    const e = evaluations[b];
    if (e.inDomain) inDomain++;
    freshGraphs.push(g);
    labelled.add(encodeGraph6(g));
    const key = lazyKey(g);
    fresh.push({
      bits: own,
      get key() {
        return key();
      },
      inDomain: e.inDomain,
      score: e.inDomain ? e.score : -Infinity,
    });
  }
  const tScore = performance.now() - t0;

  t0 = performance.now();
  const rankedBatch = rankCandidates([...state.pool, ...fresh]);
  // Polishing: improved graphs join the ranking (so the pool, the elite and the best-ever list);
  // finds at other orders are kept apart as near misses.
  const polished =
    polishEvaluate !== undefined && polishDue(t, o.polish.every)
      ? polishIteration(
          polishEvaluate,
          judge,
          rankedBatch,
          state.nearMisses,
          o.order,
          o.seed,
          t,
          o.polish,
          o.connected,
        )
      : undefined;
  const ranked =
    polished !== undefined && polished.candidates.length > 0
      ? rankCandidates([...polished.candidates, ...rankedBatch])
      : rankedBatch;
  const eliteCount = Math.max(1, Math.round(o.elite * o.batch));
  const keepCount = Math.round(o.keep * o.batch);
  // Right after a perturbation or restart the elite comes from fresh samples only (collapse.ts).
  const eliteFrom = o.explore && state.collapse.freshOnly > 0 ? rankCandidates(fresh) : ranked;
  // The elite keeps duplicates (the policy should learn what is best, as often as it is best);
  // the carried pool is distinct, so that it does not fill with copies of one near miss.
  const elite = takeTop(eliteFrom, eliteCount, false);
  const pool = takeTop(ranked, keepCount, o.explore);
  const previousBest = state.best.length > 0 ? state.best[0].score : -Infinity;
  const best = mergeBest(state.best, ranked, o.bestCapacity);
  const bestScore = best.length > 0 ? best[0].score : -Infinity;
  const improved = bestScore > previousBest;
  const known = new Set(state.counterexamples.map((c) => c.key));
  const newCounterexamples: CounterexampleRecord[] = [];
  for (let b = 0; b < o.batch; b++) {
    const c = fresh[b];
    if (!c.inDomain) continue;
    const verdict = judge(freshGraphs[b], evaluations[b]);
    if (verdict === null || known.has(c.key)) continue;
    known.add(c.key);
    newCounterexamples.push({ key: c.key, score: c.score, certification: verdict });
  }
  polished?.candidates.forEach((c, i) => {
    const verdict = judge(polished.graphs[i], { inDomain: true, score: c.score });
    if (verdict === null || known.has(c.key)) return;
    known.add(c.key);
    newCounterexamples.push({ key: c.key, score: c.score, certification: verdict });
  });
  const distinctFraction = labelled.size / o.batch;
  let eliteSum = 0;
  let eliteInDomain = 0;
  for (const c of elite) {
    if (c.inDomain) {
      eliteSum += c.score;
      eliteInDomain++;
    }
  }
  const tSelect = performance.now() - t0;

  t0 = performance.now();
  const eliteBits = new Uint8Array(elite.length * n);
  elite.forEach((c, i) => eliteBits.set(c.bits, i * n));
  const adam = { ...ADAM_DEFAULTS, learningRate: o.learningRate };
  const trained = trainEpoch(
    tf,
    state.weights,
    state.optimizer,
    eliteBits,
    adam,
    o.trainGraphs,
    iterationRng(o.seed, 'train', t),
  );
  let weights = trained.weights;
  let optimizer = trained.optimizer;
  let collapse = state.collapse;
  let action: CollapseAction = 'none';
  let collapsed = false;
  if (o.explore) {
    const step = collapseStep(
      state.collapse,
      { distinctFraction, meanEntropy: sampled.meanEntropy, improved },
      o.collapse,
    );
    collapse = step.state;
    action = step.action;
    collapsed = step.collapsed;
    if (action === 'perturb') {
      weights = perturbedWeights(weights, o.collapse.perturbScale, iterationRng(o.seed, 'perturb', t));
      optimizer = freshOptimizerState(parameterCount(weights.shape));
    } else if (action === 'restart') {
      weights = initialWeights(weights.shape, iterationRng(o.seed, 'restart', t));
      optimizer = freshOptimizerState(parameterCount(weights.shape));
    }
  }
  const tTrain = performance.now() - t0;

  const next: HuntState = {
    iteration: t + 1,
    weights,
    optimizer,
    pool,
    best,
    counterexamples: [...state.counterexamples, ...newCounterexamples],
    collapse,
    nearMisses: polished?.nearMisses ?? state.nearMisses,
  };
  return {
    state: next,
    report: {
      iteration: t,
      best: bestScore,
      eliteMean: eliteInDomain > 0 ? eliteSum / eliteInDomain : -Infinity,
      distinctFraction,
      meanEntropy: sampled.meanEntropy,
      inDomainFraction: inDomain / o.batch,
      repaired,
      trainingLoss: trained.meanLoss,
      collapsed,
      action,
      newCounterexamples,
      polish:
        polished === undefined ? null : { improved: polished.improved, evaluations: polished.evaluations },
      timings: { generate: tGenerate, score: tScore, select: tSelect, train: tTrain },
    },
  };
}
