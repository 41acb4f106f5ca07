#!/usr/bin/python3
"""Writes tests/fixtures/atlas-1-7.g6: every graph on 1..7 vertices, one per isomorphism class.

Source: networkx.graph_atlas_g() (Debian package python3-networkx), which lists the 1253 graphs
of R. C. Read and R. J. Wilson, "An Atlas of Graphs", Oxford University Press, 1998, on 0..7
vertices. The graph on 0 vertices is skipped (refute's graphs have n >= 1). Each line is
networkx's own graph6 encoding, so the fixture is independent of refute's codec.

Run: /usr/bin/python3 tests/scripts/make_atlas.py
"""
import os
import networkx as nx

here = os.path.dirname(os.path.abspath(__file__))
out = os.path.join(here, "..", "fixtures", "atlas-1-7.g6")
with open(out, "w") as f:
    for g in nx.graph_atlas_g():
        if g.number_of_nodes() == 0:
            continue
        f.write(nx.to_graph6_bytes(g, header=False).decode("ascii").strip() + "\n")
print("networkx", nx.__version__, "->", out)
