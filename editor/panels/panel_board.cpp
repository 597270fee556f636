// "Board": size in holes and millimetres, set rows and columns, grow or shrink at any edge, trim.
#include <imgui.h>
#include <imgui_stdlib.h>

#include "editor/panels/panels.hpp"
#include "netcheck/edit/edit.hpp"

namespace stripsmith {
namespace {

void resize(EditorApp& app, netcheck::edit::EdgeChange change) {
    const auto& board = app.doc.board();
    if (board.rows + change.top + change.bottom < 1 || board.cols + change.left + change.right < 1) return;
    try {
        app.perform(std::make_unique<netcheck::edit::ResizeBoard>(board, change));
    } catch (const std::exception& e) {
        app.say(e.what());
    }
    app.selection.clear();
}

void edgeRow(EditorApp& app, const char* name, netcheck::edit::EdgeChange grow) {
    ImGui::PushID(name);
    ImGui::TextUnformatted(name);
    ImGui::SameLine(80);
    if (ImGui::SmallButton("+1")) resize(app, grow);
    ImGui::SameLine();
    netcheck::edit::EdgeChange shrink{-grow.top, -grow.bottom, -grow.left, -grow.right};
    if (ImGui::SmallButton("-1")) resize(app, shrink);
    ImGui::PopID();
}

}  // namespace

void drawBoardPanel(EditorApp& app, ImVec2 pos, ImVec2 size) {
    if (beginPanel("Board", pos, size)) {
        const auto& board = app.doc.board();
        ImGui::Text("%d x %d holes", board.cols, board.rows);
        ImGui::Text("%.1f x %.1f mm", board.widthMm(), board.heightMm());
        ImGui::TextDisabled("(%d strips of %d holes, pitch %.2f mm)", board.rows, board.cols, board.pitchMm);
        int rows = board.rows, cols = board.cols;
        ImGui::SetNextItemWidth(110);
        if (ImGui::InputInt("strips (rows)", &rows, 1, 5, ImGuiInputTextFlags_EnterReturnsTrue) && rows != board.rows)
            resize(app, {0, rows - board.rows, 0, 0});
        ImGui::SetNextItemWidth(110);
        if (ImGui::InputInt("holes (cols)", &cols, 1, 5, ImGuiInputTextFlags_EnterReturnsTrue) && cols != board.cols)
            resize(app, {0, 0, 0, cols - board.cols});
        if (ImGui::TreeNode("Grow or shrink an edge")) {
            edgeRow(app, "Top", {1, 0, 0, 0});
            edgeRow(app, "Bottom", {0, 1, 0, 0});
            edgeRow(app, "Left", {0, 0, 1, 0});
            edgeRow(app, "Right", {0, 0, 0, 1});
            ImGui::TreePop();
        }
        if (ImGui::Button("Trim to used area")) {
            if (auto command = netcheck::edit::trimToUsedArea(board)) {
                app.perform(std::move(command));
                app.selection.clear();
                app.view.fitPending = true;
            } else {
                app.say("Nothing to trim.");
            }
        }
        std::string title = board.title;
        ImGui::SetNextItemWidth(-1);
        if (ImGui::InputTextWithHint("##title", "board title", &title, ImGuiInputTextFlags_EnterReturnsTrue) &&
            title != board.title)
            app.perform(std::make_unique<netcheck::edit::SetTitle>(board, title));
    }
    ImGui::End();
}

}  // namespace stripsmith
