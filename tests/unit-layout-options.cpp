// The layout engine's options and refusals: supply rails (the positive supply on the top strip,
// 0 V on the bottom strip), "place the rest" with placed parts the circuit does not name, and the
// command that accepts a layout as one undo step. Every layout is checked by netcheck::check.
#include <doctest/doctest.h>

#include <map>
#include <random>
#include <set>

#include "netcheck/check/check.hpp"
#include "netcheck/check/connectivity.hpp"
#include "netcheck/edit/replace_board.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/layout/layout_engine.hpp"
#include "netcheck/layout/supply_nets.hpp"
#include "test_support.hpp"

namespace {

using test_support::readSample;

using netcheck::Board;
using netcheck::Circuit;
using netcheck::Hole;
using netcheck::PinRef;

std::string errors(const Board& board) {
    std::string text;
    for (const auto& finding : netcheck::check(board).errors)
        text += std::string(finding.id()) + ": " + finding.message + "\n";
    return text;
}

// True when every hole of strip `row` is joined by copper to the circuit's pins of `net`.
bool stripCarries(const Board& board, int row, const std::string& net) {
    const netcheck::Connectivity copper(board);
    const std::vector<PinRef>& pins = board.circuit->nets.at(net);
    for (int col = 0; col < board.cols; ++col) {
        const int island = copper.islandOfHole({row, col});
        if (island < 0) return false;
        for (const PinRef& pin : pins) {
            if (copper.islandOfPin(pin) != island) return false;
        }
    }
    return true;
}

}  // namespace

TEST_CASE("supply nets of a circuit") {
    Circuit circuit;
    circuit.parts["BT1"] = {"battery", "9V", {}, nlohmann::json::object()};
    circuit.parts["R1"] = {"resistor", "1k", {}, nlohmann::json::object()};
    circuit.nets["SUPPLY"] = {{"BT1", "+"}, {"R1", "1"}};
    circuit.nets["COMMON"] = {{"BT1", "-"}, {"R1", "2"}};
    const netcheck::SupplyNets byParts = netcheck::findSupplyNets(circuit);
    CHECK(byParts.positive == std::optional<std::string>("SUPPLY"));
    CHECK(byParts.ground == std::optional<std::string>("COMMON"));

    Circuit named;
    named.parts["R1"] = {"resistor", "1k", {}, nlohmann::json::object()};
    named.nets["VCC"] = {{"R1", "1"}};
    named.nets["GND"] = {{"R1", "2"}};
    const netcheck::SupplyNets byName = netcheck::findSupplyNets(named);
    CHECK(byName.positive == std::optional<std::string>("VCC"));
    CHECK(byName.ground == std::optional<std::string>("GND"));
}

TEST_CASE("supply rails: the top strip carries the positive supply, the bottom strip 0 V") {
    int laidOut = 0;
    for (const std::string& path : test_support::sourceFiles("samples", ".board.json")) {
        CAPTURE(path);
        const Board hand = readSample(path);
        REQUIRE(hand.circuit);
        const netcheck::SupplyNets supply = netcheck::findSupplyNets(*hand.circuit);
        REQUIRE(supply.positive);
        REQUIRE(supply.ground);
        netcheck::LayoutOptions options;
        options.iterations = 100;
        options.rails = true;
        const netcheck::LayoutResult result = netcheck::layOut(*hand.circuit, options);
        REQUIRE_MESSAGE(result.ok, result.problem);
        CHECK(errors(result.board) == "");
        CHECK(stripCarries(result.board, 0, *supply.positive));
        CHECK(stripCarries(result.board, result.board.rows - 1, *supply.ground));
        // Without the option the strips are the engine's own choice (and this test can fail).
        options.rails = false;
        const netcheck::LayoutResult plain = netcheck::layOut(*hand.circuit, options);
        REQUIRE(plain.ok);
        if (!stripCarries(plain.board, 0, *supply.positive) ||
            !stripCarries(plain.board, plain.board.rows - 1, *supply.ground))
            ++laidOut;
    }
    CHECK(laidOut > 0);  // the rails are the option's doing, not the engine's habit
}

