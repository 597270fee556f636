// The menus: File, Edit, View, Board, Help.
#include <imgui.h>

#include <algorithm>

#include "editor/app/look.hpp"
#include "editor/panels/panel_layout.hpp"
#include "editor/panels/panels.hpp"

namespace stripsmith {
namespace {

void exportSheet(const MenuContext& c) {
    const std::string& path = c.doc.path();
    std::string name = path.empty() ? "board" : path;
    const auto slash = name.find_last_of('/');
    if (slash != std::string::npos) name = name.substr(slash + 1);
    if (const auto dot = name.find('.'); dot != std::string::npos) name = name.substr(0, dot);
    const auto folder = path.empty() ? std::string() : path.substr(0, path.find_last_of('/'));
    c.chooser.open(FileChooser::Purpose::ExportSheet, folder, name + "-sheet.pdf");
}

FileRequest fileMenu(const MenuContext& c) {
    using Kind = FileRequest::Kind;
    FileRequest request;
    if (!ImGui::BeginMenu("File")) {
        c.log.item("menu-file");
        return request;
    }
    if (ImGui::MenuItem("New board", "Ctrl+N")) request.kind = Kind::New;
    if (ImGui::MenuItem("Open...", "Ctrl+O")) request.kind = Kind::Open;
    if (ImGui::BeginMenu("Open recent", !c.recent.paths().empty())) {
        for (const std::string& path : c.recent.paths())
            if (ImGui::MenuItem(path.c_str())) request = {Kind::OpenRecent, path};
        ImGui::EndMenu();
    }
    if (ImGui::MenuItem("Save", "Ctrl+S")) request.kind = Kind::Save;
    if (ImGui::MenuItem("Save as...", "Ctrl+Shift+S")) request.kind = Kind::SaveAs;
    ImGui::Separator();
    if (ImGui::MenuItem("Export build sheet (PDF/SVG)...")) exportSheet(c);
    c.log.item("menu-export-sheet");
    ImGui::Separator();
    if (ImGui::MenuItem("Quit", "Ctrl+Q")) request.kind = Kind::Quit;
    ImGui::EndMenu();
    return request;
}

void editMenu(const MenuContext& c) {
    if (!ImGui::BeginMenu("Edit")) return;
    const auto& history = c.doc.history();
    const std::string undoText = history.canUndo() ? "Undo " + history.undoLabel() : "Undo";
    const std::string redoText = history.canRedo() ? "Redo " + history.redoLabel() : "Redo";
    if (ImGui::MenuItem(undoText.c_str(), "Ctrl+Z", false, history.canUndo())) undo(c.edit);
    if (ImGui::MenuItem(redoText.c_str(), "Ctrl+Y", false, history.canRedo())) redo(c.edit);
    ImGui::Separator();
    const bool any = !c.edit.selection.empty();
    if (ImGui::MenuItem("Copy", "Ctrl+C", false, any)) copySelection(c.edit);
    if (ImGui::MenuItem("Paste", "Ctrl+V", false, !c.edit.clipboard.empty()))
        paste(c.edit, c.pasteAt);
    if (ImGui::MenuItem("Duplicate", "Ctrl+D", false, any)) duplicateSelection(c.edit);
    if (ImGui::MenuItem("Turn 90°", "R", false, any)) rotateSelection(c.edit);
    if (ImGui::MenuItem("Delete", "Del", false, any)) deleteSelection(c.edit);
    if (ImGui::MenuItem("Select all", "Ctrl+A")) selectAll(c.edit);
    ImGui::EndMenu();
}

void viewMenu(const MenuContext& c) {
    ViewState& view = c.view;
    if (!ImGui::BeginMenu("View")) {
        c.log.item("menu-view");
        return;
    }
    auto side = [&](const char* label, Side s) {
        if (ImGui::MenuItem(label, nullptr, view.side == s)) {
            view.side = s;
            view.fitPending = true;
        }
    };
    side("Component side", Side::Component);
    side("Copper side (mirrored)", Side::Copper);
    side("See-through", Side::SeeThrough);
    ImGui::Separator();
    if (ImGui::MenuItem("Fit board", "F")) view.fitPending = true;
    ImGui::MenuItem("Circuit panel", nullptr, &view.showCircuit);
    c.log.item("menu-circuit-panel");
    ImGui::MenuItem("Bench voltages", nullptr, &view.showBenchVoltages);
    c.log.item("menu-bench-voltages");
    if (c.showJfetBias) ImGui::MenuItem("JFET bias helper", nullptr, c.showJfetBias);
    c.log.item("menu-jfet-bias");
    if (ImGui::BeginMenu("Interface size")) {
        if (ImGui::MenuItem("Normal (1x)", nullptr, view.uiScale == 1)) view.uiScale = 1;
        if (ImGui::MenuItem("Large (2x)", nullptr, view.uiScale == 2)) view.uiScale = 2;
        ImGui::EndMenu();
    }
    ImGui::EndMenu();
}

// Board: the layout engine's two entries, which open the layout dialog (they need a circuit).
void boardMenu(const MenuContext& c) {
    if (!ImGui::BeginMenu("Board")) {
        c.log.item("menu-board");
        return;
    }
    const netcheck::Board& board = c.doc.board();
    const bool circuit = board.circuit && !board.circuit->parts.empty() && c.layout != nullptr;
    if (ImGui::MenuItem("Lay out from the circuit...", nullptr, false, circuit))
        openLayoutDialog(*c.layout, false);
    c.log.item("menu-layout");
    if (ImGui::MenuItem("Place the remaining parts...", nullptr, false,
                        circuit && !board.parts.empty()))
        openLayoutDialog(*c.layout, true);
    c.log.item("menu-place-rest");
    if (!circuit) ImGui::TextDisabled("(load a circuit in the Circuit panel first)");
    ImGui::EndMenu();
}

// "Check: OK" would claim too much for a circuit of parts whose nets are not typed in yet: the
// check then has nothing to hold the copper against.
bool circuitWithoutNets(const netcheck::Board& board) {
    return board.circuit && !board.circuit->parts.empty() && board.circuit->nets.empty();
}

void titleAndCheck(const Document& doc, TestLog& log) {
    const auto& report = doc.report();
    const std::string title = (doc.path().empty() ? std::string("untitled") : doc.path()) +
                              (doc.modified() ? " *" : "") +
                              (doc.readOnly() ? "  [read-only]" : "");
    ImGui::SameLine(ImGui::GetWindowWidth() * 0.35f);
    ImGui::TextDisabled("%s", title.c_str());
    const std::size_t warnings = report.warnings.size();
    const std::size_t errors = report.errors.size();
    std::string summary;
    ImVec4 colour = look::kGoodText;
    if (!report.ok()) {
        summary = "Check: " + std::to_string(errors) + " error" + (errors == 1 ? "" : "s");
        colour = look::kErrorText;
    } else if (circuitWithoutNets(doc.board())) {
        summary = "Check: the circuit has no nets yet";
        colour = look::kWarningText;
    } else {
        summary = "Check: OK (" + std::to_string(warnings) + " warning" +
                  (warnings == 1 ? "" : "s") + ")";
    }
    const float width = ImGui::CalcTextSize(summary.c_str()).x;
    ImGui::SameLine(ImGui::GetWindowWidth() - std::max(220.0f, width + 20.0f));
    ImGui::TextColored(colour, "%s", summary.c_str());
    log.summary(summary);
}

}  // namespace

FileRequest drawMenuBar(const MenuContext& c) {
    if (!ImGui::BeginMainMenuBar()) return {};
    const FileRequest request = fileMenu(c);
    editMenu(c);
    viewMenu(c);
    boardMenu(c);
    if (ImGui::BeginMenu("Help")) {
        ImGui::MenuItem("Keys", "F1", &c.view.showHelp);
        ImGui::EndMenu();
    }
    titleAndCheck(c.doc, c.log);
    ImGui::EndMainMenuBar();
    return request;
}

}  // namespace stripsmith
