// A net name box with completion from the circuit's existing net names.
#include <imgui.h>
#include <imgui_stdlib.h>

#include "editor/panels/circuit_views.hpp"

namespace stripsmith {

bool netNameInput(const char* id, std::string& text, const netcheck::Circuit& circuit,
                  float width) {
    ImGui::PushID(id);
    bool confirmed = false;
    ImGui::SetNextItemWidth(width);
    if (ImGui::InputText("##name", &text, ImGuiInputTextFlags_EnterReturnsTrue)) confirmed = true;
    if (ImGui::IsItemDeactivatedAfterEdit()) confirmed = true;
    ImGui::SameLine(0, 0);
    // The list filters by what is typed, so it doubles as the completion of a half-typed name.
    if (ImGui::BeginCombo("##pick", nullptr, ImGuiComboFlags_NoPreview)) {
        const auto names = netNameSuggestions(circuit, text, 40);
        if (names.empty()) ImGui::TextDisabled("no net name matches");
        for (const std::string& name : names)
            if (ImGui::Selectable(name.c_str(), name == text)) {
                text = name;
                confirmed = true;
            }
        ImGui::EndCombo();
    }
    if (ImGui::IsItemHovered()) ImGui::SetTooltip("Existing net names matching what is typed");
    ImGui::PopID();
    return confirmed;
}

}  // namespace stripsmith
