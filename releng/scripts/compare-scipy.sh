#!/usr/bin/env bash
# Side by side: Penduline's friction fit against an independent SciPy reference of the same
# model (releng/benchmarks/reference/scipy_fit.py), on one invented 1 kHz record with a known
# truth, from the same starting values. Prints, in one run:
#   1. as a user measures it: `./penduline fit` with its default settings (term sets compared,
#      40 bootstrap refits) as a fresh process, against the SciPy script as a fresh process
#      (one point fit), wall time and peak resident memory of each, and the ratio;
#   2. the default fit of the sample project and of a 300 000-sample record, fresh processes;
#   3. a table of estimates and the warm in-process times (the second figure, never the headline).
# Needs Debian's python3-scipy (installed when missing and run as root).
# Usage: releng/scripts/compare-scipy.sh [DURATION_S]   (default 60)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
duration="${1:-60}"
py=/usr/bin/python3
if ! "$py" -c "import scipy" 2>/dev/null; then
  if [ "$(id -u)" -ne 0 ]; then
    echo "compare-scipy: needs python3-scipy (apt-get install python3-scipy)" >&2
    exit 2
  fi
  apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq python3-scipy >/dev/null
fi
export JAVA_HOME="$("$root/releng/scripts/find-jdk.sh")"
mvn="$("$root/releng/scripts/bootstrap-maven.sh")"
"$mvn" -B -q -f "$root/releng/benchmarks/pom.xml" package
"$root/penduline" --version >/dev/null  # builds the product and its start-up cache when needed

# Wall time and peak resident memory of one fresh process (its own, from wait4's rusage).
measure() {
  "$py" - "$@" <<'PY'
import os, subprocess, sys, time
t0 = time.monotonic()
p = subprocess.Popen(sys.argv[1:], stdout=subprocess.DEVNULL, stderr=subprocess.PIPE)
_, status, usage = os.wait4(p.pid, 0)
wall = time.monotonic() - t0
err = p.stderr.read().decode(errors="replace").strip().splitlines()
code = os.waitstatus_to_exitcode(status)
print(f"{wall:.2f} {usage.ru_maxrss / 1024:.0f} {code}" + ("" if code == 0 else " " + (err[-1] if err else "")))
PY
}

work="$(mktemp -d)"
trap 'rm -rf "$work"' EXIT
record="$work/record.csv"
# Truth: arm 2 kg, Lc 0.4 m, J0 0.5 kg·m²; released at 30° after 1 s; b 0.01, Tc 0.02; offset 1.2°;
# 0.02° noise, angles in degrees at 1 kHz. The calculated inertia handed to both fits is 2 % off.
"$root/penduline" demo-record --mass 2 --centroid-distance 0.4 --pivot-inertia 0.5 --theta0-deg 30 \
    --viscous 0.01 --coulomb 0.02 --offset-deg 1.2 --noise-deg 0.02 --counts-per-rev 0 --still-s 1 \
    --duration "$duration" --rate 1000 --seed 7 --out "$record" >/dev/null
