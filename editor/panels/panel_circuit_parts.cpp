// The Circuit panel's parts: ref, kind, value, pins, and the net of every pin.
#include <imgui.h>
#include <imgui_stdlib.h>

#include <sstream>

#include "editor/panels/circuit_views.hpp"
#include "netcheck/model/part_kinds.hpp"
#include "netcheck/model/wording.hpp"

namespace stripsmith {
namespace {

std::vector<std::string> splitPins(const std::string& text) {
    std::vector<std::string> pins;
    std::istringstream in(text);
    for (std::string pin; in >> pin;) {
        while (!pin.empty() && pin.back() == ',') pin.pop_back();
        if (!pin.empty()) pins.push_back(pin);
    }
    return pins;
}

std::string usualPins(const netcheck::PartKind& kind) {
    std::string names;
    for (auto pin : kind.pins) names += (names.empty() ? "" : " ") + std::string(pin);
    return names.empty() ? "1 2" : names;
}

/// Kind box with a list of the known kinds; typing a known kind or picking one from the list
/// fills in its usual pin names.
void kindPicker(const char* id, std::string& kind, std::string& pins, TestLog& log) {
    ImGui::PushID(id);
    ImGui::SetNextItemWidth(110);
    if (ImGui::InputText("##kind", &kind)) {
        const netcheck::PartKind* known = netcheck::findPartKind(kind);
        if (known != nullptr) pins = usualPins(*known);
    }
    log.item(std::string(id) + "-part-kind");
    ImGui::SameLine(0, 0);
    if (ImGui::BeginCombo("##kinds", nullptr, ImGuiComboFlags_NoPreview)) {
        for (const netcheck::PartKind& known : netcheck::partKinds()) {
            const std::string label =
                std::string(known.label) + " (" + std::string(known.name) + ")";
            if (!ImGui::Selectable(label.c_str(), kind == known.name)) continue;
            kind = known.name;
            pins = usualPins(known);
        }
        ImGui::EndCombo();
    }
    ImGui::PopID();
}

void addPartForm(const CircuitPanelContext& c, const netcheck::Circuit& circuit) {
    auto& s = c.state;
    ImGui::TextUnformatted("Add a part:");
    ImGui::SetNextItemWidth(70);
    ImGui::InputTextWithHint("##ref", "ref", &s.newRef);
    c.log.item("add-part-ref");
    ImGui::SameLine();
    kindPicker("add", s.newKind, s.newPins, c.log);
    ImGui::SameLine();
    ImGui::SetNextItemWidth(80);
    ImGui::InputTextWithHint("##value", "value", &s.newValue);
    ImGui::SameLine();
    ImGui::SetNextItemWidth(110);
    ImGui::InputTextWithHint("##pins", "pins: 1 2", &s.newPins);
    c.log.item("add-part-pins");
    if (ImGui::IsItemHovered())
        ImGui::SetTooltip("Pin names separated by spaces, e.g. 1 2, or A K, or C B E");
    ImGui::SameLine();
    if (ImGui::Button("Add")) {
        const netcheck::CircuitPart part{s.newKind, s.newValue, splitPins(s.newPins),
                                         nlohmann::json::object()};
        const auto edit = addCircuitPart(circuit, s.newRef, part);
        applyCircuitEdit(c, edit, "Add " + s.newRef + " to the circuit");
        if (std::holds_alternative<netcheck::Circuit>(edit)) s.newRef.clear();
    }
    c.log.item("add-part");
}

void editPartForm(const CircuitPanelContext& c, const netcheck::Circuit& circuit, const std::string& ref) {
    auto& s = c.state;
    ImGui::Indent();
    ImGui::SetNextItemWidth(70);
    ImGui::InputText("##eref", &s.editRef);
    ImGui::SameLine();
    kindPicker("edit", s.editKind, s.editPins, c.log);
    ImGui::SameLine();
    ImGui::SetNextItemWidth(80);
    ImGui::InputText("##evalue", &s.editValue);
    ImGui::SameLine();
    ImGui::SetNextItemWidth(110);
    ImGui::InputText("##epins", &s.editPins);
    ImGui::SameLine();
    if (ImGui::Button("Apply")) {
        const auto& old = circuit.parts.at(ref);
        const netcheck::CircuitPart part{s.editKind, s.editValue, splitPins(s.editPins), old.extra};
        const auto edit = editCircuitPart(circuit, ref, s.editRef, part);
        if (std::holds_alternative<netcheck::Circuit>(edit)) s.editingRef.clear();
        applyCircuitEdit(c, edit, "Edit " + ref + " in the circuit");
    }
    ImGui::SameLine();
    if (ImGui::Button("Cancel")) s.editingRef.clear();
    ImGui::Unindent();
}

void pinRows(const CircuitPanelContext& c, const netcheck::Circuit& circuit, const std::string& ref) {
    auto& s = c.state;
    for (const std::string& pinName : pinsOfPart(circuit, ref)) {
        const netcheck::PinRef pin{ref, pinName};
        const std::string key = pin.name();
        const std::string current = circuit.netOf(pin).value_or("");
        auto held = s.pinNetText.find(key);
        std::string text = held != s.pinNetText.end() ? held->second : current;
        ImGui::PushID(key.c_str());
        ImGui::Text("%-6s", pinName.c_str());
        ImGui::SameLine(90);
        const bool confirmed = netNameInput("net", text, circuit, 160);
        const bool active = ImGui::IsItemActive() || ImGui::IsPopupOpen("##pick_popup");
        if (confirmed) {
            s.pinNetText.erase(key);
            applyCircuitEdit(
                c, assignPinToNet(circuit, pin, text),
                text.empty() ? "Take " + key + " out of its net" : "Join " + key + " to " + text);
        } else if (text != current || active) {
            s.pinNetText[key] = text;
        } else {
            s.pinNetText.erase(key);
        }
        if (current.empty()) {
            ImGui::SameLine();
            ImGui::TextDisabled("not connected");
        }
        ImGui::PopID();
    }
}

}  // namespace

void drawCircuitParts(const CircuitPanelContext& c, const netcheck::Circuit& circuit) {
    auto& s = c.state;
    addPartForm(c, circuit);
    ImGui::Separator();
    ImGui::BeginChild("parts");
    for (const auto& [ref, part] : circuit.parts) {
        ImGui::PushID(ref.c_str());
        const std::string header = ref + "  " + part.kind + "  " + part.value;
        const bool open = ImGui::TreeNode("part", "%s", header.c_str());
        ImGui::SameLine(ImGui::GetWindowWidth() - 130);
        if (ImGui::SmallButton("Edit")) {
            s.editingRef = ref;
            s.editRef = ref;
            s.editKind = part.kind;
            s.editValue = part.value;
            s.editPins = netcheck::joined(part.pins, " ");
        }
        ImGui::SameLine();
        if (ImGui::SmallButton("Remove"))
            applyCircuitEdit(c, removeCircuitPart(circuit, ref),
                             "Remove " + ref + " from the circuit");
        if (s.editingRef == ref) editPartForm(c, circuit, ref);
        if (open) {
            pinRows(c, circuit, ref);
            ImGui::TreePop();
        }
        ImGui::PopID();
    }
    ImGui::EndChild();
}

}  // namespace stripsmith
