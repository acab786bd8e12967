#!/usr/bin/env bash
# Regenerates the EMF model code of bundles/dev.penduline.model (src-gen/) from
# model/mechanism.genmodel with the standalone generator in releng/dev.penduline.codegen.
#
#   releng/scripts/regenerate-model.sh                   regenerate src-gen/ in place
#   releng/scripts/regenerate-model.sh --check           regenerate into a scratch folder and compare
#                                                        with src-gen/; exit 1 on any difference (CI)
#   releng/scripts/regenerate-model.sh --write-genmodel  also save the genmodel completed from the
#                                                        .ecore (after adding a class or feature)
#
# Generated code is never edited by hand: change the .ecore/.genmodel and run this script.
# The generator writes into an empty scratch folder, so nothing is ever merged with old code.
set -euo pipefail

root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
bundle="$root/bundles/dev.penduline.model"
codegen="$root/releng/dev.penduline.codegen"
mode=generate
write_genmodel=()
for arg in "$@"; do
  case "$arg" in
    --check) mode=check ;;
    --write-genmodel) write_genmodel=(--write-genmodel) ;;
    -h|--help) sed -n '2,12p' "${BASH_SOURCE[0]}" | sed 's/^# \{0,1\}//'; exit 0 ;;
    *) echo "regenerate-model: unknown option '$arg' (use --check, --write-genmodel or --help)" >&2; exit 2 ;;
  esac
done
if [ "$mode" = check ] && [ ${#write_genmodel[@]} -gt 0 ]; then
  echo "regenerate-model: --check never writes; drop --write-genmodel" >&2
  exit 2
fi

export JAVA_HOME="$("$root/releng/scripts/find-jdk.sh")"

mvn="$("$root/releng/scripts/bootstrap-maven.sh")"
"$mvn" -q -B -f "$codegen/pom.xml" package

scratch="$(mktemp -d "${TMPDIR:-/tmp}/penduline-codegen.XXXXXX")"
trap 'rm -rf "$scratch"' EXIT
log="$scratch/generator.log"
mkdir -p "$scratch/project"
if ! "$JAVA_HOME/bin/java" -Xmx512m -Dline.separator=$'\n' -Dfile.encoding=UTF-8 \
    -cp "$codegen/target/classes:$(cat "$codegen/target/runtime-classpath.txt")" \
    dev.penduline.codegen.ModelCodeGenerator \
    --genmodel "$bundle/model/mechanism.genmodel" --project-root "$scratch/project" \
    "${write_genmodel[@]}" >"$log" 2>&1; then
  cat "$log" >&2
  echo "regenerate-model: the generator failed (log above)" >&2
  exit 1
fi
if [ ! -d "$scratch/project/src-gen" ]; then
  cat "$log" >&2
  echo "regenerate-model: the generator wrote no code (is the GenModel adapter factory registered?)" >&2
  exit 1
fi

if [ "$mode" = check ]; then
  if diff -ru "$bundle/src-gen" "$scratch/project/src-gen" >"$scratch/diff.txt"; then
    echo "regenerate-model: src-gen is up to date with model/mechanism.genmodel"
    exit 0
  fi
  head -n 200 "$scratch/diff.txt"
  echo "regenerate-model: src-gen differs from what the genmodel generates;" \
       "run releng/scripts/regenerate-model.sh and commit the result" >&2
  exit 1
fi

rm -rf "$bundle/src-gen"
cp -R "$scratch/project/src-gen" "$bundle/src-gen"
echo "regenerate-model: wrote $(find "$bundle/src-gen" -name '*.java' | wc -l) files into bundles/dev.penduline.model/src-gen"
