// Control characters from files never reach a terminal or a page raw: an ESC sequence in a name
// could retitle and clear the terminal that shows a report. Refs, kinds and values refuse them
// with a located message; everything printed escapes them. Refs have no blanks (no-break and
// zero-width spaces included), and refs that differ only in case are one part.
#include <doctest/doctest.h>

#include <string>

#include "netcheck/check/check.hpp"
#include "netcheck/report/report_format.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/model/name_rules.hpp"
#include "netcheck/model/printable.hpp"
#include "netcheck/spice/spice_import.hpp"

using namespace netcheck;

namespace {

// The sequence of the report that found this: set the window title, then clear the screen.
constexpr std::string_view kRetitleAndClear = "\x1b]0;x\x07\x1b[2J";

// A board file with one resistor whose ref, kind and value are JSON text as given.
std::string boardWith(const std::string& ref, const std::string& kind, const std::string& value) {
    return R"({"format": "stripsmith-board", "version": 1, "board": {"rows": 4, "cols": 6},
  "parts": [{"ref": ")" +
           ref + R"(", "kind": ")" + kind + R"(", "value": ")" + value +
           R"(", "pins": {"1": "A1", "2": "A3"}}]})";
}

std::string refusal(const std::string& text) {
    const ReadResult<Board> result = readBoard(text, "c.board.json");
    REQUIRE_FALSE(result.ok());
    return result.error->describe();
}

}  // namespace

TEST_CASE("printing escapes control characters") {
    CHECK(escapeControls(kRetitleAndClear) == "\\x1b]0;x\\x07\\x1b[2J");
    CHECK(escapeControls("tab\there\nDEL\x7f") == "tab\\x09here\\x0aDEL\\x7f");
    CHECK(escapeControls("C1 \xc2\x9b"
                         "2J") == "C1 \\u009b2J");  // U+009B, the 8-bit CSI
    CHECK(escapeControls("broken \xff byte") == "broken \\xff byte");
    CHECK(escapeControls(std::string("nul\0x", 5)) == "nul\\x00x");
    // Ordinary text prints unchanged: ohms, micro, backslashes, no-break spaces.
    CHECK(escapeControls("4.7 k\xce\xa9 100\xc2\xb5"
                         "F C:\\x") ==
          "4.7 k\xce\xa9 100\xc2\xb5"
          "F C:\\x");
    CHECK(escapeControlsKeepingLines("a\x1b\nb\n") == "a\\x1b\nb\n");
}

TEST_CASE("refs, kinds and values refuse control characters") {
    SUBCASE("a control character in a ref says so") {
        CHECK(refusal(boardWith("R\\u001b1", "resistor", "1k")) ==
              "c.board.json:2:21: parts[0].ref: ref \"R\\u001b1\" holds a control character "
              "(U+001B)");
    }
    SUBCASE("in a kind and in a value") {
        CHECK(refusal(boardWith("R1", "resistor\\u0007", "1k")) ==
              "c.board.json:2:35: parts[0].kind: kind \"resistor\\u0007\" holds a control "
              "character (U+0007)");
        CHECK(refusal(boardWith("R1", "resistor", "1k\\u001b]0;x\\u0007\\u001b[2J"))
                  .ends_with("parts[0].value: value \"1k\\u001b]0;x\\u0007\\u001b[2J\" holds a "
                             "control character (U+001B)"));
        CHECK(refusal(boardWith("R1", "resistor", "1k\\u009b2J"))
                  .ends_with("holds a control character (U+009B)"));
        CHECK(refusal(boardWith("R1", "resistor", "1k\\n")).ends_with("(U+000A)"));
    }
    SUBCASE("in the circuit's parts") {
        const std::string text =
            R"({"format": "stripsmith-board", "version": 1, "board": {"rows": 4, "cols": 6},
  "circuit": {"parts": {"R1": {"kind": "resistor", "value": "\u001b[2J"}}}})";
        CHECK(refusal(text) ==
              "c.board.json:2:61: circuit.parts.R1.value: value "
              "\"\\u001b[2J\" holds a control character (U+001B)");
    }
    SUBCASE("the message itself never carries the raw character") {
        const std::string said = refusal(boardWith("R1", "resistor", "1k\\u009b2J"));
        CHECK(said.find('\x1b') == std::string::npos);
        CHECK(said.find("\xc2\x9b") == std::string::npos);
    }
}

