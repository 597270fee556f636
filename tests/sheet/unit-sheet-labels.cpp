// Labels on the sheet's board views never cover a pin, a hole in use, a cut mark or another
// label, on every sample. The rectangles are rebuilt here from what the sheet would print (each
// label's text measured again in its font, centred where it was put) and from the board itself
// with the sizes the sheet draws things at, not from the placer's own lists.
#include <doctest/doctest.h>

#include <cairo.h>

#include <string>
#include <vector>

#include "../test_support.hpp"
#include "editor/sheet/sheet_labels.hpp"
#include "netcheck/file/board_file.hpp"

namespace {

using labels::Box;
using netcheck::Board;

constexpr double kPitchMm = 2.54;

// What the sheet draws, in pitches (board_view.hpp, component_side.cpp, copper_side.cpp):
constexpr double kHoleRadius = 0.18;       // a hole disc, where a lead or link end goes in
constexpr double kWireRingRadius = 0.42;   // the ring in the wire's colour round its hole
constexpr double kCutRingRadius = 0.42;    // the copper side's cut ring, 0.36 + half its line
constexpr double kCutBarHalfWidth = 0.11;  // a cut between holes: a bar 0.22 wide...
constexpr double kCutBarHalfHeight = 0.45; // ...and 0.9 tall

Box square(netcheck::Hole h, double half) {
    return {h.col + 0.5 - half, h.row + 0.5 - half, h.col + 0.5 + half, h.row + 0.5 + half};
}

struct Things {
    std::vector<Box> pins, usedHoles, cuts;
};

Things drawnThings(const Board& board) {
    Things t;
    for (const auto& part : board.parts)
        for (const auto& pin : part.pins) t.pins.push_back(square(pin.hole, kHoleRadius));
    for (const auto& link : board.links) {
        t.usedHoles.push_back(square(link.from, kHoleRadius));
        t.usedHoles.push_back(square(link.to, kHoleRadius));
    }
    for (const auto& wire : board.wires)
        for (const auto* end : {&wire.from, &wire.to})
            if (end->isHole()) t.usedHoles.push_back(square(*end->hole, kWireRingRadius));
    for (const auto& cut : board.cuts) {
        if (cut.kind == netcheck::Cut::Kind::Hole) {
            t.cuts.push_back(square(cut.hole, kCutRingRadius));
        } else {
            const double x = cut.hole.col + 1.0, y = cut.hole.row + 0.5;
            t.cuts.push_back({x - kCutBarHalfWidth, y - kCutBarHalfHeight, x + kCutBarHalfWidth,
                              y + kCutBarHalfHeight});
        }
    }
    return t;
}

/// The printed rectangle of each label: its text measured again, centred where it was put.
std::vector<Box> printedBoxes(cairo_t* cr, const std::vector<sheet::SheetLabel>& labels) {
    std::vector<Box> boxes;
    for (const auto& label : labels) {
        sheet::setFont(cr, label.fontMm, label.weight);
        const sheet::LabelSize size = sheet::labelSize(cr, label.text);
        const Box& at = label.placement.box;
        boxes.push_back(labels::boxAround(at.centreX(), at.centreY(), size.w / kPitchMm,
                                          size.h / kPitchMm));
    }
    return boxes;
}

int countHits(const std::vector<Box>& labels, const std::vector<Box>& things) {
    int hits = 0;
    for (const Box& label : labels)
        for (const Box& thing : things) hits += label.overlaps(thing);
    return hits;
}

struct Overlaps {
    int labels = 0, pins = 0, usedHoles = 0, cuts = 0, offBoard = 0;
    int total() const { return labels + pins + usedHoles + cuts + offBoard; }
};

Overlaps countOverlaps(const Board& board, const std::vector<Box>& boxes) {
    const Things things = drawnThings(board);
    Overlaps o;
    for (std::size_t i = 0; i < boxes.size(); ++i)
        for (std::size_t j = i + 1; j < boxes.size(); ++j) o.labels += boxes[i].overlaps(boxes[j]);
    o.pins = countHits(boxes, things.pins);
    o.usedHoles = countHits(boxes, things.usedHoles);
    o.cuts = countHits(boxes, things.cuts);
    // The view is clipped a pitch beyond the board: a label further out is cut off.
    const Box shown{-1.0, -1.0, board.cols + 1.0, board.rows + 1.0};
    for (const Box& box : boxes) o.offBoard += !shown.contains(box);
    return o;
}

std::string describe(const Overlaps& o) {
    return "label-label " + std::to_string(o.labels) + ", label-pin " + std::to_string(o.pins) +
           ", label-used hole " + std::to_string(o.usedHoles) + ", label-cut " +
           std::to_string(o.cuts) + ", cut off " + std::to_string(o.offBoard);
}

struct Scrap {
    Scrap()
        : surface(cairo_image_surface_create(CAIRO_FORMAT_ARGB32, 10, 10)), cr(cairo_create(surface)) {
        sheet::prepareText(cr);
    }
    ~Scrap() {
        cairo_destroy(cr);
        cairo_surface_destroy(surface);
    }
    cairo_surface_t* surface;
    cairo_t* cr;
};

}  // namespace

