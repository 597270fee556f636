#!/usr/bin/env bash
# Every sample board (and the sheet test boards) gives a sheet: A4 pages, one numbered mark per
# cut, holes one pitch apart, and a failing check printed as a banner.
# With STRIPSMITH_SHEET_PNGS=1 every page is also rendered to PNG with poppler's pdftoppm, for
# people to look at (build/test-artifacts/sheet/<board>/page-N.png); that step is slow and checks
# little beyond "poppler can draw it", so it is left out of the ordinary run.
source "$(dirname "$0")/lib.sh"

out=$STRIPSMITH_ARTIFACTS/sheet
mkdir -p "$out"
boards=("$STRIPSMITH_SOURCE"/samples/*.board.json "$STRIPSMITH_SOURCE"/tests/sheet/boards/*.board.json)
expect "sample boards exist" test -e "${boards[0]}"

for board in "${boards[@]}"; do
  name=$(basename "$board" .board.json)
  pdf=$out/$name.pdf
  if ! sheet "$pdf" "$board"; then
    fail "$name: sheet written"
    continue
  fi
  pages=$(page_count "$pdf")
  read -r w h < <(page_size_pt "$pdf")
  # ISO 216 A4 = 210 x 297 mm = 595.276 x 841.890 pt (1 pt = 1/72 in, ISO 32000-1).
  expect "$name: A4 pages" eval 'near "$w" 595.276 0.01 && near "$h" 841.890 0.01'
  if [ "${STRIPSMITH_SHEET_PNGS:-}" = 1 ]; then
    rm -rf "${out:?}/$name"
    mkdir -p "$out/$name"
    pdftoppm -r 100 -png "$pdf" "$out/$name/page"
    pngs=$(find "$out/$name" -name "page-*.png" -size +1k | wc -l)
    expect "$name: $pages pages rendered to PNG" test "$pngs" -eq "$pages"
  fi

  pdftocairo -svg -noshrink -nocenter -f 1 -l 1 "$pdf" "$out/$name-page1.svg"
  pdftotext -bbox -f 1 -l 1 "$pdf" "$out/$name-page1.html"
  measure pdf "$out/$name-page1.svg" "$out/$name-page1.html" --board "$board"

  text=$(pdftotext -layout "$pdf" -)
  for words in "CAUTIONS" "Low-voltage circuits only" "IEC 61140" "ventilated" \
               "Disconnect power" "Bill of materials" "Assembly order" "Track cuts" \
               "Off-board wiring" "Check result at print time"; do
    expect "$name: has \"$words\"" grep -q "$words" <<<"$text"
  done
  # The checker's own verdict, from its CLI, must be the one the sheet prints.
  if "$STRIPSMITH_BIN/netcheck" "$board" >/dev/null 2>&1; then
    expect "$name: passes its check and says so" grep -q "CHECK PASSED\|CHECKED WITHOUT A CIRCUIT" <<<"$text"
  else
    expect "$name: fails its check and says so" grep -q "CHECK FAILED" <<<"$text"
  fi
done

finish
