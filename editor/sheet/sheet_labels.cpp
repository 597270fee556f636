#include "sheet_labels.hpp"

#include <cmath>

#include "netcheck/model/part_kinds.hpp"

namespace sheet {

namespace {

using netcheck::Hole;
using netcheck::Part;

constexpr double kPinNameMm = 1.1;
constexpr Rgb kPinNameInk{0.1, 0.1, 0.6};
constexpr Rgb kWireTagInk{0.1, 0.1, 0.4};
constexpr Rgb kCutNumberInk{0.55, 0.0, 0.0};

double centreX(Hole hole) { return hole.col + 0.5; }
double centreY(Hole hole) { return hole.row + 0.5; }

/// The board and the free margins of its view: half a pitch left and right (the row letters
/// stand further out), a quarter above (the hole numbers), a pitch below (the view's clip).
labels::Box printableArea(const netcheck::Board& board) {
    const labels::Box area = labels::boardArea(board);
    return {area.x0 - 0.5, area.y0 - 0.25, area.x1 + 0.5, area.y1 + 1.0};
}

/// Collects labels with their first choices (in board units), measuring each in its font.
class LabelList {
public:
    LabelList(cairo_t* cr, double pitchMm) : cr_(cr), pitch_(pitchMm) {}

    /// `owner`: the part the label names (its body may be covered), or -1.
    void add(std::string text, double fontMm, Rgb ink, double anchorX, double anchorY,
             double firstX, double firstY, int owner = -1) {
        setFont(cr_, fontMm, Weight::Bold);
        const LabelSize size = labelSize(cr_, text);
        requests_.push_back(
            {anchorX, anchorY, firstX, firstY, size.w / pitch_, size.h / pitch_, owner});
        SheetLabel label;
        label.text = std::move(text);
        label.fontMm = fontMm;
        label.ink = ink;
        label.anchorX = anchorX;
        label.anchorY = anchorY;
        labels_.push_back(std::move(label));
    }
    /// The text width in board units, for first choices that depend on it.
    double width(const std::string& text, double fontMm) {
        setFont(cr_, fontMm, Weight::Bold);
        return labelSize(cr_, text).w / pitch_;
    }
    /// `bodies`: the parts' bodies when the side shows them.
    std::vector<SheetLabel> place(const netcheck::Board& board,
                                  const std::vector<labels::Body>& bodies) {
        const auto placements = labels::placeLabels(requests_, labels::boardObstacles(board),
                                                    printableArea(board), bodies);
        for (std::size_t i = 0; i < labels_.size(); ++i) labels_[i].placement = placements[i];
        return std::move(labels_);
    }

private:
    cairo_t* cr_;
    double pitch_;
    std::vector<labels::Label> requests_;
    std::vector<SheetLabel> labels_;
};

std::string partLabel(const Part& part) {
    return part.value.empty() ? part.ref : part.ref + " " + part.value;
}

/// Where a part's name goes first: on the body (between the leads, over the standing body, in
/// the middle of a many-lead box), above a one-lead part.
void addPartLabel(LabelList& list, const Part& part, int owner) {
    if (part.pins.empty()) return;
    const Hole a = part.pins.front().hole;
    double x = centreX(a), y = centreY(a);
    if (part.pins.size() == 1) {
        list.add(partLabel(part), kTinyMm, kInk, x, y, x, y - 0.7, owner);
        return;
    }
    if (part.pins.size() == 2) {
        const Hole b = part.pins[1].hole;
        const bool standing = std::hypot(b.col - a.col, b.row - a.row) < 1.5;
        if (!standing) x = (centreX(a) + centreX(b)) / 2, y = (centreY(a) + centreY(b)) / 2;
        list.add(partLabel(part), kTinyMm, kInk, x, y, x, y, owner);
        return;
    }
    double left = 1e9, right = -1e9, top = 1e9, bottom = -1e9;
    for (const auto& pin : part.pins) {
        left = std::min(left, centreX(pin.hole)), right = std::max(right, centreX(pin.hole));
        top = std::min(top, centreY(pin.hole)), bottom = std::max(bottom, centreY(pin.hole));
    }
    x = (left + right) / 2, y = (top + bottom) / 2;
    list.add(partLabel(part), kTinyMm, kInk, x, y, x, y, owner);
}

/// Pin names beside the pins of small polarised parts (transistors, regulators, diodes...).
void addPinNames(LabelList& list, const Part& part, int owner) {
    const netcheck::PartKind* kind = netcheck::findPartKind(part.kind);
    if (!kind || !kind->polarised || part.pins.size() > 4) return;
    for (const auto& pin : part.pins) {
        const double x = centreX(pin.hole), y = centreY(pin.hole);
        list.add(pin.name, kPinNameMm, kPinNameInk, x, y, x - 0.42, y + 0.5, owner);
    }
}

/// The tag at a wire's end on the board: first to the right of the hole (to the left near the
/// right edge), above it (below on the top strip).
void addWireTag(LabelList& list, const netcheck::Board& board, Hole hole,
                const std::string& other, const std::string& colour) {
    std::string tag = "→" + other + (colour.empty() ? "" : " " + colour);
    const double width = list.width(tag, kTinyMm);
    const double x = centreX(hole), y = centreY(hole);
    const bool left = x + 0.5 + width > board.cols;
    const double firstX = left ? x - 0.5 - width / 2 : x + 0.5 + width / 2;
    const double firstY = hole.row == 0 ? y + 0.5 : y - 0.5;
    list.add(std::move(tag), kTinyMm, kWireTagInk, x, y, firstX, firstY);
}

}  // namespace

std::vector<SheetLabel> componentSideLabels(cairo_t* cr, const netcheck::Board& board,
                                            double pitchMm) {
    LabelList list(cr, pitchMm);
    // Pin names first: they only make sense right at their pins. Wire tags last: long, and
    // fine a little way off with a leader.
    const int parts = static_cast<int>(board.parts.size());
    for (int i = 0; i < parts; ++i) addPinNames(list, board.parts[i], i);
    for (int i = 0; i < parts; ++i) addPartLabel(list, board.parts[i], i);
    for (const auto& wire : board.wires) {
        if (wire.from.isHole()) addWireTag(list, board, *wire.from.hole, wire.to.name(), wire.color);
        if (wire.to.isHole()) addWireTag(list, board, *wire.to.hole, wire.from.name(), wire.color);
    }
    return list.place(board, labels::partBodies(board));
}

std::vector<SheetLabel> copperSideLabels(cairo_t* cr, const netcheck::Board& board,
                                         const std::vector<netcheck::Cut>& cuts, double pitchMm) {
    LabelList list(cr, pitchMm);
    const double fontMm = 0.72 * pitchMm;
    for (std::size_t i = 0; i < cuts.size(); ++i) {
        const netcheck::Cut& cut = cuts[i];
        const double x = cut.kind == netcheck::Cut::Kind::Hole ? centreX(cut.hole) : cut.hole.col + 1.0;
        const double y = centreY(cut.hole);
        // Up and to the right of the mark as the copper side is seen (mirrored): to the left in
        // board units.
        list.add(std::to_string(i + 1), fontMm, kCutNumberInk, x, y, x - 0.55, y - 0.5);
    }
    return list.place(board, {});  // the copper side shows no bodies
}

}  // namespace sheet
