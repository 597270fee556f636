// Lead findings. Leads are counted per hole once (CheckContext), so these passes only look at the
// leads themselves, never at every hole.
#include "netcheck/check/detail/lead_findings.hpp"

#include <algorithm>
#include <charconv>
#include <cmath>
#include <cstdio>

namespace netcheck {

namespace {

Finding holeFinding(std::string type, Severity severity, Hole hole, std::string message) {
    Finding finding;
    finding.type = std::move(type);
    finding.severity = severity;
    finding.hole = hole;
    finding.holes = {hole};
    finding.message = std::move(message);
    return finding;
}

// The trim warning is rebuilt on every re-check, so its text is appended to one buffer, with
// numbers written by to_chars rather than through temporary strings or printf.
void appendNumber(std::string& text, long long number) {
    char digits[24];
    const auto end = std::to_chars(digits, digits + sizeof digits, number).ptr;
    text.append(digits, end);
}

void appendPlural(std::string& text, int count, std::string_view word) {
    appendNumber(text, count);
    text.append(" ").append(word);
    if (count != 1) text += 's';
}

// One decimal, rounded half away from zero.
void appendMillimetres(std::string& text, double value) {
    if (!(value >= 0 && value < 1e15)) {  // absurd pitches still print
        char digits[32];
        std::snprintf(digits, sizeof digits, "%.1f", value);
        text += digits;
        return;
    }
    const long long tenths = std::llround(value * 10);
    appendNumber(text, tenths / 10);
    text += '.';
    appendNumber(text, tenths % 10);
}

}  // namespace

void findSharedHoles(const CheckContext& context, std::vector<Finding>& errors) {
    if (!context.anyLeadShared()) return;
    std::vector<const Lead*> crowded;
    for (const Lead& lead : context.leads()) {
        if (lead.shared) crowded.push_back(&lead);
    }
    std::stable_sort(crowded.begin(), crowded.end(),
                     [](const Lead* a, const Lead* b) { return a->hole < b->hole; });
    for (std::size_t i = 0; i < crowded.size();) {
        std::size_t j = i;
        std::string names;
        for (; j < crowded.size() && crowded[j]->hole == crowded[i]->hole; ++j) {
            names += (names.empty() ? "" : ", ") + context.leadName(*crowded[j]);
        }
        const Hole hole = context.holeAt(crowded[i]->hole);
        std::string message = holeName(hole) + " holds ";
        appendPlural(message, static_cast<int>(j - i), "lead");
        errors.push_back(holeFinding("shared-hole", Severity::Error, hole, message + ": " + names));
        i = j;
    }
}

void findLeadsOnCuts(const CheckContext& context, std::vector<Finding>& errors) {
    if (!context.anyLeadOnCut()) return;
    std::vector<const Lead*> onCuts;
    for (const Lead& lead : context.leads()) {
        if (lead.onCut) onCuts.push_back(&lead);
    }
    std::stable_sort(onCuts.begin(), onCuts.end(),
                     [](const Lead* a, const Lead* b) { return a->hole < b->hole; });
    for (const Lead* lead : onCuts) {
        const Hole hole = context.holeAt(lead->hole);
        errors.push_back(holeFinding("pin-on-cut", Severity::Error, hole,
                                     context.leadName(*lead) + " is in " + holeName(hole) +
                                         ", where a hole cut removed the copper"));
    }
}

void findDanglingLeads(const CheckContext& context, const std::vector<char>* onlyIslands,
                       std::vector<Finding>& warnings) {
    const Board& board = context.board();
    const Connectivity& copper = context.copper();
    std::vector<int> pins(static_cast<std::size_t>(copper.islandCount()), 0);
    auto islandAt = [&](int node) { return static_cast<std::size_t>(copper.islandOfNode(node)); };
    for (const Lead& lead : context.leads()) {
        // A link or wire end makes the island more than a lone lead.
        pins[static_cast<std::size_t>(lead.island)] += lead.kind == Lead::Kind::PartPin ? 1 : 2;
    }
    for (std::size_t p = 0; p < board.offboard.size(); ++p) {
        for (std::size_t k = 0; k < board.offboard[p].pins.size(); ++k) {
            ++pins[islandAt(context.lugNode(static_cast<int>(p), static_cast<int>(k)))];
        }
    }
    for (const Wire& wire : board.wires) {
        for (const Endpoint* end : {&wire.from, &wire.to}) {
            const int node = end->isHole() ? -1 : context.endpointNode(*end);
            if (node >= 0) pins[islandAt(node)] += 2;
        }
    }
    std::vector<const Lead*> lonely;
    for (const Lead& lead : context.leads()) {
        const auto island = static_cast<std::size_t>(lead.island);
        if (pins[island] != 1) continue;
        if (onlyIslands != nullptr && !(*onlyIslands)[island]) continue;
        lonely.push_back(&lead);
    }
    std::stable_sort(lonely.begin(), lonely.end(),
                     [](const Lead* a, const Lead* b) { return a->hole < b->hole; });
    for (const Lead* lead : lonely) {
        const Hole hole = context.holeAt(lead->hole);
        warnings.push_back(holeFinding(
            "dangling-lead", Severity::Warning, hole,
            context.leadName(*lead) + " in " + holeName(hole) + " touches nothing else"));
    }
}

void findTrim(const CheckContext& context, std::vector<Finding>& warnings) {
    const Board& board = context.board();
    // Every lead's hole: part pins, link ends, wire ends on the board.
    const auto [top, bottom, left, right] = context.leadArea();
    if (top > bottom) return;
    const int spare[4] = {top, board.rows - 1 - bottom, left, board.cols - 1 - right};
    const char* const what[4] = {"row", "row", "column", "column"};
    const char* const where[4] = {" at the top", " at the bottom", " at the left", " at the right"};
    const int sides =
        static_cast<int>(std::count_if(spare, spare + 4, [](int n) { return n > 0; }));
    if (sides == 0) return;
    const int rows = bottom - top + 1;
    const int cols = right - left + 1;
    Finding finding;
    finding.type = "trim";
    finding.severity = Severity::Warning;
    finding.holes = {Hole{top, left}, Hole{bottom, right}};
    std::string& text = finding.message;
    text.reserve(160);
    text.append("the board could lose ");
    for (int i = 0, listed = 0; i < 4; ++i) {
        if (spare[i] == 0) continue;
        if (listed > 0) text.append(listed + 1 == sides ? " and " : ", ");
        appendPlural(text, spare[i], what[i]);
        text.append(where[i]);
        ++listed;
    }
    text.append(": ");
    appendNumber(text, rows);
    text += 'x';
    appendNumber(text, cols);
    text.append(" holes (").append(holeName(Hole{top, left})).append(" to ");
    text.append(holeName(Hole{bottom, right})).append("), ");
    appendMillimetres(text, cols * board.pitchMm);
    text.append(" x ");
    appendMillimetres(text, rows * board.pitchMm);
    text.append(" mm");
    warnings.push_back(std::move(finding));
}

}  // namespace netcheck
