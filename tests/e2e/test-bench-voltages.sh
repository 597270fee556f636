#!/usr/bin/env bash
# End to end: View > Bench voltages on the astable sample. The figures arrive from the worker
# thread while the editor keeps drawing frames, and are netcheck --voltages' own; after an edit
# (a cut between two holes at the far end of strip F) they are worked out again for the new revision.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

board="$WORK/astable.board.json"
cp "$STRIPSMITH_SOURCE/samples/astable.board.json" "$board"
"$STRIPSMITH_BIN/netcheck" --voltages --nominal-only --json "$board" >"$WORK/expected.json"
expected=$(python3 - "$WORK/expected.json" <<'PY'
import json, sys
for net in json.load(open(sys.argv[1]))["nets"]:
    if net["net"] in ("VCC", "L1"):
        print(net["net"], "%.2f V" % net["nominal"], "at", net["probe"])
PY
)

start_editor "$board"
click_at $(item_xy menu-view)
click_at $(item_xy menu-bench-voltages)
while read -r line; do
    check "the overlay shows $line" eventually grep -q "STRIPSMITH_E2E note bench-voltages revision [0-9]* .*$line" "$LOG"
done <<<"$expected"
screenshot bench-voltages

# The status line under the mouse: the hole, its net and what a meter should read there, as
# netcheck --voltages --json gives them for this board (nominal, then the tolerance range).
"$STRIPSMITH_BIN/netcheck" --voltages --json "$board" >"$WORK/ranges.json"
read -r probe row col status_line < <(python3 - "$WORK/ranges.json" <<'PY'
import json, sys
def volts(v):  # netcheck's own rounding: three places under 1 V, else two
    return ("%.3f V" if abs(v) < 1 else "%.2f V") % v
net = [n for n in json.load(open(sys.argv[1]))["nets"] if n["net"] == "L1"][0]
probe = net["probe"]
letters = probe.rstrip("0123456789")
row = 0
for ch in letters:
    row = row * 26 + ord(ch) - ord("A") + 1
print(probe, row - 1, int(probe[len(letters):]) - 1,
      "%s  net L1  meter: %s (%s to %s)" % (probe, volts(net["nominal"]), volts(net["min"]), volts(net["max"])))
PY
)
move_to $(hole_xy "$row" "$col")
check "the status line over $probe reads \"$status_line\"" wait_for_log "STRIPSMITH_E2E pointer-line $status_line\$"
screenshot bench-voltages-status
first=$(grep -c "STRIPSMITH_E2E note bench-voltages revision" "$LOG")
revision=$(frame_field revision)
keys x
click_at $(gap_xy 5 12)
check "the cut is a new revision" eventually bash -c "[ \$(grep 'STRIPSMITH_E2E frame' '$LOG' | tail -1 | awk '{print \$5}') -gt $revision ]"
check "the figures are worked out again after the edit" \
    eventually bash -c "[ \$(grep -c 'STRIPSMITH_E2E note bench-voltages revision' '$LOG') -gt $first ]"
check "the editor kept drawing frames" wait_frames 3
finish
