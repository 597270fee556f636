// Every character the interface draws is in the font as loaded: the string literals of editor/
// (menus, panels, tool hints, dialogs) and netcheck/ (finding texts, reports, command labels such
// as "Add link B10–C10") are read from the source, and each code point must have a glyph in the
// atlas built from assets/fonts/DejaVuSans.ttf with uiGlyphRanges(). (The regression: the en dash
// of "Redo Add link B10–C10" was outside the ranges loaded, and drew as "?".)
#include <doctest/doctest.h>

#include <filesystem>
#include <map>
#include <set>
#include <string>

#include <imgui.h>

#include "editor/app/look.hpp"
#include "../test_support.hpp"

using namespace stripsmith;
namespace fs = std::filesystem;

namespace {

void appendUtf8(std::string& out, unsigned code) {
    if (code < 0x80) {
        out += static_cast<char>(code);
    } else if (code < 0x800) {
        out += static_cast<char>(0xC0 | (code >> 6));
        out += static_cast<char>(0x80 | (code & 0x3F));
    } else {
        out += static_cast<char>(0xE0 | (code >> 12));
        out += static_cast<char>(0x80 | ((code >> 6) & 0x3F));
        out += static_cast<char>(0x80 | (code & 0x3F));
    }
}

unsigned hexValue(const std::string& text, std::size_t& i, std::size_t digits) {
    unsigned value = 0;
    for (std::size_t n = 0; n < digits && i < text.size() && std::isxdigit(static_cast<unsigned char>(text[i])); ++n, ++i)
        value = value * 16 + static_cast<unsigned>(std::stoi(std::string(1, text[i]), nullptr, 16));
    return value;
}

/// The bytes of every string literal in C++ source, escapes resolved (\uXXXX, \xHH, \n ...);
/// comments and character literals skipped. Raw strings are taken as they stand.
std::string literalBytes(const std::string& src) {
    std::string out;
    std::size_t i = 0;
    while (i < src.size()) {
        if (src.compare(i, 2, "//") == 0) {
            i = src.find('\n', i);
            if (i == std::string::npos) break;
        } else if (src.compare(i, 2, "/*") == 0) {
            i = src.find("*/", i + 2);
            if (i == std::string::npos) break;
            i += 2;
        } else if (src[i] == '\'') {
            for (++i; i < src.size() && src[i] != '\''; ++i)
                if (src[i] == '\\') ++i;
            ++i;
        } else if (src.compare(i, 3, "R\"(") == 0) {
            const std::size_t end = src.find(")\"", i + 3);
            if (end == std::string::npos) break;
            out += src.substr(i + 3, end - i - 3) + '\n';
            i = end + 2;
        } else if (src[i] == '"') {
            for (++i; i < src.size() && src[i] != '"'; ++i) {
                if (src[i] != '\\') {
                    out += src[i];
                    continue;
                }
                const char e = src[++i];
                if (e == 'u') {
                    ++i;
                    appendUtf8(out, hexValue(src, i, 4));
                    --i;
                } else if (e == 'x') {
                    ++i;
                    out += static_cast<char>(hexValue(src, i, 2));
                    --i;
                } else {
                    out += ' ';  // \n, \t, \", \\: plain ASCII, always in the font
                }
            }
            out += '\n';
            ++i;
        } else {
            ++i;
        }
    }
    return out;
}

/// Code points of UTF-8 text; bytes that are not UTF-8 are skipped (no literal the UI draws has
/// them: the BOM check in the JSON reader is three bytes compared, never drawn).
std::set<unsigned> codePoints(const std::string& text) {
    std::set<unsigned> points;
    for (std::size_t i = 0; i < text.size();) {
        const auto c = static_cast<unsigned char>(text[i]);
        std::size_t n = c < 0x80 ? 1 : (c >> 5) == 6 ? 2 : (c >> 4) == 14 ? 3 : (c >> 3) == 30 ? 4 : 0;
        if (n == 0 || i + n > text.size()) {
            ++i;
            continue;
        }
        unsigned code = n == 1 ? c : c & (0x7F >> n);
        for (std::size_t k = 1; k < n; ++k) code = (code << 6) | (static_cast<unsigned char>(text[i + k]) & 0x3F);
        if (code >= 0x20 && code != 0xFEFF) points.insert(code);
        i += n;
    }
    return points;
}

/// Each code point drawn by the interface, with one file it comes from.
std::map<unsigned, std::string> interfaceCodePoints() {
    std::map<unsigned, std::string> where;
    for (const char* folder : {"editor", "netcheck"}) {
        for (const auto& entry : fs::recursive_directory_iterator(test_support::sourcePath(folder))) {
            const std::string path = entry.path().string();
            // The build sheet draws with cairo and the system's fonts, not with this atlas.
            if (path.find("/editor/sheet/") != std::string::npos) continue;
            if (entry.path().extension() != ".cpp" && entry.path().extension() != ".hpp") continue;
            for (unsigned code : codePoints(literalBytes(test_support::readTextFile(path))))
                where.emplace(code, path);
        }
    }
    return where;
}

}  // namespace

TEST_CASE("glyphs") {
    SUBCASE("the literal reader finds escaped and plain characters, and skips comments") {
        const std::string src = "// \xE2\x86\x92 in a comment\nauto a = \"B10\\u2013C10\"; auto b = \"4.7 k\xCE\xA9\"; char c = '\"';";
        const auto points = codePoints(literalBytes(src));
        CHECK(points.count(0x2013) == 1);  // en dash, written as an escape
        CHECK(points.count(0x03A9) == 1);  // omega, written as UTF-8
        CHECK(points.count(0x2192) == 0);  // the arrow is only in a comment
    }

    SUBCASE("every character of the interface's strings has a glyph in the font as loaded") {
        const std::string font = test_support::sourcePath("assets/fonts/DejaVuSans.ttf");
        REQUIRE(fs::exists(font));
        ImFontAtlas atlas;
        ImFont* loaded = addUiFont(atlas, font, 15.0f);
        REQUIRE(loaded != nullptr);
        REQUIRE(atlas.Build());
        const auto points = interfaceCodePoints();
        // Guard: the scan saw the interface's text, non-ASCII characters included.
        REQUIRE(points.size() > 80);
        REQUIRE(points.count(0x2013) == 1);
        for (const auto& [code, file] : points) {
            CAPTURE(code);
            CAPTURE(file);
            CHECK(loaded->FindGlyphNoFallback(static_cast<ImWchar>(code)) != nullptr);
        }
    }

    SUBCASE("the test can fail: ImGui's default ranges miss the en dash") {
        ImFontAtlas atlas;
        ImFontConfig config;
        ImFont* latin = atlas.AddFontFromFileTTF(test_support::sourcePath("assets/fonts/DejaVuSans.ttf").c_str(), 15.0f,
                                                 &config, atlas.GetGlyphRangesDefault());
        REQUIRE(atlas.Build());
        CHECK(latin->FindGlyphNoFallback(0x2013) == nullptr);
    }
}
