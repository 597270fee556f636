#!/usr/bin/env bash
# End to end: Stripsmith's own theme (editor/app/look.cpp) is what the window shows, not ImGui's
# stock dark one: the panels are the theme's light paper, and the status line's text on it has a
# contrast of at least 7:1, WCAG 2.1's AAA level for body text (relative luminance and contrast
# ratio as WCAG 2.1 defines them). The board keeps its copper strips on the copper side.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

shot="$ART/look.png"
"$STRIPSMITH_BIN/stripsmith" --screenshot "$shot" --size 1400x900 "$STRIPSMITH_SOURCE/samples/demo.board.json" 2>/dev/null
copper="$ART/look-copper.png"
"$STRIPSMITH_BIN/stripsmith" --screenshot "$copper" --size 1400x900 --view copper "$STRIPSMITH_SOURCE/samples/demo.board.json" 2>/dev/null
check "the screenshots were written" test -s "$shot" -a -s "$copper"

pixels() {  # pixels PNG GEOMETRY: "R G B" per pixel of the area
    convert "$1" -crop "$2" +repage -depth 8 txt:- | sed -n 's/.*: (\([0-9]*\),\([0-9]*\),\([0-9]*\).*/\1 \2 \3/p'
}
# An empty stretch of the Properties panel (right, 1060..1400 at 1x; its text ends near the top).
paper=$(pixels "$shot" 200x40+1150+200 | sort | uniq -c | sort -rn | head -1 | awk '{ print $2, $3, $4 }')
echo "panel paper: $paper"
# The theme's kPaper is (236, 234, 228); ImGui's stock dark WindowBg is near (15, 15, 15).
check "the panels are the theme's light paper (got $paper)" awk -v c="$paper" 'BEGIN {
    split(c, v, " "); exit !(v[1] >= 230 && v[1] <= 242 && v[2] >= 228 && v[2] <= 240 && v[3] >= 222 && v[3] <= 234) }'

# The status line (bottom strip, left part): the darkest pixel is the ink, the commonest the paper.
pixels "$shot" 420x22+0+874 >"$WORK/status.txt"
check "the status line's text has a contrast of at least 7:1 on the panel paper" python3 - "$WORK/status.txt" <<'PY'
import collections, sys
px = [tuple(map(int, l.split())) for l in open(sys.argv[1]) if l.strip()]
def luminance(rgb):  # WCAG 2.1 relative luminance of an sRGB colour
    def lin(c):
        c /= 255
        return c / 12.92 if c <= 0.04045 else ((c + 0.055) / 1.055) ** 2.4
    r, g, b = map(lin, rgb)
    return 0.2126 * r + 0.7152 * g + 0.0722 * b
background = collections.Counter(px).most_common(1)[0][0]
ink = min(px, key=luminance)
ratio = (luminance(background) + 0.05) / (luminance(ink) + 0.05)
print("status line: paper", background, "ink", ink, "contrast %.1f:1" % ratio)
sys.exit(0 if ratio >= 7 else 1)
PY

# Copper side: the strips keep the copper colour (palette kCopper, 222 142 74), whatever the theme.
strip=$(pixels "$copper" 1400x800+0+50 | awk '$1 > 200 && $1 < 240 && $2 > 125 && $2 < 160 && $3 > 55 && $3 < 95' | wc -l)
check "the copper side shows copper-coloured strips ($strip pixels)" [ "$strip" -gt 20000 ]
finish
