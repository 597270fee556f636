// Highlights: the island under the mouse, the focused finding and its suggested fix.
#include <algorithm>
#include <cmath>

#include "editor/canvas/layers.hpp"
#include "editor/canvas/palette.hpp"
#include "editor/canvas/wire_route.hpp"

namespace stripsmith {
namespace {

void cellGlow(const CanvasFrame& f, netcheck::Hole h, ImU32 colour) {
    const ImVec2 p = f.hole(h);
    const float s = f.t.len(0.5f);
    f.draw->AddRectFilled({p.x - s, p.y - s}, {p.x + s, p.y + s}, colour);
}

void dashedLine(const CanvasFrame& f, ImVec2 a, ImVec2 b, ImU32 colour, float width) {
    const float dx = b.x - a.x, dy = b.y - a.y;
    const float len = std::sqrt(dx * dx + dy * dy);
    const float dash = std::max(6.0f, f.t.len(0.3f));
    for (float t = 0; t < len; t += dash * 2) {
        const float e = std::min(len, t + dash);
        f.draw->AddLine({a.x + dx * t / len, a.y + dy * t / len}, {a.x + dx * e / len, a.y + dy * e / len}, colour, width);
    }
}

void drawSuggestedCut(const CanvasFrame& f, const netcheck::Cut& cut) {
    const ImU32 c = palette::kSuggestion;
    if (cut.kind == netcheck::Cut::Kind::Hole) {
        const ImVec2 p = f.hole(cut.hole);
        const float r = f.t.len(0.46f);
        f.draw->AddCircle(p, r, c, 20, 3.0f);
        f.draw->AddLine({p.x - r * 0.7f, p.y - r * 0.7f}, {p.x + r * 0.7f, p.y + r * 0.7f}, c, 3.0f);
        f.draw->AddLine({p.x - r * 0.7f, p.y + r * 0.7f}, {p.x + r * 0.7f, p.y - r * 0.7f}, c, 3.0f);
    } else {
        const float x = static_cast<float>(cut.hole.col) + 1.0f, y = static_cast<float>(cut.hole.row) + 0.5f;
        dashedLine(f, f.at({x, y - 0.6f}), f.at({x, y + 0.6f}), c, 4.0f);
    }
}

}  // namespace

void drawIslandHighlight(const LayerFrame& f) {
    if (!f.hoveredIsland) return;
    const netcheck::Island& island = *f.hoveredIsland;
    const netcheck::Board& board = f.board;
    for (const netcheck::Hole& h : island.holes)
        if (h.row >= f.firstRow && h.row <= f.lastRow && h.col >= f.firstCol && h.col <= f.lastCol)
            cellGlow(f, h, palette::kHover);
    // Links and wires whose ends are in the island carry it across strips.
    auto inIsland = [&](netcheck::Hole h) { return std::binary_search(island.holes.begin(), island.holes.end(), h); };
    for (const netcheck::Link& link : board.links)
        if (inIsland(link.from))
            f.draw->AddLine(f.hole(link.from), f.hole(link.to), palette::kHoverEdge, std::max(3.0f, f.t.len(0.22f)));
    for (std::size_t i = 0; i < board.wires.size(); ++i) {
        const netcheck::Wire& wire = board.wires[i];
        const bool hit = (wire.from.hole && inIsland(*wire.from.hole)) || (wire.to.hole && inIsland(*wire.to.hole)) ||
                         std::binary_search(island.pins.begin(), island.pins.end(), wire.from.lug) ||
                         std::binary_search(island.pins.begin(), island.pins.end(), wire.to.lug);
        if (!hit) continue;
        std::vector<ImVec2> points;
        for (ImVec2 p : wireRoute(board, f.spots, wire, i)) points.push_back(f.at(p));
        if (points.size() >= 2)
            f.draw->AddPolyline(points.data(), static_cast<int>(points.size()), palette::kHoverEdge, 0, 2.0f);
    }
}

void drawFindingHighlight(const LayerFrame& f) {
    if (!f.focusedFinding) return;
    const netcheck::Finding& finding = *f.focusedFinding;
    const netcheck::Board& board = f.board;
    const ImU32 tone = finding.severity() == netcheck::Severity::Error ? palette::kErrorFill
                                                                      : palette::rgba(250, 180, 40, 70);
    for (const netcheck::Hole& h : finding.holes) cellGlow(f, h, tone);
    // Short: the copper path between the two nets.
    for (std::size_t i = 1; i < finding.path.size(); ++i)
        f.draw->AddLine(f.hole(finding.path[i - 1]), f.hole(finding.path[i]), palette::kError, std::max(3.0f, f.t.len(0.2f)));
    // Open: each piece in its own colour (pins located on the board).
    for (std::size_t p = 0; p < finding.pieces.size(); ++p)
        for (const netcheck::PinRef& pin : finding.pieces[p])
            if (const netcheck::Part* part = board.findPart(pin.ref))
                if (const netcheck::Pin* on = part->findPin(pin.pin))
                    f.draw->AddCircle(f.hole(on->hole), f.t.len(0.45f), palette::pieceColour(static_cast<int>(p)), 16, 3.0f);
    for (const netcheck::Link& link : finding.suggestedLinks)
        dashedLine(f, f.hole(link.from), f.hole(link.to), palette::kSuggestion, std::max(3.0f, f.t.len(0.16f)));
    if (finding.suggestedCut) drawSuggestedCut(f, *finding.suggestedCut);
    if (finding.hole) {
        const ImVec2 p = f.hole(*finding.hole);
        f.draw->AddCircle(p, f.t.len(0.7f), palette::kError, 24, 3.0f);
    }
    if (!finding.ref.empty())
        if (const netcheck::Part* part = board.findPart(finding.ref))
            for (const netcheck::Pin& pin : part->pins)
                f.draw->AddCircle(f.hole(pin.hole), f.t.len(0.55f), palette::kWarning, 16, 2.5f);
}

namespace {

// A cross over a hole: what the step takes away.
void crossOut(const CanvasFrame& f, ImVec2 p) {
    const float r = f.t.len(0.4f);
    f.draw->AddLine({p.x - r, p.y - r}, {p.x + r, p.y + r}, palette::kError, 3.0f);
    f.draw->AddLine({p.x - r, p.y + r}, {p.x + r, p.y - r}, palette::kError, 3.0f);
}

void previewLeads(const LayerFrame& f, const netcheck::RepairStep& step) {
    const float size = canvasTextSize(f, 0.45f);
    for (std::size_t k = 0; k < step.pinsAfter.size() && k < step.pinsBefore.size(); ++k) {
        const netcheck::Pin& after = step.pinsAfter[k];
        if (after.hole == step.pinsBefore[k].hole) continue;
        const ImVec2 p = f.hole(after.hole);
        f.draw->AddCircleFilled(p, f.t.len(0.38f), palette::rgba(90, 200, 255, 110), 16);
        f.draw->AddCircle(p, f.t.len(0.38f), palette::kSuggestion, 16, 2.5f);
        if (size > 0)
            f.draw->AddText(nullptr, size, {p.x + f.t.len(0.42f), p.y - size}, palette::kSuggestion, after.name.c_str());
    }
}

}  // namespace

void drawRepairPreview(const LayerFrame& f) {
    if (!f.previewStep) return;
    const netcheck::RepairStep& step = *f.previewStep;
    using Action = netcheck::RepairAction;
    const float width = std::max(3.0f, f.t.len(0.16f));
    switch (step.action) {
        case Action::AddCut: drawSuggestedCut(f, *step.cut); break;
        case Action::MoveCut:
            crossOut(f, f.hole(step.cut->hole));
            drawSuggestedCut(f, *step.movedTo);
            break;
        case Action::RemoveCut: crossOut(f, f.hole(step.cut->hole)); break;
        case Action::AddLink: dashedLine(f, f.hole(step.link->from), f.hole(step.link->to), palette::kSuggestion, width); break;
        case Action::RemoveLink:
            f.draw->AddLine(f.hole(step.link->from), f.hole(step.link->to), palette::kError, width);
            crossOut(f, f.hole(step.link->from));
            crossOut(f, f.hole(step.link->to));
            break;
        case Action::RemoveWire:
            for (const netcheck::Endpoint* end : {&step.wire->from, &step.wire->to})
                if (end->hole) crossOut(f, f.hole(*end->hole));
            break;
        case Action::TurnPart:
        case Action::ReorderPins:
        case Action::MoveLead: previewLeads(f, step); break;
    }
}

void drawFindingMarks(const LayerFrame& f) {
    for (const netcheck::Finding& finding : f.report.errors) {
        if (finding.hole) f.draw->AddCircle(f.hole(*finding.hole), f.t.len(0.55f), palette::kError, 16, 2.0f);
        if (finding.suggestedCut) {
            const ImVec2 p = f.hole(finding.suggestedCut->hole);
            f.draw->AddCircle(p, f.t.len(0.2f), palette::kSuggestion, 10, 2.0f);
        }
    }
}

}  // namespace stripsmith
