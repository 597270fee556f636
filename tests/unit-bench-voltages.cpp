// Expected bench voltages: small circuits whose operating point can be worked by hand (the hand
// calculation is in each comment), textbook examples, tolerance ranges, nets with no figure, bad
// circuits, probe holes. The in-process results are checked against ngspice's own batch run in
// unit-bench-voltages-ngspice.cpp.
#include <doctest/doctest.h>

#include <cmath>

#include "netcheck/file/board_file.hpp"
#include "netcheck/voltage/bench_voltages.hpp"
#include "netcheck/voltage/voltage_report.hpp"
#include "test_support.hpp"
#include "voltage_support.hpp"

using namespace netcheck;
using voltage_support::boardWith;
using voltage_support::circuitOf;
using voltage_support::net;

namespace {

BenchVoltages computed(const Circuit& circuit, BenchOptions options = {}) {
    const Board board = boardWith(circuit);
    BenchVoltagesResult result = computeBenchVoltages(board, nullptr, options);
    INFO(result.error);
    REQUIRE(result.value);
    return *result.value;
}

// A supply written "9V 0%" is taken as exact, so the ranges are the resistors' alone.
Circuit divider(const std::string& top, const std::string& bottom, const std::string& supply = "9V 0%") {
    return circuitOf({{"BT1", "battery", supply, {"+", "-"}},
                      {"R1", "resistor", top, {"1", "2"}},
                      {"R2", "resistor", bottom, {"1", "2"}}},
                     {{"VCC", {"BT1.+", "R1.1"}}, {"MID", {"R1.2", "R2.1"}},
                      {"GND", {"BT1.-", "R2.2"}}});
}

}  // namespace

