#!/usr/bin/env bash
# The install test (README "Install into an existing Eclipse"): after a build (`mvn verify`), it
#  1. copies the bare Equinox that releng/dev.penduline.installtest materialises (framework,
#     runtime, Declarative Services and the p2 director, no Penduline and no UI bundle) to a
#     fresh folder: the "existing Eclipse";
#  2. installs dev.penduline.feature.feature.group into it with that installation's own p2
#     director, from the built Penduline repository alone (releng/dev.penduline.product/target/
#     repository), as a user would;
#  3. runs the headless application (dev.penduline.cli.headless) of the installed result on a
#     sample and compares its output with the plain `java -cp` command line's on the same file;
#  4. installs the test-only check bundle (dev.penduline.installcheck) and starts the installed
#     workbench (-product dev.penduline.app.product) under a virtual display; the check opens the
#     Mechanism view and writes OK only when the view shows its own heading.
# Fails with a message naming the step, and the log to read, on the first thing that goes wrong.
# Usage: install-test.sh [WORK_DIR]   (default: a new temporary folder, removed on success)
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
started=$(date +%s)

fail() {
  echo "install-test: FAILED: $*" >&2
  exit 1
}

repo="$root/releng/dev.penduline.product/target/repository"
checkrepo="$root/releng/dev.penduline.installtest/target/repository"
equinox="$root/releng/dev.penduline.installtest/target/products/dev.penduline.installtest.equinox/linux/gtk/x86_64/equinox"
product="$root/releng/dev.penduline.product/target/products/dev.penduline.app.product/linux/gtk/x86_64/penduline"
sample="$root/samples/inspection-hatch/hatch.penduline"
for need in "$repo/content.jar" "$checkrepo/content.jar" "$equinox/plugins" "$product/plugins" "$sample"; do
  [ -e "$need" ] || fail "$need is missing; build first (mvn verify, or releng/scripts/test.sh)"
done

java_home="${JAVA_HOME:-$("$root/releng/scripts/find-jdk.sh")}"
java="$java_home/bin/java"

if [ $# -gt 0 ]; then
  work="$1"
  rm -rf "$work"
  mkdir -p "$work"
  keep=true
else
  work="$(mktemp -d "${TMPDIR:-/tmp}/penduline-install-test.XXXXXX")"
  keep=false
fi
eclipse="$work/eclipse"
cp -r "$equinox" "$eclipse"
launcher=$(ls "$eclipse"/plugins/org.eclipse.equinox.launcher_*.jar 2>/dev/null | head -n 1)
[ -n "$launcher" ] || fail "no org.eclipse.equinox.launcher jar in $equinox/plugins"
for absent in dev.penduline.cli org.eclipse.ui.workbench org.hipparchus.core; do
  if ls "$eclipse/plugins/${absent}_"* >/dev/null 2>&1; then
    fail "the bare Equinox already has $absent: the install would prove nothing"
  fi
done

# Runs the installation's own launcher; the rest of the arguments are Eclipse's.
run_eclipse() {
  "$java" --enable-native-access=ALL-UNNAMED -Xmx1g -jar "$launcher" -install "$eclipse" \
    -configuration "$eclipse/configuration" -nosplash -consoleLog "$@"
}

# p2 director: the command a user runs in an existing Eclipse (README).
director() {
  local log="$1"
  shift
  if ! run_eclipse -application org.eclipse.equinox.p2.director \
      -destination "$eclipse" -profile DefaultProfile \
      -p2.os linux -p2.ws gtk -p2.arch x86_64 "$@" >"$log" 2>&1; then
    tail -n 40 "$log" >&2
    fail "the p2 director failed ($*); log: $log"
  fi
}

echo "install-test: 2. installing dev.penduline.feature.feature.group from $repo" >&2
director "$work/director-feature.log" -repository "file:$repo" -installIU dev.penduline.feature.feature.group
grep -q "Operation completed" "$work/director-feature.log" \
  || fail "the director did not report 'Operation completed'; log: $work/director-feature.log"
for bundle in dev.penduline.cli dev.penduline.app dev.penduline.ui org.hipparchus.core org.eclipse.ui.workbench; do
  grep -q "^$bundle," "$eclipse/configuration/org.eclipse.equinox.simpleconfigurator/bundles.info" \
    || fail "after the install, $bundle is not in the installation's bundles.info"
done

echo "install-test: 3. headless application of the installed result: inertia $sample" >&2
if ! run_eclipse -application dev.penduline.cli.headless inertia "$sample" \
    >"$work/headless.out" 2>"$work/headless.err"; then
  cat "$work/headless.err" >&2
  fail "the installed headless application failed; output: $work/headless.out, errors: $work/headless.err"
fi
# The plain command line of the materialised product (the `penduline` script's way) is the reference.
cp_jars=""
for jar in "$product"/plugins/dev.penduline.*.jar "$product"/plugins/org.hipparchus.*.jar \
           "$product"/plugins/org.eclipse.emf.common_*.jar "$product"/plugins/org.eclipse.emf.ecore_*.jar \
           "$product"/plugins/org.eclipse.emf.ecore.xmi_*.jar "$product"/plugins/com.google.gson_*.jar; do
  case "$(basename "$jar")" in dev.penduline.ui*|dev.penduline.app*) continue ;; esac
  cp_jars="$cp_jars${cp_jars:+:}$jar"
done
"$java" -cp "$cp_jars" dev.penduline.cli.Main inertia "$sample" >"$work/plain.out" 2>"$work/plain.err" \
  || fail "the plain command line failed on $sample; errors: $work/plain.err"
grep -q "J0" "$work/plain.out" || fail "the plain command line printed no J0 for $sample: $work/plain.out"
if ! diff -u "$work/plain.out" "$work/headless.out" >"$work/headless.diff"; then
  cat "$work/headless.diff" >&2
  fail "the installed headless application's output differs from the command line's (diff above)"
fi

echo "install-test: 4. workbench of the installed result: opening the Mechanism view" >&2
director "$work/director-check.log" -repository "file:$checkrepo" -installIU dev.penduline.installcheck
result="$work/view-check.txt"
rm -f "$result"
display_run=()
if [ -z "${DISPLAY:-}" ]; then
  command -v xvfb-run >/dev/null 2>&1 || fail "no DISPLAY and no xvfb-run to make one"
  display_run=(xvfb-run -a -s "-screen 0 1400x900x24")
fi
if ! timeout 300 "${display_run[@]}" "$java" --enable-native-access=ALL-UNNAMED -Xmx1g \
    "-Dpenduline.installcheck.result=$result" -jar "$launcher" -install "$eclipse" \
    -configuration "$eclipse/configuration" -nosplash -consoleLog \
    -product dev.penduline.app.product -data "$work/workspace" \
    >"$work/workbench.log" 2>&1; then
  tail -n 40 "$work/workbench.log" >&2
  fail "the installed workbench did not start and stop cleanly; log: $work/workbench.log"
fi
[ -f "$result" ] || { tail -n 40 "$work/workbench.log" >&2; fail "the view check wrote no result (did the check bundle run?); log: $work/workbench.log"; }
if [ "$(head -n 1 "$result")" != "OK" ]; then
  cat "$result" >&2
  fail "the Mechanism view of the installed workbench: $(head -n 1 "$result"); log: $work/workbench.log"
fi

echo "install-test: OK in $(( $(date +%s) - started )) s: feature installed with the p2 director into a bare Equinox; headless output equals the command line's; $(sed -n 2p "$result")" >&2
if [ "$keep" = false ]; then rm -rf "$work"; fi
