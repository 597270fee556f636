// Open location. Pieces are the net's pins grouped by island. First, one existing cut whose removal
// mends the net without a new short is looked for (a cut made in the wrong hole). Otherwise links
// are chosen Prim-style: start from the first piece and repeatedly join the nearest piece not yet
// joined, through the nearest pair of free holes (copper present, nothing soldered in) of the two
// islands whose link would not lie across a lead or a bare link (the nearest pair at all when no
// pair is clear), on the board with the shorts' suggested cuts applied.
#include "netcheck/check/detail/finders.hpp"

#include <algorithm>
#include <cstdlib>
#include <limits>
#include <map>
#include <optional>

#include "netcheck/check/detail/finders.hpp"

namespace netcheck {

namespace {

constexpr std::size_t kMaxCutTrials = 16;

struct Piece {
    int island = 0;
    std::vector<const NetPin*> pins;  // sorted by pin name
    std::vector<int> freeHoles;       // hole indices, ascending
};

std::vector<Piece> splitIntoPieces(const CheckedBoard& checked, const Net& net) {
    std::map<int, Piece> byIsland;
    for (const NetPin& pin : net.pins) {
        const int island = checked.copper().islandOfNode(pin.node);
        Piece& piece = byIsland[island];
        piece.island = island;
        piece.pins.push_back(&pin);
    }
    std::vector<Piece> pieces;
    for (auto& [island, piece] : byIsland) {
        std::sort(piece.pins.begin(), piece.pins.end(),
                  [](const NetPin* a, const NetPin* b) { return *a < *b; });
        pieces.push_back(std::move(piece));
    }
    std::sort(pieces.begin(), pieces.end(),
              [](const Piece& a, const Piece& b) { return *a.pins.front() < *b.pins.front(); });
    return pieces;
}

void collectFreeHoles(const CheckedBoard& checked, const Connectivity& copper,
                      std::vector<Piece>& pieces) {
    std::map<int, Piece*> byIsland;
    for (Piece& piece : pieces) byIsland[copper.islandOfNode(piece.pins.front()->node)] = &piece;
    const int holes = checked.board().holeCount();
    for (int hole = 0; hole < holes; ++hole) {
        auto it = byIsland.find(copper.islandOfNode(hole));
        const bool free = !checked.holdsLead(hole) && !copper.isHoleCut(checked.holeAt(hole));
        if (it != byIsland.end() && free) it->second->freeHoles.push_back(hole);
    }
}

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
std::vector<std::size_t> cutsNearNet(const CheckedBoard& checked, const Board& board,
                                     const Net& net) {
    std::vector<std::pair<int, std::size_t>> near;
    for (std::size_t c = 0; c < board.cuts.size(); ++c) {
        int best = std::numeric_limits<int>::max();
        for (const NetPin& pin : net.pins) {
            if (!checked.isHoleNode(pin.node)) continue;
            const Hole hole = checked.holeAt(pin.node);
            if (hole.row == board.cuts[c].hole.row) {
                best = std::min(best, std::abs(hole.col - board.cuts[c].hole.col));
            }
        }
        if (best != std::numeric_limits<int>::max()) near.push_back({best, c});
    }
    std::stable_sort(near.begin(), near.end(),
                     [](const auto& a, const auto& b) { return a.first < b.first; });
    std::vector<std::size_t> order;
    for (std::size_t i = 0; i < near.size() && i < kMaxCutTrials; ++i)
        order.push_back(near[i].second);
    return order;
}

// An existing cut whose removal alone mends the net and shorts nothing.
std::optional<Cut> misplacedCut(const CheckedBoard& checked, const Net& net,
                                const RepairedBoard& repaired) {
    Board trial = copperOnly(*repaired.board);
    for (std::size_t c : cutsNearNet(checked, trial, net)) {
        const Cut cut = trial.cuts[c];
        trial.cuts.erase(trial.cuts.begin() + static_cast<std::ptrdiff_t>(c));
        const Connectivity copper(trial);
        trial.cuts.insert(trial.cuts.begin() + static_cast<std::ptrdiff_t>(c), cut);
        if (isWhole(copper, net) && !hasShort(copper, *repaired.nets)) return cut;
    }
    return std::nullopt;
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
Joint nearestJoint(const CheckedBoard& checked, const std::vector<Piece>& pieces,
                   const std::vector<bool>& joined) {
    std::vector<Joint> nearest;  // a max-heap of the kClearTrials nearest pairs met so far
    long found = 0;
    for (std::size_t a = 0; a < pieces.size(); ++a) {
        if (!joined[a]) continue;
        for (std::size_t b = 0; b < pieces.size(); ++b) {
            if (joined[b]) continue;
            for (int x : pieces[a].freeHoles) {
                const Hole hx = checked.holeAt(x);
                for (int y : pieces[b].freeHoles) {
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
        if (liesClear(checked, Link{checked.holeAt(joint.from), checked.holeAt(joint.to)}))
            return joint;
    }
    return nearest.empty() ? Joint{} : nearest.front();
}

std::vector<Link> suggestLinks(const CheckedBoard& checked, const std::vector<Piece>& pieces) {
    std::vector<Link> links;
    std::vector<bool> joined(pieces.size(), false);
    joined[0] = true;
    for (std::size_t step = 1; step < pieces.size(); ++step) {
        const Joint joint = nearestJoint(checked, pieces, joined);
        if (joint.from < 0) break;  // the rest have no free hole (lugs only, or every hole used)
        joined[joint.piece] = true;
        links.push_back(Link{checked.holeAt(joint.from), checked.holeAt(joint.to)});
    }
    return links;
}

std::string piecesText(const CheckedBoard& checked, const std::vector<Piece>& pieces) {
    std::string text;
    for (const Piece& piece : pieces) {
        if (!text.empty()) text += " | ";
        std::string pins;
        for (const NetPin* pin : piece.pins) {
            pins += (pins.empty() ? "" : ", ") + pin->name();
            if (checked.isHoleNode(pin->node)) pins += " (" + checked.nodeName(pin->node) + ")";
        }
        text += pins;
    }
    return text;
}

}  // namespace

Finding locateOpen(const CheckedBoard& checked, const Net& net,
                   const RepairedBoard& repaired) {
    std::vector<Piece> pieces = splitIntoPieces(checked, net);
    Finding finding;
    finding.type = FindingType::Open;
    finding.net = std::string(net.name);
    for (const Piece& piece : pieces) {
        std::vector<PinRef>& pins = finding.pieces.emplace_back();
        for (const NetPin* pin : piece.pins) {
            pins.push_back(pin->pinRef());
            if (checked.isHoleNode(pin->node)) finding.holes.push_back(checked.holeAt(pin->node));
        }
    }
    finding.message = std::string(net.name) + " is in " + std::to_string(pieces.size()) +
                      " pieces: " + piecesText(checked, pieces);
    if (const std::optional<Cut> cut = misplacedCut(checked, net, repaired)) {
        finding.cutToRemove = *cut;
        finding.fix = "remove the cut at " + cutName(*cut);
        return finding;
    }
    collectFreeHoles(checked, *repaired.copper, pieces);
    finding.suggestedLinks = suggestLinks(checked, pieces);
    for (const Link& link : finding.suggestedLinks) {
        finding.fix += (finding.fix.empty() ? "link " : ", link ") + holeName(link.from) + " to " +
                       holeName(link.to);
    }
    if (finding.suggestedLinks.size() + 1 < pieces.size()) {
        finding.fix += std::string(finding.fix.empty() ? "" : "; ") +
                       "no free hole to link some pieces: wire them";
    }
    return finding;
}

}  // namespace netcheck
