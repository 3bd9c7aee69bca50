#!/usr/bin/env python3
"""Scores a run's targets.csv against the generator's dipoles.csv (bench/run.sh): recall within a radius,
median horizontal error, median relative error of the depth below the sensors (truth: dipole depth below
the sea surface minus the nominal sensor depth, 25 m water less 2 m altitude; the altitude wanders by
+-0.3 m, so the depth figure is good to about that), and the picks that match no dipole.
Usage: score_targets.py DIPOLES_CSV TARGETS_CSV [RADIUS_M]"""
import csv, math, sys

truth = list(csv.DictReader(open(sys.argv[1])))
picks = list(csv.DictReader(open(sys.argv[2])))
radius = float(sys.argv[3]) if len(sys.argv) > 3 else 1.5
used, herr, derr = set(), [], []
for d in truth:
    tx, ty = float(d["x"]), float(d["y"])
    best, bi = None, None
    for i, p in enumerate(picks):
        r = math.hypot(float(p["x"]) - tx, float(p["y"]) - ty)
        if r <= radius and (best is None or r < best):
            best, bi = r, i
    if bi is None:
        continue
    used.add(bi)
    herr.append(best)
    depth = picks[bi]["depth_below_sensor_m"]
    if depth:
        true_depth = float(d["depth_m"]) - (25.0 - 2.0)
        derr.append(abs(float(depth) - true_depth) / true_depth)
med = lambda a: sorted(a)[len(a) // 2] if a else float("nan")
print(f"recall {len(herr)}/{len(truth)} within {radius} m; picks {len(picks)}, unmatched {len(picks) - len(used)}; "
      f"median horizontal error {med(herr):.3f} m; median relative depth error {med(derr):.3f}")
