#include "editor/app/finding_fix.hpp"

#include <algorithm>

#include "netcheck/edit/edit.hpp"

namespace stripsmith {

namespace {

// A bare link lying across leads, or the first of two crossing: the fix is a sleeve on it.
std::unique_ptr<netcheck::edit::Command> sleeveCommand(const netcheck::Board& board, const netcheck::Finding& finding) {
    if (finding.holes.size() < 2) return nullptr;
    for (std::size_t i = 0; i < board.links.size(); ++i) {
        const netcheck::Link& link = board.links[i];
        if (link.from != finding.holes[0] || link.to != finding.holes[1] || link.insulated || link.copperSide) continue;
        netcheck::Link sleeved = link;
        sleeved.insulated = true;
        return std::make_unique<netcheck::edit::ReplaceLink>(board, i, sleeved, "Sleeve link " + netcheck::linkName(link));
    }
    return nullptr;
}

}  // namespace

std::unique_ptr<netcheck::edit::Command> fixCommand(const netcheck::Board& board, const netcheck::Finding& finding) {
    if (finding.type == netcheck::FindingType::LinkOverLead || finding.type == netcheck::FindingType::LinksTouch) return sleeveCommand(board, finding);
    if (finding.suggestedCut) {
        const netcheck::Cut& cut = *finding.suggestedCut;
        if (std::find(board.cuts.begin(), board.cuts.end(), cut) != board.cuts.end()) return nullptr;
        return std::make_unique<netcheck::edit::AddCut>(cut, std::nullopt, "Apply suggested cut " + netcheck::cutName(cut));
    }
    if (finding.suggestedLinks.empty()) return nullptr;
    std::vector<std::unique_ptr<netcheck::edit::Command>> members;
    for (const netcheck::Link& link : finding.suggestedLinks) members.push_back(std::make_unique<netcheck::edit::AddLink>(link));
    if (members.size() == 1) return std::move(members.front());
    return std::make_unique<netcheck::edit::CompoundCommand>("Apply suggested links", std::move(members));
}

std::optional<ImVec2> findingLocation(const netcheck::Board& board, const netcheck::Finding& finding) {
    auto centre = [](netcheck::Hole h) { return ImVec2{static_cast<float>(h.col) + 0.5f, static_cast<float>(h.row) + 0.5f}; };
    if (finding.hole) return centre(*finding.hole);
    if (finding.suggestedCut) return centre(finding.suggestedCut->hole);
    if (!finding.path.empty()) return centre(finding.path[finding.path.size() / 2]);
    if (!finding.suggestedLinks.empty()) return centre(finding.suggestedLinks.front().from);
    if (!finding.holes.empty()) return centre(finding.holes.front());
    if (const netcheck::Part* part = board.findPart(finding.ref); part && !part->pins.empty())
        return centre(part->pins.front().hole);
    return std::nullopt;
}

}  // namespace stripsmith
