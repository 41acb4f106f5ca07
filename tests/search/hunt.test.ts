import { beforeAll, describe, expect, test } from 'vitest';
import { startTensorflow, tf } from '../../src/search/backend.js';
import { decodeGraph6 } from '../../src/graph/graph6.js';
import { type Graph } from '../../src/graph/graph.js';
import { InvariantMemo } from '../../src/invariants/registry.js';
import { judgeCounterexample } from '../../src/search/counterexample.js';
import {
  type Evaluation,
  HUNT_DEFAULTS,
  type HuntOptions,
  type HuntState,
  initialHuntState,
  runIteration,
} from '../../src/search/hunt.js';
import { localBatchSource } from '../../src/search/local-source.js';
import { flattenWeights } from '../../src/search/policy.js';

beforeAll(async () => {
  await startTensorflow(1);
});

/** "Triangle-free graphs on 8 vertices have at most 15 edges": false by Mantel's theorem (K_{4,4} has 16). */
function mantelClaim(g: Graph): Evaluation {
  const memo = new InvariantMemo(g);
  if (memo.get('triangleCount') !== 0) return { inDomain: false };
  return { inDomain: true, score: g.size - 15.5 };
}

async function hunt(
  o: HuntOptions,
  iterations: number,
  evaluate: (g: Graph) => Evaluation,
): Promise<HuntState> {
  const source = localBatchSource(tf, o.seed, evaluate);
  let state = initialHuntState(o);
  for (let i = 0; i < iterations && state.counterexamples.length === 0; i++) {
    state = (await runIteration(tf, o, state, source, judgeCounterexample)).state;
  }
  return state;
}

const options: HuntOptions = {
  ...HUNT_DEFAULTS,
  seed: '1',
  order: 8,
  batch: 200,
  connected: false,
  explore: true,
};

describe('runIteration', () => {
  test('a small hunt refutes the Mantel-false claim with K_{4,4} (n=8, seed 1, at most 60 iterations)', async () => {
    const state = await hunt(options, 60, mantelClaim);
    expect(state.counterexamples.length).toBeGreaterThan(0);
    const g = decodeGraph6(state.counterexamples[0].key);
    const memo = new InvariantMemo(g);
    // Mantel's extremal graph is unique: a triangle-free graph with 16 edges on 8 vertices is K_{4,4},
    // which is bipartite and 4-regular.
    expect(g.size).toBe(16);
    expect(memo.get('triangleCount')).toBe(0);
    expect(memo.get('isBipartite')).toBe(true);
    expect(Array.from(g.degrees)).toEqual([4, 4, 4, 4, 4, 4, 4, 4]);
    expect(state.counterexamples[0].certification).toBe('numerical');
    // Nothing outside the domain is ever reported: every best-list graph is triangle-free.
    for (const c of state.best) expect(new InvariantMemo(decodeGraph6(c.key)).get('triangleCount')).toBe(0);
  });

  test('runIteration() leaves no tfjs tensors behind (an overnight run must not grow)', async () => {
    const source = localBatchSource(tf, 'leak', mantelClaim);
    let state = initialHuntState({ ...options, seed: 'leak' });
    state = (await runIteration(tf, options, state, source, judgeCounterexample)).state;
    const before = tf.memory().numTensors;
    for (let i = 0; i < 3; i++)
      state = (await runIteration(tf, options, state, source, judgeCounterexample)).state;
    expect(tf.memory().numTensors).toBe(before);
  });

  test('runIteration() is deterministic: the same seed twice gives the same pool, best list and weights', async () => {
    const a = await hunt({ ...options, seed: 'twice' }, 4, mantelClaim);
    const b = await hunt({ ...options, seed: 'twice' }, 4, mantelClaim);
    expect(a.best.map((c) => c.key)).toEqual(b.best.map((c) => c.key));
    expect(a.pool.map((c) => c.key)).toEqual(b.pool.map((c) => c.key));
    expect(
      Buffer.from(flattenWeights(a.weights).buffer).equals(Buffer.from(flattenWeights(b.weights).buffer)),
    ).toBe(true);
    const c = await hunt({ ...options, seed: 'other' }, 4, mantelClaim);
    expect(c.best.map((x) => x.key)).not.toEqual(a.best.map((x) => x.key));
  });

  test('with connected repair every fresh graph is in a connected-only domain, though most raw samples are not', async () => {
    // A sparse policy: output bias -2 gives p = 0.12, so a raw sample on 12 vertices is mostly disconnected.
    const o: HuntOptions = { ...options, order: 12, batch: 100, connected: true };
    const state0 = initialHuntState(o);
    state0.weights.biases[state0.weights.biases.length - 1][0] = -2;
    const connectedOnly = (g: Graph): Evaluation =>
      new InvariantMemo(g).get('isConnected') === true
        ? { inDomain: true, score: -g.size }
        : { inDomain: false };
    const { report } = await runIteration(
      tf,
      o,
      state0,
      localBatchSource(tf, o.seed, connectedOnly),
      judgeCounterexample,
    );
    expect(report.inDomainFraction).toBe(1);
    expect(report.repaired).toBeGreaterThan(50);
  });
});
