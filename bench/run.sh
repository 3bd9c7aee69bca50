#!/usr/bin/env bash
# Benchmark of the whole job: `halyard run` on N samples with 2 sensors (default 10 million), a 1 m grid,
# every stage (lines, grid, maps, targets, GeoPackage, sheets), in a 4 GB heap.
# Usage: bench/run.sh [SAMPLES] [DIPOLES]   (defaults 10000000 and 400)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
n="${1:-10000000}"
dipoles="${2:-400}"
work="${BENCH_DIR:-/tmp/halyard-bench-run}"
mkdir -p "$work"
(cd "$root" && ./halyard --version >/dev/null)   # builds the jar (the generator uses its forward model)
if [ ! -f "$work/data-$n-$dipoles.done" ]; then
  echo "generating $n samples with $dipoles dipoles in $work ..." >&2
  java -Xmx512m -cp "$root/plugin-ui/target/halyard.jar" "$root/bench/SurveyBenchData.java" "$n" "$work" "$dipoles"
  touch "$work/data-$n-$dipoles.done"
fi
cat > "$work/recipe.json" <<JSON
{
  "name": "Halyard benchmark block (synthetic)",
  "crs": "EPSG:32631",
  "survey": {
    "file": "lines.csv",
    "columns": { "line": "line", "time": "time", "x": "x", "y": "y", "altitude": "altitude", "depth": "depth" },
    "sensors": [ { "column": "mag_port", "across_m": -0.75, "along_m": 0.0 },
                 { "column": "mag_stbd", "across_m": 0.75, "along_m": 0.0 } ],
    "tie_lines": ["T01", "T02", "T03", "T04", "T05", "T06", "T07", "T08", "T09", "T10"]
  },
  "base_station": { "file": "base.iaga2002" },
  "grid": { "cell_m": 1.0 }
}
JSON
rm -rf "$work/out"
/usr/bin/time -v java -Xmx4g -jar "$root/plugin-ui/target/halyard.jar" run "$work/recipe.json" --out "$work/out" \
  2> >(grep -iE "Maximum resident|Elapsed|User time|System time|error|exception" >&2)
cat "$work/out/report/run.log" 2>/dev/null | grep -iE "stage|s$|seconds" | head -40
