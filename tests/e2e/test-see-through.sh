#!/usr/bin/env bash
# End to end: the see-through view shows the copper through part bodies. The real window renders
# the headphone amplifier in the component view and in the see-through view; inside the TL071's
# body (between its two pin rows, rows D to G) the component view shows the dark body, the
# see-through view the copper strips and gaps under it.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

board="$STRIPSMITH_SOURCE/samples/headphone-amp.board.json"
for view in component both; do
    STRIPSMITH_E2E_LOG=1 "$STRIPSMITH_BIN/stripsmith" --screenshot "$ART/view-$view.png" --size 1400x900 \
        --view "$view" "$board" 2>"$WORK/$view.log"
done

# Mean colour inside U1 (pins in holes 8 and 11): from hole 8.6 to 10.4, rows D to G.
body_colour() {  # body_colour VIEW -> "R G B"
    read -r x0 y0 pitch < <(grep "STRIPSMITH_E2E view A1" "$WORK/$1.log" | tail -1 | awk '{ print $4, $5, $7 }')
    local crop
    crop=$(awk -v x="$x0" -v y="$y0" -v p="$pitch" \
        'BEGIN { printf "%dx%d+%d+%d", 1.8 * p, 3 * p, x + 7.6 * p, y + 3 * p }')
    convert "$ART/view-$1.png" -crop "$crop" +repage -resize '1x1!' \
        -format '%[fx:int(255*r)] %[fx:int(255*g)] %[fx:int(255*b)]' info:
}
component=$(body_colour component)
through=$(body_colour both)
echo "inside U1: component view $component, see-through $through"
check "the component view shows U1's dark body" \
    awk -v c="$component" 'BEGIN { split(c, v, " "); exit !((v[1] + v[2] + v[3]) / 3 < 90) }'
check "seen through, U1's body is lighter and redder (copper under it)" \
    awk -v c="$component" -v t="$through" 'BEGIN {
        split(c, a, " "); split(t, b, " ")
        exit !((b[1] + b[2] + b[3]) / 3 > (a[1] + a[2] + a[3]) / 3 + 30 && b[1] - b[3] > a[1] - a[3] + 25) }'
finish
