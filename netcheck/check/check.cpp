// Checking a board against its intended circuit.
//
// What the check decides, in the order a maker reads the report:
// - Copper: holes are nodes (row * cols + col), then off-board lugs. On strip board adjacent holes
//   of a row share copper unless a between cut scores the track or either hole is hole-cut; a
//   hole-cut hole touches no copper at all (a lead in it joins only what else is soldered in the
//   same hole). On pad board no two holes share copper. Links and wires join their ends. Part pins
//   sit at their hole's node.
// - Parts are matched by reference designator. A ref the circuit names (declared, or only used in
//   a net) that the board lacks is missing-part; a board part (on or off the board) the circuit
//   never names is extra-part. A pin the circuit uses that the board part lacks, or a declared pin
//   list that differs from the board part's, is pin-mismatch (that part's pins are then left out
//   of the net comparison). Values: kinds whose value is a quantity compare numerically
//   (value-mismatch, an error); other kinds compare as text (value-differs, a warning). An empty
//   value in the circuit is don't-care.
// - Orientation: non-polarised two-pin parts of a known kind may sit end for end. Each gets the
//   orientation whose pins agree best with the copper (the number of pins of other parts in the
//   same island and the same intended net); a tie keeps the part as written. Two rounds, so
//   neighbouring flipped parts settle. Pots and trimmers whose lugs 1 and 3 agree better swapped,
//   with the wiper agreeing as placed, are taken as swapped and get a pot-reversed warning (the
//   control works backwards but nothing is shorted). Polarised parts keep their pin names; if the
//   other way round (two pins) or another order (three-pin transistors and regulators) would agree
//   clearly better - at least two joins and more than twice as many - one reversed-part error
//   says so, beside the shorts and opens the reversal causes.
// - Pins of circuit parts that no net lists are don't-care.
// - short: one error per island holding pins of two or more intended nets, nets sorted, with the
//   shortest path between pins of the first net and another, and one cut that separates those
//   two pins without splitting any net of the island (a hole cut in a free hole near the middle of
//   the path preferred, else a cut between two holes), or "no single cut separates them".
// - open: one error per net whose pins lie in two or more islands; pieces sorted; links through
//   the nearest free holes, joining pieces Prim-style, found on the board with the shorts'
//   suggested cuts applied; when removing one existing cut alone mends the net without a short
//   (a cut made in the wrong hole), that is the fix instead.
// - shared-hole (two or more leads in one hole: part pins, link ends and wire ends all count) and
//   pin-on-cut (a lead in a hole-cut hole) are errors with or without a circuit.
// - Warnings: value-differs, pot-reversed, dangling-lead (an island with exactly one pin and no
//   link or wire end; with a circuit only when the circuit joins that pin to another),
//   link-over-lead and links-touch (a bare component-side link lying across a lead or another
//   bare link: a contact the copper cannot show), and trim (rows and columns at the edges
//   holding no pin, link end or wire end).
// - Without a circuit the report lists the islands that hold pins, with the lead findings and
//   warnings above.
// Findings are ordered: part findings by ref, shorts by island, opens by net, hole findings by
// hole; the same board always gives the same report.
#include "netcheck/check/check.hpp"

#include <algorithm>
#include <map>
#include <optional>

#include "netcheck/check/detail/check_context.hpp"
#include "netcheck/check/detail/circuit_match.hpp"
#include "netcheck/check/detail/lead_findings.hpp"
#include "netcheck/check/detail/link_findings.hpp"
#include "netcheck/check/detail/open_locator.hpp"
#include "netcheck/check/detail/short_locator.hpp"

