import { afterEach, describe, expect, it, vi } from 'vitest';
import { createGraphView, createTracingGraphView, memoOfView } from '../../src/conjecture/view.js';
import { UnknownInvariantError } from '../../src/conjecture/errors.js';
import {
  INVARIANTS,
  computeInvariant,
  invariantNames,
  type InvariantDefinition,
} from '../../src/invariants/registry.js';
import { InvariantDomainError } from '../../src/errors.js';
import { cycle, path, petersen, star, completeBipartite } from '../../src/graph/families.js';
import { fromEdges } from '../../src/graph/builders.js';
import { encodeGraph6 } from '../../src/graph/graph6.js';
import { graphsEqual } from '../../src/graph/graph.js';
import { type GraphView } from '../../src/conjecture/types.js';

/** Reads an invariant, treating "not defined on this graph" as a value. */
function read(view: GraphView, name: string): unknown {
  try {
    return (view as unknown as Record<string, unknown>)[name];
  } catch (err) {
    if (err instanceof InvariantDomainError) return 'undefined here';
    throw err;
  }
}

/** Spies on every registered compute function; returns the call counts by name. */
function countComputations(): Map<string, { mock: { calls: unknown[] } }> {
  const spies = new Map<string, { mock: { calls: unknown[] } }>();
  for (const def of INVARIANTS.values()) {
    spies.set(def.name, vi.spyOn(def as { compute: InvariantDefinition['compute'] }, 'compute'));
  }
  return spies;
}

afterEach(() => {
  vi.restoreAllMocks();
});

describe('createGraphView()', () => {
  it('computes each invariant at most once per graph, however often and in whatever order it is read', () => {
    const spies = countComputations();
    const view = createGraphView(petersen());
    const names = invariantNames();
    for (let round = 0; round < 3; round++)
      for (const name of round === 1 ? [...names].reverse() : names) read(view, name);
    for (const name of names) expect(spies.get(name)!.mock.calls.length, name).toBe(1);
  });

  it('gives every invariant the value the registry computes (fresh memo per call there)', () => {
    for (const g of [path(5), cycle(6), star(4), completeBipartite(2, 3), fromEdges(5, [[0, 1]])]) {
      const view = createGraphView(g);
      for (const name of invariantNames()) {
        let expected: unknown;
        try {
          expected = computeInvariant(g, name);
        } catch (err) {
          if (!(err instanceof InvariantDomainError)) throw err;
          expected = 'undefined here';
        }
        expect(read(view, name), `${name} of ${encodeGraph6(g)}`).toEqual(expected);
      }
    }
  });

  it('exposes n, m, hasEdge, neighbors, degree and edges (path P4: 0-1-2-3)', () => {
    const g = createGraphView(path(4));
    expect([g.n, g.m]).toEqual([4, 3]);
    expect(g.hasEdge(1, 2)).toBe(true);
    expect(g.hasEdge(0, 2)).toBe(false);
    expect(g.neighbors(1)).toEqual([0, 2]);
    expect([0, 1, 2, 3].map((v) => g.degree(v))).toEqual([1, 2, 2, 1]);
    expect(g.edges).toEqual([
      [0, 1],
      [1, 2],
      [2, 3],
    ]);
    // graph6 of P4 by hand: bits x01 x02 x12 x03 x13 x23 = 1 0 1 0 0 1 -> 41 + 63 = 'h'; n = 4 -> 'C'.
    expect(g.graph6).toBe('Ch');
    expect(String(g)).toBe('GraphView(Ch)');
  });

  it('rejects a vertex out of range with a message giving the range', () => {
    const g = createGraphView(path(4));
    expect(() => g.degree(4)).toThrow('g.degree: expected a vertex in 0..3 but found 4');
    expect(() => g.hasEdge(-1, 0)).toThrow(RangeError);
  });

  it('has the complement as a view, cached, whose complement is the view itself', () => {
    const g = createGraphView(cycle(5));
    const c = g.complement;
    // The complement of C5 is C5 (common knowledge): 5 edges, every degree 2.
    expect(c.m).toBe(5);
    expect(c.maxDegree).toBe(2);
    expect(c.isConnected).toBe(true);
    expect(g.complement).toBe(c);
    expect(c.complement).toBe(g);
    expect(
      graphsEqual(
        createGraphView(star(4)).complement.graph,
        fromEdges(4, [
          [1, 2],
          [1, 3],
          [2, 3],
        ]),
      ),
    ).toBe(true);
  });

  it('names the closest invariant when a property is not one', () => {
    const g = createGraphView(path(3));
    const read = () => (g as unknown as Record<string, unknown>).maxDegre;
    expect(read).toThrow(UnknownInvariantError);
    expect(read).toThrow('g.maxDegre is not an invariant; did you mean g.maxDegree?');
    expect(() => (g as unknown as Record<string, unknown>).componentcount).toThrow(
      'did you mean g.componentCount?',
    );
    expect(() => (g as unknown as Record<string, unknown>).zzzzzzzz).toThrow(
      /^g\.zzzzzzzz is not an invariant \(/,
    );
  });

  it('answers the probes of await, JSON and inspection with undefined instead of throwing', async () => {
    const g = createGraphView(path(3));
    const probe = g as unknown as Record<string | symbol, unknown>;
    expect(probe.then).toBeUndefined();
    expect(probe[Symbol.iterator]).toBeUndefined();
    expect('maxDegre' in g).toBe(false);
    expect('maxDegree' in g).toBe(true);
    await expect(Promise.resolve(g)).resolves.toBe(g);
  });

  it('leaves the memo empty until something is read', () => {
    const g = createGraphView(path(3));
    expect(memoOfView(g).has('maxDegree')).toBe(false);
    expect(g.maxDegree).toBe(2);
    expect(memoOfView(g).has('maxDegree')).toBe(true);
  });
});

describe('createTracingGraphView()', () => {
  it('records the invariants read directly, the complement\'s with a "complement." prefix', () => {
    const { view, reads } = createTracingGraphView(path(4));
    void view.maxDegree;
    void view.isTree; // reads componentCount internally: not a direct read
    void view.complement.minDegree;
    void view.complement.complement.size;
    void view.n;
    expect([...reads].sort()).toEqual(['complement.minDegree', 'isTree', 'maxDegree', 'size']);
  });
});
