#!/usr/bin/env bash
# Runs netcheck (text and --json, and --nets) on every sample and compares with the golden files in
# tests/cli/golden/. Exit status must be 0 for boards that match and 1 for planted faults.
# Re-collect the golden files deliberately with:  STRIPSMITH_RECOLLECT=1 bash tests/cli/test-golden.sh
set -uo pipefail
bin="${STRIPSMITH_BIN:?STRIPSMITH_BIN not set}"
src="${STRIPSMITH_SOURCE:?STRIPSMITH_SOURCE not set}"
out="${STRIPSMITH_ARTIFACTS:-/tmp}/cli-golden"
golden="$src/tests/cli/golden"
mkdir -p "$out" "$golden"
passed=0
failed=0

check() {  # name, expected exit, actual exit, output file
    local name=$1 want=$2 got=$3 file=$4
    if [ "$got" != "$want" ]; then
        echo "FAIL $name: exit $got, expected $want"; failed=$((failed + 1)); return
    fi
    if [ "${STRIPSMITH_RECOLLECT:-}" = 1 ]; then
        cp "$file" "$golden/$name"; echo "collected $name"; passed=$((passed + 1)); return
    fi
    if diff -u "$golden/$name" "$file"; then passed=$((passed + 1)); else
        echo "FAIL $name differs from the golden file"; failed=$((failed + 1)); fi
}

shopt -s nullglob
samples=("$src"/samples/*.board.json)
[ ${#samples[@]} -ge 8 ] || { echo "FAIL: expected at least 8 samples, found ${#samples[@]}"; exit 1; }
# The sample's own expect key says whether it should match (exit 0) or not (exit 1); read for all
# samples in one go, as "BASE EXIT" lines.
wants=$(python3 - "${samples[@]}" <<'PY'
import json, os, sys
for path in sys.argv[1:]:
    print(os.path.basename(path)[:-len(".board.json")], json.load(open(path))["expect"]["exit"])
PY
)
[ "$(wc -l <<<"$wants")" -eq ${#samples[@]} ] || { echo "FAIL: expect keys unreadable"; exit 1; }
while read -r base want; do
    (cd "$src/samples" && "$bin/netcheck" "$base.board.json") > "$out/$base.txt" 2>&1
    check "$base.txt" "$want" $? "$out/$base.txt"
    (cd "$src/samples" && "$bin/netcheck" --json "$base.board.json") > "$out/$base.json" 2>&1
    check "$base.json" "$want" $? "$out/$base.json"
done <<<"$wants"
# The JSON report's ok flag agrees with the exit status, for every sample (one Python start).
flags=$(python3 - "$out" "$wants" <<'PY'
import json, sys
for line in sys.argv[2].splitlines():
    base, want = line.split()
    report = json.load(open("%s/%s.json" % (sys.argv[1], base)))
    print("ok" if report["ok"] == (want == "0") else "FAIL %s.json: ok flag" % base)
    # Each faulty sample holds one mistake: its repair plan is one step that clears every error.
    if want == "1":
        plan = report.get("repair", {})
        one = len(plan.get("steps", [])) == 1 and plan.get("errors_after") == 0
        print("ok" if one else "FAIL %s.json: not one root cause that clears all" % base)
PY
)
while read -r flag; do
    if [ "$flag" = ok ]; then passed=$((passed + 1)); else echo "$flag"; failed=$((failed + 1)); fi
done <<<"$flags"
[ "$(grep -c . <<<"$flags")" -eq $(( ${#samples[@]} + $(grep -c ' 1$' <<<"$wants") )) ] || { echo "FAIL: ok flags unreadable"; failed=$((failed + 1)); }
(cd "$src/samples" && "$bin/netcheck" --nets --json flasher.board.json) > "$out/flasher-nets.json" 2>&1
check "flasher-nets.json" 0 $? "$out/flasher-nets.json"
(cd "$src/samples" && "$bin/netcheck" --nets headphone-amp.board.json) > "$out/headphone-amp-nets.txt" 2>&1
check "headphone-amp-nets.txt" 0 $? "$out/headphone-amp-nets.txt"
# A separate circuit file overrides the embedded one: the flasher's own circuit, written alone.
python3 -c 'import json,sys; print(json.dumps(json.load(open(sys.argv[1]))["circuit"]))' \
    "$src/samples/flasher.board.json" > "$out/flasher.circuit.json"
"$bin/netcheck" --circuit "$out/flasher.circuit.json" "$src/samples/flasher-missing-cut.board.json" \
    > /dev/null 2>&1
got=$?
if [ "$got" = 1 ]; then passed=$((passed + 1)); else echo "FAIL --circuit: exit $got"; failed=$((failed + 1)); fi

echo "$passed passed, $failed failed"
[ "$failed" = 0 ]
