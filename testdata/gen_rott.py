#!/usr/bin/python3
"""Reference tables for calc/special and calc/pore (Rott's functions).

Run with Debian's interpreter, which has python3-scipy 1.10.1 and numpy:

    /usr/bin/python3 testdata/gen_rott.py          # rewrite the tables
    /usr/bin/python3 testdata/gen_rott.py --check  # only run the self-checks

Writes, next to this script:
  rott_bessel.csv  scipy.special jve/ive/kve (scaled) and jv/iv/kv values
                   of complex argument on rays through the complex plane.
  rott_f.csv       Rott's f for plates, circular pores, rectangular pores
                   (several aspect ratios) and pin arrays, for
                   length/delta from 0.01 to 100 (log-spaced).

Sign convention: Swift's exp(+i omega t) (Swift, Thermoacoustics: A Unifying
Perspective for Some Engines and Refrigerators, 2002, ch. 4), so f has a
negative imaginary part.

The formulas here are written from the field equation
  laplacian(h) = (2i/delta^2) h,  h = 1 on the solid,  f = area average of h
and evaluated with scipy's complex Bessel functions (AMOS), independently of
the Go code: the Go code uses its own Bessel routines, a different form of the
circular function (I1/I0 of (1+i)R/delta instead of J1/J0 of (i-1)R/delta),
and an accelerated tail for the rectangular series, while this script sums
the rectangular series directly to two million terms and cross-checks it
against the double series of Arnott, Bass & Raspet (JASA 90, 3228, 1991).
"""
import csv
import math
import os
import sys

import numpy as np
import scipy
import scipy.special as sp

HERE = os.path.dirname(os.path.abspath(__file__))
I = 1j


def plates(y0_over_delta):
    z = (1 + I) * y0_over_delta
    return np.tanh(z) / z


def circular(r_over_delta):
    # Swift 2002, circular pore: f = 2 J1(z) / (z J0(z)), z = (i-1) R/delta.
    z = (I - 1) * r_over_delta
    return 2 * sp.jv(1, z) / (z * sp.jv(0, z))


def rect_single(a, b, delta, mterms=2_000_000):
    """Rectangle |x|<a, |y|<b: the inner (n) sum of the double series done in
    closed form. f = 1 - sum_m odd 8/(pi^2 m^2) lam/q^2 (1 - tanh(q b)/(q b)),
    q^2 = (m pi/2a)^2 + lam, lam = 2i/delta^2. Summed directly."""
    lam = 2 * I / delta**2
    m = np.arange(1, 2 * mterms, 2, dtype=float)
    q = np.sqrt((m * np.pi / (2 * a)) ** 2 + lam)
    qb = q * b
    th = np.where(qb.real > 40, 1.0 + 0j, np.tanh(qb))
    terms = 8 / (np.pi**2 * m**2) * lam / q**2 * (1 - th / qb)
    # sum smallest first
    s = np.sum(terms[::-1])
    return 1 - s


def rect_double(a, b, delta, nterms=3000):
    """Arnott, Bass & Raspet (1991) double series in Swift's sign convention:
    f = 1 - (64/pi^4) sum_{m,n odd} 1/(m^2 n^2 Y_mn),
    Y_mn = 1 - i pi^2 delta^2/8 (m^2/a^2 + n^2/b^2)."""
    m = np.arange(1, 2 * nterms, 2, dtype=float)
    M, N = np.meshgrid(m, m, indexing="ij")
    Y = 1 - I * np.pi**2 * delta**2 / 8 * (M**2 / a**2 + N**2 / b**2)
    return 1 - 64 / np.pi**4 * np.sum(1 / (M**2 * N**2 * Y))


def pins(ri_over_delta, ro_over_ri):
    """Pin of radius ri in a circular cell of outer radius ro (h = 1 on the
    pin, dh/dr = 0 at ro): f = -2 ri/(k (ro^2-ri^2)) *
    [I1(k ri)K1(k ro) - I1(k ro)K1(k ri)] / [I0(k ri)K1(k ro) + I1(k ro)K0(k ri)]
    with k = (1+i)/delta. Lengths in units of delta."""
    ri = ri_over_delta
    ro = ro_over_ri * ri
    k = 1 + I
    a, b = k * ri, k * ro
    num = sp.iv(1, a) * sp.kv(1, b) - sp.iv(1, b) * sp.kv(1, a)
    den = sp.iv(0, a) * sp.kv(1, b) + sp.iv(1, b) * sp.kv(0, a)
    return -2 * ri / (k * (ro**2 - ri**2)) * num / den


RATIOS = np.logspace(-2, 2, 41)  # length/delta, 0.01 .. 100
ASPECTS = [1.0, 2.0, 5.0]  # b/a for rectangles
PIN_CELLS = [3.0, 6.0]  # ro/ri


