#!/usr/bin/env bash
# End to end: a bare link laid across a resistor's lead gets a link-over-lead warning; selecting
# the link with the mouse and ticking "insulated" in its properties clears it, and the saved
# board says the link is insulated.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

board="$WORK/sleeve.board.json"
cat >"$board" <<'JSON'
{"format": "stripsmith-board", "version": 1, "title": "link across a lead",
 "board": {"rows": 6, "cols": 10},
 "parts": [{"ref": "R1", "kind": "resistor", "value": "10k", "pins": {"1": "C3", "2": "C7"}}],
 "links": [{"from": "A3", "to": "E3"}]}
JSON
check "netcheck warns that the bare link A3-E3 lies across R1.1 in C3" bash -c \
    "'$STRIPSMITH_BIN/netcheck' '$board' | grep -q 'link-over-lead Bare link A3-E3 passes over C3 (R1.1)'"

start_editor "$board"
click_at $(hole_xy 1 2)  # B3, on the link's wire
check "the link is selected" wait_for_log "STRIPSMITH_E2E item link-insulated"
screenshot sleeve-0-selected
click_at $(item_xy link-insulated)
check "ticking insulated is one command" eventually grep -q "STRIPSMITH_E2E status Edit link A3" "$LOG"
shortcut ctrl+s Saved
screenshot sleeve-1-saved
check "the saved link is insulated" python3 - "$board" <<'PY'
import json, sys
links = json.load(open(sys.argv[1]))["links"]
sys.exit(0 if links == [{"from": "A3", "to": "E3", "insulated": True}] else 1)
PY
check "netcheck no longer warns" bash -c "! '$STRIPSMITH_BIN/netcheck' '$board' | grep -q link-over-lead"

# The other way: undo brings the warning back, and its button in the Check panel sleeves the link.
shortcut ctrl+z "Undid: Edit link A3"
shortcut ctrl+s Saved
check "after undo the saved link is bare again" python3 - "$board" <<'PY'
import json, sys
sys.exit(0 if "insulated" not in json.load(open(sys.argv[1]))["links"][0] else 1)
PY
click_at $(item_xy apply-fix-0)
check "the Check panel's button sleeves the link" eventually grep -q "STRIPSMITH_E2E status Sleeve link A3-E3" "$LOG"
shortcut ctrl+s Saved
screenshot sleeve-2-fixed-from-panel
check "saved again with the link insulated" python3 - "$board" <<'PY'
import json, sys
sys.exit(0 if json.load(open(sys.argv[1]))["links"][0].get("insulated") is True else 1)
PY
finish
