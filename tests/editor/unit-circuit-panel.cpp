// The Circuit panel's logic without a window: part, pin and net edits, completion, reading decks
// with the maker's options, exporting, and the board-against-circuit comparison. Each edit is
// performed as the panel does (one SetCircuit command) and undone through the history.
#include <doctest/doctest.h>

#include <algorithm>
#include <fstream>
#include <set>
#include <sstream>

#include "netcheck/edit/circuit_edits.hpp"
#include "editor/panels/circuit_files.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/edit/edit.hpp"

using namespace stripsmith;
using netcheck::CircuitEdit;
using netcheck::Circuit;
using netcheck::PinRef;

namespace {

std::string sampleText(const std::string& name) {
    std::ifstream in(std::string(STRIPSMITH_SOURCE) + "/samples/" + name);
    REQUIRE_MESSAGE(in.good(), "missing sample " << name);
    std::ostringstream text;
    text << in.rdbuf();
    return text.str();
}

netcheck::Board sampleBoard(const std::string& name) {
    auto board = netcheck::readBoard(sampleText(name), name);
    REQUIRE(board.ok());
    return *board.value;
}

Circuit edited(const CircuitEdit& edit) {
    if (const auto* problem = std::get_if<std::string>(&edit)) FAIL("edit refused: " << *problem);
    return std::get<Circuit>(edit);
}

std::string refused(const CircuitEdit& edit) {
    const auto* problem = std::get_if<std::string>(&edit);
    REQUIRE_MESSAGE(problem != nullptr, "edit should have been refused");
    return *problem;
}

/// The nets as sets of pin names, so order does not matter.
std::set<std::set<std::string>> netShapes(const Circuit& circuit) {
    std::set<std::set<std::string>> shapes;
    for (const auto& [name, pins] : circuit.nets) {
        std::set<std::string> shape;
        for (const auto& pin : pins) shape.insert(pin.name());
        shapes.insert(shape);
    }
    return shapes;
}

// Three parts by hand: R1 from IN to MID, R2 from MID to GND, C1 across R2.
Circuit divider() {
    Circuit c;
    c.parts["R1"] = {"resistor", "10k", {"1", "2"}, nlohmann::json::object()};
    c.parts["R2"] = {"resistor", "4k7", {"1", "2"}, nlohmann::json::object()};
    c.parts["C1"] = {"capacitor", "100n", {"1", "2"}, nlohmann::json::object()};
    c.nets["IN"] = {{"R1", "1"}};
    c.nets["MID"] = {{"R1", "2"}, {"R2", "1"}, {"C1", "1"}};
    c.nets["GND"] = {{"R2", "2"}, {"C1", "2"}};
    return c;
}

}  // namespace

