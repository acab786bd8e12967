#!/usr/bin/env bash
# The one test command (README "Run the tests"): installs what the build and its tests need
# when missing (Xvfb, xauth, GTK 3 and a font from Debian; Maven 3.9 into .tools/), then builds
# everything and runs all tests: the plain JUnit tests of the headless bundles and the OSGi and
# workbench tests under a virtual display. Extra arguments go to Maven (e.g. -o, -pl ...).
# Then it installs the built feature into a bare Equinox with the p2 director and runs its headless
# application and a workbench view (releng/scripts/install-test.sh, about 15 s).
# Then it fuzzes the three readers of user files (releng/scripts/fuzz.sh) for FUZZ_SECONDS per
# reader (default 60; FUZZ_SECONDS=0 skips it) and fails on a finding, printing the input.
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
cd "$root"

need=()
command -v xvfb-run >/dev/null 2>&1 || need+=(xvfb)
command -v xauth >/dev/null 2>&1 || need+=(xauth)
dpkg -s libgtk-3-0 >/dev/null 2>&1 || dpkg -s libgtk-3-0t64 >/dev/null 2>&1 || need+=(libgtk-3-0)
command -v mvn >/dev/null 2>&1 || need+=(maven)
# the report's plots measure their labels with a real font (AWT headless through fontconfig)
dpkg -s fonts-dejavu-core >/dev/null 2>&1 || need+=(fonts-dejavu-core)
if [ ${#need[@]} -gt 0 ]; then
  if [ "$(id -u)" -ne 0 ]; then
    echo "test.sh: missing ${need[*]}; run as root or install them: apt-get install ${need[*]}" >&2
    exit 2
  fi
  echo "test.sh: installing ${need[*]} from Debian" >&2
  apt-get update -qq
  DEBIAN_FRONTEND=noninteractive apt-get install -y -qq "${need[@]}" >/dev/null
fi

export JAVA_HOME="$("$root/releng/scripts/find-jdk.sh")"
mvn="$("$root/releng/scripts/bootstrap-maven.sh")"
opts=(-B)
if [ "${CI:-}" = "true" ]; then
  opts+=(-ntp)
fi
fuzz_seconds="${FUZZ_SECONDS:-60}"
if ! [[ "$fuzz_seconds" =~ ^[0-9]+$ ]]; then
  echo "test.sh: FUZZ_SECONDS must be a whole number of seconds per reader, got '$fuzz_seconds'" >&2
  exit 2
fi
fuzz_opts=()
[[ " $* " == *" -o "* || " $* " == *" --offline "* ]] && fuzz_opts=(-o)
echo "test.sh: JDK $JAVA_HOME, $("$mvn" -v | head -n 1)" >&2
# Generated EMF code must be what the genmodel generates (never hand-edited).
"$root/releng/scripts/regenerate-model.sh" --check
xvfb-run -a -s "-screen 0 1400x900x24" "$mvn" "${opts[@]}" clean verify "$@"
# Installable into an existing Eclipse: the p2 director of a bare Equinox installs the built
# feature from the built repository; its headless application and a workbench view must work
# (releng/scripts/install-test.sh). A build limited with -pl/--projects has not made the
# repository and the bare Equinox, so the install test is left out then, and says so.
if [[ " $* " == *" -pl "* || " $* " == *" --projects "* || " $* " == *" -DskipTests "* ]]; then
  echo "test.sh: a limited build (-pl, --projects or -DskipTests): the install test is not run" >&2
else
  "$root/releng/scripts/install-test.sh"
fi
if [ "$fuzz_seconds" -eq 0 ]; then
  echo "test.sh: FUZZ_SECONDS=0: the readers are not fuzzed" >&2
  exit 0
fi
# The fuzz project compiles the readers' sources itself (releng/fuzz/pom.xml); it needs only the
# local Maven repository (Jazzer and JUnit come from there, fetched on first use unless -o).
exec "$root/releng/scripts/fuzz.sh" "$fuzz_seconds" "${fuzz_opts[@]}"
