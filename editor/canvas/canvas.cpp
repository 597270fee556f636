// Sections: transform | view input | hover | drawing.
#include "editor/canvas/canvas.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <string>

#include <SFML/Window/Keyboard.hpp>

#include "editor/canvas/palette.hpp"
#include "editor/platform/imgui_impl_sfml.hpp"
#include "editor/tools/tools.hpp"

namespace stripsmith {

// ---- transform ---------------------------------------------------------------------------------

BoardTransform canvasTransform(EditorApp& app, ImVec2 min, ImVec2 max) {
    const auto& board = app.doc.board();
    const bool mirrored = app.view.side == Side::Copper;
    if (app.view.fitPending) {
        const auto spots = layoutOffboard(board);
        const BoardTransform fit = fitTransform(contentBounds(board, spots, mirrored), min, max, board.cols, mirrored);
        app.view.holePx = fit.holePx;
        app.view.origin = fit.origin;
        app.view.fitPending = false;
    }
    BoardTransform t;
    t.origin = app.view.origin;
    t.holePx = app.view.holePx;
    t.cols = board.cols;
    t.mirrored = mirrored;
    return t;
}

void centreOn(EditorApp& app, ImVec2 boardPoint) {
    BoardTransform t;
    t.origin = app.view.origin;
    t.holePx = app.view.holePx;
    t.cols = app.doc.board().cols;
    t.mirrored = app.view.side == Side::Copper;
    const ImVec2 now = t.toScreen(boardPoint);
    const ImVec2 mid{(app.view.canvasMin.x + app.view.canvasMax.x) * 0.5f,
                     (app.view.canvasMin.y + app.view.canvasMax.y) * 0.5f};
    app.view.origin = {app.view.origin.x + mid.x - now.x, app.view.origin.y + mid.y - now.y};
}

// ---- view input ----------------------------------------------------------------------------------

namespace {

void handleViewInput(EditorApp& app, bool hovered, bool active) {
    ImGuiIO& io = ImGui::GetIO();
    if (hovered && io.MouseWheel != 0.0f) {
        const float factor = std::pow(1.2f, io.MouseWheel);
        const float next = std::clamp(app.view.holePx * factor, 2.0f, 160.0f);
        app.view.origin = zoomAbout(app.view.origin, app.view.holePx, next, io.MousePos);
        app.view.holePx = next;
    }
    // Pan: middle or right drag, or space held with a left drag.
    const bool spacePan = app.spaceHeld && ImGui::IsMouseDragging(ImGuiMouseButton_Left, 0.0f) && active;
    for (int button : {ImGuiMouseButton_Middle, ImGuiMouseButton_Right}) {
        if (ImGui::IsMouseDragging(button, 2.0f) && (hovered || ImGui::IsItemActive())) {
            app.view.origin.x += io.MouseDelta.x;
            app.view.origin.y += io.MouseDelta.y;
        }
    }
    if (spacePan) {
        app.view.origin.x += io.MouseDelta.x;
        app.view.origin.y += io.MouseDelta.y;
    }
}

// ---- hover ---------------------------------------------------------------------------------------

void updateHover(EditorApp& app, const CanvasInput& in, const CanvasFrame& f) {
    const auto& board = app.doc.board();
    app.hoverHole.reset();
    app.hoverIsland = -1;
    app.hoverPart.reset();
    app.hoverLug = in.lug;
    if (!in.hovered) return;
    if (auto h = holeAt(in.board, board.rows, board.cols, 0.5f)) {
        app.hoverHole = h;
        app.hoverIsland = app.doc.connectivity().islandOfHole(*h);
        for (std::size_t i = 0; i < board.parts.size(); ++i)
            for (const auto& pin : board.parts[i].pins)
                if (pin.hole == *h) app.hoverPart = i;
    } else if (in.lug) {
        app.hoverIsland = app.doc.connectivity().islandOfPin(*in.lug);
    }
    (void)f;
}

CanvasInput readInput(EditorApp& app, const CanvasFrame& f, bool hovered) {
    ImGuiIO& io = ImGui::GetIO();
    const auto& board = app.doc.board();
    CanvasInput in;
    in.board = f.t.toBoard(io.MousePos);
    in.hovered = hovered;
    in.hole = holeAt(in.board, board.rows, board.cols, 0.71f);
    in.lug = lugAt(board, f.spots, in.board, 0.6f);
    const bool panning = app.spaceHeld;
    in.pressed = hovered && !panning && ImGui::IsMouseClicked(ImGuiMouseButton_Left);
    in.released = ImGui::IsMouseReleased(ImGuiMouseButton_Left);
    in.down = ImGui::IsMouseDown(ImGuiMouseButton_Left) && !panning;
    in.shift = io.KeyShift;
    return in;
}

void logHolePositions(EditorApp& app, const CanvasFrame& f) {
    // Only when the layout on screen changed, so the log stays short.
    const std::string key = std::to_string(app.doc.revision()) + " " + std::to_string(f.t.holePx) + " " +
                            std::to_string(f.t.origin.x) + " " + std::to_string(f.t.origin.y) + " " +
                            std::to_string(f.t.mirrored);
    if (key == app.lastLoggedView) return;
    app.lastLoggedView = key;
    const ImVec2 a1 = f.hole({0, 0});
    std::fprintf(stderr, "STRIPSMITH_E2E view A1 %.1f %.1f pitch %.3f mirrored %d rows %d cols %d\n", a1.x, a1.y,
                 static_cast<double>(f.t.mirrored ? -f.t.holePx : f.t.holePx), f.t.mirrored ? 1 : 0,
                 app.doc.board().rows, app.doc.board().cols);
    for (const OffboardSpot& s : f.spots) {
        const ImVec2 body = f.at({(s.min.x + s.max.x) / 2, (s.min.y + s.max.y) / 2});
        std::fprintf(stderr, "STRIPSMITH_E2E offboard %s %.1f %.1f\n", app.doc.board().offboard[s.index].ref.c_str(),
                     body.x, body.y);
        for (std::size_t j = 0; j < s.lugs.size(); ++j) {
            const ImVec2 p = f.at(s.lugs[j]);
            std::fprintf(stderr, "STRIPSMITH_E2E lug %s.%s %.1f %.1f\n", app.doc.board().offboard[s.index].ref.c_str(),
                         app.doc.board().offboard[s.index].pins[j].c_str(), p.x, p.y);
        }
    }
}

}  // namespace

// ---- drawing -------------------------------------------------------------------------------------

void drawCanvas(EditorApp& app, ImVec2 pos, ImVec2 size) {
    const ImVec2 max{pos.x + size.x, pos.y + size.y};
    app.view.canvasMin = pos;
    app.view.canvasMax = max;
    ImGui::SetCursorScreenPos(pos);
    ImGui::InvisibleButton("board-canvas", {std::max(size.x, 1.0f), std::max(size.y, 1.0f)},
                           ImGuiButtonFlags_MouseButtonLeft | ImGuiButtonFlags_MouseButtonRight |
                               ImGuiButtonFlags_MouseButtonMiddle);
    const bool hovered = ImGui::IsItemHovered();
    const bool active = ImGui::IsItemActive();
    app.spaceHeld = (hovered || active) && !ImGui::GetIO().WantTextInput &&
                    ImGui::IsKeyDown(platform::keyIndex(sf::Keyboard::Space));
    handleViewInput(app, hovered, active);

    const auto& board = app.doc.board();
    ImDrawList* draw = ImGui::GetWindowDrawList();
    draw->PushClipRect(pos, max, true);
    draw->AddRectFilled(pos, max, palette::kSurround);
    const CanvasFrame f = makeCanvasFrame(draw, canvasTransform(app, pos, max), pos, max, app.view.side, board);
    if (app.logHoles) logHolePositions(app, f);

    const CanvasInput in = readInput(app, f, hovered);
    updateHover(app, in, f);

    drawSubstrate(f, board);
    drawCopper(f, board);
    drawEdgeLabels(f, board);
    if (const netcheck::Island* island = app.doc.island(app.hoverIsland)) drawIslandHighlight(f, board, *island);
    drawLinks(f, board, app.selection);
    drawParts(f, board, app.selection, app.hoverPart);
    // Cuts above the parts: a cut hidden under an IC is still a cut to make.
    drawCuts(f, board, app.selection);
    drawOffboardParts(f, board, app.selection);
    drawWires(f, board, app.selection);
    drawFindingMarks(f, app.doc.report());
    if (auto index = app.view.focusedFinding) {
        const auto& r = app.doc.report();
        const std::size_t i = static_cast<std::size_t>(*index);
        if (i < r.errors.size()) drawFindingHighlight(f, board, r.errors[i]);
        else if (i - r.errors.size() < r.warnings.size()) drawFindingHighlight(f, board, r.warnings[i - r.errors.size()]);
    }
    if (app.view.side == Side::Copper) {
        const char* caption = "COPPER SIDE - seen from below, mirrored: hole 1 is on the right";
        draw->AddRectFilled({pos.x + 8, pos.y + 8}, {pos.x + 8 + ImGui::CalcTextSize(caption).x + 16, pos.y + 12 + ImGui::GetFontSize() + 4},
                            palette::rgba(222, 142, 74, 230), 4);
        draw->AddText({pos.x + 16, pos.y + 12}, palette::kText, caption);
    } else if (app.view.side == Side::SeeThrough) {
        draw->AddText({pos.x + 16, pos.y + 12}, palette::kLabel, "SEE-THROUGH - component side with the copper below");
    }

    if (!app.doc.readOnly() && !app.spaceHeld) {
        switch (app.tool.tool) {
        case Tool::Select: runSelectTool(app, in, f); break;
        case Tool::Place: runPlaceTool(app, in, f); break;
        case Tool::Link: runLinkTool(app, in, f); break;
        case Tool::Cut: runCutTool(app, in, f); break;
        case Tool::Wire: runWireTool(app, in, f); break;
        }
    }
    draw->PopClipRect();
}

}  // namespace stripsmith