TEST_CASE("circuit panel edits") {
    const Circuit before = divider();

    SUBCASE("assign a pin to a net, moving it out of its old one") {
        const Circuit after = edited(assignPinToNet(before, {"C1", "1"}, "IN"));
        CHECK(after.netOf({"C1", "1"}) == "IN");
        CHECK(after.nets.at("MID") == std::vector<PinRef>{{"R1", "2"}, {"R2", "1"}});
        CHECK(after.nets.at("IN") == std::vector<PinRef>{{"R1", "1"}, {"C1", "1"}});
    }
    SUBCASE("assign to a new name makes the net; an empty name disconnects") {
        const Circuit after = edited(assignPinToNet(before, {"R1", "1"}, "VIN"));
        CHECK_FALSE(after.nets.count("IN"));  // its only pin left
        CHECK(after.nets.at("VIN") == std::vector<PinRef>{{"R1", "1"}});
        const Circuit cleared = edited(assignPinToNet(before, {"C1", "2"}, ""));
        CHECK_FALSE(cleared.netOf({"C1", "2"}).has_value());
        CHECK(cleared.nets.at("GND") == std::vector<PinRef>{{"R2", "2"}});
    }
    SUBCASE("rename keeps the pins; a taken name is refused") {
        const Circuit after = edited(renameNet(before, "MID", "TAP"));
        CHECK_FALSE(after.nets.count("MID"));
        CHECK(after.nets.at("TAP") == before.nets.at("MID"));
        CHECK(after.parts == before.parts);
        CHECK(refused(renameNet(before, "MID", "GND")).find("merge") != std::string::npos);
        CHECK_FALSE(refused(renameNet(before, "NOPE", "X")).empty());
        CHECK_FALSE(refused(renameNet(before, "MID", "")).empty());
    }
    SUBCASE("merge joins every pin once and drops the merged net") {
        const Circuit after = edited(mergeNets(before, "IN", "MID"));
        CHECK_FALSE(after.nets.count("IN"));
        CHECK(after.nets.at("MID") ==
              std::vector<PinRef>{{"R1", "2"}, {"R2", "1"}, {"C1", "1"}, {"R1", "1"}});
        CHECK_FALSE(refused(mergeNets(before, "MID", "MID")).empty());
    }
    SUBCASE("add a net: its pins leave their old nets; a taken name or no pin is refused") {
        const Circuit after = edited(addNet(before, "TAP", {{"C1", "1"}, {"Q1", "B"}}));
        CHECK(after.nets.at("TAP") == std::vector<PinRef>{{"C1", "1"}, {"Q1", "B"}});
        CHECK(after.nets.at("MID") == std::vector<PinRef>{{"R1", "2"}, {"R2", "1"}});
        const Circuit moved = edited(addNet(before, "VIN", {{"R1", "1"}}));
        CHECK_FALSE(moved.nets.count("IN"));  // its only pin left
        CHECK(refused(addNet(before, "GND", {{"R1", "1"}})).find("already") != std::string::npos);
        CHECK_FALSE(refused(addNet(before, "", {{"R1", "1"}})).empty());
        CHECK_FALSE(refused(addNet(before, "NEW", {})).empty());
    }
    SUBCASE("add, edit and remove parts") {
        const Circuit added =
            edited(addCircuitPart(before, "D1", {"diode", "1N4148", {"A", "K"}, {}}));
        CHECK(added.parts.at("D1").pins == std::vector<std::string>{"A", "K"});
        CHECK_FALSE(refused(addCircuitPart(before, "R1", {})).empty());
        CHECK_FALSE(refused(addCircuitPart(before, "R.1", {})).empty());
        CHECK_FALSE(refused(addCircuitPart(before, "", {})).empty());

        // Renumbering R2 as R5 follows it into its nets; its value changes with it.
        const Circuit renamed =
            edited(editCircuitPart(before, "R2", "R5", {"resistor", "2k2", {"1", "2"}, {}}));
        CHECK_FALSE(renamed.parts.count("R2"));
        CHECK(renamed.parts.at("R5").value == "2k2");
        CHECK(renamed.netOf({"R5", "1"}) == "MID");
        CHECK(renamed.netOf({"R5", "2"}) == "GND");
        // Dropping a pin from the list takes it out of its net.
        const Circuit onePin =
            edited(editCircuitPart(before, "C1", "C1", {"capacitor", "100n", {"1"}, {}}));
        CHECK_FALSE(onePin.netOf({"C1", "2"}).has_value());

        const Circuit removed = edited(removeCircuitPart(before, "R1"));
        CHECK_FALSE(removed.parts.count("R1"));
        CHECK_FALSE(removed.nets.count("IN"));
        CHECK(removed.nets.at("MID") == std::vector<PinRef>{{"R2", "1"}, {"C1", "1"}});
    }
    SUBCASE("pins listed for a part: declared, else named in the nets") {
        Circuit c = before;
        c.parts["U1"] = {"ic", "NE555", {}, nlohmann::json::object()};
        c.nets["GND"].push_back({"U1", "1"});
        c.nets["MID"].push_back({"U1", "8"});
        CHECK(pinsOfPart(c, "U1") == std::vector<std::string>{"1", "8"});
        CHECK(pinsOfPart(c, "R1") == std::vector<std::string>{"1", "2"});
    }
    SUBCASE("net name completion: starting matches first, any case") {
        Circuit c = before;
        c.nets["VIN"] = {{"X", "1"}};
        CHECK(netNameSuggestions(c, "in") == std::vector<std::string>{"IN", "VIN"});
        CHECK(netNameSuggestions(c, "m") == std::vector<std::string>{"MID"});
        CHECK(netNameSuggestions(c, "").size() == 4);
        CHECK(netNameSuggestions(c, "", 2).size() == 2);
        CHECK(netNameSuggestions(c, "zz").empty());
    }
}

