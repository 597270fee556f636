// The JFET bias helper against Shockley's equation worked by hand, a textbook example, IEC 60063
// preferred values, and its own inverse (two bench readings back to IDSS and VP).
#include <doctest/doctest.h>

#include <cmath>

#include "netcheck/voltage/jfet_bias.hpp"
#include "netcheck/voltage/preferred_values.hpp"

using namespace netcheck;

TEST_CASE("preferred values") {
    SUBCASE("the IEC 60063 tables") {
        // IEC 60063, as listed in REFERENCE-FACTS.
        const std::vector<double> e12{1.0, 1.2, 1.5, 1.8, 2.2, 2.7, 3.3, 3.9, 4.7, 5.6, 6.8, 8.2};
        const std::vector<double> e24{1.0, 1.1, 1.2, 1.3, 1.5, 1.6, 1.8, 2.0, 2.2, 2.4, 2.7, 3.0,
                                      3.3, 3.6, 3.9, 4.3, 4.7, 5.1, 5.6, 6.2, 6.8, 7.5, 8.2, 9.1};
        const auto table12 = decadeValues(PreferredSeries::E12);
        const auto table24 = decadeValues(PreferredSeries::E24);
        CHECK(std::vector<double>(table12.begin(), table12.end()) == e12);
        CHECK(std::vector<double>(table24.begin(), table24.end()) == e24);
    }
    SUBCASE("neighbours either side") {
        const auto e12 = preferredNeighbours(761.4, PreferredSeries::E12);
        REQUIRE(e12);
        CHECK(e12->below == doctest::Approx(680));
        CHECK(e12->above == doctest::Approx(820));
        const auto e24 = preferredNeighbours(761.4, PreferredSeries::E24);
        CHECK(e24->below == doctest::Approx(750));
        CHECK(e24->above == doctest::Approx(820));
        // A preferred value is its own neighbour on both sides; decade edges.
        const auto exact = preferredNeighbours(4700, PreferredSeries::E12);
        CHECK(exact->below == doctest::Approx(4700));
        CHECK(exact->above == doctest::Approx(4700));
        const auto top = preferredNeighbours(9.5, PreferredSeries::E24);
        CHECK(top->below == doctest::Approx(9.1));
        CHECK(top->above == doctest::Approx(10));
        const auto bottom = preferredNeighbours(0.99, PreferredSeries::E12);
        CHECK(bottom->below == doctest::Approx(0.82));
        CHECK(bottom->above == doctest::Approx(1.0));
        CHECK_FALSE(preferredNeighbours(0, PreferredSeries::E12));
        CHECK_FALSE(preferredNeighbours(-5, PreferredSeries::E12));
    }
}

