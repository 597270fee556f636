// The JFET bias panel's Apply: one command that sets a part's value, undone in one step.
#include <doctest/doctest.h>

#include "editor/app/document.hpp"
#include "editor/tools/set_part_value.hpp"

using namespace stripsmith;

TEST_CASE("set part value") {
    netcheck::Board board;
    board.parts.push_back({"RS", "resistor", "1k", {{"1", {0, 0}}, {"2", {0, 4}}}, {}});
    Document doc;
    doc.reset(board, "");
    auto command = setPartValue(doc.board(), "RS", "820R", "Set RS to 820R (JFET bias)");
    REQUIRE(command);
    CHECK(doc.perform(std::move(command)));
    CHECK(doc.board().parts[0].value == "820R");
    CHECK(doc.undo());
    CHECK(doc.board().parts[0].value == "1k");
    CHECK(doc.redo());
    CHECK(doc.board().parts[0].value == "820R");
    CHECK(setPartValue(doc.board(), "R99", "1k", "") == nullptr);
}
