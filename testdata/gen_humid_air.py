#!/usr/bin/python3
"""Write testdata/humid_air_iapws.csv: humid-air reference values for the
gasprops tests of HumidAir, WaterMoleFraction and WaterSaturationPressure.

Source: Debian's python3-iapws (iapws 1.5.3):
  - iapws.iapws97._PSat_T: saturation pressure of water, IAPWS-IF97 eq. 30;
  - iapws.humidAir.HumidAir: humid air after IAPWS G8-10 (2010), the
    TEOS-10 based Gibbs function of humid air (real-gas dry air of Lemmon
    et al. 2000, IAPWS-95 water, cross virial coefficients); its relative
    humidity is not used (see humid()): the vapour's mole fraction is
    x_w = rh p_sat(T) / p here;
  - iapws.humidAir.Air: dry air (Lemmon et al. 2000) for the same T and p.

For each temperature, pressure and relative humidity the speed of sound of the humid air is written with that of dry air, so the
Go test can compare the relative rise of the sound speed with humidity
(which removes the small difference between tubewright's ideal-gas air and
the real-gas reference).

Run from the repository root:  /usr/bin/python3 testdata/gen_humid_air.py
(CI never runs this; the CSV is committed.)
"""
import csv
import os

import iapws
from iapws.humidAir import Air, HumidAir
from iapws.iapws97 import _PSat_T

OUT = os.path.join(os.path.dirname(os.path.abspath(__file__)), "humid_air_iapws.csv")

TEMPS_C = [0.0, 10.0, 22.0, 30.0, 40.0, 50.0, 60.0]
PRESS = [0.101325, 0.2]  # MPa
RHS = [0.25, 0.5, 0.75, 1.0]


def humid(T, P, rh):
    # x_w = rh p_sat / p (Dalton; no enhancement factor: the saturation
    # routine of HumidAir, _eq, returns a dry-air fraction above 1 in this
    # iapws version, so its RH is not used)
    xw = rh * _PSat_T(T) / P
    return xw, HumidAir(T=T, P=P, xw=xw)


def main():
    with open(OUT, "w", newline="") as f:
        f.write("# humid air, iapws %s (IAPWS G8-10 HumidAir, IF97 _PSat_T, Lemmon et al. 2000 Air)\n" % iapws.__version__)
        f.write("# written by testdata/gen_humid_air.py; T K, p Pa, rh 1, psat Pa, xw = rh psat/p mol/mol, w_humid and w_dry m/s\n")
        w = csv.writer(f, lineterminator="\n")
        w.writerow(["name", "T", "p", "rh", "psat", "xw", "w_humid", "w_dry"])
        for tc in TEMPS_C:
            T = 273.15 + tc
            for P in PRESS:
                ps = _PSat_T(T)
                if ps >= P:
                    continue
                dry = Air(T=T, P=P)
                for rh in RHS:
                    xw, h = humid(T, P, rh)
                    name = "t%g_p%g_rh%g" % (tc, P * 1e6, rh)
                    w.writerow([name, "%.2f" % T, "%.1f" % (P * 1e6), rh, "%.10g" % (ps * 1e6), "%.10g" % xw,
                                "%.10g" % h.w, "%.10g" % dry.w])
                    print(name, "xw %.6f" % xw, "rise %.4f %%" % (100 * (h.w / dry.w - 1)))


if __name__ == "__main__":
    main()
