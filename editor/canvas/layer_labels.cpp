// Labels on the board (part names, pin names, polarity marks), placed clear of pins, holes in
// use, cut marks and each other, and drawn above the wires so a lead never hides a name.
#include <algorithm>

#include "editor/canvas/canvas_labels.hpp"
#include "editor/canvas/layers.hpp"
#include "editor/canvas/palette.hpp"

namespace stripsmith {

namespace {

ImVec2 screenOf(const CanvasFrame& f, double x, double y) {
    return f.at({static_cast<float>(x), static_cast<float>(y)});
}

MeasureText imguiMeasure() {
    return [](const std::string& text, float sizePx) {
        return ImGui::GetFont()->CalcTextSizeA(sizePx, FLT_MAX, 0.0f, text.c_str());
    };
}

void drawLeader(const CanvasFrame& f, const CanvasLabel& label) {
    const labels::Box& box = label.placement.box;
    const double nx = std::clamp(label.anchorX, box.x0, box.x1);
    const double ny = std::clamp(label.anchorY, box.y0, box.y1);
    f.draw->AddLine(screenOf(f, label.anchorX, label.anchorY), screenOf(f, nx, ny),
                    palette::kLabel, 1.0f);
}

void drawOne(const CanvasFrame& f, const CanvasLabel& label) {
    const labels::Box& box = label.placement.box;
    const ImVec2 a = screenOf(f, box.x0, box.y0), b = screenOf(f, box.x1, box.y1);
    const ImVec2 lo{std::min(a.x, b.x), a.y}, hi{std::max(a.x, b.x), b.y};
    const bool pinName = label.kind == CanvasLabel::Kind::PinName;
    f.draw->AddRectFilled(lo, hi, pinName ? palette::rgba(255, 255, 240, 235) : palette::rgba(20, 24, 28, 170), 3);
    f.draw->AddText(ImGui::GetFont(), label.sizePx, {lo.x + kLabelPadPx, lo.y},
                    pinName ? palette::kText : palette::kTextLight, label.text.c_str());
}

std::vector<CanvasLabel> frameLabels(const LayerFrame& f) {
    CanvasLabelView view;
    view.holePx = f.t.holePx;
    view.mirrored = f.t.mirrored;
    view.bodies = f.showsBodies();
    view.hoveredPart = f.hoveredPart;
    // Only what is on screen when the board is larger than the view.
    const bool whole = f.firstRow == 0 && f.firstCol == 0 && f.lastRow == f.board.rows - 1 &&
                       f.lastCol == f.board.cols - 1;
    if (!whole)
        view.shown = labels::Box{static_cast<double>(f.firstCol), static_cast<double>(f.firstRow),
                                 f.lastCol + 1.0, f.lastRow + 1.0};
    return canvasLabels(f.board, view, imguiMeasure());
}

}  // namespace

void drawLabels(const LayerFrame& f) {
    const std::vector<CanvasLabel> placed = frameLabels(f);
    for (const CanvasLabel& label : placed)
        if (label.placement.leader) drawLeader(f, label);
    for (const CanvasLabel& label : placed) drawOne(f, label);
}

}  // namespace stripsmith
