#!/usr/bin/env bash
# Gridding benchmark: Halyard `halyard grid` beside GMT `surface` on the same synthetic line data,
# whole-process wall time and peak memory from /usr/bin/time -v, and each grid's RMS error against the
# exact dipole field at nodes within 2 cells of data. Figures go in docs/benchmarks.md ("Gridding").
#
# usage: bench/gridding.sh [small|large|all]   (small: 128 k samples, 505 x 571; large: 10 M, 4000 x 4000)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
work="${BENCH_DIR:-/tmp/halyard-bench-gridding}"
mkdir -p "$work"
py=/usr/bin/python3
which="${1:-all}"
"$root/halyard" --version >/dev/null  # build once, outside the timings
# The launcher as users run it (with its class-data archive); the build above keeps rebuilds out of the timings.
halyard_jar() { "$root/halyard" "$@"; }
export -f halyard_jar; export root

measure() {  # label, command...
  local label="$1"; shift
  /usr/bin/time -v "$@" 2>"$work/time.txt" >/dev/null || { cat "$work/time.txt" >&2; exit 1; }
  local wall rss cpu
  wall=$(grep 'Elapsed (wall clock)' "$work/time.txt" | awk '{print $NF}')
  rss=$(grep 'Maximum resident set size' "$work/time.txt" | awk '{print $NF}')
  cpu=$(awk -F': ' '/User time|System time/ {s += $2} END {printf "%.1f", s}' "$work/time.txt")
  printf '%-30s wall %8s  cpu %7s s  peak %6d MB\n' "$label" "$wall" "$cpu" $((rss / 1024))
}

run_case() {  # name width height samples dipoles
  local name="$1" w="$2" h="$3" n="$4" nd="$5"
  cd "$work"  # GMT leaves gmt.history in the working directory
  local csv="$work/$name.csv"
  [ -f "$csv.dipoles.npy" ] || "$py" "$root/bench/gridding_data.py" "$csv" "$w" "$h" "$n" "$nd"
  local rows; rows=$(($(wc -l <"$csv") - 1))
  echo "== $name: $rows samples, ${w} m x ${h} m, cell 0.5 m, tension 0.25"
  # Same lattice for both: GMT gridline registration on Halyard's cell centres.
  local region="-R0.25/$(echo "$w - 0.25" | bc)/0.25/$(echo "$h - 0.25" | bc)"
  measure "halyard grid" bash -c 'halyard_jar "$@"' _ grid "$csv" "$work/$name-halyard.tif" --x x --y y --value value \
      --cell 0.5 --crs EPSG:32631 --blank none
  measure "gmt surface -T0.25" gmt surface "$csv" -h1 "$region" -I0.5 -T0.25 -G"$work/$name-gmt.nc"
  measure "gmt blockmedian + surface" bash -c "gmt blockmedian '$csv' -h1 $region -I0.5 | gmt surface $region -I0.5 -T0.25 -G'$work/$name-gmtbm.nc'"
  gdalinfo "$work/$name-halyard.tif" | grep -E '^Size is' | sed 's/^/halyard /'
  gmt grdinfo -C "$work/$name-gmt.nc" | awk '{print "gmt     size is " $10 ", " $11}'
  gdal_translate -q -of XYZ "$work/$name-halyard.tif" "$work/$name-halyard.xyz"
  gmt grd2xyz "$work/$name-gmt.nc" >"$work/$name-gmt.xyz"
  gmt grd2xyz "$work/$name-gmtbm.nc" >"$work/$name-gmtbm.xyz"
  printf 'accuracy halyard:             '; "$py" "$root/bench/gridding_accuracy.py" "$csv" "$work/$name-halyard.xyz" 0.5
  printf 'accuracy gmt surface:         '; "$py" "$root/bench/gridding_accuracy.py" "$csv" "$work/$name-gmt.xyz" 0.5
  printf 'accuracy gmt blockmedian+surf:'; "$py" "$root/bench/gridding_accuracy.py" "$csv" "$work/$name-gmtbm.xyz" 0.5
}

echo "machine: $(nproc) cores, load average $(cut -d' ' -f1-3 /proc/loadavg), $(free -g | awk '/Mem:/ {print $2}') GB; $(gmt --version | sed 's/^/GMT /'); $(java -version 2>&1 | head -1)"
case "$which" in
  small) run_case small 252.5 285.5 128000 40 ;;
  large) run_case large 2000 2000 10000000 60 ;;
  all) run_case small 252.5 285.5 128000 40; run_case large 2000 2000 10000000 60 ;;
  *) echo "usage: $0 [small|large|all]" >&2; exit 2 ;;
esac
