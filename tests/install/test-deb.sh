#!/usr/bin/env bash
# The Debian package: `cpack -G DEB` makes stripsmith_<version>_<arch>.deb from the build tree;
# dpkg-deb --info lists its dependencies, and they name the package of every shared library the
# two programs load (found here from the binaries' own NEEDED entries, not from a list) and the
# sheet's font; apt accepts it on this system (a simulated `apt-get install ./stripsmith_*.deb`);
# its programs run from the unpacked tree. The package is kept in test-artifacts/deb/.
source "$(dirname "$0")/../dist/lib.sh"

arch=$(dpkg --print-architecture)
deb_name="stripsmith_${STRIPSMITH_VERSION}_${arch}.deb"
if ! cpack -G DEB --config "$STRIPSMITH_BUILD/CPackConfig.cmake" -B "$WORK/pkg" >"$WORK/cpack.log" 2>&1; then
    cat "$WORK/cpack.log"
fi
deb="$WORK/pkg/$deb_name"
check "cpack made $deb_name" test -s "$deb"
[ -s "$deb" ] || { finish; exit 1; }
mkdir -p "$STRIPSMITH_ARTIFACTS/deb"
cp "$deb" "$STRIPSMITH_ARTIFACTS/deb/"

dpkg-deb --info "$deb" | tee "$WORK/info"
field() { sed -n "s/^ $1: //p" "$WORK/info"; }
check "Package: stripsmith" test "$(field Package)" = stripsmith
check "Version: $STRIPSMITH_VERSION" test "$(field Version)" = "$STRIPSMITH_VERSION"
check "Architecture: $arch" test "$(field Architecture)" = "$arch"
depends=$(field Depends | tr -d ' ' | tr ',' '\n' | sed 's/(.*//' | sort -u)
depends_on() { grep -qx -- "$1" <<<"$depends"; }
check "Depends names the sheet's font package (fonts-dejavu-core)" depends_on fonts-dejavu-core

dpkg-deb --contents "$deb" | awk '{ print $NF }' >"$WORK/contents"
for file in ./usr/bin/stripsmith ./usr/bin/netcheck ./usr/share/stripsmith/fonts/DejaVuSans.ttf \
    ./usr/share/man/man1/stripsmith.1.gz ./usr/share/man/man1/netcheck.1.gz \
    ./usr/share/applications/$APP_ID.desktop ./usr/share/metainfo/$APP_ID.metainfo.xml \
    ./usr/share/mime/packages/$APP_ID.xml ./usr/share/icons/hicolor/scalable/apps/$APP_ID.svg \
    ./usr/share/icons/hicolor/48x48/apps/$APP_ID.png; do
    check "the package holds $file" grep -qxF -- "$file" "$WORK/contents"
done

# Every library the programs load, by its package on this system (the one holding it in this
# architecture's library folder), must be a dependency.
dpkg-deb -x "$deb" "$WORK/root"
multiarch=$(dpkg-architecture -qDEB_HOST_MULTIARCH 2>/dev/null)
for program in stripsmith netcheck; do
    for library in $(readelf -d "$WORK/root/usr/bin/$program" | sed -n 's/.*(NEEDED).*\[\(.*\)\]/\1/p'); do
        owner=$(dpkg -S "*/$multiarch/$library" 2>/dev/null | head -1 | cut -d: -f1)
        check "$program needs $library: its package ${owner:-(none found)} is a dependency" \
            eval '[ -n "$owner" ] && depends_on "$owner"'
    done
done

check "apt accepts the package here (apt-get install --simulate ./$deb_name)" \
    bash -c "cd '$WORK/pkg' && apt-get install --simulate -q './$deb_name' >'$WORK/apt.log' 2>&1 || { cat '$WORK/apt.log' >&2; false; }"
check "the unpacked netcheck prints its version" \
    test "$("$WORK/root/usr/bin/netcheck" --version)" = "netcheck $STRIPSMITH_VERSION"
check "the unpacked stripsmith writes a sheet" \
    "$WORK/root/usr/bin/stripsmith" --sheet "$WORK/sheet.svg" "$STRIPSMITH_SOURCE/samples/demo.board.json"
check "the unpacked programs are stripped (no debug sections)" \
    bash -c "! readelf -S '$WORK/root/usr/bin/stripsmith' | grep -q debug_info"
finish
