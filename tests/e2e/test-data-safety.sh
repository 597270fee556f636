#!/usr/bin/env bash
# End to end: the editor never loses a board behind the maker's back.
#  1. Opening a broken board file through the chooser shows an error naming the file and line, and
#     the board already open (with an unsaved edit) stays as it was: saving it afterwards writes
#     the original board plus that edit.
#  2. Quitting with unsaved changes asks first: Ctrl+Q then Cancel keeps the editor running; the
#     window manager's close request (WM_DELETE_WINDOW, what the title bar's close button sends)
#     then "Don't save" ends it, and the file on disk is unchanged both times.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

sample="$STRIPSMITH_SOURCE/samples/flasher.board.json"
board="$WORK/flasher.board.json"
broken="$WORK/broken.board.json"
cp "$sample" "$board"

# The broken file: R1's second lead moved to E95 on an 18-column board.
python3 - "$sample" "$broken" <<'PY'
import sys
text = open(sys.argv[1]).read()
assert text.count('"E15"') == 1
open(sys.argv[2], "w").write(text.replace('"E15"', '"E95"'))
PY
bad_line=$(grep -n '"E95"' "$broken" | cut -d: -f1)
check "the broken file is refused by the netcheck CLI too (exit status 2)" \
    bash -c "'$STRIPSMITH_BIN/netcheck' '$broken' >/dev/null 2>&1; [ \$? -eq 2 ]"

# ---- 1. a broken file does not replace the open board ----------------------------------------

start_editor "$board"
screenshot safety-0-opened
# Cut strip A (the +9 V rail) between A13 and A14.
check "the cut tool made a cut at A13|A14" cut_gap 0 12 "A13|A14"
screenshot safety-1-cut

# Ctrl+O on a changed board asks first; "Don't save" goes on to the chooser.
check "Ctrl+O with an unsaved edit asks about the changes" press_for_dialog ctrl+o unsaved
screenshot safety-2-ask-before-open
check "\"Don't save\" is clicked" click_item unsaved-dont-save
check "\"Don't save\" goes on to the file chooser" wait_dialogs "^chooser$"
type_text "$(basename "$broken")"  # the chooser starts in the open board's folder
keys Return
check "the error names the file and line: $broken:$bad_line" \
    wait_dialogs "error .*$broken:$bad_line"
check "the error says what is wrong (the hole E95)" dialogs_match "E95"
wait_frames 30
check "the error stays up for 30 frames, until it is dismissed" dialogs_match "error "
screenshot safety-3-error
check "the window still shows the first board, with the change mark" \
    title_is "Stripsmith - flasher.board.json *"
check "the error's OK button is clicked" click_item message-ok
check "OK closes the error" wait_dialogs "^-$"
check "the broken file was not touched" cmp -s "$broken" <(sed 's/"E15"/"E95"/' "$sample")

check "Ctrl+S saves the board that stayed open" shortcut ctrl+s "Saved $board"
screenshot safety-4-saved

check "the saved file is the original board plus the one cut" python3 - "$sample" "$board" <<'PY'
import json, sys
before, after = json.load(open(sys.argv[1])), json.load(open(sys.argv[2]))
kept = ("board", "parts", "links", "offboard", "wires", "circuit")
same = all(before[k] == after[k] for k in kept)
sys.exit(0 if same and sorted(after["cuts"]) == sorted(before["cuts"] + ["A13|A14"]) else 1)
PY
nets_before=$("$STRIPSMITH_BIN/netcheck" --nets --json "$sample")
nets_after=$("$STRIPSMITH_BIN/netcheck" --nets --json "$board" || true)
# Traced by hand from the sample: strip A is the +9 V rail, fed by the battery at A1 and joined to
# U1.4 (link A7-G7) and U1.8 (link A12-D12); R1.1 sits at A15. Cutting A13|A14 leaves R1.1 alone on
# A14..A18 while the rest of the rail keeps its members.
check "netcheck: R1.1 was on the 9 V rail before and is cut off from it after" python3 - <<PY
import json
before = json.loads('''$nets_before''')["nets"]
after = json.loads('''$nets_after''')["nets"]
def net_of(nets, pin):
    return sorted([n for n in nets if pin in n][0])
rail_before = net_of(before, "BT1.+")
rail_after = net_of(after, "BT1.+")
ok = ("R1.1" in rail_before and net_of(after, "R1.1") == ["R1.1"]
      and rail_after == sorted(p for p in rail_before if p != "R1.1"))
others = [sorted(n) for n in before if "BT1.+" not in n]
ok = ok and all(n in [sorted(m) for m in after] for n in others)
raise SystemExit(0 if ok else 1)
PY

# ---- 2. quitting with unsaved changes asks first ---------------------------------------------

saved_sum=$(sha256sum <"$board")
check "the cut tool made a second cut at I17|I18" cut_gap 8 16 "I17|I18"
check "Ctrl+Q with an unsaved edit asks about the changes" press_for_dialog ctrl+q unsaved
screenshot safety-5-ask-before-quit
wait_frames 10
check "the editor is still running while it asks" editor_running
check "Cancel is clicked" click_item unsaved-cancel
check "Cancel closes the question" wait_dialogs "^-$"
wait_frames 30
check "after Cancel the editor keeps running (30 frames on)" editor_running
check "after Cancel the edit is still there, unsaved" \
    eventually title_is "Stripsmith - flasher.board.json *"
check "after Cancel the file on disk is unchanged" test "$(sha256sum <"$board")" = "$saved_sum"
screenshot safety-6-cancelled

close_window
check "closing the window with an unsaved edit asks about the changes" wait_dialogs unsaved
wait_frames 10
check "the editor is still running while it asks" editor_running
screenshot safety-7-ask-before-close
check "\"Don't save\" is clicked" click_item unsaved-dont-save
wait_exit || true
check "\"Don't save\" ends the editor normally (exit status: $EXIT_STATUS)" test "$EXIT_STATUS" = 0
check "after \"Don't save\" the file on disk is unchanged" \
    test "$(sha256sum <"$board")" = "$saved_sum"
check "the unsaved second cut is not on disk" python3 - "$board" <<'PY'
import json, sys
sys.exit(0 if "I17|I18" not in json.load(open(sys.argv[1]))["cuts"] else 1)
PY
"$STRIPSMITH_BIN/stripsmith" --screenshot "$ART/safety-8-reopened.png" --size 1400x900 "$board" \
    2>/dev/null || true
finish
