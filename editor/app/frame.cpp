#include "editor/app/frame.hpp"

#include <SFML/Window/Keyboard.hpp>
#include <imgui.h>

#include "editor/app/edit_actions.hpp"
#include "editor/app/look.hpp"
#include "editor/canvas/canvas.hpp"
#include "editor/files/file_actions.hpp"
#include "editor/panels/panels.hpp"
#include "editor/platform/imgui_impl_sfml.hpp"
#include "editor/tools/tools.hpp"

namespace stripsmith {

namespace {

bool pressed(sf::Keyboard::Key key) { return ImGui::IsKeyPressed(platform::keyIndex(key), true); }

void drawCanvasWindow(EditorApp& app, const PanelLayout& l) {
    ImGui::SetNextWindowPos(l.canvasPos, ImGuiCond_Always);
    ImGui::SetNextWindowSize(l.canvasSize, ImGuiCond_Always);
    ImGui::PushStyleVar(ImGuiStyleVar_WindowPadding, {0, 0});
    ImGui::PushStyleVar(ImGuiStyleVar_WindowBorderSize, 0.0f);
    ImGui::Begin("Board view", nullptr,
                 ImGuiWindowFlags_NoDecoration | ImGuiWindowFlags_NoMove | ImGuiWindowFlags_NoBringToFrontOnFocus |
                     ImGuiWindowFlags_NoScrollWithMouse | ImGuiWindowFlags_NoSavedSettings);
    drawCanvas(app, l.canvasPos, l.canvasSize);
    ImGui::End();
    ImGui::PopStyleVar(2);
}

}  // namespace

void handleShortcuts(EditorApp& app) {
    ImGuiIO& io = ImGui::GetIO();
    if (io.WantTextInput || ImGui::IsPopupOpen("", ImGuiPopupFlags_AnyPopupId | ImGuiPopupFlags_AnyPopupLevel)) return;
    using K = sf::Keyboard;
    if (io.KeyCtrl) {
        if (pressed(K::Z)) io.KeyShift ? redo(app) : undo(app);
        if (pressed(K::Y)) redo(app);
        if (pressed(K::S)) io.KeyShift ? actionSaveAs(app) : actionSave(app);
        if (pressed(K::O)) actionOpen(app);
        if (pressed(K::N)) actionNew(app);
        if (pressed(K::Q)) actionQuit(app);
        if (pressed(K::C)) copySelection(app);
        if (pressed(K::V)) paste(app, app.hoverHole);
        if (pressed(K::D)) duplicateSelection(app);
        if (pressed(K::A)) selectAll(app);
        return;
    }
    if (pressed(K::V)) selectTool(app, Tool::Select);
    if (pressed(K::L)) selectTool(app, Tool::Link);
    if (pressed(K::X)) selectTool(app, Tool::Cut);
    if (pressed(K::W)) selectTool(app, Tool::Wire);
    if (pressed(K::F)) app.view.fitPending = true;
    if (pressed(K::F1)) app.view.showHelp = !app.view.showHelp;
    if (pressed(K::Escape)) {
        if (app.tool.firstEnd || app.tool.wireStart) app.tool.cancel();
        else selectTool(app, Tool::Select);
    }
    if (pressed(K::Tab)) {
        app.view.side = app.view.side == Side::Component ? Side::Copper
                        : app.view.side == Side::Copper  ? Side::SeeThrough
                                                         : Side::Component;
        app.view.fitPending = true;
    }
    if (pressed(K::R)) {
        if (app.tool.tool == Tool::Place) app.tool.quarterTurns = (app.tool.quarterTurns + 1) % 4;
        else rotateSelection(app);
    }
    if (pressed(K::Delete) || pressed(K::BackSpace)) deleteSelection(app);
    if (app.tool.tool == Tool::Select && !app.selection.empty()) {
        if (pressed(K::Left)) nudgeSelection(app, 0, app.view.side == Side::Copper ? 1 : -1);
        if (pressed(K::Right)) nudgeSelection(app, 0, app.view.side == Side::Copper ? -1 : 1);
        if (pressed(K::Up)) nudgeSelection(app, -1, 0);
        if (pressed(K::Down)) nudgeSelection(app, 1, 0);
    }
    // Arrow nudges merge while keys repeat; any other key ends the run.
    if (!ImGui::IsKeyDown(platform::keyIndex(K::Left)) && !ImGui::IsKeyDown(platform::keyIndex(K::Right)) &&
        !ImGui::IsKeyDown(platform::keyIndex(K::Up)) && !ImGui::IsKeyDown(platform::keyIndex(K::Down)) &&
        !ImGui::IsMouseDown(ImGuiMouseButton_Left))
        app.doc.endMerge();
}

void buildFrame(EditorApp& app) {
    if (app.view.appliedUiScale != app.view.uiScale) {
        applyLook(app.view.uiScale);
        app.view.appliedUiScale = app.view.uiScale;
    }
    if (app.quitRequested) {
        app.quitRequested = false;
        actionQuit(app);
    }
    drawMenuBar(app);
    const PanelLayout l = computeLayout(ImGui::GetIO().DisplaySize, ImGui::GetFrameHeight(),
                                        static_cast<float>(app.view.uiScale));
    const float top = l.menuHeight;
    const float height = l.display.y - top - l.statusHeight;
    drawCanvasWindow(app, l);
    drawPartsPanel(app, {0, top}, {l.leftWidth, height * 0.68f});
    drawBoardPanel(app, {0, top + height * 0.68f}, {l.leftWidth, height * 0.32f});
    const float rightX = l.display.x - l.rightWidth;
    drawPropertiesPanel(app, {rightX, top}, {l.rightWidth, height * 0.38f});
    drawCheckPanel(app, {rightX, top + height * 0.38f}, {l.rightWidth, height * 0.62f});
    drawStatusBar(app, {0, l.display.y - l.statusHeight}, {l.display.x, l.statusHeight});
    drawCircuitPanel(app);
    drawHelpWindow(app);
    drawFileDialogs(app);
    handleShortcuts(app);
}

}  // namespace stripsmith
