#!/usr/bin/env bash
# The installed manual pages, stripsmith(1) and netcheck(1), against the programs themselves: each
# page's OPTIONS section lists exactly the long options its program's --help prints (an option
# added to --help and not to the page, or left in the page after leaving --help, fails here), the
# pages format without groff warnings, and every version shown (--version, the pages, the
# AppStream release) is the one in CMakeLists.txt.
source "$(dirname "$0")/lib.sh"

stage_install "$WORK/stage" /usr
man1="$WORK/stage/usr/share/man/man1"

# The long options a --help text names anywhere (usage lines and prose).
help_options() { "$STRIPSMITH_BIN/$1" --help | grep -o -e '--[a-z][a-z0-9-]*' | sort -u; }

# The long options tagged in a page's OPTIONS section (with its subsections): the line after each
# .TP, roff's \- read as a hyphen.
page_options() {
    zcat "$man1/$1.1.gz" | awk '
        /^\.SH/ { section = $2 }
        section == "OPTIONS" && previous == ".TP" { print }
        { previous = $1 }' | sed 's/\\-/-/g' | grep -o -e '--[a-z][a-z0-9-]*' | sort -u
}

groff_quiet() {  # groff_quiet PAGE: formats with every warning on, and none comes
    zcat "$man1/$1.1.gz" | groff -man -ww -z 2>"$WORK/groff.log"
    if [ -s "$WORK/groff.log" ]; then cat "$WORK/groff.log" >&2; return 1; fi
}

page_version() {  # the version in a page's .TH line ("Stripsmith X.Y.Z")
    zcat "$man1/$1.1.gz" | awk '/^\.TH/ { for (i = 1; i <= NF; i++) if ($i ~ /^[0-9]+\.[0-9]+\.[0-9]+"?$/) { gsub(/"/, "", $i); print $i } }'
}

for program in stripsmith netcheck; do
    check "$program.1.gz is installed in share/man/man1" test -s "$man1/$program.1.gz"
    help_options "$program" >"$WORK/$program.help"
    page_options "$program" >"$WORK/$program.page"
    echo "$program --help names: $(tr '\n' ' ' <"$WORK/$program.help")"
    check "$program --help names options (the comparison below is not empty)" test -s "$WORK/$program.help"
    check "$program(1) lists exactly the options $program --help prints" \
        same_lines "$program --help and $program(1) options" "$WORK/$program.help" "$WORK/$program.page"
    check "$program(1) formats without groff warnings" groff_quiet "$program"
    check "$program --version prints $program $STRIPSMITH_VERSION (CMakeLists.txt)" \
        test "$("$STRIPSMITH_BIN/$program" --version)" = "$program $STRIPSMITH_VERSION"
    check "$program(1) carries version $STRIPSMITH_VERSION" test "$(page_version "$program")" = "$STRIPSMITH_VERSION"
done

metainfo="$WORK/stage/usr/share/metainfo/$APP_ID.metainfo.xml"
release=$(python3 -c 'import sys, xml.etree.ElementTree as et
print(et.parse(sys.argv[1]).find("releases/release").get("version"))' "$metainfo")
check "the AppStream release is version $STRIPSMITH_VERSION" test "$release" = "$STRIPSMITH_VERSION"
finish
