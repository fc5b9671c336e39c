#!/usr/bin/python3
"""Independent reference for calc/design: the onset of designed engines.

Reads testdata/design_devices.json (engines designed by calc/design with a
power-law gas and written in the project's device-file format; regenerate
with `go test ./calc/design -run TestWriteDesignDevices
-update-design-devices`), solves each device's onset with the independent
scipy implementation of Rott's linear wave equations in
testdata/gen_onset.py (solve_ivp DOP853 rtol 1e-11, fsolve), and writes
testdata/design_onset_ref.json.

Run:  /usr/bin/python3 testdata/design_onset.py
"""
import json
import math
import os
import re
import sys

import scipy
from scipy.optimize import fsolve

HERE = os.path.dirname(os.path.abspath(__file__))
sys.path.insert(0, HERE)
import gen_onset  # noqa: E402  (the independent equations)

UNITS = {"mm": 1e-3, "m": 1.0, "bar": 1e5, "Pa": 1.0, "kPa": 1e3, "K": 1.0, "": 1.0}


def si(text):
    """'194.735 mm' -> 0.194735; '10 bar' -> 1e6; '0.7500' -> 0.75."""
    m = re.fullmatch(r"\s*([-+0-9.eE]+)\s*([A-Za-z]*)\s*", text)
    if not m:
        raise ValueError("cannot read %r" % text)
    return float(m.group(1)) * UNITS[m.group(2)]


def half(pores, whole, halfkey):
    """The half size (y0, r) of pores written whole (gap, diameter, as the
    design writes now) or as the half (half_gap, radius, older files)."""
    if whole in pores:
        return si(pores[whole]) / 2
    return si(pores[halfkey])


def device(doc, gas):
    parts = []
    for p in doc["parts"]:
        q = dict(kind=p["kind"])
        if "length" in p:
            q["L"] = si(p["length"])
        if "diameter" in p:
            q["D"] = si(p["diameter"])
        if "temperature" in p:
            q["T"] = p["temperature"]
        if "porosity" in p:
            q["porosity"] = si(p["porosity"])
        if "pores" in p:
            ps = p["pores"]
            if ps["shape"] == "plates":
                q["pores"] = dict(shape="plates", y0=half(ps, "gap", "half_gap"))
            elif ps["shape"] == "circular":
                q["pores"] = dict(shape="circular", r=half(ps, "diameter", "radius"))
            else:
                raise ValueError("pore shape %s is not in gen_onset.py" % ps["shape"])
        if p["kind"] == "open-end" and p.get("flange", "none") != "none":
            raise ValueError("flanged ends are not in gen_onset.py")
        parts.append(q)
    g = dict(name="power law", M=gas["molar_mass"], gamma=gas["gamma"], T0=gas["t0"],
             mu0=gas["mu0"], k0=gas["k0"], b=gas["exponent"])
    return dict(gas=g, pm=si(doc["mean_pressure"]), Ta=si(doc["ambient_temperature"]), parts=parts)


def main():
    with open(os.path.join(HERE, "design_devices.json")) as fh:
        src = json.load(fh)
    out = dict(generator="testdata/design_onset.py", scipy=scipy.__version__, designs=[])
    for d in src["designs"]:
        dev = device(d["device"], d["gas"])
        # The design's own answer only picks the mode to converge to.
        t0, f0 = d["design_onset"], d["design_frequency"]

        def f(x):
            r = gen_onset.end_residual(dev, x[0] * t0, 2 * math.pi * x[1] * f0)
            return [r.real, r.imag]
        x, info, ier, msg = fsolve(f, [1.0, 1.0], xtol=1e-13, full_output=True)
        if ier != 1:
            raise RuntimeError(d["name"] + ": " + msg)
        th, fr = x[0] * t0, x[1] * f0
        out["designs"].append(dict(name=d["name"], hot_temperature=th, frequency=fr, residual=math.hypot(*f(x))))
        print("%-34s Th = %.6f K  f = %.6f Hz" % (d["name"], th, fr))
    with open(os.path.join(HERE, "design_onset_ref.json"), "w") as fh:
        json.dump(out, fh, indent=1)
        fh.write("\n")


if __name__ == "__main__":
    main()
