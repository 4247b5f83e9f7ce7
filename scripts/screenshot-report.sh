#!/usr/bin/env bash
# screenshot-report.sh: build qult, write the HTML calculation package of a
# calc file, open it in headless Chromium, fail on any console message
# (errors, uncaught exceptions), check the page rendered, and take a
# screenshot. Not part of `go test` (which needs no browser).
#
# usage: scripts/screenshot-report.sh [CALC_FILE] [OUT_PNG]
#        scripts/screenshot-report.sh --self-test
#
#   CALC_FILE  default examples/pump-station-bored.yaml
#   OUT_PNG    default qult-report.png in the current directory
#
# --self-test opens a page with a deliberate script error and succeeds only
# if the check catches it (a check that cannot fail proves nothing).
#
# Chromium is Debian's package `chromium`; it is installed with apt-get when
# /usr/bin/chromium is missing (needs root).
#
# Exit status: 0 clean; 1 console errors, or the page did not render;
# 2 setup failed (build, report, browser).
set -euo pipefail

root=$(cd "$(dirname "$0")/.." && pwd)
chromium=${CHROMIUM:-/usr/bin/chromium}

self_test=0
if [[ ${1:-} == "--self-test" ]]; then
	self_test=1
	shift
fi
calc_file=${1:-$root/examples/pump-station-bored.yaml}
out_png=${2:-$PWD/qult-report.png}

if [[ ! -x $chromium ]]; then
	echo "screenshot-report: $chromium missing; installing Debian's chromium" >&2
	if ! { apt-get update && apt-get install -y chromium; } >&2; then
		echo "screenshot-report: could not install chromium" >&2
		exit 2
	fi
fi

work=$(mktemp -d)
profile=$(mktemp -d)
trap 'rm -rf "$work" "$profile"' EXIT

html=$work/report.html
if ((self_test)); then
	cat >"$html" <<'EOF'
<!doctype html><html><head><meta charset="utf-8"><title>self-test</title></head>
<body><h1>self-test</h1><svg width="10" height="10"></svg>
<script>thisFunctionDoesNotExist();</script></body></html>
EOF
else
	echo "screenshot-report: building qult" >&2
	(cd "$root" && CGO_ENABLED=0 go build -o "$work/qult" ./cmd/qult) || exit 2
	"$work/qult" report -o "$html" "$calc_file" || {
		echo "screenshot-report: qult report failed" >&2
		exit 2
	}
fi

# The page must be self-contained: no scripts, styles, images or fonts
# fetched from elsewhere.
if grep -Eiq '(src|href)=["'\'']?(https?:)?//' "$html"; then
	echo "screenshot-report: the report refers to outside resources:" >&2
	grep -Eio '(src|href)=["'\'']?(https?:)?//[^"'\'' >]*' "$html" | head >&2
	exit 1
fi

flags=(--headless --no-sandbox --disable-gpu --disable-quic --no-first-run
	--disable-background-networking --disable-component-update --disable-sync
	--user-data-dir="$profile" --enable-logging=stderr --v=0
	--virtual-time-budget=5000 --window-size=1280,2000)
url="file://$html"

log=$work/chromium.log
if ! timeout 120 "$chromium" "${flags[@]}" --screenshot="$out_png" "$url" 2>"$log" >/dev/null; then
	echo "screenshot-report: chromium failed; its log:" >&2
	tail -20 "$log" >&2
	exit 2
fi
dom=$work/dom.html
timeout 120 "$chromium" "${flags[@]}" --dump-dom "$url" >"$dom" 2>>"$log" || {
	echo "screenshot-report: chromium --dump-dom failed" >&2
	exit 2
}

status=0
# Console messages are logged as "...:CONSOLE(line)] "message", source: ...".
# A calculation package should write none at all.
if grep -E 'CONSOLE|Uncaught' "$log" >"$work/console.txt"; then
	echo "screenshot-report: console messages in the page:" >&2
	cat "$work/console.txt" >&2
	status=1
fi
if ! grep -q '<svg' "$dom" || ! grep -q '<h1' "$dom"; then
	echo "screenshot-report: the rendered page lacks its heading or figures" >&2
	status=1
fi
if [[ ! -s $out_png ]]; then
	echo "screenshot-report: no screenshot written" >&2
	exit 2
fi

if ((self_test)); then
	if ((status == 1)); then
		echo "screenshot-report: self-test passed (the deliberate error was caught)" >&2
		exit 0
	fi
	echo "screenshot-report: self-test FAILED: a script error went unnoticed" >&2
	exit 1
fi
if ((status == 0)); then
	echo "screenshot-report: no console errors; screenshot in $out_png" >&2
fi
exit $status
