#include "netcheck/repair/detail/candidates.hpp"

#include <algorithm>
#include <set>
#include <string>
#include <tuple>

#include "netcheck/check/connectivity.hpp"
#include "netcheck/model/part_kinds.hpp"

namespace netcheck {

namespace {

constexpr Hole kNeighbours[] = {{0, 1}, {0, -1}, {1, 0}, {-1, 0}};

Hole offset(Hole hole, Hole by) { return Hole{hole.row + by.row, hole.col + by.col}; }

class CandidateFinder {
public:
    explicit CandidateFinder(const Board& board)
        : board_(board), copper_(board), leads_(static_cast<std::size_t>(board.holeCount()), 0) {
        for (const Part& part : board.parts) {
            for (const Pin& pin : part.pins) countLead(pin.hole);
        }
        for (const Link& link : board.links) {
            countLead(link.from);
            countLead(link.to);
        }
        for (const Wire& wire : board.wires) {
            for (const Endpoint* end : {&wire.from, &wire.to}) {
                if (end->hole) countLead(*end->hole);
            }
        }
    }

    std::vector<RepairStep> run(const CheckReport& report) {
        for (const Finding& error : report.errors) {
            switch (error.type) {
                case FindingType::Short: forShort(error); break;
                case FindingType::Open: forOpen(error); break;
                case FindingType::ReversedPart: reorderings(board_.findPart(error.ref)); break;
                case FindingType::SharedHole: forSharedHole(*error.hole); break;
                case FindingType::PinOnCut: forLeadOnCut(*error.hole); break;
                default: break;
            }
        }
        return std::move(steps_);
    }

private:
    void countLead(Hole hole) {
        if (board_.contains(hole)) ++leads_[index(hole)];
    }
    std::size_t index(Hole hole) const {
        return static_cast<std::size_t>(hole.row * board_.cols + hole.col);
    }
    bool holdsLead(Hole hole) const { return leads_[index(hole)] > 0; }
    // Copper and nothing soldered in it: where a lead may go or a hole cut be made.
    bool isFree(Hole hole) const {
        return board_.contains(hole) && !holdsLead(hole) && !copper_.isHoleCut(hole);
    }

    void add(RepairStep step) {
        if (seen_.insert(step.key()).second) steps_.push_back(std::move(step));
    }

    // ---- shorts ----------------------------------------------------------------------------

    void forShort(const Finding& error) {
        if (error.path.empty()) return;
        const int island = copper_.islandOfHole(error.path.front());
        strayJoins(island);
        for (const std::vector<Hole>& run : stripRuns(error.path)) {
            const std::vector<Cut> gaps = gapCuts(run);
            for (const Cut& cut : gaps) add(RepairStep::addCut(cut));
            cutsMovedInto(run, gaps);
        }
        if (error.suggestedCut) add(RepairStep::addCut(*error.suggestedCut));
        for (const Hole& end : {error.path.front(), error.path.back()}) {
            for (const Part& part : board_.parts) {
                for (const Pin& pin : part.pins) {
                    if (pin.hole == end) partSteps(part);
                }
            }
        }
    }

    // Links and wires with an end in the island: a stray one is the likeliest short.
    void strayJoins(int island) {
        auto inIsland = [&](Hole hole) { return copper_.islandOfHole(hole) == island; };
        for (const Link& link : board_.links) {
            if (inIsland(link.from) || inIsland(link.to))
                add(RepairStep::removeLink(link));
        }
        for (const Wire& wire : board_.wires) {
            const bool touches = (wire.from.hole && inIsland(*wire.from.hole)) ||
                                 (wire.to.hole && inIsland(*wire.to.hole)) ||
                                 (!wire.from.hole && copper_.islandOfPin(wire.from.lug) == island) ||
                                 (!wire.to.hole && copper_.islandOfPin(wire.to.lug) == island);
            if (touches) add(RepairStep::removeWire(wire));
        }
    }

