// Circuit text (netcheck/file/circuit_text): the lines a maker types from a paper schematic. Each
// expected circuit below is written out by hand from the kind table's pin order (part_kinds.cpp);
// every sample circuit and SPICE deck goes circuit -> text -> circuit unchanged.
#include <doctest/doctest.h>

#include <algorithm>

#include "netcheck/file/board_file.hpp"
#include "netcheck/file/circuit_text.hpp"
#include "netcheck/spice/circuit_loader.hpp"
#include "test_support.hpp"

using netcheck::Circuit;
using netcheck::circuitText;
using netcheck::CircuitTextError;
using netcheck::parseCircuitText;
using netcheck::PinRef;

namespace {

Circuit parsed(const std::string& text) {
    const auto result = parseCircuitText(text);
    for (const auto& error : result.errors) FAIL_CHECK(error.describe());
    REQUIRE(result.ok());
    return *result.circuit;
}

// The one error a text has (the test fails when it has none or several).
CircuitTextError onlyError(const std::string& text) {
    const auto result = parseCircuitText(text);
    CHECK_FALSE(result.ok());
    REQUIRE_MESSAGE(result.errors.size() == 1, "errors: " << result.errors.size());
    return result.errors.front();
}

std::vector<PinRef> pins(std::initializer_list<const char*> names) {
    std::vector<PinRef> list;
    for (const char* name : names) list.push_back(*PinRef::parse(name));
    std::sort(list.begin(), list.end());
    return list;
}

// What a circuit says, without what text does not carry: declared pin lists, unknown keys, and
// the order of pins within a net (which means nothing).
Circuit meaning(Circuit circuit) {
    circuit.extra = nlohmann::json::object();
    for (auto& [ref, part] : circuit.parts) {
        part.pins.clear();
        part.extra = nlohmann::json::object();
    }
    for (auto& [net, list] : circuit.nets) std::sort(list.begin(), list.end());
    return circuit;
}

void checkRoundTrip(const Circuit& original, const std::string& what) {
    INFO(what);
    const std::string text = circuitText(original);
    INFO(text);
    const auto back = parseCircuitText(text);
    for (const auto& error : back.errors) FAIL_CHECK(error.describe());
    REQUIRE(back.ok());
    CHECK(*back.circuit == meaning(original));
    CHECK(netcheck::keepWhatTextCannotSay(*back.circuit, original) == original);
    CHECK(circuitText(*back.circuit) == text);
}

// The seven-part circuit of the end-to-end test: battery, pot as a divider, base resistor, NPN
// transistor switching an LED with its resistor, supply capacitor.
const char* const kSevenParts =
    "BT1 battery 9V : VCC GND\n"
    "VR1 pot 10k : VCC WIPER GND\n"
    "R1 resistor 10k : WIPER BASE\n"
    "Q1 bjt BC547 : LED_K BASE GND\n"
    "R2 resistor 470 : VCC LED_A\n"
    "D1 led red : LED_A LED_K\n"
    "C1 capacitor 100n : VCC GND\n";

}  // namespace

TEST_CASE("circuit text: one line per part, nets in the kind's pin order") {
    const Circuit circuit = parsed(kSevenParts);
    REQUIRE(circuit.parts.size() == 7);
    CHECK(circuit.parts.at("Q1").kind == "bjt");
    CHECK(circuit.parts.at("Q1").value == "BC547");
    CHECK(circuit.parts.at("VR1").kind == "pot");
    CHECK(circuit.parts.at("D1").value == "red");
    CHECK(circuit.parts.at("R1").pins.empty());  // pins come from the nets, as from a SPICE deck
    REQUIRE(circuit.nets.size() == 6);
    // bjt pins C B E, pot 1 2 3 (wiper 2), led A K, battery + -.
    CHECK(circuit.nets.at("VCC") == pins({"BT1.+", "VR1.1", "R2.1", "C1.1"}));
    CHECK(circuit.nets.at("GND") == pins({"BT1.-", "VR1.3", "Q1.E", "C1.2"}));
    CHECK(circuit.nets.at("WIPER") == pins({"VR1.2", "R1.1"}));
    CHECK(circuit.nets.at("BASE") == pins({"R1.2", "Q1.B"}));
    CHECK(circuit.nets.at("LED_K") == pins({"Q1.C", "D1.K"}));
    CHECK(circuit.nets.at("LED_A") == pins({"R2.2", "D1.A"}));
}

