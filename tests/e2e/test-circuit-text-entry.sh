#!/usr/bin/env bash
# End to end: a maker types a seven-part circuit (battery, pot, two resistors, NPN transistor, LED,
# capacitor) into the Circuit panel's text view on an empty board, applies it and saves, in at
# most 30 actions. The saved file holds the parts and nets typed (written out below by hand from
# the kind table's pin order, docs/editor.md), and netcheck reports the seven parts as missing
# from the board. A typing error is shown by line and column with Apply held back; undo takes the
# whole circuit back in one step.
#
# Counting rule for actions (also in docs/editor.md): each click is one action, each key chord
# (Ctrl+S, Return) is one action, and each typed run of text is one action; here every typed run
# is one line of the circuit, and the Return after it is one more action.
#
# A second run on a board holding one resistor covers the rest of the panel: parts typed without
# nets make the menu bar say so instead of "Check: OK"; the Nets tab adds a net; the Rename and
# Merge buttons fit their cell and window; typing a kind fills in its pins as picking it does.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

board="$WORK/seven.board.json"
python3 - "$STRIPSMITH_SOURCE/samples/demo.board.json" "$board" <<'PY'
import json, sys
data = json.load(open(sys.argv[1]))
for key in ("parts", "cuts", "links", "offboard", "wires"):
    data[key] = []
for key in ("circuit", "expect", "notes"):
    data.pop(key, None)
data["title"] = "Seven parts typed in"
json.dump(data, open(sys.argv[2], "w"), indent=2)
PY

ACTIONS=0
act_click() { ACTIONS=$((ACTIONS + 1)); click_at $(item_xy "$1"); }
act_keys() { ACTIONS=$((ACTIONS + 1)); keys "$1"; }
act_type() { ACTIONS=$((ACTIONS + 1)); type_text "$1"; }
wait_saved() { wait_status_after "$1" "Saved"; }
# text_reads STATE: the text view's last reading is STATE ("ok parts 7 nets 6", "error 8:4 ...").
last_reading_is() { grep "STRIPSMITH_E2E circuit-text " "$LOG" | tail -1 | grep -q -- "circuit-text $1"; }
text_reads() { wait_until last_reading_is "$1"; }

start_editor "$board"

# ---- the seven parts, counted -------------------------------------------------------------------
act_click menu-view
act_click menu-circuit-panel
act_click circuit-text
act_type 'BT1 battery 9V : VCC GND'
act_keys Return
act_type 'VR1 pot 10k : VCC WIPER GND'
act_keys Return
act_type 'R1 resistor 10k : WIPER BASE'
act_keys Return
act_type 'Q1 bjt BC547 : LED_K BASE GND'
act_keys Return
act_type 'R2 resistor 470 : VCC LED_A'
act_keys Return
act_type 'D1 led red : LED_A LED_K'
act_keys Return
act_type 'C1 capacitor 100n : VCC GND'
act_keys Return
check "the text reads as 7 parts and 6 nets while typed" text_reads "ok parts 7 nets 6"
screenshot text-entry-1-typed
before=$(status_count)
act_click circuit-text-apply
check "Apply is one command" wait_status_after "$before" "status Type in the circuit"
before=$(status_count)
act_keys ctrl+s
check "saved" wait_saved "$before"
echo "actions to enter and save the seven-part circuit: $ACTIONS"
check "the seven-part circuit took at most 30 actions ($ACTIONS)" test "$ACTIONS" -le 30
screenshot text-entry-2-applied

# Expected, by hand from the pin orders: battery + -, pot 1 2 3 (2 the wiper), resistor 1 2,
# bjt C B E, led A K, capacitor 1 2.
check "the saved circuit holds the parts and nets typed" python3 - "$board" <<'PY'
import json, sys
circuit = json.load(open(sys.argv[1]))["circuit"]
parts = {ref: (p["kind"], p["value"]) for ref, p in circuit["parts"].items()}
nets = {name: sorted(pins) for name, pins in circuit["nets"].items()}
want_parts = {"BT1": ("battery", "9V"), "VR1": ("pot", "10k"), "R1": ("resistor", "10k"),
              "Q1": ("bjt", "BC547"), "R2": ("resistor", "470"), "D1": ("led", "red"),
              "C1": ("capacitor", "100n")}
want_nets = {"VCC": ["BT1.+", "C1.1", "R2.1", "VR1.1"], "GND": ["BT1.-", "C1.2", "Q1.E", "VR1.3"],
             "WIPER": ["R1.1", "VR1.2"], "BASE": ["Q1.B", "R1.2"], "LED_K": ["D1.K", "Q1.C"],
             "LED_A": ["D1.A", "R2.2"]}
ok = parts == want_parts and nets == want_nets
if not ok:
    print(parts, nets, file=sys.stderr)