TEST_CASE("circuit panel undo") {
    // Each edit is one SetCircuit step: undo gives back the very circuit before it.
    netcheck::Board board = sampleBoard("flasher.board.json");
    REQUIRE(board.circuit.has_value());
    const Circuit original = *board.circuit;
    netcheck::edit::History history;
    auto perform = [&](const CircuitEdit& edit, const char* label) {
        history.perform(std::make_unique<netcheck::edit::SetCircuit>(board, edited(edit), label),
                        board);
    };
    perform(renameNet(*board.circuit, "DIS", "DISCHARGE"), "rename");
    const Circuit renamed = *board.circuit;
    perform(mergeNets(*board.circuit, "CV", "GND"), "merge");
    perform(assignPinToNet(*board.circuit, {"R3", "2"}, "OUT"), "assign");
    perform(removeCircuitPart(*board.circuit, "C2"), "remove");
    CHECK(history.depth() == 4);
    CHECK(board.circuit->nets.count("DISCHARGE"));
    CHECK_FALSE(board.circuit->parts.count("C2"));

    for (int i = 0; i < 3; ++i) CHECK(history.undo(board));
    CHECK(*board.circuit == renamed);
    CHECK(history.undo(board));
    CHECK(*board.circuit == original);
    CHECK(history.redo(board));
    CHECK(*board.circuit == renamed);
}

TEST_CASE("circuit panel files") {
    const netcheck::Board board = sampleBoard("flasher.board.json");
    const std::string deck = sampleText("spice/flasher.cir");

    SUBCASE("the flasher deck gives the nets the board file's own circuit states") {
        // Reference: the hand-written circuit in samples/flasher.board.json.
        auto read = readCircuitForEditor(deck, "flasher.cir", {});
        REQUIRE(read.ok());
        CHECK(netShapes(*read.value) == netShapes(*board.circuit));
        CHECK(read.value->nets.count("GND"));
    }
    SUBCASE("the name of node 0 is the maker's choice") {
        netcheck::SpiceOptions options;
        options.groundName = "0V";
        auto read = readCircuitForEditor(deck, "flasher.cir", options);
        REQUIRE(read.ok());
        CHECK(read.value->nets.count("0V"));
        CHECK_FALSE(read.value->nets.count("GND"));
    }
    SUBCASE("4K7 reads as 4000 by the SPICE rule, with a note") {
        // ngspice manual, 2.3.2 (scale factors): letters after a number that are not a scale
        // factor are ignored, so 4K7 is 4K = 4000.
        auto read =
            readCircuitForEditor("divider\nR1 in out 4K7\nR2 out 0 10k\n.end\n", "d.cir", {});
        REQUIRE(read.ok());
        REQUIRE_FALSE(read.notes.empty());
        const bool mentioned =
            std::any_of(read.notes.begin(), read.notes.end(), [](const std::string& n) {
                return n.find("4K7") != std::string::npos && n.find("d.cir:2") != std::string::npos;
            });
        CHECK(mentioned);
    }
    SUBCASE("a malformed deck is refused with file and line") {
        auto read = readCircuitForEditor("bad\nR1 onlyone\n.end\n", "bad.cir", {});
        REQUIRE_FALSE(read.ok());
        REQUIRE(read.error.has_value());
        CHECK(read.error->describe().find("bad.cir:2") != std::string::npos);
    }
    SUBCASE("export: SPICE for deck names, JSON otherwise, both read back the same") {
        CHECK(isSpiceFileName("x/amp.cir"));
        CHECK(isSpiceFileName("amp.spice"));
        CHECK_FALSE(isSpiceFileName("amp.json"));
        CHECK_FALSE(isSpiceFileName(".cir"));
        const std::string spice = circuitFileText(*board.circuit, "flasher.cir", "flasher");
        const std::string json = circuitFileText(*board.circuit, "flasher.json", "flasher");
        CHECK(spice.rfind("flasher", 0) == 0);  // SPICE3: the first line is the title
        CHECK(json.front() == '{');
        auto fromSpice = readCircuitForEditor(spice, "flasher.cir", {});
        auto fromJson = readCircuitForEditor(json, "flasher.json", {});
        REQUIRE(fromSpice.ok());
        REQUIRE(fromJson.ok());
        CHECK(netShapes(*fromSpice.value) == netShapes(*board.circuit));
        CHECK(*fromJson.value == *board.circuit);
    }
}
