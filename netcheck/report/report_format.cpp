// Report printing. Text is for people at the bench: one line per finding, every line naming holes,
// then a summary; a repair plan first, each step over the errors it clears. JSON is the CLI contract: stable key order, fields only where they mean
// something.
#include "netcheck/report/report_format.hpp"

#include "netcheck/check/circuit_capture.hpp"
#include "netcheck/check/connectivity.hpp"

#include <string_view>
#include <unordered_map>

#include "netcheck/model/printable.hpp"
#include "netcheck/model/wording.hpp"

namespace netcheck {

namespace {

std::string findingLine(const Finding& finding) {
    std::string line = (finding.severity() == Severity::Error ? "error " : "warning ") +
                       std::string(finding.id()) + " " + finding.message;
    if (!finding.fix.empty()) line += "; " + finding.fix;
    // Messages quote refs, values and net names from the files: shown raw, an escape sequence
    // among them would act on the terminal.
    return escapeControls(line);
}

// The board's parts by ref, made once per report: a look-up along the whole list per pin made
// the report of a board of 100,000 parts take 23 s.
using PartsByRef = std::unordered_map<std::string_view, const Part*>;

PartsByRef partsByRef(const Board& board) {
    PartsByRef parts;
    parts.reserve(board.parts.size());
    for (const Part& part : board.parts) parts.emplace(part.ref, &part);  // the first of a ref
    return parts;
}

// "R1.2 (A9)" for on-board pins, the bare name for off-board lugs.
std::string pinWithHole(const PartsByRef& parts, const PinRef& pin) {
    const auto found = parts.find(pin.ref);
    const Part* part = found == parts.end() ? nullptr : found->second;
    const Pin* onBoard = part ? part->findPin(pin.pin) : nullptr;
    return onBoard ? pin.name() + " (" + holeName(onBoard->hole) + ")"
                   : pin.name() + " (off board)";
}

std::string islandLine(const PartsByRef& parts, const Island& island) {
    std::string line = "island";
    if (!island.holes.empty()) {
        line += " " + holeName(island.holes.front());
        if (island.holes.size() > 1) line += "-" + holeName(island.holes.back());
    }
    line += ":";
    for (std::size_t i = 0; i < island.pins.size(); ++i) {
        line += (i == 0 ? " " : ", ") + pinWithHole(parts, island.pins[i]);
    }
    return escapeControls(line);
}

nlohmann::ordered_json pinNames(const std::vector<PinRef>& pins) {
    nlohmann::ordered_json names = nlohmann::ordered_json::array();
    for (const PinRef& pin : pins) names.push_back(pin.name());
    return names;
}

nlohmann::ordered_json holeNames(const std::vector<Hole>& holes) {
    nlohmann::ordered_json names = nlohmann::ordered_json::array();
    for (const Hole& hole : holes) names.push_back(holeName(hole));
    return names;
}

nlohmann::ordered_json findingJson(const Finding& finding) {
    nlohmann::ordered_json entry;
    entry["type"] = finding.id();
    if (!finding.ref.empty()) entry["ref"] = finding.ref;
    if (finding.type == FindingType::Short) {
        entry["nets"] = finding.nets;
        entry["path"] = holeNames(finding.path);
        entry["cut"] = finding.suggestedCut ? nlohmann::ordered_json(cutName(*finding.suggestedCut))
                                            : nlohmann::ordered_json(nullptr);
    }
    if (finding.type == FindingType::Open) {
        entry["net"] = finding.net;
        entry["pieces"] = nlohmann::ordered_json::array();
        for (const auto& piece : finding.pieces) entry["pieces"].push_back(pinNames(piece));
        entry["links"] = nlohmann::ordered_json::array();
        for (const Link& link : finding.suggestedLinks) {
            entry["links"].push_back({{"from", holeName(link.from)}, {"to", holeName(link.to)}});
        }
    }
    if (finding.hole) entry["hole"] = holeName(*finding.hole);
    if (!finding.holes.empty()) entry["holes"] = holeNames(finding.holes);
    entry["message"] = finding.message;
    if (!finding.fix.empty()) entry["fix"] = finding.fix;
    if (finding.repairStep >= 0) entry["repair_step"] = finding.repairStep + 1;
    return entry;
}

std::string stepLine(std::size_t k, const RepairStep& step) {
    return escapeControls("step " + std::to_string(k + 1) + ": " + step.words() + " (clears " +
                          plural(step.clears.size(), "error") + ")");
}

std::string planText(const CheckReport& report, const RepairPlan& plan) {
    if (report.errors.empty()) return "";
    if (!plan.skipped.empty()) return "repair plan: not searched: " + plan.skipped + "\n";
    if (plan.steps.empty()) return "repair plan: no safe edit clears any error\n";
    const int cleared = plan.errorsBefore - plan.errorsAfter;
    std::string text = "repair plan: " + plural(plan.steps.size(), "step") + " clear" +
                       (plan.steps.size() == 1 ? "s " : " ") + std::to_string(cleared) + " of " +
                       plural(static_cast<std::size_t>(plan.errorsBefore), "error") + "\n";
    for (std::size_t k = 0; k < plan.steps.size(); ++k) {
        text += stepLine(k, plan.steps[k]) + "\n";
        for (const Finding& error : report.errors) {
            if (error.repairStep == static_cast<int>(k)) text += "  " + findingLine(error) + "\n";
        }
    }
    return text;
}

nlohmann::ordered_json planJson(const RepairPlan& plan) {
    nlohmann::ordered_json json;
    if (!plan.skipped.empty()) return {{"skipped", plan.skipped}};
    json["errors_before"] = plan.errorsBefore;
    json["errors_after"] = plan.errorsAfter;
    json["steps"] = nlohmann::ordered_json::array();
    for (std::size_t k = 0; k < plan.steps.size(); ++k) {
        const RepairStep& step = plan.steps[k];
        nlohmann::ordered_json entry;
        entry["step"] = k + 1;
        entry["action"] = repairActionId(step.action);
        if (!step.ref.empty()) entry["ref"] = step.ref;
        entry["holes"] = holeNames(step.holes());
        entry["words"] = step.words();
        entry["clears"] = step.clears;
        json["steps"].push_back(std::move(entry));
    }
    json["remaining"] = nlohmann::ordered_json::array();
    for (const RemainingError& error : plan.remaining) json["remaining"].push_back(error.text());
    return json;
}

nlohmann::ordered_json findingsJson(const std::vector<Finding>& findings) {
    nlohmann::ordered_json list = nlohmann::ordered_json::array();
    for (const Finding& finding : findings) list.push_back(findingJson(finding));
    return list;
}

}  // namespace

std::string formatReportText(const CheckReport& report, const Board& board, const RepairPlan* plan) {
    std::string text = plan ? planText(report, *plan) : "";
    if (!report.hasCircuit) {
        text += "no circuit to compare with; " + plural(report.islands.size(), "island") +
                (report.islands.size() == 1 ? " holds" : " hold") + " pins:\n";
        const PartsByRef parts = partsByRef(board);
        for (const Island& island : report.islands) text += islandLine(parts, island) + "\n";
    }
    for (const Finding& finding : report.errors) {
        if (finding.repairStep < 0) text += findingLine(finding) + "\n";
    }
    for (const Finding& finding : report.warnings) text += findingLine(finding) + "\n";
    text += plural(report.errors.size(), "error") + ", " +
            plural(report.warnings.size(), "warning") + "\n";
    return text;
}

nlohmann::ordered_json reportJson(const CheckReport& report, const RepairPlan* plan) {
    nlohmann::ordered_json json;
    json["ok"] = report.ok();
    json["errors"] = findingsJson(report.errors);
    json["warnings"] = findingsJson(report.warnings);
    if (!report.hasCircuit) {
        json["islands"] = nlohmann::ordered_json::array();
        for (const Island& island : report.islands) {
            json["islands"].push_back(
                {{"pins", pinNames(island.pins)}, {"holes", holeNames(island.holes)}});
        }
    }
    if (plan && !report.errors.empty()) json["repair"] = planJson(*plan);
    return json;
}

nlohmann::ordered_json netsJson(const Board& board) {
    nlohmann::ordered_json json;
    json["nets"] = nlohmann::ordered_json::array();
    for (const auto& group : boardNets(board)) json["nets"].push_back(pinNames(group));
    return json;
}

std::string formatNetsText(const Board& board) {
    std::string text;
    for (const auto& group : boardNets(board)) {
        for (std::size_t i = 0; i < group.size(); ++i) {
            text += (i == 0 ? "" : " ") + escapeControls(group[i].name());
        }
        text += "\n";
    }
    return text;
}

}  // namespace netcheck
