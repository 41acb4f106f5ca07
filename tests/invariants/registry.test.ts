import { describe, expect, test } from 'vitest';
import { INVARIANTS, InvariantMemo, invariantNames } from '../../src/invariants/registry.js';
import { invariantToJson, formatInvariant } from '../../src/invariants/encode.js';
import { petersen } from '../../src/graph/families.js';

describe('InvariantMemo', () => {
  test('InvariantMemo.shared() computes an intermediate product once', () => {
    const memo = new InvariantMemo(petersen());
    let calls = 0;
    const f = () => ++calls;
    memo.shared('x', f);
    memo.shared('x', f);
    expect(calls).toBe(1);
  });
  test('InvariantMemo.get() caches values and dependencies (wienerIndex brings transmissions)', () => {
    const memo = new InvariantMemo(petersen());
    expect(memo.has('transmissions')).toBe(false);
    expect(memo.get('wienerIndex')).toBe(75);
    expect(memo.has('transmissions')).toBe(true);
    expect(memo.get('wienerIndex')).toBe(memo.get('wienerIndex'));
  });
  test('InvariantMemo.get() rejects an unknown name', () => {
    expect(() => new InvariantMemo(petersen()).get('girt')).toThrow(
      "Expected a known invariant name but found 'girt'",
    );
  });
  test('every registered name is camelCase and has a kind and a description', () => {
    for (const name of invariantNames()) {
      expect(name).toMatch(/^[a-z][A-Za-z]*$/);
      const def = INVARIANTS.get(name)!;
      expect(['integer', 'real', 'boolean', 'integer-list', 'real-list']).toContain(def.kind);
      expect(def.description.length).toBeGreaterThan(3);
    }
  });
});

describe('encoding of values (shared/INVARIANTS.md conventions)', () => {
  test('invariantToJson() writes Infinity as a string and big integers as decimal strings', () => {
    expect(invariantToJson(Infinity)).toBe('Infinity');
    expect(invariantToJson([1, Infinity])).toEqual([1, 'Infinity']);
    expect(invariantToJson(2000n)).toBe(2000);
    expect(invariantToJson(2n ** 60n)).toBe('1152921504606846976');
  });
  test('formatInvariant() prints booleans as yes/no and reals to 10 significant digits', () => {
    expect(formatInvariant(true)).toBe('yes');
    expect(formatInvariant(1 / 3)).toBe('0.3333333333');
    expect(formatInvariant([2, 4.8e-16, -1])).toBe('2 0 -1');
  });
});
