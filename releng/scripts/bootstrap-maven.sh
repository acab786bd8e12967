#!/usr/bin/env bash
# Bootstraps the Maven version the build needs (Tycho 5 needs Maven >= 3.9.11) into the
# git-ignored folder .tools/ at the repository root, using the system Maven only to copy the
# distribution archive from the default remote repository. Prints the path of the mvn binary.
set -euo pipefail
MAVEN_VERSION="${PENDULINE_MAVEN_VERSION:-3.9.16}"
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
tools="$root/.tools"
home="$tools/apache-maven-$MAVEN_VERSION"
if [ -x "$home/bin/mvn" ]; then
  echo "$home/bin/mvn"
  exit 0
fi
if ! command -v mvn >/dev/null 2>&1; then
  echo "penduline: no system 'mvn' to bootstrap Maven $MAVEN_VERSION with; install Debian's 'maven' package (apt-get install maven)" >&2
  exit 2
fi
mkdir -p "$tools"
echo "penduline: bootstrapping Maven $MAVEN_VERSION into .tools/ (one-time download)" >&2
# Run the system Maven outside the checkout: it would otherwise load .mvn/extensions.xml
# (tycho-build), which Maven 3.8 cannot run ("No implementation for ... was bound").
scratch="$(mktemp -d)"
trap 'rm -rf "$scratch"' EXIT
cd "$scratch"
mvn -q -B dependency:copy \
  -Dartifact="org.apache.maven:apache-maven:$MAVEN_VERSION:tar.gz:bin" \
  -DoutputDirectory="$tools" -Dmdep.overWriteReleases=true >&2
tar -xzf "$tools/apache-maven-$MAVEN_VERSION-bin.tar.gz" -C "$tools"
rm -f "$tools/apache-maven-$MAVEN_VERSION-bin.tar.gz"
echo "$home/bin/mvn"
