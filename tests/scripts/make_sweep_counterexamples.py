#!/usr/bin/python3
"""Writes tests/fixtures/sweep-counterexamples.json: for two false claims of our own (the
conjecture files in tests/fixtures/sweep/), every graph on 1..7 vertices that refutes them,
decided by networkx on networkx's graph atlas, independently of refute's generator, canonical
labelling and invariants.

- diameter-below-twice-radius: connected G, n >= 2, with diameter > 2 radius - 1 (that is,
  diameter = 2 radius);
- triangle-free-is-bipartite: G with no triangle that is not bipartite.

Graphs are written in networkx's graph6, grouped by order. Run with Debian's
/usr/bin/python3 and python3-networkx 2.8.8:

    /usr/bin/python3 tests/scripts/make_sweep_counterexamples.py
"""
import json
import os
import networkx as nx

here = os.path.dirname(os.path.abspath(__file__))
out = os.path.join(here, "..", "fixtures", "sweep-counterexamples.json")


def g6(g):
    return nx.to_graph6_bytes(g, header=False).decode("ascii").strip()


claims = {"diameter-below-twice-radius": {}, "triangle-free-is-bipartite": {}}
for g in nx.graph_atlas_g():
    n = g.number_of_nodes()
    if n == 0:
        continue
    key = str(n)
    for table in claims.values():
        table.setdefault(key, [])
    if n >= 2 and nx.is_connected(g) and nx.diameter(g) > 2 * nx.radius(g) - 1:
        claims["diameter-below-twice-radius"][key].append(g6(g))
    if sum(nx.triangles(g).values()) == 0 and not nx.is_bipartite(g):
        claims["triangle-free-is-bipartite"][key].append(g6(g))

with open(out, "w") as f:
    json.dump({"source": "networkx " + nx.__version__ + " graph_atlas_g()", "claims": claims}, f, indent=1)
    f.write("\n")
print("networkx", nx.__version__, "->", out)
