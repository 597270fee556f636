#include "editor/panels/circuit_diff.hpp"

#include <algorithm>
#include <map>
#include <set>

#include "netcheck/check/connectivity.hpp"
#include "netcheck/model/value.hpp"

namespace stripsmith {
namespace {

using netcheck::PinRef;

struct BoardPartSummary {
    std::string kind;
    std::string value;
};

std::map<std::string, BoardPartSummary> boardParts(const netcheck::Board& board) {
    std::map<std::string, BoardPartSummary> out;
    for (const auto& part : board.parts) out[part.ref] = {part.kind, part.value};
    for (const auto& part : board.offboard) out[part.ref] = {part.kind, part.value};
    return out;
}

NetDifference compareNet(const std::string& name, const std::vector<PinRef>& pins,
                         const std::vector<std::vector<PinRef>>& groups,
                         const std::map<PinRef, std::size_t>& groupOf) {
    NetDifference diff{name, pins, {}, {}, {}};
    std::set<std::size_t> touched;
    for (const PinRef& pin : pins)
        if (auto it = groupOf.find(pin); it != groupOf.end()) touched.insert(it->second);
    std::set<PinRef> joined;
    for (std::size_t g : touched) joined.insert(groups[g].begin(), groups[g].end());
    diff.onBoard.assign(joined.begin(), joined.end());
    // The island holding most of the net's pins is the net on the board; the others are missing.
    std::map<std::size_t, int> count;
    for (const PinRef& pin : pins)
        if (auto it = groupOf.find(pin); it != groupOf.end()) ++count[it->second];
    std::size_t main = groups.size();
    int best = 0;
    for (auto [g, n] : count)
        if (n > best) best = n, main = g;
    const std::set<PinRef> named(pins.begin(), pins.end());
    for (const PinRef& pin : pins) {
        auto it = groupOf.find(pin);
        if (it == groupOf.end() || it->second != main) diff.missingOnBoard.push_back(pin);
    }
    for (const PinRef& pin : joined)
        if (!named.count(pin)) diff.extraOnBoard.push_back(pin);
    return diff;
}

}  // namespace

bool CircuitDifference::same() const {
    return partsOnlyOnBoard.empty() && partsOnlyInCircuit.empty() && parts.empty() &&
           std::all_of(nets.begin(), nets.end(), [](const NetDifference& n) { return n.same(); });
}

CircuitDifference compareBoardWithCircuit(const netcheck::Board& board) {
    CircuitDifference out;
    if (!board.circuit) return out;
    const netcheck::Circuit& circuit = *board.circuit;
    const auto groups = netcheck::boardNets(board);
    std::map<PinRef, std::size_t> groupOf;
    for (std::size_t g = 0; g < groups.size(); ++g)
        for (const PinRef& pin : groups[g]) groupOf[pin] = g;
    for (const auto& [name, pins] : circuit.nets)
        out.nets.push_back(compareNet(name, pins, groups, groupOf));

    const auto onBoard = boardParts(board);
    for (const auto& [ref, part] : onBoard) {
        const auto it = circuit.parts.find(ref);
        if (it == circuit.parts.end()) {
            out.partsOnlyOnBoard.push_back(ref);
            continue;
        }
        const bool sameKind = it->second.kind.empty() || it->second.kind == part.kind;
        const bool sameValue = it->second.value.empty() || part.value.empty() ||
                               netcheck::sameValue(part.value, it->second.value);
        if (!sameKind || !sameValue)
            out.parts.push_back({ref, part.kind, it->second.kind, part.value, it->second.value});
    }
    for (const auto& [ref, part] : circuit.parts)
        if (!onBoard.count(ref)) out.partsOnlyInCircuit.push_back(ref);
    return out;
}

}  // namespace stripsmith