# The same crude starting values for both: still level, first motion, late mean, small friction.
read -r theta0 trel offset < <("$py" - "$record" <<'PY'
import sys, numpy as np
rows = [l for l in open(sys.argv[1]) if l.strip() and not l.startswith('#')][1:]
d = np.array([[float(v) for v in l.split(',')] for l in rows])
t, y = d[:, 0], np.radians(d[:, 1])
still = y[:200]
level, spread = np.median(still), np.std(still) + 1e-6
moving = np.nonzero(np.abs(y - level) > 6 * spread)[0]
offset = float(np.mean(y[len(y) // 2:]))
print(level - offset, t[moving[0]], offset)
PY
)
j0=0.51   # 2 % above the truth, as a parts list might be
java_json="$("$JAVA_HOME/bin/java" -Xmx256m -cp "$root/releng/benchmarks/target/penduline-benchmarks.jar" \
    dev.penduline.benchmarks.FitTiming "$record" 2 0.4 "$j0" 0.001 0.001 "$theta0" "$trel" "$offset" 10)"
scipy_json="$("$py" "$root/releng/benchmarks/reference/scipy_fit.py" "$record" --mass 2 --centroid-distance 0.4 \
    --pivot-inertia "$j0" --guess 0.001 0.001 "$j0" "$theta0" "$trel" "$offset" --repeat 1)"
# 1. as a user runs them: fresh processes, default settings; three runs each, the median shown
cli=("$root/penduline" fit --mass 2 --centroid-distance 0.4 --pivot-inertia "$j0" --session "$record")
ref=("$py" "$root/releng/benchmarks/reference/scipy_fit.py" "$record" --mass 2 --centroid-distance 0.4 \
     --pivot-inertia "$j0" --guess 0.001 0.001 "$j0" "$theta0" "$trel" "$offset" --repeat 1)
runs="$work/runs.txt"
: > "$runs"
for i in 1 2 3; do
  echo "penduline $(measure "${cli[@]}")" >> "$runs"
  echo "scipy $(measure "${ref[@]}")" >> "$runs"
done
sample="$work/sample"
cp -r "$root/samples/inspection-hatch" "$sample"
echo "sample $(measure "$root/penduline" fit "$sample/hatch.penduline" --no-save)" >> "$runs"
long="$work/long.csv"
"$root/penduline" demo-record --mass 2 --centroid-distance 0.4 --pivot-inertia 0.5 --theta0-deg 30 \
    --viscous 0.01 --coulomb 0.02 --offset-deg 1.2 --noise-deg 0.02 --counts-per-rev 0 --still-s 1 \
    --duration 300 --rate 1000 --seed 7 --out "$long" >/dev/null
echo "long $(measure "$root/penduline" fit --mass 2 --centroid-distance 0.4 --pivot-inertia "$j0" --session "$long")" >> "$runs"
"$py" - "$runs" "$duration" <<'PY'
import statistics, sys
rows = [l.split() for l in open(sys.argv[1])]
def med(kind, k):
    vals = [float(r[k]) for r in rows if r[0] == kind]
    return statistics.median(vals), min(vals), max(vals)
for r in rows:
    if r[3] != "0":
        print("FAILED:", " ".join(r)); sys.exit(1)
pw, pwmin, pwmax = med("penduline", 1); pm = med("penduline", 2)[0]
sw, swmin, swmax = med("scipy", 1); sm = med("scipy", 2)[0]
print(f"Whole fresh processes, default settings, {sys.argv[2]} s record at 1 kHz (median of 3):")
print(f"  ./penduline fit (term sets compared, 40 bootstrap refits): {pw:6.2f} s ({pwmin:.2f}-{pwmax:.2f}), {pm:5.0f} MB peak resident")
print(f"  SciPy reference (one point fit):                          {sw:6.2f} s ({swmin:.2f}-{swmax:.2f}), {sm:5.0f} MB peak resident")
print(f"  ratio: Penduline {sw / pw:.1f}x faster as a whole process (goal: 10x)")
s = [r for r in rows if r[0] == "sample"][0]; l = [r for r in rows if r[0] == "long"][0]
print(f"  ./penduline fit of the sample project (3 records x 30 000 samples): {float(s[1]):.2f} s, {float(s[2]):.0f} MB")
print(f"  ./penduline fit of a 300 000-sample record: {float(l[1]):.2f} s, {float(l[2]):.0f} MB")
print()
PY
"$py" - "$java_json" "$scipy_json" "$duration" <<'PY'
import json, sys, math
j, s, duration = json.loads(sys.argv[1]), json.loads(sys.argv[2]), sys.argv[3]
truth = {"viscous": 0.01, "coulomb": 0.02, "pivot_inertia": 0.5}
print(f"Fit of a {duration} s record at 1 kHz (viscous + Coulomb + inertia + release angle, time, offset)")
print(f"{'parameter':<15}{'truth':>10}{'Penduline':>14}{'± σ':>11}{'SciPy':>14}{'± σ':>11}")
for k, v in truth.items():
    print(f"{k:<15}{v:>10.4g}{j['parameters'][k]:>14.6g}{j['sigma'][k]:>11.2g}"
          f"{s['parameters'][k]:>14.6g}{s['sigma'][k]:>11.2g}")
print(f"{'rms residual °':<15}{'':>10}{j['rms_residual_deg']:>14.5f}{'':>11}{s['rms_residual_deg']:>14.5f}")
print(f"{'seconds / fit':<15}{'':>10}{j['seconds_per_fit']:>14.3f}{'':>11}{s['seconds_per_fit']:>14.3f}")
print(f"in-process (second figure): first Penduline point fit in a cold JVM {j['seconds_first_fit']:.3f} s; "
      f"speed-up of the warm point fit: {s['seconds_per_fit'] / j['seconds_per_fit']:.0f}x")
PY