TEST_CASE("circuit text: one line per net says the same circuit") {
    const Circuit byNets = parsed(
        "BT1 battery 9V\nVR1 pot 10k\nR1 resistor 10k\nQ1 bjt BC547\nR2 resistor 470\n"
        "D1 led red\nC1 capacitor 100n\n"
        "VCC: BT1.+ VR1.1 R2.1 C1.1\n"
        "GND: BT1.- VR1.3 Q1.E C1.2\n"
        "WIPER: VR1.2 R1.1\n"
        "BASE: R1.2 Q1.B\n"
        "LED_K: Q1.C D1.K\n"
        "LED_A : R2.2 D1.A   # blanks around ':' and comments are fine\n");
    CHECK(byNets == parsed(kSevenParts));
}

TEST_CASE("circuit text: both forms mix; net lines may come before the part") {
    const Circuit circuit = parsed("OUT: R1.2 Q1.C\nR1 resistor 1k : VCC -\nQ1 bjt : - B E\n");
    CHECK(circuit.nets.at("OUT") == pins({"R1.2", "Q1.C"}));
    CHECK(circuit.nets.at("VCC") == pins({"R1.1"}));
    CHECK(circuit.nets.at("B") == pins({"Q1.B"}));
    CHECK(circuit.parts.at("Q1").value.empty());
}

TEST_CASE("circuit text: '-' leaves a pin unconnected; a part line without ':' declares a part") {
    const Circuit circuit = parsed("VR1 pot 100k lin : IN - GND\nU1 ic NE555\n");
    CHECK(circuit.parts.at("VR1").value == "100k lin");  // a value's words, as in a board file
    CHECK(circuit.nets.at("IN") == pins({"VR1.1"}));
    CHECK(circuit.nets.at("GND") == pins({"VR1.3"}));
    CHECK_FALSE(circuit.netOf({"VR1", "2"}).has_value());
    CHECK(circuit.parts.count("U1") == 1);
    CHECK(circuit.nets.size() == 2);
}

TEST_CASE("circuit text: kinds without pin names number their pins 1..N") {
    const Circuit circuit = parsed("U1 ic NE555 : GND TRIG OUT VCC - THR THR VCC\n");
    CHECK(circuit.nets.at("VCC") == pins({"U1.4", "U1.8"}));
    CHECK(circuit.nets.at("THR") == pins({"U1.6", "U1.7"}));
    CHECK(circuit.nets.at("OUT") == pins({"U1.3"}));
}

TEST_CASE("circuit text: pins by name with PIN=NET") {
    const Circuit circuit =
        parsed("Q1 BJT 2N3904 : E=GND B=IN C=OUT\nSW1 switch : COM=VCC NO=LAMP\n");
    CHECK(circuit.parts.at("Q1").kind == "bjt");  // kinds in any case
    CHECK(circuit.nets.at("GND") == pins({"Q1.E"}));
    CHECK(circuit.nets.at("OUT") == pins({"Q1.C"}));
    CHECK(circuit.nets.at("LAMP") == pins({"SW1.NO"}));
}

TEST_CASE("circuit text: quotes hold blanks and marks; a quoted - is a net name") {
    const Circuit circuit = parsed("R1 resistor \"4k7\" : \"net: one\" \"-\"\n\"a#b\": X1.1x\n");
    CHECK(circuit.nets.at("net: one") == pins({"R1.1"}));
    CHECK(circuit.nets.at("-") == pins({"R1.2"}));
    CHECK(circuit.nets.at("a#b") == pins({"X1.1x"}));
}

