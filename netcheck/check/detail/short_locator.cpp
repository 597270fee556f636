// Short location. The path is a breadth-first search over the island (strip neighbours joined by
// copper, links and wires), from every pin of the first net to the nearest pin of another net.
// Cut candidates lie on the path's strip runs; each is tried on a copy of the board and kept only
// when the two pins fall apart and no net of the island is split.
#include "netcheck/check/detail/finders.hpp"

#include <algorithm>
#include <cstdlib>
#include <deque>
#include <set>
#include <unordered_map>

namespace netcheck {

namespace {

constexpr std::size_t kMaxCutTrials = 48;

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

// True when the board already has a cut of the same kind in the same column on a neighbouring
// strip: makers like cuts in a line (one pass of the cutter, easy to check by eye).
bool inLineWithACut(const Board& board, const Cut& cut) {
    for (const Cut& other : board.cuts) {
        if (other.kind == cut.kind && other.hole.col == cut.hole.col &&
            std::abs(other.hole.row - cut.hole.row) == 1) {
            return true;
        }
    }
    return false;
}

// Candidate cuts along the path's strip runs: hole cuts in free holes first (a spot-face cutter in
// a free hole is the usual practice), then cuts between holes; within each, cuts in line with an
// existing cut first, then nearest the middle of the path.
std::vector<Cut> cutCandidates(const CheckedBoard& checked, const std::vector<int>& path) {
    std::vector<std::pair<int, Cut>> holeCuts;
    std::vector<std::pair<int, Cut>> betweenCuts;
    const int middle = static_cast<int>(path.size()) - 1;  // twice the middle index
    auto rank = [&](const Cut& cut, int distance) {
        return (inLineWithACut(checked.board(), cut) ? 0 : 1 << 24) + distance;
    };
    std::set<int> holeCutSeen;
    for (std::size_t i = 0; i + 1 < path.size(); ++i) {
        const int a = path[i];
        const int b = path[i + 1];
        if (!checked.isHoleNode(a) || !checked.isHoleNode(b) || std::abs(a - b) != 1) continue;
        const Hole left = checked.holeAt(std::min(a, b));
        if (checked.holeAt(std::max(a, b)).row != left.row) continue;
        const Cut between{left, Cut::Kind::Between};
        betweenCuts.push_back(
            {rank(between, std::abs(static_cast<int>(2 * i + 1) - middle)), between});
        for (std::size_t j : {i, i + 1}) {
            if (checked.isFree(path[j]) && holeCutSeen.insert(path[j]).second) {
                const Cut holeCut{checked.holeAt(path[j]), Cut::Kind::Hole};
                holeCuts.push_back(
                    {rank(holeCut, std::abs(static_cast<int>(2 * j) - middle)), holeCut});
            }
        }
    }
    auto better = [](const auto& x, const auto& y) { return x.first < y.first; };
    std::stable_sort(holeCuts.begin(), holeCuts.end(), better);
    std::stable_sort(betweenCuts.begin(), betweenCuts.end(), better);
    std::vector<Cut> cuts;
    for (const auto& entry : holeCuts) cuts.push_back(entry.second);
    for (const auto& entry : betweenCuts) cuts.push_back(entry.second);
    return cuts;
}

// True when, after `cut`, the two ends fall apart and every net keeps its island's pins together.
bool separatesCleanly(const Board& trial, int start, int end,
                      const std::vector<const Net*>& nets,
                      const std::unordered_map<int, std::vector<PinAt>>& pinsAt) {
    const Connectivity copper(trial);
    if (copper.islandOfNode(start) == copper.islandOfNode(end)) return false;
    std::vector<int> islandOfNet(nets.size(), -1);
    for (const auto& [node, pins] : pinsAt) {
        for (const PinAt& pin : pins) {
            int& island = islandOfNet[static_cast<std::size_t>(pin.net)];
            const int now = copper.islandOfNode(node);
            if (island >= 0 && island != now) return false;
            island = now;
        }
    }
    return true;
}

std::optional<Cut> suggestCut(const CheckedBoard& checked, const std::vector<int>& path, int start,
                              int end, const std::vector<const Net*>& nets,
                              const std::unordered_map<int, std::vector<PinAt>>& pinsAt) {
    std::vector<Cut> candidates = cutCandidates(checked, path);
    if (candidates.size() > kMaxCutTrials) candidates.resize(kMaxCutTrials);
    if (candidates.empty()) return std::nullopt;
    Board trial = copperOnly(checked.board());
    for (const Cut& cut : candidates) {
        trial.cuts.push_back(cut);
        const bool good = separatesCleanly(trial, start, end, nets, pinsAt);
        trial.cuts.pop_back();
        if (good) return cut;
    }
    return std::nullopt;
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

std::string cutFix(const Cut& cut) {
    if (cut.kind == Cut::Kind::Hole) return "cut at " + holeName(cut.hole);
    return "cut between " + holeName(cut.hole) + " and " +
           holeName(Hole{cut.hole.row, cut.hole.col + 1});
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
    finding.suggestedCut = suggestCut(checked, path, start, end, nets, pinsAt);
    finding.fix = finding.suggestedCut ? cutFix(*finding.suggestedCut)
                                       : std::string("no single cut separates them");
    return finding;
}

}  // namespace netcheck
