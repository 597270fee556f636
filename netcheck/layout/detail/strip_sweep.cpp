// The column sweep. Invariants, which make every layout it emits correct by construction:
// - A lead (pin, link end, wire end) goes only into a Free hole, and a link only over Free holes;
//   holes under a link or a part body never take a lead later. So no hole holds two leads, and
//   no bare link lies across a lead or touches another link.
// - Every hole's copper has one owner net (or none); cuts are made wherever two owners meet along
//   a strip (finish()), so no two nets share copper.
// - A net that is already on the board and needs a new strip is always joined to one of its
//   strips by a link before that strip is given up, so no net is split.
#include "netcheck/layout/detail/strip_sweep.hpp"

#include <algorithm>
#include <cstdlib>

namespace netcheck::layout_detail {

StripSweep::StripSweep(std::vector<int> uses, int maxRows)
    : uses_(std::move(uses)), maxRows_(maxRows), rowNet_(static_cast<std::size_t>(maxRows), -1) {}

int StripSweep::newColumn() {
    cells_.emplace_back(static_cast<std::size_t>(maxRows_));
    const int col = columns() - 1;
    for (int row = 0; row < maxRows_; ++row) cell(row, col).owner = rowNet(row);
    return col;
}

bool StripSweep::linkFits(int col, int a, int b) const {
    if (a == b) return false;
    for (int row = std::min(a, b); row <= std::max(a, b); ++row) {
        if (cell(row, col).use != Use::Free) return false;
    }
    return true;
}

void StripSweep::addLink(int col, int a, int b) {
    const int lo = std::min(a, b);
    const int hi = std::max(a, b);
    for (int row = lo + 1; row < hi; ++row) cell(row, col).use = Use::Covered;
    cell(lo, col).use = Use::Lead;
    cell(hi, col).use = Use::Lead;
    touchHeight(hi);
    links_.push_back({{lo, col}, {hi, col}});
}

// A link in a column already made, as near the right as it fits: where both strips carry the
// net, or where the new strip's copper can be taken back to from unused holes.
bool StripSweep::joinBack(const Join& join, int lastCol) {
    for (int col = lastCol; col >= 0; --col) {
        if (cell(join.aliveRow, col).owner != join.net) return false;
        const int newOwner = cell(join.newRow, col).owner;
        if (col >= join.fromCol ? newOwner != join.net : newOwner != -1) {
            if (col < join.fromCol) return false;  // another net's copper: no way further left
            continue;
        }
        if (!linkFits(col, join.aliveRow, join.newRow)) continue;
        for (int c = col; c < join.fromCol; ++c) cell(join.newRow, c).owner = join.net;
        addLink(col, join.aliveRow, join.newRow);
        return true;
    }
    return false;
}

// A net not yet on the board that needs two strips from the start (a DIP's left pin whose net
// goes on past the IC): a link in an earlier column where both strips are unused, their copper
// taken back to it.
bool StripSweep::startBack(const Join& join) {
    for (int col = join.fromCol - 1; col >= 0; --col) {
        if (cell(join.aliveRow, col).owner != -1 || cell(join.newRow, col).owner != -1) return false;
        if (!linkFits(col, join.aliveRow, join.newRow)) continue;
        for (int c = col; c < join.fromCol; ++c) {
            cell(join.aliveRow, c).owner = join.net;
            cell(join.newRow, c).owner = join.net;
        }
        addLink(col, join.aliveRow, join.newRow);
        return true;
    }
    return false;
}

// Links in new columns at the right, as few columns as the links' spans allow (first fit).
void StripSweep::joinInNewColumns(std::vector<Join> joins) {
    for (const Join& join : joins) rowNet(join.newRow) = join.net;
    while (!joins.empty()) {
        const int col = newColumn();
        std::vector<Join> left;
        for (const Join& join : joins) {
            if (linkFits(col, join.aliveRow, join.newRow)) {
                addLink(col, join.aliveRow, join.newRow);
            } else {
                left.push_back(join);
            }
        }
        joins = std::move(left);
    }
}

int StripSweep::aliveRowOf(int net, const std::vector<int>& except) const {
    for (int row = 0; row < maxRows_; ++row) {
        if (rowNet_[static_cast<std::size_t>(row)] == net &&
            std::find(except.begin(), except.end(), row) == except.end())
            return row;
    }
    return -1;
}

int StripSweep::freeRowNear(int row, const std::vector<int>& reserved) const {
    for (int distance = 0; distance < 2 * maxRows_; ++distance) {
        for (int candidate : {row - distance, row + distance}) {
            if (candidate < 0 || candidate >= maxRows_) continue;
            if (rowNet_[static_cast<std::size_t>(candidate)] != -1) continue;
            if (std::find(reserved.begin(), reserved.end(), candidate) != reserved.end()) continue;
            return candidate;
        }
    }
    return -1;
}

// What placing `shape` with its top row at `top` would take: the nets that must move off the
// strips its leads need (each a link), the joins its leads need, the board height after.
StripSweep::Plan StripSweep::plan(const Shape& shape, int top) const {
    Plan result;
    std::vector<int> reserved;
    int lowest = top;
    for (const ShapePin& pin : shape.pins) {
        reserved.push_back(top + pin.dy);
        lowest = std::max(lowest, top + pin.dy);
    }
    for (const Hole& hole : shape.body) lowest = std::max(lowest, top + hole.row);
    if (top < 0 || lowest >= maxRows_) return result;
    std::vector<int> band = shape.band;
    for (int i = 0; i < shape.bandRows; ++i) band.push_back(top + i);
    auto inBand = [&](int row) { return std::find(band.begin(), band.end(), row) != band.end(); };
    std::vector<int> movedRows;
    auto needsNewRow = [&](int net, int row) {
        Join join{net, row, freeRowNear(row, reserved), 0};
        if (join.newRow < 0) return false;
        reserved.push_back(join.newRow);
        result.relocations.push_back(join);
        result.newHeight = std::max(result.newHeight, join.newRow + 1);
        return true;
    };
    for (const ShapePin& pin : shape.pins) {
        if (pin.dx != 0) continue;
        const int row = top + pin.dy;
        const int here = rowNet_[static_cast<std::size_t>(row)];
        if (here >= 0 && here != pin.net) {
            if (!needsNewRow(here, row)) return result;
            movedRows.push_back(row);
        }
        if (inBand(row)) {
            // A DIP's left pin: its strip ends under the IC. A net that goes on needs another.
            int inColumn = 0;
            for (const ShapePin& other : shape.pins) inColumn += other.dx == 0 && other.net == pin.net;
            const bool goesOn = uses_[static_cast<std::size_t>(pin.net)] > inColumn;
            if (!goesOn || aliveRowOf(pin.net, band) >= 0) continue;
            if (here == pin.net) {
                if (!needsNewRow(pin.net, row)) return result;
            } else if (aliveRowOf(pin.net, {}) < 0 &&
                       std::none_of(result.starts.begin(), result.starts.end(),
                                    [&](const Join& j) { return j.net == pin.net; })) {
                const int newRow = freeRowNear(row, reserved);
                if (newRow < 0) return result;
                reserved.push_back(newRow);
                result.starts.push_back({pin.net, row, newRow, 0});
                result.newHeight = std::max(result.newHeight, newRow + 1);
            }
        }
    }
    std::vector<int> seen;  // nets with a lead of this part on a strip already
    for (const ShapePin& pin : shape.pins) {
        const int row = top + pin.dy;
        const bool onItsNet = pin.dx == 0 && rowNet_[static_cast<std::size_t>(row)] == pin.net;
        if (onItsNet) continue;
        std::vector<int> except = movedRows;
        if (pin.dx > 0) except.insert(except.end(), band.begin(), band.end());
        const bool alive = aliveRowOf(pin.net, except) >= 0 ||
                           std::find(seen.begin(), seen.end(), pin.net) != seen.end();
        if (alive) ++result.links;
        seen.push_back(pin.net);
    }
    result.links += static_cast<int>(result.relocations.size() + result.starts.size());
    result.newHeight = std::max({result.newHeight, height_, lowest + 1});
    result.valid = true;
    return result;
}

bool StripSweep::relocate(const std::vector<Join>& relocations, bool fixed) {
    std::vector<Join> pending;
    const int col = columns();
    std::vector<int> taken;
    for (const Join& join : relocations) taken.push_back(join.newRow);
    for (Join join : relocations) {
        join.fromCol = col;
        if (joinBack(join, col - 1)) {
            rowNet(join.newRow) = join.net;
        } else if (fixed) {
            // Pre-placed pins leave no new columns: any free strip whose link fits will do.
            if (!relocateAnywhere(join, taken)) return false;
        } else {
            pending.push_back(join);
        }
    }
    joinInNewColumns(pending);
    return true;
}

bool StripSweep::relocateAnywhere(Join join, std::vector<int>& taken) {
    for (int distance = 1; distance < maxRows_; ++distance) {
        for (int row : {join.aliveRow - distance, join.aliveRow + distance}) {
            if (row < 0 || row >= maxRows_ || rowNet(row) != -1) continue;
            if (std::find(taken.begin(), taken.end(), row) != taken.end()) continue;
            join.newRow = row;
            if (!joinBack(join, join.fromCol - 1)) continue;
            rowNet(row) = join.net;
            taken.push_back(row);
            return true;
        }
    }
    return false;
}

// Puts the shape's leads into new columns at the right; returns their holes. Joins of leads
// whose nets are on other strips are made here too.
std::vector<Hole> StripSweep::placeShape(const Shape& shape, int top,
                                         const std::vector<Join>& starts) {
    std::vector<Hole> holes(shape.pins.size());
    std::vector<Join> joins;
    for (const ShapePin& pin : shape.pins) {
        const int row = top + pin.dy;
        if (pin.dx == 0 && rowNet(row) != pin.net) rowNet(row) = -1;  // moved off by relocate()
    }
    for (Join start : starts) {
        start.fromCol = columns();
        if (startBack(start)) {
            rowNet(start.aliveRow) = start.net;
            rowNet(start.newRow) = start.net;
        } else {
            rowNet(start.newRow) = start.net;  // the pin's strip joins it below, before the IC
        }
    }
    // A DIP's left pin whose net is on another strip joins it before the IC: its own strip
    // ends under the IC.
    std::vector<Join> early;
    for (const ShapePin& pin : shape.pins) {
        const int row = top + pin.dy;
        if (pin.dx != 0 || row - top >= shape.bandRows || rowNet(row) == pin.net) continue;
        const int alive = aliveRowOf(pin.net, {});
        if (alive < 0) continue;
        const Join join{pin.net, alive, row, columns()};
        if (joinBack(join, columns() - 1)) {
            rowNet(row) = pin.net;
        } else {
            early.push_back(join);
        }
    }
    joinInNewColumns(early);
    for (int dx = 0; dx < shape.width; ++dx) {
        if (dx == 1) {
            for (int i = 0; i < shape.bandRows; ++i) rowNet(top + i) = -1;
        }
        const int col = newColumn();
        for (const Hole& hole : shape.body) {
            if (hole.col == dx) cell(top + hole.row, col).use = Use::Body;
        }
        for (std::size_t i = 0; i < shape.pins.size(); ++i) {
            const ShapePin& pin = shape.pins[i];
            if (pin.dx != dx) continue;
            const int row = top + pin.dy;
            if (rowNet(row) != pin.net) {
                const int alive = aliveRowOf(pin.net, {row});
                if (alive >= 0) joins.push_back({pin.net, alive, row, col});
            }
            rowNet(row) = pin.net;
            cell(row, col) = {pin.net, Use::Lead};
            touchHeight(row);
            holes[i] = {row, col};
        }
    }
    std::vector<Join> late;
    for (const Join& join : joins) {
        if (!joinBack(join, columns() - 1)) late.push_back(join);
    }
    joinInNewColumns(late);
    return holes;
}

// After a part: each net keeps one strip open (the one its last lead here is on), and nets
// with no leads left to place are closed.
void StripSweep::settle(const std::vector<ShapePin>& pins, const std::vector<Hole>& holes) {
    for (std::size_t i = 0; i < pins.size(); ++i) {
        const int net = pins[i].net;
        int keep = -1;
        for (std::size_t j = 0; j < pins.size(); ++j) {
            if (pins[j].net == net && rowNet(holes[j].row) == net) keep = holes[j].row;
        }
        if (keep < 0) keep = aliveRowOf(net, {});
        const bool pending = std::any_of(deferred_.begin(), deferred_.end(),
                                         [&](const Join& j) { return j.net == net; });
        for (int row = 0; row < maxRows_; ++row) {
            if (rowNet(row) == net && row != keep && !pending) rowNet(row) = -1;
        }
    }
    for (const ShapePin& pin : pins) --uses_[static_cast<std::size_t>(pin.net)];
    for (const ShapePin& pin : pins) {
        const bool pending = std::any_of(deferred_.begin(), deferred_.end(),
                                         [&](const Join& j) { return j.net == pin.net; });
        if (uses_[static_cast<std::size_t>(pin.net)] > 0 || pending) continue;
        for (int row = 0; row < maxRows_; ++row) {
            if (rowNet(row) == pin.net) rowNet(row) = -1;
        }
    }
}

std::optional<std::vector<Hole>> StripSweep::place(const std::vector<Shape>& shapes) {
    resolveDeferred(columns() - 1, true);
    const Shape* bestShape = nullptr;
    int bestTop = 0;
    long bestCost = 0;
    Plan bestPlan;
    for (const Shape& shape : shapes) {
        for (int top = 0; top < maxRows_; ++top) {
            Plan candidate = plan(shape, top);
            if (!candidate.valid) continue;
            const long cost = long{candidate.newHeight} * 100 + long{candidate.links} * 60 +
                              long{shape.preference} * 2 + top;
            if (bestShape == nullptr || cost < bestCost) {
                bestShape = &shape;
                bestTop = top;
                bestCost = cost;
                bestPlan = std::move(candidate);
            }
        }
    }
    if (bestShape == nullptr) return std::nullopt;
    relocate(bestPlan.relocations, false);
    std::vector<Hole> holes = placeShape(*bestShape, bestTop, bestPlan.starts);
    std::vector<ShapePin> pins = bestShape->pins;
    settle(pins, holes);
    return holes;
}

bool StripSweep::placeFixed(int col, const std::vector<ShapePin>& pins, const std::vector<int>& band) {
    while (columns() < col) newColumn();
    Shape shape;
    shape.pins = pins;
    shape.band = band;
    Plan fixedPlan = plan(shape, 0);
    if (!fixedPlan.valid || !relocate(fixedPlan.relocations, true)) return false;
    for (const ShapePin& pin : pins) {
        if (rowNet(pin.dy) != pin.net) rowNet(pin.dy) = -1;
    }
    for (Join start : fixedPlan.starts) {  // a DIP's pin whose new net goes on past it
        start.fromCol = col;
        if (!startBack(start)) return false;
        rowNet(start.aliveRow) = start.net;
        rowNet(start.newRow) = start.net;
    }
    for (const ShapePin& pin : pins) {  // a DIP's pin whose net is on another strip joins it now
        if (std::find(band.begin(), band.end(), pin.dy) == band.end() || rowNet(pin.dy) == pin.net) continue;
        const int alive = aliveRowOf(pin.net, {});
        if (alive < 0) continue;
        if (!joinBack({pin.net, alive, pin.dy, col}, col - 1)) return false;
        rowNet(pin.dy) = pin.net;
    }
    const int at = newColumn();
    std::vector<Hole> holes;
    for (const ShapePin& pin : pins) {
        if (cell(pin.dy, at).use != Use::Free) return false;
        if (rowNet(pin.dy) != pin.net) {
            const int alive = aliveRowOf(pin.net, {pin.dy});
            rowNet(pin.dy) = pin.net;
            cell(pin.dy, at).owner = pin.net;
            if (alive >= 0) {
                const Join join{pin.net, alive, pin.dy, at};
                if (!joinBack(join, at - 1)) deferred_.push_back(join);
            }
        }
        cell(pin.dy, at).use = Use::Lead;
        touchHeight(pin.dy);
        holes.push_back({pin.dy, at});
    }
    resolveDeferred(at, false);
    for (int row : band) {  // the DIP's strips end under it (unless a join still needs them)
        const bool needed = std::any_of(deferred_.begin(), deferred_.end(), [&](const Join& j) {
            return j.newRow == row || j.aliveRow == row;
        });
        if (!needed) rowNet(row) = -1;
    }
    settle(pins, holes);
    return true;
}

// Joins among pre-placed pins that found no link place when their pin went in: at `col`, or in
// new columns when `force`.
void StripSweep::resolveDeferred(int col, bool force) {
    if (deferred_.empty()) return;
    std::vector<Join> left;
    for (const Join& join : deferred_) {
        const bool both = col >= 0 && cell(join.aliveRow, col).owner == join.net &&
                          cell(join.newRow, col).owner == join.net;
        if (both && linkFits(col, join.aliveRow, join.newRow)) {
            addLink(col, join.aliveRow, join.newRow);
        } else {
            left.push_back(join);
        }
    }
    deferred_.clear();
    if (force) {
        joinInNewColumns(left);
    } else {
        deferred_ = std::move(left);
    }
    // Nets whose pins are all placed close once their joins are made.
    for (int row = 0; row < maxRows_; ++row) {
        const int net = rowNet(row);
        if (net < 0 || uses_[static_cast<std::size_t>(net)] > 0) continue;
        const bool pending = std::any_of(deferred_.begin(), deferred_.end(),
                                         [&](const Join& j) { return j.net == net; });
        if (!pending) rowNet(row) = -1;
    }
}

std::optional<std::vector<Hole>> StripSweep::placeWires(const std::vector<int>& nets) {
    resolveDeferred(columns() - 1, true);
    std::vector<Hole> holes;
    std::vector<int> inColumn;
    int col = -1;
    std::vector<ShapePin> pins;
    for (int net : nets) {
        if (col < 0 || std::find(inColumn.begin(), inColumn.end(), net) != inColumn.end()) {
            col = newColumn();
            inColumn.clear();
        }
        int row = aliveRowOf(net, {});
        if (row < 0) {
            row = freeRowNear(0, {});
            if (row < 0) return std::nullopt;
            rowNet(row) = net;
            cell(row, col).owner = net;
        }
        cell(row, col).use = Use::Lead;
        touchHeight(row);
        inColumn.push_back(net);
        holes.push_back({row, col});
        pins.push_back({net, row, 0});
    }
    settle(pins, holes);
    return holes;
}

SweepResult StripSweep::finish() const {
    SweepResult result;
    result.rows = height_;
    result.cols = columns();
    result.owner.resize(cells_.size());
    for (std::size_t col = 0; col < cells_.size(); ++col) {
        for (int row = 0; row < height_; ++row) result.owner[col].push_back(cells_[col][static_cast<std::size_t>(row)].owner);
    }
    result.links = links_;
    return result;
}

Occupancy occupiedHoles(const SweepResult& copper, const std::vector<std::vector<Hole>>& groups) {
    Occupancy taken(static_cast<std::size_t>(copper.cols), std::vector<char>(static_cast<std::size_t>(copper.rows), 0));
    auto mark = [&](Hole a, Hole b) {
        for (int col = std::min(a.col, b.col); col <= std::max(a.col, b.col); ++col)
            for (int row = std::min(a.row, b.row); row <= std::max(a.row, b.row); ++row)
                taken[static_cast<std::size_t>(col)][static_cast<std::size_t>(row)] = 1;
    };
    for (const auto& group : groups) {
        if (group.empty()) continue;
        Hole lo = group.front();
        Hole hi = group.front();
        for (const Hole& h : group) {
            lo = {std::min(lo.row, h.row), std::min(lo.col, h.col)};
            hi = {std::max(hi.row, h.row), std::max(hi.col, h.col)};
        }
        mark(lo, hi);
    }
    for (const auto& link : copper.links) mark(link.from, link.to);
    return taken;
}

}  // namespace netcheck::layout_detail
