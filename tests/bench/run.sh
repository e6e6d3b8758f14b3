#!/bin/sh
# One command for the benchmark table: builds a Release tree in build-bench, runs
# the C benchmark (1e6 points, 21 repetitions) and, when the Python binding and
# its benchmark exist, the Python comparison; writes build-bench/results.csv and
# build-bench/results.md. Usage, from the top of the repository:
#   sh tests/bench/run.sh
set -eu
cd "$(dirname "$0")/../.."
cmake -S . -B build-bench -DCMAKE_BUILD_TYPE=Release -DACPERF_BUILD_BENCH=ON >/dev/null
cmake --build build-bench -j2 >/dev/null
out=build-bench
./build-bench/tests/bench/acperf_bench 1000000 21 > "$out/results.csv"
{
  echo "Measured $(date -u +%Y-%m-%d) on $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ //'),"
  echo "$(nproc) cores, one run of \`sh tests/bench/run.sh\` (1e6 points, median of 21)."
  echo
  echo "| kernel | ns per point (median) | min | max | ratio to one libm pow() per point |"
  echo "|---|---|---|---|---|"
  tail -n +2 "$out/results.csv" | awk -F, '{printf "| %s | %.2f | %.2f | %.2f | %s |\n", $1, $3, $4, $5, ($6 == "nan" ? "" : sprintf("%.2f", $6))}'
} > "$out/results.md"
cat "$out/results.md"
