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
//   differs from the board part's is pin-mismatch too, but its pins still take part. Values: kinds
//   whose value is a quantity compare numerically (value-mismatch, an error); other kinds compare
//   as text (value-differs, a warning). An empty value in the circuit is don't-care.
// - Orientation: non-polarised two-pin parts of a known kind may sit end for end. Each gets the
//   orientation whose pins agree best with the copper (the number of pins of other parts in the
//   same island and the same intended net). A tie between two different nets is broken by the
//   other end-for-end parts counted under both of their nets (they could be turned too, but still
//   say which nets meet in an island); a full tie keeps the part as written. Two rounds, so
//   neighbouring flipped parts settle. Pots and trimmers whose lugs 1 and 3 agree better swapped,
//   with the wiper agreeing as placed, are taken as swapped and get a pot-reversed warning (the
//   control works backwards but nothing is shorted). A pin whose hole lies outside the board
//   (only a board made in code can have one: the file reader refuses it) joins nothing and is
//   left out of the nets. Polarised parts keep their pin names; if the other way round (two
//   pins) or another order (three-pin transistors and regulators) would agree
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
void findShorts(const CheckedBoard& checked, const std::vector<Net>& nets, bool locate,
                std::vector<Finding>& errors, std::vector<char>& meantToJoin) {
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
    for (const auto& [island, islandNets] : shorted) {
        errors.push_back(locateShort(checked, island, islandNets, locate));
    }
}

// The opens, one per net whose pins lie in two or more islands.
void findOpens(const CheckedBoard& checked, const std::vector<Net>& nets, bool locate,
               std::vector<Finding>& errors) {
    for (const Net& net : nets) {
        auto elsewhere = [&](const NetPin& pin) { return pin.island != net.pins.front().island; };
        if (std::any_of(net.pins.begin(), net.pins.end(), elsewhere)) {
            errors.push_back(locateOpen(checked, net, locate));
        }
    }
}

CheckReport checkBoard(const CheckedBoard& checked, const Circuit* circuit,
                       const CheckOptions& options) {
    if (circuit == nullptr && checked.board().circuit) circuit = &*checked.board().circuit;
    CheckReport report;
    report.hasCircuit = circuit != nullptr;
    std::vector<char> meantToJoin;
    if (circuit != nullptr) {
        CircuitMatch match = matchCircuit(checked, *circuit);
        report.errors = std::move(match.errors);
        report.warnings = std::move(match.warnings);
        findShorts(checked, match.nets, options.locateFaults, report.errors, meantToJoin);
        findOpens(checked, match.nets, options.locateFaults, report.errors);
    }
    findSharedHoles(checked, report.errors);
    findLeadsOnCuts(checked, report.errors);
    findDanglingLeads(checked, circuit ? &meantToJoin : nullptr, report.warnings);
    findBareLinkContacts(checked, report.warnings);
    findTrim(checked, report.warnings);
    // With a circuit the findings say everything; the island list is the report of a board alone.
    if (circuit == nullptr) {
        report.islands = checked.copper().islands();
        std::erase_if(report.islands, [](const Island& island) { return island.pins.empty(); });
    }
    return report;
}

}  // namespace

CheckReport check(const Board& board, const Circuit* circuit, const CheckOptions& options) {
    return checkBoard(CheckedBoard(board), circuit, options);
}

CheckReport Checker::check(const Board& board, const Circuit* circuit,
                           const CheckOptions& options) {
    const CheckedBoard checked(board);
    CheckReport report = checkBoard(checked, circuit, options);
    copper_.emplace(checked.copper());
    return report;
}

}  // namespace netcheck
