#!/usr/bin/python3
"""Reference resonances of tubes with wall (boundary-layer) losses, for
calc/resonator's tests of Tube.Losses = WallLosses.

Run with Debian's interpreter (python3-scipy, python3-numpy):

    /usr/bin/python3 testdata/gen_wall_resonance.py          # rewrite the table
    /usr/bin/python3 testdata/gen_wall_resonance.py --check  # only the self-checks

Writes wall_resonance.csv next to this script.

Physics. In a uniform circular duct of radius a, Rott's wave equation
(G. W. Swift, Thermoacoustics: A Unifying Perspective for Some Engines and
Refrigerators, 2002, ch. 4; exp(+i omega t) convention) gives for the
pressure p and volume velocity U

    dp/dx = -i omega rho / (S (1 - f_nu)) U
    dU/dx = -i omega S (1 + (gamma-1) f_kappa) / (rho c^2) p

with S = pi a^2 and Rott's circular function

    f = 2 J1(z) / (z J0(z)),   z = (i - 1) a / delta,   delta = sqrt(2 D / omega)

(D = kinematic viscosity for f_nu, thermal diffusivity for f_kappa). So
k = (omega/c) sqrt((1 + (gamma-1) f_kappa) / (1 - f_nu)) and the
characteristic impedance is Zc = omega rho / (S (1 - f_nu) k).

A resonance is a complex angular frequency omega at which the boundary
conditions hold with no drive: a closed end has U = 0; an open end is a
pressure node p = 0 at the end of its end correction delta_end, a loss-free
extension of the end section (the gas moving outside the tube has no wall;
the radiation resistance is left out: it belongs to the Q, not to the
frequency). The resonance frequency is
Re(omega) / 2 pi and the decay rate Im(omega) (> 0 decays).

Independence from the Go code: here scipy.special.jv of complex argument
(AMOS) evaluates f at the complex omega itself (the Go code evaluates f at
Re omega, the usual high-Q approximation), the root is found with
scipy.optimize.newton in the complex plane from the loss-free frequency, and
the transfer matrices are written out separately. The end correction of an
unflanged open end is the Davies, Bento Coelho & Bhattacharya (1980) fit as
printed in calc/resonator/ends.go, evaluated at ka = Re(omega) a / c.

Gas properties in the cases are round, plausible input numbers (not checked
data): the comparison is of the wave solution only. The helium rows use the
properties that tubewright's gasprops gives for helium at 1 bar (printed by
`go test ./calc/resonator -run TestWallLossHeliumProps -v`), so that the
diagnosis check of issue 12 (0.5 m closed-closed tube, 10 mm radius, 1000 Hz)
can be compared with an independent forward solution.
"""
import csv
import math
import os
import sys

import numpy as np
import scipy
import scipy.optimize as opt
import scipy.special as sp

HERE = os.path.dirname(os.path.abspath(__file__))
OUT = os.path.join(HERE, "wall_resonance.csv")
I = 1j

CLOSED_OPEN, CLOSED_CLOSED, OPEN_OPEN = 0, 1, 2
NONE, UNFLANGED = 0, 1


def rott_circular(a, D, omega):
    delta = np.sqrt(2 * D / omega)  # principal root, complex omega allowed
    z = (I - 1) * a / delta
    return 2 * sp.jv(1, z) / (z * sp.jv(0, z))


def unflanged_delta(a, ka):
    x = min(ka, 2.0)
    if x < 0.5:
        return (0.6133 - 0.1168 * x * x) * a
    return (0.6393 - 0.1104 * x) * a


class Zone:
    def __init__(self, L, a, c, rho, gamma, nu, kappa):
        self.L, self.a, self.c, self.rho = L, a, c, rho
        self.gamma, self.nu, self.kappa = gamma, nu, kappa
        self.S = math.pi * a * a

    def wave(self, omega, lossy):
        if not lossy:
            k = omega / self.c
            return k, self.rho * self.c / self.S
        fn = rott_circular(self.a, self.nu, omega)
        fk = rott_circular(self.a, self.kappa, omega)
        k = omega / self.c * np.sqrt((1 + (self.gamma - 1) * fk) / (1 - fn))
        zc = omega * self.rho / (self.S * (1 - fn) * k)
        return k, zc

    def end_extension(self, omega, corr, p, U):
        """carry (p, U) through the loss-free end correction"""
        if corr == NONE:
            return p, U
        ka = omega.real * self.a / self.c
        kd = omega / self.c * unflanged_delta(self.a, ka)
        z0 = self.rho * self.c / self.S
        return np.cos(kd) * p - I * z0 * np.sin(kd) * U, -I * np.sin(kd) / z0 * p + np.cos(kd) * U


