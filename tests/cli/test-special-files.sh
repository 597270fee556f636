#!/usr/bin/env bash
# netcheck on inputs that are not plain files, on an output that cannot be written, and on names
# holding terminal escape sequences: exit 2 with one clear message, never a hang, never a raw
# escape sequence on the terminal.
set -uo pipefail
bin="${STRIPSMITH_BIN:?STRIPSMITH_BIN not set}"
src="${STRIPSMITH_SOURCE:?STRIPSMITH_SOURCE not set}"
out="${STRIPSMITH_ARTIFACTS:?STRIPSMITH_ARTIFACTS not set}/cli-special-files"
rm -rf "$out"
mkdir -p "$out"
sample="$src/samples/flasher.board.json"
passed=0
failed=0
ok() { echo "PASS $1"; passed=$((passed + 1)); }
bad() { echo "FAIL $1"; failed=$((failed + 1)); }

# expect_refusal NAME FRAGMENT ARGS...: exit 2, FRAGMENT on stderr, nothing on stdout. The
# timeout only turns a hang (the old behaviour on a FIFO) into a failure.
expect_refusal() {
    local name=$1 fragment=$2
    shift 2
    timeout 60 "$bin/netcheck" "$@" >"$out/stdout" 2>"$out/stderr" </dev/null
    local got=$?
    if [ "$got" != 2 ]; then bad "$name: exit $got, expected 2"; return; fi
    if ! grep -qF -- "$fragment" "$out/stderr"; then
        bad "$name: stderr lacks '$fragment': $(cat "$out/stderr")"; return
    fi
    if [ -s "$out/stdout" ]; then bad "$name: something on stdout"; return; fi
    ok "$name"
}

mkfifo "$out/f.board.json"
expect_refusal "a FIFO as the board" "f.board.json: this is not a plain file (a pipe or FIFO)" \
    "$out/f.board.json"
expect_refusal "a FIFO as the circuit" "f.board.json: this is not a plain file (a pipe or FIFO)" \
    --circuit "$out/f.board.json" "$sample"
expect_refusal "a device as the board" "/dev/zero: this is not a plain file (a device)" /dev/zero
expect_refusal "a folder as the board" "this is a folder, not a file" "$out"

# A report that cannot be written is a failure, not an empty success.
for mode in "" "--json" "--nets"; do
    "$bin/netcheck" $mode "$sample" >/dev/full 2>"$out/stderr"
    got=$?
    if [ "$got" = 2 ] && grep -qF "cannot write the report" "$out/stderr"; then
        ok "report to a full disk ($mode): exit 2 with a message"
    else
        bad "report to a full disk ($mode): exit $got, stderr: $(cat "$out/stderr")"
    fi
done

# Net names are free text: an escape sequence in one is shown escaped in the report.
cat >"$out/escape.board.json" <<'BOARD'
{"format": "stripsmith-board", "version": 1, "board": {"rows": 4, "cols": 6},
 "parts": [{"ref": "R1", "kind": "resistor", "value": "1k", "pins": {"1": "A1", "2": "B3"}},
           {"ref": "R2", "kind": "resistor", "value": "1k", "pins": {"1": "A2", "2": "C3"}}],
 "circuit": {"parts": {"R1": {"kind": "resistor", "value": "1k"},
                       "R2": {"kind": "resistor", "value": "1k"}},
             "nets": {"\u001b]0;x\u0007\u001b[2J": ["R1.1"], "B": ["R2.1"]}}}
BOARD
"$bin/netcheck" "$out/escape.board.json" >"$out/stdout" 2>&1
if grep -qF 'error short \x1b]0;x\x07\x1b[2J, B:' "$out/stdout" &&
    ! grep -q $'\x1b' "$out/stdout" && ! grep -q $'\x07' "$out/stdout"; then
    ok "an escape sequence in a net name is printed escaped"
else
    bad "an escape sequence in a net name: $(cat -v "$out/stdout")"
fi
sed 's/"value": "1k", "pins": {"1": "A1"/"value": "1k\\u001b[2J", "pins": {"1": "A1"/' \
    "$out/escape.board.json" >"$out/value.board.json"
expect_refusal "an escape sequence in a value is refused" \
    'parts[0].value: value "1k\u001b[2J" holds a control character (U+001B)' "$out/value.board.json"
if grep -q $'\x1b' "$out/stderr"; then bad "the refusal carries a raw escape"; else ok "the refusal is escaped"; fi

echo "$passed passed, $failed failed"
[ "$failed" = 0 ]
