#!/usr/bin/env bash
# stripsmith --layout: each sample's embedded circuit (written out as a circuit file) and each
# SPICE deck in samples/spice/ is laid out from scratch; each sample board is laid out again
# around its placed parts (place the rest, with every other part removed); every output must
# pass `netcheck` (exit 0, "ok": true, no bare link across a lead or touching another) and keep
# the placed parts where they were. Work is bounded by --iterations, so results do not depend on
# the machine's load. Bad input exits 2; a board too small exits 1. (Python runs twice in all:
# it is slow to start on a busy machine.)
set -uo pipefail
bin="${STRIPSMITH_BIN:?STRIPSMITH_BIN not set}"
src="${STRIPSMITH_SOURCE:?STRIPSMITH_SOURCE not set}"
out="${STRIPSMITH_ARTIFACTS:-/tmp}/cli-layout"
rm -rf "$out" && mkdir -p "$out"
[ -x "$bin/stripsmith" ] || { echo "SKIP: no stripsmith binary (editor not built)"; exit 77; }
passed=0
failed=0
fail() { echo "FAIL $*"; failed=$((failed + 1)); }

samples=("$src"/samples/*.board.json)
[ ${#samples[@]} -ge 3 ] || fail "only ${#samples[@]} samples"
# Inputs: NAME.circuit.json (the embedded circuit) and NAME.placed.board.json (every other part
# of the hand layout kept, no cuts, links or wires).
python3 - "$out" "${samples[@]}" <<'PY'
import json, os, sys
out = sys.argv[1]
for path in sys.argv[2:]:
    name = os.path.basename(path)[:-len(".board.json")]
    board = json.load(open(path))
    json.dump(board["circuit"], open(f"{out}/{name}.circuit.json", "w"), indent=1)
    board["parts"] = board["parts"][::2]
    for key in ("cuts", "links", "wires"):
        board[key] = []
    json.dump(board, open(f"{out}/{name}.placed.board.json", "w"), indent=1)
PY

checked=()
# lays out INPUT into NAME.board.json and checks it with netcheck (the report is read below).
layout_and_check() {
    local name=$1 input=$2; shift 2
    local board="$out/$name.board.json"
    if ! "$bin/stripsmith" --layout "$board" --iterations 150 "$@" "$input" > "$out/$name.txt" 2> "$out/$name.err"; then
        fail "$name: stripsmith --layout failed"; cat "$out/$name.err"; return
    fi
    grep -q '^area [0-9]* holes' "$out/$name.txt" || { fail "$name: no area line"; return; }
    grep -q '^lower bound: ' "$out/$name.txt" || { fail "$name: no lower bound line"; return; }
    if ! "$bin/netcheck" --json "$board" > "$out/$name.check.json" 2>&1; then
        fail "$name: netcheck finds errors"; head -c 2000 "$out/$name.check.json"; return
    fi
    checked+=("$name")
    passed=$((passed + 1))
}

for sample in "${samples[@]}"; do
    name=$(basename "$sample" .board.json)
    layout_and_check "$name-scratch" "$out/$name.circuit.json"
    layout_and_check "$name-rest" "$out/$name.placed.board.json"
done
for deck in "$src"/samples/spice/*.cir; do
    layout_and_check "spice-$(basename "$deck" .cir)" "$deck"
done
# A fixed board large enough keeps its size.
layout_and_check "fixed-board" "$out/astable.circuit.json" --board 40x20
grep -q '"rows": 20' "$out/fixed-board.board.json" || fail "fixed board: size not kept"

# Supply rails: laid out and checked like the rest; the strips' nets are checked below.
layout_and_check "astable-rails" "$out/astable.circuit.json" --rails
python3 - "$out/astable-rails.board.json" <<'PY' || fail "--rails: the battery's wires do not start on the top and bottom strips"
import json, sys
board = json.load(open(sys.argv[1]))
ends = {w["from"]: w["to"] for w in board["wires"]}
last = chr(ord("A") + board["board"]["rows"] - 1)
sys.exit(0 if ends["BT1.+"].startswith("A") and ends["BT1.-"].startswith(last) else 1)
PY

# Every report clean of link contacts; every placed part where it was.
python3 - "$out" "${checked[@]}" <<'PY' || fail "reports or placed parts"
import json, sys
out, names = sys.argv[1], sys.argv[2:]
bad = 0
for name in names:
    report = json.load(open(f"{out}/{name}.check.json"))
    contacts = [f for f in report.get("warnings", [])
                if f.get("type") in ("link-over-lead", "links-touch", "links-unchecked")]
    if not report["ok"] or report.get("errors") or contacts:
        print(f"FAIL {name}: {contacts or report.get('errors')}"); bad += 1
    if name.endswith("-rest"):
        placed = json.load(open(f"{out}/{name[:-5]}.placed.board.json"))["parts"]
        after = {p["ref"]: p for p in json.load(open(f"{out}/{name}.board.json"))["parts"]}
        for part in placed:
            if after.get(part["ref"], {}).get("pins") != part["pins"]:
                print(f"FAIL {name}: {part['ref']} moved"); bad += 1
sys.exit(1 if bad else 0)
PY

# A board too small exits 1 and writes nothing.
"$bin/stripsmith" --layout "$out/small.board.json" --iterations 20 --board 4x2 "$out/astable.circuit.json" > /dev/null 2> "$out/small.err"
[ $? = 1 ] || fail "board too small: exit not 1"
[ -e "$out/small.board.json" ] && fail "board too small: a file was written"
grep -q "no layout" "$out/small.err" || fail "board too small: no message"

# Place the rest with a placed part the circuit does not name: exit 1, the part named.
python3 - "$out/astable.placed.board.json" "$out/stray.board.json" <<'PY'
import json, sys
board = json.load(open(sys.argv[1]))
board["parts"].append({"ref": "R99", "kind": "resistor", "value": "1k", "pins": {"1": "A20", "2": "E20"}})
board["board"]["cols"] = max(board["board"]["cols"], 20)
json.dump(board, open(sys.argv[2], "w"))
PY
"$bin/stripsmith" --layout "$out/stray-out.board.json" --iterations 20 "$out/stray.board.json" > /dev/null 2> "$out/stray.err"
[ $? = 1 ] && grep -q "does not name (R99)" "$out/stray.err" || { fail "stray placed part: not exit 1 naming R99"; cat "$out/stray.err"; }

# Unusable input: exit 2 with the file named.
printf '{"parts": {"R1": {"kind": "resistor"}}, "nets": 7}\n' > "$out/bad.json"
"$bin/stripsmith" --layout "$out/x.board.json" "$out/bad.json" > /dev/null 2> "$out/bad.err"
[ $? = 2 ] && grep -q "bad.json" "$out/bad.err" || { fail "bad circuit: not exit 2 naming the file"; cat "$out/bad.err"; }
"$bin/stripsmith" --layout "$out/x.board.json" --board 10by3 "$out/bad.json" > /dev/null 2>&1
[ $? = 2 ] || fail "bad --board: not exit 2"
"$bin/stripsmith" --layout "$out/x.board.json" "$out/missing.json" > /dev/null 2>&1
[ $? = 2 ] || fail "missing input: not exit 2"

echo "layout: $passed laid out and checked, $failed failed"
[ "$failed" = 0 ]
