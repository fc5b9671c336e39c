#!/usr/bin/python3
"""Independent reference for calc/linear: onset of three invented devices.

Implements, separately from the Go code, the same published equations:
Rott's linear wave equations as written by Swift ("Thermoacoustics: a
unifying perspective for some engines and refrigerators", ASA 2002, ch. 4):

    dp1/dx = -i w rho / (A (1 - fnu)) U1
    dU1/dx = -i w A (1 + (g-1) fk) / (g pm) p1
             + (fk - fnu) / ((1 - fnu)(1 - sigma)) (dTm/dx / Tm) U1

with fnu, fk for parallel plates  f = tanh((1+i) y0/d) / ((1+i) y0/d),
circular pores  f = 2 J1(z) / (z J0(z)), z = (i-1) r/d, and the boundary-layer
limit f = (1-i) d / (2 rh) in open tubes (rh = D/4); a lumped cavity
U_out = U_in - i w V p1 / (g pm); far end closed (U1 = 0) or open with the
unflanged low-ka radiation impedance of Levine & Schwinger (1948):
Z = rho a / A ((ka)^2/4 + i k 0.6133 r).
The stack's Tm is linear between its neighbours' temperatures.

Gas: an ideal gas with constant gamma and mu, k proportional to (T/T0)^b,
the same PowerLawGas law as the Go test (values from memory, see below).

Solved with scipy 1.10 solve_ivp (DOP853, rtol 1e-11) and fsolve on the
unknowns (hot temperature, frequency).

Run:  /usr/bin/python3 testdata/gen_onset.py   (writes testdata/onset_ref.json)
"""
import json
import math
import os

import numpy as np
import scipy
from scipy.integrate import solve_ivp
from scipy.optimize import fsolve
from scipy.special import jv

R = 8.314462618  # CODATA 2018

# Power-law gases. Reference values at 300 K are from memory (close to
# handbook values for helium and argon near room temperature); the exponent
# b is a rough fit. Both the script and the Go test use exactly these, so
# they are shared inputs, not reference values: their accuracy does not
# affect the comparison.
HELIUM = dict(name="helium", label="helium (power law)", M=4.002602e-3, gamma=5.0 / 3.0, T0=300.0,
              mu0=19.9e-6, k0=0.155, b=0.68)
ARGON = dict(name="argon", label="argon (power law)", M=39.948e-3, gamma=5.0 / 3.0, T0=300.0,
             mu0=22.7e-6, k0=0.0177, b=0.8)


def gas_state(g, T, pm):
    rs = R / g["M"]
    s = (T / g["T0"]) ** g["b"]
    return dict(rho=pm / (rs * T), a=math.sqrt(g["gamma"] * rs * T), gamma=g["gamma"],
                cp=g["gamma"] * rs / (g["gamma"] - 1), mu=g["mu0"] * s, k=g["k0"] * s)


def f_plates(y0, d):
    z = (1 + 1j) * y0 / d
    return np.tanh(z) / z


def f_circular(r, d):
    z = (1j - 1) * r / d
    return 2 * jv(1, z) / (z * jv(0, z))


def f_pore(pores, d):
    if pores["shape"] == "plates":
        return f_plates(pores["y0"], d)
    if pores["shape"] == "circular":
        return f_circular(pores["r"], d)
    raise ValueError(pores["shape"])


# Devices in SI numbers. Each part: kind, L (m), D (m), T ("ambient"/"hot"),
# porosity, pores, V (m^3). Invented for the tests.
def mm(v):
    return v * 1e-3


DEVICES = [
    dict(name="half-wave plates engine", gas=HELIUM, pm=8e5, Ta=295.0, guess=(700.0, 500.0), parts=[
        dict(kind="closed-end"),
        dict(kind="tube", L=mm(40), D=mm(60), T="hot"),
        dict(kind="exchanger", L=mm(8), D=mm(60), T="hot", porosity=0.62,
             pores=dict(shape="plates", y0=mm(0.5), t=mm(0.6))),
        dict(kind="stack", L=mm(60), D=mm(60), porosity=0.76, pores=dict(shape="plates", y0=mm(0.4), t=mm(0.25))),
        dict(kind="exchanger", L=mm(8), D=mm(60), T="ambient", porosity=0.62,
             pores=dict(shape="plates", y0=mm(0.5), t=mm(0.6))),
        dict(kind="tube", L=mm(900), D=mm(60), T="ambient"),
        dict(kind="closed-end"),
    ]),
    dict(name="quarter-wave open engine", gas=HELIUM, pm=3e5, Ta=300.0, guess=(700.0, 450.0), parts=[
        dict(kind="closed-end"),
        dict(kind="tube", L=mm(20), D=mm(30), T="hot"),
        dict(kind="stack", L=mm(40), D=mm(30), porosity=0.7, pores=dict(shape="plates", y0=mm(0.3), t=mm(0.26))),
        dict(kind="tube", L=mm(500), D=mm(30), T="ambient"),
        dict(kind="open-end"),
    ]),
    dict(name="circular-pore engine with cavity", gas=ARGON, pm=5e5, Ta=290.0, guess=(520.0, 180.0), parts=[
        dict(kind="closed-end"),
        dict(kind="tube", L=mm(30), D=mm(50), T="hot"),
        dict(kind="stack", L=mm(50), D=mm(50), porosity=0.65, pores=dict(shape="circular", r=mm(0.25))),
        dict(kind="tube", L=mm(600), D=mm(50), T="ambient"),
        dict(kind="cavity", V=0.5e-3, T="ambient"),
        dict(kind="closed-end"),
    ]),
]


