#!/usr/bin/env bash
# Prints the home of a JDK >= 21 (SWTChart and current SWT need Java 21): JAVA_HOME if it
# qualifies, otherwise the newest qualifying JDK under /usr/lib/jvm. Exits 2 with a message
# when there is none.
set -euo pipefail
major_of() {
  local v
  v=$("$1/bin/java" -XshowSettings:properties -version 2>&1 | awk -F'= ' '/java.specification.version/{print $2; exit}')
  echo "${v%%.*}"
}
qualifies() {
  [ -x "$1/bin/java" ] && [ -x "$1/bin/javac" ] && [ "$(major_of "$1")" -ge 21 ] 2>/dev/null
}
if [ -n "${JAVA_HOME:-}" ] && qualifies "$JAVA_HOME"; then
  echo "$JAVA_HOME"
  exit 0
fi
best=""
best_major=0
for d in /usr/lib/jvm/*/; do
  d="${d%/}"
  [ -L "$d" ] && continue
  if qualifies "$d"; then
    m=$(major_of "$d")
    if [ "$m" -gt "$best_major" ]; then best="$d"; best_major="$m"; fi
  fi
done
if [ -z "$best" ]; then
  echo "penduline: no JDK 21 or newer found (looked at JAVA_HOME and /usr/lib/jvm/*). Install one, e.g. a Temurin 25 JDK, or set JAVA_HOME." >&2
  exit 2
fi
echo "$best"
