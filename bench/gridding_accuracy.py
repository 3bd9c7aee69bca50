#!/usr/bin/python3
"""RMS error of a gridded surface against the exact dipole field, at nodes within 2 cells of data.

usage: gridding_accuracy.py DATA.csv NODES.xyz CELL   (NODES.xyz: x y z per line, from gdal or gmt)
"""
import sys
import numpy as np

data, nodes, cell = sys.argv[1], sys.argv[2], float(sys.argv[3])
dip = np.load(data + ".dipoles.npy")
inc, dec = np.radians(66.0), np.radians(1.5)
f = np.array([np.cos(inc) * np.sin(dec), np.cos(inc) * np.cos(dec), np.sin(inc)])
d = np.loadtxt(data, delimiter=",", skiprows=1)
g = np.loadtxt(nodes)
g = g[np.isfinite(g[:, 2]) & (np.abs(g[:, 2]) < 1e4)]
x0, y0 = g[:, 0].min(), g[:, 1].min()
nc = int(round((g[:, 0].max() - x0) / cell)) + 1
nr = int(round((g[:, 1].max() - y0) / cell)) + 1
occ = np.zeros((nr, nc), bool)
ci = np.clip(np.round((d[:, 0] - x0) / cell).astype(int), 0, nc - 1)
ri = np.clip(np.round((d[:, 1] - y0) / cell).astype(int), 0, nr - 1)
occ[ri, ci] = True
near = np.zeros_like(occ)
for di in range(-2, 3):
    for dj in range(-2, 3):
        if di * di + dj * dj <= 4:
            near |= np.roll(np.roll(occ, di, 0), dj, 1)
gc = np.round((g[:, 0] - x0) / cell).astype(int)
gr = np.round((g[:, 1] - y0) / cell).astype(int)
sel = near[gr, gc]
if sel.sum() > 2_000_000:  # keep the check quick on the large case: a fixed random subset of the nodes
    keep = np.random.default_rng(1).random(sel.size) < 2_000_000 / sel.sum()
    sel &= keep
x, y = g[sel, 0], g[sel, 1]
t = np.zeros_like(x)
for dx0, dy0, dz0, m in dip:
    rx, ry, rz = x - dx0, y - dy0, 0.0 - dz0
    r2 = rx * rx + ry * ry + rz * rz
    r = np.sqrt(r2)
    mx, my, mz = m * f
    mdotr = (mx * rx + my * ry + mz * rz) / r
    k = 100.0 / (r2 * r)
    t += k * ((3 * mdotr * rx / r - mx) * f[0] + (3 * mdotr * ry / r - my) * f[1] + (3 * mdotr * rz / r - mz) * f[2])
e = g[sel, 2] - t
print("%.4f nT RMS over %d nodes within 2 cells of data (data range %.1f nT)" % (np.sqrt(np.mean(e * e)), sel.sum(), np.ptp(d[:, 2])))
