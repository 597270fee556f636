// Sections: the parts handed out | shortcuts | the frame.
#include "editor/frame.hpp"

#include <imgui.h>
#include <imgui_internal.h>  // GetActiveID, GetInputTextState: which text field has the keys now
#include <SFML/Window/Keyboard.hpp>

#include "editor/app/look.hpp"
#include "editor/canvas/canvas.hpp"
#include "editor/file_actions.hpp"
#include "editor/panels/panel_layout.hpp"
#include "editor/panels/panels.hpp"
#include "editor/platform/imgui_impl_sfml.hpp"
#include "editor/tools/edit_actions.hpp"
#include "editor/tools/tools.hpp"
#include "netcheck/voltage/voltage_report.hpp"

namespace stripsmith {

namespace {

// ---- the parts handed out -------------------------------------------------------------------

EditContext editContext(EditorApp& app) {
    return {app.doc, app.selection, app.clipboard, app.commands()};
}

ToolContext toolContext(EditorApp& app) {
    return {app.doc, app.selection, app.tool, app.commands()};
}

MenuContext menuContext(EditorApp& app) {
    return {app.doc,  app.recent,      app.chooser, app.view, editContext(app), app.hover.hole,
            app.log, &app.jfetPanel.open, &app.layoutDialog};
}

CanvasContext canvasContext(EditorApp& app) {
    return {app.doc, app.selection, app.view, app.hover, app.log, app.benchVoltages.latest()};
}

/// Asks the worker for the voltages after each edit while the overlay is on; never waits. Each
/// result as it arrives goes to the end-to-end log: "bench-voltages revision R NET V at HOLE ...".
void requestBenchVoltages(EditorApp& app) {
    if (!app.view.showBenchVoltages) return;
    if (app.benchRequested != app.doc.revision()) {
        app.benchVoltages.request(app.doc.board(), app.doc.revision());
        app.benchRequested = app.doc.revision();
    }
    const auto latest = app.benchVoltages.latest();
    if (!latest || !app.log.on()) return;
    std::string line = "bench-voltages revision " + std::to_string(latest->revision);
    if (!latest->voltages.value) line += " error " + latest->voltages.error;
    for (const auto& net : latest->voltages.value ? latest->voltages.value->nets
                                                  : std::vector<netcheck::NetReading>{}) {
        line += " " + net.net + " " +
                (net.state == netcheck::NetState::Known ? netcheck::formatVolts(net.nominal)
                                                        : std::string("-")) +
                " at " + net.probe;
    }
    if (app.log.changed("bench-voltages", line)) app.log.note(line);
}

CircuitPanelContext circuitPanelContext(EditorApp& app) {
    return {app.doc,
            app.circuitPanel,
            app.view.showCircuit,
            app.chooser,
            app.chosenForPanel,
            app.dialogs,
            app.commands(),
            app.log};
}

// ---- shortcuts ---------------------------------------------------------------------------------

bool pressed(sf::Keyboard::Key key) {
    return ImGui::IsKeyPressed(platform::keyIndex(key), true);
}

void commandShortcuts(EditorApp& app) {
    using K = sf::Keyboard;
    const EditContext edit = editContext(app);
    if (pressed(K::Z)) ImGui::GetIO().KeyShift ? redo(edit) : undo(edit);
    if (pressed(K::Y)) redo(edit);
    if (pressed(K::S)) ImGui::GetIO().KeyShift ? actionSaveAs(app) : actionSave(app);
    if (pressed(K::O)) actionOpen(app);
    if (pressed(K::N)) actionNew(app);
    if (pressed(K::Q)) actionQuit(app);
    if (pressed(K::C)) copySelection(edit);
    if (pressed(K::V)) paste(edit, app.hover.hole);
    if (pressed(K::D)) duplicateSelection(edit);
    if (pressed(K::A)) selectAll(edit);
}

void nextSide(ViewState& view) {
    view.side = view.side == Side::Component ? Side::Copper
                : view.side == Side::Copper  ? Side::SeeThrough
                                             : Side::Component;
    view.fitPending = true;
}

void nudgeShortcuts(EditorApp& app) {
    using K = sf::Keyboard;
    const EditContext edit = editContext(app);
    const bool copper = app.view.side == Side::Copper;
    if (pressed(K::Left)) nudgeSelection(edit, 0, copper ? 1 : -1);
    if (pressed(K::Right)) nudgeSelection(edit, 0, copper ? -1 : 1);
    if (pressed(K::Up)) nudgeSelection(edit, -1, 0);
    if (pressed(K::Down)) nudgeSelection(edit, 1, 0);
}

void toolKeys(ToolState& tool) {
    using K = sf::Keyboard;
    if (pressed(K::V)) selectTool(tool, Tool::Select);
    if (pressed(K::L)) selectTool(tool, Tool::Link);
    if (pressed(K::X)) selectTool(tool, Tool::Cut);
    if (pressed(K::W)) selectTool(tool, Tool::Wire);
}

void escape(ToolState& tool) {
    if (tool.firstEnd || tool.wireStart)
        tool.cancel();
    else
        selectTool(tool, Tool::Select);
}

void turn(EditorApp& app) {
    if (app.tool.tool == Tool::Place)
        app.tool.quarterTurns = (app.tool.quarterTurns + 1) % 4;
    else
        rotateSelection(editContext(app));
}

bool textFieldActive() {
    const ImGuiID active = ImGui::GetActiveID();
    return active != 0 && ImGui::GetInputTextState(active) != nullptr;
}

bool arrowOrMouseHeld() {
    using K = sf::Keyboard;
    for (K::Key key : {K::Left, K::Right, K::Up, K::Down})
        if (ImGui::IsKeyDown(platform::keyIndex(key))) return true;
    return ImGui::IsMouseDown(ImGuiMouseButton_Left);
}

}  // namespace

void handleShortcuts(EditorApp& app) {
    ImGuiIO& io = ImGui::GetIO();
    // Whether a text field holds the keys now, at the end of this frame's widgets; not
    // io.WantTextInput, which is last frame's: a field that Enter closed in the last frame still
    // read as typing, and Ctrl+S in the next frame was lost.
    if (textFieldActive() ||
        ImGui::IsPopupOpen("", ImGuiPopupFlags_AnyPopupId | ImGuiPopupFlags_AnyPopupLevel))
        return;
    if (io.KeyCtrl) {
        commandShortcuts(app);
        return;
    }
    using K = sf::Keyboard;
    toolKeys(app.tool);
    if (pressed(K::F)) app.view.fitPending = true;
    if (pressed(K::F1)) app.view.showHelp = !app.view.showHelp;
    if (pressed(K::Escape)) escape(app.tool);
    if (pressed(K::Tab)) nextSide(app.view);
    if (pressed(K::R)) turn(app);
    if (pressed(K::Delete) || pressed(K::BackSpace)) deleteSelection(editContext(app));
    if (app.tool.tool == Tool::Select && !app.selection.empty()) nudgeShortcuts(app);
    // Arrow nudges merge while keys repeat; any other key ends the run.
    if (!arrowOrMouseHeld()) app.doc.endMerge();
}

// ---- the frame ---------------------------------------------------------------------------------

namespace {

void runFileRequest(EditorApp& app, const FileRequest& request) {
    switch (request.kind) {
        case FileRequest::Kind::None:
            break;
        case FileRequest::Kind::New:
            actionNew(app);
            break;
        case FileRequest::Kind::Open:
            actionOpen(app);
            break;
        case FileRequest::Kind::OpenRecent:
            actionOpenPath(app, request.path);
            break;
        case FileRequest::Kind::Save:
            actionSave(app);
            break;
        case FileRequest::Kind::SaveAs:
            actionSaveAs(app);
            break;
        case FileRequest::Kind::Quit:
            actionQuit(app);
            break;
    }
}

void runTool(EditorApp& app, const CanvasView& canvas) {
    if (app.doc.readOnly() || app.hover.spaceHeld) return;
    const CanvasFrame& f = canvas.frame;
    f.draw->PushClipRect(f.clipMin, f.clipMax, true);
    runActiveTool(toolContext(app), canvas.input, f);
    f.draw->PopClipRect();
}

void drawCanvasWindow(EditorApp& app, const PanelLayout& l) {
    ImGui::SetNextWindowPos(l.canvasPos, ImGuiCond_Always);
    ImGui::SetNextWindowSize(l.canvasSize, ImGuiCond_Always);
    ImGui::PushStyleVar(ImGuiStyleVar_WindowPadding, {0, 0});
    ImGui::PushStyleVar(ImGuiStyleVar_WindowBorderSize, 0.0f);
    ImGui::Begin("Board view", nullptr,
                 ImGuiWindowFlags_NoDecoration | ImGuiWindowFlags_NoMove |
                     ImGuiWindowFlags_NoBringToFrontOnFocus | ImGuiWindowFlags_NoScrollWithMouse |
                     ImGuiWindowFlags_NoSavedSettings);
    requestBenchVoltages(app);
    runTool(app, drawCanvas(canvasContext(app), l.canvasPos, l.canvasSize));
    ImGui::End();
    ImGui::PopStyleVar(2);
}

void drawPanels(EditorApp& app, const PanelLayout& l) {
    const float top = l.menuHeight;
    const float height = l.display.y - top - l.statusHeight;
    // A new off-board part is scrolled into sight.
    if (const auto added = drawPartsPanel(toolContext(app), app.log, {0, top}, {l.leftWidth, height * 0.68f}))
        centreOn(app.view, app.doc.board(), *added);
    drawBoardPanel(app.doc, app.commands(), app.selection, app.view, app.log, {0, top + height * 0.68f},
                   {l.leftWidth, height * 0.32f});
    const float rightX = l.display.x - l.rightWidth;
    drawPropertiesPanel(editContext(app), app.log, {rightX, top}, {l.rightWidth, height * 0.38f});
    drawCheckPanel(app.doc, app.commands(), app.view, app.log, {rightX, top + height * 0.38f},
                   {l.rightWidth, height * 0.62f});
    const auto voltages = app.benchVoltages.latest();
    const bool showVoltages = app.view.showBenchVoltages && voltages && voltages->voltages.value;
    drawStatusBar(app.doc, app.hover, app.tool, app.status, {0, l.display.y - l.statusHeight},
                  {l.display.x, l.statusHeight},
                  showVoltages ? &*voltages->voltages.value : nullptr, app.log);
    drawCircuitPanel(circuitPanelContext(app));
    drawJfetBiasPanel({app.doc, app.jfetPanel, app.commands(), app.log});
    drawLayoutDialog({app.doc, app.layoutDialog, app.commands(), app.log, app.view, app.selection});
    drawHelpWindow(app.view.showHelp, app.log);
}

}  // namespace

void buildFrame(EditorApp& app) {
    if (app.view.appliedUiScale != app.view.uiScale) {
        applyLook(app.view.uiScale);
        app.view.appliedUiScale = app.view.uiScale;
    }
    if (app.quitRequested) {
        app.quitRequested = false;
        actionQuit(app);
    }
    runFileRequest(app, drawMenuBar(menuContext(app)));
    const PanelLayout l = computeLayout(ImGui::GetIO().DisplaySize, ImGui::GetFrameHeight(),
                                        static_cast<float>(app.view.uiScale));
    drawCanvasWindow(app, l);
    drawPanels(app, l);
    drawFileDialogs(app);
    handleShortcuts(app);
}

}  // namespace stripsmith
