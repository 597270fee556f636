// Resistor colour bands against the worked examples of the IEC 60062 colour code.
#include <doctest/doctest.h>

#include "netcheck/model/colour_code.hpp"

using namespace netcheck;
using enum BandColour;

namespace {

std::vector<BandColour> bands(double ohms, double tolerance) {
    const auto result = resistorBands(ohms, tolerance);
    REQUIRE(result.has_value());
    return *result;
}

}  // namespace

TEST_CASE("colour code") {
    SUBCASE("four-band worked examples") {
        // IEC 60062: brown-black-red-gold = 1 kΩ ±5 %
        CHECK(bands(1000, 5) == std::vector{Brown, Black, Red, Gold});
        // IEC 60062: yellow-violet-red-gold = 4.7 kΩ ±5 %
        CHECK(bands(4700, 5) == std::vector{Yellow, Violet, Red, Gold});
        // IEC 60062: red-red-orange-gold = 22 kΩ ±5 %
        CHECK(bands(22000, 5) == std::vector{Red, Red, Orange, Gold});
        // IEC 60062: yellow-violet-gold-gold = 4.7 Ω ±5 % (gold multiplier = ×0.1)
        CHECK(bands(4.7, 5) == std::vector{Yellow, Violet, Gold, Gold});
    }

    SUBCASE("five-band worked examples") {
        // IEC 60062: brown-black-black-brown-brown = 1 kΩ ±1 %
        CHECK(bands(1000, 1) == std::vector{Brown, Black, Black, Brown, Brown});
        // IEC 60062: brown-black-black-gold-brown = 10 Ω ±1 %
        CHECK(bands(10, 1) == std::vector{Brown, Black, Black, Gold, Brown});
    }

    SUBCASE("multiplier bands") {
        // IEC 60062: silver multiplier = ×0.01; pink = ×0.001 (2016 edition).
        CHECK(bands(0.47, 5) == std::vector{Yellow, Violet, Silver, Gold});
        CHECK(bands(0.1, 1) == std::vector{Brown, Black, Black, Pink, Brown});
        // IEC 60062: white multiplier = ×10^9, so 10 GΩ is the top of the two-figure code.
        CHECK(bands(10e9, 5) == std::vector{Brown, Black, White, Gold});
        CHECK_FALSE(resistorBands(100e9, 5).has_value());
    }

    SUBCASE("tolerance bands") {
        // IEC 60062: silver 10 %, none 20 % (no band), red 2 %, green 0.5 %, blue 0.25 %,
        // violet 0.1 %. Two figures for ±5 % and wider, three for ±2 % and tighter.
        CHECK(bands(4700, 10) == std::vector{Yellow, Violet, Red, Silver});
        CHECK(bands(4700, 20) == std::vector{Yellow, Violet, Red});
        CHECK(bands(4700, 2) == std::vector{Yellow, Violet, Black, Brown, Red});
        CHECK(bands(4700, 0.5).back() == Green);
        CHECK(bands(4700, 0.25).back() == Blue);
        CHECK(bands(4700, 0.1).back() == Violet);
        CHECK_FALSE(resistorBands(4700, 3).has_value());  // no colour for 3 %
    }

    SUBCASE("values that need more figures than the bands carry") {
        CHECK_FALSE(resistorBands(4750, 5).has_value());  // 475 needs three figures
        CHECK(bands(4750, 1) == std::vector{Yellow, Violet, Green, Brown, Brown});
        CHECK_FALSE(resistorBands(-1, 5).has_value());
    }

    SUBCASE("digit colours in order") {
        // IEC 60062: black 0, brown 1, red 2, orange 3, yellow 4, green 5, blue 6, violet 7,
        // grey 8, white 9.
        const std::vector<std::string_view> names{"black", "brown", "red",    "orange", "yellow",
                                                  "green", "blue",  "violet", "grey",   "white"};
        for (int digit = 0; digit <= 9; ++digit) {
            CAPTURE(digit);
            CHECK(bandName(static_cast<BandColour>(digit)) ==
                  names[static_cast<std::size_t>(digit)]);
            // A resistance of digit*10 + 1 ohms at 5 % begins with that digit's colour.
            if (digit > 0)
                CHECK(bands(digit * 10 + 1, 5).front() == static_cast<BandColour>(digit));
        }
    }
}
