import { describe, expect, it } from 'vitest';
import { judge, checkExitStatus, ROUNDING_MARGIN } from '../../src/conjecture/verdict.js';
import { defineConjecture } from '../../src/conjecture/define.js';
import { path } from '../../src/graph/families.js';

const c = defineConjecture({ name: 'x', statement: 's', vertices: 3, score: () => 0 });
const g = path(3);

describe('judge()', () => {
  it('calls a positive score beyond the rounding margin a numerical refutation', () => {
    expect(judge(c, g, { inDomain: true, score: 0.5 })).toEqual({
      kind: 'refutes',
      certification: 'numerical',
    });
    expect(judge(c, g, { inDomain: true, score: Infinity }).kind).toBe('refutes');
  });

  it('calls |score| <= the margin tight: a true theorem tight on g may score +1e-15 by rounding', () => {
    expect(judge(c, g, { inDomain: true, score: 0 }).kind).toBe('tight');
    expect(judge(c, g, { inDomain: true, score: 4e-16 }).kind).toBe('tight');
    expect(judge(c, g, { inDomain: true, score: ROUNDING_MARGIN }).kind).toBe('tight');
    expect(judge(c, g, { inDomain: true, score: -ROUNDING_MARGIN }).kind).toBe('tight');
  });

  it('calls a negative score beyond the margin holds, and the outside of the domain so', () => {
    expect(judge(c, g, { inDomain: true, score: -1 })).toEqual({ kind: 'holds', certification: null });
    expect(judge(c, g, { inDomain: true, score: -Infinity }).kind).toBe('holds');
    expect(judge(c, g, { inDomain: false })).toEqual({ kind: 'outside-domain', certification: null });
  });
});

describe('checkExitStatus()', () => {
  it('is 0 (grep convention: found) with a refutation and 1 without', () => {
    expect(checkExitStatus(3)).toBe(0);
    expect(checkExitStatus(0)).toBe(1);
  });
});
