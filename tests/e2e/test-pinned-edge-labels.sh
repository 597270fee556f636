#!/usr/bin/env bash
# End to end: zoomed in on the middle of a board, the row letters and hole numbers stay at the
# canvas edges (over a dark backdrop) instead of scrolling away with the board's edges. The
# editor logs where it draws them; the screenshot shows a letter there.
source "$(dirname "$0")/e2e_lib.sh"
run_under_xvfb "$0"

start_editor "$STRIPSMITH_SOURCE/samples/headphone-amp.board.json"
read -r _ _ _ fit_x fit_y _ fit_pitch rest < <(view_line)
rows=$(view_line | awk '{ for (i = 1; i < NF; i++) if ($i == "rows") print $(i + 1) }')
# Over the middle of the board, zoom in with the mouse wheel until a hole is 4 times as wide.
read -r mx my < <(hole_xy 5 9)
move_to "$mx" "$my"
pitch_now() { view_line | awk '{ print $7 }'; }
zoomed() { awk -v p="$(pitch_now)" -v f="$fit_pitch" 'BEGIN { exit !(p >= 4 * f) }'; }
for _ in $(seq 1 20); do
    zoomed && break
    before=$(pitch_now)
    xdotool click 4
    wait_until awk -v p="$(pitch_now)" -v b="$before" 'BEGIN { exit !(p > b) }' || true
done
check "zoomed in four times" zoomed
wait_settled "STRIPSMITH_E2E view A1"
screenshot pinned-edge-labels
read -r _ _ _ x0 y0 _ pitch _ < <(view_line)
edges=$(grep "STRIPSMITH_E2E note edge-labels" "$LOG" | tail -1)
echo "A1 at $x0 $y0, pitch $pitch; $edges"
left=$(echo "$edges" | awk '{ print $5 }')
top=$(echo "$edges" | awk '{ for (i = 1; i < NF; i++) if ($i == "top") print $(i + 1) }')
check "the row letters are pinned at the left" grep -q "left [0-9.]* pinned" <<<"$edges"
check "the hole numbers are pinned at the top" grep -q "top [0-9.]* pinned" <<<"$edges"
check "both moved in from beside the board, inside the window" awk -v l="$left" -v t="$top" \
    -v x="$x0" -v y="$y0" -v p="$pitch" \
    'BEGIN { exit !(l > x - 0.75 * p + 1 && t > y - 1.2 * p + 1 && l > 0 && l < 1400 && t > 0 && t < 900) }'
# In the picture: the letter of a row in view sits on its backdrop at the pinned place: light
# text pixels and dark backdrop pixels both in a small box there.
row_y=$(awk -v y="$y0" -v p="$pitch" -v r="$((rows / 2))" 'BEGIN { printf "%d", y + r * p }')
crop=$(awk -v x="$left" -v y="$row_y" 'BEGIN { printf "24x24+%d+%d", x - 12, y - 12 }')
read -r light dark < <(convert "$ART/pinned-edge-labels.png" -crop "$crop" +repage -colorspace Gray -depth 8 txt:- |
    awk -F'[(),]' 'NR > 1 { v = $3 + 0; if (v > 170) l++; if (v < 60) d++ } END { print l + 0, d + 0 }')
echo "at the pinned letter: $light light pixels, $dark dark ones"
check "a letter is drawn at the pinned place" test "$light" -gt 5
check "over its backdrop" test "$dark" -gt 50
finish
