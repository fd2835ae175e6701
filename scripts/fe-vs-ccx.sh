#!/usr/bin/env bash
# Times the finite-element check against CalculiX on the same mesh: a solid
# 20 ft x 10 ft wall meshed 160 x 80 (1.5 in elements), pierwise with the
# plain bilinear element (q4), CalculiX with CPS4. Prints the best-of-N
# wall-clock time, the CPU time and the peak resident memory of each, and the
# ratios. The target: pierwise at least 10x faster, at most 1/10 of
# CalculiX's peak memory.
#
# Usage: scripts/fe-vs-ccx.sh [runs]     (default 3 runs each)
set -euo pipefail
cd "$(dirname "$0")/.."
runs=${1:-3}

command -v ccx >/dev/null || { echo "ccx not found: apt-get install -y calculix-ccx" >&2; exit 1; }
[ -x /usr/bin/time ] || { echo "/usr/bin/time not found: apt-get install -y time" >&2; exit 1; }

tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT

# Build first so compile time is not counted.
go build -o "$tmp/fetime" ./scripts/fetime
"$tmp/fetime" -length 20 -height 10 -mesh 1.5 -inp "$tmp/wall.inp"
# The same wall through the command line (reads the file, solves the classic
# method too, prints JSON); skipped when the command does not build.
cli=""
if go build -o "$tmp/pierwise" ./cmd/pierwise 2>/dev/null; then
	cli="$tmp/pierwise"
	cat >"$tmp/wall.toml" <<'TOML'
title = "timing wall"
units = "us"
length = "20ft"
height = "10ft"
thickness = "7.625in"
support = "cantilever"
[material]
kind = "concrete-masonry"
strength = "2000psi"
TOML
fi

# measure NAME DIR CMD...: best elapsed, its CPU time, the largest peak RSS.
measure() {
	local name=$1 dir=$2
	shift 2
	local best="" cpu="" rss=0 i out e u s m
	for ((i = 0; i < runs; i++)); do
		out=$(cd "$dir" && /usr/bin/time -f "TIME %e %U %S %M" "$@" 2>&1 >/dev/null | grep '^TIME')
		read -r _ e u s m <<<"$out"
		if [[ -z $best ]] || awk "BEGIN{exit !($e < $best)}"; then
			best=$e
			cpu=$(awk "BEGIN{print $u + $s}")
		fi
		((m > rss)) && rss=$m
	done
	printf '%-10s elapsed %6.2f s   cpu %6.2f s   peak RSS %8d KB\n' "$name" "$best" "$cpu" "$rss"
	eval "${name}_t=$best ${name}_c=$cpu ${name}_m=$rss"
}

echo "solid wall 20 ft x 10 ft, 160 x 80 elements (1.5 in), best of $runs runs, each program with its default threads"
"$tmp/fetime" -length 20 -height 10 -mesh 1.5
measure pierwise "$tmp" "$tmp/fetime" -length 20 -height 10 -mesh 1.5
if [[ -n $cli ]]; then
	measure cli "$tmp" "$cli" solve wall.toml --fe --mesh 1.5in --element q4 --json
fi
measure ccx "$tmp" ccx wall
grep -A2 'displacements' "$tmp/wall.dat" >/dev/null || { echo "ccx produced no displacements" >&2; exit 1; }

if [[ -n $cli ]]; then
	awk -v t="$cli_t" -v ct="$ccx_t" -v m="$cli_m" -v cm="$ccx_m" 'BEGIN {
		printf "command line (pierwise solve --fe --json): %.1fx faster, %.3f of the memory\n", ct / t, m / cm
	}'
fi
awk -v pt="$pierwise_t" -v ct="$ccx_t" -v pc="$pierwise_c" -v cc="$ccx_c" -v pm="$pierwise_m" -v cm="$ccx_m" 'BEGIN {
	printf "time ratio   ccx/pierwise %6.1fx (elapsed)  %6.1fx (cpu)   target >= 10x\n", ct / pt, cc / (pc > 0 ? pc : 0.01)
	printf "memory ratio pierwise/ccx %6.3f                              target <= 0.100\n", pm / cm
	ok = (ct / pt >= 10 && pm / cm <= 0.1)
	print ok ? "targets met" : "targets NOT met"
}'