def self_checks():
    # Double series (ABR 1991) against the closed-form inner sum where the
    # double series converges well enough (moderate a/delta).
    worst = 0.0
    for asp in ASPECTS:
        for r in [0.05, 0.3, 1.0, 3.0]:
            s = rect_single(1.0, asp, 1.0 / r)
            d = rect_double(1.0, asp, 1.0 / r)
            worst = max(worst, abs(s - d) / abs(s))
    print("rectangle: single vs double series, worst relative difference %.2e" % worst)
    assert worst < 1e-6, worst  # the double series truncation is ~1/N^2..1/N^3
    # Square against itself with sides swapped; long rectangle tends to plates.
    for r in [0.1, 1, 10]:
        long_ = rect_single(1.0, 1e4, 1.0 / r, mterms=200_000)
        assert abs(long_ - plates(r)) / abs(plates(r)) < 1e-3, (r, long_, plates(r))
    # Pins: wide cell tends to the circular-tube boundary layer, small-delta
    # limit (1-i) delta/(2 r_h) with r_h = (ro^2-ri^2)/(2 ri).
    ri, ro = 50.0, 150.0
    rh = (ro**2 - ri**2) / (2 * ri)
    bl = (1 - I) / (2 * rh)
    assert abs(pins(ri, ro / ri) - bl) / abs(bl) < 0.02


def bessel_rows():
    rows = []
    mags = np.logspace(-3, math.log10(300), 31)
    angles = [0, 1 / 8, 1 / 4, 3 / 8, 1 / 2, 5 / 8, 3 / 4, 7 / 8, 1, -1 / 8, -1 / 4, -3 / 8, -1 / 2, -3 / 4]
    for frac in angles:
        for r in mags:
            z = r * np.exp(I * np.pi * frac)
            for name, fn in [
                ("J0e", lambda z: sp.jve(0, z)),
                ("J1e", lambda z: sp.jve(1, z)),
                ("I0e", lambda z: sp.ive(0, z)),
                ("I1e", lambda z: sp.ive(1, z)),
            ]:
                rows.append((name, z, fn(z)))
            if abs(frac) < 0.5:  # K on Re z > 0
                rows.append(("K0e", z, sp.kve(0, z)))
                rows.append(("K1e", z, sp.kve(1, z)))
            if r <= 50:
                rows.append(("J0", z, sp.jv(0, z)))
                rows.append(("J1", z, sp.jv(1, z)))
                rows.append(("I0", z, sp.iv(0, z)))
                rows.append(("I1", z, sp.iv(1, z)))
                if abs(frac) < 0.5:
                    rows.append(("K0", z, sp.kv(0, z)))
                    rows.append(("K1", z, sp.kv(1, z)))
    return rows


def f_rows():
    rows = []
    for r in RATIOS:
        rows.append(("plates", 0.0, r, plates(r)))
        rows.append(("circular", 0.0, r, circular(r)))
        for asp in ASPECTS:
            # a = 1 (half width), b = asp (half height), a/delta = r
            rows.append(("rectangular", asp, r, rect_single(1.0, asp, 1.0 / r)))
        for cell in PIN_CELLS:
            rows.append(("pins", cell, r, pins(r, cell)))
    return rows


def write(path, header, rows):
    tmp = path + ".tmp"
    with open(tmp, "w", newline="") as fh:
        fh.write("# made by testdata/gen_rott.py with scipy %s, numpy %s\n" % (scipy.__version__, np.__version__))
        w = csv.writer(fh, lineterminator="\n")
        w.writerow(header)
        for row in rows:
            w.writerow(row)
    os.replace(tmp, path)


def main():
    self_checks()
    if "--check" in sys.argv:
        return
    brows = []
    for name, z, v in bessel_rows():
        v = complex(v)
        if not (math.isfinite(v.real) and math.isfinite(v.imag)):
            continue
        brows.append((name, repr(z.real), repr(z.imag), repr(v.real), repr(v.imag)))
    write(os.path.join(HERE, "rott_bessel.csv"), ["func", "z_re", "z_im", "re", "im"], brows)
    frows = []
    for shape, param, r, v in f_rows():
        v = complex(v)
        assert math.isfinite(v.real) and math.isfinite(v.imag), (shape, param, r, v)
        frows.append((shape, repr(float(param)), repr(float(r)), repr(v.real), repr(v.imag)))
    write(os.path.join(HERE, "rott_f.csv"), ["shape", "param", "length_over_delta", "re", "im"], frows)
    print("wrote %d Bessel rows, %d f rows" % (len(brows), len(frows)))


if __name__ == "__main__":
    main()
