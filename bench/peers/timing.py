"""Shared timing for the bench peers: the best (lowest) mean time per call over a few rounds."""
import time


def best_microseconds(fn, repeat, rounds):
    """Call fn() `repeat` times per round, `rounds` rounds; return the lowest mean time per call in µs."""
    best = float("inf")
    for _ in range(rounds):
        t0 = time.perf_counter()
        for _ in range(repeat):
            fn()
        best = min(best, (time.perf_counter() - t0) / repeat)
    return best * 1e6
