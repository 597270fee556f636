// SPICE export: export -> import gives the same circuit, for the sample circuits, for imported
// decks, for awkward names and values, and for random circuits (fixed seed). That ngspice parses
// the exports is checked in unit-spice-ngspice.cpp.
#include <doctest/doctest.h>

#include <algorithm>
#include <random>
#include <string>
#include <vector>

#include "netcheck/file/board_file.hpp"
#include "netcheck/model/part_kinds.hpp"
#include "netcheck/spice/spice_export.hpp"
#include "netcheck/spice/spice_import.hpp"
#include "test_support.hpp"

using netcheck::Circuit;
using netcheck::CircuitPart;
using netcheck::PinRef;

namespace {

/// The circuit as the importer states it: every part declares its pins (undeclared ones in the
/// order the nets name them, nets by name), pins sorted within each net, no empty nets.
Circuit normalised(Circuit circuit) {
    for (auto& [ref, part] : circuit.parts) {
        if (!part.pins.empty()) continue;
        for (const auto& [net, pins] : circuit.nets) {
            for (const PinRef& pin : pins) {
                if (pin.ref == ref) part.pins.push_back(pin.pin);
            }
        }
    }
    for (auto it = circuit.nets.begin(); it != circuit.nets.end();) {
        std::sort(it->second.begin(), it->second.end());
        it = it->second.empty() ? circuit.nets.erase(it) : std::next(it);
    }
    return circuit;
}

Circuit roundTrip(const Circuit& circuit) {
    const std::string deck = netcheck::exportSpice(circuit, "round trip");
    const auto result = netcheck::importSpice(deck, "export.cir", {});
    if (!result.ok()) FAIL("re-import failed: " << result.error->describe() << "\n" << deck);
    return *result.value;
}

void checkSameParts(const Circuit& expected, const Circuit& got) {
    CHECK(got.parts.size() == expected.parts.size());
    for (const auto& entry : expected.parts) {
        const std::string& ref = entry.first;  // CAPTURE takes a lambda: no structured binding
        const CircuitPart& part = entry.second;
        CAPTURE(ref);
        REQUIRE(got.parts.count(ref) == 1);
        const CircuitPart& back = got.parts.at(ref);
        CHECK(back.kind == part.kind);
        CHECK(back.value == part.value);
        CHECK(back.pins == part.pins);
    }
    CHECK(got.nets == expected.nets);
    CHECK(got == expected);
}

CircuitPart part(std::string kind, std::string value, std::vector<std::string> pins) {
    return CircuitPart{std::move(kind), std::move(value), std::move(pins),
                       nlohmann::json::object()};
}

}  // namespace

