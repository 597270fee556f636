// Page layout of the build sheet: paper sizes, true scale, mirroring, splitting big boards.
#include <doctest/doctest.h>

#include <set>

#include "editor/sheet/page_layout.hpp"
#include "editor/sheet/paper.hpp"

using netcheck::Board;
using netcheck::Hole;
using namespace sheet;

namespace {

Board boardOf(int rows, int cols) {
    Board board;
    board.rows = rows;
    board.cols = cols;
    return board;
}

const ViewPlacement& firstView(const SheetPlan& plan, Side side) {
    for (const ViewPlacement& view : plan.views) {
        if (view.side == side) return view;
    }
    FAIL("no view of that side");
    return plan.views.front();
}

}  // namespace

TEST_CASE("sheet layout") {
    SUBCASE("paper sizes") {
        // ISO 216: A4 is 210 x 297 mm.
        CHECK(paperSize(Paper::A4).widthMm == doctest::Approx(210.0));
        CHECK(paperSize(Paper::A4).heightMm == doctest::Approx(297.0));
        // US Letter is 8.5 x 11 in; 1 in = 25.4 mm exactly (1959 international inch).
        CHECK(paperSize(Paper::Letter).widthMm == doctest::Approx(215.9));
        CHECK(paperSize(Paper::Letter).heightMm == doctest::Approx(279.4));
        // ISO 32000-1: 1 PDF unit = 1/72 in, so A4 is 595.276 x 841.890 pt.
        CHECK(210.0 * kPointsPerMm == doctest::Approx(595.276).epsilon(1e-6));
        CHECK(297.0 * kPointsPerMm == doctest::Approx(841.890).epsilon(1e-6));
        CHECK(parsePaper("A4") == Paper::A4);
        CHECK(parsePaper("letter") == Paper::Letter);
        CHECK_FALSE(parsePaper("a5").has_value());
    }

    SUBCASE("a small board has both sides on page 1 at true scale") {
        SheetPlan plan = planSheet(boardOf(10, 24), {});
        REQUIRE(plan.views.size() == 2);
        CHECK(plan.boardPageCount == 1);
        CHECK_FALSE(plan.split);
        for (const ViewPlacement& view : plan.views) {
            CHECK(view.pageIndex == 0);
            // 0.1 in pitch = 2.54 mm: A1 to A10 is 9 pitches = 22.86 mm on paper.
            Point a1 = holeCentre(view, plan.pitchMm, {0, 0});
            Point a10 = holeCentre(view, plan.pitchMm, {0, 9});
            CHECK(std::abs(a10.x - a1.x) == doctest::Approx(22.86));
            CHECK(a10.y == doctest::Approx(a1.y));
            // Views stay inside the paper's margins.
            CHECK(view.board.x >= plan.content.x);
            CHECK(view.board.right() <= plan.content.right());
            CHECK(view.board.bottom() <= plan.frame.views.bottom());
        }
    }

    SUBCASE("the copper side is mirrored: hole 1 at the right end of the top row") {
        SheetPlan plan = planSheet(boardOf(10, 24), {});
        const ViewPlacement& top = firstView(plan, Side::Component);
        const ViewPlacement& bottom = firstView(plan, Side::Copper);
        Point a1 = holeCentre(bottom, plan.pitchMm, {0, 0});
        Point a24 = holeCentre(bottom, plan.pitchMm, {0, 23});
        CHECK(a1.x > a24.x);
        CHECK(a1.x == doctest::Approx(bottom.board.right() - plan.pitchMm / 2));
        CHECK(holeCentre(top, plan.pitchMm, {0, 0}).x ==
              doctest::Approx(top.board.x + plan.pitchMm / 2));
    }

    SUBCASE("a board pitch other than 0.1 in is kept on paper") {
        Board board = boardOf(8, 20);
        board.pitchMm = 2.0;
        SheetPlan plan = planSheet(board, {});
        const ViewPlacement& view = firstView(plan, Side::Component);
        CHECK(holeCentre(view, 2.0, {0, 9}).x - holeCentre(view, 2.0, {0, 0}).x ==
              doctest::Approx(18.0));
    }

    SUBCASE("a board too big for one page is split into overlapping tiles") {
        Board board = boardOf(90, 100);
        SheetOptions options;
        options.overlapHoles = 2;
        SheetPlan plan = planSheet(board, options);
        CHECK(plan.split);
        CHECK(plan.boardPageCount == static_cast<int>(plan.views.size()));
        CHECK(plan.views.size() == 2 * plan.grid.tiles.size());
        std::set<std::pair<int, int>> covered;
        for (const Tile& tile : plan.grid.tiles) {
            for (int r = tile.row0; r < tile.row0 + tile.rows; ++r) {
                for (int c = tile.col0; c < tile.col0 + tile.cols; ++c) covered.insert({r, c});
            }
        }
        CHECK(covered.size() == 90u * 100u);
        for (const ViewPlacement& view : plan.views) {
            CHECK(view.board.right() <= plan.content.right() + 1e-9);
            CHECK(view.board.bottom() <= plan.frame.views.bottom() + 1e-9);
            CHECK(view.board.w == doctest::Approx(view.tile.cols * 2.54));
        }
        // Neighbours share exactly the overlap.
        const Tile& left = plan.grid.at(0, 0);
        const Tile& right = plan.grid.at(0, 1);
        CHECK(left.col0 + left.cols - right.col0 == 2);
    }

    SUBCASE("tileBoard") {
        SUBCASE("fits") {
            TileGrid grid = tileBoard(10, 20, 30, 40, 2);
            CHECK(grid.tiles.size() == 1);
            CHECK(grid.tiles[0].cols == 20);
        }
        SUBCASE("even tiles never above the maximum") {
            for (int cols = 41; cols < 200; cols += 7) {
                CAPTURE(cols);
                TileGrid grid = tileBoard(5, cols, 30, 40, 3);
                int previousEnd = -1;
                for (const Tile& tile : grid.tiles) {
                    CHECK(tile.cols <= 40);
                    CHECK(tile.cols >= 4);
                    if (previousEnd >= 0) CHECK(previousEnd - tile.col0 == 3);
                    previousEnd = tile.col0 + tile.cols;
                }
                CHECK(previousEnd == cols);
            }
        }
    }

    SUBCASE("copper tiles run right to left, as the turned-over board lies") {
        SheetPlan plan = planSheet(boardOf(20, 150), {});
        REQUIRE(plan.grid.gridCols >= 2);
        std::vector<int> copperCols;
        for (const ViewPlacement& view : plan.views) {
            if (view.side == Side::Copper && view.tile.gridRow == 0) {
                copperCols.push_back(view.tile.gridCol);
            }
        }
        REQUIRE(copperCols.size() >= 2);
        CHECK(copperCols.front() == plan.grid.gridCols - 1);
        CHECK(copperCols.back() == 0);
    }
}
