#!/usr/bin/python3
"""RMS error of a gridded surface against the exact dipole field, at nodes within 2 cells of data.

usage: gridding_accuracy.py DATA.csv NODES.xyz CELL   (NODES.xyz: x y z per line, from gdal or gmt)
"""
import os
import sys
import numpy as np

sys.path.insert(0, os.path.dirname(os.path.abspath(__file__)))
from gridding_data import dipole_field  # noqa: E402

data, nodes, cell = sys.argv[1], sys.argv[2], float(sys.argv[3])
dip = np.load(data + ".dipoles.npy")
d = np.loadtxt(data, delimiter=",", skiprows=1)
g = np.loadtxt(nodes)
g = g[np.isfinite(g[:, 2]) & (np.abs(g[:, 2]) < 1e4)]
x0, y0 = g[:, 0].min(), g[:, 1].min()
nc = int(round((g[:, 0].max() - x0) / cell)) + 1
nr = int(round((g[:, 1].max() - y0) / cell)) + 1
occ = np.zeros((nr, nc), bool)
occ[np.clip(np.round((d[:, 1] - y0) / cell).astype(int), 0, nr - 1),
    np.clip(np.round((d[:, 0] - x0) / cell).astype(int), 0, nc - 1)] = True
near = np.zeros_like(occ)
for di in range(-2, 3):
    for dj in range(-2, 3):
        if di * di + dj * dj <= 4:
            near |= np.roll(np.roll(occ, di, 0), dj, 1)
sel = near[np.round((g[:, 1] - y0) / cell).astype(int), np.round((g[:, 0] - x0) / cell).astype(int)]
if sel.sum() > 2_000_000:  # keep the large case quick: a fixed random subset of the nodes
    sel &= np.random.default_rng(1).random(sel.size) < 2_000_000 / sel.sum()
e = g[sel, 2] - dipole_field(dip, g[sel, 0], g[sel, 1])
print("%.4f nT RMS over %d nodes within 2 cells of data (data range %.1f nT)"
      % (np.sqrt(np.mean(e * e)), sel.sum(), np.ptp(d[:, 2])))
