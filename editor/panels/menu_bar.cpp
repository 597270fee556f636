// The menus: File, Edit, View, Help.
#include <imgui.h>

#include "editor/app/edit_actions.hpp"
#include "editor/files/file_actions.hpp"
#include "editor/panels/panels.hpp"

namespace stripsmith {
namespace {

void fileMenu(EditorApp& app) {
    if (!ImGui::BeginMenu("File")) return;
    if (ImGui::MenuItem("New board", "Ctrl+N")) actionNew(app);
    if (ImGui::MenuItem("Open...", "Ctrl+O")) actionOpen(app);
    if (ImGui::BeginMenu("Open recent", !app.recent.paths().empty())) {
        for (const std::string& path : app.recent.paths())
            if (ImGui::MenuItem(path.c_str())) actionOpenPath(app, path);
        ImGui::EndMenu();
    }
    if (ImGui::MenuItem("Save", "Ctrl+S")) actionSave(app);
    if (ImGui::MenuItem("Save as...", "Ctrl+Shift+S")) actionSaveAs(app);
    ImGui::Separator();
    if (ImGui::MenuItem("Export build sheet (PDF/SVG)...")) {
        std::string name = app.doc.path().empty() ? "board" : app.doc.path();
        const auto slash = name.find_last_of('/');
        if (slash != std::string::npos) name = name.substr(slash + 1);
        if (const auto dot = name.find('.'); dot != std::string::npos) name = name.substr(0, dot);
        const auto folder = app.doc.path().empty() ? std::string() : app.doc.path().substr(0, app.doc.path().find_last_of('/'));
        app.chooser.open(FileChooser::Purpose::ExportSheet, folder, name + "-sheet.pdf");
    }
    ImGui::Separator();
    if (ImGui::MenuItem("Quit", "Ctrl+Q")) actionQuit(app);
    ImGui::EndMenu();
}

void editMenu(EditorApp& app) {
    if (!ImGui::BeginMenu("Edit")) return;
    const auto& history = app.doc.history();
    const std::string undoText = history.canUndo() ? "Undo " + history.undoLabel() : "Undo";
    const std::string redoText = history.canRedo() ? "Redo " + history.redoLabel() : "Redo";
    if (ImGui::MenuItem(undoText.c_str(), "Ctrl+Z", false, history.canUndo())) undo(app);
    if (ImGui::MenuItem(redoText.c_str(), "Ctrl+Y", false, history.canRedo())) redo(app);
    ImGui::Separator();
    const bool any = !app.selection.empty();
    if (ImGui::MenuItem("Copy", "Ctrl+C", false, any)) copySelection(app);
    if (ImGui::MenuItem("Paste", "Ctrl+V", false, !app.clipboard.empty())) paste(app, app.hoverHole);
    if (ImGui::MenuItem("Duplicate", "Ctrl+D", false, any)) duplicateSelection(app);
    if (ImGui::MenuItem("Turn 90°", "R", false, any)) rotateSelection(app);
    if (ImGui::MenuItem("Delete", "Del", false, any)) deleteSelection(app);
    if (ImGui::MenuItem("Select all", "Ctrl+A")) selectAll(app);
    ImGui::EndMenu();
}

void viewMenu(EditorApp& app) {
    if (!ImGui::BeginMenu("View")) {
        app.logItem("menu-view");
        return;
    }
    auto side = [&](const char* label, Side s) {
        if (ImGui::MenuItem(label, nullptr, app.view.side == s)) {
            app.view.side = s;
            app.view.fitPending = true;
        }
    };
    side("Component side", Side::Component);
    side("Copper side (mirrored)", Side::Copper);
    side("See-through", Side::SeeThrough);
    ImGui::Separator();
    if (ImGui::MenuItem("Fit board", "F")) app.view.fitPending = true;
    ImGui::MenuItem("Circuit panel", nullptr, &app.view.showCircuit);
    app.logItem("menu-circuit-panel");
    if (ImGui::BeginMenu("Interface size")) {
        if (ImGui::MenuItem("Normal (1x)", nullptr, app.view.uiScale == 1)) app.view.uiScale = 1;
        if (ImGui::MenuItem("Large (2x)", nullptr, app.view.uiScale == 2)) app.view.uiScale = 2;
        ImGui::EndMenu();
    }
    ImGui::EndMenu();
}

}  // namespace

void drawMenuBar(EditorApp& app) {
    if (!ImGui::BeginMainMenuBar()) return;
    fileMenu(app);
    editMenu(app);
    viewMenu(app);
    if (ImGui::BeginMenu("Help")) {
        ImGui::MenuItem("Keys", "F1", &app.view.showHelp);
        ImGui::EndMenu();
    }
    const auto& report = app.doc.report();
    const std::string title = (app.doc.path().empty() ? std::string("untitled") : app.doc.path()) +
                              (app.doc.modified() ? " *" : "") + (app.doc.readOnly() ? "  [read-only]" : "");
    ImGui::SameLine(ImGui::GetWindowWidth() * 0.35f);
    ImGui::TextDisabled("%s", title.c_str());
    ImGui::SameLine(ImGui::GetWindowWidth() - 220);
    const std::size_t warnings = report.warnings.size();
    const std::size_t errors = report.errors.size();
    if (report.ok())
        ImGui::TextColored({0.45f, 0.9f, 0.55f, 1.0f}, "Check: OK (%zu warning%s)", warnings, warnings == 1 ? "" : "s");
    else ImGui::TextColored({1.0f, 0.5f, 0.45f, 1.0f}, "Check: %zu error%s", errors, errors == 1 ? "" : "s");
    ImGui::EndMainMenuBar();
}

}  // namespace stripsmith
