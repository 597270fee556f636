#!/usr/bin/env bash
# netcheck --voltages and --jfet-bias: golden reports (text and JSON) for sample boards and a
# SPICE deck, exit 0 when computed, exit 2 with a clear message for unusable input.
# Re-collect the golden files deliberately with:  STRIPSMITH_RECOLLECT=1 bash tests/cli/test-voltages.sh
set -uo pipefail
bin="${STRIPSMITH_BIN:?STRIPSMITH_BIN not set}"
src="${STRIPSMITH_SOURCE:?STRIPSMITH_SOURCE not set}"
out="${STRIPSMITH_ARTIFACTS:-/tmp}/cli-voltages"
golden="$src/tests/cli/golden-voltages"
mkdir -p "$out" "$golden"
passed=0
failed=0

golden() {  # name, command...: exit 0 and output equal to the golden file
    local name=$1; shift
    "$@" > "$out/$name" 2> "$out/$name.stderr"
    local got=$?
    if [ "$got" != 0 ]; then
        echo "FAIL $name: exit $got"; cat "$out/$name.stderr"; failed=$((failed + 1)); return
    fi
    if [ "${STRIPSMITH_RECOLLECT:-}" = 1 ]; then
        cp "$out/$name" "$golden/$name"; echo "collected $name"; passed=$((passed + 1)); return
    fi
    if diff -u "$golden/$name" "$out/$name"; then passed=$((passed + 1)); else
        echo "FAIL $name differs from the golden file"; failed=$((failed + 1)); fi
}

expect2() {  # name, fragment, command...: exit 2, the fragment on stderr, nothing on stdout
    local name=$1 fragment=$2; shift 2
    "$@" > "$out/stdout" 2> "$out/stderr"
    local got=$?
    if [ "$got" != 2 ]; then echo "FAIL $name: exit $got, expected 2"; failed=$((failed + 1)); return; fi
    if ! grep -qF -- "$fragment" "$out/stderr"; then
        echo "FAIL $name: stderr lacks '$fragment':"; cat "$out/stderr"; failed=$((failed + 1)); return
    fi
    if [ -s "$out/stdout" ]; then echo "FAIL $name: output on stdout"; failed=$((failed + 1)); return; fi
    passed=$((passed + 1))
}

cd "$src/samples" || exit 1
golden astable.txt "$bin/netcheck" --voltages astable.board.json
golden astable.json "$bin/netcheck" --voltages --json astable.board.json
golden flasher.json "$bin/netcheck" --voltages --json flasher.board.json
golden headphone-amp.txt "$bin/netcheck" --voltages --supply 9V headphone-amp.board.json
golden headphone-amp-spice.txt "$bin/netcheck" --voltages --supply 12 --nominal-only \
    --circuit spice/headphone-amp.cir headphone-amp.board.json
# Boylestad and Nashelsky, Example 7.2 (figures from memory): IDSS 8 mA, VP -6 V, RD 3.3k,
# VDD 20 V. A target of 11.461 V gives back the example's RS = 1k (worked in unit-jfet-bias.cpp).
golden jfet-bias.txt "$bin/netcheck" --jfet-bias --supply 20 --rd 3k3 --target 11.461 --idss 8m --vp -6
golden jfet-measured.json "$bin/netcheck" --jfet-bias --json --supply 20 --rd 3k3 --target 10 \
    --measured 1k:11.46 --measured 2k2:14.5

# The JSON has a figure for every known net, none for the others, and the cautions.
if python3 - "$out/flasher.json" <<'PY'
import json, sys
report = json.load(open(sys.argv[1]))
nets = {n["net"]: n for n in report["nets"]}
assert nets["VCC"]["state"] == "known" and abs(nets["VCC"]["nominal"] - 9) < 1e-9
assert nets["OUT"]["state"] == "unknown" and nets["OUT"]["nominal"] is None
assert all(n["min"] <= n["nominal"] <= n["max"] for n in nets.values() if n["state"] == "known")
assert any("extra-low-voltage" in c for c in report["cautions"])
PY
then passed=$((passed + 1)); else echo "FAIL flasher.json contents"; failed=$((failed + 1)); fi

expect2 "no supply voltage" "J3 (dc-jack" "$bin/netcheck" --voltages headphone-amp.board.json
expect2 "missing board" "missing.board.json" "$bin/netcheck" --voltages missing.board.json
expect2 "no board" "no board file given" "$bin/netcheck" --voltages
expect2 "unknown option" "unknown option --frob" "$bin/netcheck" --voltages --frob astable.board.json
expect2 "bad supply" "--supply takes a number" "$bin/netcheck" --voltages --supply lots astable.board.json
printf '{"parts": {"R1": {"kind": "resistor", "value": "1k"}, "BT1": {"kind": "battery", "value": "9V", "pins": ["+", "-"]}}, "nets": {"A": ["BT1.+", "R1.1"]}}' \
    > "$out/no-ground.circuit.json"
expect2 "no ground" "no ground" "$bin/netcheck" --voltages --circuit "$out/no-ground.circuit.json" astable.board.json
expect2 "jfet: unreachable target" "IDSS" "$bin/netcheck" --jfet-bias --supply 20 --rd 1k --target 10 --idss 8m --vp -6
expect2 "jfet: missing stage" "needs --supply" "$bin/netcheck" --jfet-bias --idss 8m --vp -6
expect2 "jfet: one reading" "two --measured" "$bin/netcheck" --jfet-bias --supply 20 --rd 3k3 --target 10 --measured 1k:11
expect2 "jfet: readings off the law" "do not fit" "$bin/netcheck" --jfet-bias --supply 20 --rd 3k3 --target 10 --measured 1k:14.5 --measured 2k2:11.46

echo "$passed passed, $failed failed"
[ "$failed" = 0 ]
