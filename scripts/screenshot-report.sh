#!/usr/bin/env bash
# screenshot-report.sh: build qult, write the HTML calculation package of a
# calc file, open it in headless Chromium and check it:
#
#   - no console messages (errors, uncaught exceptions);
#   - no outside resources (scripts, styles, images, fonts fetched from
#     elsewhere) and no script at all in the page;
#   - every figure rendered (as many <svg> drawn with a size in the
#     rendered page as <figure> in the file) and the heading present;
#   - no element wider than the page, at a screen width (1280 px) and at
#     the width of an A4 page's text (182 mm, 688 px);
#   - the screenshot covers the whole page: it is taken at the page's full
#     height, and its height is checked against the page's;
#
# then prints the number of A4 pages the package prints to from Chromium
# (--print-to-pdf, pages counted in the PDF).
#
# usage: scripts/screenshot-report.sh [CALC_FILE] [OUT_PNG]
#        scripts/screenshot-report.sh --self-test [CALC_FILE]
#
#   CALC_FILE  default examples/pump-station-bored.yaml
#   OUT_PNG    default qult-report.png in the current directory
#
# --self-test checks the clean report, then injects one fault at a time
# into a copy of it (a console error from an inline handler, an outside image, an element wider
# than the page, a figure that does not render, a screenshot cut short)
# and succeeds only if the clean page passes and every fault is caught:
# a check that cannot fail proves nothing.
#
# The probe that measures the page (its height, the elements wider than
# it) is a script added to a copy of the page; the page itself carries no
# script.
#
# Chromium is Debian's package `chromium`; it is installed with apt-get when
# /usr/bin/chromium is missing (needs root).
#
# Exit status: 0 clean; 1 a check failed; 2 setup failed (build, report,
# browser).
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
trap 'rm -rf "$work"' EXIT

echo "screenshot-report: building qult" >&2
(cd "$root" && CGO_ENABLED=0 go build -o "$work/qult" ./cmd/qult) || exit 2
html=$work/report.html
"$work/qult" report -o "$html" "$calc_file" || {
	echo "screenshot-report: qult report failed" >&2
	exit 2
}

flags=(--headless --no-sandbox --disable-gpu --disable-quic --no-first-run
	--disable-background-networking --disable-component-update --disable-sync
	--enable-logging=stderr --v=0 --virtual-time-budget=5000 --hide-scrollbars)

# The probe: after load, write the page's height and width, the elements
# wider than the viewport and the number of rendered SVG figures into a
# <pre id="qult-probe"> that --dump-dom shows.
probe='<script>window.addEventListener("load",function(){var W=document.documentElement.clientWidth,wide=[];document.querySelectorAll("body *").forEach(function(e){if(e.id==="qult-probe")return;var r=e.getBoundingClientRect();if(r.width>0&&(r.right>W+0.5||r.left<-0.5))wide.push(e.tagName.toLowerCase()+(e.className&&e.className.baseVal===undefined?"."+e.className:"")+" "+Math.round(r.left)+".."+Math.round(r.right))});var p=document.createElement("pre");p.id="qult-probe";p.textContent="height="+document.documentElement.scrollHeight+" width="+W+" scrollwidth="+document.documentElement.scrollWidth+" svgs="+Array.prototype.filter.call(document.querySelectorAll("figure svg"),function(s){var r=s.getBoundingClientRect();return r.width>0&&r.height>0}).length+" wide="+wide.length+" first="+wide.slice(0,5).join(";");document.body.appendChild(p)});</script>'

# run_chromium PROFILE ARGS...: one headless run with its own profile.
run_chromium() {
	local prof
	prof=$(mktemp -d -p "$work")
	timeout 120 "$chromium" "${flags[@]}" --user-data-dir="$prof" "$@"
}

