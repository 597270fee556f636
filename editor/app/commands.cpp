#include "editor/app/commands.hpp"

#include <exception>

namespace stripsmith {

bool Commands::perform(std::unique_ptr<netcheck::edit::Command> command, int mergeKey) const {
    if (!command) return false;
    if (doc_.readOnly()) {
        say("This board is open read-only (written by a newer version). Use Save As to keep a "
            "copy.");
        return false;
    }
    const std::string label = command->label();
    try {
        if (!doc_.perform(std::move(command), mergeKey)) return false;
    } catch (const std::exception& e) {
        // A command built against a stale board: nothing was changed.
        say(std::string("Could not do that: ") + e.what());
        return false;
    }
    say(label);
    return true;
}

bool Commands::undo() const {
    const std::string label = doc_.history().undoLabel();
    if (!doc_.undo()) return false;
    say("Undid: " + label);
    return true;
}

bool Commands::redo() const {
    const std::string label = doc_.history().redoLabel();
    if (!doc_.redo()) return false;
    say("Redid: " + label);
    return true;
}

void Commands::say(std::string message) const {
    status_ = std::move(message);
    log_.status(status_);
}

}  // namespace stripsmith
