#!/usr/bin/env bash
# Regenerate the ngspice reference data in this folder:
#   1. writes the uniform-ladder netlists netlists/rc_ladder_nNN.cir (N = 1..16) and the restored-chain netlists
#      netlists/restored_chain_g12_mMM.cir;
#      the tree and retention netlists in netlists/ are hand-written and committed;
#   2. runs ngspice in batch mode on every netlist;
#   3. parses the .meas results (failing if any is missing) and writes
#      rc_ladder_t50.csv, rc_tree_t50.csv, retention.csv and restored_chain_t50.csv (numbers as %.6e).
# Usage: tests/reference/ngspice/regenerate.sh     (from any directory)
set -euo pipefail
export LC_ALL=C
here="$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)"
# shellcheck source=lib.sh
source "$here/lib.sh"

ref_require_ngspice
work="$(mktemp -d)"
# Keep the ngspice logs when something fails, so the error can be read.
trap 'rc=$?; if (( rc == 0 )); then rm -rf "$work"; else echo "ngspice logs kept in $work" >&2; fi' EXIT

ref_gen_all_ladders "$here/netlists"
ref_gen_all_restored "$here/netlists"
ref_build_csvs "$here/netlists" "$work"
for f in rc_ladder_t50.csv rc_tree_t50.csv retention.csv restored_chain_t50.csv; do
    cp "$work/$f" "$here/$f"
    echo "wrote $here/$f ($(( $(wc -l < "$here/$f") - 1 )) rows)"
done
