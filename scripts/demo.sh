#!/usr/bin/env bash
# Installs, builds, and opens the editor on the demo board. Without a display it prints the
# check report of the demo instead (and says so).
set -euo pipefail
top=$(cd "$(dirname "$0")/.." && pwd)
bash "$top/scripts/build.sh"
demo="$top/samples/demo.board.json"
if [ -n "${DISPLAY:-}" ] && [ -x "$top/build/bin/stripsmith" ]; then
  exec "$top/build/bin/stripsmith" "$demo"
fi
echo "No display: showing the check report of $demo instead of opening the editor."
"$top/build/bin/netcheck" "$demo" || true