def residual(omega, ends, corr, zones, lossy):
    first, last = zones[0], zones[-1]
    if ends == OPEN_OPEN:
        # start at the pressure node beyond the first open end
        p, U = first.end_extension(omega, corr, 0j, 1.0 + 0j)
    else:
        p, U = 1.0 + 0j, 0.0 + 0j
    for z in zones:
        k, zc = z.wave(omega, lossy)
        cs, sn = np.cos(k * z.L), np.sin(k * z.L)
        p, U = cs * p - I * zc * sn * U, -I * sn / zc * p + cs * U
    if ends == CLOSED_CLOSED:
        return U * last.rho * last.c / last.S
    p, U = last.end_extension(omega, corr, p, U)
    return p


def travel_guess(ends, zones, n):
    tau = sum(z.L / z.c for z in zones)
    m = (2 * n - 1) / 4 if ends == CLOSED_OPEN else n / 2
    return 2 * math.pi * m / tau


def solve(ends, corr, zones, n, lossy, w0=None):
    if w0 is None:
        w0 = travel_guess(ends, zones, n)
    # secant method in the complex plane (scipy.optimize.newton without a
    # derivative), from the travel-time estimate (loss-free) or from the
    # loss-free root (lossy)
    w = opt.newton(lambda w: residual(w, ends, corr, zones, lossy), w0 + 0j,
                   x1=w0 * (1 - 1e-3) + 1e-3j * w0, tol=1e-10, rtol=1e-13, maxiter=200)
    return w


def cases():
    # property sets: c (m/s), rho (kg/m^3), gamma, nu (m^2/s), kappa (m^2/s)
    air = dict(c=343.2, rho=1.204, gamma=1.4, nu=1.516e-5, kappa=2.12e-5)
    hot_air = dict(c=490.0, rho=0.588, gamma=1.39, nu=5.0e-5, kappa=7.2e-5)
    he30 = dict(c=1019.0, rho=4.80, gamma=5 / 3, nu=4.15e-6, kappa=6.2e-6)
    # helium at 1 bar from gasprops (see the docstring): 299.0 K
    he299 = dict(c=1017.433088552999, rho=0.16100413674, gamma=5 / 3,
                 nu=1.2348390428e-04, kappa=1.8580910117e-04)
    out = []
    def add(name, ends, corr, n, zones):
        out.append((name, ends, corr, n, zones))
    Z = lambda L, a, p: Zone(L, a, p["c"], p["rho"], p["gamma"], p["nu"], p["kappa"])
    add("helium_cc_0.5m_10mm", CLOSED_CLOSED, NONE, 1, [Z(0.5, 0.01, he299)])
    add("air_cc_1m_25mm", CLOSED_CLOSED, NONE, 1, [Z(1.0, 0.025, air)])
    add("air_cc_1m_25mm_mode3", CLOSED_CLOSED, NONE, 3, [Z(1.0, 0.025, air)])
    add("air_co_0.147m_10mm_none", CLOSED_OPEN, NONE, 1, [Z(0.147, 0.01, air)])
    add("air_co_0.147m_10mm_unflanged", CLOSED_OPEN, UNFLANGED, 1, [Z(0.147, 0.01, air)])
    add("air_oo_0.6m_15mm_unflanged", OPEN_OPEN, UNFLANGED, 1, [Z(0.6, 0.015, air)])
    add("air_cc_0.2m_1mm", CLOSED_CLOSED, NONE, 1, [Z(0.2, 0.001, air)])
    add("air_co_0.1m_1mm_none", CLOSED_OPEN, NONE, 1, [Z(0.1, 0.001, air)])
    add("air_cc_0.1m_0.3mm", CLOSED_CLOSED, NONE, 1, [Z(0.1, 0.0003, air)])
    add("helium30bar_co_1m_50mm_unflanged", CLOSED_OPEN, UNFLANGED, 1, [Z(1.0, 0.05, he30)])
    add("zoned_air_cc_hot_cold", CLOSED_CLOSED, NONE, 1, [Z(0.3, 0.01, hot_air), Z(0.5, 0.01, air)])
    add("zoned_air_co_hot_cold_unflanged", CLOSED_OPEN, UNFLANGED, 1, [Z(0.2, 0.012, hot_air), Z(0.4, 0.012, air)])
    add("zoned_air_co_hot_cold_mode2", CLOSED_OPEN, NONE, 2, [Z(0.2, 0.012, hot_air), Z(0.4, 0.012, air)])
    return out


