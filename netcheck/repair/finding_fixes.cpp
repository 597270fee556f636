// The fix of each short and open on its own. Every candidate is tried on a copy of the board's
// copper alone (copperOnly): cheap to copy and trace even on a board of 100,000 parts.
#include "netcheck/repair/finding_fixes.hpp"

#include <algorithm>
#include <cstdlib>
#include <limits>
#include <map>
#include <optional>
#include <set>

#include "netcheck/check/checked_board.hpp"
#include "netcheck/check/circuit_match.hpp"
#include "netcheck/model/link_geometry.hpp"

namespace netcheck {

namespace {

// Bounds on the trials per finding, so a board with hundreds of faults is still answered at once.
constexpr std::size_t kMaxCutTrials = 48;
constexpr std::size_t kMaxCutRemovals = 16;

// The board's copper alone: grid, cuts, links, wires and off-board lugs, with each wire end on an
// on-board part's lead turned into that lead's hole. It traces exactly like the board and is cheap
// to copy, for trying cuts (a board of 100,000 parts and its circuit is not).
Board copperOnly(const CheckedBoard& checked) {
    const Board& board = checked.board();
    Board copper;
    copper.rows = board.rows;
    copper.cols = board.cols;
    copper.copper = board.copper;
    copper.cuts = board.cuts;
    copper.links = board.links;
    for (const OffboardPart& part : board.offboard) copper.offboard.push_back({part.ref, part.kind, {}, part.pins, {}});
    for (const Wire& wire : board.wires) {
        Wire bare{wire.from, wire.to, {}, {}};
        for (Endpoint* end : {&bare.from, &bare.to}) {
            const int node = checked.copper().endpointNode(*end);
            if (checked.isHoleNode(node)) *end = Endpoint::atHole(checked.holeAt(node));
        }
        copper.wires.push_back(std::move(bare));
    }
    return copper;
}

// ---- Shorts ----------------------------------------------------------------------------------

// True when the board already has a cut of the same kind in the same column on a neighbouring
// strip: makers like cuts in a line (one pass of the cutter, easy to check by eye).
bool inLineWithACut(const Board& board, const Cut& cut) {
    return std::any_of(board.cuts.begin(), board.cuts.end(), [&](const Cut& other) {
        return other.kind == cut.kind && other.hole.col == cut.hole.col &&
               std::abs(other.hole.row - cut.hole.row) == 1;
    });
}

// Candidate cuts along the path's strip runs: hole cuts in free holes first (a spot-face cutter in
// a free hole is the usual practice), then cuts between holes; within each, cuts in line with an
// existing cut first, then nearest the middle of the path.
std::vector<Cut> cutCandidates(const CheckedBoard& checked, const std::vector<Hole>& path) {
    std::vector<std::pair<int, Cut>> holeCuts;
    std::vector<std::pair<int, Cut>> betweenCuts;
    const int middle = static_cast<int>(path.size()) - 1;  // twice the middle index
    auto rank = [&](const Cut& cut, int distance) {
        return (inLineWithACut(checked.board(), cut) ? 0 : 1 << 24) + distance;
    };
    std::set<int> holeCutSeen;
    for (std::size_t i = 0; i + 1 < path.size(); ++i) {
        const Hole a = path[i];
        const Hole b = path[i + 1];
        if (a.row != b.row || std::abs(a.col - b.col) != 1) continue;
        const Cut between{Hole{a.row, std::min(a.col, b.col)}, Cut::Kind::Between};
        betweenCuts.push_back({rank(between, std::abs(static_cast<int>(2 * i + 1) - middle)), between});
        for (std::size_t j : {i, i + 1}) {
            const int hole = checked.holeIndex(path[j]);
            if (checked.isFree(hole) && holeCutSeen.insert(hole).second) {
                const Cut holeCut{path[j], Cut::Kind::Hole};
                holeCuts.push_back({rank(holeCut, std::abs(static_cast<int>(2 * j) - middle)), holeCut});
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

// True when, on `trial`, the two ends fall apart and every net keeps its pins (those that were in
// the short's island, `netNodes`) together.
bool separatesCleanly(const Board& trial, int start, int end,
                      const std::vector<std::vector<int>>& netNodes) {
    const Connectivity copper(trial);
    if (copper.islandOfNode(start) == copper.islandOfNode(end)) return false;
    return std::all_of(netNodes.begin(), netNodes.end(), [&](const std::vector<int>& nodes) {
        return std::all_of(nodes.begin(), nodes.end(), [&](int node) {
            return copper.islandOfNode(node) == copper.islandOfNode(nodes.front());
        });
    });
}

std::optional<Cut> shortCut(const CheckedBoard& checked, const Finding& finding,
                            const std::map<std::string_view, const Net*>& netNamed) {
    std::vector<Cut> candidates = cutCandidates(checked, finding.path);
    if (candidates.size() > kMaxCutTrials) candidates.resize(kMaxCutTrials);
    if (candidates.empty()) return std::nullopt;
    const int start = checked.holeIndex(finding.path.front());
    const int island = checked.copper().islandOfNode(start);
    std::vector<std::vector<int>> netNodes;
    for (const std::string& name : finding.nets) {
        std::vector<int>& nodes = netNodes.emplace_back();
        for (const NetPin& pin : netNamed.at(name)->pins) {
            if (pin.island == island) nodes.push_back(pin.node);
        }
    }
    Board trial = copperOnly(checked);
    for (const Cut& cut : candidates) {
        trial.cuts.push_back(cut);
        const bool good =
            separatesCleanly(trial, start, checked.holeIndex(finding.path.back()), netNodes);
        trial.cuts.pop_back();
        if (good) return cut;
    }
    return std::nullopt;
}

std::string cutFix(const Cut& cut) {
    if (cut.kind == Cut::Kind::Hole) return "cut at " + holeName(cut.hole);
    return "cut between " + holeName(cut.hole) + " and " + holeName(Hole{cut.hole.row, cut.hole.col + 1});
}

// ---- Opens -----------------------------------------------------------------------------------

bool isWhole(const Connectivity& copper, const Net& net) {
    return std::all_of(net.pins.begin(), net.pins.end(), [&](const NetPin& pin) {
        return copper.islandOfNode(pin.node) == copper.islandOfNode(net.pins.front().node);
    });
}

bool hasShort(const Connectivity& copper, const std::vector<Net>& nets) {
    std::vector<int> firstNet(static_cast<std::size_t>(copper.islandCount()), -1);
    for (std::size_t n = 0; n < nets.size(); ++n) {
        for (const NetPin& pin : nets[n].pins) {
            int& first = firstNet[static_cast<std::size_t>(copper.islandOfNode(pin.node))];
            if (first >= 0 && first != static_cast<int>(n)) return true;
            first = static_cast<int>(n);
        }
    }
    return false;
}

// Existing cuts on the rows of the net's pins, nearest to a pin first.
std::vector<std::size_t> cutsNearNet(const CheckedBoard& checked, const Board& board, const Net& net) {
    std::vector<std::pair<int, std::size_t>> near;
    for (std::size_t c = 0; c < board.cuts.size(); ++c) {
        int best = std::numeric_limits<int>::max();
        for (const NetPin& pin : net.pins) {
            if (!checked.isHoleNode(pin.node)) continue;
            const Hole hole = checked.holeAt(pin.node);
            if (hole.row == board.cuts[c].hole.row) best = std::min(best, std::abs(hole.col - board.cuts[c].hole.col));
        }
        if (best != std::numeric_limits<int>::max()) near.push_back({best, c});
    }
    std::stable_sort(near.begin(), near.end(), [](const auto& a, const auto& b) { return a.first < b.first; });
    std::vector<std::size_t> order;
    for (std::size_t i = 0; i < near.size() && i < kMaxCutRemovals; ++i) order.push_back(near[i].second);
    return order;
}

// An existing cut whose removal alone mends the net and shorts nothing, on `trial` (the board's
// copper with the shorts' cuts made).
std::optional<Cut> misplacedCut(const CheckedBoard& checked, const Net& net, Board trial,
                                const std::vector<Net>& nets) {
    for (std::size_t c : cutsNearNet(checked, trial, net)) {
        const Cut cut = trial.cuts[c];
        trial.cuts.erase(trial.cuts.begin() + static_cast<std::ptrdiff_t>(c));
        const Connectivity copper(trial);
        trial.cuts.insert(trial.cuts.begin() + static_cast<std::ptrdiff_t>(c), cut);
        if (isWhole(copper, net) && !hasShort(copper, nets)) return cut;
    }
    return std::nullopt;
}

// Free holes (copper present, nothing soldered in) of each piece's island on `copper`.
std::vector<std::vector<int>> freeHoles(const CheckedBoard& checked, const Connectivity& copper,
                                        const std::vector<NetPiece>& pieces) {
    std::map<int, std::size_t> pieceOfIsland;
    for (std::size_t p = 0; p < pieces.size(); ++p)
        pieceOfIsland[copper.islandOfNode(pieces[p].pins.front()->node)] = p;
    std::vector<std::vector<int>> holes(pieces.size());
    for (int hole = 0; hole < checked.board().holeCount(); ++hole) {
        auto it = pieceOfIsland.find(copper.islandOfNode(hole));
        const bool free = !checked.holdsLead(hole) && !copper.isHoleCut(checked.holeAt(hole));
        if (it != pieceOfIsland.end() && free) holes[it->second].push_back(hole);
    }
    return holes;
}

// Whether a new bare link would lie clear of every lead and every bare link of the board, so that
// a suggested fix does not make a contact of its own.
bool liesClear(const CheckedBoard& checked, const Link& link) {
    const Board& board = checked.board();
    bool clear = true;
    forEachHoleNear(link, contactReach(board), false,
                    [&](Hole h) { clear = clear && !checked.holdsLead(checked.holeIndex(h)); });
    return clear && std::none_of(board.links.begin(), board.links.end(), [&](const Link& other) {
               return isBare(board, other) && crossingPlace(link, other);
           });
}

struct Joint {
    long distance = std::numeric_limits<long>::max();
    int from = -1;  // hole index in the joined part
    int to = -1;    // hole index in the new piece
    std::size_t piece = 0;
    long found = 0;  // order in which the pair was met, so equal distances keep the first

    bool operator<(const Joint& other) const {
        return distance != other.distance ? distance < other.distance : found < other.found;
    }
};

// Pairs of free holes tried, nearest first, for one that a link would join without lying across
// a lead or a bare link; when none of them is clear the nearest is taken all the same. Bounded,
// so two large pieces with every near pair blocked cost no more than a few dozen trials.
constexpr std::size_t kClearTrials = 32;

// The nearest pair of free holes joining a joined piece to one not yet joined, preferring among
// the nearest few a pair whose link would lie clear (see liesClear).
Joint nearestJoint(const CheckedBoard& checked, const std::vector<std::vector<int>>& holes,
                   const std::vector<bool>& joined) {
    std::vector<Joint> nearest;  // a max-heap of the kClearTrials nearest pairs met so far
    long found = 0;
    for (std::size_t a = 0; a < holes.size(); ++a) {
        if (!joined[a]) continue;
        for (std::size_t b = 0; b < holes.size(); ++b) {
            if (joined[b]) continue;
            for (int x : holes[a]) {
                const Hole hx = checked.holeAt(x);
                for (int y : holes[b]) {
                    const Hole hy = checked.holeAt(y);
                    const long dr = hx.row - hy.row;
                    const long dc = hx.col - hy.col;
                    const Joint joint{dr * dr + dc * dc, x, y, b, found++};
                    if (nearest.size() == kClearTrials && !(joint < nearest.front())) continue;
                    nearest.push_back(joint);
                    std::push_heap(nearest.begin(), nearest.end());
                    if (nearest.size() > kClearTrials) {
                        std::pop_heap(nearest.begin(), nearest.end());
                        nearest.pop_back();
                    }
                }
            }
        }
    }
    std::sort_heap(nearest.begin(), nearest.end());
    for (const Joint& joint : nearest) {
        if (liesClear(checked, Link{checked.holeAt(joint.from), checked.holeAt(joint.to)})) return joint;
    }
    return nearest.empty() ? Joint{} : nearest.front();
}

// Links joining the pieces Prim-style: from the first piece, the nearest piece not yet joined.
std::vector<Link> piecesLinks(const CheckedBoard& checked, const std::vector<std::vector<int>>& holes) {
    std::vector<Link> links;
    std::vector<bool> joined(holes.size(), false);
    joined[0] = true;
    for (std::size_t step = 1; step < holes.size(); ++step) {
        const Joint joint = nearestJoint(checked, holes, joined);
        if (joint.from < 0) break;  // the rest have no free hole (lugs only, or every hole used)
        joined[joint.piece] = true;
        links.push_back(Link{checked.holeAt(joint.from), checked.holeAt(joint.to)});
    }
    return links;
}

void fixOpen(const CheckedBoard& checked, const Net& net, const Board& repaired,
             const Connectivity& repairedCopper, const std::vector<Net>& nets, Finding& open) {
    if (const std::optional<Cut> cut = misplacedCut(checked, net, repaired, nets)) {
        open.cutToRemove = *cut;
        open.fix = "remove the cut at " + cutName(*cut);
        return;
    }
    const std::vector<NetPiece> pieces = netPieces(net);
    open.suggestedLinks = piecesLinks(checked, freeHoles(checked, repairedCopper, pieces));
    for (const Link& link : open.suggestedLinks) {
        open.fix += (open.fix.empty() ? "link " : ", link ") + holeName(link.from) + " to " + holeName(link.to);
    }
    if (open.suggestedLinks.size() + 1 < pieces.size()) {
        open.fix += std::string(open.fix.empty() ? "" : "; ") + "no free hole to link some pieces: wire them";
    }
}

}  // namespace

void suggestFixes(CheckReport& report, const Board& board, const Circuit* circuit) {
    if (circuit == nullptr && board.circuit) circuit = &*board.circuit;
    if (circuit == nullptr) return;
    const CheckedBoard checked(board);
    const CircuitMatch match = matchCircuit(checked, *circuit);
    std::map<std::string_view, const Net*> netNamed;
    for (const Net& net : match.nets) netNamed.emplace(net.name, &net);
    Board repaired = copperOnly(checked);  // with every short's cut made, for the opens
    for (Finding& error : report.errors) {
        if (error.type != FindingType::Short) continue;
        error.suggestedCut = shortCut(checked, error, netNamed);
        error.fix = error.suggestedCut ? cutFix(*error.suggestedCut) : "no single cut separates them";
        if (error.suggestedCut) repaired.cuts.push_back(*error.suggestedCut);
    }
    const Connectivity repairedCopper(repaired);
    for (Finding& error : report.errors) {
        if (error.type != FindingType::Open || !netNamed.contains(error.net)) continue;
        fixOpen(checked, *netNamed.at(error.net), repaired, repairedCopper, match.nets, error);
    }
}

}  // namespace netcheck
