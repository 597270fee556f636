#!/usr/bin/env bash
# The printed sheet is at true scale and the copper side is mirrored, measured from outside with
# poppler (pdfinfo, pdftocairo -svg, pdftotext -bbox) on the PDF, and on the SVG itself.
source "$(dirname "$0")/lib.sh"

work=$STRIPSMITH_ARTIFACTS/sheet/geometry
mkdir -p "$work"
board=$STRIPSMITH_SOURCE/tests/sheet/boards/booster.board.json
read -r rows cols cuts pitch < <(board_facts "$board")

for paper in a4 letter; do
  pdf=$work/booster-$paper.pdf
  expect "$paper: sheet written" sheet "$pdf" --paper "$paper" "$board"
  read -r w h < <(page_size_pt "$pdf")
  if [ "$paper" = a4 ]; then
    # ISO 216: A4 = 210 x 297 mm; PDF units are 1/72 in (ISO 32000-1), 1 in = 25.4 mm.
    expect "a4: page width 210 mm" near "$(awk -v p="$w" 'BEGIN {print p * 25.4 / 72}')" 210 0.05
    expect "a4: page height 297 mm" near "$(awk -v p="$h" 'BEGIN {print p * 25.4 / 72}')" 297 0.05
  else
    # US Letter = 8.5 x 11 in.
    expect "letter: page width 8.5 in" near "$(awk -v p="$w" 'BEGIN {print p / 72}')" 8.5 0.002
    expect "letter: page height 11 in" near "$(awk -v p="$h" 'BEGIN {print p / 72}')" 11 0.002
  fi
  # -noshrink -nocenter: draw the page as it is, without fitting it to pdftocairo's own paper.
  pdftocairo -svg -noshrink -nocenter -f 1 -l 1 "$pdf" "$work/page1-$paper.svg"
  pdftotext -bbox -f 1 -l 1 "$pdf" "$work/page1-$paper.html"
  measure pdf "$work/page1-$paper.svg" "$work/page1-$paper.html" \
    --rows "$rows" --cols "$cols" --pitch "$pitch" --cuts "$cuts"
  text=$(pdftotext "$pdf" -)
  expect "$paper: says how to print" grep -q 'Print at 100% / actual size' <<<"$text"
  expect "$paper: says to measure the bar" grep -q 'measure this bar' <<<"$text"
done

svg=$work/booster.svg
expect "svg: sheet written" sheet "$svg" "$board"
measure svg "$svg" --paper-width 210 --rows "$rows" --cols "$cols" --pitch "$pitch" \
  --cuts "$cuts" --same-as "$work/page1-a4.svg"
svg=$work/booster-letter.svg
expect "svg letter: sheet written" sheet "$svg" --paper letter "$board"
# 8.5 in = 215.9 mm.
measure svg "$svg" --paper-width 215.9 --rows "$rows" --cols "$cols" --pitch "$pitch" \
  --cuts "$cuts"

finish
