#!/usr/bin/env bash
# End to end: open a board with a forgotten track cut, show the repair plan's one step (a cut) on
# the board, apply that step with a mouse click, save with Ctrl+S, and check that netcheck now
# passes the board.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

sample="$STRIPSMITH_SOURCE/samples/flasher-missing-cut.board.json"
board="$WORK/flasher.board.json"
cp "$sample" "$board"
check "the sample fails its check before the fix" bash -c "! '$STRIPSMITH_BIN/netcheck' '$board' >/dev/null"

start_editor "$board"
screenshot fix-0-opened
# Show the finding on the board, then the plan's step, then apply the step.
click_at $(item_xy finding-0)
screenshot fix-1-finding
click_at $(item_xy repair-step-1)
screenshot fix-1-step-shown
click_at $(item_xy apply-step-1)
screenshot fix-2-applied
shortcut ctrl+s Saved
check "the previous version is kept as a backup" eventually test -s "$board.bak"
check "netcheck passes the saved board" eventually "$STRIPSMITH_BIN/netcheck" "$board"
check "exactly one cut was added" python3 - "$sample" "$board" <<'PY'
import json, sys
before = json.load(open(sys.argv[1]))["cuts"]
after = json.load(open(sys.argv[2]))["cuts"]
sys.exit(0 if len(after) == len(before) + 1 and all(c in after for c in before) else 1)
PY
# Undo with Ctrl+Z brings the fault back (the fix is an ordinary undoable command).
shortcut ctrl+z Undid
shortcut ctrl+s Saved
check "after undo and save the board fails again" eventually bash -c "! '$STRIPSMITH_BIN/netcheck' '$board'"
screenshot fix-3-undone
finish
