#!/usr/bin/env bash
# End to end: View > JFET bias helper on a self-biased JFET stage. With the panel's figures
# (9 V, RD 4k7, target 4.5 V, IDSS 3 mA, VP -2 V) the exact source resistor is 909 ohm:
# ID = 4.5 / 4.7k = 0.957 mA, VGS = -2 (1 - sqrt(0.957 / 3)) = -0.870 V, RS = 0.870 / 0.957 mA.
# The E12 value below it is 820R. Apply sets it on the stage's source resistor RS in one
# command; Ctrl+Z takes it back. Each state is saved and read back from the file.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

board="$WORK/jfet.board.json"
cat >"$board" <<'JSON'
{
  "format": "stripsmith-board", "version": 1, "title": "JFET stage",
  "board": {"rows": 6, "cols": 12, "pitch_mm": 2.54, "copper": "strips"},
  "cuts": [],
  "parts": [
    {"ref": "J1", "kind": "jfet", "value": "2N5457", "pins": {"D": "B6", "G": "C6", "S": "D6"}},
    {"ref": "RD", "kind": "resistor", "value": "4k7", "pins": {"1": "A3", "2": "B3"}},
    {"ref": "RS", "kind": "resistor", "value": "1k", "pins": {"1": "D9", "2": "E9"}},
    {"ref": "RG", "kind": "resistor", "value": "1M", "pins": {"1": "C11", "2": "E11"}}
  ],
  "links": [],
  "offboard": [{"ref": "BT1", "kind": "battery", "value": "9V", "pins": ["+", "-"]}],
  "wires": [{"from": "BT1.+", "to": "A1", "color": "red"},
            {"from": "BT1.-", "to": "E1", "color": "black"}]
}
JSON
value_of_rs() {  # value_of_rs WANT: the saved board's RS has the value WANT
    python3 -c 'import json,sys; sys.exit([p["value"] for p in json.load(open(sys.argv[1]))["parts"] if p["ref"] == "RS"] != [sys.argv[2]])' "$board" "$1"
}

start_editor "$board"
click_at $(item_xy menu-view)
click_at $(item_xy menu-jfet-bias)
click_at $(item_xy jfet-apply-0)
check "Apply sets RS to the E12 value below, as one command" \
    eventually grep -q "STRIPSMITH_E2E status Set RS to 820R (JFET bias)" "$LOG"
screenshot jfet-bias
keys ctrl+s
check "the saved board has RS 820R" eventually value_of_rs 820R
keys ctrl+z
keys ctrl+s
check "undone and saved, RS is 1k again" eventually value_of_rs 1k
finish
