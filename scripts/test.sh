#!/usr/bin/env bash
# Builds everything and runs every test through ctest (GUI tests start their own Xvfb).
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
bash "$top/scripts/build.sh"
ctest --test-dir "$top/build" --output-on-failure -j"$(nproc)"
