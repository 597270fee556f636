// The layout engine's construction: parts placed column by column, left to right, each net kept
// on one strip segment while it is open (the left-edge idea of Hashimoto and Stevens, 1971:
// a freed strip is taken by the next net that needs one), links where a net must change strip,
// cuts wherever two nets meet on a strip.
#pragma once

#include <optional>
#include <string>
#include <vector>

#include "netcheck/model/hole.hpp"

namespace netcheck::layout_detail {

/// One lead of a placed shape, relative to the shape's top-left hole.
struct ShapePin {
    int net = -1;
    int dy = 0;
    int dx = 0;
};

/// One way a part can stand: its leads, the holes its body covers (no lead or link may go there)
/// and, for a DIP, the strips under it that must be cut between its two pin columns.
struct Shape {
    std::vector<ShapePin> pins;  ///< in the unit's pin order
    std::vector<Hole> body;      ///< (dy, dx) as (row, col)
    int width = 1;
    int bandRows = 0;            ///< DIP: rows 0..bandRows-1 die after column 0
    std::vector<int> band;       ///< pre-placed DIPs: more rows that die after this column
    int preference = 0;          ///< lower is preferred when all else is equal
};

/// What the sweep builds: copper owners per hole, the links, and where each pin went.
struct SweepResult {
    int rows = 0;
    int cols = 0;
    std::vector<std::vector<int>> owner;  ///< [col][row]: net whose copper it is, or -1
    struct Link {
        Hole from;
        Hole to;
    };
    std::vector<Link> links;
};

/// The sweep itself. Use: optionally placeFixed() for every column of pre-placed pins (in column
/// order, from 0), then place() each part and placeWires() for off-board lugs, in board order;
/// finish() returns the copper.
class StripSweep {
public:
    /// `uses[net]`: how many leads (pins and lugs) of that net will be placed in all.
    StripSweep(std::vector<int> uses, int maxRows);

    /// Pins already on the board at column `col` (all of them, rows in ShapePin::dy). False when
    /// the nets around them cannot be kept joined without moving them.
    /// `band`: the rows of pre-placed DIPs' first pin column here, whose strips end under them.
    bool placeFixed(int col, const std::vector<ShapePin>& pins, const std::vector<int>& band);
    /// Places a part in new columns at the right, in whichever of `shapes` and at whichever
    /// height costs least. The holes of its pins, in shape pin order; nullopt when no shape fits
    /// under maxRows.
    std::optional<std::vector<Hole>> place(const std::vector<Shape>& shapes);
    /// Off-board lugs: each gets a hole of its net's strip in new columns at the right; nullopt
    /// when a net needs a strip and none is free under maxRows.
    std::optional<std::vector<Hole>> placeWires(const std::vector<int>& nets);
    SweepResult finish() const;
    int columns() const { return static_cast<int>(cells_.size()); }
    int height() const { return height_; }

private:
    enum class Use { Free, Lead, Covered, Body };
    struct Cell {
        int owner = -1;
        Use use = Use::Free;
    };
    struct Join {
        int net;
        int aliveRow;
        int newRow;
        int fromCol;  // the new row's copper starts here
    };
    struct Plan {
        std::vector<Join> relocations;
        std::vector<Join> starts;  // DIP left pins of new nets that go on past the IC
        int links = 0;
        int newHeight = 0;
        bool valid = false;
    };

    Cell& cell(int row, int col) { return cells_[static_cast<std::size_t>(col)][static_cast<std::size_t>(row)]; }
    const Cell& cell(int row, int col) const { return cells_[static_cast<std::size_t>(col)][static_cast<std::size_t>(row)]; }
    int& rowNet(int row) { return rowNet_[static_cast<std::size_t>(row)]; }
    int newColumn();
    bool linkFits(int col, int a, int b) const;
    void addLink(int col, int a, int b);
    bool joinBack(const Join& join, int lastCol);
    bool startBack(const Join& join);
    void joinInNewColumns(std::vector<Join> joins);
    int aliveRowOf(int net, const std::vector<int>& except) const;
    int freeRowNear(int row, const std::vector<int>& reserved) const;
    Plan plan(const Shape& shape, int top) const;
    bool relocate(const std::vector<Join>& relocations, bool fixed);
    bool relocateAnywhere(Join join, std::vector<int>& taken);
    std::vector<Hole> placeShape(const Shape& shape, int top, const std::vector<Join>& starts);
    void settle(const std::vector<ShapePin>& pins, const std::vector<Hole>& holes);
    void resolveDeferred(int col, bool force);
    void touchHeight(int row) { height_ = std::max(height_, row + 1); }

    std::vector<int> uses_;
    int maxRows_;
    std::vector<int> rowNet_;
    std::vector<std::vector<Cell>> cells_;
    std::vector<SweepResult::Link> links_;
    std::vector<Join> deferred_;  // joins among pre-placed pins, made at a later column
    int height_ = 0;
};

/// Which holes are taken, [col][row]: by a lead, by a part's body (the box of its leads, one
/// group per part) or by a link.
using Occupancy = std::vector<std::vector<char>>;
Occupancy occupiedHoles(const SweepResult& copper, const std::vector<std::vector<Hole>>& groups);

}  // namespace netcheck::layout_detail
