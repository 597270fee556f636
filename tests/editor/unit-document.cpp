// The open document: island details under the pointer follow every edit, undo and redo.
#include <doctest/doctest.h>

#include "editor/app/document.hpp"
#include "netcheck/edit/cut_commands.hpp"

using namespace stripsmith;
using netcheck::Hole;
using netcheck::PinRef;

namespace {

// Two resistors side by side across strips A and B: A is net IN, B is net OUT.
netcheck::Board twoResistors() {
    netcheck::Board board;
    board.rows = 2;
    board.cols = 6;
    board.parts.push_back({"R1", "resistor", "10k", {{"1", {0, 0}}, {"2", {1, 0}}}, {}});
    board.parts.push_back({"R2", "resistor", "10k", {{"1", {0, 4}}, {"2", {1, 4}}}, {}});
    netcheck::Circuit circuit;
    circuit.nets["IN"] = {{"R1", "1"}, {"R2", "1"}};
    circuit.nets["OUT"] = {{"R1", "2"}, {"R2", "2"}};
    board.circuit = circuit;
    return board;
}

}  // namespace

TEST_CASE("island details follow the board") {
    Document doc;
    doc.reset(twoResistors(), "");
    auto islandAt = [&](Hole hole) { return doc.island(doc.connectivity().islandOfHole(hole)); };

    const netcheck::Island* strip = islandAt({0, 0});
    REQUIRE(strip);
    CHECK(strip->holes.size() == 6);
    CHECK(strip->pins == std::vector<PinRef>{{"R1", "1"}, {"R2", "1"}});
    CHECK(doc.netOfIsland(strip->id) == "IN");
    CHECK(doc.netOfIsland(doc.connectivity().islandOfHole({1, 3})) == "OUT");
    CHECK(doc.island(-1) == nullptr);
    CHECK(doc.island(doc.connectivity().islandCount()) == nullptr);

    // A hole cut at A3 splits strip A; the island holding A1 keeps its id, so a detail kept
    // from before the edit would still list six holes.
    REQUIRE(doc.perform(netcheck::edit::toggleCut(doc.board(), netcheck::Cut{{0, 2}, netcheck::Cut::Kind::Hole})));
    const netcheck::Island* left = islandAt({0, 0});
    REQUIRE(left);
    CHECK(left->holes == std::vector<Hole>{{0, 0}, {0, 1}});
    CHECK(left->pins == std::vector<PinRef>{{"R1", "1"}});
    CHECK(doc.netOfIsland(left->id) == "IN");
    const netcheck::Island* cutHole = islandAt({0, 2});
    REQUIRE(cutHole);
    CHECK(cutHole->pins.empty());
    CHECK_FALSE(doc.netOfIsland(cutHole->id));

    REQUIRE(doc.undo());
    CHECK(islandAt({0, 0})->holes.size() == 6);
    REQUIRE(doc.redo());
    CHECK(islandAt({0, 0})->holes.size() == 2);
}
