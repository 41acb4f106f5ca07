import { describe, expect, test } from 'vitest';
import {
  type Candidate,
  distinctCount,
  mergeBest,
  rankCandidates,
  takeTop,
} from '../../src/search/selection.js';

const c = (key: string, score: number, inDomain = true): Candidate => ({
  bits: new Uint8Array(1),
  key,
  inDomain,
  score: inDomain ? score : -Infinity,
});

describe('selection', () => {
  test('rankCandidates() puts in-domain graphs first (even at -Infinity), then higher scores, ties in batch order', () => {
    const batch = [c('a', 1), c('out', 0, false), c('b', 3), c('c', -Infinity), c('d', 3), c('e', Infinity)];
    expect(rankCandidates(batch).map((x) => x.key)).toEqual(['e', 'b', 'd', 'a', 'c', 'out']);
  });

  test('takeTop() with distinct keeps the first copy of each key; without, copies count', () => {
    const ranked = [c('a', 5), c('a', 5), c('b', 4), c('a', 5), c('c', 1)];
    expect(takeTop(ranked, 3, true).map((x) => x.key)).toEqual(['a', 'b', 'c']);
    expect(takeTop(ranked, 3, false).map((x) => x.key)).toEqual(['a', 'a', 'b']);
    expect(distinctCount(ranked)).toBe(3);
  });

  test('mergeBest() keeps in-domain graphs only, distinct, best first, earlier entries winning ties', () => {
    const best = [c('x', 2), c('y', 1)];
    const merged = mergeBest(best, [c('z', 2), c('out', 0, false), c('y', 1), c('w', 3)], 3);
    expect(merged.map((x) => x.key)).toEqual(['w', 'x', 'z']);
  });
});
