// Tolerances, voltages and LED colours read from part values, as makers write them.
#include <doctest/doctest.h>

#include "netcheck/voltage/device_defaults.hpp"
#include "netcheck/voltage/value_reading.hpp"

using namespace netcheck;

TEST_CASE("value reading for bench voltages") {
    SUBCASE("tolerance") {
        CHECK(toleranceInValue("10k 1%") == doctest::Approx(0.01));
        CHECK(toleranceInValue("4k7 0.1 %") == doctest::Approx(0.001));
        CHECK_FALSE(toleranceInValue("10k"));
        CHECK(withoutTolerance("10k 1%") == "10k");
        CHECK(withoutTolerance("10k 5 %") == "10k");
        CHECK(withoutTolerance("10k") == "10k");
    }
    SUBCASE("voltage") {
        CHECK(voltageInValue("9V") == doctest::Approx(9));
        CHECK(voltageInValue("9 V") == doctest::Approx(9));
        CHECK(voltageInValue("12V DC") == doctest::Approx(12));
        CHECK(voltageInValue("3V3") == doctest::Approx(3.3));
        CHECK(voltageInValue("4.5V") == doctest::Approx(4.5));
        CHECK(voltageInValue("BZX55C5V1") == doctest::Approx(5.1));
        CHECK(voltageInValue("-5V") == doctest::Approx(-5));
        CHECK_FALSE(voltageInValue("2.1 mm"));
        CHECK_FALSE(voltageInValue("5Vrms"));
        CHECK_FALSE(voltageInValue(""));
    }
    SUBCASE("LED colour (common practice figures)") {
        CHECK(ledColour("red 5 mm")->forwardVolts == doctest::Approx(1.9));
        CHECK(ledColour("Green 3mm")->colour == "green");
        CHECK(ledColour("white")->forwardVolts == doctest::Approx(3.1));
        CHECK_FALSE(ledColour("5 mm"));
    }
    SUBCASE("regulators and transistor polarity by part number") {
        CHECK(regulatorDefaults("7805")->volts == doctest::Approx(5));
        CHECK(regulatorDefaults("78L09")->volts == doctest::Approx(9));
        CHECK(regulatorDefaults("LM7912")->volts == doctest::Approx(-12));
        CHECK(regulatorDefaults("AMS1117-3.3")->volts == doctest::Approx(3.3));
        CHECK(regulatorDefaults("LM1117 3V3")->volts == doctest::Approx(3.3));
        CHECK_FALSE(regulatorDefaults("LM317"));
        CHECK(bjtIsPnp("BC557B") == true);
        CHECK(bjtIsPnp("2N3904") == false);
        CHECK_FALSE(bjtIsPnp("TIP31"));
        CHECK(fetIsPChannel("J201", true) == false);
        CHECK(fetIsPChannel("BS250", false) == true);
    }
}
