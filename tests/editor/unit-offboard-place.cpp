// Off-board parts placed by the maker: where they are drawn, how a move records the place, and
// that a drag of on- and off-board parts together is one undo step.
#include <doctest/doctest.h>

#include <cmath>

#include "editor/tools/edit_actions.hpp"
#include "editor/canvas/offboard_layout.hpp"
#include "netcheck/file/board_file.hpp"
#include "netcheck/edit/history.hpp"

using namespace stripsmith;
using netcheck::edit::ElementRef;

namespace {

// A 10 x 20 board with R1 on it and two pots beside it, neither placed yet.
netcheck::Board boardWithPots() {
    netcheck::Board board;
    board.rows = 10;
    board.cols = 20;
    board.parts.push_back({"R1", "resistor", "10k", {{"1", {2, 2}}, {"2", {2, 6}}}, {}});
    board.offboard.push_back({"VR1", "pot", "B100k", {"1", "2", "3"}, nlohmann::json::object()});
    board.offboard.push_back({"VR2", "pot", "A10k", {"1", "2", "3"}, nlohmann::json::object()});
    return board;
}

}  // namespace

TEST_CASE("off-board places") {
    netcheck::Board board = boardWithPots();
    const auto column = layoutOffboard(board);
    REQUIRE(column.size() == 2);
    CHECK(column[0].min.x == column[1].min.x);  // unplaced: one column right of the board
    CHECK(column[0].min.x > 20.0f);
    CHECK(column[1].min.y > column[0].max.y);

    SUBCASE("a move writes the place, the others keep their slots, undo takes it away exactly") {
        netcheck::edit::History history;
        const netcheck::Board before = board;
        history.perform(moveCommand(board, {{ElementRef::Kind::Offboard, 0}}, 3, -2), board);
        const auto place = placeOf(board.offboard[0]);
        REQUIRE(place);
        CHECK(place->x == doctest::Approx(column[0].min.x - 2));
        CHECK(place->y == doctest::Approx(column[0].min.y + 3));
        const auto moved = layoutOffboard(board);
        CHECK(moved[0].lugs[1].y == doctest::Approx(column[0].lugs[1].y + 3));
        CHECK(moved[1].min.y == column[1].min.y);
        CHECK(history.undoLabel() == "Move VR1");
        REQUIRE(history.undo(board));
        CHECK(board == before);
    }

    SUBCASE("a drag of a part and a pot is one undo step") {
        netcheck::edit::History history;
        const netcheck::Board before = board;
        const Selected both{{ElementRef::Kind::Part, 0}, {ElementRef::Kind::Offboard, 1}};
        constexpr int kDrag = 7;
        history.perform(moveCommand(board, both, 1, 0), board, kDrag);
        history.perform(moveCommand(board, both, 0, 1), board, kDrag);
        CHECK(history.depth() == 1);
        CHECK(board.parts[0].pins[0].hole == netcheck::Hole{3, 3});
        CHECK(placeOf(board.offboard[1])->y == doctest::Approx(column[1].min.y + 1));
        CHECK(placeOf(board.offboard[1])->x == doctest::Approx(column[1].min.x + 1));
        CHECK_FALSE(placeOf(board.offboard[0]));
        REQUIRE(history.undo(board));
        CHECK(board == before);
    }

    SUBCASE("the place survives the board file") {
        board.offboard[0] = placedAt(board.offboard[0], {-6.0f, 4.2f});
        const auto read = netcheck::readBoard(netcheck::writeBoard(board), "placed.board.json");
        REQUIRE(read.ok());
        CHECK(read.value->offboard[0].extra["place"] == nlohmann::json{{"x", -6.0}, {"y", 4.2}});
        CHECK(layoutOffboard(*read.value)[0].min.x == doctest::Approx(-6.0f));
    }

    SUBCASE("an unusable place puts the part back in the column") {
        for (const char* place : {R"("left")", R"({"x": 3})", R"({"x": "3", "y": 4})", R"({"x": 3, "y": 1e9})"}) {
            CAPTURE(place);
            board.offboard[0].extra["place"] = nlohmann::json::parse(place);
            CHECK_FALSE(placeOf(board.offboard[0]));
            CHECK(layoutOffboard(board)[0].min.x == column[0].min.x);
        }
    }

    SUBCASE("nothing to move") {
        CHECK(moveCommand(board, {{ElementRef::Kind::Offboard, 0}}, 0, 0) == nullptr);
        CHECK(moveCommand(board, {}, 1, 0) == nullptr);
    }
}
