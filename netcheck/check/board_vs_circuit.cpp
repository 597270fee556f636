#include "netcheck/check/board_vs_circuit.hpp"

#include <algorithm>
#include <map>
#include <set>

#include "netcheck/check/checked_board.hpp"
#include "netcheck/check/circuit_match.hpp"

namespace netcheck {

namespace {

// Every pin on the board by island, named as the circuit names it where the check matched the
// part (and by its board name where the circuit does not know the part). Pins of circuit parts
// that no net lists are don't-care, as in the check: they go into `dontCare` too.
std::map<int, std::vector<PinRef>> pinsByIsland(const CheckedBoard& checked,
                                                const CircuitMatch& match, std::set<PinRef>& dontCare) {
    std::map<std::string_view, const MatchedPart*> matched;
    for (const MatchedPart& part : match.parts) matched.emplace(part.ref, &part);
    std::map<int, std::vector<PinRef>> byIsland;
    auto add = [&](const std::string& ref, std::size_t k, std::string_view name, int island) {
        const auto it = matched.find(ref);
        const bool same = it != matched.end() && k < it->second->pins.size() &&
                          it->second->pins[k].name == name;
        if (island < 0) return;
        PinRef pin{ref, std::string(same ? it->second->pins[k].meant : name)};
        if (same && it->second->pins[k].net < 0) dontCare.insert(pin);
        byIsland[island].push_back(std::move(pin));
    };
    const Board& board = checked.board();
    const Connectivity& copper = checked.copper();
    for (const Part& part : board.parts) {
        for (std::size_t k = 0; k < part.pins.size(); ++k)
            add(part.ref, k, part.pins[k].name, copper.islandOfHole(part.pins[k].hole));
    }
    for (const OffboardPart& part : board.offboard) {
        for (std::size_t k = 0; k < part.pins.size(); ++k)
            add(part.ref, k, part.pins[k], copper.islandOfPin(PinRef{part.ref, part.pins[k]}));
    }
    return byIsland;
}

NetDifference compareNet(const Net& net, const std::vector<PinRef>& named,
                         const std::map<int, std::vector<PinRef>>& pinsOfIsland,
                         const std::set<PinRef>& dontCare) {
    NetDifference diff{std::string(net.name), named, {}, {}, {}};
    // The island holding most of the net's pins is the net on the board (the first such island
    // on a tie); the net's pins elsewhere, or not on the board at all, are missing.
    std::map<int, int> count;
    for (const NetPin& pin : net.pins) ++count[pin.island];
    int main = -1;
    for (const auto& [island, n] : count) {
        if (main < 0 || n > count[main]) main = island;
    }
    std::set<PinRef> joined;
    for (const auto& [island, n] : count) {
        const std::vector<PinRef>& pins = pinsOfIsland.at(island);
        joined.insert(pins.begin(), pins.end());
    }
    diff.onBoard.assign(joined.begin(), joined.end());
    std::set<PinRef> inMain;
    for (const NetPin& pin : net.pins) {
        if (pin.island == main) inMain.insert(pin.pinRef());
    }
    for (const PinRef& pin : named) {
        if (!inMain.count(pin)) diff.missingOnBoard.push_back(pin);
    }
    const std::set<PinRef> namedSet(named.begin(), named.end());
    for (const PinRef& pin : joined) {
        if (!namedSet.count(pin) && !dontCare.count(pin)) diff.extraOnBoard.push_back(pin);
    }
    return diff;
}

}  // namespace

bool CircuitDifference::same() const {
    return partsOnlyOnBoard.empty() && partsOnlyInCircuit.empty() && parts.empty() &&
           std::all_of(nets.begin(), nets.end(), [](const NetDifference& n) { return n.same(); });
}

CircuitDifference compareBoardWithCircuit(const Board& board) {
    CircuitDifference out;
    if (!board.circuit) return out;
    const Circuit& circuit = *board.circuit;
    const CheckedBoard checked(board);
    const CircuitMatch match = matchCircuit(checked, circuit);
    std::set<PinRef> dontCare;
    const std::map<int, std::vector<PinRef>> pinsOfIsland = pinsByIsland(checked, match, dontCare);
    std::size_t n = 0;
    for (const auto& [name, pins] : circuit.nets) {
        out.nets.push_back(compareNet(match.nets[n++], pins, pinsOfIsland, dontCare));
    }
    for (const std::vector<Finding>* findings : {&match.errors, &match.warnings}) {
        for (const Finding& finding : *findings) {
            if (finding.type == FindingType::ExtraPart) out.partsOnlyOnBoard.push_back(finding.ref);
            if (finding.type == FindingType::MissingPart) out.partsOnlyInCircuit.push_back(finding.ref);
            if (finding.type != FindingType::ValueMismatch && finding.type != FindingType::ValueDiffers)
                continue;
            const auto matched = std::find_if(match.parts.begin(), match.parts.end(),
                                              [&](const MatchedPart& p) { return p.ref == finding.ref; });
            out.parts.push_back({finding.ref, matched->kind(), matched->declared->kind,
                                 matched->value(), matched->declared->value});
        }
    }
    return out;
}

}  // namespace netcheck
