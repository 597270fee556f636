// Bare link contacts: leads under a bare link and bare links crossing (the geometry is in
// model/link_geometry.hpp).
#include "netcheck/check/detail/finders.hpp"

#include <algorithm>
#include <cstdlib>
#include <optional>
#include <utility>

#include "netcheck/model/link_geometry.hpp"
#include "netcheck/model/wording.hpp"

namespace netcheck {

namespace {

// A board file may hold millions of links a board long, crossing at the same holes. Past these
// bounds the contacts are left unchecked, with a warning that says so, rather than taking minutes
// and gigabytes: holes passed over by all the bare links together, per hole of the board (plus a
// floor for small boards), and pairs of wires that may cross.
constexpr long kPassesPerHole = 4;
constexpr long kPassesFloor = 4096;
constexpr std::size_t kMaxPairs = std::size_t{1} << 22;

// Pairs of links that may cross, each pair once, first < second: the hole nearest to where two
// wires cross lies within a pitch of both (within 0.71), so they share a hole in the lists of holes
// near each wire. `complete` is cleared when the pairs pass kMaxPairs (those found so far are
// returned).
std::vector<std::pair<int, int>> crossingCandidates(const Board& board,
                                                    const std::vector<int>& bare, bool& complete) {
    std::vector<std::pair<Hole, int>> marks;  // (hole, link)
    for (int l : bare) {
        forEachHoleNear(board.links[static_cast<std::size_t>(l)], 1.0, true,
                        [&](Hole h) { marks.emplace_back(h, l); });
    }
    std::sort(marks.begin(), marks.end());
    std::vector<std::pair<int, int>> pairs;
    for (std::size_t i = 0; i < marks.size() && complete;) {
        std::size_t end = i;
        while (end < marks.size() && marks[end].first == marks[i].first) ++end;
        for (std::size_t x = i; x < end && complete; ++x) {
            for (std::size_t y = x + 1; y < end; ++y) {
                if (marks[x].second != marks[y].second)
                    pairs.emplace_back(marks[x].second, marks[y].second);
            }
            complete = pairs.size() <= kMaxPairs;
        }
        i = end;
    }
    std::sort(pairs.begin(), pairs.end());
    pairs.erase(std::unique(pairs.begin(), pairs.end()), pairs.end());
    return pairs;
}

// "D3 (R1.1)", "D3 (R1.1) and E3 (C2.+)", "C3 (R2.1), D3 (R1.1) and E3 (C2.+)"; past eight holes
// the rest are counted, not named (the finding's holes list them all).
std::string leadsPassedOver(const CheckedBoard& checked, const std::vector<Hole>& under) {
    constexpr std::size_t kNamed = 8;
    const std::size_t shown = under.size() > kNamed ? kNamed - 1 : under.size();
    std::vector<std::string> names;
    for (std::size_t i = 0; i < shown; ++i) {
        names.push_back(holeName(under[i]) + " (" + checked.leadNames(checked.holeIndex(under[i])) +
                        ")");
    }
    if (shown < under.size()) names.push_back(std::to_string(under.size() - shown) + " more holes");
    return listed(names);
}

// link-over-lead warnings, in link order.
void findLinksOverLeads(const CheckedBoard& checked, const std::vector<int>& bare, double reach,
                        std::vector<Finding>& warnings) {
    for (int l : bare) {
        const Link& link = checked.board().links[static_cast<std::size_t>(l)];
        std::vector<Hole> under;
        forEachHoleNear(link, reach, false, [&](Hole h) {
            if (checked.holdsLead(checked.holeIndex(h))) under.push_back(h);
        });
        if (under.empty()) continue;
        std::sort(under.begin(), under.end());
        std::string message = "Bare link " + linkName(link) + " passes over " +
                              leadsPassedOver(checked, under) + ": the wire would touch " +
                              (under.size() > 1 ? "those leads" : "that lead");
        std::vector<Hole> holes{link.from, link.to};
        holes.insert(holes.end(), under.begin(), under.end());
        warnings.push_back(
            Finding::of(FindingType::LinkOverLead, std::move(message), std::move(holes)));
        warnings.back().fix = "sleeve the link or route it round";
    }
}

// links-touch warnings, in link order (and links-unchecked past kMaxPairs).
void findCrossings(const Board& board, const std::vector<int>& bare,
                   std::vector<Finding>& warnings) {
    bool complete = true;
    for (const auto& [i, j] : crossingCandidates(board, bare, complete)) {
        const Link& first = board.links[static_cast<std::size_t>(i)];
        const Link& second = board.links[static_cast<std::size_t>(j)];
        const std::optional<std::string> place = crossingPlace(first, second);
        if (!place) continue;
        warnings.push_back(Finding::of(FindingType::LinksTouch,
                                       "Bare links " + linkName(first) + " and " +
                                           linkName(second) + " cross " + *place +
                                           ": the wires would touch",
                                       {first.from, first.to, second.from, second.to}));
        warnings.back().fix = "sleeve one of them or route it round";
    }
    if (!complete) {
        warnings.push_back(Finding::of(FindingType::LinksUnchecked,
                                       "Too many bare links cross the same places to check every "
                                       "pair: check by eye where links cross"));
    }
}

}  // namespace

void findBareLinkContacts(const CheckedBoard& checked, std::vector<Finding>& warnings) {
    const Board& board = checked.board();
    const double reach = contactReach(board);
    std::vector<int> bare;
    bare.reserve(board.links.size());
    long passes = 0;  // holes passed over, by all the bare links together
    for (std::size_t l = 0; l < board.links.size(); ++l) {
        const Link& link = board.links[l];
        if (!isBare(board, link)) continue;
        bare.push_back(static_cast<int>(l));
        passes +=
            std::max(std::abs(link.to.row - link.from.row), std::abs(link.to.col - link.from.col)) -
            1;
    }
    if (passes > kPassesPerHole * board.holeCount() + kPassesFloor) {
        warnings.push_back(Finding::of(
            FindingType::LinksUnchecked,
            "Bare links pass over " + std::to_string(passes) +
                " holes in all, too many to check for leads under them or links crossing: check "
                "the links by eye"));
        return;
    }
    findLinksOverLeads(checked, bare, reach, warnings);
    findCrossings(board, bare, warnings);
}

}  // namespace netcheck
