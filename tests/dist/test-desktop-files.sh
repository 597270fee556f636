#!/usr/bin/env bash
# The desktop integration as installed (a DESTDIR install with prefix /usr): the .desktop entry
# passes desktop-file-validate, the AppStream metainfo passes appstreamcli (file and install tree,
# offline), the shared-mime-info package compiles and maps *.board.json to the board type, and the
# names that tie them together agree: the entry's MimeType is the package's type, its Icon is an
# installed icon (SVG and every PNG size, at that size), its Exec an installed program.
source "$(dirname "$0")/lib.sh"

stage_install "$WORK/stage" /usr
share="$WORK/stage/usr/share"
desktop="$share/applications/$APP_ID.desktop"
metainfo="$share/metainfo/$APP_ID.metainfo.xml"
mime="$share/mime/packages/$APP_ID.xml"

quiet() {  # quiet LOG COMMAND...: succeeds, else its output is shown
    local log=$1
    shift
    if "$@" >"$log" 2>&1; then cat "$log"; return 0; fi
    cat "$log" >&2
    return 1
}

desktop_key() { sed -n "s/^$1=//p" "$desktop"; }

check "desktop-file-validate: the .desktop entry" quiet "$WORK/dfv.log" desktop-file-validate "$desktop"
check "desktop-file-validate says nothing (no warnings)" test ! -s "$WORK/dfv.log"
check "appstreamcli validate: the metainfo" quiet "$WORK/as.log" appstreamcli validate --no-net "$metainfo"
check "appstreamcli validate-tree: the installed tree (metainfo with its .desktop entry)" \
    quiet "$WORK/astree.log" appstreamcli validate-tree --no-net "$WORK/stage/usr"
check "the entry is in the Graphics and Electronics categories" \
    grep -qE '^Categories=(.*;)?Graphics;(.*;)?Electronics;' "$desktop"

# The MIME package, compiled as the system would (update-mime-database runs on a copy of share/mime).
type=$(python3 -c 'import sys, xml.etree.ElementTree as et
ns = "{http://www.freedesktop.org/standards/shared-mime-info}"
print(et.parse(sys.argv[1]).getroot().find(ns + "mime-type").get("type"))' "$mime")
check "the MIME package defines application/x-stripsmith-board" test "$type" = application/x-stripsmith-board
# (with the stage on XDG_DATA_DIRS, where a system would have it, or it says so)
check "update-mime-database compiles the package" \
    quiet "$WORK/umd.log" env XDG_DATA_DIRS="$share:/usr/share" update-mime-database "$share/mime"
check "update-mime-database reports nothing" test ! -s "$WORK/umd.log"
check "*.board.json maps to $type" grep -qF ":$type:*.board.json" "$share/mime/globs2"
check "the .desktop entry opens $type" test "$(desktop_key MimeType)" = "$type;"

# The icon the entry names, SVG and PNGs (their sizes read from the PNG header).
icon=$(desktop_key Icon)
png_size() { python3 -c 'import struct, sys
d = open(sys.argv[1], "rb").read(24)
assert d[:8] == b"\x89PNG\r\n\x1a\n", "not a PNG"
print("%dx%d" % struct.unpack(">II", d[16:24]))' "$1"; }
check "the entry's icon $icon is installed as SVG" test -s "$share/icons/hicolor/scalable/apps/$icon.svg"
for size in 16 24 32 48 64 128 256; do
    png="$share/icons/hicolor/${size}x${size}/apps/$icon.png"
    check "icon $icon at ${size}x${size} is a ${size}x${size} PNG" test "$(png_size "$png" 2>/dev/null)" = "${size}x${size}"
done
check "the board type has its icon (application-x-stripsmith-board)" \
    test -s "$share/icons/hicolor/scalable/mimetypes/application-x-stripsmith-board.svg"
exec_program=$(desktop_key Exec | awk '{ print $1 }')
check "the entry's Exec ($exec_program) is an installed program" test -x "$WORK/stage/usr/bin/$exec_program"
check "the entry passes the file to open (%f)" grep -qE '^Exec=[^ ]+ %[fF]$' "$desktop"
finish
