#!/usr/bin/env bash
# Installed, Stripsmith runs from wherever the install is, with the build tree out of reach: the
# build is installed into a temporary DESTDIR (prefix /usr/local), the installed prefix is moved to
# another folder, and netcheck, stripsmith --sheet and stripsmith --screenshot run from there on a
# sample (the screenshot under Xvfb, as the end-to-end tests do). Then the installed font is
# removed from a copy: the editor must stop with a clear error naming it, although the build tree
# (build/share/stripsmith), the source tree (assets/) and the current directory all hold the font,
# so an editor that found its assets anywhere but beside itself would fail this test.
if [ -z "${STRIPSMITH_XVFB:-}" ]; then
    exec xvfb-run -a -s "-screen 0 1600x1000x24" env STRIPSMITH_XVFB=1 bash "$0"
fi
source "$(dirname "$0")/../dist/lib.sh"
unset STRIPSMITH_ASSETS
font=fonts/DejaVuSans.ttf

stage_install "$WORK/stage" /usr/local
prefix="$WORK/elsewhere/stripsmith"
mkdir -p "$WORK/elsewhere"
mv "$WORK/stage/usr/local" "$prefix"

for file in bin/stripsmith bin/netcheck share/stripsmith/$font share/man/man1/stripsmith.1.gz \
    share/man/man1/netcheck.1.gz share/applications/$APP_ID.desktop share/metainfo/$APP_ID.metainfo.xml \
    share/mime/packages/$APP_ID.xml share/icons/hicolor/scalable/apps/$APP_ID.svg; do
    check "installed: $file" test -s "$prefix/$file"
done

# The runs happen in a folder of their own that holds decoy fonts where a program looking in the
# current directory would find them.
cwd="$WORK/cwd"
mkdir -p "$cwd/assets/fonts" "$cwd/share/stripsmith/fonts" "$cwd/fonts"
for decoy in "$cwd/assets/$font" "$cwd/share/stripsmith/$font" "$cwd/$font"; do
    cp "$STRIPSMITH_SOURCE/assets/$font" "$decoy"
done
run() { (cd "$cwd" && "$@"); }

sample="$STRIPSMITH_SOURCE/samples/headphone-amp.board.json"
faulty="$STRIPSMITH_SOURCE/samples/headphone-amp-missing-cut.board.json"

# netcheck: the installed one reports what the built one reports, exit status included.
for board in "$sample" "$faulty"; do
    name=$(basename "$board")
    run "$prefix/bin/netcheck" "$board" >"$WORK/installed.txt" 2>&1
    installed_status=$?
    "$STRIPSMITH_BIN/netcheck" "$board" >"$WORK/built.txt" 2>&1
    built_status=$?
    check "installed netcheck on $name: status $installed_status, as built ($built_status)" \
        test "$installed_status" = "$built_status"
    check "installed netcheck on $name: the same report as built" \
        same_lines "reports" "$WORK/built.txt" "$WORK/installed.txt"
done
check "installed netcheck --version is $STRIPSMITH_VERSION" \
    test "$(run "$prefix/bin/netcheck" --version)" = "netcheck $STRIPSMITH_VERSION"

# The build sheet, no window.
check "installed stripsmith --sheet writes the sample's sheet" \
    run "$prefix/bin/stripsmith" --sheet "$WORK/sheet.pdf" "$sample"
check "the sheet is a PDF with a page" bash -c "pdfinfo '$WORK/sheet.pdf' | grep -qE '^Pages: +[1-9]'"

# The screenshot: the window, with the installed font.
shot() {  # shot PREFIX OUT.png: screenshot of the sample by PREFIX's editor, stderr in OUT.err
    run "$1/bin/stripsmith" --screenshot "$2" --size 800x600 "$sample" 2>"$2.err"
}
check "installed stripsmith --screenshot renders the sample" shot "$prefix" "$WORK/shot.png"
cat "$WORK/shot.png.err"
check "the screenshot is 800x600" test "$(identify -format '%wx%h' "$WORK/shot.png" 2>/dev/null)" = 800x600
colours=$(convert "$WORK/shot.png" -format '%k' info: 2>/dev/null || echo 0)
check "the screenshot is a picture (more than a few colours: $colours)" test "$colours" -gt 50
mkdir -p "$STRIPSMITH_ARTIFACTS/install" && cp "$WORK/shot.png" "$STRIPSMITH_ARTIFACTS/install/screenshot.png"

# Run through a symlink on PATH, as /usr/local/bin links often are: assets are found through it.
mkdir -p "$WORK/path"
ln -s "$prefix/bin/stripsmith" "$WORK/path/stripsmith"
check "stripsmith found on PATH through a symlink renders the sample" \
    bash -c "cd '$cwd' && PATH='$WORK/path':\$PATH stripsmith --screenshot '$WORK/link.png' --size 800x600 '$sample'"

# A broken install: the same tree without its font. The font is still in the build tree, the
# source tree and the current directory; the editor must not use any of them.
check "precondition: the build tree holds the font (build/share/stripsmith)" \
    test -s "$STRIPSMITH_BUILD/share/stripsmith/$font"
check "precondition: the source tree holds the font (assets/)" test -s "$STRIPSMITH_SOURCE/assets/$font"
broken="$WORK/broken/stripsmith"
mkdir -p "$WORK/broken"
cp -a "$prefix" "$broken"
rm "$broken/share/stripsmith/$font"
shot "$broken" "$WORK/broken.png"
status=$?
echo "without its font, the editor said: $(cat "$WORK/broken.png.err")"
check "without its font, the installed editor stops with status 2" test "$status" = 2
check "... writes no screenshot" test ! -e "$WORK/broken.png"
check "... and names the missing file where it looked for it" \
    grep -qF "missing $broken/share/stripsmith/$font" "$WORK/broken.png.err"
check "without its font, --sheet still works (the sheet uses the system's fonts)" \
    run "$broken/bin/stripsmith" --sheet "$WORK/broken.svg" "$sample"
finish