TEST_CASE("bench voltages") {
    SUBCASE("a divider, with corner ranges worked by hand") {
        // 9 V across 10k over 10k: 4.5 V. Extremes at 5 %: 9 * 9.5 / (9.5 + 10.5) = 4.275 V and
        // 9 * 10.5 / (10.5 + 9.5) = 4.725 V; two parameters, so every corner is run.
        const BenchVoltages voltages = computed(divider("10k", "10k"));
        CHECK(voltages.ground == "GND");
        CHECK(voltages.nets.front().net == "GND");
        CHECK(net(voltages, "VCC").nominal == doctest::Approx(9.0).epsilon(1e-6));
        const NetReading& mid = net(voltages, "MID");
        CHECK(mid.state == NetState::Known);
        CHECK(mid.nominal == doctest::Approx(4.5).epsilon(1e-6));
        CHECK(mid.low == doctest::Approx(4.275).epsilon(1e-6));
        CHECK(mid.high == doctest::Approx(4.725).epsilon(1e-6));
        CHECK(voltages.method.rfind("corners: 4 runs", 0) == 0);
    }
    SUBCASE("a supply's own tolerance, worked by hand") {
        // Exact resistors, so MID is half the supply: a battery is 9 V +-10 % over its life
        // (common practice): 4.05 to 4.95 V; a tolerance in the value wins: 9 V +-5 %: 4.275 to
        // 4.725 V; a DC jack +-5 % (common practice) at 12 V: 5.7 to 6.3 V; a "V" override is
        // taken as measured: no range at all.
        const auto mid = [](const Circuit& circuit) { return net(computed(circuit), "MID"); };
        const NetReading battery = mid(divider("10k 0%", "10k 0%", "9V"));
        CHECK(battery.low == doctest::Approx(4.05).epsilon(1e-6));
        CHECK(battery.high == doctest::Approx(4.95).epsilon(1e-6));
        const NetReading written = mid(divider("10k 0%", "10k 0%", "9V 5%"));
        CHECK(written.low == doctest::Approx(4.275).epsilon(1e-6));
        CHECK(written.high == doctest::Approx(4.725).epsilon(1e-6));
        Circuit adapter = divider("10k 0%", "10k 0%", "12V");
        adapter.parts["BT1"].kind = "dc-jack";
        const NetReading jack = mid(adapter);
        CHECK(jack.low == doctest::Approx(5.7).epsilon(1e-6));
        CHECK(jack.high == doctest::Approx(6.3).epsilon(1e-6));
        Circuit measured = divider("10k 0%", "10k 0%", "9V");
        measured.parts["BT1"].extra["spice_model"] = {{"V", 9.3}};
        const NetReading exact = mid(measured);
        CHECK(exact.nominal == doctest::Approx(4.65).epsilon(1e-6));
        CHECK(exact.low == doctest::Approx(4.65).epsilon(1e-6));
        CHECK(exact.high == doctest::Approx(4.65).epsilon(1e-6));
    }
    SUBCASE("the range contains the nominal and widens with the tolerance") {
        const BenchVoltages tight = computed(divider("10k 1%", "22k 1%"));
        const BenchVoltages loose = computed(divider("10k 10%", "22k 10%"));
        for (const BenchVoltages* v : {&tight, &loose}) {
            const NetReading& mid = net(*v, "MID");
            CHECK(mid.low <= mid.nominal);
            CHECK(mid.nominal <= mid.high);
        }
        // 9 * 22 / 32 = 6.1875 V either way; the width grows with the tolerance.
        CHECK(net(tight, "MID").nominal == doctest::Approx(6.1875).epsilon(1e-6));
        const double tightWidth = net(tight, "MID").high - net(tight, "MID").low;
        const double looseWidth = net(loose, "MID").high - net(loose, "MID").low;
        CHECK(tightWidth > 0);
        CHECK(looseWidth > 5 * tightWidth);
    }
    SUBCASE("Monte Carlo: fixed seed, contains the nominal, widens with the spreads") {
        // Nine resistors: more parameters than corners allow, so the ranges are Monte Carlo.
        Circuit ladder = circuitOf({{"BT1", "battery", "12V 0%", {"+", "-"}}}, {});
        ladder.nets["GND"].push_back({"BT1", "-"});
        std::string previous = "BT1.+";
        for (int i = 1; i <= 9; ++i) {
            const std::string ref = "R" + std::to_string(i);
            ladder.parts[ref] = CircuitPart{"resistor", "1k", {"1", "2"}, nlohmann::json::object()};
            ladder.nets["N" + std::to_string(i)].push_back(*PinRef::parse(previous));
            ladder.nets["N" + std::to_string(i)].push_back({ref, "1"});
            previous = ref + ".2";
        }
        ladder.nets["GND"].push_back(*PinRef::parse(previous));
        BenchOptions options;
        options.tolerance.monteCarloRuns = 60;  // enough to show the behaviour, quick under ASan
        const BenchVoltages first = computed(ladder, options);
        const BenchVoltages again = computed(ladder, options);
        options.tolerance.toleranceScale = 2;
        const BenchVoltages wider = computed(ladder, options);
        CHECK(first.method.rfind("Monte Carlo: 60 runs, seed 1", 0) == 0);
        // N5 is the fifth node from the top: 12 V * 5 / 9 = 6.667 V.
        const NetReading& n5 = net(first, "N5");
        CHECK(n5.nominal == doctest::Approx(12.0 * 5 / 9).epsilon(1e-6));
        CHECK(n5.low < n5.nominal);
        CHECK(n5.high > n5.nominal);
        // Never past the worst case: 12 * 5 * 1.05 / (5 * 1.05 + 4 * 0.95) = 6.961 V.
        CHECK(n5.high < 6.961);
        CHECK(net(again, "N5").low == n5.low);
        CHECK(net(again, "N5").high == n5.high);
        CHECK(net(wider, "N5").high - net(wider, "N5").low > 1.5 * (n5.high - n5.low));
    }
    SUBCASE("textbook: voltage-divider bias of a BJT stage") {
        // Boylestad and Nashelsky, Electronic Devices and Circuit Theory, Example 4.8 (exact
        // analysis of voltage-divider bias; figures from memory): VCC 22 V, R1 39k, R2 3.9k,
        // RC 10k, RE 1.5k, beta 140. The book gives IC about 0.85 mA and VCE about 12.22 V.
        // By hand: RTh = 39k || 3.9k = 3.5455k, ETh = 22 * 3.9 / 42.9 = 2.000 V,
        // IB = (2.000 - 0.7) / (3.5455k + 141 * 1.5k) = 6.045 uA, IC = 140 IB = 0.8463 mA,
        // VE = 141 IB * 1.5k = 1.279 V, VB = VE + 0.7 = 1.979 V, VC = 22 - IC * 10k = 13.54 V.
        // The model is set to match the book's assumptions: beta 140 and VBE 0.70 V at 0.846 mA
        // (IS = 0.846 mA / exp(0.7 / 25.865 mV) = 1.49e-15 A).
        const Circuit stage = circuitOf(
            {{"BT1", "battery", "22V", {"+", "-"}},
             {"R1", "resistor", "39k", {"1", "2"}},
             {"R2", "resistor", "3k9", {"1", "2"}},
             {"RC", "resistor", "10k", {"1", "2"}},
             {"RE", "resistor", "1k5", {"1", "2"}},
             {"Q1", "bjt", "BC547", {"C", "B", "E"}, {{"BF", 140}, {"IS", 1.49e-15}}}},
            {{"VCC", {"BT1.+", "R1.1", "RC.1"}},
             {"B", {"R1.2", "R2.1", "Q1.B"}},
             {"C", {"RC.2", "Q1.C"}},
             {"E", {"Q1.E", "RE.1"}},
             {"GND", {"BT1.-", "R2.2", "RE.2"}}});
        const BenchVoltages voltages = computed(stage);
        CHECK(net(voltages, "B").nominal == doctest::Approx(1.979).epsilon(0.01));
        CHECK(net(voltages, "E").nominal == doctest::Approx(1.279).epsilon(0.015));
        CHECK(net(voltages, "C").nominal == doctest::Approx(13.54).epsilon(0.005));
        // VCE against the book's 12.22 V (graphical rounding in the book: 0.1 V).
        CHECK(net(voltages, "C").nominal - net(voltages, "E").nominal ==
              doctest::Approx(12.22).epsilon(0.01));
        CHECK(net(voltages, "C").low < net(voltages, "C").nominal);
    }
    SUBCASE("textbook: self-biased JFET stage") {
        // Boylestad and Nashelsky, Electronic Devices and Circuit Theory, Example 7.2 (self-bias;
        // figures from memory): IDSS 8 mA, VP -6 V, RS 1k, RD 3.3k, RG 1M, VDD 20 V. The book
        // reads ID = 2.6 mA and VGS = -2.6 V off the graph, VD = 11.42 V.
        // By hand, with x = ID in mA: x = 8 (1 - x / 6)^2 -> 2x^2 - 33x + 72 = 0 -> x = 2.5875
        // (the other root, 13.9, puts VGS below VP). VD = 20 - 3.3 * 2.5875 = 11.461 V,
        // VS = 2.5875 V.
        const Circuit stage = circuitOf(
            {{"BT1", "battery", "20V", {"+", "-"}},
             {"RD", "resistor", "3k3", {"1", "2"}},
             {"RS", "resistor", "1k", {"1", "2"}},
             {"RG", "resistor", "1M", {"1", "2"}},
             {"Q1", "jfet", "2N5457", {"D", "G", "S"}, {{"IDSS", "8m"}, {"VP", -6}}}},
            {{"VDD", {"BT1.+", "RD.1"}},
             {"D", {"RD.2", "Q1.D"}},
             {"G", {"Q1.G", "RG.1"}},
             {"S", {"Q1.S", "RS.1"}},
             {"GND", {"BT1.-", "RG.2", "RS.2"}}});
        const BenchVoltages voltages = computed(stage);
        CHECK(std::abs(net(voltages, "D").nominal - 11.461) < 1e-3);
        CHECK(std::abs(net(voltages, "S").nominal - 2.5875) < 1e-3);
        CHECK(std::abs(net(voltages, "G").nominal) < 1e-3);
        CHECK(std::abs(net(voltages, "D").nominal - 11.42) < 0.1);
    }
    SUBCASE("LED by colour, zener by value, regulator with dropout") {
        // Red LED (1.9 V at 10 mA, common practice) through 470R from 9 V: about 15 mA, so
        // 1.9 + 2 * 25.865 mV * ln(1.5) = 1.921 V (emission coefficient 2).
        // Zener 5V1 through 1k from 9 V: 3.9 mA, a little under its 5 mA test current: ~5.1 V.
        // 7805 from 9 V: 5 V; from 6 V it drops out: 6 - 2 = 4 V.
        const Circuit circuit = circuitOf(
            {{"BT1", "battery", "9V 0%", {"+", "-"}},
             {"BT2", "battery", "6V 0%", {"+", "-"}},
             {"R1", "resistor", "470R", {"1", "2"}},
             {"LED1", "led", "red 5 mm", {"A", "K"}},
             {"R2", "resistor", "1k", {"1", "2"}},
             {"D1", "zener", "BZX55C5V1", {"A", "K"}},
             {"U1", "regulator", "7805", {"IN", "GND", "OUT"}},
             {"U2", "regulator", "L7805CV", {"IN", "GND", "OUT"}},
             {"R3", "resistor", "1k", {"1", "2"}},
             {"R4", "resistor", "1k", {"1", "2"}}},
            {{"VCC", {"BT1.+", "R1.1", "R2.1", "U1.IN"}},
             {"V6", {"BT2.+", "U2.IN"}},
             {"ANODE", {"R1.2", "LED1.A"}},
             {"ZENER", {"R2.2", "D1.K"}},
             {"OUT1", {"U1.OUT", "R3.1"}},
             {"OUT2", {"U2.OUT", "R4.1"}},
             {"GND", {"BT1.-", "BT2.-", "LED1.K", "D1.A", "U1.GND", "U2.GND", "R3.2", "R4.2"}}});
        const BenchVoltages voltages = computed(circuit);
        CHECK(net(voltages, "ANODE").nominal == doctest::Approx(1.921).epsilon(0.003));
        CHECK(net(voltages, "ZENER").nominal == doctest::Approx(5.1).epsilon(0.01));
        CHECK(net(voltages, "OUT1").nominal == doctest::Approx(5.0).epsilon(1e-4));
        CHECK(net(voltages, "OUT2").nominal == doctest::Approx(4.0).epsilon(1e-4));
        // 78xx output +-4 %: 4.8 to 5.2 V.
        CHECK(net(voltages, "OUT1").low == doctest::Approx(4.8).epsilon(1e-4));
        CHECK(net(voltages, "OUT1").high == doctest::Approx(5.2).epsilon(1e-4));
    }
    SUBCASE("a pot at mid-travel, linear and log") {
        // 10k linear at mid-travel from 10 V: 5 V at the wiper. Log (10 % at mid-travel): 1 V.
        const auto potCircuit = [](const std::string& value) {
            return circuitOf({{"BT1", "battery", "10V", {"+", "-"}},
                              {"VR1", "pot", value, {"1", "2", "3"}}},
                             {{"TOP", {"BT1.+", "VR1.3"}}, {"W", {"VR1.2"}},
                              {"GND", {"BT1.-", "VR1.1"}}});
        };
        CHECK(net(computed(potCircuit("B10k")), "W").nominal == doctest::Approx(5.0).epsilon(1e-6));
        CHECK(net(computed(potCircuit("10k log")), "W").nominal ==
              doctest::Approx(10.0 * 9 / 99).epsilon(1e-6));
    }
}

