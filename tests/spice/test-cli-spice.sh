#!/usr/bin/env bash
# `netcheck --circuit DECK BOARD` must give exactly the report and exit status of the board's
# embedded circuit, for every sample board and each of its faulty copies; a malformed deck must
# exit 2 naming file and line.
set -uo pipefail
bin="${STRIPSMITH_BIN:?STRIPSMITH_BIN not set}"
src="${STRIPSMITH_SOURCE:?STRIPSMITH_SOURCE not set}"
out="${STRIPSMITH_ARTIFACTS:-${TMPDIR:-/tmp}}/spice-cli"
mkdir -p "$out"
passed=0
failed=0
fail() { echo "FAIL $*"; failed=$((failed + 1)); }

compared=0
for deck in "$src"/samples/spice/*.cir; do
    name=$(basename "$deck" .cir)
    for board in "$src/samples/$name.board.json" "$src/samples/$name"-*.board.json; do
        [ -f "$board" ] || continue
        compared=$((compared + 1))
        "$bin/netcheck" "$board" > "$out/embedded.txt" 2>&1
        embedded=$?
        "$bin/netcheck" --circuit "$deck" "$board" > "$out/deck.txt" 2>&1
        fromDeck=$?
        if [ "$embedded" != "$fromDeck" ]; then
            fail "$(basename "$board"): exit $fromDeck with the deck, $embedded with the embedded circuit"
        elif ! diff -u "$out/embedded.txt" "$out/deck.txt"; then
            fail "$(basename "$board"): the deck's report differs from the embedded circuit's"
        else
            passed=$((passed + 1))
        fi
    done
done
[ "$compared" -ge 6 ] || fail "only $compared sample boards compared (samples missing?)"

expect() {  # name, expected exit, fragment, command...
    local name=$1 status=$2 fragment=$3; shift 3
    "$@" > "$out/stdout" 2> "$out/stderr"
    local got=$?
    if [ "$got" != "$status" ]; then fail "$name: exit $got, expected $status"; cat "$out/stdout" "$out/stderr"; return; fi
    if ! grep -qF -- "$fragment" "$out/stdout" "$out/stderr"; then
        fail "$name: output lacks '$fragment'"; cat "$out/stdout" "$out/stderr"; return
    fi
    passed=$((passed + 1))
}

samples="$src/samples"
expect "flasher, correct board" 0 "0 errors" \
    "$bin/netcheck" --circuit "$samples/spice/flasher.cir" "$samples/flasher.board.json"
expect "flasher, forgotten cut under the 555" 1 "error short DIS, THR" \
    "$bin/netcheck" --circuit "$samples/spice/flasher.cir" "$samples/flasher-missing-cut.board.json"
expect "astable, forgotten link" 1 "error open BASE1" \
    "$bin/netcheck" --circuit "$samples/spice/astable.cir" "$samples/astable-forgotten-link.board.json"
expect "headphone amp, correct board" 0 "0 errors" \
    "$bin/netcheck" --circuit "$samples/spice/headphone-amp.cir" "$samples/headphone-amp.board.json"

# A deck whose resistor value is wrong: the checker reports a value mismatch for that part.
sed 's/^R2 DIS THR 47k$/R2 DIS THR 4.7k/' "$samples/spice/flasher.cir" > "$out/flasher-wrong-r2.cir"
expect "deck with another R2 value" 1 "R2" \
    "$bin/netcheck" --circuit "$out/flasher-wrong-r2.cir" "$samples/flasher.board.json"
grep -qF "value-mismatch R2" "$out/stdout" || fail "no value-mismatch finding for R2"

# Malformed decks: exit 2, file and line named, nothing on stdout.
printf 'bad deck\nR1 a b 1k\nR2 a\n.end\n' > "$out/too-few.cir"
expect "too few nodes" 2 "too-few.cir:3: element R2 has too few fields" \
    "$bin/netcheck" --circuit "$out/too-few.cir" "$samples/flasher.board.json"
[ -s "$out/stdout" ] && fail "too few nodes: partial report on stdout"
printf 'bad deck\nX1 a b amp\n.subckt amp p q\nR1 p q 1k\n' > "$out/open-subckt.cir"
expect "unterminated .subckt" 2 "open-subckt.cir:3: .subckt amp has no .ends" \
    "$bin/netcheck" --circuit "$out/open-subckt.cir" "$samples/flasher.board.json"

# Notes reach the maker: 4K7 is 4000 in SPICE.
sed 's/^R2 DIS THR 47k$/R2 DIS THR 4K7/' "$samples/spice/flasher.cir" > "$out/flasher-iec.cir"
expect "IEC-style value warned" 1 'value "4K7" reads as 4000 under SPICE rules' \
    "$bin/netcheck" --circuit "$out/flasher-iec.cir" "$samples/flasher.board.json"

# Command-line options reach the importer: node 0 takes the given name; V sources become an
# off-board battery (which this board does not have, so the checker says it is missing).
expect "--ground names node 0" 1 "carries net ZERO" \
    "$bin/netcheck" --ground ZERO --circuit "$samples/spice/flasher.cir" \
    "$samples/flasher-reversed-electrolytic.board.json"
printf 'supply\nV9 VCC 0 DC 9\nR1 VCC DIS 1k\n.end\n' > "$out/supply.cir"
expect "--spice-sources offboard" 1 "missing-part V9" \
    "$bin/netcheck" --spice-sources offboard --circuit "$out/supply.cir" "$samples/flasher.board.json"
expect "sources ignored by default" 1 "extra-part" \
    "$bin/netcheck" --circuit "$out/supply.cir" "$samples/flasher.board.json"
grep -qF "V9" "$out/stdout" && fail "sources ignored by default: V9 still in the report"
expect "--spice-sources takes a mode" 2 "--spice-sources takes ignore or offboard" \
    "$bin/netcheck" --spice-sources maybe --circuit "$out/supply.cir" "$samples/flasher.board.json"

echo "spice cli: $passed passed, $failed failed"
[ "$failed" = 0 ]