TEST_CASE("sheet labels: no overlaps on any sample's sheet") {
    Scrap scrap;
    const auto files = test_support::sourceFiles("samples", ".board.json");
    REQUIRE(files.size() >= 10);
    int total = 0, labelsSeen = 0;
    for (const std::string& file : files) {
        const Board board = test_support::readSample(file);
        const auto component = sheet::componentSideLabels(scrap.cr, board, kPitchMm);
        const auto copper = sheet::copperSideLabels(scrap.cr, board, board.cuts, kPitchMm);
        const Overlaps top = countOverlaps(board, printedBoxes(scrap.cr, component));
        const Overlaps bottom = countOverlaps(board, printedBoxes(scrap.cr, copper));
        MESSAGE(file << ": component side " << describe(top) << "; copper side "
                     << describe(bottom));
        CHECK_MESSAGE(top.total() == 0, file, " component side: ", describe(top));
        CHECK_MESSAGE(bottom.total() == 0, file, " copper side: ", describe(bottom));
        total += top.total() + bottom.total();
        labelsSeen += static_cast<int>(component.size() + copper.size());
    }
    MESSAGE("overlaps on all samples: " << total << " among " << labelsSeen << " labels");
    CHECK(labelsSeen > 100);  // the samples do print labels: the count is not vacuous
}

TEST_CASE("sheet labels: the counter sees an overlap") {
    // Two parts side by side, each named on its body: left in their first places, the names
    // would cover each other; the placer must move one.
    Board board;
    board.rows = 6;
    board.cols = 12;
    netcheck::Part a{"R1", "resistor", "4k7", {{"1", {2, 1}}, {"2", {2, 5}}}, {}};
    netcheck::Part b{"R2", "resistor", "4k7", {{"1", {3, 1}}, {"2", {3, 5}}}, {}};
    board.parts = {a, b};
    Scrap scrap;
    const auto placed = sheet::componentSideLabels(scrap.cr, board, kPitchMm);
    REQUIRE(placed.size() == 2);
    CHECK(countOverlaps(board, printedBoxes(scrap.cr, placed)).total() == 0);
    // The same two names both on their first choices: the counter finds the overlap.
    auto stacked = placed;
    stacked[1].placement.box = labels::boxAround(3.5, 2.9, placed[1].placement.box.width(),
                                                 placed[1].placement.box.height());
    stacked[0].placement.box = labels::boxAround(3.5, 2.6, placed[0].placement.box.width(),
                                                 placed[0].placement.box.height());
    CHECK(countOverlaps(board, printedBoxes(scrap.cr, stacked)).labels == 1);
}
