#!/usr/bin/env bash
# End to end: open the board whose electrolytic C2 is the wrong way round (five errors), show the
# repair plan's step on the board, apply the whole plan from the Check panel as one undo step, save,
# and check with netcheck that the saved board passes and that only C2 changed (turned round).
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

sample="$STRIPSMITH_SOURCE/samples/astable-reversed-electrolytic.board.json"
board="$WORK/astable.board.json"
cp "$sample" "$board"
check "the sample fails its check before the repair" bash -c "! '$STRIPSMITH_BIN/netcheck' '$board' >/dev/null"

start_editor "$board"
screenshot plan-0-opened
click_at $(item_xy repair-step-1)
screenshot plan-1-step-shown
click_at $(item_xy apply-plan)
screenshot plan-2-applied
shortcut ctrl+s Saved
check "netcheck passes the saved board" eventually "$STRIPSMITH_BIN/netcheck" "$board"
check "only C2 changed, turned round" python3 - "$sample" "$board" <<'PY'
import json, sys
before, after = (json.load(open(p)) for p in sys.argv[1:])
changed = [(a, b) for a, b in zip(before["parts"], after["parts"]) if a != b]
if len(changed) != 1 or changed[0][0]["ref"] != "C2":
    sys.exit(1)
was, now = changed[0][0]["pins"], changed[0][1]["pins"]
sys.exit(0 if was["+"] == now["-"] and was["-"] == now["+"] and before["cuts"] == after["cuts"] else 1)
PY
# One undo takes the whole plan back.
shortcut ctrl+z Undid
shortcut ctrl+s Saved
check "after one undo and save the board fails again" eventually bash -c "! '$STRIPSMITH_BIN/netcheck' '$board'"
finish
