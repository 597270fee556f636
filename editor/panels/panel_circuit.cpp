// "Circuit": the intended circuit the board is checked against. Load one from a file, take the
// board's present connectivity as the circuit, or remove it.
#include <imgui.h>

#include "editor/panels/circuit_capture.hpp"
#include "editor/panels/panels.hpp"
#include "netcheck/circuit_loader.hpp"
#include "netcheck/edit/edit.hpp"
#include "netcheck/file_io.hpp"

namespace stripsmith {
namespace {

void loadCircuitFile(EditorApp& app, const std::string& path) {
    const netcheck::ReadLimits limits;
    auto text = netcheck::readFileLimited(path, limits.maxBytes);
    if (!text.ok()) {
        app.dialogs.errorTitle = "Cannot load the circuit";
        app.dialogs.errorText = text.error ? text.error->describe() : "cannot read " + path;
        return;
    }
    auto circuit = netcheck::loadCircuitText(*text.value, path, limits);
    if (!circuit.ok()) {
        app.dialogs.errorTitle = "Cannot load the circuit";
        app.dialogs.errorText = (circuit.error ? circuit.error->describe() : "unreadable circuit") +
                                "\n\nThe board's circuit is unchanged.";
        return;
    }
    app.perform(std::make_unique<netcheck::edit::SetCircuit>(app.doc.board(), *circuit.value, "Load circuit"));
}

void circuitContents(const netcheck::Circuit& circuit) {
    if (ImGui::TreeNodeEx("Parts", ImGuiTreeNodeFlags_DefaultOpen, "Parts (%zu)", circuit.parts.size())) {
        for (const auto& [ref, part] : circuit.parts)
            ImGui::BulletText("%s  %s  %s", ref.c_str(), part.kind.c_str(), part.value.c_str());
        ImGui::TreePop();
    }
    if (ImGui::TreeNodeEx("Nets", ImGuiTreeNodeFlags_DefaultOpen, "Nets (%zu)", circuit.nets.size())) {
        for (const auto& [name, pins] : circuit.nets) {
            std::string list;
            for (const auto& pin : pins) list += (list.empty() ? "" : ", ") + pin.name();
            ImGui::BulletText("%s: %s", name.c_str(), list.c_str());
        }
        ImGui::TreePop();
    }
}

}  // namespace

void drawCircuitPanel(EditorApp& app) {
    if (!app.chosenForPanel.empty() && app.chooser.purpose() == FileChooser::Purpose::OpenCircuit) {
        loadCircuitFile(app, app.chosenForPanel);
        app.chosenForPanel.clear();
    }
    if (!app.view.showCircuit) return;
    const ImVec2 d = ImGui::GetIO().DisplaySize;
    ImGui::SetNextWindowPos({d.x * 0.3f, d.y * 0.15f}, ImGuiCond_FirstUseEver);
    ImGui::SetNextWindowSize({d.x * 0.4f, d.y * 0.6f}, ImGuiCond_FirstUseEver);
    if (ImGui::Begin("Circuit", &app.view.showCircuit)) {
        const auto& board = app.doc.board();
        if (ImGui::Button("Load circuit file...")) app.chooser.open(FileChooser::Purpose::OpenCircuit, {});
        ImGui::SameLine();
        if (ImGui::Button("Take the board as the circuit"))
            app.perform(std::make_unique<netcheck::edit::SetCircuit>(board, captureCircuit(board), "Take the board as the circuit"));
        if (ImGui::IsItemHovered())
            ImGui::SetTooltip("The board's present connections become the intended circuit, so later edits are checked against them.");
        if (board.circuit) {
            ImGui::SameLine();
            if (ImGui::Button("Remove circuit"))
                app.perform(std::make_unique<netcheck::edit::SetCircuit>(board, std::nullopt, "Remove circuit"));
            ImGui::Separator();
            circuitContents(*board.circuit);
        } else {
            ImGui::Separator();
            ImGui::TextWrapped("No intended circuit yet. Load one, or take the board's connections once you have checked them by eye.");
        }
    }
    ImGui::End();
}

}  // namespace stripsmith
