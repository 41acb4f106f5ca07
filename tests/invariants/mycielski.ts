/**
 * Mycielski's construction (J. Mycielski, "Sur le coloriage des graphes", Colloquium
 * Mathematicum 3 (1955) 161–162): from G on v_0..v_{n−1}, add u_0..u_{n−1} and w, join u_i to
 * the neighbours of v_i and to w. It keeps the graph triangle-free and raises χ by one.
 */
import { fromEdges } from '../../src/graph/builders.js';
import { type Graph, edgeList } from '../../src/graph/graph.js';

export function mycielskian(g: Graph): Graph {
  const n = g.order;
  const edges: Array<[number, number]> = [];
  for (const [a, b] of edgeList(g)) edges.push([a, b], [n + a, b], [a, n + b]);
  for (let i = 0; i < n; i++) edges.push([n + i, 2 * n]);
  return fromEdges(2 * n + 1, edges);
}
