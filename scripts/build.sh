#!/usr/bin/env bash
# Installs the Debian packages (when run as root, or with sudo), then configures and builds into
# ./build. Extra CMake options come from $CMAKE_ARGS.
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
cd "$top"
if [ "${STRIPSMITH_SKIP_INSTALL:-}" != 1 ]; then
  if [ "$(id -u)" = 0 ]; then bash .ci/install-deps; else sudo bash .ci/install-deps; fi
fi
# shellcheck disable=SC2086
cmake -S . -B build -DCMAKE_BUILD_TYPE=RelWithDebInfo ${CMAKE_ARGS:-} >/dev/null
cmake --build build -j"$(nproc)"
