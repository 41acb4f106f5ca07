/**
 * Every built-in family (src/graph/families.ts) at every order 1..N, for `refute check
 * --families`: the first graphs a conjecture should meet, since extremal results are so often
 * tight on them. Each member comes with a label such as "lollipop(4,3)" that rebuilds it.
 *
 * A parameter range starts where the family stops coinciding with an earlier one as a labelled
 * graph of the same kind (star(3) is a path, complete(3) is cycle(3), wheel(4) is K4, K_{1,b} is a star, T(n,2) is
 * K_{⌊n/2⌋,⌈n/2⌉}, Q_2 is C4), so the list repeats few graphs; isomorphic members of different
 * families (ladder(2) and cycle(4)) are not removed. Order n = 1..N in turn, families in a
 * fixed order: the output is deterministic.
 */
import { type Graph } from '../graph/graph.js';
import * as F from '../graph/families.js';

/** A family member and the call that builds it. */
export interface FamilyMember {
  readonly label: string;
  readonly graph: Graph;
}

/** The members of every built-in family on exactly n vertices. */
export function* familyMembersOfOrder(n: number): Generator<FamilyMember> {
  yield { label: `emptyGraph(${n})`, graph: F.emptyGraph(n) };
  if (n >= 2) yield { label: `path(${n})`, graph: F.path(n) };
  if (n >= 3) yield { label: `cycle(${n})`, graph: F.cycle(n) };
  if (n >= 4) yield { label: `star(${n})`, graph: F.star(n) };
  if (n >= 4) yield { label: `complete(${n})`, graph: F.complete(n) };
  for (let a = 2; 2 * a <= n; a++)
    yield { label: `completeBipartite(${a},${n - a})`, graph: F.completeBipartite(a, n - a) };
  for (let r = 3; r < n; r++) yield { label: `turan(${n},${r})`, graph: F.turan(n, r) };
  if (n >= 5) yield { label: `wheel(${n})`, graph: F.wheel(n) };
  for (let d = 3; 1 << d <= n; d++)
    if (1 << d === n) yield { label: `hypercube(${d})`, graph: F.hypercube(d) };
  if (n === 10) yield { label: 'petersen()', graph: F.petersen() };
  if (n >= 5 && n % 2 === 1) yield { label: `friendship(${(n - 1) / 2})`, graph: F.friendship((n - 1) / 2) };
  for (let k = 3; k < n; k++) yield { label: `lollipop(${k},${n - k})`, graph: F.lollipop(k, n - k) };
  for (let k = 3; 2 * k <= n; k++)
    yield { label: `barbell(${k},${n - 2 * k})`, graph: F.barbell(k, n - 2 * k) };
  for (let p = 3; p + 2 <= n; p++) yield { label: `broom(${p},${n - p})`, graph: F.broom(p, n - p) };
  if (n >= 6 && n % 2 === 0) yield { label: `prism(${n / 2})`, graph: F.prism(n / 2) };
  if (n >= 6 && n % 2 === 0) yield { label: `ladder(${n / 2})`, graph: F.ladder(n / 2) };
}

/** The members of every built-in family on 1..maxVertices vertices, by order. */
export function* familyMembers(maxVertices: number): Generator<FamilyMember> {
  for (let n = 1; n <= maxVertices; n++) yield* familyMembersOfOrder(n);
}
