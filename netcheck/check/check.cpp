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
//   never names is extra-part. A pin the circuit uses that the board part lacks is pin-mismatch,
//   and that part's pins are then left out of the net comparison; a declared pin list that
//   differs from the board part's is pin-mismatch too, but its pins still take part. Values: kinds whose value is a quantity compare numerically
//   (value-mismatch, an error); other kinds compare as text (value-differs, a warning). An empty
//   value in the circuit is don't-care.
// - Orientation: non-polarised two-pin parts of a known kind may sit end for end. Each gets the
//   orientation whose pins agree best with the copper (the number of pins of other parts in the
//   same island and the same intended net); a tie keeps the part as written. Two rounds, so
//   neighbouring flipped parts settle. Pots and trimmers whose lugs 1 and 3 agree better swapped,
//   with the wiper agreeing as placed, are taken as swapped and get a pot-reversed warning (the
//   control works backwards but nothing is shorted). A pin whose hole lies outside the board
//   (only a board made in code can have one: the file reader refuses it) joins nothing and is
//   left out of the nets. Polarised parts keep their pin names; if the
//   other way round (two pins) or another order (three-pin transistors and regulators) would agree
//   clearly better - at least two joins and more than twice as many - one reversed-part error
//   says so, beside the shorts and opens the reversal causes.
// - Pins of circuit parts that no net lists are don't-care.
// - short: one error per island holding pins of two or more intended nets, nets sorted, with the
//   shortest path between pins of the first net and another.
// - open: one error per net whose pins lie in two or more islands; pieces sorted.
// - The fixes of shorts and opens (a cut, a cut to remove, links) are not the check's: they are
//   found and verified by the repair code (repair/finding_fixes.hpp).
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

#include "netcheck/check/checked_board.hpp"
#include "netcheck/check/circuit_match.hpp"
#include "netcheck/check/detail/finders.hpp"

