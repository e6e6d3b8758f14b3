#!/bin/sh
# Install the built tree into a temporary prefix, then build and run an outside
# program against it with CMake's find_package and with pkg-config, shared and static.
# usage: run.sh <build-dir> <source-dir-of-this-consumer>
set -eu
build=$1; here=$2
tmp=$(mktemp -d); trap 'rm -rf "$tmp"' EXIT
cmake --install "$build" --prefix "$tmp/prefix" >/dev/null
libdir=$(ls -d "$tmp"/prefix/lib*/ | head -n1)

cmake -S "$here" -B "$tmp/cm" -DCMAKE_PREFIX_PATH="$tmp/prefix" >/dev/null
cmake --build "$tmp/cm" >/dev/null
LD_LIBRARY_PATH="$libdir" "$tmp/cm/consumer"
"$tmp/cm/consumer_static"

export PKG_CONFIG_PATH="$libdir/pkgconfig"
cc -std=c11 -Wall -Wextra -Wpedantic -Werror $(pkg-config --cflags acperf) "$here/consumer.c" \
   -o "$tmp/pc" $(pkg-config --libs acperf) -lm
LD_LIBRARY_PATH="$libdir" "$tmp/pc"
cc -std=c11 $(pkg-config --cflags acperf) "$here/consumer.c" -o "$tmp/pcs" \
   "$libdir/libacperf.a" $(pkg-config --static --libs-only-l acperf | sed 's/-lacperf//')
"$tmp/pcs"
# The shared library's soname and its only dependencies: glibc's libc and its
# math library (libm, and libmvec, glibc's vector math, which libm.so links as
# needed when the array kernels are vectorised).
objdump -p "$libdir/libacperf.so" | grep -q 'SONAME *libacperf.so.0'
deps=$(objdump -p "$libdir/libacperf.so" | awk '/NEEDED/{print $2}' | grep -v '^libmvec.so.1$' | sort | tr '\n' ' ')
[ "$deps" = "libc.so.6 libm.so.6 " ] || { echo "unexpected dependencies: $deps"; exit 1; }
echo "install checks ok"
