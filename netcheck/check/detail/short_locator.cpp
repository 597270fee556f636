// Short location. The path is a breadth-first search over the island (strip neighbours joined by
// copper, links and wires), from every pin of the first net to the nearest pin of another net.
// The cut that mends it is found by the repair code (repair/finding_fixes.cpp), along this path.
#include "netcheck/check/detail/finders.hpp"

#include <algorithm>
#include <cstdlib>
#include <deque>
#include <map>
#include <set>
#include <unordered_map>

#include "netcheck/model/wording.hpp"

namespace netcheck {

namespace {

struct PinAt {
    const NetPin* pin = nullptr;
    std::size_t net = 0;  // index into the short's nets: 0 is the first
};
// Node -> the pins there, in net order (a multimap keeps equal keys in insertion order).
using PinsAt = std::multimap<int, PinAt>;

// Nodes from a pin of the first net to the nearest pin of another net, both ends included.
std::vector<int> shortestPath(const CheckedBoard& checked, const PinsAt& pinsAt) {
    std::multimap<int, int> jumpers;  // both ways, in board order
    for (const auto& [a, b] : checked.copper().jumpers()) {
        jumpers.emplace(a, b);
        jumpers.emplace(b, a);
    }
    std::unordered_map<int, int> parent;  // node -> the node it was reached from
    std::deque<int> queue;
    for (const auto& [node, at] : pinsAt) {
        if (at.net == 0 && parent.emplace(node, node).second) queue.push_back(node);
    }
    while (!queue.empty()) {
        const int node = queue.front();
        queue.pop_front();
        const auto [first, last] = pinsAt.equal_range(node);
        if (std::any_of(first, last, [](const auto& at) { return at.second.net != 0; })) {
            std::vector<int> path{node};
            while (parent[path.back()] != path.back()) path.push_back(parent[path.back()]);
            std::reverse(path.begin(), path.end());
            return path;
        }
        auto visit = [&](int next) {
            if (parent.emplace(next, node).second) queue.push_back(next);
        };
        if (checked.isHoleNode(node)) {
            const Hole hole = checked.holeAt(node);
            if (hole.col > 0 && checked.copper().joinsNext(Hole{hole.row, hole.col - 1}))
                visit(node - 1);
            if (checked.copper().joinsNext(hole)) visit(node + 1);
        }
        const auto [from, to] = jumpers.equal_range(node);
        for (auto it = from; it != to; ++it) visit(it->second);
    }
    return {};
}

// "R1.2 (D7)": the first pin at `node` of the first net, or of another net.
std::string pinText(const CheckedBoard& checked, const PinsAt& pinsAt, int node, bool firstNet) {
    const auto [first, last] = pinsAt.equal_range(node);
    const auto it =
        std::find_if(first, last, [&](const auto& at) { return (at.second.net == 0) == firstNet; });
    const NetPin& pin = *(it == last ? first : it)->second.pin;
    return pin.name() + " (" + (checked.isHoleNode(node) ? checked.nodeName(node) : "off board") +
           ")";
}

std::string routeText(const CheckedBoard& checked, const std::vector<int>& path) {
    std::set<int> rows;
    bool jumps = false;
    for (std::size_t i = 0; i < path.size(); ++i) {
        if (!checked.isHoleNode(path[i])) {
            jumps = true;
            continue;
        }
        rows.insert(checked.holeAt(path[i]).row);
        if (i > 0 && std::abs(path[i] - path[i - 1]) != 1) jumps = true;
    }
    std::string strips;
    for (int row : rows) strips += (strips.empty() ? "" : ", ") + rowName(row);
    if (rows.size() == 1 && !jumps) return "strip " + strips + " joins ";
    return std::string(rows.size() == 1 ? "strip " : "strips ") + strips +
           (jumps ? " with links or wires" : "") + " join ";
}

}  // namespace

Finding locateShort(const CheckedBoard& checked, int island, const std::vector<const Net*>& nets,
                    bool locate) {
    Finding finding;
    finding.type = FindingType::Short;
    for (const Net* net : nets) finding.nets.emplace_back(net->name);
    if (!locate) return finding;
    PinsAt pinsAt;
    for (std::size_t n = 0; n < nets.size(); ++n) {
        for (const NetPin& pin : nets[n]->pins) {
            if (pin.island == island) pinsAt.emplace(pin.node, PinAt{&pin, n});
        }
    }
    const std::vector<int> path = shortestPath(checked, pinsAt);
    for (int node : path) {
        if (checked.isHoleNode(node)) finding.path.push_back(checked.holeAt(node));
    }
    finding.holes = finding.path;
    const std::string names = joined(finding.nets);
    if (path.empty()) {
        finding.message = names + " share one island";
        return finding;
    }
    finding.message = names + ": " +
                      (path.size() == 1 ? "one hole holds " : routeText(checked, path)) +
                      pinText(checked, pinsAt, path.front(), true) + " and " +
                      pinText(checked, pinsAt, path.back(), false);
    return finding;
}

}  // namespace netcheck
