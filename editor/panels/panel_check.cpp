// "Check": the live check's errors and warnings in the trade's words. Click one to see it on the
// board; apply its suggested cut or link with one click (undoable).
#include <optional>
#include <string>

#include <imgui.h>

#include "editor/app/finding_fix.hpp"
#include "editor/canvas/canvas.hpp"
#include "editor/panels/panels.hpp"

namespace stripsmith {
namespace {

// What a row of the list reads and changes.
struct CheckPanel {
    const Document& doc;
    ViewState& view;
    TestLog& log;
};

// Returns true when its fix button was pressed (applied after the list, which the fix changes).
bool findingRow(const CheckPanel& p, const netcheck::Finding& finding, int index) {
    bool fixPressed = false;
    ImGui::PushID(index);
    const bool error = finding.severity() == netcheck::Severity::Error;
    const bool focused = p.view.focusedFinding && *p.view.focusedFinding == index;
    ImGui::PushStyleColor(ImGuiCol_Text, error ? ImVec4(1.0f, 0.5f, 0.45f, 1.0f) : ImVec4(1.0f, 0.78f, 0.35f, 1.0f));
    const std::string head = std::string(error ? "Error: " : "Warning: ") + std::string(finding.id());
    const bool clicked = ImGui::Selectable(head.c_str(), focused);
    p.log.item("finding-" + std::to_string(index));
    if (clicked) {
        p.view.focusedFinding = focused ? std::nullopt : std::optional<int>(index);
        if (!focused)
            if (auto where = findingLocation(p.doc.board(), finding)) centreOn(p.view, p.doc.board(), *where);
    }
    ImGui::PopStyleColor();
    ImGui::Indent();
    ImGui::PushTextWrapPos(0.0f);
    ImGui::TextUnformatted(finding.message.c_str());
    if (!finding.fix.empty()) ImGui::TextDisabled("%s", finding.fix.c_str());
    ImGui::PopTextWrapPos();
    if (const auto fix = fixCommand(p.doc.board(), finding)) {
        const std::string label = finding.suggestedCut          ? "Apply cut " + netcheck::cutName(*finding.suggestedCut)
                                  : finding.suggestedLinks.empty() ? fix->label()
                                                                   : std::string(finding.suggestedLinks.size() > 1 ? "Add the links" : "Add the link");
        fixPressed = ImGui::Button(label.c_str());
        p.log.item("apply-fix-" + std::to_string(index));
    }
    ImGui::Unindent();
    ImGui::Spacing();
    ImGui::PopID();
    return fixPressed;
}

}  // namespace

void drawCheckPanel(const Document& doc, Commands commands, ViewState& view, TestLog& log, ImVec2 pos,
                    ImVec2 size) {
    const CheckPanel p{doc, view, log};
    if (beginPanel("Check", pos, size)) {
        const auto& report = doc.report();
        if (!report.hasCircuit) ImGui::TextDisabled("No intended circuit: checking the board's own faults only.");
        if (report.ok() && report.warnings.empty()) {
            ImGui::TextColored({0.45f, 0.9f, 0.55f, 1.0f}, "All clear: no errors, no warnings.");
        } else {
            ImGui::Text("%zu error%s, %zu warning%s", report.errors.size(), report.errors.size() == 1 ? "" : "s",
                        report.warnings.size(), report.warnings.size() == 1 ? "" : "s");
        }
        ImGui::Separator();
        const int errors = static_cast<int>(report.errors.size());
        std::optional<netcheck::Finding> toFix;
        for (int i = 0; i < errors; ++i)
            if (findingRow(p, report.errors[static_cast<std::size_t>(i)], i)) toFix = report.errors[static_cast<std::size_t>(i)];
        for (std::size_t i = 0; i < report.warnings.size(); ++i)
            if (findingRow(p, report.warnings[i], errors + static_cast<int>(i))) toFix = report.warnings[i];
        // Applying re-runs the check, so only after the list is drawn.
        if (toFix) {
            commands.perform(fixCommand(doc.board(), *toFix));
            view.focusedFinding.reset();
        }
    }
    ImGui::End();
}

}  // namespace stripsmith
