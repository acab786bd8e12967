#!/usr/bin/env bash
# Fuzzes the three readers of user files with Jazzer (releng/fuzz, a plain Maven project outside
# the Tycho reactor): first every seed and committed finding once (regression mode), then each
# reader in its own JVM for SECONDS (default 60): parts lists, swing records, mechanism files.
# Fails on a finding and says where the input was saved (the reader's inputs directory under
# releng/fuzz/src/test/resources/, from where the regression run replays it from then on).
# Usage: releng/scripts/fuzz.sh [SECONDS_PER_READER] [-o]     (-o: Maven offline; 0 seconds: the
# regression run only). Seeds: the samples' parts lists, records and mechanism files, the records
# of the physics tests and the reference corpus, and every file of the hostile corpus (files/).
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
seconds="${1:-60}"
shift || true
case "$seconds" in
  ''|*[!0-9]*) echo "fuzz.sh: SECONDS_PER_READER must be a whole number, got '$seconds'" >&2; exit 2 ;;
esac
offline=()
for a in "$@"; do
  case "$a" in
    -o|--offline) offline=(-o) ;;
    *) echo "fuzz.sh: unknown option '$a' (only -o)" >&2; exit 2 ;;
  esac
done

export JAVA_HOME="$("$root/releng/scripts/find-jdk.sh")"
mvn="$("$root/releng/scripts/bootstrap-maven.sh")"
project="$root/releng/fuzz"
inputs="$project/src/test/resources/dev/penduline/fuzz"
opts=(-B "${offline[@]}" -f "$project/pom.xml")
if [ "${CI:-}" = "true" ]; then
  opts+=(-ntp)
fi
# Inputs of at most 32 KiB, so that an out-of-memory error in the tests' 512 MB heap is a real
# finding. Jazzer passes jazzer.internal.arg.N to libFuzzer (0 is the program name).
max_len=32768
# In fuzzing mode one JUnit invocation runs the whole campaign, so the tests' @Timeout (the hang
# guard of the regression run) is switched off and libFuzzer's per-input -timeout takes its place.
settings="-Djazzer.max_duration=${seconds}s -Djunit.jupiter.execution.timeout.mode=disabled"
settings+=" -Djazzer.internal.arg.0=fuzz -Djazzer.internal.arg.1=-max_len=$max_len -Djazzer.internal.arg.2=-timeout=10"
# CI fuzzes from a fixed seed (FUZZ_SEED, default 1 there) so that a run of unchanged code explores
# the same inputs first and a finding is reproducible; elsewhere libFuzzer picks a seed per run.
fuzz_seed="${FUZZ_SEED:-}"
if [ -z "$fuzz_seed" ] && [ "${CI:-}" = "true" ]; then
  fuzz_seed=1
fi
if [ -n "$fuzz_seed" ]; then
  settings+=" -Djazzer.internal.arg.3=-seed=$fuzz_seed"
fi

echo "fuzz.sh: building and running the seeds and committed findings (regression mode)" >&2
if ! "$mvn" "${opts[@]}" -q clean test; then
  echo "fuzz.sh: the regression run failed: a seed or a committed finding under" \
      "releng/fuzz/src/test/resources/ breaks a reader's promise (see the test output above)" >&2
  exit 1
fi

found=0
if [ "$seconds" -eq 0 ]; then
  echo "fuzz.sh: 0 seconds: the regression run only" >&2
  exit 0
fi
for test in PartsListFuzzTest SwingRecordFuzzTest MechanismFileFuzzTest; do
  before="$(find "$inputs/${test}Inputs" -type f | sort)"
  echo "fuzz.sh: fuzzing $test for ${seconds} s" >&2
  status=0
  log="$project/target/fuzz-$test.log"
  JAZZER_FUZZ=1 "$mvn" "${opts[@]}" -o -q surefire:test -Dtest="$test" \
      "-Dfuzz.settings=$settings" \
      >"$log" 2>&1 || status=$?
  # libFuzzer's closing lines: "#N DONE cov: ... exec/s: R ..." and "Done N runs in S second(s)"
  rate="$(grep -a -o 'DONE .*exec/s: [0-9]*' "$log" | tail -n 1 | sed 's/.*exec\/s: //' || true)"
  done_line="$(grep -a -E '^Done [0-9]+ runs in [0-9]+ second' "$log" | tail -n 1 || true)"
  echo "fuzz.sh: $test: ${done_line:-no summary (see $log)}${rate:+, $rate inputs/s}" >&2
  after="$(find "$inputs/${test}Inputs" -type f | sort)"
  new="$(comm -13 <(echo "$before") <(echo "$after"))"
  if [ "$status" -ne 0 ] || [ -n "$new" ]; then
    found=1
    echo "fuzz.sh: FINDING in $test (Maven exit $status); the whole log is $log" >&2
    grep -a -E '» (FuzzTestFinding|Timeout)' "$log" | head -n 5 >&2 || true
    grep -a -o 'Test unit written to .*' "$log" >&2 || true
    for f in $new; do
      echo "fuzz.sh: the input that caused it is saved as $f" >&2
    done
  fi
done
if [ "$found" -ne 0 ]; then
  echo "fuzz.sh: a reader broke its promise. Replay the input with the regression run" \
      "(releng/scripts/fuzz.sh 0), fix the reader, then make the input a regression input:" \
      "a small file in bundles/dev.penduline.cli/src/test/resources/hostile/files/fuzz/" \
      "(releng/reference/make_fuzz_fixtures.py) and an entry in hostile/entries-fuzz.txt (DEVELOPERS.md," \
      "\"Fuzzing the readers\")" >&2
fi
exit "$found"
