// Board <-> screen transforms and hit-testing of holes and the gaps between them.
#include <doctest/doctest.h>

#include "editor/canvas/board_transform.hpp"
#include "editor/canvas/offboard_layout.hpp"

using namespace stripsmith;
using netcheck::Cut;
using netcheck::Hole;

TEST_CASE("canvas transform") {
    BoardTransform t;
    t.origin = {100, 50};
    t.holePx = 20;
    t.cols = 24;

    SUBCASE("component side: hole 1 at the left, strip A at the top") {
        const ImVec2 a1 = t.holeCentre({0, 0});
        CHECK(a1.x == doctest::Approx(110));
        CHECK(a1.y == doctest::Approx(60));
        const ImVec2 c12 = t.holeCentre({2, 11});
        CHECK(c12.x == doctest::Approx(100 + 11.5 * 20));
        CHECK(c12.y == doctest::Approx(50 + 2.5 * 20));
    }
    SUBCASE("copper side is mirrored left-right: hole 1 at the right, rows unchanged") {
        t.mirrored = true;
        const ImVec2 a1 = t.holeCentre({0, 0});
        const ImVec2 a24 = t.holeCentre({0, 23});
        CHECK(a1.x > a24.x);
        CHECK(a1.x == doctest::Approx(100 + 23.5 * 20));
        CHECK(a24.x == doctest::Approx(110));
        CHECK(a1.y == doctest::Approx(60));
    }
    SUBCASE("screen to board undoes board to screen, both sides") {
        for (bool mirrored : {false, true}) {
            CAPTURE(mirrored);
            t.mirrored = mirrored;
            for (ImVec2 p : {ImVec2{0.5f, 0.5f}, ImVec2{3.25f, 7.75f}, ImVec2{23.9f, 0.1f}}) {
                const ImVec2 back = t.toBoard(t.toScreen(p));
                CHECK(back.x == doctest::Approx(p.x));
                CHECK(back.y == doctest::Approx(p.y));
            }
        }
    }
    SUBCASE("zooming about the cursor keeps the board point under it") {
        const ImVec2 cursor{333, 222};
        const ImVec2 before = t.toBoard(cursor);
        t.origin = zoomAbout(t.origin, t.holePx, 37.0f, cursor);
        t.holePx = 37.0f;
        const ImVec2 after = t.toBoard(cursor);
        CHECK(after.x == doctest::Approx(before.x));
        CHECK(after.y == doctest::Approx(before.y));
    }
}

TEST_CASE("hole hit-testing") {
    SUBCASE("a point near a hole centre names that hole") {
        CHECK(holeAt({2.5f, 1.5f}, 10, 24) == Hole{1, 2});
        CHECK(holeAt({2.8f, 1.2f}, 10, 24) == Hole{1, 2});
    }
    SUBCASE("outside the board or far from a centre: none") {
        CHECK_FALSE(holeAt({-0.5f, 1.5f}, 10, 24));
        CHECK_FALSE(holeAt({24.5f, 1.5f}, 10, 24));
        CHECK_FALSE(holeAt({2.95f, 1.95f}, 10, 24, 0.5f));
    }
}

TEST_CASE("cut hit-testing") {
    SUBCASE("near a hole centre: a hole cut") {
        CHECK(cutAt({4.6f, 2.5f}, 10, 24) == Cut{{2, 4}, Cut::Kind::Hole});
    }
    SUBCASE("near the gap between two holes: a between cut named by the left hole") {
        CHECK(cutAt({5.05f, 2.5f}, 10, 24) == Cut{{2, 4}, Cut::Kind::Between});
        CHECK(cutAt({4.95f, 2.5f}, 10, 24) == Cut{{2, 4}, Cut::Kind::Between});
    }
    SUBCASE("the outer edges have no gap to cut") {
        CHECK_FALSE(cutAt({0.05f, 2.5f}, 10, 24));
        CHECK_FALSE(cutAt({23.95f, 2.5f}, 10, 24));
    }
}

TEST_CASE("off-board layout") {
    netcheck::Board board;
    board.offboard.push_back({"VR1", "pot", "B100k", {"1", "2", "3"}, nlohmann::json::object()});
    board.offboard.push_back({"J1", "jack", "", {"T", "S"}, nlohmann::json::object()});
    const auto spots = layoutOffboard(board);
    REQUIRE(spots.size() == 2);
    SUBCASE("parts sit to the right of the board, one below the other") {
        CHECK(spots[0].min.x > static_cast<float>(board.cols));
        CHECK(spots[1].min.y > spots[0].max.y);
    }
    SUBCASE("a lug is found at its own position and a wire end resolves to it") {
        const auto lug = lugAt(board, spots, spots[0].lugs[1]);
        REQUIRE(lug);
        CHECK(lug->name() == "VR1.2");
        const auto p = endpointPosition(board, spots, netcheck::Endpoint::atLug({"J1", "S"}));
        REQUIRE(p);
        CHECK(p->x == doctest::Approx(spots[1].lugs[1].x));
    }
    SUBCASE("fit bounds take in the off-board parts on the side they are drawn") {
        const auto plain = contentBounds(board, spots, false);
        const auto mirrored = contentBounds(board, spots, true);
        CHECK(plain.max.x > static_cast<float>(board.cols) + 3);
        CHECK(mirrored.min.x < -3);
    }
}
