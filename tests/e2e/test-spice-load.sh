#!/usr/bin/env bash
# End to end: open a board with a forgotten track cut but no intended circuit, load the circuit
# from a SPICE deck through the Circuit panel (menu, button and file chooser, all by real clicks
# and keys), and check that the editor then reports the short the sample itself declares (its
# "expect" block: DIS and THR joined). Save, and netcheck finds the same short in the saved file,
# which now carries the loaded circuit. A malformed deck is refused and leaves the board alone.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

sample="$STRIPSMITH_SOURCE/samples/flasher-missing-cut.board.json"
deck="$WORK/flasher.cir"  # beside the board: the chooser starts in the board's folder
cp "$STRIPSMITH_SOURCE/samples/spice/flasher.cir" "$deck"
board="$WORK/flasher.board.json"
python3 - "$sample" "$board" <<'PY'
import json, sys
data = json.load(open(sys.argv[1]))
del data["circuit"]
json.dump(data, open(sys.argv[2], "w"), indent=2)
PY
printf 'broken deck\nR1 only_one_node\n.end\n' >"$WORK/broken.cir"

# The shorts netcheck reports for a board, as JSON lists of net names; exits 2 on unusable output.
cat >"$WORK/shorts.py" <<'PY'
import json, subprocess, sys
run = subprocess.run([sys.argv[1], "--json", sys.argv[2]], capture_output=True, text=True)
report = json.loads(run.stdout)
shorts = sorted(sorted(e["nets"]) for e in report["errors"] if e["type"] == "short")
expected = json.loads(sys.argv[3])
sys.exit(0 if shorts == expected else 1)
PY

check "without a circuit netcheck reports no short" \
    python3 "$WORK/shorts.py" "$STRIPSMITH_BIN/netcheck" "$board" '[]'

start_editor "$board"
screenshot spice-0-opened

# View > Circuit panel.
click_at $(item_xy menu-view)
click_at $(item_xy menu-circuit-panel)
screenshot spice-1-panel

# A malformed deck first: refused with its line, nothing loaded.
click_at $(item_xy load-circuit)
type_text broken.cir
keys Return
check "the malformed deck is refused, naming file and line" \
    eventually grep -q "STRIPSMITH_E2E status Cannot load the circuit: .*broken.cir:2" "$LOG"
screenshot spice-2-refused
check "Enter closes the error message" press_until Return dialogs_match "^-$"
check "the refused deck left the board without a circuit" bash -c "! grep -q 'STRIPSMITH_E2E status Load circuit' '$LOG'"

# Now the real deck.
click_at $(item_xy load-circuit)
type_text "$(basename "$deck")"
keys Return
check "the deck was loaded as one command" eventually grep -q "STRIPSMITH_E2E status Load circuit flasher.cir" "$LOG"
check "the editor's check finds the short between DIS and THR" \
    eventually grep -q "STRIPSMITH_E2E finding short DIS, THR" "$LOG"
screenshot spice-3-loaded

# The side-by-side comparison tab.
click_at $(item_xy circuit-tab-difference)
screenshot spice-4-difference

shortcut ctrl+s Saved
# Reference: the sample's own "expect" block (one short, DIS with THR).
check "netcheck on the saved board finds the same short" eventually \
    python3 "$WORK/shorts.py" "$STRIPSMITH_BIN/netcheck" "$board" '[["DIS", "THR"]]'
check "the saved circuit has the nets the sample's own circuit states" python3 - "$sample" "$board" <<'PY'
import json, sys
def shapes(path):
    return sorted(sorted(pins) for pins in json.load(open(path))["circuit"]["nets"].values())
sys.exit(0 if shapes(sys.argv[1]) == shapes(sys.argv[2]) else 1)
PY

# Undo takes the circuit away again (one step).
shortcut ctrl+z Undid
shortcut ctrl+s Saved
check "after undo the saved board has no circuit again" eventually python3 -c \
    "import json,sys; sys.exit('circuit' in json.load(open('$board')))"
screenshot spice-5-undone
finish
