#include "editor/app/document.hpp"

#include "netcheck/check/check.hpp"

namespace stripsmith {

Document::Document() { recheck(); }

bool Document::perform(std::unique_ptr<netcheck::edit::Command> command, int mergeKey) {
    if (readOnly_ || !command) return false;
    history_.perform(std::move(command), board_, mergeKey);
    recheck();
    return true;
}

bool Document::undo() {
    if (readOnly_ || !history_.undo(board_)) return false;
    recheck();
    return true;
}

bool Document::redo() {
    if (readOnly_ || !history_.redo(board_)) return false;
    recheck();
    return true;
}

void Document::reset(netcheck::Board board, std::string path, bool readOnly, bool unsaved) {
    board_ = std::move(board);
    path_ = std::move(path);
    readOnly_ = readOnly;
    unsavedImport_ = unsaved;
    history_.clear();
    history_.markSaved();
    recheck();
}

void Document::markSaved(std::string path) {
    path_ = std::move(path);
    readOnly_ = false;
    unsavedImport_ = false;
    history_.markSaved();
}

void Document::recheck() {
    // The checker keeps a pointer to the board it traced; board_ never moves.
    report_ = checker_.check(board_);
    // The plan is searched only for a board with errors: a clean board costs nothing more.
    plan_ = report_.ok() ? netcheck::RepairPlan{} : netcheck::planRepair(board_);
    if (!report_.ok()) netcheck::attachPlan(report_, plan_, board_);
    ++revision_;
}

const Document::IslandDetails* Document::details(int id) const {
    if (id < 0 || id >= connectivity().islandCount()) return nullptr;
    if (details_.revision == revision_ && details_.island.id == id) return &details_;
    details_.revision = revision_;
    details_.island = connectivity().island(id);
    details_.net.reset();
    if (board_.circuit) {
        for (const netcheck::PinRef& pin : details_.island.pins) {
            if ((details_.net = board_.circuit->netOf(pin))) break;
        }
    }
    return &details_;
}

const netcheck::Island* Document::island(int id) const {
    const IslandDetails* found = details(id);
    return found ? &found->island : nullptr;
}

std::optional<std::string> Document::netOfIsland(int id) const {
    const IslandDetails* found = details(id);
    return found ? found->net : std::nullopt;
}

}  // namespace stripsmith