TEST_CASE("circuit text: errors name line and column") {
    SUBCASE("unknown kind, with the near one") {
        const auto error = onlyError("R1 resistor 1k : A B\nR2 resister 1k : B C\n");
        CHECK(error.line == 2);
        CHECK(error.column == 4);
        CHECK(error.message.find("unknown kind \"resister\"") != std::string::npos);
        CHECK(error.message.find("did you mean resistor?") != std::string::npos);
        CHECK(error.describe().starts_with("line 2, column 4: "));
    }
    SUBCASE("a schematic's word for a kind points at the kind") {
        const auto error = onlyError("Q1 NPN BC547 : C B E\n");
        CHECK(error.message.find("unknown kind \"NPN\" (did you mean bjt?)") != std::string::npos);
    }
    SUBCASE("too many nets for the kind: at the first one too many") {
        const auto error = onlyError("Q1 bjt BC547 : C B E X\n");
        CHECK(error.line == 1);
        CHECK(error.column == 22);
        CHECK(error.message.find("a bjt has 3 pins (C B E)") != std::string::npos);
        CHECK(error.message.find("4 written") != std::string::npos);
    }
    SUBCASE("too few nets: at the ':'") {
        const auto error = onlyError("\n  D1 led : A\n");
        CHECK(error.line == 2);
        CHECK(error.column == 10);
        CHECK(error.message.find("a led has 2 pins (A K)") != std::string::npos);
    }
    SUBCASE("duplicate ref, also in another case") {
        const auto error = onlyError("R1 resistor 1k : A B\nr1 resistor 2k : C D\n");
        CHECK(error.line == 2);
        CHECK(error.column == 1);
        CHECK(error.message.find("duplicate ref r1 (R1 is on line 1") != std::string::npos);
    }
    SUBCASE("a pin in two nets") {
        const auto error = onlyError("R1 resistor 1k : A B\nC: R1.2\n");
        CHECK(error.line == 2);
        CHECK(error.column == 4);
        CHECK(error.message == "R1.2 is already in net B (line 1); a pin is in one net only");
    }
    SUBCASE("a pin the kind does not have") {
        const auto error = onlyError("D1 led : A K\nX: D1.C\n");
        CHECK(error.line == 2);
        CHECK(error.column == 4);
        CHECK(error.message == "D1 has no pin \"C\": a led's pins are A K");
    }
    SUBCASE("a value that is not a quantity") {
        const auto error = onlyError("C1 capacitor 10qq : A B\n");
        CHECK(error.column == 14);
        CHECK(error.message.find("\"10qq\" is not a value") != std::string::npos);
    }
    SUBCASE("columns count characters, not bytes") {
        const auto error = onlyError("# Ω µ\nR1 resistor 4k7 : Ω Ω2 X\n");
        CHECK(error.line == 2);
        CHECK(error.column == 24);
    }
    SUBCASE("an unclosed quote") {
        const auto error = onlyError("R1 resistor \"1k : A B\n");
        CHECK(error.column == 13);
        CHECK(error.message.find("not closed") != std::string::npos);
    }
    SUBCASE("a word alone, a second ':', a pin not written REF.PIN, a blank in a ref") {
        CHECK(onlyError("R1\n").message.find("REF KIND VALUE : NETS") != std::string::npos);
        CHECK(onlyError("A: R1.1 : B\n").column == 9);
        CHECK(onlyError("A: R1\n").message.find("write REF.PIN") != std::string::npos);
        CHECK(onlyError("\"R 1\" resistor : A B\n").message.find("blank") != std::string::npos);
    }
    SUBCASE("a ref written in another case than its part line") {
        const auto error = onlyError("Q1 bjt : C B E\nX: q1.B\n");
        CHECK(error.message == "q1 is written Q1 on line 1");
    }
    SUBCASE("mixing PIN=NET with pin order") {
        CHECK(onlyError("Q1 bjt : C=A B E\n").column == 14);
    }
}

TEST_CASE("circuit text: every error is listed, in text order") {
    const auto result =
        parseCircuitText("X1 widget : A\nR1 resistor 1k : A\nR1 resistor 1k : B C\n");
    REQUIRE(result.errors.size() == 3);
    CHECK(result.errors[0].line == 1);
    CHECK(result.errors[1].line == 2);
    CHECK(result.errors[2].line == 3);
}

