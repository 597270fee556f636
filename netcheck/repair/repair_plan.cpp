// The repair search: breadth by breadth over plans of 1, 2, 3 ... edits. Every candidate edit of
// every plan kept is done on the board, the board checked, and the edit undone; a plan goes on
// only if its last edit obeys the rule (see repair_plan.hpp) and clears at least one error. The
// first depth that reaches zero errors gives the plan (the cheapest of them); otherwise the plan
// with the fewest errors found.
#include "netcheck/repair/repair_plan.hpp"

#include <algorithm>
#include <set>

#include "netcheck/check/check.hpp"
#include "netcheck/edit/compound_command.hpp"
#include "netcheck/edit/cut_commands.hpp"
#include "netcheck/edit/link_commands.hpp"
#include "netcheck/repair/detail/board_health.hpp"
#include "netcheck/repair/detail/candidates.hpp"
#include "netcheck/repair/finding_fixes.hpp"

namespace netcheck {

namespace {

// The search compares faults by name; where they lie matters only for the plans it goes on with.
constexpr CheckOptions kNamesOnly{.locateFaults = false};

struct Trial {
    std::vector<RepairStep> steps;
    int errors = 0;
    double cost = 0;

    // Fewest errors, then fewest edits, then the cheapest; the step keys settle the rest so the
    // same board always gives the same plan.
    bool betterThan(const Trial& other) const {
        if (errors != other.errors) return errors < other.errors;
        if (steps.size() != other.steps.size()) return steps.size() < other.steps.size();
        if (cost != other.cost) return cost < other.cost;
        return keys() < other.keys();
    }
    std::vector<std::string> keys() const {
        std::vector<std::string> keys;
        for (const RepairStep& step : steps) keys.push_back(step.key());
        std::sort(keys.begin(), keys.end());
        return keys;
    }
};

Board withSteps(const Board& board, const std::vector<RepairStep>& steps) {
    Board edited = board;
    for (const RepairStep& step : steps) {
        if (auto command = step.command(edited)) command->apply(edited);
    }
    return edited;
}

class RepairSearch {
public:
    RepairSearch(const Board& board, const Circuit* circuit, const RepairLimits& limits)
        : board_(board), circuit_(circuit), limits_(limits) {}

    Trial run() {
        Trial best{{}, BoardHealth(check(board_, circuit_)).errorCount(), 0};
        std::vector<Trial> kept{best};
        for (int depth = 1; depth <= limits_.maxSteps && best.errors > 0 && !kept.empty(); ++depth) {
            std::vector<Trial> next;
            for (const Trial& trial : kept) extend(trial, next);
            std::sort(next.begin(), next.end(), [](const Trial& a, const Trial& b) { return a.betterThan(b); });
            if (next.size() > static_cast<std::size_t>(limits_.keep)) next.resize(static_cast<std::size_t>(limits_.keep));
            if (!next.empty() && next.front().betterThan(best)) best = next.front();
            kept = std::move(next);
        }
        return best;
    }

    int checks() const { return checks_; }

private:
    // Every candidate edit after `trial` that obeys the rule and clears an error.
    void extend(const Trial& trial, std::vector<Trial>& next) {
        Board board = withSteps(board_, trial.steps);
        CheckReport report = check(board, circuit_);
        suggestFixes(report, board, circuit_);
        const BoardHealth health(report);
        for (RepairStep& step : candidateSteps(board, report)) {
            if (checks_ >= limits_.maxChecks) return;
            std::vector<RepairStep> steps = trial.steps;
            steps.push_back(step);
            Trial child{std::move(steps), 0, trial.cost + step.cost()};
            if (!tried_.insert(child.keys()).second) continue;
            const auto command = step.command(board);
            if (!command) continue;
            command->apply(board);
            const BoardHealth after(check(board, circuit_, kNamesOnly));
            ++checks_;
            command->revert(board);
            if (!after.noWorseThan(health) || after.errorCount() >= health.errorCount()) continue;
            child.errors = after.errorCount();
            next.push_back(std::move(child));
        }
    }

