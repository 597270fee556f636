#!/usr/bin/env bash
# `stripsmith --sheet` reads the board through the same size-limited reader as netcheck: a FIFO,
# a device or a folder is refused at once with status 2, a board with an absurd hole pitch is
# refused with its line, and no output file is left behind by any refusal.
source "$(dirname "$0")/lib.sh"

work=$STRIPSMITH_ARTIFACTS/sheet/input
rm -rf "$work"
mkdir -p "$work"
good=$STRIPSMITH_SOURCE/tests/sheet/boards/booster.board.json

# refused NAME PATTERN BOARD: status 2 within the timeout (a hang is a failure), PATTERN on
# stderr, and no sheet written.
refused() {
  local name=$1 pattern=$2 board=$3
  local err status
  err=$(timeout 60 "$STRIPSMITH_BIN/stripsmith" --sheet "$work/out.pdf" "$board" 2>&1 >/dev/null </dev/null)
  status=$?
  if [ "$status" -eq 2 ] && grep -qF -- "$pattern" <<<"$err" && [ ! -e "$work/out.pdf" ]; then
    pass "$name"
  else
    fail "$name (status $status, stderr: $err)"
  fi
}

mkfifo "$work/f.board.json"
refused "a FIFO" "f.board.json: this is not a plain file (a pipe or FIFO)" "$work/f.board.json"
refused "an endless device" "/dev/zero: this is not a plain file (a device)" /dev/zero
mkdir "$work/folder.board.json"
refused "a folder" "folder.board.json: this is a folder, not a file" "$work/folder.board.json"
truncate -s $((64 * 1024 * 1024 + 1)) "$work/huge.board.json"  # sparse: no disk used
refused "a file over the limit" "too large (the limit is 67108864 bytes)" "$work/huge.board.json"
rm -f "$work/huge.board.json"
sed 's/"pitch_mm": *[0-9.]*/"pitch_mm": 1e308/' "$good" >"$work/pitch.board.json"
expect "the test board names its pitch" grep -q '"pitch_mm": 1e308' "$work/pitch.board.json"
refused "an absurd pitch" "board.pitch_mm: pitch_mm 1e+308 is outside 0.5 to 10 mm" "$work/pitch.board.json"

"$STRIPSMITH_BIN/stripsmith" --sheet "$work/ok.pdf" "$good" 2>"$work/stderr"
expect "a good board still gives a sheet" grep -q "^%PDF-" "$work/ok.pdf"
expect "and nothing else in the folder" test "$(ls -A "$work" | grep -c '\.tmp$')" -eq 0

finish
