#!/usr/bin/env bash
# Makes the example of docs/reproducers.md from the Quorvane ChannelSelect sample: its PW2001 deck
# (docs/reproducers/ChannelSelect-PW2001-1.cir), the estimate-vs-simulated table (docs/reproducers/confirm.txt)
# and the plot of the deck's waveforms (docs/images/reproducer-pw2001.png), from ngspice's `wrdata` output drawn
# with gnuplot. Installs ngspice and gnuplot from Debian when they are missing.
# Usage: docs/reproducers/make-example.sh
set -euo pipefail
cd "$(dirname "$0")/../.."
root=$(pwd)
for tool in ngspice gnuplot; do
  if ! command -v "$tool" >/dev/null 2>&1; then
    apt-get update -qq
    DEBIAN_FRONTEND=noninteractive apt-get install -y -qq ngspice gnuplot-nox >/dev/null
  fi
done

work=$(mktemp -d)
trap 'rm -rf "$work"' EXIT
dotnet run --project src/Cli -- samples/Quorvane/Quorvane.csproj --design ChannelSelect \
  --artifacts "$work/artifacts" --spice "$work/decks" --confirm >"$work/report.txt"

deck="$work/decks/ChannelSelect/PW2001-1.cir"
# The committed copy names the source file relative to the repository, not this machine's folder.
sed "s|$root/||" "$deck" >docs/reproducers/ChannelSelect-PW2001-1.cir
sed -n '/^Decks run in ngspice/,$p' "$work/report.txt" >docs/reproducers/confirm.txt

# The waveforms: the step and every chain node, written by ngspice's wrdata (time/value column pairs).
nodes=$(grep -oE '^C[0-9]+_(n_[A-Za-z0-9_]+)' "$deck" | sed -E 's/^C[0-9]+_//' | tr '\n' ' ')
vectors="v(step)"
for n in $nodes; do vectors="$vectors v($n)"; done
sed '/^\.end$/d' "$deck" >"$work/plot.cir"
cat >>"$work/plot.cir" <<CONTROL
.control
run
wrdata $work/waves.data $vectors
.endc
.end
CONTROL
(cd "$work" && ngspice -b plot.cir >"$work/ngspice.log" 2>&1)
[ -s "$work/waves.data" ] || { echo "make-example.sh: ngspice wrote no waveforms (see $work/ngspice.log)" >&2; cat "$work/ngspice.log" >&2; exit 1; }

estimate=$(sed -nE 's/^\* estimate t50 = ([0-9.eE+-]+).*/\1/p' "$deck")
step_at=$(sed -nE 's/^V[0-9]+_step step 0 PWL\(0 0 ([0-9.eE+-]+) .*/\1/p' "$deck")
count=$(echo $nodes | wc -w)
plots="'$work/waves.data' using (\$1*1e9):2 with lines lw 2 dt 2 title 'step (driving stage)'"
for i in $(seq 1 "$count"); do
  name=$(echo $nodes | cut -d' ' -f"$i")
  col=$(( 2 * i + 2 ))
  plots="$plots, '' using (\$1*1e9):$col with lines lw 2 title '$name'"
done
gnuplot <<GNUPLOT
set terminal pngcairo noenhanced size 960,540 font ",11"
set output "$root/docs/images/reproducer-pw2001.png"
set title "ChannelSelect PW2001 deck in ngspice: 7 pass gates in series (switch-level, invented demo figures)"
set xlabel "time (ns)"
set ylabel "V"
set key outside right
set grid
set arrow from (($step_at + $estimate)*1e9),0 to (($step_at + $estimate)*1e9),1.2 nohead dt 3 lc rgb "black"
set label "step + estimated t50" at (($step_at + $estimate)*1e9 + 0.02),0.08
set arrow from 0,0.6 to 3.5,0.6 nohead dt 3 lc rgb "gray"
set label "vdd/2" at 3.0,0.64
plot $plots
GNUPLOT
echo "docs/reproducers/ChannelSelect-PW2001-1.cir, docs/reproducers/confirm.txt and docs/images/reproducer-pw2001.png made"
