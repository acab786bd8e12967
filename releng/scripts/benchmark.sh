#!/usr/bin/env bash
# Builds the JMH benchmarks of the physics engine (releng/benchmarks, a plain Maven project
# outside the Tycho reactor) and runs them with modest settings, printing JMH's result table.
# Usage: releng/scripts/benchmark.sh [extra JMH arguments, e.g. a benchmark name regex]
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"

export JAVA_HOME="$("$root/releng/scripts/find-jdk.sh")"
mvn="$("$root/releng/scripts/bootstrap-maven.sh")"

"$mvn" -B -q -f "$root/releng/benchmarks/pom.xml" package
# one fork, 3 warm-up and 5 measured iterations of 2 s: about half a minute per benchmark
"$JAVA_HOME/bin/java" -Xmx1g -jar "$root/releng/benchmarks/target/penduline-benchmarks.jar" \
    -f 1 -wi 3 -i 5 -w 2s -r 2s "$@"
