#!/usr/bin/env bash
# Benchmark: upward continuation and analytic signal of a 4096 x 4096 float grid, whole process (JVM start,
# GeoTIFF read and write included), beside GMT grdfft on the same grid. Prints wall time and peak memory.
# Usage: bench/filters.sh [N]   (needs gdal-bin, gmt, python3-numpy; run from the repository root)
set -euo pipefail
n=${1:-4096}
w=$(mktemp -d); trap 'rm -rf "$w"' EXIT
./halyard --version >/dev/null   # build first, outside the timings
/usr/bin/python3 - "$w" "$n" <<'PY'
import sys, numpy as np
w, n = sys.argv[1], int(sys.argv[2])
rng = np.random.default_rng(1)
x = np.linspace(0, 1, n)
a = (np.sin(40 * x)[None, :] * np.cos(33 * x)[:, None] + 0.1 * rng.standard_normal((n, n))).astype('<f4')
a.tofile(f"{w}/in.f32")
open(f"{w}/in.hdr", "w").write(f"ENVI\nsamples = {n}\nlines = {n}\nbands = 1\nheader offset = 0\nfile type = ENVI Standard\ndata type = 4\ninterleave = bsq\nbyte order = 0\nmap info = {{UTM, 1, 1, 400000, 6000000, 0.25, 0.25, 31, North, WGS-84}}\n")
PY
gdal_translate -q -of GTiff -a_srs EPSG:32631 "$w/in.f32" "$w/in.tif"
gmt grdconvert "$w/in.tif=gd" "$w/in.nc"
echo "grid ${n} x ${n} float32, $(nproc) cores, $(java -version 2>&1 | head -1)"
for i in 1 2 3; do
  /usr/bin/time -f "%e %M" -o "$w/t" ./halyard filter upward "$w/in.tif" "$w/up.tif" --height 2 >/dev/null 2>&1
  read -r s kb < "$w/t"; printf 'halyard filter upward --height 2      %6.2f s %6d MB\n' "$s" "$((kb / 1024))"
  /usr/bin/time -f "%e %M" -o "$w/t" ./halyard filter analytic-signal "$w/in.tif" "$w/as.tif" >/dev/null 2>&1
  read -r s kb < "$w/t"; printf 'halyard filter analytic-signal        %6.2f s %6d MB\n' "$s" "$((kb / 1024))"
  /usr/bin/time -f "%e %M" -o "$w/t" gmt grdfft "$w/in.nc" -C2 -G"$w/gup.nc" >/dev/null 2>&1
  read -r s kb < "$w/t"; printf 'gmt grdfft in.nc -C2                  %6.2f s %6d MB\n' "$s" "$((kb / 1024))"
  # the very GeoTIFF Halyard reads, through GMT's GDAL bridge
  /usr/bin/time -f "%e %M" -o "$w/t" gmt grdfft "$w/in.tif=gd" -C2 -G"$w/gup2.nc" >/dev/null 2>&1
  read -r s kb < "$w/t"; printf 'gmt grdfft in.tif=gd -C2              %6.2f s %6d MB\n' "$s" "$((kb / 1024))"
  # an analytic signal with GMT takes three transforms and a combination (timing only; peak = largest step)
  /usr/bin/time -f "%e %M" -o "$w/t" bash -c "gmt grdfft '$w/in.tif=gd' -A90 -G'$w/dx.nc' && gmt grdfft '$w/in.tif=gd' -A0 -G'$w/dy.nc' \
    && gmt grdfft '$w/in.tif=gd' -D -G'$w/dz.nc' && gmt grdmath '$w/dx.nc' '$w/dy.nc' HYPOT '$w/dz.nc' HYPOT = '$w/gas.nc'" >/dev/null 2>&1
  read -r s kb < "$w/t"; printf 'gmt grdfft -A90, -A0, -D + grdmath      %6.2f s %6d MB\n' "$s" "$((kb / 1024))"
done