TEST_CASE("bench voltages: no figure where the tool cannot know") {
    SUBCASE("nets on an IC's pins, and nets joined only by capacitors") {
        // flasher.board.json: a 555 flasher. The 555 has no model: its pins' nets get no figure;
        // VCC and GND are held by the battery.
        const std::string path = test_support::sourcePath("samples/flasher.board.json");
        const auto board = readBoard(test_support::readTextFile(path), path);
        REQUIRE(board.ok());
        BenchOptions options;
        options.ranges = false;
        const auto result = computeBenchVoltages(*board.value, nullptr, options);
        REQUIRE(result.value);
        const BenchVoltages& v = *result.value;
        CHECK(net(v, "VCC").state == NetState::Known);
        CHECK(net(v, "VCC").nominal == doctest::Approx(9.0));
        for (const char* name : {"DIS", "THR", "CV", "OUT"}) {
            CAPTURE(name);
            CHECK(net(v, name).state == NetState::Unknown);
            CHECK(net(v, name).why.find("U1") != std::string::npos);
        }
        // The LED's anode net hangs between the 555's output (unknown) and an LED carrying no
        // current: no figure either.
        CHECK(net(v, "LED").state != NetState::Known);
        bool noted = false;
        for (const std::string& note : v.notes) noted = noted || note.rfind("U1 (ic", 0) == 0;
        CHECK(noted);
    }
    SUBCASE("an op-amp stage: the reference divider is known, the output only through C") {
        const std::string path = test_support::sourcePath("samples/headphone-amp.board.json");
        const auto board = readBoard(test_support::readTextFile(path), path);
        REQUIRE(board.ok());
        BenchOptions options;
        options.ranges = false;
        options.models.supplyVolts = 9;
        const auto result = computeBenchVoltages(*board.value, nullptr, options);
        REQUIRE(result.value);
        // 9 V over 10k / 10k: 4.5 V, the op-amp's inputs drawing no current.
        CHECK(net(*result.value, "VREF").nominal == doctest::Approx(4.5).epsilon(1e-6));
        CHECK(net(*result.value, "VREF").state == NetState::Known);
        CHECK(net(*result.value, "OUT").state == NetState::Unknown);
        CHECK(net(*result.value, "HP").state == NetState::NoDcPath);
    }
    SUBCASE("no supply voltage, no supply, no ground: clear errors") {
        const std::string path = test_support::sourcePath("samples/headphone-amp.board.json");
        const auto board = readBoard(test_support::readTextFile(path), path);
        REQUIRE(board.ok());
        const auto noVolts = computeBenchVoltages(*board.value, nullptr, {});
        CHECK_FALSE(noVolts.value);
        CHECK(noVolts.error.find("J3") != std::string::npos);
        CHECK(noVolts.error.find("--supply") != std::string::npos);

        const Circuit noSupply = circuitOf({{"R1", "resistor", "1k", {"1", "2"}}},
                                           {{"A", {"R1.1"}}, {"GND", {"R1.2"}}});
        const auto none = computeBenchVoltages(boardWith(noSupply), nullptr, {});
        CHECK_FALSE(none.value);
        CHECK(none.error.find("no supply") != std::string::npos);

        const Circuit noGround = circuitOf(
            {{"BT1", "battery", "9V", {"+", "-"}}, {"R1", "resistor", "1k", {"1", "2"}}},
            {{"A", {"BT1.+", "R1.1"}}});
        const auto floating = computeBenchVoltages(boardWith(noGround), nullptr, {});
        CHECK_FALSE(floating.value);
        CHECK(floating.error.find("no ground") != std::string::npos);
    }
}

