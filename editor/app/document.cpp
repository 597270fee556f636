#include "editor/app/document.hpp"

#include "netcheck/check.hpp"

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
    // Connectivity keeps a pointer to the board it traced; board_ never moves.
    connectivity_ = std::make_unique<netcheck::Connectivity>(board_);
    islands_ = connectivity_->islands();
    report_ = checker_.check(board_);
    ++revision_;
}

std::optional<std::string> Document::netOfIsland(int island) const {
    if (island < 0 || island >= static_cast<int>(islands_.size()) || !board_.circuit) return std::nullopt;
    for (const netcheck::PinRef& pin : islands_[static_cast<std::size_t>(island)].pins)
        if (auto net = board_.circuit->netOf(pin)) return net;
    return std::nullopt;
}

}  // namespace stripsmith
