// "Check": the repair plan first (each step with the errors it clears under it, shown ghosted on
// the board when chosen, applied one by one or all at once as one undo step), then the other
// errors and warnings in the trade's words. Click a finding to see it on the board; apply a fix
// a finding still offers with one click (undoable).
#include <optional>
#include <string>

#include <imgui.h>

#include "editor/app/finding_fix.hpp"
#include "editor/app/look.hpp"
#include "editor/canvas/canvas.hpp"
#include "editor/panels/panels.hpp"
#include "netcheck/repair/repair_plan.hpp"

namespace stripsmith {
namespace {

// What a row of the list reads and changes.
struct CheckPanel {
    const Document& doc;
    ViewState& view;
    TestLog& log;
};

std::string findingKey(const netcheck::Finding& finding) {
    return std::string(finding.id()) + " " + finding.message;
}

// After an edit or an undo the list is made anew and an index may name another finding: the
// focus follows the finding it was on, or goes when that finding is gone. It never moves the view.
void followFocusedFinding(const Document& doc, ViewState& view) {
    if (!view.focusedFinding || view.focusRevision == doc.revision()) return;
    view.focusRevision = doc.revision();
    const auto& report = doc.report();
    int index = 0;
    for (const auto* list : {&report.errors, &report.warnings})
        for (const netcheck::Finding& finding : *list) {
            if (findingKey(finding) == view.focusedFindingKey) {
                view.focusedFinding = index;
                return;
            }
            ++index;
        }
    view.focusedFinding.reset();
}

// Returns true when its fix button was pressed (applied after the list, which the fix changes).
bool findingRow(const CheckPanel& p, const netcheck::Finding& finding, int index) {
    bool fixPressed = false;
    ImGui::PushID(index);
    const bool error = finding.severity() == netcheck::Severity::Error;
    const bool focused = p.view.focusedFinding && *p.view.focusedFinding == index;
    ImGui::PushStyleColor(ImGuiCol_Text, error ? look::kErrorText : look::kWarningText);
    const std::string head = std::string(error ? "Error: " : "Warning: ") + std::string(finding.id());
    const bool clicked = ImGui::Selectable(head.c_str(), focused);
    p.log.item("finding-" + std::to_string(index));
    ImGui::PopStyleColor();
    // The whole row answers a click, not only its header: the message under it too.
    ImGui::Indent();
    ImGui::BeginGroup();
    ImGui::PushTextWrapPos(0.0f);
    ImGui::TextUnformatted(finding.message.c_str());
    if (!finding.fix.empty()) ImGui::TextDisabled("%s", finding.fix.c_str());
    ImGui::PopTextWrapPos();
    ImGui::EndGroup();
    const bool textClicked = ImGui::IsItemHovered() && ImGui::IsMouseClicked(ImGuiMouseButton_Left);
    p.log.item("finding-text-" + std::to_string(index));
    ImGui::Unindent();
    if (clicked || textClicked) {
        p.view.focusedFinding = focused ? std::nullopt : std::optional<int>(index);
        p.view.focusedFindingKey = findingKey(finding);
        p.view.focusRevision = p.doc.revision();
        if (!focused)
            if (auto where = findingLocation(p.doc.board(), finding)) centreOn(p.view, p.doc.board(), *where);
    }
    ImGui::Indent();
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

// The plan's header, its steps with the errors each clears, and what stays. Returns the command
// a pressed Apply button asks for.
std::unique_ptr<netcheck::edit::Command> planRows(const CheckPanel& p, std::optional<netcheck::Finding>& toFix) {
    const netcheck::RepairPlan& plan = p.doc.plan();
    const auto& errors = p.doc.report().errors;
    std::unique_ptr<netcheck::edit::Command> pressed;
    if (!plan.skipped.empty()) {
        ImGui::PushTextWrapPos(0.0f);
        ImGui::TextDisabled("No repair plan: %s.", plan.skipped.c_str());
        ImGui::PopTextWrapPos();
    } else if (plan.steps.empty()) {
        ImGui::TextDisabled("No safe repair found.");
    } else {
        const int cleared = plan.errorsBefore - plan.errorsAfter;
        ImGui::TextColored(look::kPlanText, "Repair plan: %zu step%s clear%s %d of %d error%s", plan.steps.size(),
                           plan.steps.size() == 1 ? "" : "s", plan.steps.size() == 1 ? "s" : "", cleared, plan.errorsBefore,
                           plan.errorsBefore == 1 ? "" : "s");
        if (ImGui::Button(plan.steps.size() == 1 ? "Apply the repair" : "Apply all steps")) pressed = netcheck::planCommand(p.doc.board(), plan);
        p.log.item("apply-plan");
    }
    for (std::size_t k = 0; k < plan.steps.size(); ++k) {
        const netcheck::RepairStep& step = plan.steps[k];
        ImGui::PushID(static_cast<int>(k) + 100000);
        const bool shown = p.view.previewStep && *p.view.previewStep == static_cast<int>(k);
        const std::string head = std::to_string(k + 1) + ". " + step.words() + " (clears " + std::to_string(step.clears.size()) + ")";
        ImGui::PushTextWrapPos(0.0f);
        if (ImGui::Selectable(head.c_str(), shown)) p.view.previewStep = shown ? std::nullopt : std::optional<int>(static_cast<int>(k));
        ImGui::PopTextWrapPos();
        p.log.item("repair-step-" + std::to_string(k + 1));
        auto command = step.command(p.doc.board());
        ImGui::BeginDisabled(!command);
        if (ImGui::SmallButton("Apply this step")) pressed = std::move(command);
        ImGui::EndDisabled();
        p.log.item("apply-step-" + std::to_string(k + 1));
        ImGui::Indent();
        for (std::size_t i = 0; i < errors.size(); ++i)
            if (errors[i].repairStep == static_cast<int>(k) && findingRow(p, errors[i], static_cast<int>(i))) toFix = errors[i];
        ImGui::Unindent();
        ImGui::PopID();
    }
    if (plan.errorsAfter > 0 && !plan.remaining.empty()) {
        ImGui::PushTextWrapPos(0.0f);
        ImGui::TextDisabled("What no repair of cuts, links and leads mends:");
        for (const netcheck::RemainingError& error : plan.remaining) ImGui::BulletText("%s", error.text().c_str());
        ImGui::PopTextWrapPos();
    }
    ImGui::Separator();
    return pressed;
}

}  // namespace

void drawCheckPanel(const Document& doc, Commands commands, ViewState& view, TestLog& log, ImVec2 pos,
                    ImVec2 size) {
    const CheckPanel p{doc, view, log};
    followFocusedFinding(doc, view);
    const std::string focus = view.focusedFinding ? std::to_string(*view.focusedFinding) + " " + view.focusedFindingKey : "-";
    if (log.changed("focused-finding", focus)) log.note("focused-finding " + focus);
    if (beginPanel("Check", pos, size)) {
        const auto& report = doc.report();
        if (!report.hasCircuit) ImGui::TextDisabled("No intended circuit: checking the board's own faults only.");
        if (report.ok() && report.warnings.empty()) {
            ImGui::TextColored(look::kGoodText, "All clear: no errors, no warnings.");
        } else {
            ImGui::Text("%zu error%s, %zu warning%s", report.errors.size(), report.errors.size() == 1 ? "" : "s",
                        report.warnings.size(), report.warnings.size() == 1 ? "" : "s");
        }
        ImGui::Separator();
        std::optional<netcheck::Finding> toFix;
        std::unique_ptr<netcheck::edit::Command> repair;
        if (!report.errors.empty()) repair = planRows(p, toFix);
        const int errors = static_cast<int>(report.errors.size());
        for (int i = 0; i < errors; ++i) {
            const netcheck::Finding& error = report.errors[static_cast<std::size_t>(i)];
            if (error.repairStep < 0 && findingRow(p, error, i)) toFix = error;
        }
        for (std::size_t i = 0; i < report.warnings.size(); ++i)
            if (findingRow(p, report.warnings[i], errors + static_cast<int>(i))) toFix = report.warnings[i];
        // Applying re-runs the check (and the plan), so only after the list is drawn.
        if (toFix) repair = fixCommand(doc.board(), *toFix);
        if (repair) {
            commands.perform(std::move(repair));
            view.focusedFinding.reset();
            view.previewStep.reset();
        }
    }
    ImGui::End();
}

}  // namespace stripsmith
