#!/usr/bin/python3
"""Write testdata/air_iapws.csv: dry-air reference values for the gasprops tests.

Source: Debian's python3-iapws (iapws 1.5.2), class iapws.humidAir.Air, which
implements Lemmon, Jacobsen, Penoncello & Friend, J. Phys. Chem. Ref. Data 29,
331 (2000) for the equation of state and Lemmon & Jacobsen, Int. J.
Thermophys. 25, 21 (2004) for viscosity and thermal conductivity.

Run from the repository root:  /usr/bin/python3 testdata/gen_air_iapws.py
(CI never runs this; the CSV is committed.)
"""
import csv
import os

import iapws
from iapws.humidAir import Air

OUT = os.path.join(os.path.dirname(os.path.abspath(__file__)), "air_iapws.csv")

TEMPS = [200.0, 250.0, 300.0, 400.0, 500.0, 700.0, 1000.0]  # K
PRESS = [0.001, 0.1, 1.0, 3.0]  # MPa


def main():
    with open(OUT, "w", newline="") as f:
        w = csv.writer(f, lineterminator="\n")
        f.write("# dry air, iapws %s iapws.humidAir.Air (Lemmon et al. 2000; Lemmon & Jacobsen 2004)\n" % iapws.__version__)
        f.write("# molar mass used by iapws: %.5f g/mol\n" % Air.M)
        f.write("# written by testdata/gen_air_iapws.py; T K, p Pa, rho kg/m3, cp0 and cp J/(kg K), w m/s, mu Pa s, k W/(m K)\n")
        w.writerow(["T", "p", "rho", "cp0", "cp", "w", "mu", "k"])
        for T in TEMPS:
            for P in PRESS:
                a = Air(T=T, P=P)
                w.writerow([T, P * 1e6, "%.8g" % a.rho, "%.8g" % (a.cp0 * 1e3), "%.8g" % (a.cp * 1e3),
                            "%.8g" % a.w, "%.8g" % a.mu, "%.8g" % a.k])


if __name__ == "__main__":
    main()