# check PAGE PNG [SHORT]: every check on one page; prints what fails and
# returns 1 when any does. SHORT (a height in px) cuts the screenshot short.
check() {
	local page=$1 png=$2 short=${3:-} status=0 log=$work/chromium.log
	: >"$log"
	# No script in the page and nothing fetched from elsewhere.
	if grep -Eiq '<script' "$page"; then
		echo "  the page carries a script" >&2
		status=1
	fi
	if grep -Eiq '(src|href)=["'\'']?(https?:)?//|url\(["'\'']?(https?:)?//|@import' "$page"; then
		echo "  the page refers to outside resources:" >&2
		grep -Eio '(src|href)=["'\'']?(https?:)?//[^"'\'' >]*|url\([^)]*\)|@import[^;]*' "$page" | head -5 >&2
		status=1
	fi
	# Measure at the screen width and at an A4 page's text width.
	local height=0
	for w in 1280 688; do
		local probed=$work/probed-$w.html dom=$work/dom-$w.html
		sed "s#</body>#${probe//&/\\&}</body>#" "$page" >"$probed"
		run_chromium --window-size=$w,1000 --dump-dom "file://$probed" >"$dom" 2>>"$log" || {
			echo "  chromium --dump-dom failed" >&2
			return 2
		}
		local line
		line=$(grep -o 'height=[0-9]* width=[0-9]* scrollwidth=[0-9]* svgs=[0-9]* wide=[0-9]* first=[^<]*' "$dom" || true)
		if [[ -z $line ]]; then
			echo "  the probe did not run at $w px" >&2
			status=1
			continue
		fi
		local h sw vw svgs wide figs
		h=$(sed -E 's/.*height=([0-9]+).*/\1/' <<<"$line")
		vw=$(sed -E 's/.*width=([0-9]+) scroll.*/\1/' <<<"$line")
		sw=$(sed -E 's/.*scrollwidth=([0-9]+).*/\1/' <<<"$line")
		svgs=$(sed -E 's/.*svgs=([0-9]+).*/\1/' <<<"$line")
		wide=$(sed -E 's/.*wide=([0-9]+).*/\1/' <<<"$line")
		figs=$(grep -o '<figure' "$page" | wc -l)
		if ((wide > 0 || sw > vw)); then
			echo "  at $w px, $wide elements are wider than the page (scroll width $sw of $vw): ${line#*first=}" >&2
			status=1
		fi
		if ((svgs != figs || figs == 0)); then
			echo "  at $w px, $svgs of $figs figures rendered" >&2
			status=1
		fi
		if ! grep -q '<h1' "$dom"; then
			echo "  the rendered page lacks its heading" >&2
			status=1
		fi
		if ((w == 1280)); then height=$h; fi
	done
	# The screenshot: the whole page at the screen width.
	local shot=$((height + 0))
	if [[ -n $short ]]; then shot=$short; fi
	if ((shot < 100)); then shot=2000; fi
	run_chromium --window-size=1280,$shot --screenshot="$png" "file://$page" 2>>"$log" >/dev/null || {
		echo "  chromium --screenshot failed" >&2
		return 2
	}
	if [[ ! -s $png ]]; then
		echo "  no screenshot written" >&2
		return 2
	fi
	# PNG height: bytes 20-23 of the IHDR chunk, big-endian.
	local png_h
	png_h=$(od -An -tu1 -j20 -N4 "$png" | awk '{print $1*16777216+$2*65536+$3*256+$4}')
	if ((png_h < height)); then
		echo "  the screenshot is $png_h px high; the page is $height px" >&2
		status=1
	fi
	# Console messages are logged as "...:CONSOLE(line)] "message", source: ...".
	if grep -E 'CONSOLE|Uncaught' "$log" >"$work/console.txt"; then
		echo "  console messages in the page:" >&2
		cat "$work/console.txt" >&2
		status=1
	fi
	return $status
}

# a4_pages PAGE: the number of pages Chromium prints the page to.
# Pages are counted by pdfinfo (Debian's poppler-utils).
a4_pages() {
	local pdf=$work/print.pdf
	run_chromium --no-pdf-header-footer --print-to-pdf="$pdf" "file://$1" 2>/dev/null >/dev/null || return 2
	if ! command -v pdfinfo >/dev/null; then
		{ apt-get install -y poppler-utils || { apt-get update && apt-get install -y poppler-utils; }; } >&2 || return 2
	fi
	pdfinfo "$pdf" | awk '/^Pages:/ {print $2}'
}

if ((self_test)); then
	failed=0
	echo "screenshot-report: self-test: the clean report must pass" >&2
	if ! check "$html" "$work/clean.png"; then
		echo "screenshot-report: self-test FAILED: the clean report does not pass" >&2
		exit 1
	fi
	fault() { # NAME SED-EXPRESSION [SHORT]
		local name=$1 expr=$2 short=${3:-}
		sed "$expr" "$html" >"$work/fault.html"
		if cmp -s "$html" "$work/fault.html" && [[ -z $short ]]; then
			echo "screenshot-report: self-test: fault '$name' changed nothing" >&2
			failed=1
			return
		fi
		echo "screenshot-report: self-test: fault '$name':" >&2
		if check "$work/fault.html" "$work/fault.png" $short; then
			echo "screenshot-report: self-test FAILED: fault '$name' went unnoticed" >&2
			failed=1
		else
			echo "screenshot-report: self-test: fault '$name' caught" >&2
		fi
	}
	fault "console error (no script element)" 's#</body>#<img alt="" src="data:image/png;base64,AAAA" onerror="thisFunctionDoesNotExist()"></body>#'
	fault "outside image" 's#</body>#<img src="https://example.invalid/x.png" alt=""></body>#'
	fault "element wider than the page" 's#</body>#<div style="width:3000px;height:4px"></div></body>#'
	fault "figure that does not render" '0,/<svg role/s#<svg role#<svg style="display:none" role#'
	fault "screenshot cut short" 's#x#x#' 600
	if ((failed)); then
		exit 1
	fi
	echo "screenshot-report: self-test passed (the clean report passes; every fault was caught)" >&2
	exit 0
fi

status=0
check "$html" "$out_png" || status=$?
if ((status == 2)); then
	exit 2
fi
# A4 pages, whatever the file's units.
"$work/qult" report --paper a4 -o "$work/a4.html" "$calc_file" || exit 2
pages=$(a4_pages "$work/a4.html")
echo "screenshot-report: $(basename "$calc_file"): prints to $pages A4 pages from Chromium" >&2
if ((status == 0)); then
	echo "screenshot-report: all checks pass; screenshot of the whole page in $out_png" >&2
fi
exit $status