TEST_CASE("bench voltages: probe holes") {
    // A 3 x 8 strip board: BT1 off the board wired to strips A (+) and C (-); R1 from A3 to B3,
    // R2 from B6 to C6. Strip B's free ends are B1 and B8, both at an edge: B1 (lower row and
    // column first). Strip A: A1 is free and at the edge.
    const std::string text = R"({
      "format": "stripsmith-board", "version": 1, "title": "probe",
      "board": {"rows": 3, "cols": 8, "pitch_mm": 2.54, "copper": "strips"},
      "cuts": [],
      "parts": [
        {"ref": "R1", "kind": "resistor", "value": "10k", "pins": {"1": "A3", "2": "B3"}},
        {"ref": "R2", "kind": "resistor", "value": "10k", "pins": {"1": "B6", "2": "C6"}}
      ],
      "links": [],
      "offboard": [{"ref": "BT1", "kind": "battery", "value": "9V", "pins": ["+", "-"]}],
      "wires": [{"from": "BT1.+", "to": "A8", "color": "red"},
                {"from": "BT1.-", "to": "C8", "color": "black"}]
    })";
    const auto board = readBoard(text, "probe.board.json");
    REQUIRE(board.ok());
    const auto result = computeBenchVoltages(*board.value, nullptr, {});
    REQUIRE(result.value);
    bool sawMiddle = false;
    for (const NetReading& reading : result.value->nets) {
        CAPTURE(reading.net);
        if (reading.nominal > 1 && reading.nominal < 8) {
            sawMiddle = true;
            CHECK(reading.probe == "B1");
            CHECK(reading.nominal == doctest::Approx(4.5).epsilon(1e-6));
        } else if (reading.nominal > 8) {
            CHECK(reading.probe == "A1");  // A8 holds the red wire
        } else {
            CHECK(reading.probe == "C1");
        }
    }
    CHECK(sawMiddle);
    const std::string report = formatBenchVoltagesText(*result.value);
    CHECK(report.find("extra-low-voltage") != std::string::npos);
    CHECK(report.find("bridging two strips") != std::string::npos);
    CHECK(benchVoltagesJson(*result.value)["nets"].size() == 3);
}
