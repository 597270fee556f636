#!/usr/bin/env bash
# `stripsmith --sheet`: bad input gets a clear message naming the file (and line) and status 2.
source "$(dirname "$0")/lib.sh"

work=$STRIPSMITH_ARTIFACTS/sheet/cli
mkdir -p "$work"
good=$STRIPSMITH_SOURCE/tests/sheet/boards/booster.board.json

# run NAME EXPECTED_STATUS PATTERN ARGS...: status and a stderr line matching PATTERN.
run() {
  local name=$1 want=$2 pattern=$3
  shift 3
  local err status
  err=$("$STRIPSMITH_BIN/stripsmith" "$@" 2>&1 >/dev/null)
  status=$?
  if [ "$status" -eq "$want" ] && grep -q -- "$pattern" <<<"$err"; then
    pass "$name"
  else
    fail "$name (status $status, stderr: $err)"
  fi
}

run "writes a PDF" 0 "" --sheet "$work/ok.pdf" "$good"
expect "the PDF is a PDF" grep -q "^%PDF-" "$work/ok.pdf"
run "paper before the board" 0 "" --paper letter --sheet "$work/ok-letter.svg" "$good"
run "missing board file named" 2 "no-such.board.json" --sheet "$work/x.pdf" "$work/no-such.board.json"
printf '{\n  "format": "stripsmith-board",\n  "version": 1,\n  "board": {"rows": 5, "cols": 5},\n  "cuts": ["Z9"]\n}\n' >"$work/bad.board.json"
run "bad board: file and line named" 2 "bad.board.json:5:" --sheet "$work/x.pdf" "$work/bad.board.json"
run "bad board: what is wrong" 2 "outside" --sheet "$work/x.pdf" "$work/bad.board.json"
run "unknown paper" 2 "a5" --sheet "$work/x.pdf" --paper a5 "$good"
run "unknown output type" 2 "x.png" --sheet "$work/x.png" "$good"
run "no board given" 2 "no board file" --sheet "$work/x.pdf"
run "missing output folder" 1 "no-folder" --sheet "$work/no-folder/x.pdf" "$good"
expect "no file left after a refused board" test ! -e "$work/x.pdf"

finish
