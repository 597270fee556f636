#!/usr/bin/env bash
# Board sizes have one order everywhere (holes across x strips; millimetres width x height), so
# only netcheck/model/board_size.cpp may put a size together. This looks through the code for any
# other place that writes "N x M" or "NxM" from numbers (parsing with sscanf and comments aside).
set -uo pipefail
src="${STRIPSMITH_SOURCE:?STRIPSMITH_SOURCE not set}"
pattern='\\u00d7|"x" *\+|" x " *\+|\+ *" x "|\+ *"x"|%[0-9.]*[dfu] *x *%|strips x|rows x|x %[0-9.]*[dfu] (holes|mm)'
hits=$(cd "$src" && grep -rnE "$pattern" netcheck editor --include=*.cpp --include=*.hpp |
    grep -v '^netcheck/model/board_size\.cpp:' | grep -v 'sscanf' | grep -vE '^[^:]*:[0-9]+: *//')
if [ -n "$hits" ]; then
    echo "sizes formatted outside netcheck/model/board_size.cpp (use sizeInHoles / sizeInMm):"
    echo "$hits"
    echo "0 passed, 1 failed"
    exit 1
fi
# The check itself must be able to see a size: the formatter's own file matches the pattern.
if ! grep -qE "$pattern" "$src/netcheck/model/board_size.cpp"; then
    echo "the pattern no longer finds the formatter itself; it would miss other code too"
    echo "0 passed, 1 failed"
    exit 1
fi
echo "2 passed, 0 failed"
