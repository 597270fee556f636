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
for board in "${samples[@]}"; do
    base=$(basename "$board" .board.json)
    # The sample's own expect key says whether it should match (exit 0) or not (exit 1).
    want=$(python3 -c 'import json,sys; print(json.load(open(sys.argv[1]))["expect"]["exit"])' "$board")
    (cd "$src/samples" && "$bin/netcheck" "$base.board.json") > "$out/$base.txt" 2>&1
    check "$base.txt" "$want" $? "$out/$base.txt"
    (cd "$src/samples" && "$bin/netcheck" --json "$base.board.json") > "$out/$base.json" 2>&1
    check "$base.json" "$want" $? "$out/$base.json"
    python3 -c 'import json,sys; d=json.load(open(sys.argv[1])); assert d["ok"] == (sys.argv[2] == "0")' \
        "$out/$base.json" "$want" || { echo "FAIL $base.json: ok flag"; failed=$((failed + 1)); }
done
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
