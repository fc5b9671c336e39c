#!/usr/bin/python3
"""Write units_factors.json: conversion factors and temperature conversions from
scipy.constants (Debian python3-scipy), an outside reference for the units
package's tests.

Run from the repository root:  /usr/bin/python3 testdata/gen_units_factors.py
The tests read the committed factors.json; CI never runs this script.
"""
import json
import os

import scipy
import scipy.constants as c

# SI value of one typed unit, by the unit's spelling in our parser.
factors = {
    "in": c.inch,
    "ft": c.foot,
    "mil": c.mil,
    "um": c.micron,
    "lb": c.pound,
    "oz": c.oz,
    "psi": c.psi,
    "ksi": 1e3 * c.psi,
    "torr": c.torr,
    "atm": c.atm,
    "bar": c.bar,
    "mbar": 1e-3 * c.bar,
    "cal": c.calorie,
    "kcal": 1e3 * c.calorie,
    "L": c.liter,
    "in3": c.inch ** 3,
    "ft3": c.foot ** 3,
    "in2": c.inch ** 2,
    "ft2": c.foot ** 2,
    "lb/ft3": c.pound / c.foot ** 3,
    "cfm": c.foot ** 3 / c.minute,
    "L/min": c.liter / c.minute,
    "m3/h": 1 / c.hour,
    "km/h": c.kmh,
    "ft/s": c.foot,
    "/in": 1 / c.inch,
    "/in2": 1 / c.inch ** 2,
    "cpsi": 1 / c.inch ** 2,
    "kWh": 1e3 * c.hour,
    "Wh": c.hour,
    "min": c.minute,
    "h": c.hour,
    "d": c.day,
    "/h": 1 / c.hour,
    "/min": 1 / c.minute,
    "t": c.metric_ton,
    "degR": c.convert_temperature(1.0, "Rankine", "Kelvin"),
}

# Absolute temperatures: typed value and unit -> kelvin.
temps = []
for unit, name in (("degC", "Celsius"), ("degF", "Fahrenheit"), ("degR", "Rankine")):
    for x in (-459.67, -273.15, -40.0, 0.0, 27.0, 80.0, 100.0, 571.5, 1000.0):
        k = float(c.convert_temperature(x, name, "Kelvin"))
        if k > 0:
            temps.append({"value": x, "unit": unit, "kelvin": k})

out = {
    "generator": "testdata/gen_units_factors.py",
    "scipy_version": scipy.__version__,
    "factors": {k: float(v) for k, v in factors.items()},
    "temperatures": temps,
}
path = os.path.join(os.path.dirname(os.path.abspath(__file__)), "units_factors.json")
with open(path, "w") as f:
    json.dump(out, f, indent=1, sort_keys=True)
    f.write("\n")
print("wrote", path)
