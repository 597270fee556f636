#!/usr/bin/env bash
# End to end: two editors on one file never silently overwrite each other.
#  1. A opens shared.board.json; B opening it too warns that another editor has it open.
#  2. B cuts and saves. A cuts and saves: A asks instead (the file changed on disk), and the file
#     keeps B's save. Reload brings B's save into A; A's next cut saves without a question.
#  3. B, now behind A's save, cuts and saves: it asks; Overwrite writes B's board, and the version
#     it replaced is kept as shared.board.json.bak.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"
board="$WORK/shared.board.json"
cp "$STRIPSMITH_SOURCE/samples/flasher.board.json" "$board"

has_cut() { python3 -c 'import json, sys; sys.exit(0 if sys.argv[2] in json.load(open(sys.argv[1]))["cuts"] else 1)' "$1" "$2"; }
lacks_cut() { ! has_cut "$@"; }
unchanged() { [ "$(sha256sum <"$board")" = "$1" ]; }

# ---- 1. opening a file another editor has open ----------------------------------------------------
check "editor A opens shared.board.json" start_named a "$board"
check "A's own opening says nothing" dialogs_match "^-$"
check "editor B opens shared.board.json too" start_named b "$board"
check "B warns that A has the file open" wait_dialogs "note Another Stripsmith window (process ${PID_OF[a]})"
screenshot two-editors-0-warning
click_item message-ok
check "OK closes the warning" wait_dialogs "^-$"

# ---- 2. A saves after B ---------------------------------------------------------------------------
check "B cuts A13|A14" cut_gap 0 12 "A13|A14"
check "B saves" shortcut ctrl+s "Saved "
check "B's cut is on disk" has_cut "$board" "A13|A14"
saved_by_b=$(sha256sum <"$board")

use_editor a
check "A cuts I17|I18" cut_gap 8 16 "I17|I18"
check "A's save asks: the file changed on disk" press_until ctrl+s dialogs_match changed-on-disk
screenshot two-editors-1-changed-on-disk
wait_frames 10
check "while A asks, the file keeps B's save" unchanged "$saved_by_b"
click_item changed-reload
check "Reload closes the question" wait_dialogs "^-$"
check "after Reload A shows the file as saved" eventually title_is "Stripsmith - shared.board.json" "${WINDOW_OF[a]}"
check "A cuts C5|C6" cut_gap 2 4 "C5|C6"
check "A's next save goes through without a question" shortcut ctrl+s "Saved "
check "the file holds B's cut and A's, and not the cut A dropped" \
    bash -c "$(declare -f has_cut lacks_cut); has_cut '$board' 'A13|A14' && has_cut '$board' 'C5|C6' && lacks_cut '$board' 'I17|I18'"
saved_by_a=$(sha256sum <"$board")

# ---- 3. B saves after A, and chooses Overwrite ----------------------------------------------------
use_editor b
check "B cuts E9|E10" cut_gap 4 8 "E9|E10"
check "B's save asks: the file changed on disk" press_until ctrl+s dialogs_match changed-on-disk
check "while B asks, the file keeps A's save" unchanged "$saved_by_a"
before=$(status_count)
click_item changed-overwrite
check "Overwrite saves B's board" wait_status_after "$before" "Saved "
check "the file now holds B's board: its cuts, not A's" \
    bash -c "$(declare -f has_cut lacks_cut); has_cut '$board' 'E9|E10' && lacks_cut '$board' 'C5|C6'"
check "A's save is kept as the backup" bash -c "[ \"\$(sha256sum <'$board.bak')\" = '$saved_by_a' ]"
finish