TEST_CASE("JFET bias") {
    // Boylestad and Nashelsky, Electronic Devices and Circuit Theory, Example 7.2 (self-bias;
    // figures from memory): IDSS 8 mA, VP -6 V, RS 1k, RD 3.3k, VDD 20 V.
    const JfetDevice device{8e-3, -6.0};
    const JfetStage stage{20.0, 3300.0};

    SUBCASE("the bias with a given source resistor (Shockley by hand)") {
        // x = ID in mA: x = 8 (1 - x / 6)^2 -> 2x^2 - 33x + 72 = 0 -> x = (33 - sqrt(513)) / 4
        // = 2.5875; VGS = -2.5875 V, VD = 20 - 3.3 x = 11.461 V; the book reads 2.6 mA and
        // -2.6 V off its graph. Headroom: up 20 - 11.461 = 8.539 V; down 11.461 - (2.5875 + 6)
        // = 2.874 V.
        const JfetBias bias = biasWith(device, stage, 1000);
        const double x = (33 - std::sqrt(513.0)) / 4;
        CHECK(bias.drainCurrent * 1e3 == doctest::Approx(x).epsilon(1e-9));
        CHECK(bias.gateSource == doctest::Approx(-x).epsilon(1e-9));
        CHECK(bias.drain == doctest::Approx(20 - 3.3 * x).epsilon(1e-9));
        CHECK(bias.drainCurrent * 1e3 == doctest::Approx(2.6).epsilon(0.02));
        CHECK(bias.headroomUp == doctest::Approx(3.3 * x).epsilon(1e-9));
        CHECK(bias.headroomDown == doctest::Approx(20 - 3.3 * x - x - 6).epsilon(1e-9));
        // No source resistor: ID = IDSS.
        CHECK(biasWith(device, stage, 0).drainCurrent == doctest::Approx(8e-3));
    }
    SUBCASE("the source resistor for a target drain voltage") {
        // Target VD 10 V: ID = (20 - 10) / 3.3k = 3.0303 mA;
        // VGS = VP (1 - sqrt(ID / IDSS)) = -6 (1 - sqrt(0.378788)) = -6 (1 - 0.615457) = -2.30726 V;
        // RS = 2.30726 / 3.0303 mA = 761.40 ohm. E12 either side: 680 and 820; E24: 750 and 820.
        const JfetAdviceResult result = sourceResistorFor(device, stage, 10.0);
        REQUIRE(result.advice);
        const SourceResistorAdvice& advice = *result.advice;
        CHECK(advice.exact.sourceResistor == doctest::Approx(761.40).epsilon(1e-4));
        CHECK(advice.exact.drain == doctest::Approx(10.0).epsilon(1e-9));
        REQUIRE(advice.preferred.size() == 4);
        CHECK(advice.preferred[0].bias.sourceResistor == doctest::Approx(680));
        CHECK(advice.preferred[1].bias.sourceResistor == doctest::Approx(820));
        CHECK(advice.preferred[2].bias.sourceResistor == doctest::Approx(750));
        CHECK(advice.preferred[3].bias.sourceResistor == doctest::Approx(820));
        // A smaller RS lets more current through: the drain sits lower.
        CHECK(advice.preferred[0].bias.drain < 10.0);
        CHECK(advice.preferred[1].bias.drain > 10.0);
        // The round trip: the exact resistor gives back the textbook example's 1k for its VD.
        const auto back = sourceResistorFor(device, stage, 20 - 3.3 * (33 - std::sqrt(513.0)) / 4);
        REQUIRE(back.advice);
        CHECK(back.advice->exact.sourceResistor == doctest::Approx(1000).epsilon(1e-9));
    }
    SUBCASE("targets no self-bias reaches") {
        // VD 1 V needs 19 / 3.3k = 5.76 mA: fine. VD 0.5 V would need 5.9 mA: also below IDSS;
        // with RD 1k, VD 10 V needs 10 mA > IDSS 8 mA: impossible.
        CHECK(sourceResistorFor(device, {20.0, 1000.0}, 10.0).error.find("IDSS") !=
              std::string::npos);
        CHECK_FALSE(sourceResistorFor(device, stage, 25.0).advice);
        CHECK_FALSE(sourceResistorFor({8e-3, 2.0}, stage, 10.0).advice);
    }
    SUBCASE("two bench readings give back IDSS and VP") {
        // Readings made with the device above and RS 1k and 2k2 (computed by the forward law),
        // then solved back: sqrt(ID) = s - t VGS for both, s = sqrt(IDSS), t = s / VP.
        const DrainReading first{1000, biasWith(device, stage, 1000).drain};
        const DrainReading second{2200, biasWith(device, stage, 2200).drain};
        const JfetEstimate estimate = estimateJfet(stage, first, second);
        REQUIRE(estimate.device);
        CHECK(estimate.device->idss == doctest::Approx(8e-3).epsilon(1e-9));
        CHECK(estimate.device->vp == doctest::Approx(-6.0).epsilon(1e-9));
        // By hand for rounded bench readings: VD 11.46 V with 1k, VD 14.5 V with 2k2 give
        // ID1 = 2.5879 mA, ID2 = 1.6667 mA, VGS1 = -2.5879 V, VGS2 = -3.6667 V.
        const JfetEstimate bench = estimateJfet(stage, {1000, 11.46}, {2200, 14.5});
        REQUIRE(bench.device);
        const double id1 = 8.54 / 3300, id2 = 5.5 / 3300;
        const double t = (std::sqrt(id1) - std::sqrt(id2)) / (-id2 * 2200 + id1 * 1000);
        const double s = std::sqrt(id1) + t * -id1 * 1000;
        CHECK(bench.device->idss == doctest::Approx(s * s).epsilon(1e-9));
        CHECK(bench.device->vp == doctest::Approx(s / t).epsilon(1e-9));
        // Readings that do not fit the law (more current with the larger resistor), or the same
        // gate-source voltage twice.
        CHECK_FALSE(estimateJfet(stage, {1000, 14.5}, {2200, 11.46}).device);
        CHECK_FALSE(estimateJfet(stage, {1000, 12.0}, {1000, 12.0}).device);
    }
}
