// Sections: transform | view input | hover | drawing.
#include "editor/canvas/canvas.hpp"

#include <algorithm>
#include <cmath>
#include <cstdio>
#include <string>

#include <SFML/Window/Keyboard.hpp>

#include "editor/canvas/layers.hpp"
#include "editor/canvas/palette.hpp"
#include "editor/platform/imgui_impl_sfml.hpp"

namespace stripsmith {

// ---- transform ---------------------------------------------------------------------------------

namespace {

BoardTransform viewTransform(const ViewState& view, const netcheck::Board& board) {
    BoardTransform t;
    t.origin = view.origin;
    t.holePx = view.holePx;
    t.cols = board.cols;
    t.mirrored = view.side == Side::Copper;
    return t;
}

}  // namespace

BoardTransform canvasTransform(ViewState& view, const netcheck::Board& board, ImVec2 min,
                               ImVec2 max) {
    if (view.fitPending) {
        const bool mirrored = view.side == Side::Copper;
        const auto spots = layoutOffboard(board);
        const BoardTransform fit =
            fitTransform(contentBounds(board, spots, mirrored), min, max, board.cols, mirrored);
        view.holePx = fit.holePx;
        view.origin = fit.origin;
        view.fitPending = false;
    }
    return viewTransform(view, board);
}

void centreOn(ViewState& view, const netcheck::Board& board, ImVec2 boardPoint) {
    const ImVec2 now = viewTransform(view, board).toScreen(boardPoint);
    const ImVec2 mid{(view.canvasMin.x + view.canvasMax.x) * 0.5f,
                     (view.canvasMin.y + view.canvasMax.y) * 0.5f};
    view.origin = {view.origin.x + mid.x - now.x, view.origin.y + mid.y - now.y};
}

// ---- view input
// ----------------------------------------------------------------------------------

namespace {

void handleViewInput(ViewState& view, bool spaceHeld, bool hovered, bool active) {
    ImGuiIO& io = ImGui::GetIO();
    if (hovered && io.MouseWheel != 0.0f) {
        const float factor = std::pow(1.2f, io.MouseWheel);
        const float next = std::clamp(view.holePx * factor, 2.0f, 160.0f);
        view.origin = zoomAbout(view.origin, view.holePx, next, io.MousePos);
        view.holePx = next;
    }
    // Pan: middle or right drag, or space held with a left drag.
    const bool spacePan =
        spaceHeld && ImGui::IsMouseDragging(ImGuiMouseButton_Left, 0.0f) && active;
    for (int button : {ImGuiMouseButton_Middle, ImGuiMouseButton_Right}) {
        if (ImGui::IsMouseDragging(button, 2.0f) && (hovered || ImGui::IsItemActive())) {
            view.origin.x += io.MouseDelta.x;
            view.origin.y += io.MouseDelta.y;
        }
    }
    if (spacePan) {
        view.origin.x += io.MouseDelta.x;
        view.origin.y += io.MouseDelta.y;
    }
}

// ---- hover
// ---------------------------------------------------------------------------------------

void updateHover(const Document& doc, HoverState& hover, const CanvasInput& in) {
    const auto& board = doc.board();
    hover.hole.reset();
    hover.island = -1;
    hover.part.reset();
    hover.lug = in.lug;
    if (!in.hovered) return;
    if (auto h = holeAt(in.board, board.rows, board.cols, 0.5f)) {
        hover.hole = h;
        hover.island = doc.connectivity().islandOfHole(*h);
        for (std::size_t i = 0; i < board.parts.size(); ++i)
            for (const auto& pin : board.parts[i].pins)
                if (pin.hole == *h) hover.part = i;
    } else if (in.lug) {
        hover.island = doc.connectivity().islandOfPin(*in.lug);
    }
}

CanvasInput readInput(const netcheck::Board& board, const CanvasFrame& f, bool hovered,
                      bool panning) {
    ImGuiIO& io = ImGui::GetIO();
    CanvasInput in;
    in.board = f.t.toBoard(io.MousePos);
    in.hovered = hovered;
    in.hole = holeAt(in.board, board.rows, board.cols, 0.71f);
    in.lug = lugAt(board, f.spots, in.board, 0.6f);
    in.pressed = hovered && !panning && ImGui::IsMouseClicked(ImGuiMouseButton_Left);
    in.released = ImGui::IsMouseReleased(ImGuiMouseButton_Left);
    in.down = ImGui::IsMouseDown(ImGuiMouseButton_Left) && !panning;
    in.shift = io.KeyShift;
    return in;
}

// Hole A1, the pitch, off-board parts and lugs on screen, so scripted tests know where to click.
void logHolePositions(const Document& doc, TestLog& log, const CanvasFrame& f) {
    if (!log.on()) return;
    // Only when the layout on screen changed, so the log stays short.
    const std::string key = std::to_string(doc.revision()) + " " + std::to_string(f.t.holePx) +
                            " " + std::to_string(f.t.origin.x) + " " +
                            std::to_string(f.t.origin.y) + " " + std::to_string(f.t.mirrored);
    if (!log.changed("view", key)) return;
    const auto& board = doc.board();
    const EdgeLabelPlaces edges = edgeLabelPlaces(f, board.rows, board.cols);
    char line[160];
    std::snprintf(line, sizeof line, "edge-labels left %.1f%s right %.1f%s top %.1f%s bottom %.1f%s",
                  edges.leftX, edges.leftPinned ? " pinned" : "", edges.rightX,
                  edges.rightPinned ? " pinned" : "", edges.topY, edges.topPinned ? " pinned" : "",
                  edges.bottomY, edges.bottomPinned ? " pinned" : "");
    log.note(line);
    log.view(f.hole({0, 0}), f.t.mirrored ? -f.t.holePx : f.t.holePx, f.t.mirrored, board.rows,
             board.cols);
    for (const OffboardSpot& s : f.spots) {
        const netcheck::OffboardPart& part = board.offboard[s.index];
        log.offboard(part.ref, f.at({(s.min.x + s.max.x) / 2, (s.min.y + s.max.y) / 2}));
        for (std::size_t j = 0; j < s.lugs.size(); ++j)
            log.lug(part.ref, part.pins[j], f.at(s.lugs[j]));
    }
}

const netcheck::Finding* focusedFinding(const netcheck::CheckReport& r, std::optional<int> index) {
    if (!index) return nullptr;
    const std::size_t i = static_cast<std::size_t>(*index);
    if (i < r.errors.size()) return &r.errors[i];
    if (i - r.errors.size() < r.warnings.size()) return &r.warnings[i - r.errors.size()];
    return nullptr;
}

// ---- drawing
// -------------------------------------------------------------------------------------

void drawLayers(const CanvasContext& c, const CanvasFrame& geometry) {
    LayerFrame f(geometry, c.doc.board(), c.selection, c.doc.report());
    f.hoveredPart = c.hover.part;
    f.hoveredIsland = c.doc.island(c.hover.island);
    f.focusedFinding = focusedFinding(c.doc.report(), c.view.focusedFinding);
    const auto& steps = c.doc.plan().steps;
    if (c.view.previewStep && static_cast<std::size_t>(*c.view.previewStep) < steps.size())
        f.previewStep = &steps[static_cast<std::size_t>(*c.view.previewStep)];
    if (c.view.showBenchVoltages && c.voltages) {
        f.voltages = &c.voltages->voltages;
        f.voltagesStale = c.voltages->revision != c.doc.revision();
    }
    drawBoard(f);
    drawFindingMarks(f);
    drawFindingHighlight(f);
    drawRepairPreview(f);
    drawBenchVoltages(f);
    drawSideCaption(f);
}

}  // namespace

void drawBoard(const LayerFrame& f) {
    drawSubstrate(f);
    drawCopper(f);
    drawIslandHighlight(f);
    drawLinks(f);
    // Seen from above, a cut is under the board and the parts stand over it: bodies go above
    // the marks (a see-through body lets them show, the copper side has no bodies).
    drawCuts(f);
    drawParts(f);
    drawOffboardParts(f);
    drawWires(f);
    drawLabels(f);
    // Letters and numbers last: pinned to the canvas edges when the board's own edge is out
    // of view, over whatever lies there.
    drawEdgeLabels(f);
}

CanvasView drawCanvas(const CanvasContext& c, ImVec2 pos, ImVec2 size) {
    const ImVec2 max{pos.x + size.x, pos.y + size.y};
    c.view.canvasMin = pos;
    c.view.canvasMax = max;
    ImGui::SetCursorScreenPos(pos);
    ImGui::InvisibleButton("board-canvas", {std::max(size.x, 1.0f), std::max(size.y, 1.0f)},
                           ImGuiButtonFlags_MouseButtonLeft | ImGuiButtonFlags_MouseButtonRight |
                               ImGuiButtonFlags_MouseButtonMiddle);
    const bool hovered = ImGui::IsItemHovered();
    const bool active = ImGui::IsItemActive();
    c.hover.spaceHeld = (hovered || active) && !ImGui::GetIO().WantTextInput &&
                        ImGui::IsKeyDown(platform::keyIndex(sf::Keyboard::Space));
    handleViewInput(c.view, c.hover.spaceHeld, hovered, active);

    const auto& board = c.doc.board();
    ImDrawList* draw = ImGui::GetWindowDrawList();
    draw->PushClipRect(pos, max, true);
    draw->AddRectFilled(pos, max, palette::kSurround);
    CanvasView out{makeCanvasFrame(draw, canvasTransform(c.view, board, pos, max), pos, max,
                                   c.view.side, board),
                   {}};
    logHolePositions(c.doc, c.log, out.frame);
    out.input = readInput(board, out.frame, hovered, c.hover.spaceHeld);
    updateHover(c.doc, c.hover, out.input);
    drawLayers(c, out.frame);
    draw->PopClipRect();
    return out;
}

}  // namespace stripsmith
