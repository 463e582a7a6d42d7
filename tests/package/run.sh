#!/usr/bin/env bash
# Installs the built tree to a temporary prefix, then builds tests/package/main.cpp against it
# twice: through find_package(fourplat CONFIG) and through pkg-config. Usage: run.sh SRC BUILD
set -euo pipefail
src=$1 build=$2
tmp=$(mktemp -d)
trap 'rm -rf "$tmp"' EXIT
cmake --install "$build" --prefix "$tmp/prefix" >/dev/null
cmake -S "$src/tests/package" -B "$tmp/consumer" -G Ninja -DCMAKE_PREFIX_PATH="$tmp/prefix" >/dev/null
cmake --build "$tmp/consumer" >/dev/null
"$tmp/consumer/consumer"
libdir=$(find "$tmp/prefix" -name fourplat.pc -printf '%h\n' | head -n 1)
PKG_CONFIG_PATH="$libdir" c++ -o "$tmp/consumer_pc" "$src/tests/package/main.cpp" \
  $(PKG_CONFIG_PATH="$libdir" pkg-config --cflags --libs fourplat)
"$tmp/consumer_pc"
echo "package consumer: find_package and pkg-config both built and ran"
