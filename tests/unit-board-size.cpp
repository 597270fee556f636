// Board sizes are written in one order everywhere: holes across (along a strip) x strips, and
// millimetres as width x height. tests/cli/test-size-order.sh checks no other code formats them.
#include <doctest/doctest.h>

#include "netcheck/model/board.hpp"
#include "netcheck/model/board_size.hpp"

using namespace netcheck;

TEST_CASE("board size") {
    SUBCASE("holes across x strips") {
        CHECK(sizeInHoles(24, 10) == "24 x 10 holes");
        CHECK(sizeInHoles(1, 300) == "1 x 300 holes");
    }

    SUBCASE("millimetres width x height, rounded half away from zero") {
        // 24 holes at 2.54 mm = 60.96 mm, 10 strips = 25.4 mm (0.1 in pitch, the common stripboard).
        CHECK(sizeInMm(60.96, 25.4) == "61.0 x 25.4 mm");
        CHECK(sizeInMm(60.96, 25.4, 2) == "60.96 x 25.40 mm");
        CHECK(sizeInMm(10.25, 7.62) == "10.3 x 7.6 mm");
    }

    SUBCASE("a whole board: columns first, whatever the shape") {
        Board board;
        board.rows = 10;
        board.cols = 24;
        CHECK(boardSize(board) == "24 x 10 holes (61.0 x 25.4 mm)");
        board.rows = 30;
        board.cols = 5;
        // 5 x 2.54 = 12.7 mm wide, 30 x 2.54 = 76.2 mm high.
        CHECK(boardSize(board) == "5 x 30 holes (12.7 x 76.2 mm)");
    }
}
