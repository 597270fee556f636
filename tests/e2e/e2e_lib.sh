# Shared helpers for the end-to-end GUI tests: start the real editor under Xvfb, find where things
# are from its STRIPSMITH_E2E_LOG lines, and drive it with real mouse and key events (xdotool).
# Sourced by tests/e2e/test-*.sh; needs STRIPSMITH_BIN and STRIPSMITH_ARTIFACTS.

set -euo pipefail

: "${STRIPSMITH_BIN:?set STRIPSMITH_BIN to the folder holding stripsmith and netcheck}"
: "${STRIPSMITH_ARTIFACTS:?set STRIPSMITH_ARTIFACTS to a folder for screenshots}"
: "${STRIPSMITH_SOURCE:=$(cd "$(dirname "${BASH_SOURCE[0]}")/../.." && pwd)}"

ART="$STRIPSMITH_ARTIFACTS/e2e"
mkdir -p "$ART"
WORK=$(mktemp -d)
LOG="$WORK/editor.log"
EDITOR_PID=""
PASSED=0
FAILED=0

cleanup() {
    local pid
    for pid in "$EDITOR_PID" "${PID_OF[@]}"; do
        if [ -n "$pid" ] && kill -0 "$pid" 2>/dev/null; then kill "$pid" 2>/dev/null || true; fi
    done
    rm -rf "$WORK"
}
trap cleanup EXIT

check() {  # check "what" command...
    local what=$1
    shift
    if "$@"; then
        PASSED=$((PASSED + 1))
        echo "ok: $what"
    else
        FAILED=$((FAILED + 1))
        echo "FAILED: $what"
    fi
}

# finish: the script's verdict. A run in which no check ran (a script cut short, a helper that
# ended it early) is a failure too, never a silent pass.
finish() {
    if [ "$FAILED" -ne 0 ] || [ "$PASSED" -eq 0 ]; then
        echo "--- what the editor did:"
        grep "STRIPSMITH_E2E status" "$LOG" || true
    fi
    echo "$PASSED passed, $FAILED failed"
    [ "$FAILED" -eq 0 ] && [ "$PASSED" -gt 0 ]
}

# ---- waiting on the editor's state ---------------------------------------------------------------
# Nothing here sleeps to pace the test: every action waits for what it must produce (a log line, a
# file on disk, a window title). The editor ends every frame with "STRIPSMITH_E2E frame N revision
# R keys K buttons B mouse X Y": K key presses (modifiers aside) and B mouse-button presses and
# releases taken in so far, and where it last saw the mouse.

WAIT_SECONDS=${STRIPSMITH_E2E_WAIT:-30}  # the longest any one state may take on a loaded machine

wait_until() {  # wait_until COMMAND...: polls COMMAND until it succeeds or WAIT_SECONDS pass
    local deadline=$((SECONDS + WAIT_SECONDS))
    until "$@" >/dev/null 2>&1; do
        if [ "$SECONDS" -ge "$deadline" ]; then return 1; fi
        sleep 0.05
    done
}

eventually() { wait_until "$@"; }

show_log() {  # the editor's log for a failure report, without the frame lines
    grep -v "STRIPSMITH_E2E frame " "$LOG" >&2 || true
    grep "STRIPSMITH_E2E frame " "$LOG" | tail -1 >&2 || true
}

in_log() { grep -q -- "$1" "$LOG"; }

wait_for_log() {  # wait_for_log PATTERN
    if wait_until in_log "$1"; then return 0; fi
    echo "timed out waiting for \"$1\" in the editor log" >&2
    show_log
    return 1
}

wait_for_file() { wait_until test -s "$1"; }

frame_field() {  # frame_field frame|revision|keys|buttons: from the last frame line (0 before any)
    awk -v f="$1" '$1 == "STRIPSMITH_E2E" && $2 == "frame" { for (i = 2; i < NF; i += 2) if ($i == f) v = $(i + 1) }
        END { print v + 0 }' "$LOG"
}

