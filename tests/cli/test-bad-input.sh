#!/usr/bin/env bash
# Every malformed file in tests/bad-input/expected.tsv must make netcheck exit 2 with the expected
# message fragment and the line number on stderr, and print nothing on stdout; bad arguments and a
# missing file must exit 2 too.
set -uo pipefail
bin="${STRIPSMITH_BIN:?STRIPSMITH_BIN not set}"
src="${STRIPSMITH_SOURCE:?STRIPSMITH_SOURCE not set}"
out="${STRIPSMITH_ARTIFACTS:-/tmp}/cli-bad-input"
mkdir -p "$out"
passed=0
failed=0

expect2() {  # name, fragment, command...
    local name=$1 fragment=$2; shift 2
    "$@" > "$out/stdout" 2> "$out/stderr"
    local got=$?
    if [ "$got" != 2 ]; then echo "FAIL $name: exit $got, expected 2"; failed=$((failed + 1)); return; fi
    if ! grep -qF -- "$fragment" "$out/stderr"; then
        echo "FAIL $name: stderr lacks '$fragment':"; cat "$out/stderr"; failed=$((failed + 1)); return
    fi
    if [ -s "$out/stdout" ]; then echo "FAIL $name: partial report on stdout"; failed=$((failed + 1)); return; fi
    passed=$((passed + 1))
}

rows=0
while IFS=$'\t' read -r file line fragment; do
    case "$file" in ''|'#'*) continue ;; esac
    rows=$((rows + 1))
    expect2 "$file" "$fragment" "$bin/netcheck" "$src/tests/bad-input/$file"
    if [ "$line" != 0 ] && ! grep -qF -- "$file:$line:" "$out/stderr" && ! grep -qF -- "$file:$line" "$out/stderr"; then
        echo "FAIL $file: stderr does not name line $line:"; cat "$out/stderr"; failed=$((failed + 1))
    fi
done < "$src/tests/bad-input/expected.tsv"
[ "$rows" -ge 25 ] || { echo "FAIL: only $rows bad-input rows"; failed=$((failed + 1)); }

sample="$src/samples/flasher.board.json"
expect2 "no arguments" "no board file given" "$bin/netcheck"
expect2 "unknown option" "unknown option --frobnicate" "$bin/netcheck" --frobnicate "$sample"
expect2 "two boards" "only one board file" "$bin/netcheck" "$sample" "$sample"
expect2 "--circuit without a file" "--circuit needs a file name" "$bin/netcheck" "$sample" --circuit
expect2 "--nets with --circuit" "takes no --circuit" "$bin/netcheck" --nets --circuit "$sample" "$sample"
expect2 "missing board file" "no-such.board.json: no such file" "$bin/netcheck" "$out/no-such.board.json"
expect2 "missing circuit file" "no-such.circuit.json: no such file" \
    "$bin/netcheck" --circuit "$out/no-such.circuit.json" "$sample"
printf '{"parts": {}, "nets": {"A": ["R1"]}}\n' > "$out/bad.circuit.json"
expect2 "bad circuit file" "bad.circuit.json:1" "$bin/netcheck" --circuit "$out/bad.circuit.json" "$sample"

echo "$passed passed, $failed failed"
[ "$failed" = 0 ]
