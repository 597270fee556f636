// Component values: IEC 60062 letter-and-digit codes, SI forms, pot tapers, comparison, formatting.
#include <doctest/doctest.h>

#include <algorithm>
#include <cmath>

#include "netcheck/model/value.hpp"

using namespace netcheck;

namespace {

double magnitude(std::string_view text) {
    const auto quantity = parseQuantity(text);
    REQUIRE_MESSAGE(quantity.has_value(), text);
    return quantity->magnitude;
}

// Relative comparison: doctest::Approx adds an absolute margin that would hide picofarad errors.
bool near(double actual, double expected) {
    return std::fabs(actual - expected) <= 1e-9 * std::max(std::fabs(actual), std::fabs(expected));
}

std::string taper(std::string_view text) {
    const auto quantity = parseQuantity(text);
    REQUIRE_MESSAGE(quantity.has_value(), text);
    return quantity->taper;
}

// IEC 60063 E24 series (REFERENCE-FACTS: the table, since the rounded formula differs at 2.7,
// 3.0, 3.3, 3.6, 3.9, 4.3, 4.7 and 8.2).
constexpr double kE24[] = {1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0,
                           3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1};

}  // namespace

TEST_CASE("value parsing") {
    SUBCASE("IEC 60062 letter codes for resistance") {
        CHECK(near(magnitude("R47"), 0.47));     // IEC 60062: R47 = 0.47 Ω
        CHECK(near(magnitude("4R7"), 4.7));      // IEC 60062: 4R7 = 4.7 Ω
        CHECK(near(magnitude("470R"), 470));     // IEC 60062: 470R = 470 Ω
        CHECK(near(magnitude("4K7"), 4.7e3));    // IEC 60062: 4K7 = 4.7 kΩ
        CHECK(near(magnitude("47K3"), 47.3e3));  // IEC 60062: 47K3 = 47.3 kΩ
        CHECK(near(magnitude("4M7"), 4.7e6));    // IEC 60062: 4M7 = 4.7 MΩ
        CHECK(near(magnitude("2M2"), 2.2e6));    // IEC 60062: 2M2 = 2.2 MΩ
        CHECK(near(magnitude("4k7"), 4.7e3));    // lower-case k: common practice
    }

    SUBCASE("IEC 60062 letter codes for capacitance") {
        CHECK(near(magnitude("1p5"), 1.5e-12));  // IEC 60062: 1p5 = 1.5 pF
        CHECK(near(magnitude("4n7"), 4.7e-9));   // IEC 60062: 4n7 = 4.7 nF
        CHECK(near(magnitude("4µ7"), 4.7e-6));   // IEC 60062: 4µ7 = 4.7 µF
        CHECK(near(magnitude("4u7"), 4.7e-6));   // IEC 60062: 4u7 = 4.7 µF
        CHECK(near(magnitude("4μ7"), 4.7e-6));   // Greek mu typed for µ
    }

    SUBCASE("SI forms") {
        // SI prefixes (BIPM SI Brochure, table 7): k 1e3, M 1e6, m 1e-3, µ 1e-6, n 1e-9, p 1e-12.
        CHECK(near(magnitude("4.7k"), 4.7e3));
        CHECK(near(magnitude("4.7 kΩ"), 4.7e3));
        CHECK(near(magnitude("4700"), 4700));
        CHECK(near(magnitude("100nF"), 100e-9));
        CHECK(near(magnitude("0.1u"), 0.1e-6));
        CHECK(near(magnitude("0.1µF"), 0.1e-6));
        CHECK(near(magnitude("10 ohm"), 10));
        CHECK(near(magnitude("470 Ohms"), 470));
        CHECK(near(magnitude("1 MΩ"), 1e6));
        CHECK(near(magnitude("1 MΩ"), 1e6));  // U+2126 OHM SIGN
        CHECK(near(magnitude("2.2mH"), 2.2e-3));
        CHECK(near(magnitude("22 pF"), 22e-12));
        CHECK(near(magnitude("1meg"), 1e6));
        CHECK(near(magnitude(".5u"), 0.5e-6));
        CHECK(near(magnitude("4,7k"), 4.7e3));  // decimal comma
        CHECK(magnitude("0R") == 0);            // zero-ohm link
    }

    SUBCASE("in board files M is mega and m is milli") {
        // REFERENCE-FACTS: "In Stripsmith board files M means mega" (unlike SPICE).
        CHECK(near(magnitude("1M"), 1e6));
        CHECK(near(magnitude("1m"), 1e-3));
        CHECK(near(magnitude("4m7"), 4.7e-3));
    }

    SUBCASE("pot tapers are kept beside the resistance") {
        CHECK(near(magnitude("B100k"), 100e3));
        CHECK(taper("B100k") == "B");
        CHECK(taper("100kB") == "B");
        CHECK(taper("A10k") == "A");
        CHECK(near(magnitude("A10k"), 10e3));
        CHECK(taper("10k log") == "log");
        CHECK(taper("100k lin") == "lin");
        CHECK(taper("100k linear") == "linear");
        CHECK(taper("100k (log)") == "log");
        CHECK(taper("4k7").empty());
    }

    SUBCASE("text that is not a quantity") {
        for (const char* text : {"", " ", "k", "R", "abc", "4.7k7", "1.2.3", "4 7", "-5", "BC547",
                                 "1N4148", "NE555", "NPN general purpose", "100N", "4k7x"}) {
            CAPTURE(text);
            CHECK_FALSE(parseQuantity(text).has_value());
        }
    }
}