    // The path cut into stretches along one strip, each in column order.
    static std::vector<std::vector<Hole>> stripRuns(const std::vector<Hole>& path) {
        std::vector<std::vector<Hole>> runs;
        for (std::size_t i = 0; i < path.size(); ++i) {
            const bool continues = i > 0 && path[i].row == path[i - 1].row &&
                                   std::abs(path[i].col - path[i - 1].col) == 1;
            if (!continues) runs.emplace_back();
            runs.back().push_back(path[i]);
        }
        for (auto& run : runs) std::sort(run.begin(), run.end());
        return runs;
    }

    // One cut per gap between two lead-holding holes of a run (a cut anywhere in the gap parts
    // the same leads): a hole cut in the free hole nearest the gap's middle, else a cut between
    // the two holes.
    std::vector<Cut> gapCuts(const std::vector<Hole>& run) const {
        std::vector<Cut> cuts;
        std::optional<Hole> lastLead;
        for (const Hole& hole : run) {
            if (!holdsLead(hole)) continue;
            if (lastLead) cuts.push_back(cutBetween(*lastLead, hole));
            lastLead = hole;
        }
        return cuts;
    }

    Cut cutBetween(Hole left, Hole right) const {
        const int middle = (left.col + right.col) / 2;
        for (int distance = 0; distance <= (right.col - left.col) / 2; ++distance) {
            for (int col : {middle - distance, middle + distance + 1}) {
                const Hole hole{left.row, col};
                if (col > left.col && col < right.col && isFree(hole)) return Cut{hole, Cut::Kind::Hole};
            }
        }
        return Cut{Hole{left.row, middle}, Cut::Kind::Between};
    }

    // A cut of the run's strip up to three holes outside the run, moved into one of its gaps.
    void cutsMovedInto(const std::vector<Hole>& run, const std::vector<Cut>& gaps) {
        for (const Cut& cut : board_.cuts) {
            if (cut.hole.row != run.front().row || cut.hole.col < run.front().col - 3 ||
                cut.hole.col > run.back().col + 3)
                continue;
            for (const Cut& gap : gaps) {
                Cut to = gap;
                if (cut.kind == Cut::Kind::Hole && gap.kind == Cut::Kind::Between) continue;
                if (cut.kind == Cut::Kind::Between) to.kind = Cut::Kind::Between;
                if (to != cut) add(RepairStep::moveCut(cut, to));
            }
        }
    }

    // ---- opens -----------------------------------------------------------------------------

    void forOpen(const Finding& error) {
        std::set<int> islands;
        for (const Hole& hole : error.holes) islands.insert(copper_.islandOfHole(hole));
        for (const Cut& cut : board_.cuts) {
            if (bordersAny(cut, islands)) cutShifts(cut);
        }
        if (error.cutToRemove) add(RepairStep::removeCut(*error.cutToRemove));
        for (const Link& link : error.suggestedLinks) add(RepairStep::addLink(link));
        smallestPieceParts(error);
    }

    bool bordersAny(const Cut& cut, const std::set<int>& islands) const {
        auto near = [&](Hole hole) { return board_.contains(hole) && islands.count(copper_.islandOfHole(hole)); };
        const Hole left = cut.kind == Cut::Kind::Hole ? offset(cut.hole, {0, -1}) : cut.hole;
        return near(left) || near(offset(cut.hole, {0, 1}));
    }

    // Remove the cut, or move it one or two holes along its strip.
    void cutShifts(const Cut& cut) {
        add(RepairStep::removeCut(cut));
        for (int by : {-1, 1, -2, 2}) {
            Cut to = cut;
            to.hole.col += by;
            const bool fits = cut.kind == Cut::Kind::Hole ? isFree(to.hole)
                                                          : to.hole.col >= 0 && to.hole.col + 1 < board_.cols;
            if (fits) add(RepairStep::moveCut(cut, to));
        }
    }

    void smallestPieceParts(const Finding& error) {
        const std::vector<PinRef>* smallest = nullptr;
        for (const auto& piece : error.pieces) {
            if (smallest == nullptr || piece.size() < smallest->size()) smallest = &piece;
        }
        if (smallest == nullptr) return;
        for (const PinRef& pin : *smallest) {
            if (const Part* part = board_.findPart(pin.ref)) partSteps(*part);
        }
    }

