// "JFET bias": the source resistor for a self-biased JFET stage from IDSS and VP (or from two
// bench readings), the E12 and E24 values either side, and Apply to set one on the board's
// resistor in one undoable step.
#include <cmath>
#include <cstdio>

#include <imgui.h>
#include <imgui_stdlib.h>

#include "editor/panels/panels.hpp"
#include "editor/tools/set_part_value.hpp"
#include "netcheck/model/value.hpp"
#include "netcheck/voltage/jfet_bias.hpp"
#include "netcheck/voltage/value_reading.hpp"

namespace stripsmith {

namespace {

/// A typed figure as makers write values ("4k7", "3m", "-2", "9V"); nullopt when unreadable.
std::optional<double> figure(const std::string& text) {
    if (const auto volts = netcheck::voltageInValue(text)) return volts;
    std::string body = text;
    const bool negative = !body.empty() && body.front() == '-';
    if (negative) body.erase(0, 1);
    const auto quantity = netcheck::parseQuantity(body);
    if (!quantity || !quantity->taper.empty()) return std::nullopt;
    return negative ? -quantity->magnitude : quantity->magnitude;
}

void field(const char* label, std::string& text) {
    ImGui::SetNextItemWidth(90);
    ImGui::InputText(label, &text);
}

std::string biasText(const netcheck::JfetBias& bias) {
    char text[160];
    std::snprintf(text, sizeof text, "VD %.2f V, ID %.3g mA, headroom %.2f V up, %.2f V down",
                  bias.drain, bias.drainCurrent * 1e3, bias.headroomUp, bias.headroomDown);
    return text;
}

/// The resistor on the source strip of the board's first JFET, or "".
std::string sourceResistor(const Document& doc) {
    const netcheck::Board& board = doc.board();
    for (const netcheck::Part& jfet : board.parts) {
        if (jfet.kind != "jfet") continue;
        const int source = doc.connectivity().islandOfPin({jfet.ref, "S"});
        for (const netcheck::Part& part : board.parts) {
            if (part.kind != "resistor" || source < 0) continue;
            for (const netcheck::Pin& pin : part.pins) {
                if (doc.connectivity().islandOfPin({part.ref, pin.name}) == source) return part.ref;
            }
        }
    }
    return {};
}

/// The board's resistors, to choose the one Apply sets (first the JFET's source resistor).
void resistorChoice(const JfetPanelContext& c) {
    if (c.state.sourceRef.empty()) c.state.sourceRef = sourceResistor(c.doc);
    ImGui::SetNextItemWidth(120);
    if (!ImGui::BeginCombo("source resistor on the board", c.state.sourceRef.c_str())) return;
    for (const netcheck::Part& part : c.doc.board().parts) {
        if (part.kind != "resistor") continue;
        const std::string label = part.ref + " (" + part.value + ")";
        if (ImGui::Selectable(label.c_str(), part.ref == c.state.sourceRef)) {
            c.state.sourceRef = part.ref;
        }
    }
    ImGui::EndCombo();
}

void applyButton(const JfetPanelContext& c, double ohms, int id) {
    const std::string value = netcheck::formatIec(ohms, false);
    ImGui::PushID(id);
    const bool chosen = !c.state.sourceRef.empty();
    if (ImGui::Button(("Apply " + value).c_str()) && chosen) {
        auto command = setPartValue(c.doc.board(), c.state.sourceRef, value,
                                    "Set " + c.state.sourceRef + " to " + value + " (JFET bias)");
        if (command) c.commands.perform(std::move(command));
    }
    c.log.item("jfet-apply-" + std::to_string(id));
    ImGui::PopID();
}

/// IDSS and VP as typed, or estimated from the two readings; an explanation when neither works.
std::optional<netcheck::JfetDevice> device(const JfetPanelState& s, const netcheck::JfetStage& stage,
                                           std::string& problem) {
    if (!s.measured) {
        const auto idss = figure(s.idss), vp = figure(s.vp);
        if (!idss || !vp) {
            problem = "Type IDSS (e.g. 3m) and VP (e.g. -2).";
            return std::nullopt;
        }
        return netcheck::JfetDevice{*idss, -std::abs(*vp)};
    }
    const auto rs1 = figure(s.rs1), vd1 = figure(s.vd1), rs2 = figure(s.rs2), vd2 = figure(s.vd2);
    if (!rs1 || !vd1 || !rs2 || !vd2) {
        problem = "Type both readings: the source resistor fitted and the drain voltage read.";
        return std::nullopt;
    }
    const netcheck::JfetEstimate estimate = netcheck::estimateJfet(stage, {*rs1, *vd1}, {*rs2, *vd2});
    if (!estimate.device) problem = estimate.error;
    return estimate.device;
}

void drawAdvice(const JfetPanelContext& c) {
    const JfetPanelState& s = c.state;
    const auto supply = figure(s.supply), rd = figure(s.drainResistor), target = figure(s.target);
    if (!supply || !rd || !target) {
        ImGui::TextWrapped("Type the supply, the drain resistor and the target drain voltage.");
        return;
    }
    const netcheck::JfetStage stage{*supply, *rd};
    std::string problem;
    const auto jfet = device(s, stage, problem);
    if (!jfet) {
        ImGui::TextWrapped("%s", problem.c_str());
        return;
    }
    const netcheck::JfetAdviceResult result = netcheck::sourceResistorFor(*jfet, stage, *target);
    ImGui::Text("IDSS %.3g mA, VP %.2f V%s", jfet->idss * 1e3, jfet->vp,
                s.measured ? " (estimated from the readings)" : "");
    if (!result.advice) {
        ImGui::TextWrapped("%s", result.error.c_str());
        return;
    }
    ImGui::Text("Exact: %.1f ohm, %s", result.advice->exact.sourceResistor,
                biasText(result.advice->exact).c_str());
    resistorChoice(c);
    int id = 0;
    for (const netcheck::PreferredChoice& choice : result.advice->preferred) {
        applyButton(c, choice.bias.sourceResistor, id++);
        ImGui::SameLine();
        ImGui::Text("%s %s: %s", std::string(netcheck::seriesName(choice.series)).c_str(),
                    choice.below ? "below" : "above", biasText(choice.bias).c_str());
    }
}

}  // namespace

void drawJfetBiasPanel(const JfetPanelContext& c) {
    if (!c.state.open) return;
    ImGui::SetNextWindowSize({620, 0}, ImGuiCond_FirstUseEver);
    if (ImGui::Begin("JFET bias", &c.state.open)) {
        ImGui::TextWrapped("Self-biased common-source N-channel stage (gate to 0 V through its "
                           "resistor). Square-law estimates: trim on the bench. Extra-low-voltage "
                           "circuits only; keep the probe from bridging two strips.");
        field("supply V", c.state.supply);
        ImGui::SameLine();
        field("RD", c.state.drainResistor);
        ImGui::SameLine();
        field("target VD", c.state.target);
        ImGui::Checkbox("from two bench readings", &c.state.measured);
        if (c.state.measured) {
            field("RS 1", c.state.rs1);
            ImGui::SameLine();
            field("VD 1", c.state.vd1);
            field("RS 2", c.state.rs2);
            ImGui::SameLine();
            field("VD 2", c.state.vd2);
        } else {
            field("IDSS", c.state.idss);
            ImGui::SameLine();
            field("VP", c.state.vp);
        }
        ImGui::Separator();
        drawAdvice(c);
    }
    ImGui::End();
}

}  // namespace stripsmith
