// Open location. Pieces are the net's pins grouped by island. Links are chosen Prim-style: start
// from the first piece and repeatedly join the nearest piece not yet joined, through the nearest
// pair of free holes (copper present, nothing soldered in) of the two islands.
#include "open_locator.hpp"

#include <algorithm>
#include <limits>
#include <map>

namespace netcheck {

namespace {

struct Piece {
    int island = 0;
    std::vector<const NetPin*> pins;  // sorted by pin name
    std::vector<int> freeHoles;       // hole indices, ascending
};

std::vector<Piece> splitIntoPieces(const CheckContext& context, const PlacedNet& net) {
    std::map<int, Piece> byIsland;
    for (const NetPin& pin : net.pins) {
        const int island = context.copper().islandOfNode(pin.node);
        Piece& piece = byIsland[island];
        piece.island = island;
        piece.pins.push_back(&pin);
    }
    std::vector<Piece> pieces;
    for (auto& [island, piece] : byIsland) {
        std::sort(piece.pins.begin(), piece.pins.end(),
                  [](const NetPin* a, const NetPin* b) { return a->pin < b->pin; });
        pieces.push_back(std::move(piece));
    }
    std::sort(pieces.begin(), pieces.end(), [](const Piece& a, const Piece& b) {
        return a.pins.front()->pin < b.pins.front()->pin;
    });
    return pieces;
}

void collectFreeHoles(const CheckContext& context, std::vector<Piece>& pieces) {
    std::map<int, Piece*> byIsland;
    for (Piece& piece : pieces) byIsland[piece.island] = &piece;
    const int holes = context.board().holeCount();
    for (int hole = 0; hole < holes; ++hole) {
        auto it = byIsland.find(context.copper().islandOfNode(hole));
        if (it != byIsland.end() && context.isFree(hole)) it->second->freeHoles.push_back(hole);
    }
}

struct Joint {
    long distance = std::numeric_limits<long>::max();
    int from = -1;  // hole index in the joined part
    int to = -1;    // hole index in the new piece
    std::size_t piece = 0;
};

Joint nearestJoint(const CheckContext& context, const std::vector<Piece>& pieces,
                   const std::vector<bool>& joined) {
    Joint best;
    for (std::size_t a = 0; a < pieces.size(); ++a) {
        if (!joined[a]) continue;
        for (std::size_t b = 0; b < pieces.size(); ++b) {
            if (joined[b]) continue;
            for (int x : pieces[a].freeHoles) {
                const Hole hx = context.holeAt(x);
                for (int y : pieces[b].freeHoles) {
                    const Hole hy = context.holeAt(y);
                    const long dr = hx.row - hy.row;
                    const long dc = hx.col - hy.col;
                    const long distance = dr * dr + dc * dc;
                    if (distance < best.distance) best = Joint{distance, x, y, b};
                }
            }
        }
    }
    return best;
}

std::vector<Link> suggestLinks(const CheckContext& context, const std::vector<Piece>& pieces) {
    std::vector<Link> links;
    std::vector<bool> joined(pieces.size(), false);
    joined[0] = true;
    for (std::size_t step = 1; step < pieces.size(); ++step) {
        const Joint joint = nearestJoint(context, pieces, joined);
        if (joint.from < 0) break;  // the rest have no free hole (lugs only, or every hole used)
        joined[joint.piece] = true;
        links.push_back(Link{context.holeAt(joint.from), context.holeAt(joint.to)});
    }
    return links;
}

std::string piecesText(const CheckContext& context, const std::vector<Piece>& pieces) {
    std::string text;
    for (const Piece& piece : pieces) {
        if (!text.empty()) text += " | ";
        std::string pins;
        for (const NetPin* pin : piece.pins) {
            pins += (pins.empty() ? "" : ", ") + pin->pin.name() + " (" +
                    context.nodeName(pin->node) + ")";
        }
        text += pins;
    }
    return text;
}

}  // namespace

Finding locateOpen(const CheckContext& context, const PlacedNet& net) {
    std::vector<Piece> pieces = splitIntoPieces(context, net);
    collectFreeHoles(context, pieces);
    Finding finding;
    finding.type = "open";
    finding.net = net.name;
    for (const Piece& piece : pieces) {
        std::vector<PinRef>& pins = finding.pieces.emplace_back();
        for (const NetPin* pin : piece.pins) {
            pins.push_back(pin->pin);
            if (context.isHoleNode(pin->node)) finding.holes.push_back(context.holeAt(pin->node));
        }
    }
    finding.message = net.name + " is in " + std::to_string(pieces.size()) +
                      " pieces: " + piecesText(context, pieces);
    finding.suggestedLinks = suggestLinks(context, pieces);
    for (const Link& link : finding.suggestedLinks) {
        finding.fix += (finding.fix.empty() ? "link " : ", link ") + holeName(link.from) + " to " +
                       holeName(link.to);
    }
    if (finding.suggestedLinks.size() + 1 < pieces.size()) {
        finding.fix += std::string(finding.fix.empty() ? "" : "; ") +
                       "wire the pieces without free holes";
    }
    return finding;
}

}  // namespace netcheck
