#!/usr/bin/python3
"""Write testdata/gas_ljvirial.csv: the reduced second virial coefficient of
the Lennard-Jones (12-6) potential and its first two derivatives,

    B*(T*)   = 3 ∫0^∞ (1 − exp(−u*/T*)) r² dr,   u* = 4 (r⁻¹² − r⁻⁶)
    dB*/dT*  = −3 ∫0^∞ exp(−u*/T*) u*/T*² r² dr
    d²B*/dT*² = 3 ∫0^∞ exp(−u*/T*) (2u*/T*³ − u*²/T*⁴) r² dr

(Hirschfelder, Curtiss & Bird, Molecular Theory of Gases and Liquids, 1954,
eq. 3.6-4), computed with Debian's python3-scipy (scipy.integrate.quad,
adaptive QUADPACK) for the gasprops tests.

Run from the repository root:  /usr/bin/python3 testdata/gen_gas_ljvirial.py
(CI never runs this; the CSV is committed.)
"""
import math
import os

import numpy as np
import scipy
from scipy.integrate import quad

OUT = os.path.join(os.path.dirname(os.path.abspath(__file__)), "gas_ljvirial.csv")
TSTARS = [0.35, 0.5, 0.8, 1.0, 1.3, 2.0, 3.0, 3.4, 5.0, 7.5, 10.0, 20.0, 50.0, 100.0, 300.0]


def u(r):
    return 4.0 * (r ** -12 - r ** -6)


def integrand(r, ts, k):
    a = u(r) / ts
    if a > 700:
        return r * r if k == 0 else 0.0
    e = math.exp(-a)
    if k == 0:
        return -math.expm1(-a) * r * r  # 1 − e^{−a} without cancellation
    if k == 1:
        return -e * u(r) / ts ** 2 * r * r
    return e * (2 * u(r) / ts ** 3 - u(r) ** 2 / ts ** 4) * r * r


def value(ts, k):
    total = 0.0
    for a, b in [(1e-6, 0.9), (0.9, 1.2), (1.2, 3.0), (3.0, 50.0), (50.0, np.inf)]:
        v, _ = quad(integrand, a, b, args=(ts, k), epsabs=1e-13, epsrel=1e-11, limit=400)
        total += v
    # the piece [0, 1e-6] contributes ∫ r² dr = 1e-18/3 to B* only
    if k == 0:
        total += 1e-18 / 3
    return 3.0 * total


def main():
    with open(OUT, "w") as f:
        f.write("# Lennard-Jones reduced second virial coefficient, scipy %s scipy.integrate.quad\n" % scipy.__version__)
        f.write("# written by testdata/gen_gas_ljvirial.py; columns: T*, B*, dB*/dT*, d2B*/dT*2\n")
        f.write("ts,b,b1,b2\n")
        for ts in TSTARS:
            f.write("%.6g,%.12g,%.12g,%.12g\n" % (ts, value(ts, 0), value(ts, 1), value(ts, 2)))


if __name__ == "__main__":
    main()
