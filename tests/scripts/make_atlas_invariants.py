#!/usr/bin/python3
"""Writes tests/fixtures/atlas-invariants.json: reference values of refute's exact invariants for
every graph of tests/fixtures/atlas-1-7.g6 (all graphs on 1..7 vertices), computed by networkx
(Debian's python3-networkx) and numpy, independently of refute.

Per graph (keyed by its graph6 line, decoded here by networkx):
  matchingNumber       len(nx.max_weight_matching(G, maxcardinality=True))
  cliqueNumber         largest maximal clique of nx.find_cliques(G)
  independenceNumber   the same on nx.complement(G)
  vertexConnectivity   nx.node_connectivity(G)
  edgeConnectivity     nx.edge_connectivity(G)
  bridgeCount          len(list(nx.bridges(G)))
  cutVertexCount       len(list(nx.articulation_points(G)))
  spanningTreeCount    numpy determinant of the reduced Laplacian, rounded (checked to be within
                       1e-6 of an integer; the values here are below 17000, far inside double range)
  distanceSpectrum, distanceLaplacianSpectrum
                       numpy.linalg.eigvalsh of nx.floyd_warshall_numpy(G) and of Tr - D, sorted
                       non-increasing, rounded to 12 decimals; null for disconnected graphs.
Chromatic and domination numbers are not here: networkx has no exact routine for them, so the
tests compare against a brute-force oracle instead.

Run: /usr/bin/python3 tests/scripts/make_atlas_invariants.py
"""
import json
import os

import networkx as nx
import numpy as np

here = os.path.dirname(os.path.abspath(__file__))
src = os.path.join(here, "..", "fixtures", "atlas-1-7.g6")
out = os.path.join(here, "..", "fixtures", "atlas-invariants.json")


def clique_number(G):
    return max(len(c) for c in nx.find_cliques(G))


def spanning_tree_count(G):
    n = G.number_of_nodes()
    if n == 1:
        return 1
    if not nx.is_connected(G):
        return 0
    L = nx.laplacian_matrix(G, nodelist=range(n)).toarray().astype(float)
    d = np.linalg.det(L[:-1, :-1])
    r = int(round(d))
    assert abs(d - r) < 1e-6, (d, r)
    return r


def spectrum(M):
    return [round(float(x), 12) + 0.0 for x in sorted(np.linalg.eigvalsh(M), reverse=True)]


records = []
with open(src) as f:
    for line in f:
        line = line.strip()
        if not line:
            continue
        G = nx.from_graph6_bytes(line.encode("ascii"))
        n = G.number_of_nodes()
        rec = {
            "graph6": line,
            "order": n,
            "matchingNumber": len(nx.max_weight_matching(G, maxcardinality=True)),
            "cliqueNumber": clique_number(G),
            "independenceNumber": clique_number(nx.complement(G)),
            "vertexConnectivity": nx.node_connectivity(G),
            "edgeConnectivity": nx.edge_connectivity(G),
            "bridgeCount": len(list(nx.bridges(G))),
            "cutVertexCount": len(list(nx.articulation_points(G))),
            "spanningTreeCount": spanning_tree_count(G),
        }
        if nx.is_connected(G):
            D = nx.floyd_warshall_numpy(G, nodelist=range(n))
            rec["distanceSpectrum"] = spectrum(D)
            rec["distanceLaplacianSpectrum"] = spectrum(np.diag(D.sum(axis=1)) - D)
        else:
            rec["distanceSpectrum"] = None
            rec["distanceLaplacianSpectrum"] = None
        records.append(rec)

with open(out, "w") as f:
    json.dump({"source": "networkx %s, numpy %s" % (nx.__version__, np.__version__), "graphs": records}, f, indent=None)
    f.write("\n")
print("networkx", nx.__version__, "numpy", np.__version__, "->", out, len(records), "graphs")
