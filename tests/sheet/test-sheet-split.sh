#!/usr/bin/env bash
# A board too big for the paper is split over several pages: every page A4, holes still one
# pitch apart on every page, a page map and overlap marks, every cut marked at least once.
source "$(dirname "$0")/lib.sh"

work=$STRIPSMITH_ARTIFACTS/sheet/split
mkdir -p "$work"
board=$work/big.board.json
# Our own scenario: 100 x 90 holes with rows of resistors, each followed by a hole cut.
python3 - "$board" <<'PY'
import json, sys
def hole(r, c):
    name, n = "", r
    while True:
        name = chr(65 + n % 26) + name
        n = n // 26 - 1
        if n < 0:
            return name + str(c + 1)
parts, cuts = [], []
for r in range(0, 90, 3):
    for c in range(0, 94, 6):
        parts.append({"ref": "R%d" % (len(parts) + 1), "kind": "resistor", "value": "10k",
                      "pins": {"1": hole(r, c), "2": hole(r, c + 4)}})
        cuts.append(hole(r, c + 5))
json.dump({"format": "stripsmith-board", "version": 1, "title": "Big split board",
           "board": {"rows": 90, "cols": 100}, "cuts": cuts, "parts": parts}, open(sys.argv[1], "w"))
PY
read -r _ _ cuts _ < <(board_facts "$board")
pdf=$work/big.pdf
expect "sheet written" sheet "$pdf" "$board"
pages=$(page_count "$pdf")
expect "split over more than two pages ($pages)" test "$pages" -gt 2
text=$(pdftotext "$pdf" -)
expect "page map printed" grep -q "Page map" <<<"$text"
expect "overlap marks name the neighbouring page" grep -q "overlap with page" <<<"$text"
expect "copper pages captioned as mirrored" grep -q "MIRRORED" <<<"$text"

marks=0
board_pages=0
uneven_pages=0
for ((page = 1; page <= pages; page++)); do
  # Board pages carry a side caption; the rest are the lists.
  pdftotext -f "$page" -l "$page" "$pdf" - | grep -q "SIDE —" || continue
  board_pages=$((board_pages + 1))
  pdftocairo -svg -noshrink -nocenter -f "$page" -l "$page" "$pdf" "$work/page$page.svg"
  out=$(python3 "$here/sheet_measure.py" pitch "$work/page$page.svg" 2>&1)
  if grep -q "^FAIL" <<<"$out"; then
    echo "  page $page: $out"
    uneven_pages=$((uneven_pages + 1))
  fi
  n=$(sed -n 's/.*cut marks \([0-9]*\).*/\1/p' <<<"$out")
  marks=$((marks + ${n:-0}))
done
expect "both sides split over several pages ($board_pages)" test "$board_pages" -ge 4
expect "holes one pitch apart on every page ($uneven_pages pages not)" test "$uneven_pages" -eq 0
# Cuts in an overlap are drawn on both pages, so at least one mark per cut.
expect "every cut marked ($marks marks for $cuts cuts)" test "$marks" -ge "$cuts"
if [ "${STRIPSMITH_SHEET_PNGS:-}" = 1 ]; then pdftoppm -r 50 -png -f 1 -l 2 "$pdf" "$work/big"; fi

finish
