// Short location. The path is a breadth-first search over the island (strip neighbours joined by
// copper, links and wires), from every pin of the first net to the nearest pin of another net.
// The cut that mends it is found by the repair code (repair/finding_fixes.cpp), along this path.
#include "netcheck/check/detail/finders.hpp"

#include <algorithm>
#include <cstdlib>
#include <deque>
#include <set>
#include <unordered_map>

namespace netcheck {

namespace {

struct PinAt {
    const NetPin* pin = nullptr;
    int net = 0;  // index into the nets list
};

class IslandGraph {
public:
    IslandGraph(const CheckedBoard& checked) : checked_(checked) {
        for (auto [a, b] : checked.jumpers()) {
            jumpers_[a].push_back(b);
            jumpers_[b].push_back(a);
        }
    }

    template <class Visit>
    void forEachNeighbour(int node, Visit visit) const {
        if (checked_.isHoleNode(node)) {
            const Hole hole = checked_.holeAt(node);
            const Connectivity& copper = checked_.copper();
            if (hole.col > 0 && copper.joinsNext(Hole{hole.row, hole.col - 1})) visit(node - 1);
            if (copper.joinsNext(hole)) visit(node + 1);
        }
        auto it = jumpers_.find(node);
        if (it == jumpers_.end()) return;
        for (int other : it->second) visit(other);
    }

private:
    const CheckedBoard& checked_;
    std::unordered_map<int, std::vector<int>> jumpers_;
};

// Nodes from a pin of net 0 to the nearest pin of another net, both ends included.
std::vector<int> shortestPath(const IslandGraph& graph,
                              const std::unordered_map<int, std::vector<PinAt>>& pinsAt, int& start,
                              int& end) {
    std::unordered_map<int, int> parent;
    std::deque<int> queue;
    std::vector<int> sources;
    for (const auto& [node, pins] : pinsAt) {
        if (std::any_of(pins.begin(), pins.end(), [](const PinAt& p) { return p.net == 0; })) {
            sources.push_back(node);
        }
    }
    std::sort(sources.begin(), sources.end());
    for (int node : sources) {
        parent[node] = node;
        queue.push_back(node);
    }
    auto isTarget = [&](int node) {
        auto it = pinsAt.find(node);
        return it != pinsAt.end() && std::any_of(it->second.begin(), it->second.end(),
                                                 [](const PinAt& p) { return p.net != 0; });
    };
    while (!queue.empty()) {
        const int node = queue.front();
        queue.pop_front();
        if (isTarget(node)) {
            std::vector<int> path{node};
            while (parent[path.back()] != path.back()) path.push_back(parent[path.back()]);
            std::reverse(path.begin(), path.end());
            start = path.front();
            end = node;
            return path;
        }
        graph.forEachNeighbour(node, [&](int next) {
            if (parent.emplace(next, node).second) queue.push_back(next);
        });
    }
    return {};
}

std::string pinText(const CheckedBoard& checked, const PinAt& pin) {
    const std::string name = pin.pin->name();
    return checked.isHoleNode(pin.pin->node) ? name + " (" + checked.nodeName(pin.pin->node) + ")"
                                             : name + " (off board)";
}

const PinAt& pinOfNet(const std::vector<PinAt>& pins, bool firstNet) {
    for (const PinAt& pin : pins) {
        if ((pin.net == 0) == firstNet) return pin;
    }
    return pins.front();
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

Finding locateShort(const CheckedBoard& checked, int island,
                    const std::vector<const Net*>& nets) {
    Finding finding;
    finding.type = FindingType::Short;
    for (const Net* net : nets) finding.nets.emplace_back(net->name);
    std::unordered_map<int, std::vector<PinAt>> pinsAt;
    const Connectivity& copper = checked.copper();
    for (std::size_t n = 0; n < nets.size(); ++n) {
        for (const NetPin& pin : nets[n]->pins) {
            if (copper.islandOfNode(pin.node) == island) {
                pinsAt[pin.node].push_back(PinAt{&pin, static_cast<int>(n)});
            }
        }
    }
    const IslandGraph graph(checked);
    int start = -1;
    int end = -1;
    const std::vector<int> path = shortestPath(graph, pinsAt, start, end);
    std::string names;
    for (const std::string& name : finding.nets) names += (names.empty() ? "" : ", ") + name;
    for (int node : path) {
        if (checked.isHoleNode(node)) finding.path.push_back(checked.holeAt(node));
    }
    finding.holes = finding.path;
    if (path.empty()) {
        finding.message = names + " share one island";
        return finding;
    }
    const PinAt& from = pinOfNet(pinsAt.at(start), true);
    const PinAt& to = pinOfNet(pinsAt.at(end), false);
    finding.message = names + ": " + (start == end ? "one hole holds " : routeText(checked, path)) +
                      pinText(checked, from) + " and " + pinText(checked, to);
    return finding;
}

}  // namespace netcheck
