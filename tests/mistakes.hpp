// The mutation harness of the repair planner: correct boards, and the mistakes makers make on
// them (the list is the usual bench experience, common practice rather than a published
// survey). Used by the repair property test (unit-repair.cpp) and bench_repair.
#pragma once

#include <algorithm>
#include <functional>
#include <optional>
#include <set>
#include <random>
#include <string>
#include <vector>

#include "netcheck/check/check.hpp"
#include "netcheck/check/circuit_capture.hpp"
#include "netcheck/check/connectivity.hpp"
#include "netcheck/model/board.hpp"
#include "netcheck/model/part_kinds.hpp"
#include "netcheck/repair/repair_plan.hpp"

namespace mistakes {

using netcheck::Board;
using netcheck::Cut;
using netcheck::Hole;

inline int uniform(std::mt19937& rng, int low, int high) {
    return std::uniform_int_distribution<int>(low, high)(rng);
}

/// Leads per hole (part pins, link ends, wire ends) and hole cuts, to find free holes.
class Occupancy {
public:
    explicit Occupancy(const Board& board) : board_(board), leads_(static_cast<std::size_t>(board.holeCount()), 0) {
        for (const auto& part : board.parts) {
            for (const auto& pin : part.pins) add(pin.hole);
        }
        for (const auto& link : board.links) {
            add(link.from);
            add(link.to);
        }
        for (const auto& wire : board.wires) {
            if (wire.from.hole) add(*wire.from.hole);
            if (wire.to.hole) add(*wire.to.hole);
        }
    }
    int leadsIn(Hole hole) const { return board_.contains(hole) ? leads_[index(hole)] : 0; }
    bool isHoleCut(Hole hole) const {
        return std::find(board_.cuts.begin(), board_.cuts.end(), Cut{hole, Cut::Kind::Hole}) != board_.cuts.end();
    }
    bool isFree(Hole hole) const { return board_.contains(hole) && leadsIn(hole) == 0 && !isHoleCut(hole); }
    void add(Hole hole) {
        if (board_.contains(hole)) ++leads_[index(hole)];
    }

private:
    std::size_t index(Hole hole) const { return static_cast<std::size_t>(hole.row * board_.cols + hole.col); }
    const Board& board_;
    std::vector<int> leads_;
};

/// A correct board: parts standing across adjacent strips (two-lead parts on two strips, transistors
/// on three, in one column), short links, cuts; its circuit is its own copper, so it checks clean.
inline Board correctBoard(std::mt19937& rng, int rows, int cols, int parts) {
    Board board;
    board.rows = rows;
    board.cols = cols;
    board.title = "generated";
    Occupancy taken(board);
    auto freeColumn = [&](int length, Hole& top) {
        for (int tries = 0; tries < 1000; ++tries) {
            top = Hole{uniform(rng, 0, rows - length), uniform(rng, 0, cols - 1)};
            bool free = true;
            for (int k = 0; k < length; ++k) free = free && taken.isFree(Hole{top.row + k, top.col});
            if (free) return true;
        }
        return false;
    };
    for (int i = 0; i < rows * cols / 12; ++i) {
        const Cut cut{Hole{uniform(rng, 0, rows - 1), uniform(rng, 0, cols - 2)},
                      i % 2 ? Cut::Kind::Hole : Cut::Kind::Between};
        if (std::find(board.cuts.begin(), board.cuts.end(), cut) == board.cuts.end()) board.cuts.push_back(cut);
    }
    for (int i = 0; i < rows * cols / 48; ++i) {
        Hole top;
        if (!freeColumn(3, top)) break;
        const Hole bottom{top.row + 2, top.col};
        board.links.push_back(netcheck::Link{top, bottom});
        taken.add(top);
        taken.add(Hole{top.row + 1, top.col});  // keep the hole under the link clear of leads
        taken.add(bottom);
    }
    static const char* const kKinds[] = {"resistor", "electrolytic", "diode", "bjt", "capacitor", "led"};
    for (int i = 0; i < parts; ++i) {
        const std::string kind = kKinds[i % 6];
        const auto* table = netcheck::findPartKind(kind);
        const int leads = static_cast<int>(table->pins.size());
        Hole top;
        if (!freeColumn(leads, top)) break;
        netcheck::Part part{kind.substr(0, 1) + std::to_string(i + 1), kind, kind == "bjt" ? "BC547" : "1k", {}, {}};
        part.ref[0] = static_cast<char>(std::toupper(part.ref[0]));
        for (int k = 0; k < leads; ++k) {
            const Hole hole{top.row + k, top.col};
            part.pins.push_back(netcheck::Pin{std::string(table->pins[static_cast<std::size_t>(k)]), hole});
            taken.add(hole);
        }
        board.parts.push_back(std::move(part));
    }
    netcheck::Circuit circuit;
    for (const auto& part : board.parts) circuit.parts[part.ref] = {part.kind, part.value, {}, {}};
    int net = 0;
    for (auto& group : netcheck::boardNets(board)) {
        if (group.size() > 1) circuit.nets["N" + std::to_string(++net)] = std::move(group);
    }
    board.circuit = std::move(circuit);
    return board;
}

/// One mistake: its kind and the board with it made.
struct Mistake {
    std::string kind;
    Board board;
};

using MistakeMaker = std::function<std::optional<Board>(std::mt19937&, const Board&)>;

inline std::optional<Board> removeCut(std::mt19937& rng, const Board& board) {
    if (board.cuts.empty()) return std::nullopt;
    Board made = board;
    made.cuts.erase(made.cuts.begin() + uniform(rng, 0, static_cast<int>(made.cuts.size()) - 1));
    return made;
}

inline std::optional<Board> addCutOnUsedStrip(std::mt19937& rng, const Board& board) {
    if (board.parts.empty()) return std::nullopt;
    const auto& part = board.parts[static_cast<std::size_t>(uniform(rng, 0, static_cast<int>(board.parts.size()) - 1))];
    const Hole at = part.pins.front().hole;
    const Cut cut{Hole{at.row, std::clamp(at.col + uniform(rng, -3, 2), 0, board.cols - 2)}, Cut::Kind::Between};
    if (std::find(board.cuts.begin(), board.cuts.end(), cut) != board.cuts.end()) return std::nullopt;
    Board made = board;
    made.cuts.push_back(cut);
    return made;
}

inline std::optional<Board> moveCut(std::mt19937& rng, const Board& board) {
    if (board.cuts.empty()) return std::nullopt;
    Board made = board;
    Cut& cut = made.cuts[static_cast<std::size_t>(uniform(rng, 0, static_cast<int>(made.cuts.size()) - 1))];
    static const int kBy[] = {-2, -1, 1, 2};
    Cut moved = cut;
    moved.hole.col += kBy[uniform(rng, 0, 3)];
    const bool onBoard = moved.hole.col >= 0 && moved.hole.col + (moved.kind == Cut::Kind::Between ? 1 : 0) < board.cols;
    if (!onBoard || std::find(board.cuts.begin(), board.cuts.end(), moved) != board.cuts.end()) return std::nullopt;
    if (moved.kind == Cut::Kind::Hole && !Occupancy(board).isFree(moved.hole)) return std::nullopt;
    cut = moved;
    return made;
}

inline std::optional<Board> addStrayLink(std::mt19937& rng, const Board& board) {
    const Occupancy taken(board);
    const Hole from{uniform(rng, 0, board.rows - 2), uniform(rng, 0, board.cols - 1)};
    const Hole to{from.row + 1, from.col};
    if (!taken.isFree(from) || !taken.isFree(to)) return std::nullopt;
    Board made = board;
    made.links.push_back(netcheck::Link{from, to});
    return made;
}

inline std::optional<Board> removeLink(std::mt19937& rng, const Board& board) {
    if (board.links.empty()) return std::nullopt;
    Board made = board;
    made.links.erase(made.links.begin() + uniform(rng, 0, static_cast<int>(made.links.size()) - 1));
    return made;
}

inline netcheck::Part* randomPart(std::mt19937& rng, Board& board, const std::function<bool(const netcheck::Part&)>& wanted) {
    std::vector<netcheck::Part*> fits;
    for (auto& part : board.parts) {
        if (wanted(part)) fits.push_back(&part);
    }
    if (fits.empty()) return nullptr;
    return fits[static_cast<std::size_t>(uniform(rng, 0, static_cast<int>(fits.size()) - 1))];
}

inline std::optional<Board> reversePolarisedPart(std::mt19937& rng, const Board& board) {
    Board made = board;
    netcheck::Part* part = randomPart(rng, made, [](const netcheck::Part& p) {
        const auto* kind = netcheck::findPartKind(p.kind);
        return kind && kind->polarised && p.pins.size() == 2;
    });
    if (!part) return std::nullopt;
    std::swap(part->pins[0].hole, part->pins[1].hole);
    return made;
}

inline std::optional<Board> rotateTransistorPins(std::mt19937& rng, const Board& board) {
    Board made = board;
    netcheck::Part* part = randomPart(rng, made, [](const netcheck::Part& p) { return p.pins.size() == 3; });
    if (!part) return std::nullopt;
    const Hole first = part->pins[0].hole;
    part->pins[0].hole = part->pins[1].hole;
    part->pins[1].hole = part->pins[2].hole;
    part->pins[2].hole = first;
    return made;
}

// One lead moved to a neighbouring hole that is free (`intoLead` false) or holds another lead.
inline std::optional<Board> moveOneLead(std::mt19937& rng, const Board& board, bool intoLead) {
    Board made = board;
    netcheck::Part* part = randomPart(rng, made, [](const netcheck::Part&) { return true; });
    if (!part) return std::nullopt;
    netcheck::Pin& pin = part->pins[static_cast<std::size_t>(uniform(rng, 0, static_cast<int>(part->pins.size()) - 1))];
    static const Hole kBy[] = {{0, 1}, {0, -1}, {1, 0}, {-1, 0}};
    const Hole by = kBy[uniform(rng, 0, 3)];
    const Hole to{pin.hole.row + by.row, pin.hole.col + by.col};
    const Occupancy taken(board);
    const bool fits = intoLead ? taken.leadsIn(to) > 0 && !taken.isHoleCut(to) : taken.isFree(to);
    if (!fits) return std::nullopt;
    for (const auto& other : part->pins) {
        if (other.hole == to) return std::nullopt;  // into its own other lead is another mistake
    }
    pin.hole = to;
    return made;
}

/// Every kind of mistake, by name, in report order.
inline const std::vector<std::pair<std::string, MistakeMaker>>& mistakeKinds() {
    static const std::vector<std::pair<std::string, MistakeMaker>> kinds = {
        {"cut left out", removeCut},
        {"cut on a used strip", addCutOnUsedStrip},
        {"cut one or two holes off", moveCut},
        {"stray link", addStrayLink},
        {"link left out", removeLink},
        {"polarised part reversed", reversePolarisedPart},
        {"transistor leads rotated", rotateTransistorPins},
        {"lead one hole off", [](std::mt19937& rng, const Board& b) { return moveOneLead(rng, b, false); }},
        {"lead in a neighbour's hole", [](std::mt19937& rng, const Board& b) { return moveOneLead(rng, b, true); }},
    };
    return kinds;
}

/// `count` mistakes of random kinds made on `board`, keeping only a result that checks with at
/// least one error; nullopt when none was found in a few tries.
inline std::optional<Mistake> makeMistakes(std::mt19937& rng, const Board& board, int count,
                                           std::optional<std::size_t> kind = std::nullopt) {
    const auto& kinds = mistakeKinds();
    for (int tries = 0; tries < 50; ++tries) {
        Board made = board;
        std::string names;
        bool done = true;
        for (int i = 0; i < count && done; ++i) {
            const std::size_t k = kind ? *kind : static_cast<std::size_t>(uniform(rng, 0, static_cast<int>(kinds.size()) - 1));
            std::optional<Board> next = kinds[k].second(rng, made);
            done = next.has_value();
            if (done) made = std::move(*next);
            names += (names.empty() ? "" : " + ") + kinds[k].first;
        }
        if (done && !netcheck::check(made).ok()) return Mistake{names, std::move(made)};
    }
    return std::nullopt;
}

// ---- the rule, checked with the plain check alone ---------------------------------------------

/// The faults that must never appear where they were not: shorts by their nets, opens by their
/// net, shared holes and leads on cuts by their hole, part findings by their ref.
inline std::multiset<std::string> faults(const netcheck::CheckReport& report) {
    std::multiset<std::string> found;
    for (const netcheck::Finding& error : report.errors) {
        std::string key(error.id());
        for (const std::string& net : error.nets) key += " " + net;
        key += " " + error.net + " " + error.ref;
        if (error.hole) key += " " + netcheck::holeName(*error.hole);
        found.insert(key);
    }
    return found;
}

/// Whether an edit from `before` to `after` helps: fewer errors and no fault that was not there.
inline bool helps(const netcheck::CheckReport& before, const netcheck::CheckReport& after) {
    const auto was = faults(before);
    const auto is = faults(after);
    return after.errors.size() < before.errors.size() && std::includes(was.begin(), was.end(), is.begin(), is.end());
}

/// Each step of the plan, done in order, helps.
inline bool everyStepHelps(const Board& board, const netcheck::RepairPlan& plan) {
    Board edited = board;
    netcheck::CheckReport before = netcheck::check(edited);
    for (const netcheck::RepairStep& step : plan.steps) {
        auto command = step.command(edited);
        if (!command) return false;
        command->apply(edited);
        netcheck::CheckReport after = netcheck::check(edited);
        if (!helps(before, after)) return false;
        before = std::move(after);
    }
    return true;
}

/// The number of own fixes left on the findings of `report` (the plan attached) that do not help.
inline int harmfulOwnFixes(const Board& board, const netcheck::CheckReport& report) {
    int harmful = 0;
    for (const netcheck::Finding& error : report.errors) {
        Board fixed = board;
        bool any = false;
        if (error.suggestedCut) fixed.cuts.push_back(*error.suggestedCut), any = true;
        for (const auto& link : error.suggestedLinks) fixed.links.push_back(link), any = true;
        if (error.cutToRemove) {
            std::erase(fixed.cuts, *error.cutToRemove);
            any = true;
        }
        if (any && !helps(report, netcheck::check(fixed))) ++harmful;
    }
    return harmful;
}

}  // namespace mistakes
