#!/usr/bin/env bash
# End to end: seen from the component side a part stands over the cuts under it. A resistor lies
# across a hole cut on its own strip; in the real window's picture no pixel inside the resistor's
# body has the red of a cut mark (the ring used to be drawn over the body and its colour bands),
# while the same cut, away from any part, does show its red ring.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

board="$WORK/cut-under-body.board.json"
cat >"$board" <<'JSON'
{
  "format": "stripsmith-board", "version": 1, "title": "cut under a body",
  "board": {"rows": 6, "cols": 12},
  "cuts": ["C5", "E10"],
  "parts": [{"ref": "R1", "kind": "resistor", "value": "10k", "pins": {"1": "C2", "2": "C8"}}]
}
JSON
STRIPSMITH_E2E_LOG=1 "$STRIPSMITH_BIN/stripsmith" --screenshot "$ART/cut-under-body.png" \
    --size 1000x700 --view component "$board" 2>"$WORK/shot.log"
read -r x0 y0 pitch < <(grep "STRIPSMITH_E2E view A1" "$WORK/shot.log" | tail -1 | awk '{ print $4, $5, $7 }')

# Pixels of the cut marks' red (palette::kCutMark, 214 40 40) in a box around a hole centre:
# red_pixels ROW COL HALF_WIDTH HALF_HEIGHT (in pitches).
red_pixels() {
    local crop
    crop=$(awk -v x="$x0" -v y="$y0" -v p="$pitch" -v r="$1" -v c="$2" -v w="$3" -v h="$4" \
        'BEGIN { printf "%dx%d+%d+%d", 2 * w * p, 2 * h * p, x + (c - w) * p, y + (r - h) * p }')
    convert "$ART/cut-under-body.png" -crop "$crop" +repage -depth 8 txt:- |
        awk -F'[(),]' 'NR > 1 { r = $3 + 0; g = $4 + 0; b = $5 + 0
            if (r > 180 && g < 90 && b < 90 && r - g > 110) n++ } END { print n + 0 }'
}
# The resistor's body runs along strip C (row 2) between its leads in holes 2 and 8 (columns 1
# and 7): inside it, 1.2 pitches either side of the cut at C5 and a quarter pitch across.
under=$(red_pixels 2 4 1.2 0.25)
alone=$(red_pixels 4 9 0.6 0.6)
echo "cut-red pixels inside R1's body: $under; round the cut at E10, away from parts: $alone"
check "the cut under R1 does not show through its body" test "$under" -eq 0
check "a cut away from parts shows its red ring" test "$alone" -gt 20
finish
