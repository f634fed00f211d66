"""Graded 1-D mesh lines for the FDTD runs.

A cell-size function is fine (its own size) inside each zone and grows linearly with the
distance from it, which makes neighbouring cells differ by about `ratio` (a cell of size s
is followed by one of s + (ratio - 1) s).  Between two required lines the number of cells
is the integral of 1/size rounded up, and the lines are placed at equal steps of that
integral, so required lines (material faces, the wire's ends, the feed gap) are hit exactly.
"""
import math

import numpy as np


def size_at(x, zones, smax, ratio):
    """The wanted cell size at x: min over zones (lo, hi, size) of size + (ratio - 1) * distance."""
    s = smax
    for lo, hi, size in zones:
        d = max(lo - x, 0.0, x - hi)
        s = min(s, size + (ratio - 1.0) * d)
    return s


def graded_lines(lo, hi, zones, fixed, smax, ratio=1.25):
    """Mesh lines from lo to hi through the fixed coordinates (those inside [lo, hi])."""
    req = sorted({lo, hi} | {float(x) for x in fixed if lo < x < hi}
                 | {float(z[0]) for z in zones if lo < z[0] < hi}
                 | {float(z[1]) for z in zones if lo < z[1] < hi})
    # Required lines closer than half the local size would make a sliver cell that shrinks the
    # time step for nothing; keep the first of such a pair.
    kept = [req[0]]
    for x in req[1:]:
        if x - kept[-1] < 0.5 * size_at(x, zones, smax, ratio) - 1e-12 and x != hi:
            continue
        if x == hi and x - kept[-1] < 0.5 * size_at(x, zones, smax, ratio) - 1e-12 and len(kept) > 1:
            kept.pop()
        kept.append(x)
    lines = [kept[0]]
    for a, b in zip(kept[:-1], kept[1:]):
        xs = np.linspace(a, b, 801)
        inv = np.array([1.0 / size_at(x, zones, smax, ratio) for x in xs])
        cum = np.concatenate([[0.0], np.cumsum(0.5 * (inv[1:] + inv[:-1]) * np.diff(xs))])
        n = max(1, math.ceil(cum[-1] - 1e-6))
        targets = np.linspace(0.0, cum[-1], n + 1)[1:-1]
        lines.extend(np.interp(targets, cum, xs).tolist())
        lines.append(b)
    return np.array(lines)


def max_ratio(lines):
    d = np.diff(lines)
    return float(np.max(np.maximum(d[1:] / d[:-1], d[:-1] / d[1:])))
