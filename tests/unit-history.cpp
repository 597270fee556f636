// The undo/redo history: order, redo list, merged drags, and the "unsaved changes" state.
#include <doctest/doctest.h>

#include "netcheck/edit/edit.hpp"

using namespace netcheck;
using namespace netcheck::edit;

namespace {

Board startBoard() {
    Board board;
    board.rows = 5;
    board.cols = 10;
    board.parts = {Part{"R1", "resistor", "10k", {{"1", {0, 0}}, {"2", {0, 4}}}, {}}};
    return board;
}

std::unique_ptr<Command> cutAt(const Board& board, int row, int col) {
    return toggleCut(board, Cut{{row, col}, Cut::Kind::Hole});
}

std::unique_ptr<Command> moveR1(const Board& board, int cols) {
    return moveElements(board, {{ElementRef::Kind::Part, 0}}, 0, cols);
}

}  // namespace

TEST_CASE("history") {
    const Board start = startBoard();
    Board board = start;
    History history;

    SUBCASE("undo and redo walk the commands in order") {
        CHECK_FALSE(history.canUndo());
        CHECK_FALSE(history.undo(board));
        history.perform(cutAt(board, 1, 1), board);
        const Board one = board;
        history.perform(cutAt(board, 2, 2), board);
        const Board two = board;
        CHECK(history.undoLabel() == "Add cut C3");
        CHECK(history.redoLabel().empty());
        CHECK(history.undo(board));
        CHECK(board == one);
        CHECK(history.lastTouched() == std::vector<Hole>{{2, 2}});
        CHECK(history.redoLabel() == "Add cut C3");
        CHECK(history.undo(board));
        CHECK(board == start);
        CHECK_FALSE(history.canUndo());
        CHECK(history.redo(board));
        CHECK(history.redo(board));
        CHECK(board == two);
        CHECK_FALSE(history.redo(board));
    }

    SUBCASE("a new command clears the redo list") {
        history.perform(cutAt(board, 1, 1), board);
        history.undo(board);
        history.perform(cutAt(board, 3, 3), board);
        CHECK_FALSE(history.canRedo());
        history.undo(board);
        CHECK(board == start);
    }

    SUBCASE("a failing command leaves board and history as they were") {
        history.perform(cutAt(board, 1, 1), board);
        const Board before = board;
        auto stale = std::make_unique<RemovePart>(start, 0);
        board.parts[0].value = "22k";
        const Board changed = board;
        CHECK_THROWS_AS(history.perform(std::move(stale), board), OutOfStepError);
        CHECK(board == changed);
        CHECK(history.undoLabel() == "Add cut B2");
        (void)before;
    }

    SUBCASE("a drag with one merge key is one undo step") {
        for (int step = 0; step < 5; ++step) history.perform(moveR1(board, 1), board, 7);
        history.endMerge();
        CHECK(board.parts[0].pins[0].hole == Hole{0, 5});
        CHECK(history.undoLabel() == "Move R1");
        history.perform(moveR1(board, 1), board, 7);  // a new drag after endMerge
        history.undo(board);
        CHECK(board.parts[0].pins[0].hole == Hole{0, 5});
        history.undo(board);
        CHECK(board == start);
        CHECK_FALSE(history.canUndo());
    }

    SUBCASE("different merge keys or no key do not merge") {
        history.perform(moveR1(board, 1), board, 1);
        history.perform(moveR1(board, 1), board, 2);
        history.perform(moveR1(board, 1), board);
        history.perform(moveR1(board, 1), board);
        int steps = 0;
        while (history.undo(board)) ++steps;
        CHECK(steps == 4);
        CHECK(board == start);
    }

    SUBCASE("modified state follows the saved depth") {
        CHECK_FALSE(history.isModified());
        history.perform(cutAt(board, 1, 1), board);
        CHECK(history.isModified());
        history.markSaved();
        CHECK_FALSE(history.isModified());
        history.undo(board);
        CHECK(history.isModified());
        history.redo(board);
        CHECK_FALSE(history.isModified());

        SUBCASE("a drag that started before the save does not merge into the saved step") {
            history.perform(moveR1(board, 1), board, 3);
            history.markSaved();
            history.perform(moveR1(board, 1), board, 3);
            CHECK(history.isModified());
            history.undo(board);
            CHECK_FALSE(history.isModified());
        }
        SUBCASE("the saved state lost from the redo list stays modified for good") {
            history.undo(board);
            history.perform(cutAt(board, 4, 4), board);
            CHECK(history.isModified());
            history.undo(board);
            CHECK(history.isModified());  // the board is as before the save, not as saved
        }
        SUBCASE("clear starts a fresh unmodified document") {
            history.perform(cutAt(board, 4, 4), board);
            history.clear();
            CHECK_FALSE(history.isModified());
            CHECK_FALSE(history.canUndo());
            CHECK(history.lastTouched().empty());
        }
    }

    SUBCASE("a null command is ignored") {
        history.perform(nullptr, board);
        CHECK_FALSE(history.canUndo());
    }
}
