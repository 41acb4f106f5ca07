/**
 * A random spanning tree of a graph, for restarting a walk that cannot find the conjecture's
 * domain: trees are connected and satisfy the usual restrictions (triangle-free, bipartite,
 * large girth), and a spanning tree keeps part of the structure the walk had reached.
 *
 * Randomised Kruskal: the edges in a seeded random order, each kept when it joins two
 * components (J. B. Kruskal, "On the shortest spanning subtree of a graph and the traveling
 * salesman problem", Proc. AMS 7 (1956) 48–50), union-find with path halving and union by size
 * (R. E. Tarjan and J. van Leeuwen, "Worst-case analysis of set union algorithms", J. ACM 31
 * (1984) 245–281). A disconnected graph's components are then joined by random pairs, so the
 * result is always a tree on all the vertices.
 */
import { fromEdges } from '../../graph/builders.js';
import { edgeList, type Graph } from '../../graph/graph.js';
import { randomIndex, randomOrder } from './random-order.js';

export function randomSpanningTree(g: Graph, rng: () => number): Graph {
  const n = g.order;
  const parent = new Int32Array(n);
  const size = new Int32Array(n).fill(1);
  for (let v = 0; v < n; v++) parent[v] = v;
  const find = (v: number): number => {
    while (parent[v] !== v) {
      parent[v] = parent[parent[v]];
      v = parent[v];
    }
    return v;
  };
  const union = (a: number, b: number): boolean => {
    let ra = find(a);
    let rb = find(b);
    if (ra === rb) return false;
    if (size[ra] < size[rb]) [ra, rb] = [rb, ra];
    parent[rb] = ra;
    size[ra] += size[rb];
    return true;
  };
  const edges = edgeList(g);
  const tree: Array<[number, number]> = [];
  for (const i of randomOrder(edges.length, rng)) {
    if (union(edges[i][0], edges[i][1])) tree.push(edges[i]);
  }
  // Join the components, in order of their smallest vertex, each by a random pair.
  const components = new Map<number, number[]>();
  for (let v = 0; v < n; v++) {
    const r = find(v);
    const members = components.get(r);
    if (members === undefined) components.set(r, [v]);
    else members.push(v);
  }
  const [first, ...rest] = [...components.values()];
  const joined = first === undefined ? [] : [...first];
  for (const members of rest) {
    const u = joined[randomIndex(joined.length, rng)];
    const v = members[randomIndex(members.length, rng)];
    tree.push([u, v]);
    joined.push(...members);
  }
  return fromEdges(n, tree);
}
