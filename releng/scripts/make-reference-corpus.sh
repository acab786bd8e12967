#!/usr/bin/env bash
# Regenerates the reference corpus: invented swing records with a known truth, simulated by an
# independent SciPy integration (releng/reference/make_corpus.py), into
# bundles/dev.penduline.cli/src/test/resources/reference-corpus/ (or the folder given).
# ReferenceCorpusTest runs Penduline's fit on them. The output is byte-identical from run to run.
# Needs Debian's python3-scipy (installed when missing and run as root).
# Usage: releng/scripts/make-reference-corpus.sh [OUTPUT_FOLDER]
set -euo pipefail
root="$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)"
py=/usr/bin/python3
if ! "$py" -c "import scipy, numpy" 2>/dev/null; then
  if [ "$(id -u)" -ne 0 ]; then
    echo "make-reference-corpus: needs python3-scipy and python3-numpy (apt-get install python3-scipy)" >&2
    exit 2
  fi
  apt-get update -qq && DEBIAN_FRONTEND=noninteractive apt-get install -y -qq python3-scipy python3-numpy >/dev/null
fi
exec "$py" "$root/releng/reference/make_corpus.py" "$@"
