#!/usr/bin/env bash
# netcheck --repair OUT: the board with the whole repair plan done is written (everything else in
# the file kept, unknown keys too), and checked again here by a separate netcheck run; the exit
# status says whether errors remain; unusable input writes nothing.
set -uo pipefail
bin="${STRIPSMITH_BIN:?STRIPSMITH_BIN not set}"
src="${STRIPSMITH_SOURCE:?STRIPSMITH_SOURCE not set}"
out="${STRIPSMITH_ARTIFACTS:?STRIPSMITH_ARTIFACTS not set}/cli-repair"
rm -rf "$out"
mkdir -p "$out"
passed=0
failed=0
ok() { echo "PASS $1"; passed=$((passed + 1)); }
bad() { echo "FAIL $1"; failed=$((failed + 1)); }

# A faulty sample with an unknown key of our own added at the top and in a part.
python3 - "$src/samples/astable-reversed-electrolytic.board.json" "$out/faulty.board.json" <<'PY'
import json, sys
board = json.load(open(sys.argv[1]))
board["workshop_note"] = {"drawer": 7, "exact": 123456789012345678901234567890}
board["parts"][0]["bin_label"] = "Q-tray"
open(sys.argv[2], "w").write(json.dumps(board, indent=1))
PY

"$bin/netcheck" --repair "$out/fixed.board.json" "$out/faulty.board.json" >"$out/report.txt" 2>&1
got=$?
[ "$got" = 0 ] && ok "a one-mistake board is repaired (exit 0)" || bad "repair exit $got, expected 0"
grep -q "^step 1: turn C2 round" "$out/report.txt" && ok "the plan is printed" ||
    bad "no plan in: $(cat "$out/report.txt")"
"$bin/netcheck" "$out/fixed.board.json" >"$out/recheck.txt" 2>&1
got=$?
[ "$got" = 0 ] && ok "an independent check of the repaired board passes" ||
    bad "recheck exit $got: $(cat "$out/recheck.txt")"
grep -q '"exact": 123456789012345678901234567890' "$out/fixed.board.json" &&
    grep -q '"bin_label": "Q-tray"' "$out/fixed.board.json" && ok "unknown keys are kept" ||
    bad "unknown keys lost"
python3 - "$out/faulty.board.json" "$out/fixed.board.json" <<'PY' && ok "only C2 changed" || bad "more than C2 changed"
import json, sys
a, b = (json.load(open(p)) for p in sys.argv[1:])
changed = [p["ref"] for p, q in zip(a["parts"], b["parts"]) if p != q]
same = all(a[k] == b[k] for k in a if k != "parts")
sys.exit(0 if changed == ["C2"] and same else 1)
PY

# A part the circuit needs is missing: the plan cannot mend it, the file is still written.
python3 - "$src/samples/astable.board.json" "$out/missing.board.json" <<'PY'
import json, sys
board = json.load(open(sys.argv[1]))
board["parts"] = [p for p in board["parts"] if p["ref"] != "R1"]
open(sys.argv[2], "w").write(json.dumps(board))
PY
"$bin/netcheck" --repair "$out/missing-fixed.board.json" "$out/missing.board.json" >/dev/null 2>&1
got=$?
[ "$got" = 1 ] && [ -f "$out/missing-fixed.board.json" ] && ok "errors that remain give exit 1" ||
    bad "missing part: exit $got"

# Unusable input: exit 2, one located message, nothing written.
printf '{"board": {"rows": 3,}' >"$out/broken.board.json"
"$bin/netcheck" --repair "$out/never.board.json" "$out/broken.board.json" >/dev/null 2>"$out/stderr"
got=$?
if [ "$got" = 2 ] && [ ! -e "$out/never.board.json" ] && grep -q "broken.board.json:1:" "$out/stderr"; then
    ok "bad input: exit 2, located message, nothing written"
else
    bad "bad input: exit $got, $(cat "$out/stderr")"
fi
"$bin/netcheck" --repair >/dev/null 2>&1
[ $? = 2 ] && ok "--repair without a file name is a usage error" || bad "--repair alone"

echo "$passed passed, $failed failed"
[ "$failed" = 0 ]