def self_checks():
    # Rott's circular f: wide-tube limit (1 - i) delta / a (Swift 2002, ch. 4)
    a, D, w = 0.01, 1.5e-5, 2 * math.pi * 500
    delta = math.sqrt(2 * D / w)
    f = rott_circular(a, D, w)
    lim = (1 - I) * delta / a
    assert abs(f - lim) / abs(lim) < 0.02, (f, lim)
    # loss-free closed-closed: f = n c / (2 L) (Kinsler et al., ch. 10)
    z = [Zone(1.0, 0.02, 343.0, 1.2, 1.4, 1.5e-5, 2.1e-5)]
    w = solve(CLOSED_CLOSED, NONE, z, 2, False)
    assert abs(w.real / (2 * math.pi) - 343.0) < 1e-9, w
    # lossy wide tube: frequency lowered by the Kirchhoff phase-speed term
    # (delta_nu + (gamma-1) delta_kappa) / (2a) to first order
    wl = solve(CLOSED_CLOSED, NONE, z, 2, True, w)
    dn, dk = math.sqrt(2 * 1.5e-5 / w.real), math.sqrt(2 * 2.1e-5 / w.real)
    eps = (dn + 0.4 * dk) / (2 * 0.02)
    assert abs((w.real - wl.real) / w.real - eps) < 0.05 * eps, (wl, eps)


def main():
    self_checks()
    if "--check" in sys.argv:
        print("self-checks passed")
        return
    rows = []
    for name, ends, corr, n, zones in cases():
        w0 = solve(ends, corr, zones, n, False)
        w = solve(ends, corr, zones, n, True, w0.real)
        row = [name, ends, corr, n, len(zones)]
        for z in zones + [None] * (2 - len(zones)):
            if z is None:
                row += [0, 0, 0, 0, 0, 0, 0]
            else:
                row += [z.L, z.a, z.c, z.rho, z.gamma, z.nu, z.kappa]
        row += [w0.real / (2 * math.pi), w.real / (2 * math.pi), w.imag / (2 * math.pi)]
        rows.append(row)
        print("%-36s lossless %10.4f Hz  lossy %10.4f Hz  (%.3f %%)  Im %.4f Hz" % (
            name, w0.real / (2 * math.pi), w.real / (2 * math.pi),
            100 * (w.real / w0.real - 1), w.imag / (2 * math.pi)))
    with open(OUT, "w", newline="") as fh:
        fh.write("# made by testdata/gen_wall_resonance.py with scipy %s, numpy %s\n" % (scipy.__version__, np.__version__))
        fh.write("# ends: 0 closed-open, 1 closed-closed, 2 open-open; corr: 0 none, 1 unflanged; zone fields L a c rho gamma nu kappa (SI)\n")
        wr = csv.writer(fh, lineterminator="\n")
        hdr = ["name", "ends", "corr", "mode", "zones"]
        for i in (1, 2):
            hdr += ["L%d" % i, "a%d" % i, "c%d" % i, "rho%d" % i, "gamma%d" % i, "nu%d" % i, "kappa%d" % i]
        hdr += ["f_lossfree_Hz", "f_Hz", "im_f_Hz"]
        wr.writerow(hdr)
        for r in rows:
            wr.writerow([r[0]] + [repr(float(v)) for v in r[1:]])
    print("wrote", OUT)


if __name__ == "__main__":
    main()
