#!/usr/bin/env bash
# Compares qult with the same computation in Python, written two ways:
# vectorised with NumPy and with plain loops. Capacity with depth at 600
# and 6,000 depths and a Monte Carlo of 1,000,000 samples of the
# compression capacity (scenario and methods in scripts/compare/main.go);
# checks that the answers agree (1e-6 relative for capacity with depth,
# within sampling error for the Monte Carlo) and prints times and ratios.
#
# Needs Go and Python 3 with NumPy (Debian: apt-get install -y python3-numpy,
# which installs it for /usr/bin/python3; set PYTHON to use another). Not
# part of CI. Usage: bash scripts/compare-python.sh [LOOP_MC_SAMPLES]
# (samples of the loop Monte Carlo, default 200000; its time is scaled to
# the 1,000,000 samples of the others).
set -euo pipefail
cd "$(dirname "$0")/.."
PYTHON=${PYTHON:-/usr/bin/python3}
if ! "$PYTHON" -c 'import numpy' 2>/dev/null; then
	echo "compare-python: $PYTHON has no NumPy; on Debian: apt-get install -y python3-numpy" >&2
	exit 2
fi
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
echo "$(date -u '+%Y-%m-%d %H:%M UTC'), $(uname -srm), $(grep -m1 'model name' /proc/cpuinfo 2>/dev/null | cut -d: -f2 | sed 's/^ *//')"
go run ./scripts/compare -out "$tmp"
"$PYTHON" scripts/compare-python.py "$tmp/case.json" "${1:-200000}"
