#!/usr/bin/env bash
# End to end: keys work on the first press, and canvas keys never reach a text field the user did
# not click. Each key below is sent once (never pressed again on no effect): after the editor has
# taken it and drawn two more frames, its effect must be there.
#  - Ctrl+A in a text field selects all (typing replaces the old title);
#  - Enter in a text field, then Ctrl+S: saved;
#  - two quick Ctrl+Z (one xdotool call): two steps undone;
#  - Tab after a click on the Board panel turns the board over and does not walk into the strips
#    box: digits typed after it leave the board's size alone;
#  - F1 opens the keys window, sized so that no line is cut off.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

board="$WORK/flasher.board.json"
cp "$STRIPSMITH_SOURCE/samples/flasher.board.json" "$board"
field() {  # field EXPRESSION: a value of the saved board b, e.g. 'b["title"]'
    python3 -c 'import json, sys; b = json.load(open(sys.argv[1])); print(eval(sys.argv[2]))' "$board" "$1"
}
rows_before=$(field 'b["board"]["rows"]')
cuts_before=$(field 'len(b["cuts"])')

start_editor "$board"

# Sizes in one order: holes across (columns) x strips (rows), millimetres width x height, from the
# file's own numbers (pitch 2.54 mm).
size=$(field '"%d x %d holes, %.1f x %.1f mm" % (b["board"]["cols"], b["board"]["rows"], b["board"]["cols"] * b["board"]["pitch_mm"], b["board"]["rows"] * b["board"]["pitch_mm"])')
check "the Board panel writes the size as holes across x strips: $size" wait_for_log "STRIPSMITH_E2E note board-size $size\$"

# Ctrl+A, type, Enter in the title field; then Ctrl+S once.
click_at $(item_xy board-title)
keys ctrl+a
type_text "Amp"
keys Return ctrl+s  # one xdotool call: Ctrl+S follows Enter at once
check "Ctrl+A selected the whole title (typing replaced it)" [ "$(field 'b["title"]')" = "Amp" ]
check "Ctrl+S right after Enter in a text field saved on the first press" in_log "STRIPSMITH_E2E status Saved $board"

# Two cuts, then two quick Ctrl+Z in one xdotool call.
cut_gap 2 3 "C4|C5"
cut_gap 3 3 "D4|D5"
before=$(status_count)
keys ctrl+z ctrl+z
undone=$(grep "STRIPSMITH_E2E status" "$LOG" | tail -n +"$((before + 1))" | grep -c "Undid: Add cut" || true)
check "two quick Ctrl+Z undid two steps (undid $undone)" [ "$undone" -eq 2 ]
keys ctrl+s
check "the saved board has its cuts as before the two cuts" \
    [ "$(field 'len(b["cuts"])')" = "$cuts_before" ]

# Tab after a click on the Board panel's text: ImGui's Tab walked into the strips box, and the
# digits and Enter after it made the board 3 strips.
click_at $(item_xy board-size)
keys Tab
check "Tab turned the board over (copper side, mirrored)" wait_until bash -c "grep 'STRIPSMITH_E2E view A1' '$LOG' | tail -1 | grep -q 'mirrored 1'"
type_text "3"
keys Return
keys ctrl+s
check "digits after Tab did not reach the strips box: still $rows_before strips" [ "$(field 'b["board"]["rows"]')" = "$rows_before" ]
check "the view still shows $rows_before strips" bash -c "grep 'STRIPSMITH_E2E view A1' '$LOG' | tail -1 | grep -q 'rows $rows_before '"

# F1: the keys window, every line inside it.
keys F1
check "the keys window shows every line whole" wait_for_log "STRIPSMITH_E2E note keys-window fits"
screenshot keys-help
finish
