// Off-board parts beside the board, and the flying leads to them.
#include <cmath>
#include <string>
#include <vector>

#include "editor/canvas/layers.hpp"
#include "editor/canvas/palette.hpp"
#include "editor/canvas/wire_route.hpp"

namespace stripsmith {

using netcheck::edit::ElementRef;

void drawOffboardParts(const LayerFrame& f) {
    const netcheck::Board& board = f.board;
    const Selected& selected = f.selected;
    const float size = std::max(11.0f, canvasTextSize(f, 0.5f));
    ImFont* font = ImGui::GetFont();
    for (const OffboardSpot& spot : f.spots) {
        const auto& part = board.offboard[spot.index];
        const ImVec2 a = f.at(spot.min), b = f.at(spot.max);
        const ImVec2 lo{std::min(a.x, b.x), a.y}, hi{std::max(a.x, b.x), b.y};
        const bool sel = selected.count(ElementRef{ElementRef::Kind::Offboard, spot.index}) > 0;
        f.draw->AddRectFilled(lo, hi, palette::kOffboardBody, 6.0f);
        f.draw->AddRect(lo, hi, sel ? palette::kSelection : palette::kOffboardEdge, 6.0f, 0, sel ? 3.0f : 1.5f);
        const std::string title = part.ref + "  " + part.value;
        f.draw->PushClipRect(lo, hi, true);
        f.draw->AddText(font, size, {lo.x + 6, lo.y + 4}, palette::kTextLight, title.c_str());
        if (hi.y - lo.y > size * 2.2f)
            f.draw->AddText(font, size * 0.85f, {lo.x + 6, lo.y + 4 + size * 1.1f}, palette::kLabelDim, part.kind.c_str());
        f.draw->PopClipRect();
        for (std::size_t j = 0; j < spot.lugs.size(); ++j) {
            const ImVec2 p = f.at(spot.lugs[j]);
            f.draw->AddLine({p.x, lo.y + (hi.y - lo.y)}, p, palette::kLug, 3.0f);
            f.draw->AddCircleFilled(p, f.t.len(0.28f), palette::kLug, 14);
            f.draw->AddCircleFilled(p, f.t.len(0.12f), palette::kSurround, 10);
            const std::string& name = part.pins[j];
            const ImVec2 ts = font->CalcTextSizeA(size, FLT_MAX, 0, name.c_str());
            f.draw->AddText(font, size, {p.x - ts.x * 0.5f, p.y + f.t.len(0.35f)}, palette::kLabel, name.c_str());
        }
    }
}

void drawWires(const LayerFrame& f) {
    const netcheck::Board& board = f.board;
    const Selected& selected = f.selected;
    for (std::size_t i = 0; i < board.wires.size(); ++i) {
        const netcheck::Wire& wire = board.wires[i];
        const std::vector<ImVec2> route = wireRoute(board, f.spots, wire, i);
        if (route.size() < 2) continue;
        std::vector<ImVec2> points;
        for (ImVec2 p : route) points.push_back(f.at(p));
        const float w = std::max(2.5f, f.t.len(0.18f));
        const bool sel = selected.count(ElementRef{ElementRef::Kind::Wire, i}) > 0;
        const int n = static_cast<int>(points.size());
        if (sel) f.draw->AddPolyline(points.data(), n, palette::kSelection, 0, w + 6.0f);
        f.draw->AddPolyline(points.data(), n, palette::rgba(0, 0, 0, 160), 0, w + 2.0f);
        f.draw->AddPolyline(points.data(), n, palette::wireColour(wire.color.c_str()), 0, w);
        for (const ImVec2& p : {points.front(), points.back()})
            f.draw->AddCircleFilled(p, f.t.len(0.2f), palette::rgba(205, 210, 215), 10);
    }
}

}  // namespace stripsmith
