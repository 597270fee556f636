#!/usr/bin/env bash
# The build sheet's "What the meter should read" table: after the wiring list, with the cautions,
# one row per net with its probe hole, and the same figures netcheck --voltages prints.
source "$(dirname "$0")/lib.sh"

work=$STRIPSMITH_ARTIFACTS/sheet/meter
mkdir -p "$work"
board=$STRIPSMITH_SOURCE/samples/astable.board.json
sheet "$work/astable.pdf" "$board" || fail "the sheet was not written"
text=$(pdftotext -layout "$work/astable.pdf" -)

for words in "What the meter should read" "black lead" "extra-low-voltage" \
             "bridging two strips" "estimates" "Ranges: Monte Carlo"; do
  expect "has \"$words\"" grep -q "$words" <<<"$text"
done
wiring=$(grep -n "Off-board wiring" <<<"$text" | head -1 | cut -d: -f1)
meter=$(grep -n "What the meter should read" <<<"$text" | head -1 | cut -d: -f1)
expect "the table comes after the wiring list" test "${meter:-0}" -gt "${wiring:-0}"

# Every known net's row on the sheet carries netcheck's probe hole and nominal figure.
"$STRIPSMITH_BIN/netcheck" --voltages --json "$board" >"$work/astable.json" ||
  fail "netcheck --voltages failed"
rows=$(python3 - "$work/astable.json" <<'PY'
import json, sys
for net in json.load(open(sys.argv[1]))["nets"]:
    if net["state"] == "known":
        v = net["nominal"]
        print(net["net"], net["probe"], ("%.3f V" if abs(v) < 1 else "%.2f V") % v)
PY
)
[ -n "$rows" ] || fail "no known nets from netcheck"
while read -r name probe volts unit; do
  expect "row $name $probe $volts $unit" grep -Eq "$name( \(black lead\))? +$probe +$volts $unit" <<<"$text"
done <<<"$rows"

finish
