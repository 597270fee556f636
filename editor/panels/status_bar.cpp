// The status line: hovered hole and the net it carries, board size, zoom, last action.
#include <algorithm>
#include <string>

#include <imgui.h>

#include "editor/panels/panels.hpp"
#include "netcheck/model/board_size.hpp"
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
                   ImVec2 pos, ImVec2 size, const netcheck::BenchVoltages* voltages, TestLog& log) {
    // No title bar: a panel's title bar filled the whole strip and hid the line under it.
    ImGui::SetNextWindowPos(pos, ImGuiCond_Always);
    ImGui::SetNextWindowSize(size, ImGuiCond_Always);
    ImGui::PushStyleVar(ImGuiStyleVar_WindowPadding, {10.0f, 4.0f});
    const bool shown = ImGui::Begin("##status", nullptr,
                                    ImGuiWindowFlags_NoDecoration | ImGuiWindowFlags_NoMove |
                                        ImGuiWindowFlags_NoBringToFrontOnFocus |
                                        ImGuiWindowFlags_NoSavedSettings);
    ImGui::PopStyleVar();
    if (shown) {
        const auto& board = doc.board();
        // The hole (or lug) under the mouse, its net, and with Bench voltages on what a meter
        // should read there; the tool's hint when the mouse is over no hole.
        std::string pointer = hoverText(doc, hover);
        if (voltages && !pointer.empty() && hover.island >= 0) {
            pointer += expectedText(doc, *voltages, hover.island);
        }
        const std::string line = pointer.empty() ? toolHint(tool) : pointer;
        if (log.changed("pointer-line", line)) log.pointerLine(line);
        ImGui::TextUnformatted(line.c_str());
        ImGui::SameLine(size.x * 0.45f);
        ImGui::TextUnformatted(netcheck::boardSize(board).c_str());
        ImGui::SameLine(size.x * 0.68f);
        ImGui::TextDisabled("%s", status.c_str());
    }
    ImGui::End();
}

void drawHelpWindow(bool& open, TestLog& log) {
    if (!open) return;
    // Sized to what it holds, in two columns as wide as their widest entry: no line is cut off
    // whatever the font size.
    if (ImGui::Begin("Keys", &open, ImGuiWindowFlags_AlwaysAutoResize | ImGuiWindowFlags_NoSavedSettings)) {
        static constexpr const char* kKeys[][2] = {
            {"V / L / X / W", "select / link / cut / wire tool"},
            {"R", "turn the part being placed or the selected parts"},
            {"Arrows", "nudge the selection one hole"},
            {"Del, Backspace", "delete the selection"},
            {"Ctrl+C / Ctrl+V / Ctrl+D", "copy / paste at the mouse / duplicate"},
            {"Ctrl+Z / Ctrl+Y", "undo / redo (Ctrl+Shift+Z redoes too)"},
            {"Ctrl+N / Ctrl+O / Ctrl+S", "new / open / save (Ctrl+Shift+S: save as)"},
            {"Tab", "component side \u2192 copper side \u2192 see-through"},
            {"F", "fit the board in view"},
            {"F1", "this window"},
            {"Wheel", "zoom around the mouse"},
            {"Middle or right drag, Space+drag", "pan"},
            {"Esc", "stop the current tool"},
        };
        float widest = 0.0f;
        if (ImGui::BeginTable("keys", 2, ImGuiTableFlags_SizingFixedFit)) {
            for (const auto& row : kKeys) {
                ImGui::TableNextRow();
                ImGui::TableSetColumnIndex(0);
                ImGui::TextUnformatted(row[0]);
                ImGui::TableSetColumnIndex(1);
                ImGui::TextDisabled("%s", row[1]);
                widest = std::max(widest, ImGui::GetItemRectMax().x);
            }
            ImGui::EndTable();
        }
        // For the end-to-end test: whether the rightmost text ends inside the window.
        const float inside = ImGui::GetWindowPos().x + ImGui::GetWindowWidth();
        const std::string fit = widest <= inside ? "fits" : "cut";
        if (log.changed("keys-window", fit)) log.note("keys-window " + fit);
    }
    ImGui::End();
}

}  // namespace stripsmith
