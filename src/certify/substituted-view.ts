/**
 * A graph view whose invariants can be replaced by given values, and that records which
 * invariants `where` and `score` read. Certification evaluates a conjecture through it, once
 * with the registry's values (to learn what the score reads) and then at the corners of the
 * certified boxes.
 *
 * It wraps the ordinary view of src/conjecture/view.ts in a Proxy: an invariant read is looked up
 * in the override table first (keys "name" for g, "complement.name" for g.complement), then
 * falls through to the view (registry value, computed once). Everything else (n, m, hasEdge,
 * unknown names and their errors) is the view's own behaviour.
 */
import { INVARIANTS } from '../invariants/registry.js';
import { type GraphView } from '../conjecture/types.js';

/** Override values by key ("spectralRadius", "complement.cliqueNumber"). */
export type Overrides = ReadonlyMap<string, unknown>;

/** A view of the same graph as `base` with the given invariants replaced; reads are added to `reads`. */
export function substitutedView(base: GraphView, overrides: Overrides, reads: Set<string>): GraphView {
  const views: { main?: GraphView; complement?: GraphView } = {};
  const wrap = (target: GraphView, prefix: '' | 'complement.'): GraphView =>
    new Proxy(target, {
      get(t, key) {
        if (typeof key === 'string') {
          if (INVARIANTS.has(key)) {
            const k = prefix + key;
            reads.add(k);
            if (overrides.has(k)) return overrides.get(k);
            return (t as unknown as Record<string, unknown>)[key];
          }
          if (key === 'complement') {
            // The complement of the complement is the graph itself, as in the plain view.
            if (prefix === '') return (views.complement ??= wrap(t.complement, 'complement.'));
            return views.main!;
          }
        }
        const value = Reflect.get(t, key, t) as unknown;
        return typeof value === 'function' ? (value as (...args: unknown[]) => unknown).bind(t) : value;
      },
    });
  views.main = wrap(base, '');
  return views.main;
}
