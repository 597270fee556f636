#!/usr/bin/env bash
# End to end, the Parts panel and the Check panel:
#  - a new LED is named D1 (the kind table's reference letters);
#  - typing in the search box filters the kinds, on and off the board, by name or label (the count
#    shown is compared with README.md's table of part kinds, which a unit test keeps equal to the
#    kind table);
#  - the Link and Cut tools show their hint as the part and wire tools do;
#  - a new off-board part, added while the view is zoomed in away from the column beside the board,
#    is placed and scrolled into sight (its body is inside the canvas);
#  - a click on a finding's message (not only its header) chooses it; an edit and its undo keep the
#    same finding chosen and leave the view where it was.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

board="$WORK/flasher-missing-cut.board.json"
cp "$STRIPSMITH_SOURCE/samples/flasher-missing-cut.board.json" "$board"
start_editor "$board"

# An LED placed on the board is named as the diode it is (the kind table's rule): D1, not LED1.
# (The sample's own LED is LED1, from its circuit; D1 is free.)
click_at $(item_xy place-led)
click_at $(hole_xy 0 1)
click_at $(hole_xy 0 1)
check "a new LED is named D1" wait_for_log "STRIPSMITH_E2E status Add D1$"
keys Escape
keys ctrl+z

# Hints of the Link and Cut tools.
keys l
check "the Link tool shows its hint" wait_for_log "STRIPSMITH_E2E note tool-hint Click two holes"
keys x
check "the Cut tool shows its hint" wait_for_log "STRIPSMITH_E2E note tool-hint Click a hole for a hole cut"
keys Escape

# Search: "jack" in the box.
expected=$(python3 - "$STRIPSMITH_SOURCE/README.md" <<'PY'
import sys
rows = [l for l in open(sys.argv[1]) if l.startswith("| `")]
print(sum(1 for r in rows if "jack" in (r.split("|")[1] + r.split("|")[2]).lower()))
PY
)
click_at $(item_xy parts-search)
type_text "jack"
check "searching \"jack\" shows the $expected kinds that hold it" wait_for_log "STRIPSMITH_E2E note parts-shown $expected for \"jack\""
keys ctrl+a BackSpace
type_text "pot"
check "searching \"pot\" shows the pot alone" wait_for_log "STRIPSMITH_E2E note parts-shown 1 for \"pot\""
screenshot parts-search

# Zoom in on the left end of the board, so the column right of the board is out of view.
read -r ax ay < <(hole_xy 0 0)
move_to "$ax" "$ay"
views=$(grep -c "STRIPSMITH_E2E view A1" "$LOG")
xdotool click --repeat 6 4
check "the view zoomed in" wait_until bash -c "[ \$(grep -c 'STRIPSMITH_E2E view A1' '$LOG') -gt $views ]"
wait_settled "STRIPSMITH_E2E view A1" || true
before=$(grep -c "STRIPSMITH_E2E offboard " "$LOG")
click_at $(item_xy add-pot)
check "the pot was added" wait_for_log "STRIPSMITH_E2E status Add .*VR1"
wait_settled "STRIPSMITH_E2E view A1" || true
# The canvas at 1x in a 1400 x 900 window: between the 240 px Parts panel and the 340 px right
# panels, below the menu bar and above the status line (editor/panels/layout.cpp).
check "the new pot is in sight, inside the canvas" bash -c "grep 'STRIPSMITH_E2E offboard VR1 ' '$LOG' | tail -1 |
    awk '{ exit !(\$4 > 240 && \$4 < 1060 && \$5 > 30 && \$5 < 860) }'"
screenshot parts-offboard-added
keys ctrl+z
keys f

# The finding's message, not its header, chosen with a click.
click_at $(item_xy finding-text-0)
check "a click on the finding's message chooses it" wait_for_log "STRIPSMITH_E2E note focused-finding 0 short"
focus=$(grep "STRIPSMITH_E2E note focused-finding" "$LOG" | tail -1 | cut -d' ' -f5-)
wait_settled "STRIPSMITH_E2E view A1"
view=$(grep "STRIPSMITH_E2E view A1" "$LOG" | tail -1 | cut -d' ' -f4-8)
cut_gap 0 2 "A3|A4"
keys ctrl+z
check "after an edit and its undo the same finding is chosen" bash -c "grep 'STRIPSMITH_E2E note focused-finding' '$LOG' | tail -1 | grep -qF -- '$focus'"
check "the view stayed where it was" bash -c "[ \"\$(grep 'STRIPSMITH_E2E view A1' '$LOG' | tail -1 | cut -d' ' -f4-8)\" = '$view' ]"
screenshot parts-finding-chosen
finish
