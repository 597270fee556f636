// "Parts": tools, the part palette, off-board parts and options for the next placement.
#include <algorithm>
#include <array>
#include <cctype>
#include <string>

#include <imgui.h>
#include <imgui_stdlib.h>

#include "editor/panels/panels.hpp"
#include "editor/tools/part_factory.hpp"
#include "editor/tools/tools.hpp"
#include "netcheck/model/part_kinds.hpp"

namespace stripsmith {
namespace {

float halfWidth() {
    return (ImGui::GetWindowContentRegionMax().x - ImGui::GetWindowContentRegionMin().x -
            ImGui::GetStyle().ItemSpacing.x) * 0.5f;
}

void toolButton(ToolState& state, const char* label, Tool tool, const char* tip) {
    const bool on = state.tool == tool;
    if (on) ImGui::PushStyleColor(ImGuiCol_Button, ImGui::GetStyleColorVec4(ImGuiCol_ButtonActive));
    if (ImGui::Button(label, {halfWidth(), 0})) selectTool(state, tool);
    if (on) ImGui::PopStyleColor();
    if (ImGui::IsItemHovered()) ImGui::SetTooltip("%s", tip);
}

void placingOptions(ToolState& t) {
    ImGui::Separator();
    const netcheck::PartKind* kind = netcheck::findPartKind(t.placeKind);
    ImGui::Text("Placing: %s", kind ? std::string(kind->label).c_str() : t.placeKind.c_str());
    ImGui::SetNextItemWidth(-1);
    ImGui::InputTextWithHint("##value", "value", &t.placeValue);
    if (isTwoLead(t.placeKind)) {
        ImGui::Checkbox("Stand on end", &t.standing);
        ImGui::TextWrapped("Click both ends, or drag from one to the other. Click one hole twice for the usual span.");
    } else {
        if (t.placeKind == "ic" || t.placeKind == "header" || t.placeKind == "wire-terminal") {
            ImGui::SetNextItemWidth(100);
            ImGui::InputInt("pins", &t.pinCount, t.placeKind == "ic" ? 2 : 1);
            t.pinCount = std::clamp(t.pinCount, t.placeKind == "ic" ? 4 : 1, 64);
            if (t.placeKind == "ic" && t.pinCount % 2) ++t.pinCount;
        }
        ImGui::Text("Turned %d°", t.quarterTurns * 90);
        ImGui::SameLine();
        if (ImGui::SmallButton("Turn (R)")) t.quarterTurns = (t.quarterTurns + 1) % 4;
        ImGui::TextWrapped("Click to place; pin 1 is ringed.");
    }
}

// The hint under the Link and Cut tools, as the part and wire tools have theirs.
void toolHint(const char* text, TestLog& log) {
    ImGui::Separator();
    ImGui::TextWrapped("%s", text);
    if (log.changed("tool-hint", text)) log.note(std::string("tool-hint ") + text);
}

// A kind matches the search when its file name or its label holds the text, in any case.
bool matchesSearch(const netcheck::PartKind& kind, const std::string& search) {
    if (search.empty()) return true;
    auto lower = [](std::string_view text) {
        std::string out(text);
        std::transform(out.begin(), out.end(), out.begin(),
                       [](unsigned char c) { return static_cast<char>(std::tolower(c)); });
        return out;
    };
    const std::string wanted = lower(search);
    return lower(kind.name).find(wanted) != std::string::npos ||
           lower(kind.label).find(wanted) != std::string::npos;
}

void wireOptions(ToolState& t) {
    static constexpr std::array<const char*, 10> kColours{"red", "black", "yellow", "green", "blue",
                                                         "white", "orange", "brown", "grey", "violet"};
    ImGui::Separator();
    ImGui::TextUnformatted("Wire colour");
    ImGui::SetNextItemWidth(-1);
    if (ImGui::BeginCombo("##wirecolour", t.wireColour.c_str())) {
        for (const char* c : kColours)
            if (ImGui::Selectable(c, t.wireColour == c)) t.wireColour = c;
        ImGui::EndCombo();
    }
    ImGui::TextWrapped("Click a lug or a hole, then the other end.");
}

}  // namespace

std::optional<ImVec2> drawPartsPanel(const ToolContext& tools, TestLog& log, ImVec2 pos, ImVec2 size) {
    ToolState& t = tools.tool;
    std::optional<ImVec2> added;
    if (beginPanel("Parts", pos, size)) {
        std::string& search = t.partSearch;
        ImGui::TextUnformatted("Tools");
        toolButton(t, "Select (V)", Tool::Select, "Click, shift-click or drag a box; drag to move");
        ImGui::SameLine();
        toolButton(t, "Link (L)", Tool::Link, "A wire link between two holes");
        toolButton(t, "Cut (X)", Tool::Cut, "Click a hole for a hole cut, between two holes for a track cut");
        ImGui::SameLine();
        toolButton(t, "Wire (W)", Tool::Wire, "A flying lead from a lug to a hole or lug");
        if (t.tool == Tool::Link) toolHint("Click two holes; the link joins their strips.", log);
        if (t.tool == Tool::Cut)
            toolHint("Click a hole for a hole cut, or the gap between two holes for a track cut. "
                     "Click a cut again to remove it.", log);
        ImGui::Separator();
        ImGui::SetNextItemWidth(-1);
        ImGui::InputTextWithHint("##search", "search parts", &search);
        log.item("parts-search");
        int shown = 0;
        ImGui::TextUnformatted("On the board");
        int column = 0;
        for (const netcheck::PartKind& kind : netcheck::partKinds()) {
            if (kind.offboard || !matchesSearch(kind, search)) continue;
            ++shown;
            const std::string name(kind.name);
            const bool on = t.tool == Tool::Place && t.placeKind == name;
            if (column++ % 2) ImGui::SameLine();
            if (on) ImGui::PushStyleColor(ImGuiCol_Button, ImGui::GetStyleColorVec4(ImGuiCol_ButtonActive));
            if (ImGui::Button(name.c_str(), {halfWidth(), 0}))
                startPlacing(t, name);
            log.item("place-" + name);
            if (on) ImGui::PopStyleColor();
            if (ImGui::IsItemHovered()) ImGui::SetTooltip("%s", std::string(kind.label).c_str());
        }
        if (t.tool == Tool::Place) placingOptions(t);
        if (t.tool == Tool::Wire) wireOptions(t);
        ImGui::Separator();
        ImGui::TextUnformatted("Off the board (wired)");
        column = 0;
        for (const netcheck::PartKind& kind : netcheck::partKinds()) {
            if (!kind.offboard || !matchesSearch(kind, search)) continue;
            ++shown;
            const std::string name(kind.name);
            if (column++ % 2) ImGui::SameLine();
            if (ImGui::Button(("+ " + name).c_str(), {halfWidth(), 0}))
                added = addOffboardPart(tools, name);
            log.item("add-" + name);
            if (ImGui::IsItemHovered()) ImGui::SetTooltip("Add a %s beside the board", std::string(kind.label).c_str());
        }
        if (shown == 0) ImGui::TextDisabled("No part kind matches \"%s\".", search.c_str());
        if (log.changed("parts-shown", search + std::to_string(shown)))
            log.note("parts-shown " + std::to_string(shown) + " for \"" + search + "\"");
    }
    ImGui::End();
    return added;
}

}  // namespace stripsmith