namespace netcheck {

namespace {

// Shorts, and (for the dangling-lead rule) the islands holding a pin meant to join another pin: a
// pin the circuit leaves unconnected, or the only pin of its net, is meant to be alone.
void findShorts(const CheckContext& context, const std::vector<PlacedNet>& nets,
                std::vector<Finding>& errors, std::vector<char>& islandsWithNetPins,
                std::vector<int>& firstNet) {
    const Connectivity& copper = context.copper();
    firstNet.assign(static_cast<std::size_t>(copper.islandCount()), -1);
    islandsWithNetPins.assign(firstNet.size(), 0);
    std::vector<int> shortedIslands;
    for (std::size_t n = 0; n < nets.size(); ++n) {
        const char meantToJoin = nets[n].pins.size() > 1 ? 1 : 0;
        for (const NetPin& pin : nets[n].pins) {
            const auto island = static_cast<std::size_t>(pin.island);
            islandsWithNetPins[island] |= meantToJoin;
            int& first = firstNet[island];
            if (first < 0) first = static_cast<int>(n);
            if (first != static_cast<int>(n)) shortedIslands.push_back(pin.island);
        }
    }
    if (shortedIslands.empty()) return;
    std::map<int, std::vector<const PlacedNet*>> shorted;
    for (int island : shortedIslands) shorted[island];
    for (const PlacedNet& net : nets) {
        for (const NetPin& pin : net.pins) {
            auto it = shorted.find(pin.island);
            if (it == shorted.end()) continue;
            if (it->second.empty() || it->second.back() != &net) it->second.push_back(&net);
        }
    }
    for (const auto& [island, islandNets] : shorted) {
        errors.push_back(locateShort(context, island, islandNets));
    }
}

void findOpens(const CheckContext& context, const std::vector<PlacedNet>& nets,
               const std::vector<Finding>& shorts, std::vector<Finding>& errors) {
    std::vector<const PlacedNet*> open;
    for (const PlacedNet& net : nets) {
        if (net.pins.empty()) continue;
        const int first = net.pins.front().island;
        const bool split = std::any_of(net.pins.begin(), net.pins.end(),
                                       [&](const NetPin& pin) { return pin.island != first; });
        if (split) open.push_back(&net);
    }
    if (open.empty()) return;
    Board repaired = context.board();
    for (const Finding& finding : shorts) {
        if (finding.suggestedCut) repaired.cuts.push_back(*finding.suggestedCut);
    }
    const Connectivity repairedCopper(repaired);
    for (const PlacedNet* net : open) {
        errors.push_back(
            locateOpen(context, *net, RepairedBoard{&repaired, &repairedCopper, &nets}));
    }
}

// Islands that hold at least one pin or lug, in id order, with their holes and pins. Islands are
// numbered in id order before any is filled, and each hole list is sized before it is filled.
std::vector<Island> pinIslands(const CheckContext& context) {
    const Board& board = context.board();
    const Connectivity& copper = context.copper();
    std::vector<int> slot(static_cast<std::size_t>(copper.islandCount()), -1);
    auto slotOf = [&](int node) -> int& {
        return slot[static_cast<std::size_t>(copper.islandOfNode(node))];
    };
    for (const Lead& lead : context.leads()) {
        if (lead.kind == Lead::Kind::PartPin) slotOf(lead.hole) = 0;
    }
    for (std::size_t p = 0; p < board.offboard.size(); ++p) {
        for (std::size_t k = 0; k < board.offboard[p].pins.size(); ++k) {
            slotOf(context.lugNode(static_cast<int>(p), static_cast<int>(k))) = 0;
        }
    }
    std::vector<Island> islands;
    islands.reserve(static_cast<std::size_t>(std::count(slot.begin(), slot.end(), 0)));
    for (std::size_t id = 0; id < slot.size(); ++id) {
        if (slot[id] < 0) continue;
        slot[id] = static_cast<int>(islands.size());
        islands.push_back(Island{static_cast<int>(id), {}, {}});
    }
    std::vector<int> holeCount(islands.size(), 0);
    for (int hole = 0; hole < board.holeCount(); ++hole) {
        const int at = slotOf(hole);
        if (at >= 0) ++holeCount[static_cast<std::size_t>(at)];
    }
    for (std::size_t i = 0; i < islands.size(); ++i) {
        islands[i].holes.reserve(static_cast<std::size_t>(holeCount[i]));
    }
    for (const Lead& lead : context.leads()) {
        if (lead.kind != Lead::Kind::PartPin) continue;
        const Part& part = board.parts[static_cast<std::size_t>(lead.item)];
        islands[static_cast<std::size_t>(slotOf(lead.hole))].pins.push_back(
            PinRef{part.ref, part.pins[static_cast<std::size_t>(lead.sub)].name});
    }
    for (std::size_t p = 0; p < board.offboard.size(); ++p) {
        const OffboardPart& part = board.offboard[p];
        for (std::size_t k = 0; k < part.pins.size(); ++k) {
            islands[static_cast<std::size_t>(
                        slotOf(context.lugNode(static_cast<int>(p), static_cast<int>(k))))]
                .pins.push_back(PinRef{part.ref, part.pins[k]});
        }
    }
    for (int hole = 0; hole < board.holeCount(); ++hole) {
        const int at = slotOf(hole);
        if (at >= 0) islands[static_cast<std::size_t>(at)].holes.push_back(context.holeAt(hole));
    }
    for (Island& island : islands) std::sort(island.pins.begin(), island.pins.end());
    return islands;
}

}  // namespace

// What a Checker keeps between checks.
struct Checker::Workspace {
    std::optional<CheckContext> context;
    MatchMemory matchMemory;
    CircuitMatch match;
    std::vector<char> danglingIslands;
    std::vector<int> firstNetOfIsland;
};

Checker::Checker() = default;
Checker::~Checker() = default;
Checker::Checker(Checker&&) noexcept = default;
Checker& Checker::operator=(Checker&&) noexcept = default;

const Connectivity& Checker::copper() const { return workspace_->context->copper(); }

CheckReport Checker::check(const Board& board, const Circuit* circuit) {
    if (circuit == nullptr && board.circuit) circuit = &*board.circuit;
    if (!workspace_) workspace_ = std::make_unique<Workspace>();
    Workspace& work = *workspace_;
    if (work.context) {
        work.context->reset(board);
    } else {
        work.context.emplace(board);
    }
    const CheckContext& context = *work.context;
    CheckReport report;
    report.hasCircuit = circuit != nullptr;
    if (circuit != nullptr) {
        CircuitMatch& match = work.match;
        matchCircuit(context, *circuit, work.matchMemory, match);
        report.errors = std::move(match.errors);
        report.warnings = std::move(match.warnings);
        std::vector<Finding> shorts;
        findShorts(context, match.nets, shorts, work.danglingIslands, work.firstNetOfIsland);
        report.errors.insert(report.errors.end(), shorts.begin(), shorts.end());
        findOpens(context, match.nets, shorts, report.errors);
    }
    findSharedHoles(context, report.errors);
    findLeadsOnCuts(context, report.errors);
    findDanglingLeads(context, circuit ? &work.danglingIslands : nullptr, report.warnings);
    findBareLinkContacts(context, report.warnings);
    findTrim(context, report.warnings);
    // With a circuit the findings say everything; the island list is the report of a board alone.
    if (circuit == nullptr) report.islands = pinIslands(context);
    return report;
}

CheckReport check(const Board& board, const Circuit* circuit) {
    return Checker().check(board, circuit);
}

}  // namespace netcheck
