// Resizing the board from any edge and trimming it to the used area: hole references follow the
// copper, what falls off is removed, and undo brings back exactly the board that was there.
#include <algorithm>

#include <doctest/doctest.h>

#include "netcheck/edit/resize_board.hpp"

using namespace netcheck;
using namespace netcheck::edit;

namespace {

Part twoLead(std::string ref, Hole a, Hole b) {
    return Part{std::move(ref), "resistor", "1k", {{"1", a}, {"2", b}}, nlohmann::json::object()};
}

Board layout() {
    Board board;
    board.rows = 6;
    board.cols = 10;
    board.parts = {twoLead("R1", {1, 1}, {1, 5}), twoLead("R2", {4, 6}, {4, 9}),
                   twoLead("R3", {2, 2}, {3, 2})};
    board.links = {Link{{0, 0}, {5, 0}, false, {}}, Link{{2, 4}, {3, 4}, false, {}}};
    board.cuts = {Cut{{1, 3}, Cut::Kind::Hole}, Cut{{4, 8}, Cut::Kind::Between},
                  Cut{{2, 5}, Cut::Kind::Between}};
    board.offboard = {OffboardPart{"J1", "jack", "", {"T", "S"}, {}}};
    board.wires = {Wire{Endpoint::atLug({"J1", "T"}), Endpoint::atHole({5, 9}), "", {}},
                   Wire{Endpoint::atLug({"J1", "S"}), Endpoint::atHole({2, 3}), "", {}}};
    return board;
}

}  // namespace

TEST_CASE("resize board") {
    const Board start = layout();

    SUBCASE("growing at the top and left renames every hole") {
        ResizeBoard grow(start, EdgeChange{2, 0, 3, 1});
        Board board = start;
        grow.apply(board);
        CHECK(board.rows == 8);
        CHECK(board.cols == 14);
        CHECK(board.parts[0].pins[0].hole == Hole{3, 4});
        CHECK(board.links[0].to == Hole{7, 3});
        CHECK(board.cuts[1].hole == Hole{6, 11});
        CHECK(*board.wires[0].to.hole == Hole{7, 12});
        CHECK(board.parts.size() == start.parts.size());
        CHECK(grow.label() == "Resize board to 14 x 8 holes");  // holes across x strips
        CHECK(grow.touched().empty());
        grow.revert(board);
        CHECK(board == start);
    }

    SUBCASE("shrinking removes what falls off and undo puts it back in place") {
        // Take away the top row, the last row and the last two columns: 4 rows x 8 columns left.
        ResizeBoard shrink(start, EdgeChange{-1, -1, 0, -2});
        Board board = start;
        shrink.apply(board);
        CHECK(board.rows == 4);
        CHECK(board.cols == 8);
        // R2 (row E, holes 7-10) loses a lead: gone. R1 and R3 stay, one row up.
        REQUIRE(board.parts.size() == 2);
        CHECK(board.parts[0].pins[0].hole == Hole{0, 1});
        CHECK(board.parts[1].ref == "R3");
        // The link from A1 to F1 ends off both edges; the other stays.
        REQUIRE(board.links.size() == 1);
        CHECK(board.links[0].from == Hole{1, 4});
        // The between cut at E9|E10 goes with its row, the hole cut stays.
        CHECK(board.cuts.size() == 2);
        // The wire to F10 goes; J1 stays (off the board), with its other wire.
        CHECK(board.offboard == start.offboard);
        REQUIRE(board.wires.size() == 1);
        CHECK(*board.wires[0].to.hole == Hole{1, 3});
        CHECK_FALSE(shrink.touched().empty());
        shrink.revert(board);
        CHECK(board == start);
        shrink.apply(board);  // redo gives the same result again
        shrink.revert(board);
        CHECK(board == start);
    }

    SUBCASE("a between cut at the new last hole of a strip goes") {
        ResizeBoard shrink(start, EdgeChange{0, 0, 0, -4});  // 6 columns: C6|C7 has no C7
        Board board = start;
        shrink.apply(board);
        CHECK(std::find(board.cuts.begin(), board.cuts.end(),
                        Cut{{2, 5}, Cut::Kind::Between}) == board.cuts.end());
        shrink.revert(board);
        CHECK(board == start);
    }

    SUBCASE("a board keeps at least one hole") {
        CHECK_THROWS_AS(ResizeBoard(start, EdgeChange{-3, -3, 0, 0}), std::invalid_argument);
        CHECK_NOTHROW(ResizeBoard(start, EdgeChange{-3, -2, -9, 0}));
    }

    SUBCASE("out of step") {
        ResizeBoard grow(start, EdgeChange{1, 0, 0, 0});
        Board board = start;
        board.rows = 7;
        CHECK_THROWS_AS(grow.apply(board), OutOfStepError);
    }
}

TEST_CASE("trim to used area") {
    SUBCASE("used area covers pins, links, wire holes and both holes of a between cut") {
        Board board;
        board.rows = 20;
        board.cols = 30;
        CHECK_FALSE(usedArea(board).has_value());
        board.cuts = {Cut{{3, 10}, Cut::Kind::Between}};
        board.parts = {twoLead("R1", {5, 4}, {5, 8})};
        board.wires = {Wire{Endpoint::atLug({"J1", "T"}), Endpoint::atHole({12, 6}), "", {}}};
        REQUIRE(usedArea(board).has_value());
        CHECK(*usedArea(board) == HoleArea{{3, 4}, {12, 11}});

        auto trim = trimToUsedArea(board);
        REQUIRE(trim);
        CHECK(trim->label() == "Trim board to used area");
        Board trimmed = board;
        trim->apply(trimmed);
        CHECK(trimmed.rows == 10);
        CHECK(trimmed.cols == 8);
        CHECK(trimmed.parts[0].pins[0].hole == Hole{2, 0});
        CHECK(trimmed.cuts[0].hole == Hole{0, 6});
        CHECK(trimmed.cuts[0].hole.col + 1 == trimmed.cols - 1);
        CHECK(trimToUsedArea(trimmed) == nullptr);
        trim->revert(trimmed);
        CHECK(trimmed == board);

        // A margin of 2 leaves two free holes on each side, but never grows the board.
        auto withMargin = trimToUsedArea(board, 2);
        Board margined = board;
        withMargin->apply(margined);
        CHECK(margined.rows == 14);
        CHECK(margined.cols == 12);
        CHECK(margined.parts[0].pins[0].hole == Hole{4, 2});
        CHECK(trimToUsedArea(board, 50) == nullptr);
    }
}