sys.exit(0 if ok else 1)
PY
check "netcheck reports the seven typed parts as missing from the board" python3 - "$STRIPSMITH_BIN/netcheck" "$board" <<'PY'
import json, subprocess, sys
run = subprocess.run([sys.argv[1], "--json", sys.argv[2]], capture_output=True, text=True)
report = json.loads(run.stdout)
missing = sorted(e["ref"] for e in report["errors"] if e["type"] == "missing-part")
sys.exit(0 if missing == ["BT1", "C1", "D1", "Q1", "R1", "R2", "VR1"] else 1)
PY

# ---- a mistake, located; the fix; Revert ----------------------------------------------------------
click_at $(item_xy circuit-text)
type_text "Q2 npn BC547 : A B C"
check "an unknown kind is shown at line 8, column 4" text_reads "error 8:4 unknown kind \"npn\" (did you mean bjt?)"
screenshot text-entry-3-error
before=$(status_count)
click_at $(item_xy circuit-text-apply)
wait_frames 3
check "Apply does nothing while the text has errors" test "$(status_count)" -eq "$before"
click_at $(item_xy circuit-text)  # the click on Apply took the keyboard from the text
keys shift+Home
type_text "Q2 bjt BC547 : A B C"
check "the fixed line reads" text_reads "ok parts 8 nets 9"
click_at $(item_xy circuit-text-revert)
check "Revert shows the circuit again" text_reads "ok parts 7 nets 6"

# ---- one undo step ---------------------------------------------------------------------------------
shortcut ctrl+z "Undid: Type in the circuit"
before=$(status_count)
keys ctrl+s
check "saved after undo" wait_saved "$before"
check "after one undo the saved board has no circuit again" python3 -c \
    "import json,sys; sys.exit('circuit' in json.load(open('$board')))"
kill "$EDITOR_PID"
wait "$EDITOR_PID" 2>/dev/null || true

# ---- second run: no nets, add a net, buttons that fit, a typed kind --------------------------------
one="$WORK/one-resistor.board.json"
python3 - "$STRIPSMITH_SOURCE/samples/demo.board.json" "$one" <<'PY'
import json, sys
data = json.load(open(sys.argv[1]))
data["parts"] = [p for p in data["parts"] if p["ref"] == "R1"]
for key in ("cuts", "links", "offboard", "wires"):
    data[key] = []
for key in ("circuit", "expect", "notes"):
    data.pop(key, None)
json.dump(data, open(sys.argv[2], "w"), indent=2)
PY
start_editor "$one"
click_at $(item_xy menu-view)
click_at $(item_xy menu-circuit-panel)
click_at $(item_xy circuit-text)
type_text "R1 resistor 1k"
before=$(status_count)
click_at $(item_xy circuit-text-apply)
check "one part typed, applied" wait_status_after "$before" "status Type in the circuit"
check "parts but no nets: the menu bar says so, not OK" \
    wait_for_log "STRIPSMITH_E2E summary Check: the circuit has no nets yet"
screenshot text-entry-4-no-nets

click_at $(item_xy circuit-tab-nets)
click_at $(item_xy add-net-name)
type_text "IN"
click_at $(item_xy add-net-pins)
type_text "R1.1"
before=$(status_count)
click_at $(item_xy add-net)
check "the Nets tab adds a net" wait_status_after "$before" "status Add net IN"
wait_frames 3
screenshot text-entry-5-nets

# "fit NAME X0 Y0 X1 Y1 in X0 Y0 X1 Y1": the item's rectangle lies inside the area.
fits() {
    grep "STRIPSMITH_E2E fit $1 " "$LOG" | tail -1 |
        awk '{ exit !(NF == 12 && $4 >= $9 && $6 <= $11 && $5 >= $10 && $7 <= $12) }'
}
check "the row's Rename and Merge buttons fit their cell" fits net-row-buttons
check "the Add button fits the window" fits add-net
check "the Rename button fits the window" fits rename-net
check "the Merge button fits the window" fits merge-net

click_at $(item_xy circuit-tab-parts)
click_at $(item_xy add-part-ref)
type_text "Q5"
click_at $(item_xy add-part-kind)
keys ctrl+a
type_text "bjt"
before=$(status_count)
click_at $(item_xy add-part)
check "the part is added" wait_status_after "$before" "status Add Q5 to the circuit"
before=$(status_count)
keys ctrl+s
check "saved" wait_saved "$before"
check "the typed kind gave Q5 the bjt's pins C B E; the net IN holds R1.1" python3 - "$one" <<'PY'
import json, sys
circuit = json.load(open(sys.argv[1]))["circuit"]
ok = circuit["parts"]["Q5"]["pins"] == ["C", "B", "E"] and circuit["nets"] == {"IN": ["R1.1"]}
if not ok:
    print(circuit, file=sys.stderr)
sys.exit(0 if ok else 1)
PY
screenshot text-entry-6-parts
finish