TEST_CASE("refs have no blanks of any kind") {
    CHECK(refProblem("R 1") == "may not contain blanks");
    CHECK(refProblem("R\xc2\xa0"
                     "1") == "may not contain blanks (U+00A0 is a blank too)");
    CHECK(refProblem("R\xe2\x80\x8b"
                     "1") == "may not contain blanks (U+200B is a blank too)");
    CHECK(refProblem("R\xef\xbb\xbf"
                     "1") == "may not contain blanks (U+FEFF is a blank too)");
    CHECK(refProblem("R\t1") == "may not contain blanks");
    CHECK(refProblem("") == "is empty");
    CHECK_FALSE(refProblem("X1.R3").has_value());
    CHECK_FALSE(refProblem("R\xce\xa9"
                           "1")
                    .has_value());  // letters of any script are fine
    CHECK(refusal(boardWith("R\\u00a01", "resistor", "1k"))
              .ends_with("ref \"R\xc2\xa0"
                         "1\" may not contain blanks (U+00A0 is a blank too)"));
    CHECK(refusal(boardWith("R\\u200b1", "resistor", "1k")).ends_with("(U+200B is a blank too)"));
}

TEST_CASE("refs that differ only in case are one part") {
    SUBCASE("on the board") {
        const std::string text =
            R"({"format": "stripsmith-board", "version": 1, "board": {"rows": 4, "cols": 6},
  "parts": [{"ref": "Q1", "kind": "bjt", "pins": {"C": "A1", "B": "A2", "E": "A3"}}],
  "offboard": [{"ref": "q1", "kind": "pot", "pins": ["1"]}]})";
        CHECK(refusal(text) ==
              "c.board.json:3:24: offboard[0].ref: duplicate ref \"q1\" (also at parts[0] as "
              "\"Q1\"; refs that differ only in case are one part)");
    }
    SUBCASE("in a circuit") {
        const std::string text =
            R"({"format": "stripsmith-board", "version": 1, "board": {"rows": 4, "cols": 6},
  "circuit": {"parts": {"Q1": {"kind": "bjt"}, "q1": {"kind": "bjt"}}}})";
        CHECK(
            refusal(text).ends_with("circuit.parts.q1: duplicate ref \"q1\" (also \"Q1\"; refs "
                                    "that differ only in case are one part)"));
    }
    CHECK(refIdentity("q1") == refIdentity("Q1"));
    CHECK(refIdentity("R1") != refIdentity("R11"));
}

TEST_CASE("SPICE decks are held to the same rules") {
    const auto problem = [](const std::string& deck) {
        const auto result = importSpice(deck, "deck.cir", {});
        REQUIRE_FALSE(result.ok());
        return result.error->describe();
    };
    CHECK(problem("t\nR\xc2\xa0"
                  "1 a b 1k\n") ==
          "deck.cir:2: part ref R\xc2\xa0"
          "1 may not contain blanks (U+00A0 is a blank too)");
    CHECK(problem("t\nR\xc2\x9b"
                  "1 a b 1k\n") ==
          "deck.cir:2: part ref R\\u009b1 holds a control character (U+009B)");
}

TEST_CASE("the text report escapes what it quotes") {
    // Net names are free text: they reach the report as written, and are escaped there.
    const std::string text =
        R"({"format": "stripsmith-board", "version": 1, "board": {"rows": 4, "cols": 6},
  "parts": [{"ref": "R1", "kind": "resistor", "value": "1k", "pins": {"1": "A1", "2": "B3"}},
            {"ref": "R2", "kind": "resistor", "value": "1k", "pins": {"1": "A2", "2": "C3"}}],
  "circuit": {"parts": {"R1": {"kind": "resistor", "value": "1k"},
                        "R2": {"kind": "resistor", "value": "1k"}},
              "nets": {"\u001b]0;x\u0007\u001b[2J": ["R1.1"], "B": ["R2.1"]}}})";
    const ReadResult<Board> read = readBoard(text, "n.board.json");
    REQUIRE(read.ok());
    const std::string report = formatReportText(check(*read.value), *read.value);
    CHECK(report.find('\x1b') == std::string::npos);
    CHECK(report.find('\x07') == std::string::npos);
    CHECK(report.find("error short \\x1b]0;x\\x07\\x1b[2J, B: strip A joins") != std::string::npos);
}
