#!/usr/bin/env bash
# Re-run every committed netlist into a temporary folder and compare the results with
# the committed CSVs in this folder. Exits non-zero if a value is missing, a row or
# column differs, or a number differs by more than a relative tolerance of 1e-3.
# Also checks that the committed ladder and restored-chain netlists match what lib.sh generates.
# Usage: tests/reference/ngspice/check.sh     (from any directory)
set -euo pipefail
export LC_ALL=C
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
# shellcheck source=lib.sh
source "$here/lib.sh"

REL_TOL="1e-3"

ref_require_ngspice
work="$(mktemp -d)"
# Keep the ngspice logs when something fails, so the error can be read.
trap 'rc=$?; if (( rc == 0 )); then rm -rf "$work"; else echo "ngspice logs kept in $work" >&2; fi' EXIT

# The committed ladder and restored-chain netlists must be exactly what the generator writes.
ref_gen_all_ladders "$work/gen"
ref_gen_all_restored "$work/gen"
for f in "$work"/gen/*.cir; do
    committed="$here/netlists/$(basename "$f")"
    [[ -f "$committed" ]] || ref_die "committed netlist missing: $committed (run regenerate.sh)"
    cmp -s "$f" "$committed" || ref_die "committed netlist differs from generator output: $committed (run regenerate.sh)"
done

ref_build_csvs "$here/netlists" "$work/out"

status=0
for f in rc_ladder_t50.csv rc_tree_t50.csv retention.csv restored_chain_t50.csv; do
    committed="$here/$f"
    fresh="$work/out/$f"
    [[ -f "$committed" ]] || { echo "check: committed CSV missing: $committed" >&2; status=1; continue; }
    if ! awk -F, -v tol="$REL_TOL" -v name="$f" '
        function isnum(s) { return s ~ /^[-+]?[0-9]+(\.[0-9]*)?([eE][-+]?[0-9]+)?$/ }
        function abs(x) { return x < 0 ? -x : x }
        NR == FNR { want[FNR] = $0; nwant = FNR; next }
        {
            ngot = FNR
            if (!(FNR in want)) { printf "%s: extra row %d in fresh run: %s\n", name, FNR, $0; bad = 1; next }
            nw = split(want[FNR], w, ",")
            if (nw != NF) { printf "%s: row %d has %d fields committed, %d fresh\n", name, FNR, nw, NF; bad = 1; next }
            for (i = 1; i <= NF; i++) {
                if (isnum(w[i]) && isnum($i)) {
                    a = w[i] + 0; b = $i + 0
                    scale = abs(a) > abs(b) ? abs(a) : abs(b)
                    if (abs(a - b) > tol * scale) {
                        printf "%s: row %d field %d: committed %s, fresh %s (relative difference above %s)\n", name, FNR, i, w[i], $i, tol
                        bad = 1
                    }
                } else if (w[i] != $i) {
                    printf "%s: row %d field %d: committed \"%s\", fresh \"%s\"\n", name, FNR, i, w[i], $i
                    bad = 1
                }
            }
        }
        END {
            if (ngot < nwant) { printf "%s: fresh run has %d rows, committed has %d\n", name, ngot, nwant; bad = 1 }
            exit bad
        }' "$committed" "$fresh" >&2; then
        status=1
    else
        echo "check: $f matches ($(( $(wc -l < "$committed") - 1 )) rows, relative tolerance $REL_TOL)"
    fi
done
if (( status != 0 )); then
    echo "check: FAILED: ngspice results differ from the committed reference CSVs" >&2
fi
exit "$status"