TEST_CASE("spice export round trip") {
    SUBCASE("the sample circuits") {
        const auto files = test_support::sourceFiles("samples", ".board.json");
        REQUIRE(files.size() >= 3);
        for (const std::string& file : files) {
            CAPTURE(file);
            const auto board = netcheck::readBoard(test_support::readTextFile(file), file);
            REQUIRE(board.ok());
            if (!board.value->circuit) continue;
            const Circuit expected = normalised(*board.value->circuit);
            checkSameParts(expected, roundTrip(*board.value->circuit));
        }
    }
    SUBCASE("imported decks") {
        std::vector<std::string> files = test_support::sourceFiles("samples/spice", ".cir");
        const auto more = test_support::sourceFiles("tests/spice/decks", ".cir");
        files.insert(files.end(), more.begin(), more.end());
        REQUIRE(files.size() >= 6);
        for (const std::string& file : files) {
            for (bool flatten : {false, true}) {
                CAPTURE(file);
                CAPTURE(flatten);
                netcheck::SpiceOptions options;
                options.flatten = flatten;
                const auto first =
                    netcheck::importSpice(test_support::readTextFile(file), file, options);
                REQUIRE(first.ok());
                checkSameParts(*first.value, roundTrip(*first.value));
            }
        }
    }
    SUBCASE("awkward names, values, kinds and unconnected pins") {
        Circuit c;
        c.parts["r1"] = part("resistor", "4.7 kOhm", {"1", "2"});
        c.parts["XTAL1"] = part("crystal", "16 MHz", {"1", "2"});
        c.parts["VR1"] = part("pot", "B100k", {"1", "2", "3"});
        c.parts["VR2"] =
            part("pot", "10k", {"1", "2", "3"});  // lugs 1 and 3 joined: not two resistors
        c.parts["C1"] = part("electrolytic", "100uF 25V", {"+", "-"});
        c.parts["LED1"] = part("led", "", {"A", "K"});
        c.parts["Q1"] = part("bjt", "BC547 B", {"C", "B", "E"});
        c.parts["Q2"] = part("bjt", "2N3904", {"C", "B", "E", "S"});
        c.parts["M1"] = part("mosfet", "BS170", {"D", "G", "S"});
        c.parts["M2"] = part("mosfet", "", {"D", "G", "S", "B"});
        c.parts["U1"] = part("ic", "TL072", {"1", "2", "3", "4", "5", "6", "7", "8"});
        c.parts["U2"] = part("regulator", "78L05", {"IN", "GND", "OUT"});
        c.parts["SW1"] = part("switch", "SPDT", {"1", "2", "3"});
        c.parts["J1"] = part("stereo-jack", "", {"T", "R", "S"});
        c.parts["G1"] = part("gizmo", "x", {"+", "-", "~"});
        c.parts["X1.R3"] = part("resistor", "1k", {"1", "2"});
        c.parts["D1"] = part("diode", "1N4148", {"A", "K"});
        c.parts["D2"] = part("zener", "5V1", {"A", "K"});
        c.parts["L1"] = part("inductor", "10uH", {"1", "2"});
        c.parts["C2"] = part("capacitor", "", {"1", "2"});  // no value: not a C element
        c.nets["V+"] = {{"r1", "1"}, {"U1", "8"}, {"M1", "D"}, {"VR2", "1"}, {"VR2", "3"}};
        c.nets["GND"] = {{"U1", "4"}, {"C1", "-"}, {"VR1", "1"}, {"M2", "B"}};
        c.nets["gnd"] = {{"LED1", "K"}, {"Q1", "E"}};
        c.nets["0"] = {{"Q2", "S"}};
        c.nets["out"] = {{"U1", "1"}, {"C1", "+"}, {"VR1", "3"}, {"J1", "T"}};
        c.nets["OUT"] = {{"r1", "2"}, {"VR1", "2"}, {"G1", "~"}};
        c.nets["X1.n1"] = {{"X1.R3", "1"}, {"XTAL1", "1"}, {"D1", "A"}, {"D2", "K"}};
        c.nets["a net with blanks"] = {{"L1", "1"}, {"C2", "2"}, {"SW1", "2"}, {"U2", "OUT"}};
        c.nets["lonely"] = {{"Q1", "C"}};
        checkSameParts(normalised(c), roundTrip(c));
        const std::string deck = netcheck::exportSpice(c, "awkward");
        CHECK(deck.find("*@pot VR1") != std::string::npos);
        CHECK(deck.find("*@pot VR2") == std::string::npos);
    }
    SUBCASE("parts without declared pins take the pins their nets name") {
        Circuit c;
        c.parts["R1"] = part("resistor", "1k", {});
        c.parts["U1"] = part("ic", "NE555", {});
        c.nets["A"] = {{"R1", "1"}, {"U1", "8"}};
        c.nets["B"] = {{"R1", "2"}, {"U1", "1"}};
        const Circuit back = roundTrip(c);
        CHECK(back.parts.at("U1").pins == std::vector<std::string>{"8", "1"});
        checkSameParts(normalised(c), back);
    }
    SUBCASE("random circuits (fixed seed)") {
        std::mt19937 random(20261201);
        const auto kinds = netcheck::partKinds();
        const std::vector<std::string> netNames = {
            "VCC", "GND", "gnd", "0", "OUT", "out", "V+", "N$3", "X1.n", "in put", "n1", "N1", "-"};
        const std::vector<std::string> values = {"",         "4k7",   "100n", "2M2",     "1u",
                                                 "BC547",    "TL072", "470R", "10k log", "A100k",
                                                 "red 5 mm", "1m",    "22pF", "NE555",   "1.5"};
        const std::vector<std::string> refStarts = {"R", "C",  "L",  "D", "Q", "J",   "M",  "X",
                                                    "U", "VR", "SW", "x", "r", "LED", "BT", "X1.R"};
        for (int round = 0; round < 300; ++round) {
            CAPTURE(round);
            Circuit c;
            const int partCount = 1 + static_cast<int>(random() % 8);
            for (int p = 0; p < partCount; ++p) {
                const netcheck::PartKind& kind = kinds[random() % kinds.size()];
                std::vector<std::string> pins(kind.pins.begin(), kind.pins.end());
                if (pins.empty()) {
                    for (unsigned i = 1; i <= 1 + random() % 6; ++i)
                        pins.push_back(std::to_string(i));
                }
                const std::string ref =
                    refStarts[random() % refStarts.size()] + std::to_string(p + 1);
                c.parts[ref] = part(std::string(kind.name), values[random() % values.size()],
                                    random() % 5 == 0 ? std::vector<std::string>{} : pins);
                for (const std::string& pin : pins) {
                    if (random() % 4 == 0) continue;  // unconnected
                    c.nets[netNames[random() % netNames.size()]].push_back(PinRef{ref, pin});
                }
            }
            const Circuit expected = normalised(c);
            const std::string deck = netcheck::exportSpice(c, "random");
            CAPTURE(deck);
            const auto back = netcheck::importSpice(deck, "random.cir", {});
            REQUIRE_MESSAGE(back.ok(), back.error->describe());
            CHECK(*back.value == expected);
        }
    }
}