TEST_CASE("supply rails: no supply nets, or placed parts, are refused with a reason") {
    Circuit circuit;
    circuit.parts["R1"] = {"resistor", "1k", {}, nlohmann::json::object()};
    circuit.parts["R2"] = {"resistor", "1k", {}, nlohmann::json::object()};
    circuit.nets["A"] = {{"R1", "1"}, {"R2", "1"}};
    circuit.nets["B"] = {{"R1", "2"}, {"R2", "2"}};
    netcheck::LayoutOptions options;
    options.iterations = 10;
    options.rails = true;
    const netcheck::LayoutResult none = netcheck::layOut(circuit, options);
    CHECK_FALSE(none.ok);
    CHECK(none.problem.find("no supply nets") != std::string::npos);

    const Board hand = readSample(test_support::sourcePath("samples/astable.board.json"));
    const netcheck::LayoutResult placed = netcheck::layOut(*hand.circuit, options, &hand);
    CHECK_FALSE(placed.ok);
    CHECK(placed.problem.find("not around parts already placed") != std::string::npos);
}

TEST_CASE("place the rest: placed parts the circuit does not name are named in the refusal") {
    Board board = readSample(test_support::sourcePath("samples/astable.board.json"));
    REQUIRE(board.circuit);
    Board placed = board;
    placed.parts.resize(2);
    placed.cuts.clear();
    placed.links.clear();
    placed.wires.clear();
    netcheck::Part stray = placed.parts.front();
    stray.ref = "R99";
    for (auto& pin : stray.pins) pin.hole.col = placed.cols - 1;
    placed.parts.push_back(stray);
    netcheck::LayoutOptions options;
    options.iterations = 20;
    const netcheck::LayoutResult result = netcheck::layOut(*board.circuit, options, &placed);
    CHECK_FALSE(result.ok);
    CHECK(result.problem.find("does not name (R99)") != std::string::npos);
    // Without the stray part the same board is laid out.
    placed.parts.pop_back();
    const netcheck::LayoutResult fine = netcheck::layOut(*board.circuit, options, &placed);
    CHECK_MESSAGE(fine.ok, fine.problem);
}

TEST_CASE("a layout replaces the board as one command, undone exactly") {
    const Board before = readSample(test_support::sourcePath("samples/flasher.board.json"));
    netcheck::LayoutOptions options;
    options.iterations = 30;
    const netcheck::LayoutResult result = netcheck::layOut(*before.circuit, options);
    REQUIRE(result.ok);
    Board board = before;
    netcheck::edit::ReplaceBoard command(board, result.board, "Lay out from the circuit");
    command.apply(board);
    CHECK(board == result.board);
    command.revert(board);
    CHECK(board == before);
    command.apply(board);
    CHECK(board == result.board);
    Board other = before;
    other.title = "changed meanwhile";
    CHECK_THROWS(command.apply(other));
}

TEST_CASE("parts share columns where their strips allow, and the board stays correct") {
    int stacked = 0;
    for (const std::string& path : test_support::sourceFiles("samples", ".board.json")) {
        CAPTURE(path);
        const Board hand = readSample(path);
        netcheck::LayoutOptions options;
        options.iterations = 100;
        const netcheck::LayoutResult result = netcheck::layOut(*hand.circuit, options);
        REQUIRE(result.ok);
        CHECK(errors(result.board) == "");
        std::map<int, std::set<std::string>> partsInColumn;
        for (const auto& part : result.board.parts)
            for (const auto& pin : part.pins) partsInColumn[pin.hole.col].insert(part.ref);
        for (const auto& [col, refs] : partsInColumn) stacked += refs.size() > 1;
    }
    CHECK(stacked > 0);
}
