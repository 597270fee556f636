// The status line: hovered hole and the net it carries, board size, zoom, last action.
#include <string>

#include <imgui.h>

#include "editor/panels/panels.hpp"
#include "netcheck/voltage/voltage_report.hpp"

namespace stripsmith {

namespace {

std::string hoverText(const Document& doc, const HoverState& hover) {
    std::string text;
    if (hover.hole) text = netcheck::holeName(*hover.hole);
    else if (hover.lug) text = hover.lug->name();
    else return {};
    if (hover.hole && doc.connectivity().isHoleCut(*hover.hole)) return text + "  (hole cut: no copper)";
    if (hover.island < 0) return text;
    if (auto net = doc.netOfIsland(hover.island)) return text + "  net " + *net;
    const netcheck::Island* island = doc.island(hover.island);
    if (!island) return text;
    if (island->pins.empty()) return text + "  (no pins joined)";
    std::string pins;
    for (std::size_t i = 0; i < island->pins.size() && i < 4; ++i) pins += (i ? ", " : "") + island->pins[i].name();
    if (island->pins.size() > 4) pins += ", ...";
    return text + "  joins " + pins;
}

/// "  expect 4.50 V (4.28 V to 4.72 V)" for the net whose probe point is on `island`.
std::string expectedText(const Document& doc, const netcheck::BenchVoltages& voltages, int island) {
    for (const netcheck::NetReading& net : voltages.nets) {
        int at = -1;
        if (const auto hole = netcheck::parseHole(net.probe)) {
            at = doc.connectivity().islandOfHole(*hole);
        } else if (const auto lug = netcheck::PinRef::parse(net.probe)) {
            at = doc.connectivity().islandOfPin(*lug);
        }
        if (at != island) continue;
        if (net.state != netcheck::NetState::Known) return "  meter: no figure (" + net.why + ")";
        return "  meter: " + netcheck::formatVolts(net.nominal) + " (" +
               netcheck::formatVolts(net.low) + " to " + netcheck::formatVolts(net.high) + ")";
    }
    return {};
}

const char* toolHint(const ToolState& state) {
    switch (state.tool) {
    case Tool::Select: return "Select: click, shift-click, drag a box; drag to move; arrows nudge";
    case Tool::Place: return "Place: click the ends (or drag); R turns; Esc stops";
    case Tool::Link: return "Link: click two holes";
    case Tool::Cut: return "Cut: click a hole or the gap between two holes; again to remove";
    case Tool::Wire: return "Wire: click a lug or hole, then the other end";
    }
    return "";
}

}  // namespace

void drawStatusBar(const Document& doc, const HoverState& hover, const ToolState& tool, const std::string& status,
                   ImVec2 pos, ImVec2 size, const netcheck::BenchVoltages* voltages) {
    if (beginPanel("##status", pos, size)) {
        const auto& board = doc.board();
        std::string pointer = hoverText(doc, hover);
        if (voltages && !pointer.empty() && hover.island >= 0) {
            pointer += expectedText(doc, *voltages, hover.island);
        }
        ImGui::Text("%s", pointer.empty() ? toolHint(tool) : pointer.c_str());
        ImGui::SameLine(size.x * 0.45f);
        ImGui::Text("%d x %d holes (%.1f x %.1f mm)", board.cols, board.rows, board.widthMm(), board.heightMm());
        ImGui::SameLine(size.x * 0.68f);
        ImGui::TextDisabled("%s", status.c_str());
    }
    ImGui::End();
}

void drawHelpWindow(bool& open) {
    if (!open) return;
    ImGui::SetNextWindowSize({520, 0}, ImGuiCond_FirstUseEver);
    if (ImGui::Begin("Keys", &open)) {
        static constexpr const char* kKeys[][2] = {
            {"V / L / X / W", "select / link / cut / wire tool"},
            {"R", "turn the part being placed or the selected parts"},
            {"Arrows", "nudge the selection one hole"},
            {"Del, Backspace", "delete the selection"},
            {"Ctrl+C / Ctrl+V / Ctrl+D", "copy / paste at the mouse / duplicate"},
            {"Ctrl+Z / Ctrl+Y", "undo / redo (Ctrl+Shift+Z redoes too)"},
            {"Ctrl+N / Ctrl+O / Ctrl+S", "new / open / save (Ctrl+Shift+S: save as)"},
            {"Tab", "component side -> copper side -> see-through"},
            {"F", "fit the board in view"},
            {"Wheel", "zoom around the mouse"},
            {"Middle or right drag, Space+drag", "pan"},
            {"Esc", "stop the current tool"},
        };
        for (const auto& row : kKeys) {
            ImGui::TextUnformatted(row[0]);
            ImGui::SameLine(230);
            ImGui::TextDisabled("%s", row[1]);
        }
    }
    ImGui::End();
}

}  // namespace stripsmith
