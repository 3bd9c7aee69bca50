#!/usr/bin/python3
"""Synthetic transverse-gradiometer line data for bench/gridding.sh (fixed seed).

North-south sensor tracks 1.5 m apart with a gentle weave, dipoles 1-4 m below the sensors
(Blakely 1995, eq. 4.13, projected on a field of inclination 66, declination 1.5 degrees), 0.05 nT noise.
Writes CSV x,y,value and, for the accuracy check, the dipoles as a NumPy file.

usage: gridding_data.py OUT.csv WIDTH_M HEIGHT_M SAMPLES DIPOLES
"""
import sys
import numpy as np

out, width, height, samples, ndip = sys.argv[1], float(sys.argv[2]), float(sys.argv[3]), int(sys.argv[4]), int(sys.argv[5])
rng = np.random.default_rng(20261201)
inc, dec = np.radians(66.0), np.radians(1.5)
f = np.array([np.cos(inc) * np.sin(dec), np.cos(inc) * np.cos(dec), np.sin(inc)])
dip = np.column_stack([rng.uniform(0.05, 0.95, ndip) * width, rng.uniform(0.05, 0.95, ndip) * height,
                       rng.uniform(1.0, 4.0, ndip), rng.uniform(0.3, 3.0, ndip)])
np.save(out + ".dipoles.npy", dip)


def field(x, y):
    t = np.zeros_like(x)
    for dx0, dy0, dz0, m in dip:
        rx, ry, rz = x - dx0, y - dy0, 0.0 - dz0
        r2 = rx * rx + ry * ry + rz * rz
        r = np.sqrt(r2)
        mx, my, mz = m * f
        mdotr = (mx * rx + my * ry + mz * rz) / r
        k = 100.0 / (r2 * r)  # mu0/4pi in nT m3/(A m2)
        t += k * ((3 * mdotr * rx / r - mx) * f[0] + (3 * mdotr * ry / r - my) * f[1] + (3 * mdotr * rz / r - mz) * f[2])
    return t


tracks = int(np.floor((width - 0.2) / 1.5)) + 1
per = samples // tracks
with open(out, "w") as fh:
    fh.write("x,y,value\n")
    for k in range(tracks):
        y = np.linspace(0.1, height - 0.2, per)
        x = 0.1 + 1.5 * k + 0.15 * np.sin(y / 17.0 + k)
        x = np.clip(x, 0.05, width - 0.1)
        v = field(x, y) + rng.normal(0, 0.05, per)
        np.savetxt(fh, np.column_stack([x, y, v]), fmt="%.3f,%.3f,%.4f")
