#!/usr/bin/python3
"""Synthetic transverse-gradiometer line data for bench/gridding.sh (fixed seed).

North-south sensor tracks 1.5 m apart with a gentle weave, dipoles 1-4 m below the sensors
(Blakely 1995, eq. 4.13, projected on a field of inclination 66, declination 1.5 degrees), 0.05 nT noise.
Writes CSV x,y,value and, for the accuracy check, the dipoles as a NumPy file beside it.

usage: gridding_data.py OUT.csv WIDTH_M HEIGHT_M SAMPLES DIPOLES
"""
import os
import sys
import numpy as np

INC, DEC = np.radians(66.0), np.radians(1.5)
F = np.array([np.cos(INC) * np.sin(DEC), np.cos(INC) * np.cos(DEC), np.sin(INC)])


def dipole_field(dip, x, y):
    """Total-field anomaly (nT) at sensor level z = 0 of dipoles (x, y, depth, moment A m2) along F."""
    t = np.zeros_like(x)
    for dx0, dy0, dz0, m in dip:
        rx, ry, rz = x - dx0, y - dy0, 0.0 - dz0
        r2 = rx * rx + ry * ry + rz * rz
        r = np.sqrt(r2)
        mx, my, mz = m * F
        mdotr = (mx * rx + my * ry + mz * rz) / r
        k = 100.0 / (r2 * r)  # mu0/4pi = 1e-7 T m/A, times 1e9 for nT
        t += k * ((3 * mdotr * rx / r - mx) * F[0] + (3 * mdotr * ry / r - my) * F[1] + (3 * mdotr * rz / r - mz) * F[2])
    return t


def main():
    out, width, height = sys.argv[1], float(sys.argv[2]), float(sys.argv[3])
    samples, ndip = int(sys.argv[4]), int(sys.argv[5])
    rng = np.random.default_rng(20261201)
    dip = np.column_stack([rng.uniform(0.05, 0.95, ndip) * width, rng.uniform(0.05, 0.95, ndip) * height,
                           rng.uniform(1.0, 4.0, ndip), rng.uniform(0.3, 3.0, ndip)])
    tracks = int(np.floor((width - 0.2) / 1.5)) + 1
    per = samples // tracks
    with open(out + ".part", "w") as fh:
        fh.write("x,y,value\n")
        for k in range(tracks):
            y = np.linspace(0.1, height - 0.2, per)
            x = np.clip(0.1 + 1.5 * k + 0.15 * np.sin(y / 17.0 + k), 0.05, width - 0.1)
            v = dipole_field(dip, x, y) + rng.normal(0, 0.05, per)
            np.savetxt(fh, np.column_stack([x, y, v]), fmt="%.3f,%.3f,%.4f")
    np.save(out + ".dipoles.npy", dip)
    os.replace(out + ".part", out)


if __name__ == "__main__":
    main()
