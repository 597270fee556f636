// Open location: the net's pins grouped by island into pieces. The fix (a misplaced cut to remove,
// or links joining the pieces) is found by the repair code (repair/finding_fixes.cpp).
#include "netcheck/check/detail/finders.hpp"

namespace netcheck {

namespace {

std::string piecesText(const CheckedBoard& checked, const std::vector<NetPiece>& pieces) {
    std::string text;
    for (const NetPiece& piece : pieces) {
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

Finding locateOpen(const CheckedBoard& checked, const Net& net, bool locate) {
    Finding finding;
    finding.type = FindingType::Open;
    finding.net = std::string(net.name);
    if (!locate) return finding;
    const std::vector<NetPiece> pieces = netPieces(net);
    for (const NetPiece& piece : pieces) {
        std::vector<PinRef>& pins = finding.pieces.emplace_back();
        for (const NetPin* pin : piece.pins) {
            pins.push_back(pin->pinRef());
            if (checked.isHoleNode(pin->node)) finding.holes.push_back(checked.holeAt(pin->node));
        }
    }
    finding.message = std::string(net.name) + " is in " + std::to_string(pieces.size()) +
                      " pieces: " + piecesText(checked, pieces);
    return finding;
}

}  // namespace netcheck
