#!/usr/bin/env bash
# Measures how fast `penduline survey` goes through a production line: makes COUNT invented
# records of 30 s at 500 Hz of the sample inspection hatch (demo-record --count, friction drawn
# with a 10 % spread), then surveys them with --jobs 1 and with --jobs 2, each into a fresh
# output folder, and prints the records per second of each run (wall time of the whole command,
# JVM start included).
# Usage: releng/scripts/survey-scale.sh [COUNT [WORK_DIR]]
#   COUNT     how many records (default 1000)
#   WORK_DIR  where the records and outputs go (default: a new temporary folder, removed at the end)
#   SURVEY_ARGS  the fit's options for every unit (default: --terms viscous,coulomb --resamples 0)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
count="${1:-1000}"
if ! [[ "$count" =~ ^[1-9][0-9]*$ ]]; then
  echo "survey-scale: COUNT must be a positive whole number, not '$count'" >&2
  exit 2
fi
if [ -n "${2:-}" ]; then
  work="$2"
  mkdir -p "$work"
else
  work="$(mktemp -d)"
  trap 'rm -rf "$work"' EXIT
fi
read -r -a fit_args <<<"${SURVEY_ARGS:---terms viscous,coulomb --resamples 0}"
design="$root/samples/inspection-hatch/hatch.penduline"
pen="$root/penduline"

"$pen" --version >/dev/null  # builds the product first when it is stale, outside the timing
echo "survey-scale: making $count records of 30 s at 500 Hz in $work/records ..." >&2
start=$(date +%s.%N)
"$pen" demo-record "$design" --theta0-deg 40 --viscous 0.012 --coulomb 0.02 --duration 30 --rate 500 \
    --count "$count" --into "$work/records" --spread 10 --seed 1 --force >/dev/null
end=$(date +%s.%N)
awk -v n="$count" -v s="$start" -v e="$end" 'BEGIN { printf "demo-record --count %d: %.1f s (%.2f records/s)\n", n, e - s, n / (e - s) }'

for jobs in 1 2; do
  out="$work/survey-jobs$jobs"
  rm -rf "$out"
  start=$(date +%s.%N)
  code=0
  "$pen" survey "$work/records" --mechanism "$design" --jobs "$jobs" --out "$out" --json "${fit_args[@]}" \
      >"$work/summary-jobs$jobs.json" || code=$?
  end=$(date +%s.%N)
  awk -v n="$count" -v j="$jobs" -v s="$start" -v e="$end" -v c="$code" \
      'BEGIN { printf "survey --jobs %d: %d records in %.1f s: %.2f records/s (exit code %d)\n", j, n, e - s, n / (e - s), c }'
done
if cmp -s "$work/survey-jobs1/units.json" "$work/survey-jobs2/units.json"; then
  echo "units.json of --jobs 1 and --jobs 2: identical"
else
  echo "units.json of --jobs 1 and --jobs 2: DIFFER" >&2
  exit 1
fi