    // ---- leads -----------------------------------------------------------------------------

    void forSharedHole(Hole hole) {
        for (const Part& part : board_.parts) {
            for (std::size_t k = 0; k < part.pins.size(); ++k) {
                if (part.pins[k].hole == hole) leadMoves(part, k);
            }
        }
        for (const Link& link : board_.links) {
            if (link.from == hole || link.to == hole) add(RepairStep::removeLink(link));
        }
        for (const Wire& wire : board_.wires) {
            if (wire.from.hole == hole || wire.to.hole == hole) add(RepairStep::removeWire(wire));
        }
    }

    void forLeadOnCut(Hole hole) {
        for (const Cut& cut : board_.cuts) {
            if (cut.kind == Cut::Kind::Hole && cut.hole == hole) cutShifts(cut);
        }
        forSharedHole(hole);
    }

    void partSteps(const Part& part) {
        const PartKind* kind = findPartKind(part.kind);
        if (part.pins.size() == 2 && (kind == nullptr || kind->polarised)) reorderings(&part);
        if (part.pins.size() >= 3 && part.pins.size() <= 4) {
            reorderings(&part);
            quarterTurns(part);
        }
        for (std::size_t k = 0; k < part.pins.size(); ++k) leadMoves(part, k);
    }

    // Every other order of the part's leads in its own holes (a two-lead part: turned round).
    void reorderings(const Part* part) {
        if (part == nullptr || part->pins.size() < 2 || part->pins.size() > 4) return;
        std::vector<Hole> holes;
        for (const Pin& pin : part->pins) holes.push_back(pin.hole);
        std::vector<std::size_t> order(holes.size());
        for (std::size_t k = 0; k < order.size(); ++k) order[k] = k;
        while (std::next_permutation(order.begin(), order.end())) {
            std::vector<Pin> after = part->pins;
            for (std::size_t k = 0; k < after.size(); ++k) after[k].hole = holes[order[k]];
            const RepairAction action = part->pins.size() == 2 ? RepairAction::TurnPart : RepairAction::ReorderPins;
            add(RepairStep::changePins(action, *part, after));
        }
    }

    // The part's holes turned a quarter, a half or three quarters about one of its leads.
    void quarterTurns(const Part& part) {
        for (const Pin& pivot : part.pins) {
            for (int turn = 1; turn <= 3; ++turn) {
                std::vector<Pin> after = part.pins;
                bool fits = true;
                for (Pin& pin : after) {
                    int dr = pin.hole.row - pivot.hole.row;
                    int dc = pin.hole.col - pivot.hole.col;
                    for (int q = 0; q < turn; ++q) std::tie(dr, dc) = std::pair{dc, -dr};
                    pin.hole = Hole{pivot.hole.row + dr, pivot.hole.col + dc};
                    fits = fits && (isFree(pin.hole) || ownsHole(part, pin.hole));
                }
                if (fits) add(RepairStep::changePins(RepairAction::ReorderPins, part, after));
            }
        }
    }

    static bool ownsHole(const Part& part, Hole hole) {
        return std::any_of(part.pins.begin(), part.pins.end(), [&](const Pin& pin) { return pin.hole == hole; });
    }

    void leadMoves(const Part& part, std::size_t k) {
        for (const Hole& by : kNeighbours) {
            std::vector<Pin> after = part.pins;
            after[k].hole = offset(after[k].hole, by);
            if (isFree(after[k].hole))
                add(RepairStep::changePins(RepairAction::MoveLead, part, after));
        }
    }

    const Board& board_;
    const Connectivity copper_;
    std::vector<int> leads_;  // by hole: leads soldered in it
    std::vector<RepairStep> steps_;
    std::set<std::string> seen_;
};

}  // namespace

std::vector<RepairStep> candidateSteps(const Board& board, const CheckReport& report) {
    return CandidateFinder(board).run(report);
}

}  // namespace netcheck
