// Where the text labels of a board drawing go (part names and values, pin names, wire tags, cut
// numbers), so that none covers a pin, a hole in use, a cut mark or another label. Shared by the
// canvas and the build sheet; pure geometry in board units (one unit per hole pitch, hole {r,c}
// centred at (c + 0.5, r + 0.5), as seen from the component side), no drawing and no fonts: the
// caller measures its text and passes the sizes in.
#pragma once

#include <vector>

#include "netcheck/model/board.hpp"

namespace labels {

/// An axis-aligned rectangle in board units, y down.
struct Box {
    double x0 = 0, y0 = 0, x1 = 0, y1 = 0;

    double centreX() const { return (x0 + x1) / 2; }
    double centreY() const { return (y0 + y1) / 2; }
    double width() const { return x1 - x0; }
    double height() const { return y1 - y0; }
    /// True when the two share some area (touching edges do not count).
    bool overlaps(const Box& other) const;
    /// True when `other` lies wholly inside this box.
    bool contains(const Box& other) const;
};

/// The box of size w x h centred on (x, y).
Box boxAround(double x, double y, double w, double h);

/// One label to place: the point it names, where it would go first, and its size.
struct Label {
    double anchorX = 0, anchorY = 0;  ///< what the label belongs to (a pin, a part's middle)
    double firstX = 0, firstY = 0;    ///< centre of the first choice (the drawing's usual place)
    double width = 0, height = 0;     ///< the text's box, padding included
    int owner = -1;                   ///< the part it names (index into board.parts), or -1
};

/// A part's body: a label keeps off the bodies of other parts than its own where it can (over a
/// neighbour it would seem to name the neighbour), but covers one rather than a pin.
struct Body {
    Box box;
    int owner = -1;  ///< index into board.parts
};

/// Where a label went. With `leader` the label sits away from its anchor and the drawing joins
/// them with a thin line; `clear` is false only when no free place was found at all.
struct Placement {
    Box box;
    bool leader = false;
    bool clear = true;
};

/// Places labels in order (an earlier label keeps its place whatever comes after it). Each
/// tries its first choice, then eight places around its anchor (above, below, right, left, then
/// the corners), and takes the first that lies inside `area` and overlaps no obstacle, no label
/// placed before it and no body of another part; failing that, the nearest such place within a
/// few pitches, with a leader; failing that, the same two searches letting it cover other
/// bodies (the second reaching further); failing all, its first choice. Deterministic.
std::vector<Placement> placeLabels(const std::vector<Label>& labels,
                                   const std::vector<Box>& obstacles, const Box& area,
                                   const std::vector<Body>& bodies = {});

/// Each part's body, roughly: the box round its pins with a third of a pitch to spare (a lying
/// part's body between its leads, a standing one over a lead, a chip between its rows).
std::vector<Body> partBodies(const netcheck::Board& board);

/// What labels must not cover on a board: every pin, every hole a link or wire ends in, every
/// cut mark.
std::vector<Box> boardObstacles(const netcheck::Board& board);

/// The board's own rectangle: [0, cols] x [0, rows].
Box boardArea(const netcheck::Board& board);

}  // namespace labels
