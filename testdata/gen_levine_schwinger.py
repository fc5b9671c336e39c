#!/usr/bin/python3
"""Exact open-end values of an unflanged circular pipe (Levine & Schwinger).

H. Levine and J. Schwinger, "On the radiation of sound from an unflanged
circular pipe", Phys. Rev. 73(4), 383-406 (1948). The integrals below are
the exact results as they are usually quoted; the FORMULAS ARE WRITTEN FROM
MEMORY (the paper itself was not at hand), so this table is a check of the
fitted end correction in ends.go against the theory it was fitted to, not a
copy of a published table. Two facts that were verified in published text
guard the memory: the paper's abstract gives the low-frequency end
correction 0.6133 a (this script's ka -> 0 limit comes out 0.6127 a, 0.1 %
lower), and the reflection magnitude must behave as 1 - (ka)^2/2 at low ka.

    |R| = exp( -(2 ka / pi) * Int_0^ka  arctan(-J1(x)/Y1(x)) / (x sqrt(ka^2 - x^2)) dx )

    l/a = (1/pi) Int_0^ka ln(pi J1(x) sqrt(J1(x)^2 + Y1(x)^2)) / (x sqrt(ka^2 - x^2)) dx
        + (1/pi) Int_0^inf ln(1 / (2 I1(x) K1(x))) / (x sqrt(x^2 + ka^2)) dx

R is the pressure reflection coefficient at the open end, R = -|R| exp(-2 i k l),
and the normalised radiation resistance (real part of Z S / (rho c)) is

    r = (1 - |R|^2) / |1 - R|^2

The finite integrals use x = ka sin(t) to remove the end-point singularity.
Computed with scipy.integrate.quad and scipy.special (Debian python3-scipy
1.10.1). Valid below the first cross-mode cutoff ka = 1.8412.

Run:  /usr/bin/python3 testdata/gen_levine_schwinger.py \
          > testdata/levine_schwinger.csv
"""
import math
import sys
import warnings

import numpy as np
import scipy
from scipy import integrate
from scipy import special as sp


def _finite(ka, g):
    """(1/ka) Int_0^(pi/2) g(ka sin t) / sin t dt = Int_0^ka g(x)/(x sqrt(ka^2-x^2)) dx."""
    f = lambda t: g(ka * math.sin(t)) / (ka * math.sin(t))
    return integrate.quad(f, 0, math.pi / 2, limit=400, epsabs=1e-13, epsrel=1e-11)[0]


def reflection(ka):
    v = _finite(ka, lambda x: math.atan(-sp.j1(x) / sp.y1(x)))
    return math.exp(-2 * ka / math.pi * v)


def end_correction(ka):
    first = 0.0
    if ka > 0:
        first = _finite(ka, lambda x: math.log(math.pi * sp.j1(x) * math.hypot(sp.j1(x), sp.y1(x))))
    # i1e(x) k1e(x) = I1(x) K1(x) without overflow
    g = lambda x: math.log(1 / (2 * sp.i1e(x) * sp.k1e(x))) / (x * math.sqrt(x * x + ka * ka))
    second = 0.0
    edges = [0, 1e-3, 1e-2, 0.1, 0.5, 1, 2, 5, 10, 50, 200, 1e3]
    for lo, hi in zip(edges[:-1], edges[1:]):
        second += integrate.quad(g, lo, hi, limit=400, epsabs=1e-12, epsrel=1e-9)[0]
    second += integrate.quad(g, 1e3, np.inf, limit=400)[0]
    return (first + second) / math.pi


def main():
    # Near x = 0 the second integrand is log-singular and 1 - 2 I1 K1
    # cancels, so quad reports round-off on the first sub-interval; the
    # table agrees to 1e-9 between tolerance settings (seen when written).
    warnings.simplefilter("ignore", integrate.IntegrationWarning)
    w = sys.stdout
    w.write("# Levine & Schwinger (1948) unflanged open end, formulas from memory; "
            "scipy %s via testdata/gen_levine_schwinger.py\n" % scipy.__version__)
    w.write("ka,end_correction_over_radius,reflection_magnitude,radiation_resistance\n")
    for ka in [0.0, 0.02, 0.05, 0.1, 0.2, 0.3, 0.4, 0.5, 0.6, 0.8, 1.0, 1.2, 1.4, 1.6, 1.8]:
        la = end_correction(ka)
        if ka == 0:
            w.write("%r,%.10f,1,0\n" % (ka, la))
            continue
        rm = reflection(ka)
        R = -rm * complex(math.cos(2 * ka * la), -math.sin(2 * ka * la))
        r = (1 - rm * rm) / abs(1 - R) ** 2
        w.write("%r,%.10f,%.10f,%.10g\n" % (ka, la, rm, r))


if __name__ == "__main__":
    main()
