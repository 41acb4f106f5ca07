#!/usr/bin/python3
"""Writes tests/fixtures/score-references.json: reference values for the example conjectures of
scores/, computed with networkx 2.8.8 and numpy 1.24 (Debian packages), independently of refute.

For every graph of tests/fixtures/atlas-1-7.g6 (in file order) it records, for connected graphs,
the score of each example in scoreNames order (null for disconnected graphs, which the examples
exclude, and for lambda2 on one vertex), and its maximum degree (for tests/cli/check.test.ts):
  spectral-radius-near-average-degree: lambda1 - 2m/n - 1
  second-eigenvalue-vs-matching:       lambda2 - nu          (nu: networkx max_weight_matching)
  hong-spectral-radius-bound:          lambda1 - sqrt(2m - n + 1)
  second-eigenvalue-vs-complement-degree: lambda2 - (n - 1 - 2m/n)
Eigenvalues by numpy.linalg.eigvalsh of the adjacency matrix. It also records the largest score
of each example over networkx's own builds of the standard families on 2..20 vertices (paths,
cycles, stars, complete, complete bipartite, Turan, wheels, hypercubes, Petersen, friendship,
lollipops, barbells, brooms, prisms, ladders), and lambda2 and nu of the two-star trees T(a, b)
of scores/second-eigenvalue-vs-matching.ts, and lambda2 of K_n minus the edges of a star K_{1,k}
or of a 4-cycle (scores/second-eigenvalue-vs-complement-degree.ts).

Run: /usr/bin/python3 tests/scripts/make_score_references.py
"""
import json
import math
import os

import networkx as nx
import numpy as np

here = os.path.dirname(os.path.abspath(__file__))
fixtures = os.path.join(here, "..", "fixtures")


def spectrum(g):
    a = nx.to_numpy_array(g, nodelist=sorted(g.nodes()))
    return sorted(np.linalg.eigvalsh(a), reverse=True)


NAMES = [
    "spectral-radius-near-average-degree",
    "second-eigenvalue-vs-matching",
    "hong-spectral-radius-bound",
    "second-eigenvalue-vs-complement-degree",
]


def scores(g):
    """The three scores in NAMES order (lambda2 undefined, None, for n = 1)."""
    n, m = g.number_of_nodes(), g.number_of_edges()
    ev = spectrum(g)
    l1 = float(ev[0])
    l2 = float(ev[1]) if n >= 2 else None
    nu = len(nx.max_weight_matching(g, maxcardinality=True))
    complement_average_degree = n - 1 - 2 * m / n
    return [
        l1 - 2 * m / n - 1,
        None if l2 is None else l2 - nu,
        l1 - math.sqrt(2 * m - n + 1),
        None if l2 is None else l2 - complement_average_degree,
    ]


def families(max_n):
    for n in range(2, max_n + 1):
        yield nx.path_graph(n)
        if n >= 3:
            yield nx.cycle_graph(n)
        yield nx.star_graph(n - 1)
        yield nx.complete_graph(n)
        for a in range(1, n // 2 + 1):
            yield nx.complete_bipartite_graph(a, n - a)
        for r in range(2, n + 1):
            yield nx.turan_graph(n, r)
        if n >= 4:
            yield nx.wheel_graph(n)
        if n & (n - 1) == 0 and n >= 4:
            yield nx.hypercube_graph(n.bit_length() - 1)
        if n == 10:
            yield nx.petersen_graph()
        if n % 2 == 1:
            yield nx.windmill_graph((n - 1) // 2, 3) if n >= 5 else nx.complete_graph(3)
        for k in range(2, n):
            yield nx.lollipop_graph(k, n - k)
        for k in range(2, n // 2 + 1):
            yield nx.barbell_graph(k, n - 2 * k)
        for p in range(1, n):
            broom = nx.path_graph(p)
            for i in range(n - p):
                broom.add_edge(p - 1, p + i)
            yield broom
        if n % 2 == 0 and n >= 6:
            yield nx.circular_ladder_graph(n // 2)
        if n % 2 == 0:
            yield nx.ladder_graph(n // 2)


def two_star_tree(a, b):
    """Centres 0 and 1, joined through vertex 2; a leaves on 0, b leaves on 1."""
    g = nx.Graph([(0, 2), (1, 2)])
    k = 3
    for _ in range(a):
        g.add_edge(0, k)
        k += 1
    for _ in range(b):
        g.add_edge(1, k)
        k += 1
    return g


def g6(g):
    g = nx.convert_node_labels_to_integers(g)
    return nx.to_graph6_bytes(g, header=False).decode("ascii").strip()


with open(os.path.join(fixtures, "atlas-1-7.g6")) as f:
    atlas = [line.strip() for line in f if line.strip()]
atlas_scores = []
atlas_max_degrees = []
for line in atlas:
    g = nx.from_graph6_bytes(line.encode("ascii"))
    atlas_scores.append(scores(g) if nx.is_connected(g) else None)
    atlas_max_degrees.append(max(d for _, d in g.degree()))

family_max = {}
for g in families(20):
    g = nx.convert_node_labels_to_integers(g)
    if not nx.is_connected(g):
        continue
    for name, s in zip(NAMES, scores(g)):
        if s is not None and (name not in family_max or s > family_max[name]["score"]):
            family_max[name] = {"score": s, "graph6": g6(g)}

trees = []
for a, b in [(4, 4), (5, 4), (5, 5), (6, 5)]:
    t = two_star_tree(a, b)
    ev = spectrum(t)
    trees.append(
        {
            "leaves": [a, b],
            "graph6": g6(t),
            "order": t.number_of_nodes(),
            "secondLargestEigenvalue": float(ev[1]),
            "matchingNumber": len(nx.max_weight_matching(t, maxcardinality=True)),
        }
    )

complete_minus_star = []
for n, k in [(9, 3), (10, 3), (10, 4), (12, 4)]:
    g = nx.complete_graph(n)
    g.remove_edges_from([(0, i) for i in range(1, k + 1)])
    complete_minus_star.append(
        {"order": n, "starLeaves": k, "graph6": g6(g), "secondLargestEigenvalue": float(spectrum(g)[1])}
    )

complete_minus_4_cycle = []
for n in [8, 9, 12]:
    g = nx.complete_graph(n)
    g.remove_edges_from([(0, 1), (1, 2), (2, 3), (3, 0)])
    complete_minus_4_cycle.append({"order": n, "graph6": g6(g), "secondLargestEigenvalue": float(spectrum(g)[1])})

out = {
    "source": "tests/scripts/make_score_references.py with networkx %s, numpy %s" % (nx.__version__, np.__version__),
    "scoreNames": NAMES,
    "atlasScores": atlas_scores,
    "atlasMaxDegrees": atlas_max_degrees,
    "familyMaxima": family_max,
    "twoStarTrees": trees,
    "completeMinusStar": complete_minus_star,
    "completeMinus4Cycle": complete_minus_4_cycle,
}
with open(os.path.join(fixtures, "score-references.json"), "w") as f:
    json.dump(out, f, separators=(",", ":"))
    f.write("\n")
for i, name in enumerate(NAMES):
    vals = [s[i] for s in atlas_scores if s is not None and s[i] is not None]
    print(name, "atlas max %.6g" % max(vals), "families max %.6g" % family_max[name]["score"], family_max[name]["graph6"])
for t in trees + complete_minus_star + complete_minus_4_cycle:
    print(t)
