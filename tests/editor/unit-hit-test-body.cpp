// A transistor is selected by a click anywhere on its drawn body, not only on its pins.
#include <doctest/doctest.h>

#include "editor/tools/hit_test.hpp"

using namespace stripsmith;
using netcheck::edit::ElementRef;

TEST_CASE("hit test: a click on a transistor's body selects it") {
    netcheck::Board board;
    board.rows = 10;
    board.cols = 10;
    // Leads in a row on strip D (row 3), holes 4 to 6: the canvas draws a D-shaped body on the
    // side below the lead line (towards larger y), its round back about 1.15 pitches out.
    board.parts.push_back({"Q1", "bjt", "BC547", {{"C", {3, 3}}, {"B", {3, 4}}, {"E", {3, 5}}}, {}});
    const std::vector<OffboardSpot> spots;
    const float leadLine = 3.5f, middle = 4.5f;
    // The body's middle, 0.8 pitch from the lead line: well inside the body, off every pin.
    const auto body = elementAt(board, spots, {middle, leadLine + 0.8f});
    REQUIRE(body.has_value());
    CHECK(body->kind == ElementRef::Kind::Part);
    CHECK(body->index == 0);
    // Towards the edge of the round back.
    CHECK(elementAt(board, spots, {middle + 0.7f, leadLine + 0.7f}).has_value());
    // Outside the body on the flat side, and beyond the round back: nothing.
    CHECK_FALSE(elementAt(board, spots, {middle, leadLine - 0.6f}).has_value());
    CHECK_FALSE(elementAt(board, spots, {middle, leadLine + 1.4f}).has_value());
}
