# Shared by tests/dist and tests/install (sourced): pass/fail counting, a work folder, and an
# install of the build into a temporary DESTDIR.
set -uo pipefail
: "${STRIPSMITH_BIN:?set by tests/CMakeLists.txt}"
: "${STRIPSMITH_BUILD:?set by tests/CMakeLists.txt}"
: "${STRIPSMITH_SOURCE:?set by tests/CMakeLists.txt}"
: "${STRIPSMITH_VERSION:?set by tests/CMakeLists.txt}"
: "${STRIPSMITH_ARTIFACTS:?set by tests/CMakeLists.txt}"

APP_ID=org.stripsmith.Stripsmith
WORK=$(mktemp -d)
trap 'rm -rf "$WORK"' EXIT
PASSED=0
FAILED=0

check() {  # check "what" COMMAND...: one verdict, printed
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

finish() {  # the script's verdict: a run in which no check ran is a failure too
    echo "$PASSED passed, $FAILED failed"
    [ "$FAILED" -eq 0 ] && [ "$PASSED" -gt 0 ]
}

# stage_install DESTDIR PREFIX: `cmake --install` of the build tree; fails the script when it fails.
stage_install() {
    if ! DESTDIR="$1" cmake --install "$STRIPSMITH_BUILD" --prefix "$2" >"$WORK/install.log" 2>&1; then
        cat "$WORK/install.log"
        echo "FAILED: cmake --install into $1"
        exit 1
    fi
}

same_lines() {  # same_lines WHAT FILE_A FILE_B: equal, else the difference is shown
    if diff -u "$2" "$3" >"$WORK/diff"; then return 0; fi
    echo "$1 differ:" >&2
    cat "$WORK/diff" >&2
    return 1
}
