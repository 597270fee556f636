// Part bodies a maker recognises at a glance, leads ending in their holes.
//
// Sections: geometry helpers | two-lead bodies | multi-pin bodies | the layer. (Their labels are
// placed and drawn by layer_labels.cpp, above the wires.)
#include <algorithm>
#include <cmath>
#include <string>

#include "editor/canvas/layers.hpp"
#include "editor/canvas/palette.hpp"
#include "editor/canvas/part_style.hpp"
#include "netcheck/model/colour_code.hpp"
#include "netcheck/model/value.hpp"

namespace stripsmith {

using netcheck::Part;
using netcheck::edit::ElementRef;

namespace {

// ---- geometry helpers ----------------------------------------------------------------------

ImVec2 add(ImVec2 a, ImVec2 b) { return {a.x + b.x, a.y + b.y}; }
ImVec2 sub(ImVec2 a, ImVec2 b) { return {a.x - b.x, a.y - b.y}; }
ImVec2 mul(ImVec2 a, float s) { return {a.x * s, a.y * s}; }
float length(ImVec2 a) { return std::sqrt(a.x * a.x + a.y * a.y); }

/// The line between a two-lead part's holes, on screen.
struct Axis {
    ImVec2 a, b, mid, d, n;
    float len;
    Axis(ImVec2 from, ImVec2 to) : a(from), b(to), mid(mul(add(from, to), 0.5f)) {
        len = length(sub(to, from));
        d = len > 0.01f ? mul(sub(to, from), 1.0f / len) : ImVec2{1, 0};
        n = {-d.y, d.x};
    }
    ImVec2 along(float t, float across = 0) const { return add(add(mid, mul(d, t)), mul(n, across)); }
};

void quad(const CanvasFrame& f, const Axis& ax, float from, float to, float halfWidth, ImU32 colour) {
    f.draw->AddQuadFilled(ax.along(from, -halfWidth), ax.along(to, -halfWidth), ax.along(to, halfWidth),
                          ax.along(from, halfWidth), colour);
}

void lead(const CanvasFrame& f, ImVec2 a, ImVec2 b) {
    f.draw->AddLine(a, b, palette::kLead, std::max(1.5f, f.t.len(0.09f)));
}

void leadEnds(const CanvasFrame& f, const Part& part) {
    for (const netcheck::Pin& pin : part.pins)
        f.draw->AddCircleFilled(f.hole(pin.hole), f.t.len(0.17f), palette::kLead, 10);
}

ImU32 bandColour(netcheck::BandColour c) {
    using B = netcheck::BandColour;
    switch (c) {
    case B::Black: return palette::rgba(20, 20, 20);
    case B::Brown: return palette::rgba(120, 66, 30);
    case B::Red: return palette::rgba(210, 30, 30);
    case B::Orange: return palette::rgba(245, 130, 20);
    case B::Yellow: return palette::rgba(245, 215, 30);
    case B::Green: return palette::rgba(30, 150, 60);
    case B::Blue: return palette::rgba(40, 80, 210);
    case B::Violet: return palette::rgba(140, 60, 190);
    case B::Grey: return palette::rgba(130, 130, 130);
    case B::White: return palette::rgba(250, 250, 250);
    case B::Gold: return palette::rgba(200, 160, 50);
    case B::Silver: return palette::rgba(190, 195, 200);
    case B::Pink: return palette::rgba(245, 150, 180);
    case B::None: break;
    }
    return 0;
}

double tolerancePercent(const Part& part) {
    auto it = part.extra.find("tolerance");
    if (it != part.extra.end() && it->is_number()) return it->get<double>();
    if (it != part.extra.end() && it->is_string()) {
        try { return std::stod(it->get<std::string>()); } catch (...) { return 5.0; }
    }
    return 5.0;
}

std::vector<netcheck::BandColour> bandsOf(const Part& part) {
    const auto q = netcheck::parseQuantity(part.value);
    if (!q) return {};
    auto bands = netcheck::resistorBands(q->magnitude, tolerancePercent(part));
    return bands ? *bands : std::vector<netcheck::BandColour>{};
}

int pinIndex(const Part& part, std::initializer_list<const char*> names) {
    for (std::size_t i = 0; i < part.pins.size(); ++i)
        for (const char* n : names)
            if (part.pins[i].name == n) return static_cast<int>(i);
    return -1;
}

// ---- two-lead bodies ------------------------------------------------------------------------

void drawResistorBands(const CanvasFrame& f, const Axis& ax, const Part& part, float half, float hw) {
    const auto bands = bandsOf(part);
    const std::size_t n = bands.size();
    for (std::size_t i = 0; i < n; ++i) {
        // Value bands sit towards pin 1; the tolerance band apart at the other end.
        const bool tol = i + 1 == n && n >= 4;
        const float t = tol ? half * 0.62f : -half * 0.62f + static_cast<float>(i) * half * 0.34f;
        if (bands[i] == netcheck::BandColour::None) continue;
        quad(f, ax, t - half * 0.09f, t + half * 0.09f, hw, bandColour(bands[i]));
    }
}

void drawAxialLying(const CanvasFrame& f, const Axis& ax, const Part& part, BodyStyle style) {
    lead(f, ax.a, ax.b);
    const float half = std::min(ax.len * 0.5f - f.t.len(0.35f), f.t.len(1.3f));
    if (half <= 1.0f) return;
    const float hw = f.t.len(style == BodyStyle::Diode ? 0.26f : 0.33f);
    const ImU32 body = style == BodyStyle::Diode ? palette::rgba(40, 40, 44)
                       : part.kind == "resistor" ? palette::rgba(226, 205, 160)
                                                 : palette::rgba(90, 130, 200);
    quad(f, ax, -half, half, hw, body);
    f.draw->AddCircleFilled(ax.along(-half), hw, body, 12);
    f.draw->AddCircleFilled(ax.along(half), hw, body, 12);
    if (style == BodyStyle::Resistor && part.kind == "resistor") drawResistorBands(f, ax, part, half, hw);
    if (style == BodyStyle::Diode) {
        // Cathode band at the K end.
        const float sign = pinIndex(part, {"K", "-"}) == 0 ? -1.0f : 1.0f;
        quad(f, ax, sign * half * 0.55f, sign * half * 0.85f, hw, palette::rgba(215, 215, 220));
    }
}

void drawAxialStanding(const CanvasFrame& f, const Axis& ax, const Part& part, BodyStyle style) {
    // Body upright over pin 1 (over the anode for diodes, so the band is on top at the cathode lead).
    const ImVec2 top = ax.a;
    lead(f, ax.a, ax.b);
    const float r = f.t.len(0.42f);
    const ImU32 body = style == BodyStyle::Diode ? palette::rgba(40, 40, 44) : palette::rgba(226, 205, 160);
    f.draw->AddCircleFilled(top, r, body, 18);
    f.draw->AddCircle(top, r, palette::rgba(0, 0, 0, 120), 18, 1.0f);
    if (style == BodyStyle::Resistor) {
        const auto bands = bandsOf(part);
        for (std::size_t i = 0; i < bands.size() && i < 3; ++i)
            f.draw->AddCircle(top, r * (0.85f - 0.22f * static_cast<float>(i)), bandColour(bands[i]), 18,
                              std::max(1.5f, r * 0.16f));
    }
    if (style == BodyStyle::Diode) f.draw->AddCircle(top, r * 0.75f, palette::rgba(215, 215, 220), 18, r * 0.25f);
    f.draw->AddCircleFilled(ax.b, f.t.len(0.17f), palette::kLead, 10);
}

void drawCeramic(const CanvasFrame& f, const Axis& ax) {
    lead(f, ax.a, ax.b);
    const float half = std::max(ax.len * 0.5f + f.t.len(0.25f), f.t.len(0.6f));
    quad(f, ax, -half, half, f.t.len(0.22f), palette::rgba(230, 150, 40));
    f.draw->AddCircleFilled(ax.along(-half), f.t.len(0.22f), palette::rgba(230, 150, 40), 12);
    f.draw->AddCircleFilled(ax.along(half), f.t.len(0.22f), palette::rgba(230, 150, 40), 12);
}

void drawFilm(const CanvasFrame& f, const Axis& ax) {
    lead(f, ax.a, ax.b);
    const float half = ax.len * 0.5f + f.t.len(0.35f);
    quad(f, ax, -half, half, f.t.len(0.38f), palette::rgba(60, 120, 80));
    f.draw->AddQuad(ax.along(-half, -f.t.len(0.38f)), ax.along(half, -f.t.len(0.38f)),
                    ax.along(half, f.t.len(0.38f)), ax.along(-half, f.t.len(0.38f)),
                    palette::rgba(20, 50, 30), 1.0f);
}

void drawRadialCircle(const CanvasFrame& f, const Axis& ax, const Part& part, bool led) {
    const float r = std::max(ax.len * 0.5f + f.t.len(0.45f), f.t.len(0.8f));
    const int cathode = pinIndex(part, {"K", "-"});
    const float side = cathode == 0 ? -1.0f : 1.0f;  // along the axis towards the marked lead
    const ImU32 body = led ? palette::rgba(220, 40, 40, 200) : palette::rgba(30, 50, 110);
    f.draw->AddCircleFilled(ax.mid, r, body, 32);
    if (led) {
        // The flat on the rim at the cathode side.
        const ImVec2 c = ax.along(side * r * 0.85f);
        f.draw->AddLine(add(c, mul(ax.n, r * 0.55f)), sub(c, mul(ax.n, r * 0.55f)), palette::kTextLight, 2.5f);
        f.draw->AddCircle(ax.mid, r, palette::rgba(120, 10, 10), 32, 1.5f);
    } else {
        // The negative stripe down one side, with minus signs.
        f.draw->PathArcTo(ax.mid, r * 0.86f, std::atan2(side * ax.d.y, side * ax.d.x) - 0.9f,
                          std::atan2(side * ax.d.y, side * ax.d.x) + 0.9f, 16);
        f.draw->PathStroke(palette::rgba(200, 210, 230), 0, r * 0.22f);
        f.draw->AddCircle(ax.mid, r, palette::rgba(10, 20, 50), 32, 1.5f);
    }
    leadEnds(f, part);
}

// ---- multi-pin bodies -----------------------------------------------------------------------

struct PinBox {
    ImVec2 min{FLT_MAX, FLT_MAX};
    ImVec2 max{-FLT_MAX, -FLT_MAX};
};

PinBox pinBox(const CanvasFrame& f, const Part& part) {
    PinBox box;
    for (const netcheck::Pin& pin : part.pins) {
        const ImVec2 p = f.hole(pin.hole);
        box.min = {std::min(box.min.x, p.x), std::min(box.min.y, p.y)};
        box.max = {std::max(box.max.x, p.x), std::max(box.max.y, p.y)};
    }
    return box;
}

void drawDip(const CanvasFrame& f, const Part& part) {
    const PinBox box = pinBox(f, part);
    const ImVec2 first = f.hole(part.pins.front().hole);
    const ImVec2 last = f.hole(part.pins.back().hole);
    // Rows of pins run along the longer side; the body sits between them.
    const bool rowsVertical = std::fabs(first.x - last.x) > std::fabs(first.y - last.y);
    const float in = f.t.len(0.38f), out = f.t.len(0.45f);
    ImVec2 lo = box.min, hi = box.max;
    if (rowsVertical) { lo = {lo.x + in, lo.y - out}; hi = {hi.x - in, hi.y + out}; }
    else { lo = {lo.x - out, lo.y + in}; hi = {hi.x + out, hi.y - in}; }
    for (const netcheck::Pin& pin : part.pins) {
        const ImVec2 p = f.hole(pin.hole);
        const float s = f.t.len(0.2f);
        f.draw->AddRectFilled({p.x - s, p.y - s}, {p.x + s, p.y + s}, palette::kLead);
    }
    f.draw->AddRectFilled(lo, hi, palette::rgba(36, 38, 42), f.t.len(0.08f));
    // Notch at the end nearest pin 1, and a dot beside pin 1.
    const ImVec2 centre{(lo.x + hi.x) * 0.5f, (lo.y + hi.y) * 0.5f};
    ImVec2 notch = rowsVertical ? ImVec2{centre.x, first.y < centre.y ? lo.y : hi.y}
                                : ImVec2{first.x < centre.x ? lo.x : hi.x, centre.y};
    f.draw->AddCircleFilled(notch, f.t.len(0.3f), palette::kBoardComponent, 16);
    const ImVec2 dot{first.x + (centre.x - first.x) * 0.3f, first.y + (centre.y - first.y) * 0.18f};
    const ImVec2 dot2 = rowsVertical ? ImVec2{first.x + (centre.x > first.x ? 1.f : -1.f) * f.t.len(0.75f), first.y}
                                     : ImVec2{first.x, first.y + (centre.y > first.y ? 1.f : -1.f) * f.t.len(0.75f)};
    (void)dot;
    f.draw->AddCircleFilled(dot2, f.t.len(0.14f), palette::rgba(200, 200, 200), 10);
}

void drawToPackage(const CanvasFrame& f, const Part& part) {
    const ImVec2 first = f.hole(part.pins.front().hole);
    const ImVec2 last = f.hole(part.pins.back().hole);
    const Axis ax(first, last);
    const float r = std::max(ax.len * 0.5f + f.t.len(0.45f), f.t.len(0.8f));
    // A D shape: flat face on one side of the lead line, round back on the other.
    const ImVec2 flat = ax.along(0, -f.t.len(0.3f));
    const float a0 = std::atan2(ax.d.y, ax.d.x);
    f.draw->PathArcTo(flat, r, a0, a0 + 3.14159265f, 24);
    f.draw->PathFillConvex(palette::rgba(34, 34, 38));
    f.draw->AddLine(add(flat, mul(ax.d, r)), sub(flat, mul(ax.d, r)), palette::rgba(150, 150, 160), 2.0f);
    leadEnds(f, part);
}

void drawTrimmer(const CanvasFrame& f, const Part& part) {
    const PinBox box = pinBox(f, part);
    const float pad = f.t.len(0.45f);
    const ImVec2 lo{box.min.x - pad, box.min.y - pad}, hi{box.max.x + pad, box.max.y + pad};
    f.draw->AddRectFilled(lo, hi, palette::rgba(40, 90, 170), f.t.len(0.1f));
    const ImVec2 c{(lo.x + hi.x) * 0.5f, (lo.y + hi.y) * 0.5f};
    const float r = std::min(hi.x - lo.x, hi.y - lo.y) * 0.32f;
    f.draw->AddCircleFilled(c, r, palette::rgba(235, 235, 235), 20);
    f.draw->AddLine({c.x - r * 0.7f, c.y + r * 0.7f}, {c.x + r * 0.7f, c.y - r * 0.7f}, palette::rgba(60, 60, 60), 2.0f);
    leadEnds(f, part);
}

void drawHeader(const CanvasFrame& f, const Part& part) {
    for (const netcheck::Pin& pin : part.pins) {
        const ImVec2 p = f.hole(pin.hole);
        const float s = f.t.len(0.48f), g = f.t.len(0.13f);
        f.draw->AddRectFilled({p.x - s, p.y - s}, {p.x + s, p.y + s}, palette::rgba(30, 30, 32));
        f.draw->AddRectFilled({p.x - g, p.y - g}, {p.x + g, p.y + g}, palette::rgba(225, 185, 60));
    }
}

void drawGeneric(const CanvasFrame& f, const Part& part) {
    if (part.pins.size() == 2) {
        const Axis ax(f.hole(part.pins[0].hole), f.hole(part.pins[1].hole));
        lead(f, ax.a, ax.b);
        const float half = std::max(ax.len * 0.5f - f.t.len(0.45f), f.t.len(0.3f));
        quad(f, ax, -half, half, f.t.len(0.32f), palette::rgba(150, 156, 166));
        leadEnds(f, part);
        return;
    }
    const PinBox box = pinBox(f, part);
    const float pad = f.t.len(0.4f);
    f.draw->AddRectFilled({box.min.x - pad, box.min.y - pad}, {box.max.x + pad, box.max.y + pad},
                          palette::rgba(150, 156, 166, 220), f.t.len(0.15f));
    leadEnds(f, part);
}

void drawBody(const CanvasFrame& f, const Part& part) {
    const BodyStyle style = bodyStyleOf(part);
    if (part.pins.size() == 2 && style != BodyStyle::Header && style != BodyStyle::Generic) {
        const Axis ax(f.hole(part.pins[0].hole), f.hole(part.pins[1].hole));
        switch (style) {
        case BodyStyle::Resistor:
        case BodyStyle::Diode:
            if (isStanding(part)) drawAxialStanding(f, ax, part, style);
            else { drawAxialLying(f, ax, part, style); leadEnds(f, part); }
            return;
        case BodyStyle::CeramicCap: drawCeramic(f, ax); leadEnds(f, part); return;
        case BodyStyle::FilmCap: drawFilm(f, ax); leadEnds(f, part); return;
        case BodyStyle::Electrolytic: drawRadialCircle(f, ax, part, false); return;
        case BodyStyle::Led: drawRadialCircle(f, ax, part, true); return;
        default: break;
        }
    }
    switch (style) {
    case BodyStyle::Dip: drawDip(f, part); return;
    case BodyStyle::ToPackage: if (part.pins.size() >= 2) { drawToPackage(f, part); return; } break;
    case BodyStyle::Trimmer: drawTrimmer(f, part); return;
    case BodyStyle::Header: drawHeader(f, part); return;
    default: break;
    }
    drawGeneric(f, part);
}

// Seen through, a body lets the strips, joints and cuts under it show: every vertex drawn since
// `firstVertex` keeps this share of its opacity.
constexpr float kSeeThroughBody = 0.5f;

void fadeSince(ImDrawList* draw, int firstVertex, float opacity) {
    for (int v = firstVertex; v < draw->VtxBuffer.Size; ++v) {
        ImU32& col = draw->VtxBuffer[v].col;
        const float alpha = static_cast<float>((col & IM_COL32_A_MASK) >> IM_COL32_A_SHIFT) * opacity;
        col = (col & ~IM_COL32_A_MASK) | (static_cast<ImU32>(alpha) << IM_COL32_A_SHIFT);
    }
}

void drawSolderJoints(const CanvasFrame& f, const Part& part) {
    for (const netcheck::Pin& pin : part.pins)
        f.draw->AddCircleFilled(f.hole(pin.hole), f.t.len(0.26f), palette::rgba(205, 210, 215), 12);
}

void drawSelectionOutline(const CanvasFrame& f, const Part& part) {
    for (const netcheck::Pin& pin : part.pins)
        f.draw->AddCircle(f.hole(pin.hole), f.t.len(0.42f), palette::kSelection, 16, 2.5f);
    if (part.pins.size() >= 2) {
        const PinBox box = pinBox(f, part);
        const float pad = f.t.len(0.6f);
        f.draw->AddRect({box.min.x - pad, box.min.y - pad}, {box.max.x + pad, box.max.y + pad},
                        palette::kSelection, 4.0f, 0, 2.0f);
    }
}

}  // namespace

void drawParts(const LayerFrame& f) {
    const netcheck::Board& board = f.board;
    const Selected& selected = f.selected;
    for (std::size_t i = 0; i < board.parts.size(); ++i) {
        const Part& part = board.parts[i];
        if (part.pins.empty()) continue;
        const PinBox box = pinBox(f, part);
        const float pad = f.t.len(1.5f);
        if (!f.visible({box.min.x - pad, box.min.y - pad}, {box.max.x + pad, box.max.y + pad})) continue;
        if (f.showsBodies()) {
            const int firstVertex = f.draw->VtxBuffer.Size;
            drawBody(f, part);
            if (f.side == Side::SeeThrough) fadeSince(f.draw, firstVertex, kSeeThroughBody);
        } else {
            drawSolderJoints(f, part);
        }
        if (selected.count(ElementRef{ElementRef::Kind::Part, i})) drawSelectionOutline(f, part);
    }
}

}  // namespace stripsmith