    const Board& board_;
    const Circuit* circuit_;
    RepairLimits limits_;
    std::set<std::vector<std::string>> tried_;
    int checks_ = 0;
};

// The errors of the first check that each step clears, in `plan` order.
void noteClears(const Board& board, const Circuit* circuit, std::vector<RepairStep>& steps) {
    const CheckReport first = check(board, circuit);
    std::vector<std::string> remaining;
    for (const Finding& error : first.errors) remaining.push_back(findingKey(error));
    Board edited = board;
    for (RepairStep& step : steps) {
        if (auto command = step.command(edited)) command->apply(edited);
        const BoardHealth after(check(edited, circuit));
        for (std::size_t i = 0; i < remaining.size(); ++i) {
            if (remaining[i].empty() || std::binary_search(after.errors.begin(), after.errors.end(), remaining[i]))
                continue;
            step.clears.push_back(static_cast<int>(i));
            remaining[i].clear();
        }
    }
}

// Why an error no plan clears stays, in a maker's words.
std::string whyItStays(const Finding& error, const RepairLimits& limits) {
    switch (error.type) {
        case FindingType::MissingPart: return "fit the part (a repair moves no new part in)";
        case FindingType::ExtraPart: return "take it off, or add it to the circuit";
        case FindingType::PinMismatch: return "fit a part with the circuit's pins, or correct the circuit";
        case FindingType::ValueMismatch: return "fit a part of the circuit's value";
        default: return "no plan of up to " + std::to_string(limits.maxSteps) + " safe edits clears it";
    }
}

void withdrawFix(Finding& finding) {
    finding.fix.clear();
    finding.suggestedCut.reset();
    finding.suggestedLinks.clear();
    finding.cutToRemove.reset();
}

// The finding's own suggestion as edits, done on `board`; false when it has none.
bool applyOwnFix(const Finding& finding, Board& board) {
    std::vector<std::unique_ptr<edit::Command>> commands;
    if (finding.suggestedCut) commands.push_back(std::make_unique<edit::AddCut>(*finding.suggestedCut));
    for (const Link& link : finding.suggestedLinks) commands.push_back(std::make_unique<edit::AddLink>(link));
    if (finding.cutToRemove) {
        const auto it = std::find(board.cuts.begin(), board.cuts.end(), *finding.cutToRemove);
        if (it != board.cuts.end())
            commands.push_back(std::make_unique<edit::RemoveCut>(board, static_cast<std::size_t>(it - board.cuts.begin())));
    }
    for (auto& command : commands) command->apply(board);
    return !commands.empty();
}

}  // namespace

RepairPlan planRepair(const Board& board, const Circuit* circuit, const RepairLimits& limits) {
    if (board.holeCount() > limits.maxHoles) {
        RepairPlan plan;
        plan.skipped = "the board has " + std::to_string(board.holeCount()) +
                       " holes; repair plans are searched on boards of up to " +
                       std::to_string(limits.maxHoles);
        return plan;
    }
    RepairSearch search(board, circuit, limits);
    const Trial best = search.run();
    RepairPlan plan;
    plan.checks = search.checks();
    const CheckReport first = check(board, circuit);
    plan.errorsBefore = static_cast<int>(first.errors.size());
    plan.errorsAfter = best.errors;
    plan.steps = best.steps;
    noteClears(board, circuit, plan.steps);
    const CheckReport last = check(withSteps(board, plan.steps), circuit);
    for (const Finding& error : last.errors) {
        plan.remaining.push_back({findingKey(error), error.message, whyItStays(error, limits)});
    }
    return plan;
}

void attachPlan(CheckReport& report, const RepairPlan& plan, const Board& board, const Circuit* circuit) {
    suggestFixes(report, board, circuit);
    if (!plan.skipped.empty()) return;  // the findings' own fixes stay, unverified
    for (std::size_t k = 0; k < plan.steps.size(); ++k) {
        for (int i : plan.steps[k].clears) {
            if (i < 0 || static_cast<std::size_t>(i) >= report.errors.size()) continue;
            report.errors[static_cast<std::size_t>(i)].repairStep = static_cast<int>(k);
            withdrawFix(report.errors[static_cast<std::size_t>(i)]);
        }
    }
    const BoardHealth before(report);
    for (Finding& error : report.errors) {
        if (error.repairStep >= 0) continue;
        // An error no edit of copper or leads mends says what will: fit the part, the value ...
        const std::string key = findingKey(error);
        for (const RemainingError& remaining : plan.remaining) {
            if (error.fix.empty() && remaining.key == key) error.fix = remaining.reason;
        }
        Board fixed = board;
        if (!applyOwnFix(error, fixed)) continue;
        const BoardHealth after(check(fixed, circuit));
        if (!after.noWorseThan(before) || after.errorCount() >= before.errorCount()) withdrawFix(error);
    }
}

std::unique_ptr<edit::Command> planCommand(const Board& board, const RepairPlan& plan) {
    Board scratch = board;  // each step's command is made on the board the steps before it left
    std::vector<std::unique_ptr<edit::Command>> steps;
    for (const RepairStep& step : plan.steps) {
        auto command = step.command(scratch);
        if (!command) return nullptr;
        command->apply(scratch);
        steps.push_back(std::move(command));
    }
    const std::string label = "Repair (" + std::to_string(steps.size()) + " step" + (steps.size() == 1 ? ")" : "s)");
    return std::make_unique<edit::CompoundCommand>(label, std::move(steps));
}

Board repairedBoard(const Board& board, const RepairPlan& plan) { return withSteps(board, plan.steps); }

}  // namespace netcheck
