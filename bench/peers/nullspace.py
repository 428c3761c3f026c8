"""Peer for bench/reaction.bench.ts: the exact null space of a reaction's element matrix by a
general-purpose computer-algebra system (rational arithmetic), scaled to whole numbers.

Reads from stdin {"matrix": [[int, ...], ...], "repeat": N}; prints {"vector": [...], "usPerSolve": µs}.
The matrix is built by the bench from the library's own parsed formulas.
"""
import json, sys

from timing import best_microseconds
from sympy import Matrix, ilcm

case = json.load(sys.stdin)

def solve():
    ns = Matrix(case["matrix"]).nullspace()
    v = ns[0]
    l = ilcm(*[x.q for x in v])
    return [int(x * l) for x in v]

vec = solve()
us = best_microseconds(solve, case["repeat"], 5)
print(json.dumps({"vector": vec, "usPerSolve": us}))
