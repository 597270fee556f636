// The table of part kinds: every kind has the letters a new part of it is named with, one rule for
// all (a part is named by what it is: an LED is a diode), and the README's table is the table.
#include <doctest/doctest.h>

#include <string>

#include "netcheck/model/part_kinds.hpp"
#include "test_support.hpp"

using namespace netcheck;

TEST_CASE("part kinds") {
    SUBCASE("every kind has reference letters") {
        for (const PartKind& kind : partKinds()) {
            CAPTURE(kind.name);
            CHECK_FALSE(kind.refPrefix.empty());
            for (char c : kind.refPrefix) CHECK((c >= 'A' && c <= 'Z'));
        }
    }
    SUBCASE("LEDs are diodes: D, on the board and on the panel (common practice)") {
        REQUIRE(findPartKind("led") != nullptr);
        REQUIRE(findPartKind("panel-led") != nullptr);
        CHECK(findPartKind("led")->refPrefix == "D");
        CHECK(findPartKind("panel-led")->refPrefix == findPartKind("diode")->refPrefix);
        CHECK(findPartKind("zener")->refPrefix == "D");
    }
    SUBCASE("the README's table of part kinds is the table") {
        const std::string readme = test_support::readTextFile(test_support::sourcePath("README.md"));
        for (const PartKind& kind : partKinds()) {
            const std::string prefix(kind.refPrefix);
            const std::string row = "| `" + std::string(kind.name) + "` | " + std::string(kind.label) + " |";
            const std::string named = "| " + prefix + "1, " + prefix + "2, ... |";
            CAPTURE(row);
            const auto at = readme.find(row);
            REQUIRE(at != std::string::npos);
            const auto end = readme.find('\n', at);
            CHECK(readme.substr(at, end - at).find(named) != std::string::npos);
            CHECK(readme.substr(at, end - at).find(kind.offboard ? "| off |" : "| on |") != std::string::npos);
        }
    }
}
