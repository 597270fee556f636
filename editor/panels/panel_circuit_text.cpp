// The Circuit panel's text view: the whole circuit as lines typed from a paper schematic, read
// again on every change with its errors located by line and column, and applied as one
// SetCircuit command (one undo step). The syntax is in docs/editor.md.
#include <imgui.h>
#include <imgui_stdlib.h>

#include <algorithm>

#include "editor/panels/circuit_views.hpp"
#include "netcheck/edit/edit.hpp"
#include "netcheck/model/part_kinds.hpp"

namespace stripsmith {
namespace {

const ImVec4 kErrorColour{1.0f, 0.5f, 0.45f, 1.0f};

// The text follows the board's circuit (undo, a load, an edit in another tab) until the maker
// types; from then on it is theirs until they apply or revert it.
void printCircuit(CircuitPanelState& s, const std::optional<netcheck::Circuit>& circuit) {
    s.text = circuit ? netcheck::circuitText(*circuit) : std::string();
    s.textFrom = circuit;
    s.textEdited = false;
}

void followCircuit(CircuitPanelState& s, const std::optional<netcheck::Circuit>& circuit) {
    if (!s.textEdited && s.textFrom != circuit) printCircuit(s, circuit);
}

void readText(CircuitPanelState& s, TestLog& log) {
    if (s.parsedText == s.text && (s.parsed.ok() || !s.parsed.errors.empty())) return;
    s.parsedText = s.text;
    s.parsed = netcheck::parseCircuitText(s.text);
    if (s.parsed.ok())
        log.circuitText("ok parts " + std::to_string(s.parsed.circuit->parts.size()) + " nets " +
                        std::to_string(s.parsed.circuit->nets.size()));
    else
        log.circuitText("error " + std::to_string(s.parsed.errors[0].line) + ":" +
                        std::to_string(s.parsed.errors[0].column) + " " +
                        s.parsed.errors[0].message);
}

void syntaxHelp() {
    ImGui::TextWrapped(
        "One line per part: REF KIND VALUE : its nets in the kind's pin order (- for a pin not "
        "connected). One line per net: NET: REF.PIN REF.PIN ...  # starts a comment.");
    if (!ImGui::TreeNode("Pin order of each kind")) return;
    if (ImGui::BeginTable("pin-orders", 4, ImGuiTableFlags_SizingStretchSame)) {
        for (const netcheck::PartKind& kind : netcheck::partKinds()) {
            ImGui::TableNextColumn();
            std::string pins;
            for (auto pin : kind.pins) pins += " " + std::string(pin);
            ImGui::Text("%.*s:%s", static_cast<int>(kind.name.size()), kind.name.data(),
                        pins.empty() ? " 1 2 ... N" : pins.c_str());
        }
        ImGui::EndTable();
    }
    ImGui::TreePop();
}

void errorList(const CircuitPanelState& s, float height) {
    ImGui::BeginChild("text-errors", {0, height}, true);
    if (s.parsed.ok()) {
        const auto& circuit = *s.parsed.circuit;
        ImGui::TextDisabled("Reads as %zu part%s and %zu net%s.", circuit.parts.size(),
                            circuit.parts.size() == 1 ? "" : "s", circuit.nets.size(),
                            circuit.nets.size() == 1 ? "" : "s");
    }
    ImGui::PushStyleColor(ImGuiCol_Text, kErrorColour);
    for (const auto& error : s.parsed.errors) ImGui::TextWrapped("%s", error.describe().c_str());
    ImGui::PopStyleColor();
    ImGui::EndChild();
}

void applyButtons(const CircuitPanelContext& c) {
    auto& s = c.state;
    const auto& current = c.doc.board().circuit;
    std::optional<netcheck::Circuit> wanted;
    if (s.parsed.ok())
        wanted = netcheck::keepWhatTextCannotSay(*s.parsed.circuit,
                                                 current.value_or(netcheck::Circuit{}));
    const bool changes = wanted && wanted != current;
    ImGui::BeginDisabled(!changes);
    const bool apply = ImGui::Button("Apply");
    ImGui::EndDisabled();
    c.log.item("circuit-text-apply");
    if (ImGui::IsItemHovered(ImGuiHoveredFlags_AllowWhenDisabled))
        ImGui::SetTooltip(!s.parsed.ok() ? "Fix the errors below first."
                          : changes      ? "Replace the circuit with the text (one undo step)."
                                         : "The text says what the circuit already holds.");
    if (apply && changes) {
        s.selectTextTab = !current;  // the tabs appear with the circuit: stay on the text
        c.commands.perform(std::make_unique<netcheck::edit::SetCircuit>(c.doc.board(), *wanted,
                                                                        "Type in the circuit"));
        s.textEdited = false;
        s.textFrom = wanted;
    }
    if (!s.textEdited) return;
    ImGui::SameLine();
    if (ImGui::Button("Revert")) printCircuit(s, current);
    c.log.item("circuit-text-revert");
    if (ImGui::IsItemHovered()) ImGui::SetTooltip("Throw away what was typed; show the circuit.");
    if (s.textFrom != current) {
        ImGui::SameLine();
        ImGui::TextColored({1.0f, 0.8f, 0.35f, 1.0f},
                           "The circuit changed since you started typing.");
    }
}

}  // namespace

void drawCircuitText(const CircuitPanelContext& c) {
    auto& s = c.state;
    followCircuit(s, c.doc.board().circuit);
    syntaxHelp();
    const float line = ImGui::GetTextLineHeightWithSpacing();
    const float errorsHeight = line * 4.5f;
    const float below = errorsHeight + ImGui::GetFrameHeightWithSpacing() + line;
    const float boxHeight = std::max(line * 6, ImGui::GetContentRegionAvail().y - below);
    if (ImGui::InputTextMultiline("##circuit-text", &s.text, {-1, boxHeight})) s.textEdited = true;
    c.log.item("circuit-text");
    readText(s, c.log);
    applyButtons(c);
    errorList(s, errorsHeight);
}

}  // namespace stripsmith
