#!/usr/bin/env bash
# End to end: drag an off-board pot from its column to below the board (where it sits on the
# front panel), nudge it with an arrow key and undo the nudge, save, and check the saved place,
# that the lugs are drawn where the pot went, and that no connection changed.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

sample="$STRIPSMITH_SOURCE/samples/headphone-amp.board.json"
board="$WORK/amp.board.json"
cp "$sample" "$board"
start_editor "$board"
screenshot arrange-0-opened

pitch=$(grep "STRIPSMITH_E2E view A1" "$LOG" | tail -1 | awk '{ print $7 }')
lug_before=$(grep "STRIPSMITH_E2E lug VR1.2 " "$LOG" | tail -1 | awk '{ print $4, $5 }')
read -r bx by < <(grep "STRIPSMITH_E2E offboard VR1 " "$LOG" | tail -1 | awk '{ printf "%d %d\n", $4, $5 }')
# 14 holes to the left and 12 rows down: under the board, clear of it and of the other parts.
drag "$bx" "$by" "$(awk -v x="$bx" -v p="$pitch" 'BEGIN { printf "%d", x - 14 * p }')" \
    "$(awk -v y="$by" -v p="$pitch" 'BEGIN { printf "%d", y + 12 * p }')"
screenshot arrange-1-dragged
check "the drag moved VR1 as one step" eventually grep -q "STRIPSMITH_E2E status Move VR1" "$LOG"
shortcut Down "Move VR1"
shortcut ctrl+z "Undid: Move VR1"
shortcut ctrl+s Saved
screenshot arrange-2-saved

check "VR1 is saved 14 holes left of and 12 rows below its place in the column" python3 - "$board" <<'PY'
import json, sys
b = json.load(open(sys.argv[1]))
place = {o["ref"]: o.get("place") for o in b["offboard"]}
column_x = b["board"]["cols"] + 3.0  # the column's left edge, three holes right of the board
ok = place["VR1"] == {"x": column_x - 14, "y": 12.5} and all(place[r] is None for r in ("J1", "J2", "J3"))
print(place)
sys.exit(0 if ok else 1)
PY
check "VR1's wiper lug is drawn 14 holes left and 12 rows down" python3 - "$pitch" "$lug_before" \
    "$(grep "STRIPSMITH_E2E lug VR1.2 " "$LOG" | tail -1 | awk '{ print $4, $5 }')" <<'PY'
import sys
pitch = float(sys.argv[1])
x0, y0 = map(float, sys.argv[2].split())
x1, y1 = map(float, sys.argv[3].split())
print((x1 - x0) / pitch, (y1 - y0) / pitch)
sys.exit(0 if abs((x1 - x0) / pitch + 14) < 0.05 and abs((y1 - y0) / pitch - 12) < 0.05 else 1)
PY
check "moving a pot changed no connection" \
    diff <("$STRIPSMITH_BIN/netcheck" --nets --json "$sample") <("$STRIPSMITH_BIN/netcheck" --nets --json "$board")
finish
