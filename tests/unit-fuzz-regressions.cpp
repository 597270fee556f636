// Inputs the fuzzers found crashing, kept in fuzz/regressions/<harness>/ and replayed here through
// the same readers in the normal build, so each fix stays fixed without a fuzzing build.
#include <cmath>
#include <string>

#include <doctest/doctest.h>

#include "netcheck/file/board_file.hpp"
#include "netcheck/spice/spice_import.hpp"
#include "netcheck/model/value.hpp"
#include "test_support.hpp"

using namespace netcheck;

namespace {

std::string regression(const std::string& name) {
    return test_support::readTextFile(test_support::sourcePath("fuzz/regressions/" + name));
}

}  // namespace

TEST_CASE("fuzz regressions") {
    SUBCASE("the saved corpus is there") {
        CHECK_FALSE(test_support::sourceFiles("fuzz/regressions/board_reader", ".json").empty());
        CHECK_FALSE(test_support::sourceFiles("fuzz/regressions/circuit_reader", ".json").empty());
    }

    SUBCASE("every saved board and circuit input reads to a value or a located error") {
        for (const auto& file : test_support::sourceFiles("fuzz/regressions/board_reader", "")) {
            CAPTURE(file);
            const auto result = readBoard(test_support::readTextFile(file), file);
            CHECK(result.ok() != result.error.has_value());
        }
        for (const auto& file : test_support::sourceFiles("fuzz/regressions/circuit_reader", "")) {
            CAPTURE(file);
            const auto result = readCircuit(test_support::readTextFile(file), file);
            CHECK(result.ok() != result.error.has_value());
        }
    }

    SUBCASE("a hole name with a long run of row letters is refused, not overflowed") {
        CHECK_FALSE(parseHole(std::string(60, 'm') + "C5").has_value());
        CHECK_FALSE(parseHole("ZZZZZ1").has_value());
        const auto result =
            readBoard(regression("board_reader/long-row-letters-overflow.board.json"), "f.json");
        REQUIRE(result.error.has_value());
        CHECK(result.error->path == "cuts[0]");
    }

    SUBCASE("a number beyond the range of a double is a located error, not an exception") {
        const std::string text = R"({"parts": {}, "nets": {},
  "x": 1e400})";
        const auto result = readCircuit(text, "big.circuit.json");
        REQUIRE(result.error.has_value());
        CHECK(result.error->describe() == "big.circuit.json:2:8: a number is too large (beyond 1.8e308)");
        const auto saved = readCircuit(regression("circuit_reader/number-beyond-double.json"), "f");
        REQUIRE(saved.error.has_value());
        CHECK(saved.error->message == "a number is too large (beyond 1.8e308)");
    }

    SUBCASE("a deck with control characters is refused, naming the line") {
        const auto result = importSpice("title\nR1 a b 1k\nR\x01 a 0 2k\n", "junk.cir", {});
        REQUIRE(result.error.has_value());
        CHECK(result.error->describe() ==
              "junk.cir:3: control character (byte 1) in the deck; a deck is plain text");
        const auto saved =
            importSpice(regression("spice_import/control-character-in-ref.cir"), "f.cir", {});
        CHECK(saved.error.has_value());
        // Tabs and form feeds are separators, not junk.
        CHECK(importSpice("title\nR1\ta\tb\t1k\f\n", "tabs.cir", {}).ok());
    }

    SUBCASE("subnormal magnitudes format without throwing") {
        // 1e-310 is below the smallest normal double (2.2e-308, IEEE 754 binary64).
        CHECK_NOTHROW((void)formatIec(1e-310, true));
        CHECK_NOTHROW((void)formatIec(4.9e-324, false));
        CHECK(formatIec(4700, false) == "4k7");
    }
}
