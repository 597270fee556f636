// "Circuit": the intended circuit the board is checked against. Load one from a JSON circuit file
// or a SPICE deck, take the board's present connectivity as the circuit, type it in as text or part
// by part, compare it with the board, export it, or remove it. Every change is one SetCircuit command.
#include <imgui.h>
#include <imgui_stdlib.h>

#include "netcheck/check/circuit_capture.hpp"
#include "editor/panels/circuit_files.hpp"
#include "editor/panels/circuit_views.hpp"
#include "netcheck/edit/edit.hpp"
#include "netcheck/file/file_io.hpp"

namespace stripsmith {
namespace {

std::string baseName(const std::string& path) {
    const auto slash = path.find_last_of('/');
    return slash == std::string::npos ? path : path.substr(slash + 1);
}

std::string folderOf(const std::string& path) {
    const auto slash = path.find_last_of('/');
    return slash == std::string::npos ? std::string() : path.substr(0, slash);
}

void refuseLoad(const CircuitPanelContext& c, const std::string& message) {
    c.dialogs.errorTitle = "Cannot load the circuit";
    c.dialogs.errorText = message + "\n\nThe board's circuit is unchanged.";
    c.commands.say("Cannot load the circuit: " + message);
}

// For scripted tests: what the check says right after a load.
void logFindings(const CircuitPanelContext& c) {
    if (!c.log.on()) return;
    for (const auto& finding : c.doc.report().errors) c.log.finding(finding);
}

void loadCircuitFile(const CircuitPanelContext& c, const std::string& path) {
    const netcheck::ReadLimits limits;
    auto text = netcheck::readFileLimited(path, limits.maxBytes);
    if (!text.ok()) {
        refuseLoad(c, text.error ? text.error->describe() : "cannot read " + path);
        return;
    }
    auto circuit = readCircuitForEditor(*text.value, path, c.state.spice);
    if (!circuit.ok()) {
        refuseLoad(c, circuit.error ? circuit.error->describe() : "unreadable circuit " + path);
        return;
    }
    c.state.loadNotes = circuit.notes;
    c.state.loadedFrom = path;
    for (const std::string& note : circuit.notes) c.log.note(note);
    c.commands.perform(std::make_unique<netcheck::edit::SetCircuit>(c.doc.board(), *circuit.value,
                                                                    "Load circuit " + baseName(path)));
    logFindings(c);
}

void exportCircuitFile(const CircuitPanelContext& c, const std::string& path) {
    const auto& board = c.doc.board();
    if (!board.circuit) return;
    const std::string title = board.title.empty() ? "Stripsmith circuit" : board.title;
    if (auto problem =
            netcheck::saveFileAtomically(path, circuitFileText(*board.circuit, path, title))) {
        c.dialogs.errorTitle = "Cannot export the circuit";
        c.dialogs.errorText = *problem;
        return;
    }
    c.commands.say("Exported the circuit to " + path);
}

void takeChosenFile(const CircuitPanelContext& c) {
    if (c.chosenFile.empty()) return;
    if (c.chooser.purpose() == FileChooser::Purpose::OpenCircuit) {
        loadCircuitFile(c, c.chosenFile);
        c.chosenFile.clear();
    } else if (c.chooser.purpose() == FileChooser::Purpose::ExportCircuit) {
        exportCircuitFile(c, c.chosenFile);
        c.chosenFile.clear();
    }
}

void spiceOptions(const CircuitPanelContext& c) {
    auto& options = c.state.spice;
    if (!ImGui::TreeNode("SPICE deck options")) return;
    ImGui::SetNextItemWidth(120);
    ImGui::InputText("Name of node 0", &options.groundName);
    if (options.groundName.empty()) options.groundName = "GND";
    ImGui::Checkbox("Flatten subcircuits into their parts (refs such as X1.R3)", &options.flatten);
    bool supplies = options.sources == netcheck::SpiceOptions::Sources::Offboard;
    if (ImGui::Checkbox("Voltage sources become off-board supplies", &supplies))
        options.sources = supplies ? netcheck::SpiceOptions::Sources::Offboard
                                   : netcheck::SpiceOptions::Sources::Ignore;
    ImGui::TreePop();
}

void loadNotes(const CircuitPanelContext& c) {
    auto& state = c.state;
    if (state.loadNotes.empty()) return;
    ImGui::TextColored({1.0f, 0.8f, 0.35f, 1.0f},
                       "Notes on %s (%zu):", baseName(state.loadedFrom).c_str(),
                       state.loadNotes.size());
    ImGui::SameLine();
    if (ImGui::SmallButton("Dismiss")) state.loadNotes.clear();
    ImGui::BeginChild("notes", {0, ImGui::GetTextLineHeightWithSpacing() * 4.5f}, true);
    for (const std::string& note : state.loadNotes) ImGui::TextWrapped("%s", note.c_str());
    ImGui::EndChild();
}

void toolbar(const CircuitPanelContext& c) {
    const auto& board = c.doc.board();
    if (ImGui::Button("Load circuit file..."))
        c.chooser.open(FileChooser::Purpose::OpenCircuit, folderOf(c.doc.path()));
    c.log.item("load-circuit");
    if (ImGui::IsItemHovered())
        ImGui::SetTooltip("A JSON circuit file or a SPICE deck (.cir, .sp, .spice, .net, .ckt).");
    ImGui::SameLine();
    if (ImGui::Button("Take the board as the circuit"))
        c.commands.perform(std::make_unique<netcheck::edit::SetCircuit>(board, captureCircuit(board),
                                                                        "Take the board as the circuit"));
    if (ImGui::IsItemHovered())
        ImGui::SetTooltip(
            "The board's present connections become the intended circuit, so later edits are "
            "checked against them.");
    if (!board.circuit) {
        ImGui::SameLine();
        if (ImGui::Button("Start an empty circuit"))
            c.commands.perform(std::make_unique<netcheck::edit::SetCircuit>(board, netcheck::Circuit{},
                                                                            "Start an empty circuit"));
        return;
    }
    ImGui::SameLine();
    if (ImGui::Button("Export...")) {
        const std::string name = baseName(c.doc.path());
        const std::string stem = name.substr(0, name.find('.'));
        c.chooser.open(FileChooser::Purpose::ExportCircuit, folderOf(c.doc.path()),
                         (stem.empty() ? std::string("circuit") : stem) + ".cir");
    }
    if (ImGui::IsItemHovered())
        ImGui::SetTooltip(
            "Ending .cir, .sp, .spice, .net or .ckt: a SPICE deck; otherwise a JSON circuit "
            "file.\nThe circuit is also saved inside the board file.");
    ImGui::SameLine();
    if (ImGui::Button("Remove circuit"))
        c.commands.perform(
            std::make_unique<netcheck::edit::SetCircuit>(board, std::nullopt, "Remove circuit"));
}

}  // namespace

void applyCircuitEdit(const CircuitPanelContext& c, const netcheck::CircuitEdit& edit, const std::string& label) {
    if (const auto* problem = std::get_if<std::string>(&edit)) {
        c.commands.say(*problem);
        return;
    }
    const auto& circuit = std::get<netcheck::Circuit>(edit);
    if (c.doc.board().circuit == circuit) return;
    c.commands.perform(std::make_unique<netcheck::edit::SetCircuit>(c.doc.board(), circuit, label));
}

void drawCircuitPanel(const CircuitPanelContext& c) {
    takeChosenFile(c);
    if (!c.open) return;
    const ImVec2 d = ImGui::GetIO().DisplaySize;
    ImGui::SetNextWindowPos({d.x * 0.25f, d.y * 0.1f}, ImGuiCond_FirstUseEver);
    ImGui::SetNextWindowSize({d.x * 0.5f, d.y * 0.7f}, ImGuiCond_FirstUseEver);
    if (ImGui::Begin("Circuit", &c.open)) {
        toolbar(c);
        spiceOptions(c);
        loadNotes(c);
        ImGui::Separator();
        const auto& board = c.doc.board();
        if (!board.circuit) {
            ImGui::TextWrapped(
                "No intended circuit yet. Load one, type it in below, start an empty one and add "
                "part by part, or take the board's connections once you have checked them by eye.");
            drawCircuitText(c);
        } else if (ImGui::BeginTabBar("circuit-views")) {
            const netcheck::Circuit circuit = *board.circuit;  // edits below replace the board's
            const bool parts = ImGui::BeginTabItem("Parts");
            c.log.item("circuit-tab-parts");
            if (parts) {
                drawCircuitParts(c, circuit);
                ImGui::EndTabItem();
            }
            const bool nets = ImGui::BeginTabItem("Nets");
            c.log.item("circuit-tab-nets");
            if (nets) {
                drawCircuitNets(c, circuit);
                ImGui::EndTabItem();
            }
            const bool text = ImGui::BeginTabItem(
                "Text", nullptr, c.state.selectTextTab ? ImGuiTabItemFlags_SetSelected : 0);
            c.state.selectTextTab = false;
            c.log.item("circuit-tab-text");
            if (text) {
                drawCircuitText(c);
                ImGui::EndTabItem();
            }
            const bool comparing = ImGui::BeginTabItem("Board against circuit");
            c.log.item("circuit-tab-difference");
            if (comparing) {
                drawCircuitDifference(c.doc.board(), c.state);
                ImGui::EndTabItem();
            }
            ImGui::EndTabBar();
        }
    }
    ImGui::End();
}

}  // namespace stripsmith
