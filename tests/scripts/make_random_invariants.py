#!/usr/bin/python3
"""Writes tests/fixtures/random-invariants.json: invariants of 240 seeded random graphs, computed
by general-purpose libraries independent of refute.

Sources: networkx (Debian python3-networkx) for graph6, components, bipartiteness, distances,
Wiener index, triangles; numpy.linalg.eigvalsh (Debian python3-numpy, LAPACK) for the spectra of
A, L = D - A, Q = D + A and networkx's normalized Laplacian. Girth and the degree indices are
computed here from their textbook definitions, by code that shares nothing with refute's.
Graphs: G(n, p) (networkx.gnp_random_graph) for n in 1..30 and p in {0.05, 0.15, 0.3, 0.5, 0.8},
seeded, so the fixture is reproducible with the same library versions.

Run: /usr/bin/python3 tests/scripts/make_random_invariants.py
"""
import itertools
import json
import math
import os
import random

import networkx as nx
import numpy as np


def girth(g):
    best = math.inf
    for s in g.nodes:
        dist = {s: 0}
        parent = {s: None}
        queue = [s]
        for u in queue:
            for v in g[u]:
                if v not in dist:
                    dist[v] = dist[u] + 1
                    parent[v] = u
                    queue.append(v)
                elif parent[u] != v:
                    best = min(best, dist[u] + dist[v] + 1)
    return best


def inf(x):
    return "Infinity" if x == math.inf else x


def eig(m):
    return sorted((float(x) for x in np.linalg.eigvalsh(np.asarray(m, dtype=float))), reverse=True) if len(m) else []


def record(g):
    n = g.number_of_nodes()
    a = nx.to_numpy_array(g, nodelist=range(n))
    deg = a.sum(axis=1)
    connected = n > 0 and nx.is_connected(g)
    out = {
        "graph6": nx.to_graph6_bytes(g, nodes=range(n), header=False).decode().strip(),
        "edges": sorted([min(u, v), max(u, v)] for u, v in g.edges),
        "order": n,
        "size": g.number_of_edges(),
        "degreeSequence": sorted((int(d) for d in deg), reverse=True),
        "componentCount": nx.number_connected_components(g),
        "isConnected": connected,
        "isBipartite": nx.is_bipartite(g),
        "isTree": nx.is_tree(g),
        "isForest": nx.is_forest(g),
        "girth": inf(girth(g)),
        "triangleCount": sum(nx.triangles(g).values()) // 3,
        "adjacencySpectrum": eig(a),
        "laplacianSpectrum": eig(np.diag(deg) - a),
        "signlessLaplacianSpectrum": eig(np.diag(deg) + a),
        "normalizedLaplacianSpectrum": eig(nx.normalized_laplacian_matrix(g, nodelist=range(n)).toarray()),
        "randicIndex": sum(1 / math.sqrt(deg[u] * deg[v]) for u, v in g.edges),
        "harmonicIndex": sum(2 / (deg[u] + deg[v]) for u, v in g.edges),
        "firstZagrebIndex": int(sum(d * d for d in deg)),
        "secondZagrebIndex": int(sum(deg[u] * deg[v] for u, v in g.edges)),
    }
    if connected:
        ecc = nx.eccentricity(g)
        trans = [sum(nx.single_source_shortest_path_length(g, v).values()) for v in range(n)]
        out.update(
            diameter=max(ecc.values()),
            radius=min(ecc.values()),
            wienerIndex=int(nx.wiener_index(g)),
            transmissions=trans,
        )
    else:
        out.update(diameter="Infinity", radius="Infinity", wienerIndex="Infinity", transmissions=["Infinity"] * n)
    return out


rng = random.Random(20261201)
graphs = []
for n, p in itertools.product(range(1, 31), [0.05, 0.15, 0.3, 0.5, 0.8]):
    if rng.random() < 0.6 or n <= 3:
        graphs.append(record(nx.gnp_random_graph(n, p, seed=rng.randrange(2**31))))
while len(graphs) < 240:
    n = rng.randrange(4, 31)
    graphs.append(record(nx.gnp_random_graph(n, rng.choice([0.1, 0.4, 0.7]), seed=rng.randrange(2**31))))

here = os.path.dirname(os.path.abspath(__file__))
path = os.path.join(here, "..", "fixtures", "random-invariants.json")
with open(path, "w") as f:
    json.dump({"source": f"networkx {nx.__version__}, numpy {np.__version__}", "graphs": graphs}, f, indent=0)
print(len(graphs), "graphs ->", path)
