// The Circuit panel's nets: each with its pins; add one, rename one, merge two.
#include <imgui.h>
#include <imgui_stdlib.h>

#include <sstream>

#include "editor/panels/circuit_views.hpp"

namespace stripsmith {
namespace {

// The form's labels sit in one column as wide as the widest, so the boxes line up at any font.
float formLabelWidth() {
    return ImGui::CalcTextSize("Rename net").x + ImGui::GetStyle().ItemSpacing.x * 2;
}

// For scripted tests: the button just drawn lies inside the window.
void logFitsWindow(TestLog& log, const std::string& name) {
    const ImVec2 at = ImGui::GetWindowPos();
    const ImVec2 size = ImGui::GetWindowSize();
    log.fit(name, at, {at.x + size.x, at.y + size.y});
}

// "R1.1 D1.A, VR1.2": pins separated by blanks or commas; the first one not written REF.PIN is
// named in `problem`.
std::vector<netcheck::PinRef> readPins(const std::string& text, std::string& problem) {
    std::vector<netcheck::PinRef> pins;
    std::string spaced = text;
    for (char& ch : spaced)
        if (ch == ',') ch = ' ';
    std::istringstream in(spaced);
    for (std::string word; in >> word;) {
        const auto pin = netcheck::PinRef::parse(word);
        if (!pin) {
            problem = "\"" + word + "\" is not a pin: write REF.PIN, like R1.2 or Q1.B.";
            return {};
        }
        pins.push_back(*pin);
    }
    return pins;
}

void addNetForm(const CircuitPanelContext& c, const netcheck::Circuit& circuit) {
    auto& s = c.state;
    ImGui::TextUnformatted("Add net");
    ImGui::SameLine(formLabelWidth());
    ImGui::SetNextItemWidth(140);
    ImGui::InputTextWithHint("##new-net", "name", &s.newNetName);
    c.log.item("add-net-name");
    ImGui::SameLine();
    ImGui::TextUnformatted("pins");
    ImGui::SameLine();
    ImGui::SetNextItemWidth(220);
    ImGui::InputTextWithHint("##new-net-pins", "R1.2 D1.A ...", &s.newNetPins);
    c.log.item("add-net-pins");
    ImGui::SameLine();
    if (ImGui::Button("Add")) {
        std::string problem;
        const auto pins = readPins(s.newNetPins, problem);
        const auto edit = problem.empty() ? addNet(circuit, s.newNetName, pins)
                                          : netcheck::CircuitEdit(problem);
        applyCircuitEdit(c, edit, "Add net " + s.newNetName);
        if (std::holds_alternative<netcheck::Circuit>(edit)) {
            s.newNetName.clear();
            s.newNetPins.clear();
        }
    }
    c.log.item("add-net");
    logFitsWindow(c.log, "add-net");
}

std::string pinList(const std::vector<netcheck::PinRef>& pins) {
    std::string list;
    for (const auto& pin : pins) list += (list.empty() ? "" : ", ") + pin.name();
    return list;
}

void renameForm(const CircuitPanelContext& c, const netcheck::Circuit& circuit) {
    auto& s = c.state;
    ImGui::TextUnformatted("Rename net");
    ImGui::SameLine(formLabelWidth());
    netNameInput("rename-from", s.renameFrom, circuit, 140);
    ImGui::SameLine();
    ImGui::TextUnformatted("to");
    ImGui::SameLine();
    ImGui::SetNextItemWidth(140);
    ImGui::InputText("##rename-to", &s.renameTo);
    ImGui::SameLine();
    if (ImGui::Button("Rename")) {
        const auto edit = renameNet(circuit, s.renameFrom, s.renameTo);
        applyCircuitEdit(c, edit, "Rename net " + s.renameFrom + " to " + s.renameTo);
        if (std::holds_alternative<netcheck::Circuit>(edit)) s.renameFrom = s.renameTo;
    }
    logFitsWindow(c.log, "rename-net");
}

void mergeForm(const CircuitPanelContext& c, const netcheck::Circuit& circuit) {
    auto& s = c.state;
    ImGui::TextUnformatted("Merge net");
    ImGui::SameLine(formLabelWidth());
    netNameInput("merge-from", s.mergeFrom, circuit, 140);
    ImGui::SameLine();
    ImGui::TextUnformatted("into");
    ImGui::SameLine();
    netNameInput("merge-into", s.mergeInto, circuit, 140);
    ImGui::SameLine();
    if (ImGui::Button("Merge")) {
        const auto edit = mergeNets(circuit, s.mergeFrom, s.mergeInto);
        applyCircuitEdit(c, edit, "Merge net " + s.mergeFrom + " into " + s.mergeInto);
        if (std::holds_alternative<netcheck::Circuit>(edit)) s.mergeFrom.clear();
    }
    logFitsWindow(c.log, "merge-net");
}

}  // namespace

void drawCircuitNets(const CircuitPanelContext& c, const netcheck::Circuit& circuit) {
    auto& s = c.state;
    addNetForm(c, circuit);
    renameForm(c, circuit);
    mergeForm(c, circuit);
    ImGui::Separator();
    ImGui::BeginChild("nets");
    if (ImGui::BeginTable(
            "nets", 3,
            ImGuiTableFlags_RowBg | ImGuiTableFlags_Resizable | ImGuiTableFlags_BordersInnerV)) {
        ImGui::TableSetupColumn("Net", ImGuiTableColumnFlags_WidthFixed, 120);
        ImGui::TableSetupColumn("Pins");
        // Wide enough for both small buttons at any font size (a fixed width cut "Merge" off).
        const ImGuiStyle& style = ImGui::GetStyle();
        const float buttons = ImGui::CalcTextSize("Rename").x + ImGui::CalcTextSize("Merge").x +
                              style.FramePadding.x * 4 + style.ItemSpacing.x;
        ImGui::TableSetupColumn("", ImGuiTableColumnFlags_WidthFixed, buttons);
        ImGui::TableHeadersRow();
        for (const auto& [name, pins] : circuit.nets) {
            ImGui::PushID(name.c_str());
            ImGui::TableNextRow();
            ImGui::TableNextColumn();
            ImGui::TextUnformatted(name.c_str());
            ImGui::TableNextColumn();
            ImGui::TextWrapped("%s", pinList(pins).c_str());
            if (pins.size() < 2) {
                ImGui::SameLine();
                ImGui::TextDisabled("(one pin: joins nothing)");
            }
            ImGui::TableNextColumn();
            const ImVec2 cell = ImGui::GetCursorScreenPos();
            const float cellWidth = ImGui::GetContentRegionAvail().x;
            if (ImGui::SmallButton("Rename")) s.renameFrom = s.renameTo = name;
            ImGui::SameLine();
            if (ImGui::SmallButton("Merge")) s.mergeFrom = name;
            if (name == circuit.nets.begin()->first)
                c.log.fit("net-row-buttons", cell, {cell.x + cellWidth, ImGui::GetItemRectMax().y});
            ImGui::PopID();
        }
        ImGui::EndTable();
    }
    ImGui::EndChild();
}

}  // namespace stripsmith
