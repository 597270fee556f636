#!/usr/bin/env bash
# Crash recovery, end to end in the real editor under Xvfb: draw a link and a cut with the mouse,
# wait past the autosave interval, kill the editor with SIGKILL, start it again, accept the
# offered restore, save, and check that the saved board holds exactly what was drawn.
# Needs: Xvfb, xdotool, ImageMagick (import, convert), python3.
set -euo pipefail
: "${STRIPSMITH_BIN:?}" "${STRIPSMITH_ARTIFACTS:?}"
editor="$STRIPSMITH_BIN/stripsmith"
netcheck="$STRIPSMITH_BIN/netcheck"
work="$STRIPSMITH_ARTIFACTS/crash-recovery"
rm -rf "$work"
mkdir -p "$work/home" "$work/recovery"
board="$work/drawn.board.json"
autosave=2

fail() { echo "crash-recovery: FAIL: $*" >&2; exit 1; }

# An empty 10 x 24 strip board to draw on.
cat >"$board" <<'JSON'
{"format": "stripsmith-board", "version": 1, "title": "recovery test",
 "board": {"rows": 10, "cols": 24}, "cuts": [], "parts": [], "links": [], "offboard": [], "wires": []}
JSON
cp "$board" "$work/empty.board.json"

# ---- display ---------------------------------------------------------------------------------
exec {displayfd}<> <(:)
Xvfb -displayfd "$displayfd" -screen 0 1400x900x24 -nolisten tcp >"$work/xvfb.log" 2>&1 &
xvfb=$!
editorPid=""
cleanup() {
    [ -n "$editorPid" ] && kill -9 "$editorPid" 2>/dev/null || true
    kill "$xvfb" 2>/dev/null || true
}
trap cleanup EXIT
display=""
for _ in $(seq 100); do
    read -r -t 0.1 -u "$displayfd" display || true
    [ -n "$display" ] && break
done
[ -n "$display" ] || fail "Xvfb did not start"
export DISPLAY=":$display"
export LIBGL_ALWAYS_SOFTWARE=1
export HOME="$work/home" XDG_STATE_HOME="$work/home/state" XDG_CONFIG_HOME="$work/home/config"
export STRIPSMITH_RECOVERY_DIR="$work/recovery" STRIPSMITH_AUTOSAVE_SECONDS="$autosave"
export STRIPSMITH_E2E_LOG=1

# Starts the editor on the board; its stderr (hole positions) goes to $1.
start_editor() {
    "$editor" --size 1400x900 "$board" 2>"$1" &
    editorPid=$!
    for _ in $(seq 150); do
        if grep -q '^STRIPSMITH_E2E view A1' "$1" 2>/dev/null; then
            # No window manager runs: give the window the keyboard focus ourselves.
            # The window under the pointer is the editor's (it is the only one).
            local window
            xdotool mousemove 700 450
            sleep 0.2
            window=$(xdotool getmouselocation --shell | sed -n 's/^WINDOW=//p')
            [ -n "$window" ] || fail "no window under the pointer"
            xdotool windowfocus "$window" || true
            sleep 0.3
            return 0
        fi
        kill -0 "$editorPid" 2>/dev/null || fail "the editor exited at start: $(cat "$1")"
        sleep 0.2
    done
    fail "the editor window did not show the board"
}

# Window position of hole (row, col), both zero-based, from the newest layout the editor logged.
hole_xy() {
    grep '^STRIPSMITH_E2E view A1' "$1" | tail -n 1 |
        awk -v r="$2" -v c="$3" '{ p = $7; s = (p < 0 ? -p : p);
            printf "%d %d\n", $4 + c * p + 0.5, $5 + r * s + 0.5 }'
}

click_at() {
    xdotool mousemove "$1" "$2"
    sleep 0.3
    xdotool mousedown 1
    sleep 0.15
    xdotool mouseup 1
    sleep 0.3
}

key() {
    xdotool key "$@"
    sleep 0.3
}

shot() { import -window root "$work/$1.png"; }

# ---- first session: draw, autosave, crash ----------------------------------------------------
start_editor "$work/first.log"
read -r x y < <(hole_xy "$work/first.log" 5 12)
xdotool mousemove "$x" "$y"  # keyboard input goes to the window under the pointer
sleep 0.5
key l                            # link tool: A1 then C1
read -r x y < <(hole_xy "$work/first.log" 0 0); click_at "$x" "$y"
read -r x y < <(hole_xy "$work/first.log" 2 0); click_at "$x" "$y"
key x                            # cut tool: a hole cut at E7
read -r x y < <(hole_xy "$work/first.log" 4 6); click_at "$x" "$y"
key Escape
shot drawn

