#!/usr/bin/env bash
# End to end: File > Export build sheet asks for the paper (A4 or US Letter) after the file name,
# writes the sheet on that paper, and then says where the file went with an "Open folder" button
# (under the test log the editor logs the xdg-open command instead of running it).
# US Letter is 8.5 x 11 in (ANSI/ASME Y14.1 size A) = 612 x 792 pt at 72 pt per inch; A4 is
# 210 x 297 mm (ISO 216) = 595.3 x 841.9 pt.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"
command -v pdfinfo >/dev/null || { echo "pdfinfo (poppler-utils) is needed"; exit 77; }

board="$WORK/flasher.board.json"
cp "$STRIPSMITH_SOURCE/samples/flasher.board.json" "$board"
sheet="$WORK/flasher-sheet.pdf"
start_editor "$board"

click_at $(item_xy menu-file)
click_at $(item_xy menu-export-sheet)
check "the file chooser opens for the sheet" wait_dialogs "^chooser$"
keys Return
check "after the file name, the dialog asks for the paper" wait_dialogs "sheet-paper"
screenshot sheet-export-paper
click_at $(item_xy sheet-letter)
click_at $(item_xy sheet-export)
check "the dialog says where the sheet went" wait_dialogs "sheet-written $sheet"
check "the sheet was written" wait_for_file "$sheet"
size=$(pdfinfo "$sheet" | awk '/^Page size:/ { print $3, $5 }')
check "the sheet is on US Letter: 612 x 792 pt (got $size)" [ "$size" = "612 792" ]
screenshot sheet-export-written
click_at $(item_xy sheet-open-folder)
check "Open folder asks xdg-open for the sheet's folder" wait_for_log "STRIPSMITH_E2E note open-folder xdg-open $WORK\$"
click_at $(item_xy sheet-close)
check "Close closes the dialog" wait_dialogs "^-$"

# A4 the second time (the choice is remembered, so choose A4 on purpose).
rm -f "$sheet"
click_at $(item_xy menu-file)
click_at $(item_xy menu-export-sheet)
wait_dialogs "^chooser$"
keys Return
wait_dialogs "sheet-paper"
click_at $(item_xy sheet-a4)
click_at $(item_xy sheet-export)
check "the A4 sheet was written" wait_for_file "$sheet"
size=$(pdfinfo "$sheet" | awk '/^Page size:/ { printf "%.0f %.0f", $3, $5 }')
check "the sheet is on A4: 595 x 842 pt (got $size)" [ "$size" = "595 842" ]
finish
