#!/usr/bin/env bash
# Runs every property test (the tests named TestProp…, which draw their
# inputs with pgregory.net/rapid) with fresh random seeds, many times: a
# local soak, not part of `go test ./...` or CI.
#
#   bash scripts/soak-properties.sh          # 200 seeds
#   bash scripts/soak-properties.sh 1000     # or as many as you like
#
# Each seed is a new 64-bit number from /dev/urandom, given to rapid as
# -rapid.seed, so every run draws 100 fresh cases per test. A failure prints
# the package, the seed and rapid's fail file; fail files are written in a
# temporary folder, never in the tree. Exit 0 when every run passes.
set -uo pipefail
cd "$(dirname "$0")/.."

seeds=${1:-200}
case "$seeds" in ''|*[!0-9]*) echo "usage: $0 [number of seeds]" >&2; exit 2 ;; esac

work=$(mktemp -d)
trap 'rm -rf "$work/bin"' EXIT
mkdir -p "$work/bin" "$work/run"

# The packages that have property tests, and how many each has.
pkgs=()
total_tests=0
for dir in $(git ls-files '*_test.go' | xargs grep -l 'func TestProp' | xargs -n1 dirname | sort -u); do
  n=$(grep -h '^func TestProp' "$dir"/*_test.go | wc -l)
  total_tests=$((total_tests + n))
  name=$(echo "$dir" | tr '/' '_')
  go test -c -o "$work/bin/$name.test" "./$dir" || { echo "soak: cannot build the tests of $dir" >&2; exit 2; }
  pkgs+=("$dir")
done
echo "soak: ${#pkgs[@]} packages, $total_tests property tests, $seeds fresh seeds each"

failed=0
runs=0
for ((i = 1; i <= seeds; i++)); do
  seed=$(od -An -N8 -tu8 /dev/urandom | tr -d ' ')
  for dir in "${pkgs[@]}"; do
    name=$(echo "$dir" | tr '/' '_')
    out="$work/run/$name-$seed"
    mkdir -p "$out"
    # Run in a folder of its own, so rapid's fail file (testdata/rapid/…,
    # relative to the working folder) lands outside the tree.
    if ! (cd "$out" && "$work/bin/$name.test" -test.run '^TestProp' -rapid.seed="$seed" >"$out/log" 2>&1); then
      failed=$((failed + 1))
      echo "FAIL $dir with -rapid.seed=$seed"
      grep -E -- '--- FAIL|\[rapid\] failed|draw ' "$out/log" | head -20 | sed 's/^/    /'
      ff=$(find "$out" -name '*.fail' | head -1)
      [ -n "$ff" ] && echo "    fail file: $ff (run: go test ./$dir -run '^TestProp' -rapid.failfile=$ff)"
      echo "    full log: $out/log"
    else
      rm -rf "$out"
    fi
    runs=$((runs + 1))
  done
done

if [ "$failed" -eq 0 ]; then
  rm -rf "$work"
  echo "soak: all $total_tests property tests passed with $seeds fresh seeds ($runs package runs, none failed)"
  exit 0
fi
echo "soak: $failed of $runs package runs failed; logs and fail files kept under $work/run"
exit 1
