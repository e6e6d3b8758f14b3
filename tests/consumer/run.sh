#!/bin/sh
# Install the built tree into a temporary prefix, then build and run an outside
# program against it with CMake's find_package and with pkg-config, shared and
# static; when the Python binding is built, import it from the prefix too.
# usage: run.sh <build-dir> <source-dir-of-this-consumer> [<python3>|-]
set -eu
build=$1; here=$2; python=${3:--}
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

# The Python binding from the prefix alone: isolated mode (no PYTHONPATH, no
# user site, not the build tree), no LD_LIBRARY_PATH (the extension's RPATH
# must find the installed libacperf), one call checked against ISA.
if [ "$python" != - ]; then
  site=$(ls -d "$tmp"/prefix/lib*/python3*/dist-packages 2>/dev/null | head -n1)
  [ -n "$site" ] && [ -f "$site/acperf/__init__.py" ] || {
    echo "Python binding not installed under $tmp/prefix/lib*/python3*/dist-packages"; exit 1; }
  "$python" -I -c "
import sys
sys.path.insert(0, sys.argv[1])
import acperf
assert acperf.__file__.startswith(sys.argv[1]), acperf.__file__
t = acperf.isa(1000.0).temperature
assert abs(t - 281.65) < 1e-9, t  # ISA: 288.15 K - 6.5 K/km x 1 km
print('python binding from the prefix ok:', acperf.__file__)
" "$site"
fi
echo "install checks ok"
