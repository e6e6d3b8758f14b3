#!/bin/sh
# Regenerate tests/reliability/abi/libacperf.abi from a committed revision
# (default HEAD): the library is built from `git archive` of that revision in
# a temporary directory (RelWithDebInfo, default compiler), so the baseline
# never holds uncommitted work. When this is legitimate: docs/abi.md.
# usage: tests/reliability/abi/regenerate.sh [revision]
set -eu
rev=${1:-HEAD}
top=$(git rev-parse --show-toplevel)
tmp=$(mktemp -d); trap 'rm -rf "$tmp"' EXIT
git -C "$top" archive "$rev" | tar -x -C "$tmp"
cmake -S "$tmp" -B "$tmp/build" -DCMAKE_BUILD_TYPE=RelWithDebInfo -DACPERF_BUILD_TESTS=OFF \
      -DACPERF_BUILD_EXAMPLES=OFF -DACPERF_BUILD_PYTHON=OFF >/dev/null
cmake --build "$tmp/build" -j2 --target acperf >/dev/null
lib=$(ls "$tmp"/build/libperf/libacperf.so.*.*.* | head -n1)
out=$top/tests/reliability/abi/libacperf.abi
# --exported-interfaces-only: libabigail 2.2 otherwise may write a function
# called from an earlier source file without its symbol, and then misses
# changes to the types it takes (seen with acp_isa and acp_atmos).
abidw --exported-interfaces-only --no-corpus-path --no-comp-dir-path --short-locs \
      "$lib" --out-file "$out"
echo "wrote $out from $rev ($(grep -c '<elf-symbol ' "$out") ELF symbols)"
