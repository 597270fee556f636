#include "editor/app/editor_app.hpp"

#include <cstdio>
#include <exception>

#include <imgui.h>

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

void EditorApp::say(std::string message) {
    status = std::move(message);
    if (logHoles) std::fprintf(stderr, "STRIPSMITH_E2E status %s\n", status.c_str());
}

void EditorApp::logItem(const std::string& name) {
    if (!logHoles) return;
    const ImVec2 a = ImGui::GetItemRectMin(), b = ImGui::GetItemRectMax();
    char where[64];
    std::snprintf(where, sizeof where, "%.0f %.0f", static_cast<double>((a.x + b.x) * 0.5f),
                  static_cast<double>((a.y + b.y) * 0.5f));
    std::string& last = loggedItems[name];
    if (last == where) return;
    last = where;
    std::fprintf(stderr, "STRIPSMITH_E2E item %s %s\n", name.c_str(), where);
}

void EditorApp::logFrame(unsigned long keysTaken, unsigned long buttonsTaken) {
    if (!logHoles) return;
    ++loggedFrames;
    char mouse[32] = "- -";
    if (const ImVec2 at = ImGui::GetIO().MousePos; ImGui::IsMousePosValid(&at))
        std::snprintf(mouse, sizeof mouse, "%.0f %.0f", static_cast<double>(at.x), static_cast<double>(at.y));
    std::fprintf(stderr, "STRIPSMITH_E2E frame %lu revision %u keys %lu buttons %lu mouse %s\n", loggedFrames,
                 doc.revision(), keysTaken, buttonsTaken, mouse);
}

}  // namespace stripsmith
