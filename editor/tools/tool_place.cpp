// Place tool (two-lead parts by their ends, multi-pin parts as a unit), link, cut and wire tools.
//
// Sections: helpers | place | link | cut | wire | switching tools.
#include <algorithm>

#include "editor/canvas/offboard_layout.hpp"
#include "editor/canvas/palette.hpp"
#include "editor/tools/part_factory.hpp"
#include "editor/tools/ref_names.hpp"
#include "editor/tools/tools.hpp"
#include "netcheck/edit/edit.hpp"
#include "netcheck/model/part_kinds.hpp"

namespace stripsmith {

using netcheck::Hole;
using netcheck::edit::ElementRef;

namespace {

// ---- helpers ---------------------------------------------------------------------------------

void ghostLine(const CanvasFrame& f, ImVec2 a, ImVec2 b) {
    f.draw->AddLine(a, b, palette::kGhost, std::max(3.0f, f.t.len(0.25f)));
    f.draw->AddCircleFilled(a, f.t.len(0.25f), palette::kGhost, 12);
    f.draw->AddCircleFilled(b, f.t.len(0.25f), palette::kGhost, 12);
}

void ghostPart(const CanvasFrame& f, const netcheck::Part& part, bool fits) {
    const ImU32 colour = fits ? palette::kGhost : palette::rgba(240, 60, 60, 150);
    for (std::size_t i = 0; i < part.pins.size(); ++i) {
        const ImVec2 p = f.hole(part.pins[i].hole);
        f.draw->AddCircleFilled(p, f.t.len(0.3f), colour, 12);
        if (i > 0 && part.pins.size() == 2) f.draw->AddLine(f.hole(part.pins[0].hole), p, colour, f.t.len(0.3f));
    }
    if (part.pins.size() > 2) {
        // Pin 1 ringed so the orientation is clear before the click.
        f.draw->AddCircle(f.hole(part.pins[0].hole), f.t.len(0.45f), colour, 16, 2.0f);
    }
}

void selectOnly(const ToolContext& c, ElementRef::Kind kind, std::size_t index) { c.selection = {ElementRef{kind, index}}; }

void addPart(const ToolContext& c, netcheck::Part part) {
    const auto& board = c.doc.board();
    if (!fitsOnBoard(part, board)) {
        c.commands.say("That part would not fit on the board there.");
        return;
    }
    if (c.tool.standing && part.pins.size() == 2) part.extra["body"] = "standing";
    if (c.commands.perform(std::make_unique<netcheck::edit::AddPart>(part)))
        selectOnly(c, ElementRef::Kind::Part, c.doc.board().parts.size() - 1);
}

netcheck::Part twoLead(const ToolContext& c, Hole a, Hole b) {
    const auto& board = c.doc.board();
    return makeTwoLeadPart(c.tool.placeKind, nextFreeRef(board, refPrefix(c.tool.placeKind)),
                           c.tool.placeValue, a, b);
}

netcheck::Part multiPin(const ToolContext& c, Hole anchor) {
    const auto& board = c.doc.board();
    const bool counted = c.tool.placeKind == "ic" || c.tool.placeKind == "header" ||
                         c.tool.placeKind == "wire-terminal";
    const int pins = counted ? c.tool.pinCount : defaultPinCount(c.tool.placeKind);
    return makeMultiPinPart(c.tool.placeKind, nextFreeRef(board, refPrefix(c.tool.placeKind)),
                            c.tool.placeValue, anchor, c.tool.quarterTurns, pins);
}

}  // namespace

// ---- place -------------------------------------------------------------------------------------

void runPlaceTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f) {
    auto& t = c.tool;
    if (!isTwoLead(t.placeKind)) {
        if (!in.hole) return;
        const netcheck::Part part = multiPin(c, *in.hole);
        ghostPart(f, part, fitsOnBoard(part, c.doc.board()));
        if (in.pressed && in.hovered) addPart(c, part);
        return;
    }
    // Two-lead: click one end then the other, or drag from one end to the other. A click-click on
    // the same hole places the default span.
    if (in.pressed && in.hovered && in.hole) {
        if (!t.firstEnd) {
            t.firstEnd = *in.hole;
            t.pressHole = *in.hole;
        } else {
            const Hole second = *in.hole == *t.firstEnd ? defaultSecondHole(t.placeKind, *t.firstEnd, t.standing) : *in.hole;
            addPart(c, twoLead(c, *t.firstEnd, second));
            t.firstEnd.reset();
        }
    } else if (in.released && t.firstEnd && t.pressHole && in.hole && *in.hole != *t.pressHole) {
        addPart(c, twoLead(c, *t.firstEnd, *in.hole));
        t.firstEnd.reset();
    }
    if (in.released) t.pressHole.reset();
    if (t.firstEnd && in.hole) {
        const Hole second = *in.hole == *t.firstEnd ? defaultSecondHole(t.placeKind, *t.firstEnd, t.standing) : *in.hole;
        ghostPart(f, twoLead(c, *t.firstEnd, second), c.doc.board().contains(second));
    } else if (in.hole) {
        const Hole second = defaultSecondHole(t.placeKind, *in.hole, t.standing);
        ghostPart(f, twoLead(c, *in.hole, second), c.doc.board().contains(second));
    }
}

