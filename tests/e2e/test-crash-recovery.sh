#!/usr/bin/env bash
# End to end: draw on a new board, let the autosave run, kill the editor with SIGKILL, start it
# again: the copy is offered. Closing the window at that offer keeps the copy, offered again at the
# next start; accept the restore, save, and check the restored board holds what was drawn.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"
export STRIPSMITH_AUTOSAVE_SECONDS=1
out="$WORK/recovered.board.json"

start_editor
click_at $(item_xy place-resistor)
click_at $(hole_xy 2 3)
click_at $(hole_xy 2 3)
keys l
click_at $(hole_xy 2 9)
click_at $(hole_xy 6 9)
check "an autosave appeared in the recovery folder" eventually recovery_copy_holding '"C4"'
# The autosave runs once a second: wait for the one that holds the link, the last thing drawn.
check "the autosave holds the link to G10" eventually recovery_copy_holding '"G10"'
screenshot recovery-0-before-kill
kill -KILL "$EDITOR_PID"
wait "$EDITOR_PID" 2>/dev/null || true

start_editor
check "the copy is offered after the crash" wait_dialogs "restore"
screenshot recovery-1-offer
# Closing the window is no answer to the offer: the copy must stay for the next start.
wait_settled "STRIPSMITH_E2E item restore " >/dev/null
close_window
check "closing the window at the offer ends the editor" wait_exit
check "closing the window at the offer keeps the copy" recovery_copy_holding '"G10"'

start_editor
check "the copy is offered again at the next start" wait_dialogs "restore"
click_at $(item_xy restore)
screenshot recovery-2-restored
# The restored board has no file yet: Ctrl+S opens the chooser; type the path and press Enter.
check "Ctrl+S on the restored board opens the file chooser" press_until ctrl+s dialogs_match "^chooser$"
keys ctrl+a
type_text "$(basename "$out")"
keys Return
check "the restored board was saved" wait_for_file "$out"
check "the restored board holds the resistor C4-C8 and the link C10-G10" python3 - "$out" <<'PY'
import json, sys
b = json.load(open(sys.argv[1]))
parts = b["parts"]
pins = parts[0]["pins"] if parts else {}
pins = pins if isinstance(pins, dict) else {p["name"]: p["hole"] for p in pins}
links = [(l["from"], l["to"]) for l in b["links"]]
sys.exit(0 if len(parts) == 1 and sorted(pins.values()) == ["C4", "C8"] and links == [("C10", "G10")] else 1)
PY
no_copy_left() { ! recovery_copy_holding '"G10"'; }
check "saving cleared the recovery copy" eventually no_copy_left
finish