TEST_CASE("circuit text: empty text is an empty circuit") {
    CHECK(parsed("") == Circuit{});
    CHECK(parsed("\n  # only a comment\n\n") == Circuit{});
}

TEST_CASE(
    "circuit text: the example in docs/editor.md reads as the seven-part circuit and one net") {
    const std::string doc = test_support::readTextFile(test_support::sourcePath("docs/editor.md"));
    const auto section = doc.find("### The circuit as text");
    REQUIRE(section != std::string::npos);
    const auto open = doc.find("```\n", section);
    const auto close = doc.find("```", open + 4);
    REQUIRE(close != std::string::npos);
    Circuit circuit = parsed(doc.substr(open + 4, close - open - 4));
    CHECK(circuit.nets.at("IN") == pins({"J1.T", "C2.1"}));
    circuit.nets.erase("IN");
    CHECK(circuit == parsed(kSevenParts));
}

TEST_CASE("circuit text: every sample circuit goes circuit -> text -> circuit unchanged") {
    int circuits = 0;
    for (const std::string& path : test_support::sourceFiles("samples", ".board.json")) {
        const auto board = netcheck::readBoard(test_support::readTextFile(path), path);
        REQUIRE(board.ok());
        if (!board.value->circuit) continue;
        checkRoundTrip(*board.value->circuit, path);
        ++circuits;
    }
    CHECK(circuits >= 10);
    for (const std::string& path : test_support::sourceFiles("samples/spice", ".cir")) {
        const auto circuit = netcheck::loadCircuitText(test_support::readTextFile(path), path);
        REQUIRE(circuit.ok());
        checkRoundTrip(*circuit.value, path);
    }
}

TEST_CASE("circuit text: printing what text cannot say in part lines") {
    Circuit circuit;
    circuit.parts["Y1"] = {"crystal", "16  MHz", {}, nlohmann::json::object()};
    circuit.parts["U1"] = {"ic", "", {"VCC", "GND"}, nlohmann::json::object()};
    circuit.parts["D1"] = {"led", "", {}, nlohmann::json::object()};
    circuit.nets["A"] = pins({"Y1.1", "X9.3", "D1.1"});  // X9 undeclared, D1 has no pin 1
    circuit.nets["U1 supply"] = pins({"U1.VCC"});
    circuit.nets["EMPTY"] = {};
    const std::string text = circuitText(circuit);
    CHECK(text.find("Y1 crystal \"16  MHz\" : A -\n") != std::string::npos);
    CHECK(text.find("U1 ic : VCC=\"U1 supply\"\n") != std::string::npos);
    CHECK(text.find("D1 led\n") != std::string::npos);
    CHECK(text.find("A: D1.1 X9.3\n") != std::string::npos);
    CHECK(text.find("EMPTY:\n") != std::string::npos);
    // The led's pin 1 is not an led pin: the text says so when read back, on its net line.
    const auto back = parseCircuitText(text);
    REQUIRE(back.errors.size() == 1);
    CHECK(back.errors[0].message == "D1 has no pin \"1\": a led's pins are A K");
}

TEST_CASE("circuit text: applying keeps declared pins, unknown keys and pin order") {
    Circuit before;
    before.parts["U1"] = {"ic",
                          "TL071",
                          {"1", "2", "3", "4", "5", "6", "7", "8"},
                          nlohmann::json{{"note", "socketed"}}};
    before.nets["OUT"] = {{"U1", "6"}, {"R1", "2"}};
    before.extra = nlohmann::json{{"author", "me"}};
    const Circuit typed = parsed("U1 ic TL071 : - - - - - OUT\nOUT: R1.2\n");
    const Circuit kept = netcheck::keepWhatTextCannotSay(typed, before);
    CHECK(kept == before);
    // A pin outside the declared list drops the list (the text now says more than it).
    const Circuit more =
        netcheck::keepWhatTextCannotSay(parsed("U1 ic TL071 : - - - - - - - - OUT\n"), before);
    CHECK(more.parts.at("U1").pins.empty());
    // Another kind drops it too.
    CHECK(netcheck::keepWhatTextCannotSay(parsed("U1 header : A\n"), before)
              .parts.at("U1")
              .pins.empty());
}
