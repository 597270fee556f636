#include "editor/app/editor_app.hpp"

#include <exception>

namespace stripsmith {

bool EditorApp::perform(std::unique_ptr<netcheck::edit::Command> command, int mergeKey) {
    if (!command) return false;
    if (doc.readOnly()) {
        say("This board is open read-only (written by a newer version). Use Save As to keep a copy.");
        return false;
    }
    const std::string label = command->label();
    try {
        if (!doc.perform(std::move(command), mergeKey)) return false;
    } catch (const std::exception& e) {
        // A command built against a stale board: nothing was changed.
        say(std::string("Could not do that: ") + e.what());
        return false;
    }
    say(label);
    return true;
}

}  // namespace stripsmith
