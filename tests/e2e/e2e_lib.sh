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
    if [ -n "$EDITOR_PID" ] && kill -0 "$EDITOR_PID" 2>/dev/null; then kill "$EDITOR_PID" 2>/dev/null || true; fi
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

finish() {
    if [ "$FAILED" -ne 0 ]; then
        echo "--- what the editor did:"
        grep "STRIPSMITH_E2E status" "$LOG" || true
    fi
    echo "$PASSED passed, $FAILED failed"
    [ "$FAILED" -eq 0 ]
}

# start_editor [ARGS...]: a 1400x900 window at the top-left corner, fitted to the board.
start_editor() {
    : >"$LOG"
    STRIPSMITH_E2E_LOG=1 STRIPSMITH_RECOVERY_DIR="$WORK/recovery" XDG_CONFIG_HOME="$WORK/config" \
        "$STRIPSMITH_BIN/stripsmith" --size 1400x900 "$@" 2>"$LOG" &
    EDITOR_PID=$!
    timeout 30 xdotool search --sync --name "Stripsmith" >/dev/null
    wait_for_log "STRIPSMITH_E2E view A1"
    sleep 0.5
}

wait_for_log() {  # wait_for_log PATTERN
    for _ in $(seq 1 100); do
        if grep -q "$1" "$LOG"; then return 0; fi
        sleep 0.1
    done
    echo "timed out waiting for \"$1\" in the editor log" >&2
    cat "$LOG" >&2
    return 1
}

# hole_xy ROW COL (zero-based): screen position of a hole centre from the last view line.
hole_xy() {
    grep "STRIPSMITH_E2E view A1" "$LOG" | tail -1 |
        awk -v r="$1" -v c="$2" '{ printf "%d %d\n", $4 + c * $7, $5 + r * ($7 < 0 ? -$7 : $7) }'
}

# gap_xy ROW COL: the gap between hole COL and COL+1 on a strip.
gap_xy() {
    grep "STRIPSMITH_E2E view A1" "$LOG" | tail -1 |
        awk -v r="$1" -v c="$2" '{ printf "%d %d\n", $4 + (c + 0.5) * $7, $5 + r * ($7 < 0 ? -$7 : $7) }'
}

item_xy() {  # item_xy NAME
    wait_for_log "STRIPSMITH_E2E item $1 " >/dev/null
    grep "STRIPSMITH_E2E item $1 " "$LOG" | tail -1 | awk '{ print $4, $5 }'
}

click_at() {  # click_at X Y
    xdotool mousemove "$1" "$2"
    sleep 0.2
    xdotool click 1
    sleep 0.4
}

drag() {  # drag X1 Y1 X2 Y2
    xdotool mousemove "$1" "$2"
    sleep 0.2
    xdotool mousedown 1
    sleep 0.2
    xdotool mousemove "$(( ($1 + $3) / 2 ))" "$(( ($2 + $4) / 2 ))"
    sleep 0.2
    xdotool mousemove "$3" "$4"
    sleep 0.2
    xdotool mouseup 1
    sleep 0.4
}

keys() {  # keys KEY... (xdotool key names, e.g. ctrl+s Return)
    xdotool key --delay 120 "$@"
    sleep 0.4
}

# shortcut KEY PATTERN: presses KEY until the editor reports a new status line matching PATTERN
# (up to three presses). On a heavily loaded machine the X server now and then drops a synthetic
# key event before the window sees it; the editor's own reaction is what the test waits for.
shortcut() {
    local before
    before=$(grep -c "STRIPSMITH_E2E status .*$2" "$LOG" || true)
    for _ in 1 2 3; do
        keys "$1"
        for _ in $(seq 1 25); do
            if [ "$(grep -c "STRIPSMITH_E2E status .*$2" "$LOG" || true)" -gt "$before" ]; then return 0; fi
            sleep 0.2
        done
        echo "no \"$2\" after $1; pressing it again" >&2
    done
    return 1
}

type_text() {
    xdotool type --delay 60 "$1"
    sleep 0.3
}

screenshot() {  # screenshot NAME
    import -window root "$ART/$1.png" 2>/dev/null || xwd -root -silent >"$ART/$1.xwd"
}

eventually() {  # eventually COMMAND...: retries for up to 10 s (frames are slow on a busy machine)
    for _ in $(seq 1 50); do
        if "$@" >/dev/null 2>&1; then return 0; fi
        sleep 0.2
    done
    return 1
}

wait_for_file() {
    for _ in $(seq 1 50); do
        if [ -s "$1" ]; then return 0; fi
        sleep 0.1
    done
    return 1
}

# Under its own X server: each script re-runs itself inside xvfb-run.
run_under_xvfb() {
    if [ -z "${STRIPSMITH_E2E_INNER:-}" ]; then
        exec xvfb-run -a -s "-screen 0 1600x1000x24" env STRIPSMITH_E2E_INNER=1 bash "$1"
    fi
}