# taken KEYS BUTTONS: the editor has taken in at least KEYS key presses and BUTTONS button changes,
# and ended two more frames since (what a key opens is drawn, and logged, on the next frame), or
# has ended altogether after taking them (a click on "Don't save" when quitting).
taken() {
    local running=1
    kill -0 "$EDITOR_PID" 2>/dev/null || running=0
    awk -v k="$1" -v b="$2" -v running="$running" '$1 == "STRIPSMITH_E2E" && $2 == "frame" {
            if (!at && $7 >= k && $9 >= b) at = $3
            last = $3 }
        END { exit !(at && (last >= at + 2 || !running)) }' "$LOG"
}

wait_taken() {  # wait_taken KEYS BUTTONS WHAT
    if wait_until taken "$1" "$2"; then return 0; fi
    echo "the editor never took $3 (keys $(frame_field keys) of $1, buttons $(frame_field buttons) of $2)" >&2
    return 1
}

frames_after() {  # frames_after FRAME COUNT: COUNT frames have ended after frame FRAME
    [ "$(frame_field frame)" -ge $(($1 + $2)) ]
}

wait_frames() {  # wait_frames COUNT: the editor ends COUNT more frames (time as the editor sees it)
    wait_until frames_after "$(frame_field frame)" "$1"
}

# settled PATTERN: the last line matching PATTERN is followed by three frames without another; an
# auto-sized window or popup is placed again on its second frame, a fitted view once its size is
# known, so a position read after that is where a click lands.
settled() {
    awk -v p="$1" '$0 ~ p { at = -1; next }
        $1 == "STRIPSMITH_E2E" && $2 == "frame" && at != "" { if (at < 0) at = $3; last = $3 }
        END { exit !(at != "" && at > 0 && last >= at + 3) }' "$LOG"
}

wait_settled() {  # wait_settled PATTERN
    wait_for_log "$1" >/dev/null || return 1
    if wait_until settled "$1"; then return 0; fi
    echo "\"$1\" never settled" >&2
    return 1
}

# ---- the editor ----------------------------------------------------------------------------------

# start_editor [ARGS...]: a 1400x900 window at the top-left corner, fitted to the board; returns
# once the board view has settled. It runs in WORK, so the file chooser starts there (a file name
# typed in it is a few keys, not a long path: the editor takes about one typed key per frame).
start_editor() {
    : >"$LOG"
    (cd "$WORK" && STRIPSMITH_E2E_LOG=1 STRIPSMITH_RECOVERY_DIR="$WORK/recovery" XDG_CONFIG_HOME="$WORK/config" \
        exec "$STRIPSMITH_BIN/stripsmith" --size 1400x900 "$@" 2>"$LOG") &
    EDITOR_PID=$!
    timeout "$WAIT_SECONDS" xdotool search --sync --name "Stripsmith" >/dev/null
    wait_settled "STRIPSMITH_E2E view A1"
}

view_line() {  # the board view once settled: "STRIPSMITH_E2E view A1 X Y pitch P ..."
    wait_settled "STRIPSMITH_E2E view A1" >/dev/null || return 1
    grep "STRIPSMITH_E2E view A1" "$LOG" | tail -1
}

# hole_xy ROW COL (zero-based): screen position of a hole centre.
hole_xy() {
    view_line | awk -v r="$1" -v c="$2" '{ printf "%d %d\n", $4 + c * $7, $5 + r * ($7 < 0 ? -$7 : $7) }'
}

# gap_xy ROW COL: the gap between hole COL and COL+1 on a strip.
gap_xy() {
    view_line | awk -v r="$1" -v c="$2" '{ printf "%d %d\n", $4 + (c + 0.5) * $7, $5 + r * ($7 < 0 ? -$7 : $7) }'
}

item_xy() {  # item_xy NAME: where a named button or field is, once its window has settled
    wait_settled "STRIPSMITH_E2E item $1 " >/dev/null || return 1
    grep "STRIPSMITH_E2E item $1 " "$LOG" | tail -1 | awk '{ print $4, $5 }'
}

# ---- input: every helper returns once the editor has taken what it sent -----------------------------

mouse_at() {  # mouse_at X Y: the editor has seen the mouse at X Y
    awk -v x="$1" -v y="$2" '$1 == "STRIPSMITH_E2E" && $2 == "frame" { at = ($11 == x && $12 == y) }
        END { exit !at }' "$LOG"
}

move_to() {  # move_to X Y (by way of the next pixel: a move onto where the mouse is sends nothing)
    xdotool mousemove "$(($1 + 1))" "$2" mousemove "$1" "$2"
    if wait_until mouse_at "$1" "$2"; then return 0; fi
    echo "the editor never saw the mouse at $1 $2" >&2
    return 1
}

