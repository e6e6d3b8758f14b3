#!/bin/sh
# The built libacperf against the committed ABI baseline (libacperf.abi).
# Fails on a removed symbol or a changed function (signature, or a type it
# reaches: parameter structs, their fields and layout). Added symbols pass.
# Types no function reaches (enum acp_status: statuses are returned as int)
# are pinned by compile-time assertions in contract_status.c instead.
# usage: check.sh <libacperf.so> <baseline.abi> <public include dir>
set -eu
lib=$1; baseline=$2; inc=$3
if ! readelf -S "$lib" | grep -q '\.debug_info'; then
  echo "skipped: $lib has no debug info; build RelWithDebInfo (the default) or Debug"
  exit 77
fi
status=0
report=$(abidiff --no-added-syms --headers-dir2 "$inc" "$baseline" "$lib") || status=$?
if [ "$status" -eq 0 ]; then
  echo "ABI check ok: nothing removed or changed since the baseline"
  exit 0
fi
echo "$report"
echo
echo "abidiff exit status $status (4: ABI change, 8: incompatible change, 1/2: tool error)."
echo "A released symbol or type changed or disappeared. Either restore it, or, for a"
echo "deliberate break, follow docs/abi.md (new soname) and regenerate the baseline"
echo "with tests/reliability/abi/regenerate.sh."
exit 1
