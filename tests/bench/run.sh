#!/bin/sh
# One command for the benchmark table: builds a Release tree in build-bench (with
# the Python binding when SWIG and numpy are there), runs the C benchmark (1e6
# points, 21 repetitions; model kernels on fewer points or calls) and the Python
# comparison (times, and instructions per scalar call when valgrind is there),
# and writes build-bench/results.csv, ratios.csv (model functions in acp_drag()
# calls), results.md and python.txt.
# Usage, from the top of the repository:   sh tests/bench/run.sh
set -eu
cd "$(dirname "$0")/../.."
python=OFF
command -v swig >/dev/null 2>&1 && /usr/bin/python3 -c "import numpy" 2>/dev/null && python=ON
cmake -S . -B build-bench -DCMAKE_BUILD_TYPE=Release -DACPERF_BUILD_BENCH=ON \
      -DACPERF_BUILD_PYTHON=$python >/dev/null
cmake --build build-bench -j2 >/dev/null
out=build-bench
./build-bench/tests/bench/acperf_bench 1000000 21 > "$out/results.csv"
{
  echo "Measured $(date -u +%Y-%m-%d) on $(grep -m1 'model name' /proc/cpuinfo | cut -d: -f2 | sed 's/^ //'),"
  echo "$(nproc) cores, one run of \`sh tests/bench/run.sh\` (median of 21)."
  echo
  echo "| kernel | points or calls | ns per point or call (median) | min | max | ratio to one libm pow() per point |"
  echo "|---|---|---|---|---|---|"
  tail -n +2 "$out/results.csv" | awk -F, '{printf "| %s | %s | %.2f | %.2f | %.2f | %s |\n", $1, $2, $3, $4, $5, ($6 == "nan" ? "" : sprintf("%.2f", $6))}'
} > "$out/results.md"
# Model functions in acp_drag() calls (alternated rounds, minimum of each)
./build-bench/tests/bench/acperf_bench --ratios 51 > "$out/ratios.csv"
{
  echo
  echo "| function | calls per round | rounds | ns per call (min) | acp_drag ns per call (min) | ratio to one acp_drag() call |"
  echo "|---|---|---|---|---|---|"
  tail -n +2 "$out/ratios.csv" | awk -F, '{printf "| %s | %s | %s | %.1f | %.1f | %.2f |\n", $1, $2, $3, $4, $5, $6}'
} >> "$out/results.md"
cat "$out/results.md"
if [ "$python" = ON ]; then
  PYTHONPATH=build-bench/bindings/python /usr/bin/python3 tests/bench/bench_python.py \
    build-bench/libperf/libacperf.so build-bench/tests/bench/acperf_bench | tee "$out/python.txt"
  if command -v valgrind >/dev/null 2>&1; then
    PYTHONPATH=build-bench/bindings/python /usr/bin/python3 tests/bench/instructions_python.py |
      tee -a "$out/python.txt"
  fi
fi
