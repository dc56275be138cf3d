#!/usr/bin/env bash
# Renders the design report of a Quorvane sample design in headless Chromium (Debian's package) and writes the
# screenshot the README shows. Fails when the report cannot be made or the page logs a console error.
# Usage: docs/screenshots/render.sh [output.png] [design]     (defaults: docs/images/report-quorvane.png, BurstCapture)
set -euo pipefail
cd "$(dirname "$0")/../.."
root=$(pwd)
png=$(realpath -m "${1:-docs/images/report-quorvane.png}")
design=${2:-BurstCapture}
browser=$(command -v chromium || command -v chromium-browser || true)
if [ -z "$browser" ]; then
  echo "render.sh: chromium is not installed (apt-get install -y chromium)" >&2
  exit 1
fi

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
page="$work/report.html"

# The page has no script, so any console message at all (Chromium logs them as ":CONSOLE:<line>]") fails the run.
# The report's own exit code is 1 when a finding is at error severity; the sample's are warnings, so anything but 0 is a failure.
dotnet run --project src/Cli -- samples/Quorvane/Quorvane.csproj --design "$design" \
  --artifacts "$work/artifacts" --html "$page" >"$work/report.txt"

run_chromium() {
  # No network, no GPU, a fresh profile. --virtual-time-budget lets layout settle before the capture.
  "$browser" --headless --no-sandbox --disable-gpu --disable-quic --no-first-run --disable-background-networking \
    --disable-component-update --disable-sync --disable-extensions --hide-scrollbars \
    --user-data-dir="$work/profile" --enable-logging=stderr --v=0 "$@" "file://$page"
}

run_chromium --screenshot="$png" --window-size=1280,900 2>"$work/chromium.log" >/dev/null
run_chromium --dump-dom 2>>"$work/chromium.log" >"$work/dom.html"

if grep -E ':CONSOLE[:(]|CONSOLE\(|Uncaught' "$work/chromium.log" >/dev/null; then
  echo "render.sh: the page logged console errors:" >&2
  grep -E ':CONSOLE[:(]|CONSOLE\(|Uncaught' "$work/chromium.log" >&2
  exit 1
fi
if ! grep -q 'class="timing-diagram"' "$work/dom.html"; then
  echo "render.sh: the rendered page has no timing diagram" >&2
  exit 1
fi
if [ ! -s "$png" ]; then
  echo "render.sh: no screenshot was written to $png" >&2
  exit 1
fi
echo "render.sh: rendered $design without console errors -> ${png#"$root"/}"