# The autosave runs every $autosave seconds while there are unsaved changes.
saved=""
for _ in $(seq 60); do
    if [ -f "$work/recovery/recovery.board.json" ] &&
        grep -q '"E7"' "$work/recovery/recovery.board.json" &&
        grep -q '"C1"' "$work/recovery/recovery.board.json"; then
        saved=yes
        break
    fi
    sleep 0.5
done
[ -n "$saved" ] || fail "no autosave with the drawn link and cut after $((autosave * 15)) s"
kill -9 "$editorPid"
wait "$editorPid" 2>/dev/null || true
editorPid=""
cmp -s "$board" "$work/empty.board.json" || fail "the board file changed before any save"

# ---- second session: restore and save --------------------------------------------------------
start_editor "$work/second.log"
xdotool mousemove 5 5
# The offer is a modal; everything behind it is dimmed, so the only pixels in the plain button
# colour are its two buttons, "Restore" (left) and "Discard" (right).
find_restore() {
    shot recovery-offer
    convert "$work/recovery-offer.png" -depth 8 "$work/recovery-offer.ppm"
    python3 - "$work/recovery-offer.ppm" <<'PY'
import sys
data = open(sys.argv[1], "rb").read()
# P6 header: magic, width, height, maxval, then RGB bytes.
fields, pos = [], 0
while len(fields) < 4:
    while data[pos:pos + 1].isspace(): pos += 1
    end = pos
    while not data[end:end + 1].isspace(): end += 1
    fields.append(data[pos:end]); pos = end
pos += 1
width = int(fields[1])
pixels = data[pos:]
button = bytes((56, 64, 74))  # the editor's button colour (0.22, 0.25, 0.29)
found = []
start = pixels.find(button)
while start >= 0:
    if start % 3 == 0: found.append((start // 3 % width, start // 3 // width))
    start = pixels.find(button, start + 1)
if len(found) < 100:
    sys.exit(1)  # not drawn yet
left = min(x for x, _ in found)
column = sorted(y for x, y in found if x == left)
print(left + 12, column[len(column) // 2])
PY
}
restore=""
for _ in $(seq 40); do
    restore=$(find_restore) && break
    restore=""
    sleep 0.5
done
[ -n "$restore" ] || fail "the restore offer did not appear (see recovery-offer.png)"
read -r x y <<<"$restore"
click_at "$x" "$y"
xdotool mousemove 700 450
sleep 0.5
shot restored
key ctrl+s
for _ in $(seq 120); do
    cmp -s "$board" "$work/empty.board.json" || break
    sleep 0.25
done
cmp -s "$board" "$work/empty.board.json" && fail "the restored board was not saved (see restored.png)"
shot saved
key ctrl+q
for _ in $(seq 20); do kill -0 "$editorPid" 2>/dev/null || break; sleep 0.25; done
kill -9 "$editorPid" 2>/dev/null || true
editorPid=""

# ---- the saved board is what was drawn ---------------------------------------------------------
python3 - "$board" <<'PY' || fail "the saved board differs from what was drawn"
import json, sys
board = json.load(open(sys.argv[1]))
links = [(l["from"], l["to"]) for l in board["links"]]
problems = []
if board["board"]["rows"] != 10 or board["board"]["cols"] != 24: problems.append("size changed")
if board["cuts"] != ["E7"]: problems.append("cuts are %r, drawn was [E7]" % board["cuts"])
if sorted(links) not in ([("A1", "C1")], [("C1", "A1")]): problems.append("links are %r" % links)
if board["parts"] or board["wires"] or board["offboard"]: problems.append("extra elements")
if board.get("title") != "recovery test": problems.append("title changed")
for p in problems: print("crash-recovery:", p, file=sys.stderr)
sys.exit(1 if problems else 0)
PY
# The same through the CLI: the saved board's nets equal those of the drawing written by hand.
cat >"$work/expected.board.json" <<'JSON'
{"format": "stripsmith-board", "version": 1, "title": "recovery test",
 "board": {"rows": 10, "cols": 24}, "cuts": ["E7"], "parts": [],
 "links": [{"from": "A1", "to": "C1"}], "offboard": [], "wires": []}
JSON
"$netcheck" --nets --json "$board" >"$work/saved.nets.json" || [ $? -eq 1 ]
"$netcheck" --nets --json "$work/expected.board.json" >"$work/expected.nets.json" || [ $? -eq 1 ]
cmp -s "$work/saved.nets.json" "$work/expected.nets.json" ||
    fail "nets differ: $(diff "$work/expected.nets.json" "$work/saved.nets.json" | head -20)"
[ -f "$board.bak" ] && cmp -s "$board.bak" "$work/empty.board.json" ||
    fail "the previous version was not kept as $board.bak"
echo "crash-recovery: the drawn link and cut survived SIGKILL and were restored and saved"
