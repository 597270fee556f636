// The way panels and tools change the board: commands on the document, reported in the status line.
#include <doctest/doctest.h>

#include "editor/app/commands.hpp"
#include "netcheck/edit/cut_commands.hpp"

using namespace stripsmith;

namespace {

netcheck::Board plainBoard() {
    netcheck::Board board;
    board.rows = 3;
    board.cols = 6;
    return board;
}

std::unique_ptr<netcheck::edit::Command> cutAt(const Document& doc, netcheck::Hole hole) {
    return netcheck::edit::toggleCut(doc.board(), netcheck::Cut{hole, netcheck::Cut::Kind::Hole});
}

}  // namespace

TEST_CASE("commands change the document and say what they did") {
    Document doc;
    doc.reset(plainBoard(), "");
    std::string status;
    const TestLog log;
    const Commands commands(doc, status, log);

    REQUIRE(commands.perform(cutAt(doc, {0, 2})));
    CHECK(doc.board().cuts.size() == 1);
    CHECK_FALSE(status.empty());
    const std::string label = status;

    REQUIRE(commands.undo());
    CHECK(doc.board().cuts.empty());
    CHECK(status == "Undid: " + label);
    REQUIRE(commands.redo());
    CHECK(doc.board().cuts.size() == 1);
    CHECK(status == "Redid: " + label);
    CHECK_FALSE(commands.perform(nullptr));
}

TEST_CASE("a read-only document refuses commands and says why") {
    Document doc;
    doc.reset(plainBoard(), "newer.board.json", true);
    std::string status;
    const TestLog log;
    const Commands commands(doc, status, log);

    CHECK_FALSE(commands.perform(cutAt(doc, {0, 2})));
    CHECK(doc.board().cuts.empty());
    CHECK(status.find("read-only") != std::string::npos);
}
