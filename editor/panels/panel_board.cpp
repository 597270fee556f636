// "Board": size in holes and millimetres, set rows and columns, grow or shrink at any edge, trim.
#include <imgui.h>
#include <imgui_stdlib.h>

#include "editor/panels/panels.hpp"
#include "netcheck/edit/edit.hpp"
#include "netcheck/model/board_size.hpp"

namespace stripsmith {
namespace {

// What the Board panel changes besides the board: a resize or trim drops the selection (its
// indices may no longer hold) and a trim refits the view.
struct BoardPanel {
    const Document& doc;
    Commands commands;
    Selected& selection;
    ViewState& view;
};

void resize(const BoardPanel& p, netcheck::edit::EdgeChange change) {
    const auto& board = p.doc.board();
    if (board.rows + change.top + change.bottom < 1 || board.cols + change.left + change.right < 1) return;
    try {
        p.commands.perform(std::make_unique<netcheck::edit::ResizeBoard>(board, change));
    } catch (const std::exception& e) {
        p.commands.say(e.what());
    }
    p.selection.clear();
}

void edgeRow(const BoardPanel& p, const char* name, netcheck::edit::EdgeChange grow) {
    ImGui::PushID(name);
    ImGui::TextUnformatted(name);
    ImGui::SameLine(80);
    if (ImGui::SmallButton("+1")) resize(p, grow);
    ImGui::SameLine();
    netcheck::edit::EdgeChange shrink{-grow.top, -grow.bottom, -grow.left, -grow.right};
    if (ImGui::SmallButton("-1")) resize(p, shrink);
    ImGui::PopID();
}

}  // namespace

void drawBoardPanel(const Document& doc, Commands commands, Selected& selection, ViewState& view, TestLog& log,
                    ImVec2 pos, ImVec2 size) {
    const BoardPanel p{doc, commands, selection, view};
    if (beginPanel("Board", pos, size)) {
        const auto& board = doc.board();
        const std::string holes = netcheck::sizeInHoles(board.cols, board.rows);
        const std::string millimetres = netcheck::sizeInMm(board.widthMm(), board.heightMm());
        ImGui::TextUnformatted(holes.c_str());
        log.item("board-size");
        ImGui::TextUnformatted(millimetres.c_str());
        if (log.changed("board-size", holes + ", " + millimetres))
            log.note("board-size " + holes + ", " + millimetres);
        ImGui::PushStyleColor(ImGuiCol_Text, ImGui::GetStyleColorVec4(ImGuiCol_TextDisabled));
        ImGui::TextWrapped("(%s; %s), pitch %.2f mm", netcheck::kHolesOrder, netcheck::kMillimetresOrder,
                           board.pitchMm);
        ImGui::PopStyleColor();
        int rows = board.rows, cols = board.cols;
        ImGui::SetNextItemWidth(110);
        if (ImGui::InputInt("strips (rows)", &rows, 1, 5, ImGuiInputTextFlags_EnterReturnsTrue) && rows != board.rows)
            resize(p, {0, rows - board.rows, 0, 0});
        log.item("board-strips");
        ImGui::SetNextItemWidth(110);
        if (ImGui::InputInt("holes (cols)", &cols, 1, 5, ImGuiInputTextFlags_EnterReturnsTrue) && cols != board.cols)
            resize(p, {0, 0, 0, cols - board.cols});
        if (ImGui::TreeNode("Grow or shrink an edge")) {
            edgeRow(p, "Top", {1, 0, 0, 0});
            edgeRow(p, "Bottom", {0, 1, 0, 0});
            edgeRow(p, "Left", {0, 0, 1, 0});
            edgeRow(p, "Right", {0, 0, 0, 1});
            ImGui::TreePop();
        }
        if (ImGui::Button("Trim to used area")) {
            if (auto command = netcheck::edit::trimToUsedArea(board)) {
                p.commands.perform(std::move(command));
                p.selection.clear();
                p.view.fitPending = true;
            } else {
                p.commands.say("Nothing to trim.");
            }
        }
        std::string title = board.title;
        ImGui::SetNextItemWidth(-1);
        if (ImGui::InputTextWithHint("##title", "board title", &title, ImGuiInputTextFlags_EnterReturnsTrue) &&
            title != board.title)
            p.commands.perform(std::make_unique<netcheck::edit::SetTitle>(board, title));
        log.item("board-title");
    }
    ImGui::End();
}

}  // namespace stripsmith
