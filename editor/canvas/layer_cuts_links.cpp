// Track cuts and wire links.
#include <cmath>

#include "editor/canvas/layers.hpp"
#include "editor/canvas/palette.hpp"

namespace stripsmith {

using netcheck::edit::ElementRef;

namespace {

ImVec2 lerp(ImVec2 a, ImVec2 b, float t) { return {a.x + (b.x - a.x) * t, a.y + (b.y - a.y) * t}; }

bool isSelected(const Selected& selected, ElementRef::Kind kind, std::size_t index) {
    return selected.count(ElementRef{kind, index}) > 0;
}

void drawHoleCut(const CanvasFrame& f, netcheck::Hole h, ImU32 mark) {
    const ImVec2 p = f.hole(h);
    const ImU32 bare = f.side == Side::Copper ? palette::kBoardCopperSide : palette::kBoardComponent;
    // The drilled-away copper ring shows the bare board, then the hole itself (from above only
    // the mark, so parts over it stay visible).
    if (f.side != Side::Component) f.draw->AddCircleFilled(p, f.t.len(0.44f), bare, 20);
    f.draw->AddCircle(p, f.t.len(0.44f), mark, 20, std::max(1.5f, f.t.len(0.09f)));
    f.draw->AddCircleFilled(p, f.t.len(0.22f), palette::kCutHole, 12);
    f.draw->AddCircleFilled(p, f.t.len(0.12f), palette::kHole, 10);
}

void drawBetweenCut(const CanvasFrame& f, netcheck::Hole left, ImU32 mark) {
    const float x = static_cast<float>(left.col) + 1.0f;
    const float y = static_cast<float>(left.row) + 0.5f;
    const ImU32 bare = f.side == Side::Copper ? palette::kBoardCopperSide : palette::kBoardComponent;
    const ImVec2 a = f.at({x - 0.07f, y - 0.46f});
    const ImVec2 b = f.at({x + 0.07f, y + 0.46f});
    if (f.side != Side::Component) f.draw->AddRectFilled({std::min(a.x, b.x), a.y}, {std::max(a.x, b.x), b.y}, bare);
    // A knife score: a bold bar across the strip.
    f.draw->AddLine(f.at({x, y - 0.46f}), f.at({x, y + 0.46f}), mark, std::max(2.0f, f.t.len(0.1f)));
}

}  // namespace

void drawCuts(const LayerFrame& f) {
    const netcheck::Board& board = f.board;
    const Selected& selected = f.selected;
    for (std::size_t i = 0; i < board.cuts.size(); ++i) {
        const netcheck::Cut& cut = board.cuts[i];
        if (cut.hole.row < f.firstRow || cut.hole.row > f.lastRow) continue;
        const ImU32 mark = isSelected(selected, ElementRef::Kind::Cut, i) ? palette::kSelection
                                                                          : palette::kCutMark;
        if (cut.kind == netcheck::Cut::Kind::Hole) drawHoleCut(f, cut.hole, mark);
        else drawBetweenCut(f, cut.hole, mark);
    }
}

void drawLinks(const LayerFrame& f) {
    const netcheck::Board& board = f.board;
    const Selected& selected = f.selected;
    for (std::size_t i = 0; i < board.links.size(); ++i) {
        const netcheck::Link& link = board.links[i];
        const ImVec2 a = f.hole(link.from);
        const ImVec2 b = f.hole(link.to);
        if (!f.visible(a, b)) continue;
        const bool sel = isSelected(selected, ElementRef::Kind::Link, i);
        const bool onThisSide = link.copperSide == (f.side == Side::Copper);
        if (!onThisSide && f.side != Side::SeeThrough) {
            // Seen through the board: only where it comes through.
            f.draw->AddCircleFilled(a, f.t.len(0.2f), palette::kLinkWire, 10);
            f.draw->AddCircleFilled(b, f.t.len(0.2f), palette::kLinkWire, 10);
            continue;
        }
        const float w = std::max(2.0f, f.t.len(0.16f));
        if (sel) f.draw->AddLine(a, b, palette::kSelection, w + 6.0f);
        f.draw->AddLine(a, b, palette::kLinkWireEdge, w + 2.0f);
        f.draw->AddLine(a, b, palette::kLinkWire, w);
        // A sleeve over the wire, short of its ends, where the bare wire goes into the holes.
        if (link.insulated) f.draw->AddLine(lerp(a, b, 0.12f), lerp(a, b, 0.88f), palette::kLinkSleeve, w + 3.0f);
        f.draw->AddCircleFilled(a, f.t.len(0.2f), palette::kLinkWire, 10);
        f.draw->AddCircleFilled(b, f.t.len(0.2f), palette::kLinkWire, 10);
    }
}

}  // namespace stripsmith