def part_temp(part, Th, Ta):
    return Th if part.get("T") == "hot" else Ta


def end_residual(dev, Th, w):
    """Integrate from the closed start (p1 = 1 Pa, U1 = 0); return the residual."""
    g, pm, Ta, parts = dev["gas"], dev["pm"], dev["Ta"], dev["parts"]
    y = np.array([1.0 + 0j, 0.0 + 0j])
    last = None
    for i, p in enumerate(parts):
        kind = p["kind"]
        if kind in ("closed-end", "open-end"):
            continue
        if kind == "cavity":
            st = gas_state(g, part_temp(p, Th, Ta), pm)
            y[1] = y[1] - 1j * w * p["V"] / (st["gamma"] * pm) * y[0]
            continue
        A = math.pi * p["D"] ** 2 / 4
        if kind == "tube":
            Ag, rh = A, p["D"] / 4
        else:
            Ag = p["porosity"] * A
        if kind == "stack":
            tl = part_temp(parts[i - 1], Th, Ta)
            tr = part_temp(parts[i + 1], Th, Ta)
            grad = (tr - tl) / p["L"]
        else:
            tl = part_temp(p, Th, Ta)
            grad = 0.0

        def rhs(x, yy, p=p, Ag=Ag, tl=tl, grad=grad, kind=kind):
            T = tl + grad * x
            st = gas_state(g, T, pm)
            dk = math.sqrt(2 * st["k"] / (st["rho"] * st["cp"] * w))
            dn = math.sqrt(2 * st["mu"] / (st["rho"] * w))
            if kind == "tube":
                fn, fk = (1 - 1j) * dn / (2 * rh), (1 - 1j) * dk / (2 * rh)
            else:
                fn, fk = f_pore(p["pores"], dn), f_pore(p["pores"], dk)
            sigma = st["mu"] * st["cp"] / st["k"]
            dp = -1j * w * st["rho"] / (Ag * (1 - fn)) * yy[1]
            du = (-1j * w * Ag * (1 + (st["gamma"] - 1) * fk) / (st["gamma"] * pm) * yy[0]
                  + (fk - fn) / ((1 - fn) * (1 - sigma)) * grad / T * yy[1])
            return [dp, du]

        sol = solve_ivp(rhs, (0.0, p["L"]), y, method="DOP853", rtol=1e-11, atol=[1e-14, 1e-21])
        if not sol.success:
            raise RuntimeError(sol.message)
        y = sol.y[:, -1]
        last = dict(T=tl + grad * p["L"], A=Ag, r=p["D"] / 2)
    st = gas_state(g, last["T"], pm)
    zc = st["rho"] * st["a"] / last["A"]
    if parts[-1]["kind"] == "closed-end":
        return zc * y[1]
    k = w / st["a"]
    ka = k * last["r"]
    z = zc * (ka * ka / 4 + 1j * k * 0.6133 * last["r"])
    return y[0] - z * y[1]


def onset(dev):
    # The start guesses are rounded answers of a first run; they only
    # select the mode. Unknowns scaled by the start guess so that both are of order 1.
    t0, f0 = dev["guess"]

    def f(x):
        r = end_residual(dev, x[0] * t0, 2 * math.pi * x[1] * f0)
        return [r.real, r.imag]
    x, info, ier, msg = fsolve(f, [1.0, 1.0], xtol=1e-13, full_output=True)
    if ier != 1:
        raise RuntimeError(dev["name"] + ": " + msg)
    r = f(x)
    return x[0] * t0, x[1] * f0, math.hypot(*r)


def to_file(dev):
    """The device in our JSON file format, quantities with units."""
    parts = []
    for p in dev["parts"]:
        q = dict(kind=p["kind"])
        if "L" in p:
            q["length"] = "%.12g mm" % (p["L"] * 1e3)
        if "D" in p:
            q["diameter"] = "%.12g mm" % (p["D"] * 1e3)
        if p["kind"] in ("tube", "exchanger", "cavity"):
            q["temperature"] = p.get("T", "ambient")
        if "porosity" in p:
            q["porosity"] = "%.12g" % p["porosity"]
        if "pores" in p:
            ps = p["pores"]
            if ps["shape"] == "plates":
                q["pores"] = dict(shape="plates", half_gap="%.12g mm" % (ps["y0"] * 1e3),
                                  thickness="%.12g mm" % (ps["t"] * 1e3))
            else:
                q["pores"] = dict(shape="circular", radius="%.12g mm" % (ps["r"] * 1e3))
        if "V" in p:
            q["volume"] = "%.12g L" % (p["V"] * 1e3)
        if p["kind"] == "open-end":
            q["flange"] = "none"
        parts.append(q)
    return dict(name=dev["name"], gas=dev["gas"]["name"], mean_pressure="%.12g Pa" % dev["pm"],
                ambient_temperature="%.12g K" % dev["Ta"], parts=parts)


def main():
    out = dict(generator="testdata/gen_onset.py", scipy=scipy.__version__, devices=[])
    for dev in DEVICES:
        th, f, res = onset(dev)
        g = dev["gas"]
        out["devices"].append(dict(
            device=to_file(dev),
            gas=dict(label=g["label"], molar_mass=g["M"], gamma=g["gamma"], t0=g["T0"],
                     mu0=g["mu0"], k0=g["k0"], exponent=g["b"]),
            hot_temperature=th, frequency=f, residual=res))
        print("%-36s Th = %.6f K  f = %.6f Hz  |r| = %.2e" % (dev["name"], th, f, res))
    path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "onset_ref.json")
    with open(path, "w") as fh:
        json.dump(out, fh, indent=1)
        fh.write("\n")


if __name__ == "__main__":
    main()
