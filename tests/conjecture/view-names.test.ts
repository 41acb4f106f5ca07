import { describe, expect, it } from 'vitest';
import { GRAPH_INVARIANT_KINDS } from '../../src/conjecture/types.js';
import { INVARIANTS, invariantNames } from '../../src/invariants/registry.js';

// The GraphView type lists the names of shared/INVARIANTS.md; the registry is filled by several
// issues. This holds once all of them have landed: it is the check that nothing is missing.
describe('GraphInvariants', () => {
  it('lists exactly the names of the invariant registry', () => {
    expect(Object.keys(GRAPH_INVARIANT_KINDS).sort()).toEqual(invariantNames().sort());
  });

  it('gives each name the kind the registry gives it', () => {
    for (const [name, kind] of Object.entries(GRAPH_INVARIANT_KINDS)) {
      const def = INVARIANTS.get(name);
      if (def !== undefined) expect(def.kind, name).toBe(kind);
    }
  });
});
