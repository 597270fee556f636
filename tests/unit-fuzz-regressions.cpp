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
        CHECK(test_support::sourceFiles("fuzz/regressions/spice_import", ".cir").size() >= 3);
        CHECK_FALSE(test_support::sourceFiles("fuzz/regressions/value_parser", "").empty());
    }

    SUBCASE("every saved deck imports, with each set of options, to an error or a circuit that "
            "a circuit file can hold") {
        // As fuzz_spice_import checks it: broken-utf8-in-name.cir and dotted-port-name.cir once
        // gave names that no circuit file can hold.
        for (const auto& file : test_support::sourceFiles("fuzz/regressions/spice_import", "")) {
            CAPTURE(file);
            const std::string deck = test_support::readTextFile(file);
            for (const bool flatten : {false, true}) {
                for (const auto sources : {SpiceOptions::Sources::Ignore,
                                           SpiceOptions::Sources::Offboard}) {
                    SpiceOptions options;
                    options.flatten = flatten;
                    options.sources = sources;
                    const auto result = importSpice(deck, file, options);
                    REQUIRE(result.ok() != result.error.has_value());
                    if (!result.ok()) continue;
                    const auto back = readCircuit(writeCircuit(*result.value), "back.json");
                    CHECK_MESSAGE(back.ok(), (back.error ? back.error->describe() : ""));
                }
            }
        }
    }

    SUBCASE("every saved value pair keeps fuzz_value_parser's properties") {
        for (const auto& file : test_support::sourceFiles("fuzz/regressions/value_parser", "")) {
            CAPTURE(file);
            const std::string text = test_support::readTextFile(file);
            const std::size_t split = text.find('\n');
            const std::string a = text.substr(0, split);
            const std::string b = split == std::string::npos ? a : text.substr(split + 1);
            for (const std::string& value : {a, b}) {
                if (const auto quantity = parseQuantity(value)) {
                    CHECK(std::isfinite(quantity->magnitude));
                    CHECK_NOTHROW((void)formatIec(quantity->magnitude, true));
                }
                CHECK(sameValue(value, value));
            }
            CHECK(sameValue(a, b) == sameValue(b, a));
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
