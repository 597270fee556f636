// The Circuit panel's nets: each with its pins; rename one, merge two.
#include <imgui.h>
#include <imgui_stdlib.h>

#include "editor/panels/circuit_views.hpp"

namespace stripsmith {
namespace {

std::string pinList(const std::vector<netcheck::PinRef>& pins) {
    std::string list;
    for (const auto& pin : pins) list += (list.empty() ? "" : ", ") + pin.name();
    return list;
}

void renameForm(const CircuitPanelContext& c, const netcheck::Circuit& circuit) {
    auto& s = c.state;
    ImGui::TextUnformatted("Rename net");
    ImGui::SameLine(110);
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
}

void mergeForm(const CircuitPanelContext& c, const netcheck::Circuit& circuit) {
    auto& s = c.state;
    ImGui::TextUnformatted("Merge net");
    ImGui::SameLine(110);
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
}

}  // namespace

void drawCircuitNets(const CircuitPanelContext& c, const netcheck::Circuit& circuit) {
    auto& s = c.state;
    renameForm(c, circuit);
    mergeForm(c, circuit);
    ImGui::Separator();
    ImGui::BeginChild("nets");
    if (ImGui::BeginTable(
            "nets", 3,
            ImGuiTableFlags_RowBg | ImGuiTableFlags_Resizable | ImGuiTableFlags_BordersInnerV)) {
        ImGui::TableSetupColumn("Net", ImGuiTableColumnFlags_WidthFixed, 120);
        ImGui::TableSetupColumn("Pins");
        ImGui::TableSetupColumn("", ImGuiTableColumnFlags_WidthFixed, 110);
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
            if (ImGui::SmallButton("Rename")) s.renameFrom = s.renameTo = name;
            ImGui::SameLine();
            if (ImGui::SmallButton("Merge")) s.mergeFrom = name;
            ImGui::PopID();
        }
        ImGui::EndTable();
    }
    ImGui::EndChild();
}

}  // namespace stripsmith