// ---- link --------------------------------------------------------------------------------------

void runLinkTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f) {
    auto& t = c.tool;
    auto place = [&](Hole a, Hole b) {
        if (a == b) return;
        netcheck::Link link;
        link.from = a;
        link.to = b;
        if (c.commands.perform(std::make_unique<netcheck::edit::AddLink>(link)))
            selectOnly(c, ElementRef::Kind::Link, c.doc.board().links.size() - 1);
        t.firstEnd.reset();
    };
    if (in.pressed && in.hovered && in.hole) {
        if (!t.firstEnd) {
            t.firstEnd = *in.hole;
            t.pressHole = *in.hole;
        } else {
            place(*t.firstEnd, *in.hole);
        }
    } else if (in.released && t.firstEnd && t.pressHole && in.hole && *in.hole != *t.pressHole) {
        place(*t.firstEnd, *in.hole);
    }
    if (in.released) t.pressHole.reset();
    if (t.firstEnd && in.hole) ghostLine(f, f.hole(*t.firstEnd), f.hole(*in.hole));
    else if (in.hole) f.draw->AddCircle(f.hole(*in.hole), f.t.len(0.35f), palette::kGhost, 14, 2.0f);
}

// ---- cut ---------------------------------------------------------------------------------------

void runCutTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f) {
    const auto& board = c.doc.board();
    const auto cut = cutAt(in.board, board.rows, board.cols);
    if (!cut) return;
    if (cut->kind == netcheck::Cut::Kind::Hole) {
        f.draw->AddCircle(f.hole(cut->hole), f.t.len(0.44f), palette::kGhost, 18, 3.0f);
    } else {
        const float x = static_cast<float>(cut->hole.col) + 1.0f, y = static_cast<float>(cut->hole.row) + 0.5f;
        f.draw->AddLine(f.at({x, y - 0.5f}), f.at({x, y + 0.5f}), palette::kGhost, 4.0f);
    }
    if (in.pressed && in.hovered) c.commands.perform(netcheck::edit::toggleCut(board, *cut));
}

// ---- wire --------------------------------------------------------------------------------------

void runWireTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f) {
    auto& t = c.tool;
    const auto& board = c.doc.board();
    std::optional<netcheck::Endpoint> here;
    if (in.lug) here = netcheck::Endpoint::atLug(*in.lug);
    else if (in.hole && board.contains(*in.hole)) here = netcheck::Endpoint::atHole(*in.hole);
    if (here) {
        if (auto p = endpointPosition(board, f.spots, *here))
            f.draw->AddCircle(f.at(*p), f.t.len(0.4f), palette::kGhost, 16, 2.5f);
    }
    if (t.wireStart) {
        const auto a = endpointPosition(board, f.spots, *t.wireStart);
        if (a) f.draw->AddLine(f.at(*a), f.at(here ? *endpointPosition(board, f.spots, *here) : in.board),
                               palette::wireColour(t.wireColour.c_str()), std::max(3.0f, f.t.len(0.18f)));
    }
    if (!(in.pressed && in.hovered && here)) return;
    if (!t.wireStart) {
        t.wireStart = here;
        return;
    }
    if (*t.wireStart == *here) return;
    netcheck::Wire wire;
    wire.from = *t.wireStart;
    wire.to = *here;
    wire.color = t.wireColour;
    if (c.commands.perform(std::make_unique<netcheck::edit::AddWire>(wire)))
        selectOnly(c, ElementRef::Kind::Wire, c.doc.board().wires.size() - 1);
    t.wireStart.reset();
}

// ---- switching tools ----------------------------------------------------------------------------

void selectTool(ToolState& state, Tool tool) {
    state.cancel();
    state.tool = tool;
}

void startPlacing(ToolState& state, const std::string& kind) {
    selectTool(state, Tool::Place);
    state.placeKind = kind;
    state.placeValue = defaultValue(kind);
    state.quarterTurns = 0;
    state.pinCount = defaultPinCount(kind);
}

void runActiveTool(const ToolContext& c, const CanvasInput& in, const CanvasFrame& f) {
    switch (c.tool.tool) {
    case Tool::Select: runSelectTool(c, in, f); break;
    case Tool::Place: runPlaceTool(c, in, f); break;
    case Tool::Link: runLinkTool(c, in, f); break;
    case Tool::Cut: runCutTool(c, in, f); break;
    case Tool::Wire: runWireTool(c, in, f); break;
    }
}

namespace {

// The first slot from the top of the column right of the board that no off-board part covers: a
// new part stands beside the board, in sight, not below the parts dragged away from the column.
ImVec2 freeSlotBesideBoard(const netcheck::Board& board, std::size_t lugs) {
    constexpr float kGap = 3.0f, kStep = 4.2f, kLugPitch = 1.5f, kHeight = 3.2f;
    const std::vector<OffboardSpot> spots = layoutOffboard(board);
    const float x = static_cast<float>(board.cols) + kGap;
    const float width = std::max(4.0f, 1.0f + static_cast<float>(std::max<std::size_t>(lugs, 1)) * kLugPitch);
    for (float y = 0.5f;; y += kStep) {
        const bool taken = std::any_of(spots.begin(), spots.end(), [&](const OffboardSpot& s) {
            return s.min.x < x + width && s.max.x + 0.1f > x && s.min.y < y + kHeight && s.max.y + 1.4f > y;
        });
        if (!taken) return {x, y};
    }
}

}  // namespace

std::optional<ImVec2> addOffboardPart(const ToolContext& c, const std::string& kind) {
    const netcheck::PartKind* k = netcheck::findPartKind(kind);
    netcheck::OffboardPart part;
    part.kind = kind;
    part.ref = nextFreeRef(c.doc.board(), refPrefix(kind));
    part.value = defaultValue(kind);
    if (k && !k->pins.empty()) {
        for (std::string_view n : k->pins) part.pins.emplace_back(n);
    } else {
        // Switches: a common on-on toggle has three lugs.
        part.pins = {"1", "2", "3"};
    }
    const ImVec2 corner = freeSlotBesideBoard(c.doc.board(), part.pins.size());
    part = placedAt(std::move(part), corner);
    if (!c.commands.perform(std::make_unique<netcheck::edit::AddOffboard>(part))) return std::nullopt;
    selectOnly(c, ElementRef::Kind::Offboard, c.doc.board().offboard.size() - 1);
    return ImVec2{corner.x + 2.0f, corner.y + 1.0f};
}

}  // namespace stripsmith
