"""Peer for bench/reaction.bench.ts: the exact null space of a reaction's element matrix by a
general-purpose computer-algebra system (rational arithmetic), scaled to whole numbers.

Reads from stdin {"matrix": [[int, ...], ...], "repeat": N}; prints {"vector": [...], "usPerSolve": µs}.
The matrix is built by the bench from the library's own parsed formulas.
"""
import json, sys, time
from sympy import Matrix, ilcm

case = json.load(sys.stdin)

def solve():
    ns = Matrix(case["matrix"]).nullspace()
    v = ns[0]
    l = ilcm(*[x.q for x in v])
    return [int(x * l) for x in v]

vec = solve()
n = case["repeat"]
best = float("inf")
for _ in range(5):
    t0 = time.perf_counter()
    for _ in range(n):
        solve()
    best = min(best, (time.perf_counter() - t0) / n)
print(json.dumps({"vector": vec, "usPerSolve": best * 1e6}))