click_at() {  # click_at X Y
    [ $# -eq 2 ] || { echo "click_at: no position" >&2; return 1; }
    move_to "$1" "$2" || return 1
    local buttons
    buttons=$(frame_field buttons)
    xdotool click 1
    wait_taken 0 $((buttons + 2)) "the click at $1 $2"
}

drag() {  # drag X1 Y1 X2 Y2: press, two moves, release, each taken before the next
    [ $# -eq 4 ] || { echo "drag: no positions" >&2; return 1; }
    move_to "$1" "$2" || return 1
    local buttons
    buttons=$(frame_field buttons)
    xdotool mousedown 1
    wait_taken 0 $((buttons + 1)) "the press at $1 $2" || return 1
    move_to "$(( ($1 + $3) / 2 ))" "$(( ($2 + $4) / 2 ))" || return 1
    move_to "$3" "$4" || return 1
    xdotool mouseup 1
    wait_taken 0 $((buttons + 2)) "the release at $3 $4"
}

keys() {  # keys KEY... (xdotool key names, e.g. ctrl+s Return): each chord has one key press
    local keys
    keys=$(frame_field keys)
    xdotool key "$@"
    wait_taken $((keys + $#)) 0 "the keys $*"
}

type_text() {  # type_text TEXT: one key press per character
    local keys
    keys=$(frame_field keys)
    xdotool type --delay 20 "$1"
    wait_taken $((keys + ${#1})) 0 "the text $1"
}

# press_until KEY COMMAND...: presses KEY until COMMAND succeeds once the editor has taken the key
# (up to three presses). A shortcut the editor took but ignored (one that came while a popup was
# closing) is pressed again; the editor's own reaction decides, never a delay.
press_until() {
    local key=$1
    shift
    for _ in 1 2 3; do
        if keys "$key" && "$@"; then return 0; fi
        echo "no effect after $key; pressing it again" >&2
    done
    return 1
}

status_count() { grep -c "STRIPSMITH_E2E status" "$LOG" || true; }

status_after() {  # status_after COUNT PATTERN: a status line after the first COUNT ones matches
    grep "STRIPSMITH_E2E status" "$LOG" | tail -n +"$(($1 + 1))" | grep -q -- "$2"
}

wait_status_after() { wait_until status_after "$@"; }

# shortcut KEY PATTERN: presses KEY until the editor reports a new status line matching PATTERN.
shortcut() {
    press_until "$1" status_after "$(status_count)" "$2"
}

last_dialogs() { grep "STRIPSMITH_E2E dialogs" "$LOG" | tail -1 | cut -d' ' -f3-; }

dialogs_match() { last_dialogs | grep -q -- "$1"; }

wait_dialogs() { wait_until dialogs_match "$1"; }  # wait_dialogs PATTERN: the open dialogs match

# ---- actions and states shared by several scripts ---------------------------------------------------

# press_for_dialog KEY PATTERN: presses KEY until the open dialogs match PATTERN.
press_for_dialog() { press_until "$1" dialogs_match "$2"; }

click_item() {  # click_item NAME: a click on a dialog button once its popup has settled
    local xy
    xy=$(item_xy "$1") || return 1
    click_at $xy
}

# cut_gap ROW COL NAME: the cut tool, then a click on the gap after hole COL (zero-based) of strip
# ROW; waits for the editor to report the cut NAME (tries again if the tool key was dropped).
cut_gap() {
    local before
    for _ in 1 2; do
        before=$(status_count)
        keys x && click_at $(gap_xy "$1" "$2") || continue
        if status_after "$before" "Add cut $3\$"; then return 0; fi
    done
    return 1
}

editor_running() { kill -0 "$EDITOR_PID" 2>/dev/null; }

title_is() {  # title_is TITLE [WINDOW]: an editor window's title (the only one, without WINDOW)
    [ "$(xdotool getwindowname "${2:-$(xdotool search --name '^Stripsmith' | head -1)}")" = "$1" ]
}

# close_window [WINDOW]: what a window manager sends when the title bar's close button is pressed
# (to the only editor window without WINDOW).
close_window() {
    python3 - "${1:-$(xdotool search --name '^Stripsmith' | head -1)}" <<'PY'
import ctypes, sys
x11 = ctypes.cdll.LoadLibrary("libX11.so.6")
x11.XOpenDisplay.restype = ctypes.c_void_p
x11.XOpenDisplay.argtypes = [ctypes.c_char_p]
x11.XInternAtom.restype = ctypes.c_ulong
x11.XInternAtom.argtypes = [ctypes.c_void_p, ctypes.c_char_p, ctypes.c_int]
x11.XSendEvent.argtypes = [ctypes.c_void_p, ctypes.c_ulong, ctypes.c_int, ctypes.c_long,
                          ctypes.c_void_p]
x11.XFlush.argtypes = [ctypes.c_void_p]
x11.XCloseDisplay.argtypes = [ctypes.c_void_p]

class ClientMessage(ctypes.Structure):  # XClientMessageEvent from <X11/Xlib.h>
    _fields_ = [("type", ctypes.c_int), ("serial", ctypes.c_ulong), ("send_event", ctypes.c_int),
                ("display", ctypes.c_void_p), ("window", ctypes.c_ulong),
                ("message_type", ctypes.c_ulong), ("format", ctypes.c_int),
                ("data", ctypes.c_long * 5)]

class Event(ctypes.Union):  # XEvent: 24 longs
    _fields_ = [("xclient", ClientMessage), ("pad", ctypes.c_long * 24)]

display = x11.XOpenDisplay(None)
window = int(sys.argv[1])
event = Event()
event.xclient.type = 33  # ClientMessage
event.xclient.window = window
event.xclient.message_type = x11.XInternAtom(display, b"WM_PROTOCOLS", 0)
event.xclient.format = 32
event.xclient.data[0] = x11.XInternAtom(display, b"WM_DELETE_WINDOW", 0)
x11.XSendEvent(display, window, 0, 0, ctypes.byref(event))
x11.XFlush(display)
x11.XCloseDisplay(display)
PY
}

editor_ended() { ! editor_running; }

EXIT_STATUS=""
wait_exit() {  # wait_exit: for the editor to end; sets EXIT_STATUS
    EXIT_STATUS="still running"
    wait_until editor_ended || return 1
    EXIT_STATUS=0
    wait "$EDITOR_PID" 2>/dev/null || EXIT_STATUS=$?
}

# recovery_copy_holding TEXT: some autosaved recovery copy holds TEXT
recovery_copy_holding() {
    grep -l -F -- "$1" "$WORK"/recovery/editor-*.board.json >/dev/null 2>&1
}


# ---- several editors at once ------------------------------------------------------------------------
# start_named NAME [ARGS...]: starts one more editor, logging to $WORK/NAME.log; its process is
# PID_OF[NAME] and its window WINDOW_OF[NAME]. The helpers above act on the editor started or chosen
# (use_editor) last. All share one recovery folder, $WORK/recovery.
declare -A PID_OF=() WINDOW_OF=()

start_named() {
    local name=$1 before
    shift
    before=$(xdotool search --name '^Stripsmith' 2>/dev/null | sort || true)
    LOG="$WORK/$name.log"
    start_editor "$@" || return 1
    PID_OF[$name]=$EDITOR_PID
    WINDOW_OF[$name]=$(comm -13 <(echo "$before") <(xdotool search --name '^Stripsmith' | sort) | head -1)
    [ -n "${WINDOW_OF[$name]}" ]
}

# use_editor NAME: the helpers act on editor NAME from now on; its window is raised above the
# others and given the keyboard (there is no window manager under Xvfb to do either).
use_editor() {
    LOG="$WORK/$1.log"
    EDITOR_PID=${PID_OF[$1]}
    xdotool windowraise "${WINDOW_OF[$1]}" windowfocus --sync "${WINDOW_OF[$1]}"
}

screenshot() {  # screenshot NAME
    import -window root "$ART/$1.png" 2>/dev/null || xwd -root -silent >"$ART/$1.xwd"
}

# Under its own X server: each script re-runs itself inside xvfb-run.
run_under_xvfb() {
    if [ -z "${STRIPSMITH_E2E_INNER:-}" ]; then
        exec xvfb-run -a -s "-screen 0 1600x1000x24" env STRIPSMITH_E2E_INNER=1 bash "$1"
    fi
}
