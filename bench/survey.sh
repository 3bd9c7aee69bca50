#!/usr/bin/env bash
# Benchmark of survey line processing: import + positioning + diurnal + spikes + levelling (+ gradients,
# CSV and QC report, timed separately) of N samples with 2 sensors, in a 2 GB heap.
# Usage: bench/survey.sh [SAMPLES]   (default 10000000)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/.." && pwd)"
n="${1:-10000000}"
work="${BENCH_DIR:-/tmp/halyard-bench-survey}"
mkdir -p "$work"
if [ ! -f "$work/lines-$n.done" ]; then
  echo "generating $n samples in $work ..." >&2
  (cd "$root" && ./halyard --version >/dev/null)   # builds the jar the generator uses
  java -Xmx512m -cp "$root/plugin-ui/target/halyard.jar" "$root/bench/SurveyBenchData.java" "$n" "$work"
  touch "$work/lines-$n.done"
fi
ls -l "$work/lines.csv" "$work/base.iaga2002" >&2
(cd "$root" && ./halyard --version >/dev/null)   # builds the jar if needed
ties=T01,T02,T03,T04,T05,T06,T07,T08,T09,T10
/usr/bin/time -v java -Xmx2g -jar "$root/plugin-ui/target/halyard.jar" lines "$work/lines.csv" --out "$work/out" \
  --crs EPSG:32631 --sensor mag_port:-0.75 --sensor mag_stbd:0.75 --altitude altitude --depth depth \
  --tie "$ties" --base "$work/base.iaga2002" --spacing-limit 6 --altitude-limit 3 --timings \
  2> >(grep -iE "timings|Maximum resident|Elapsed|error|exception" >&2)
