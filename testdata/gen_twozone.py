#!/usr/bin/python3
"""Reference resonance frequencies of two-zone tubes for calc/resonator.

Run with Debian's python3-scipy (1.10.1):

    /usr/bin/python3 testdata/gen_twozone.py > testdata/twozone.csv

Each tube has section 1 (from the closed end at x = 0) and section 2 (to
the far end), each with its own length L, radius a, sound speed c and
density rho. The gas is an ideal gas with the given gamma and molar mass;
c = sqrt(gamma R T / M), rho = p M / (R T) are computed here and written
out, so the Go test uses the same numbers.

The resonance condition is written independently of the Go code (which
uses a transfer matrix), from standing waves in each section matched by
continuity of pressure and of volume velocity S u at the joint
(u proportional to (1/rho) dp/dx):

closed-closed, p1 = A cos(k1 x), p2 = B cos(k2 (L - x)):
    (S1/(rho1 c1)) sin(k1 L1) cos(k2 L2) + (S2/(rho2 c2)) sin(k2 L2) cos(k1 L1) = 0
closed-open (no end correction), p1 = A cos(k1 x), p2 = B sin(k2 (L - x)):
    (S1/(rho1 c1)) sin(k1 L1) sin(k2 L2) - (S2/(rho2 c2)) cos(k1 L1) cos(k2 L2) = 0

Roots are bracketed on a fine grid and refined with scipy.optimize.brentq.
"""
import math
import sys

import numpy as np
import scipy
from scipy.optimize import brentq

R = 8.314462618  # J/(mol K), CODATA 2018 exact value

# (name, ends, gamma, M kg/mol, p Pa, [(L, a, T), (L, a, T)])
CASES = [
    ("air hot-cold cc", "closed-closed", 1.4, 0.0289647, 101325.0,
     [(0.3, 0.025, 700.0), (0.7, 0.025, 300.0)]),
    ("air area step cc", "closed-closed", 1.4, 0.0289647, 101325.0,
     [(0.2, 0.020, 900.0), (0.5, 0.035, 300.0)]),
    ("air hot-cold co", "closed-open", 1.4, 0.0289647, 101325.0,
     [(0.1, 0.010, 600.0), (0.4, 0.010, 295.0)]),
    ("helium 10 bar co", "closed-open", 5.0 / 3.0, 0.004002602, 1.0e6,
     [(0.25, 0.030, 500.0), (0.75, 0.015, 300.0)]),
]
NMODES = 4


def condition(ends, secs):
    (L1, S1, c1, r1), (L2, S2, c2, r2) = secs
    y1, y2 = S1 / (r1 * c1), S2 / (r2 * c2)

    def f(freq):
        w = 2 * math.pi * freq
        k1, k2 = w / c1, w / c2
        if ends == "closed-closed":
            return y1 * math.sin(k1 * L1) * math.cos(k2 * L2) + y2 * math.sin(k2 * L2) * math.cos(k1 * L1)
        return y1 * math.sin(k1 * L1) * math.sin(k2 * L2) - y2 * math.cos(k1 * L1) * math.cos(k2 * L2)
    return f


def main():
    w = sys.stdout
    w.write("# two-zone tube resonances; scipy %s, numpy %s; made by testdata/gen_twozone.py\n" % (scipy.__version__, np.__version__))
    w.write("case,ends,mode,L1,a1,c1,rho1,L2,a2,c2,rho2,frequency\n")
    for name, ends, gamma, M, p, zones in CASES:
        secs = []
        for (L, a, T) in zones:
            c = math.sqrt(gamma * R * T / M)
            rho = p * M / (R * T)
            secs.append((L, math.pi * a * a, c, rho, a))
        f = condition(ends, [s[:4] for s in secs])
        tau = sum(s[0] / s[2] for s in secs)
        fmax = (NMODES + 2) / tau
        grid = np.linspace(1e-3 / tau, fmax, 20000)
        vals = [f(x) for x in grid]
        roots = []
        for i in range(len(grid) - 1):
            if vals[i] == 0 or vals[i] * vals[i + 1] < 0:
                roots.append(brentq(f, grid[i], grid[i + 1], xtol=1e-13, rtol=1e-15))
            if len(roots) == NMODES:
                break
        assert len(roots) == NMODES, (name, roots)
        for n, fr in enumerate(roots, 1):
            (L1, _, c1, r1, a1), (L2, _, c2, r2, a2) = secs
            w.write("%s,%s,%d,%r,%r,%.17g,%.17g,%r,%r,%.17g,%.17g,%.17g\n" %
                    (name, ends, n, L1, a1, c1, r1, L2, a2, c2, r2, fr))


if __name__ == "__main__":
    main()
