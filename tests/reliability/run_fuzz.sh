#!/bin/sh
# Run a libFuzzer target in the test suite.
#   run_fuzz.sh regress <binary> <dir>...            replay every file once
#   run_fuzz.sh fuzz <binary> <seconds> <workdir> <dict|-> <seed dir>...
# A bounded fuzz run keeps its growing corpus in <workdir>/corpus (the build
# tree, never the sources) and any crash in <workdir>/artifacts.
set -eu
mode=$1; bin=$2; shift 2
if [ "$mode" = regress ]; then
  files=$(find "$@" -type f ! -name '.*' ! -name README 2>/dev/null | sort)
  [ -n "$files" ] || { echo "no inputs to replay"; exit 1; }
  n=$(echo "$files" | wc -l)
  # shellcheck disable=SC2086
  "$bin" -runs=1 $files >/dev/null 2>"${TMPDIR:-/tmp}/acperf-regress.$$" || {
    cat "${TMPDIR:-/tmp}/acperf-regress.$$"; rm -f "${TMPDIR:-/tmp}/acperf-regress.$$"; exit 1; }
  rm -f "${TMPDIR:-/tmp}/acperf-regress.$$"
  echo "replayed $n inputs: no crash, no contract violation"
  exit 0
fi
seconds=$1; work=$2; dict=$3; shift 3
mkdir -p "$work/corpus" "$work/artifacts"
set -- "$work/corpus" "$@"
[ "$dict" = - ] || set -- "-dict=$dict" "$@"
log="$work/last-run.log"
status=0
"$bin" -max_total_time="$seconds" -timeout=10 -rss_limit_mb=2048 -print_final_stats=1 \
  -artifact_prefix="$work/artifacts/" "$@" >"$log" 2>&1 || status=$?
execs=$(sed -n 's/^stat::number_of_executed_units: *//p' "$log")
corpus=$(find "$work/corpus" -type f | wc -l)
echo "$(basename "$bin"): ${execs:-?} executions in ${seconds} s, corpus of $corpus inputs, status $status"
if [ "$status" -ne 0 ]; then
  grep -E 'contract violation|ERROR|SUMMARY|runtime error|Test unit written' "$log" | head -20
  echo "Crash input kept in $work/artifacts/. Reproduce: $bin <file>;"
  echo "after the fix, add it to tests/reliability/regress/<target>/ (see docs/reliability.md)."
fi
exit "$status"