TEST_CASE("value comparison") {
    SUBCASE("equal values written differently") {
        // Board file rules: 4k7 = 4.7k = 4700 = 4.7 kΩ; 100n = 0.1u = 100nF; R47 = 0.47.
        CHECK(sameValue("4k7", "4.7k"));
        CHECK(sameValue("4k7", "4700"));
        CHECK(sameValue("4.7k", "4.7 kΩ"));
        CHECK(sameValue("4K7", "4k7"));
        CHECK(sameValue("100n", "0.1u"));
        CHECK(sameValue("100n", "100nF"));
        CHECK(sameValue("0.1µF", "100nF"));
        CHECK(sameValue("R47", "0.47"));
        CHECK(sameValue("1M", "1meg"));
        CHECK(sameValue("B100k", "100kB"));
        CHECK(sameValue("100k lin", "100k linear"));
        CHECK(sameValue("10k log", "10k audio"));
    }

    SUBCASE("different values") {
        CHECK_FALSE(sameValue("4k7", "47k"));
        CHECK_FALSE(sameValue("4k7", "4k75"));
        CHECK_FALSE(sameValue("100n", "10n"));
        CHECK_FALSE(sameValue("1M", "1m"));        // mega is not milli
        CHECK_FALSE(sameValue("B100k", "A100k"));  // taper differs
        CHECK_FALSE(sameValue("B100k", "100k"));   // taper missing
        CHECK_FALSE(sameValue("100k lin", "100k log"));
    }

    SUBCASE("type names compare as text, ignoring case and blanks around") {
        CHECK(sameValue("BC547", " bc547 "));
        CHECK_FALSE(sameValue("BC547", "BC548"));
        CHECK(sameValue("", ""));
    }
}

TEST_CASE("value formatting") {
    SUBCASE("IEC 60062 codes") {
        CHECK(formatIec(0.47, false) == "R47");  // IEC 60062: R47 = 0.47 Ω
        CHECK(formatIec(4.7, false) == "4R7");   // IEC 60062: 4R7 = 4.7 Ω
        CHECK(formatIec(470, false) == "470R");  // IEC 60062: 470R = 470 Ω
        CHECK(formatIec(4700, false) == "4k7");  // IEC 60062: 4K7 = 4.7 kΩ (k written lower case)
        CHECK(formatIec(47300, false) == "47k3");  // IEC 60062: 47K3 = 47.3 kΩ
        CHECK(formatIec(4.7e6, false) == "4M7");   // IEC 60062: 4M7 = 4.7 MΩ
        CHECK(formatIec(2.2e6, false) == "2M2");   // IEC 60062: 2M2 = 2.2 MΩ
        CHECK(formatIec(1.5e-12, true) == "1p5");  // IEC 60062: 1p5 = 1.5 pF
        CHECK(formatIec(4.7e-9, true) == "4n7");   // IEC 60062: 4n7 = 4.7 nF
        CHECK(formatIec(4.7e-6, true) == "4u7");   // IEC 60062: 4µ7 = 4.7 µF (ASCII u)
        CHECK(formatIec(1e-7, true) == "100n");
        CHECK(formatIec(1000, false) == "1k");
        CHECK(formatIec(0, false) == "0R");
    }

    SUBCASE("E24 values in every decade read back to themselves") {
        for (double base : kE24) {
            for (double decade = 0.1; decade <= 1e7; decade *= 10) {
                const double ohms = base * decade;
                const std::string code = formatIec(ohms, false);
                CAPTURE(code);
                CHECK(near(magnitude(code), ohms));
                CHECK(code.find('.') == std::string::npos);  // the letter is the decimal point
            }
            for (double decade = 1e-12; decade <= 1e-3; decade *= 10) {
                const double farads = base * decade;
                const std::string code = formatIec(farads, true);
                CAPTURE(code);
                CHECK(near(magnitude(code), farads));
                CHECK(code.find('.') == std::string::npos);
            }
        }
    }
}
