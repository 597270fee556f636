// The Circuit panel's comparison: each net of the circuit beside the pins the board joins, as the
// check sees them.
#include <imgui.h>

#include "editor/panels/circuit_views.hpp"
#include "netcheck/check/board_vs_circuit.hpp"

namespace stripsmith {
namespace {

using netcheck::CircuitDifference;
using netcheck::NetDifference;
using netcheck::PartDifference;

const ImVec4 kBad{1.0f, 0.5f, 0.45f, 1.0f};
const ImVec4 kGood{0.45f, 0.9f, 0.55f, 1.0f};

std::string pinList(const std::vector<netcheck::PinRef>& pins) {
    std::string list;
    for (const auto& pin : pins) list += (list.empty() ? "" : ", ") + pin.name();
    return list;
}

std::string refList(const std::vector<std::string>& refs) {
    std::string list;
    for (const auto& ref : refs) list += (list.empty() ? "" : ", ") + ref;
    return list;
}

void netRows(const CircuitDifference& diff, bool onlyDifferent) {
    if (!ImGui::BeginTable(
            "netdiff", 3,
            ImGuiTableFlags_RowBg | ImGuiTableFlags_BordersInnerV | ImGuiTableFlags_Resizable))
        return;
    ImGui::TableSetupColumn("Net", ImGuiTableColumnFlags_WidthFixed, 110);
    ImGui::TableSetupColumn("The circuit says");
    ImGui::TableSetupColumn("The board joins");
    ImGui::TableHeadersRow();
    for (const NetDifference& net : diff.nets) {
        if (onlyDifferent && net.same()) continue;
        ImGui::TableNextRow();
        ImGui::TableNextColumn();
        ImGui::TextColored(net.same() ? kGood : kBad, "%s", net.net.c_str());
        ImGui::TableNextColumn();
        ImGui::TextWrapped("%s", pinList(net.inCircuit).c_str());
        if (!net.missingOnBoard.empty())
            ImGui::TextColored(kBad, "not joined on the board: %s",
                               pinList(net.missingOnBoard).c_str());
        ImGui::TableNextColumn();
        ImGui::TextWrapped("%s", pinList(net.onBoard).c_str());
        if (!net.extraOnBoard.empty())
            ImGui::TextColored(kBad, "not in this net: %s", pinList(net.extraOnBoard).c_str());
    }
    ImGui::EndTable();
}

}  // namespace

void drawCircuitDifference(const netcheck::Board& board, CircuitPanelState& state) {
    // Computed per frame: a board of a few hundred pins takes well under a millisecond.
    const CircuitDifference diff = netcheck::compareBoardWithCircuit(board);
    if (diff.same()) ImGui::TextColored(kGood, "The board joins exactly what the circuit says.");
    if (!diff.partsOnlyOnBoard.empty())
        ImGui::TextColored(kBad, "On the board only: %s", refList(diff.partsOnlyOnBoard).c_str());
    if (!diff.partsOnlyInCircuit.empty())
        ImGui::TextColored(kBad, "In the circuit only: %s",
                           refList(diff.partsOnlyInCircuit).c_str());
    for (const PartDifference& part : diff.parts)
        ImGui::TextColored(kBad, "%s: board %s %s, circuit %s %s", part.ref.c_str(),
                           part.boardKind.c_str(), part.boardValue.c_str(),
                           part.circuitKind.c_str(), part.circuitValue.c_str());
    bool& onlyDifferent = state.onlyDifferentNets;
    ImGui::Checkbox("Only nets that differ", &onlyDifferent);
    ImGui::BeginChild("diff");
    netRows(diff, onlyDifferent);
    ImGui::EndChild();
}

}  // namespace stripsmith
