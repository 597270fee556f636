#!/usr/bin/env bash
# Builds everything and runs the tests through ctest (GUI tests start their own Xvfb).
#   bash scripts/test.sh              every tier
#   bash scripts/test.sh fast [gui]   only the tiers named (fast, sheet, gui)
# STRIPSMITH_SHEET_PNGS=1 also renders every sample's build sheet to PNG under
# build/test-artifacts/sheet/ (slow; for looking at, not needed for the checks).
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
tiers=()
for tier in "$@"; do
  case $tier in
    fast | sheet | gui) tiers+=("$tier") ;;
    *) echo "test.sh: unknown tier $tier (fast, sheet or gui)" >&2; exit 2 ;;
  esac
done
bash "$top/scripts/build.sh"
labels=()
if [ ${#tiers[@]} -gt 0 ]; then labels=(-L "^($(IFS='|'; echo "${tiers[*]}"))\$"); fi
ctest --test-dir "$top/build" --output-on-failure -j"$(nproc)" "${labels[@]}"
