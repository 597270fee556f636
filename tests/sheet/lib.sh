# Shared by the sheet tests (sourced): pass/fail counting, the command under test, poppler.
set -u
: "${STRIPSMITH_BIN:?set by tests/CMakeLists.txt}"
: "${STRIPSMITH_SOURCE:?set by tests/CMakeLists.txt}"
: "${STRIPSMITH_ARTIFACTS:?set by tests/CMakeLists.txt}"

passed=0
failed=0
here=$(cd "$(dirname "${BASH_SOURCE[0]}")" && pwd)

pass() { passed=$((passed + 1)); echo "PASS $1"; }
fail() { failed=$((failed + 1)); echo "FAIL $1"; }
# expect NAME COMMAND...: passes when the command succeeds.
expect() {
  local name=$1
  shift
  if "$@"; then pass "$name"; else fail "$name"; fi
}
# Counts the PASS/FAIL lines of the measuring script into ours.
count_lines() {
  local line
  while IFS= read -r line; do
    case $line in
      PASS*) passed=$((passed + 1)); echo "$line" ;;
      FAIL*) failed=$((failed + 1)); echo "$line" ;;
      *) echo "  $line" ;;
    esac
  done
}
# measure MODE ARGS...: runs the measuring script and counts its checks; a crash is a failure.
measure() {
  local out rc
  out=$(python3 "$here/sheet_measure.py" "$@" 2>&1)
  rc=$?
  count_lines <<<"$out"
  [ "$rc" -eq 0 ] || fail "measuring ($1) exited with status $rc"
}
finish() {
  echo "$passed passed, $failed failed"
  [ "$failed" -eq 0 ] && [ "$passed" -gt 0 ]
}

# The documented command.
sheet() { "$STRIPSMITH_BIN/stripsmith" --sheet "$@"; }

# board_facts FILE: "ROWS COLS CUTS PITCH" of a board file, read in one go.
board_facts() {
  python3 -c '
import json, sys
b = json.load(open(sys.argv[1]))
print(b["board"]["rows"], b["board"]["cols"], len(b.get("cuts", [])), b["board"].get("pitch_mm", 2.54))' "$1"
}

# Page size of page 1 in points, "W H", from pdfinfo.
page_size_pt() { pdfinfo "$1" | awk '/^Page size:/ {print $3, $5}'; }
page_count() { pdfinfo "$1" | awk '/^Pages:/ {print $2}'; }

# near VALUE EXPECTED TOLERANCE: succeeds when |VALUE - EXPECTED| <= TOLERANCE.
near() { awk -v v="$1" -v e="$2" -v t="$3" 'BEGIN { d = v - e; if (d < 0) d = -d; exit !(d <= t) }'; }