namespace netcheck {

namespace {

// The shorts, one per island holding pins of two or more nets. `meantToJoin` flags the islands
// holding a pin meant to join another (for dangling-lead: a pin the circuit leaves unconnected,
// or the only pin of its net, is meant to be alone).
std::vector<Finding> findShorts(const CheckedBoard& checked, const std::vector<Net>& nets,
                                std::vector<char>& meantToJoin, bool locate) {
    const auto islands = static_cast<std::size_t>(checked.copper().islandCount());
    meantToJoin.assign(islands, 0);
    std::vector<const Net*> firstNet(islands, nullptr);
    std::map<int, std::vector<const Net*>> shorted;  // island -> its nets, in net order
    for (const Net& net : nets) {
        for (const NetPin& pin : net.pins) {
            const auto island = static_cast<std::size_t>(pin.island);
            if (net.pins.size() > 1) meantToJoin[island] = 1;
            if (firstNet[island] == nullptr) firstNet[island] = &net;
            if (firstNet[island] == &net) continue;
            std::vector<const Net*>& here = shorted[pin.island];
            if (here.empty()) here.push_back(firstNet[island]);
            if (here.back() != &net) here.push_back(&net);
        }
    }
    std::vector<Finding> shorts;
    for (const auto& [island, islandNets] : shorted) {
        if (locate) {
            shorts.push_back(locateShort(checked, island, islandNets));
            continue;
        }
        Finding& named = shorts.emplace_back();
        named.type = FindingType::Short;
        for (const Net* net : islandNets) named.nets.emplace_back(net->name);
    }
    return shorts;
}

// The opens, one per net whose pins lie in two or more islands.
std::vector<Finding> findOpens(const CheckedBoard& checked, const std::vector<Net>& nets, bool locate) {
    std::vector<const Net*> open;
    for (const Net& net : nets) {
        for (const NetPin& pin : net.pins) {
            if (pin.island != net.pins.front().island) {
                open.push_back(&net);
                break;
            }
        }
    }
    if (open.empty()) return {};
    if (!locate) {
        std::vector<Finding> named(open.size());
        for (std::size_t i = 0; i < open.size(); ++i) {
            named[i].type = FindingType::Open;
            named[i].net = std::string(open[i]->name);
        }
        return named;
    }
    std::vector<Finding> opens;
    for (const Net* net : open) opens.push_back(locateOpen(checked, *net));
    return opens;
}

// Islands that hold at least one pin or lug, in id order, with their holes and pins.
std::vector<Island> pinIslands(const CheckedBoard& checked) {
    const Board& board = checked.board();
    const Connectivity& copper = checked.copper();
    std::vector<int> slot(static_cast<std::size_t>(copper.islandCount()), -1);
    std::vector<Island> islands;
    auto islandOf = [&](int node) -> Island& {
        int& at = slot[static_cast<std::size_t>(copper.islandOfNode(node))];
        if (at < 0) {
            at = static_cast<int>(islands.size());
            islands.push_back(Island{copper.islandOfNode(node), {}, {}});
        }
        return islands[static_cast<std::size_t>(at)];
    };
    for (const Lead& lead : checked.leads()) {
        if (lead.kind != Lead::Kind::PartPin) continue;
        const Part& part = board.parts[static_cast<std::size_t>(lead.item)];
        islandOf(lead.hole).pins.push_back(PinRef{part.ref, part.pins[static_cast<std::size_t>(lead.sub)].name});
    }
    int node = board.holeCount();
    for (const OffboardPart& part : board.offboard) {
        for (const std::string& lug : part.pins) islandOf(node++).pins.push_back(PinRef{part.ref, lug});
    }
    for (int hole = 0; hole < board.holeCount(); ++hole) {
        const int at = slot[static_cast<std::size_t>(copper.islandOfNode(hole))];
        if (at >= 0) islands[static_cast<std::size_t>(at)].holes.push_back(checked.holeAt(hole));
    }
    for (Island& island : islands) std::sort(island.pins.begin(), island.pins.end());
    std::sort(islands.begin(), islands.end(), [](const Island& a, const Island& b) { return a.id < b.id; });
    return islands;
}

CheckReport checkBoard(const CheckedBoard& checked, const Circuit* circuit, const CheckOptions& options) {
    if (circuit == nullptr && checked.board().circuit) circuit = &*checked.board().circuit;
    CheckReport report;
    report.hasCircuit = circuit != nullptr;
    std::vector<char> meantToJoin;
    if (circuit != nullptr) {
        CircuitMatch match = matchCircuit(checked, *circuit);
        report.errors = std::move(match.errors);
        report.warnings = std::move(match.warnings);
        const std::vector<Finding> shorts =
            findShorts(checked, match.nets, meantToJoin, options.locateFaults);
        const std::vector<Finding> opens = findOpens(checked, match.nets, options.locateFaults);
        report.errors.insert(report.errors.end(), shorts.begin(), shorts.end());
        report.errors.insert(report.errors.end(), opens.begin(), opens.end());
    }
    findSharedHoles(checked, report.errors);
    findLeadsOnCuts(checked, report.errors);
    findDanglingLeads(checked, circuit ? &meantToJoin : nullptr, report.warnings);
    findBareLinkContacts(checked, report.warnings);
    findTrim(checked, report.warnings);
    // With a circuit the findings say everything; the island list is the report of a board alone.
    if (circuit == nullptr) report.islands = pinIslands(checked);
    return report;
}

}  // namespace

CheckReport check(const Board& board, const Circuit* circuit, const CheckOptions& options) {
    return checkBoard(CheckedBoard(board), circuit, options);
}

CheckReport Checker::check(const Board& board, const Circuit* circuit, const CheckOptions& options) {
    const CheckedBoard checked(board);
    CheckReport report = checkBoard(checked, circuit, options);
    copper_.emplace(checked.copper());
    return report;
}

}  // namespace netcheck
