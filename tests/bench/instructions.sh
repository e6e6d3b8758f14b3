#!/bin/sh
# Instruction counts of the array kernels under valgrind's callgrind: repeatable
# on a shared machine where times are not. Each kernel runs once on N points (or
# the points of the baseline's optional fourth column, for the slow model kernels);
# its count per point is compared with the committed baseline and the check fails
# when a kernel costs more than LIMIT times its baseline.
# Source of the check values: instructions.baseline holds this project's own
# callgrind measurements (written by --update), not published figures.
#   instructions.sh BENCH BASELINE            check
#   instructions.sh BENCH BASELINE --update   rewrite the baseline (after a
#                                             deliberate change; say why in the commit)
set -eu
bench=$1; baseline=$2; mode=${3:-check}
N=4096
# 1.5: the project's own headroom (counts are exact for one build, but move a
# little with compiler and glibc updates); not an outside figure.
LIMIT=1.5
tmp=$(mktemp); trap 'rm -f "$tmp"' EXIT
count() { # kernel function symbol, kernel name, points -> instructions per point
  valgrind --tool=callgrind --callgrind-out-file=/dev/null --collect-atstart=no \
    --toggle-collect="$1" "$bench" --once "$2" "$3" 2>&1 |
    awk -v n="$3" '/Collected :/ {printf "%.1f\n", $NF / n}'
}
status=0
while read -r name symbol base points; do
  case "$name" in ''|\#*) echo "$name $symbol $base${points:+ $points}" >> "$tmp"; continue ;; esac
  got=$(count "$symbol" "$name" "${points:-$N}")
  if [ "$mode" = "--update" ]; then
    echo "$name $symbol $got${points:+ $points}" >> "$tmp"
    echo "$name: $got instructions per point"
  else
    verdict=$(awk -v g="$got" -v b="$base" -v l="$LIMIT" 'BEGIN{print (g <= b * l) ? "ok" : "REGRESSION"}')
    echo "$name: $got instructions per point (baseline $base, limit x$LIMIT) $verdict"
    [ "$verdict" = ok ] || status=1
  fi
done < "$baseline"
[ "$mode" = "--update" ] && cp "$tmp" "$baseline"
exit $status
