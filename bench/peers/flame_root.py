"""Peer for bench/flame.bench.ts: complete-combustion CH4-air flame temperature by a general-purpose
scientific-Python bracketing root finder (Brent's method) over NASA 7-coefficient enthalpies.

Reads from stdin a JSON object {"species": {key: [[Tmin, Tmax, a1..a7], ...]}, "reactants": {key: n},
"products": {key: n}, "T0": K, "repeat": N}; prints {"T": K, "usPerSolve": µs}. The coefficients are the
library's own GRI-Mech 3.0 sets, passed in by the bench, so both sides evaluate the same data.
"""
import json, sys

from timing import best_microseconds
from scipy.optimize import brentq

R = 8.31446261815324
case = json.load(sys.stdin)
data = case["species"]

def h_rt(key, T):
    # the range holding T; below the first range (298.15 K against a 300 K start) its polynomial is used
    ranges = data[key]
    for lo, hi, *a in ranges:
        if T <= hi:
            break
    return a[0] + a[1] * T / 2 + a[2] * T**2 / 3 + a[3] * T**3 / 4 + a[4] * T**4 / 5 + a[5] / T

def h(key, T):
    return R * T * h_rt(key, T)

def solve():
    h0 = sum(n * h(k, case["T0"]) for k, n in case["reactants"].items())
    f = lambda T: sum(n * h(k, T) for k, n in case["products"].items()) - h0
    return brentq(f, 300.0, 3500.0, xtol=1e-6)

T = solve()
us = best_microseconds(solve, case["repeat"], 7)
print(json.dumps({"T": T, "usPerSolve": us}))
