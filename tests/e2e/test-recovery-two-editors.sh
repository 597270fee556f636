#!/usr/bin/env bash
# End to end: a recovery copy belongs to the editor that wrote it, with several editors running.
#  1. Editor B runs on b.board.json; editor A, on a.board.json, makes an edit and autosaves; B is
#     closed normally: A's copy is still there.
#  2. Editor C, started while A runs, offers nothing (A's copy is live work, not left behind), and
#     its normal exit leaves A's copy too.
#  3. A is killed (SIGKILL): editor D, started next, offers A's copy; restoring it makes it D's.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"
export STRIPSMITH_AUTOSAVE_SECONDS=1
cp "$STRIPSMITH_SOURCE/samples/flasher.board.json" "$WORK/a.board.json"
cp "$STRIPSMITH_SOURCE/samples/flasher.board.json" "$WORK/b.board.json"

# offers_nothing: the editor has logged its dialogs, and no recovery offer is among them.
offers_nothing() { [ -n "$(last_dialogs)" ] && ! dialogs_match restore; }

# copy_of NAME TEXT: the recovery copy of editor NAME holds TEXT.
copy_of() { grep -q -F -- "$2" "$WORK/recovery/editor-${PID_OF[$1]}-"*.board.json 2>/dev/null; }

# ---- 1. another editor's normal exit --------------------------------------------------------------
check "editor B starts on b.board.json" start_named b "$WORK/b.board.json"
check "editor A starts on a.board.json" start_named a "$WORK/a.board.json"
check "A cuts strip A at A13|A14" cut_gap 0 12 "A13|A14"
check "A's autosave holds the cut" eventually copy_of a '"A13|A14"'
screenshot two-recovery-0-a-edited
close_window "${WINDOW_OF[b]}"
LOG="$WORK/b.log" EDITOR_PID=${PID_OF[b]}
check "B, with nothing unsaved, ends at the close request" wait_exit
check "B ended normally (exit status: $EXIT_STATUS)" test "$EXIT_STATUS" = 0
check "B's normal exit left A's recovery copy" copy_of a '"A13|A14"'

# ---- 2. an editor started while A runs ------------------------------------------------------------
check "editor C starts while A runs" start_named c
wait_frames 10
check "C does not offer A's live copy as left behind" offers_nothing
close_window "${WINDOW_OF[c]}"
check "C ends at the close request" wait_exit
check "C's normal exit left A's recovery copy" copy_of a '"A13|A14"'

# ---- 3. A crashes ---------------------------------------------------------------------------------
kill -KILL "${PID_OF[a]}"
wait "${PID_OF[a]}" 2>/dev/null || true
check "editor D starts after A was killed" start_named d
check "D offers A's copy of a.board.json" wait_dialogs "restore .*/a.board.json"
screenshot two-recovery-1-offer
click_at $(item_xy restore)
check "the restored board is a.board.json with unsaved changes" \
    eventually title_is "Stripsmith - a.board.json *" "${WINDOW_OF[d]}"
check "the restored copy is now D's own" eventually copy_of d '"A13|A14"'
check "A's old copy is gone once D holds it" eventually test -z "$(ls "$WORK/recovery/editor-${PID_OF[a]}-"* 2>/dev/null)"
finish
