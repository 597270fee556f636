#include "netcheck/repair/repair_step.hpp"

#include <algorithm>
#include <cmath>
#include <cstdlib>

#include "netcheck/edit/cut_commands.hpp"
#include "netcheck/edit/link_commands.hpp"
#include "netcheck/edit/part_commands.hpp"
#include "netcheck/edit/wire_commands.hpp"

namespace netcheck {

namespace {

std::string wireName(const Wire& wire) { return wire.from.name() + "-" + wire.to.name(); }

std::string cutPlace(const Cut& cut) {
    if (cut.kind == Cut::Kind::Hole) return "at " + holeName(cut.hole);
    return "between " + holeName(cut.hole) + " and " + holeName(Hole{cut.hole.row, cut.hole.col + 1});
}

// "C into C6, B into D6" for the pins whose holes change.
std::string leadPlaces(const std::vector<Pin>& before, const std::vector<Pin>& after) {
    std::string text;
    for (std::size_t k = 0; k < after.size(); ++k) {
        if (k < before.size() && before[k].hole == after[k].hole) continue;
        text += (text.empty() ? "" : ", ") + after[k].name + " into " + holeName(after[k].hole);
    }
    return text;
}

// The one pin whose hole changes (MoveLead changes exactly one).
std::size_t movedPin(const std::vector<Pin>& before, const std::vector<Pin>& after) {
    for (std::size_t k = 0; k < after.size() && k < before.size(); ++k) {
        if (before[k].hole != after[k].hole) return k;
    }
    return 0;
}

template <class T>
std::optional<std::size_t> indexOf(const std::vector<T>& list, const T& wanted) {
    const auto it = std::find(list.begin(), list.end(), wanted);
    if (it == list.end()) return std::nullopt;
    return static_cast<std::size_t>(it - list.begin());
}

std::optional<std::size_t> partIndex(const Board& board, const std::string& ref,
                                     const std::vector<Pin>& pins) {
    for (std::size_t i = 0; i < board.parts.size(); ++i) {
        if (board.parts[i].ref == ref && board.parts[i].pins == pins) return i;
    }
    return std::nullopt;
}

std::string capitalised(std::string text) {
    if (!text.empty() && text[0] >= 'a' && text[0] <= 'z') text[0] = static_cast<char>(text[0] - 'a' + 'A');
    return text;
}

}  // namespace

std::string_view repairActionId(RepairAction action) {
    switch (action) {
        case RepairAction::RemoveLink: return "remove-link";
        case RepairAction::RemoveWire: return "remove-wire";
        case RepairAction::TurnPart: return "turn-part";
        case RepairAction::ReorderPins: return "reorder-pins";
        case RepairAction::MoveCut: return "move-cut";
        case RepairAction::RemoveCut: return "remove-cut";
        case RepairAction::MoveLead: return "move-lead";
        case RepairAction::AddCut: return "add-cut";
        case RepairAction::AddLink: return "add-link";
    }
    return "";
}

RepairStep RepairStep::addCut(const Cut& cut) {
    RepairStep step;
    step.action = RepairAction::AddCut;
    step.cut = cut;
    return step;
}

RepairStep RepairStep::removeCut(const Cut& cut) {
    RepairStep step = addCut(cut);
    step.action = RepairAction::RemoveCut;
    return step;
}

RepairStep RepairStep::moveCut(const Cut& from, const Cut& to) {
    RepairStep step = addCut(from);
    step.action = RepairAction::MoveCut;
    step.movedTo = to;
    return step;
}

RepairStep RepairStep::addLink(const Link& link) {
    RepairStep step;
    step.action = RepairAction::AddLink;
    step.link = link;
    return step;
}

RepairStep RepairStep::removeLink(const Link& link) {
    RepairStep step = addLink(link);
    step.action = RepairAction::RemoveLink;
    return step;
}

RepairStep RepairStep::removeWire(const Wire& wire) {
    RepairStep step;
    step.action = RepairAction::RemoveWire;
    step.wire = wire;
    return step;
}

RepairStep RepairStep::changePins(RepairAction action, const Part& part, std::vector<Pin> after) {
    RepairStep step;
    step.action = action;
    step.ref = part.ref;
    step.pinsBefore = part.pins;
    step.pinsAfter = std::move(after);
    return step;
}

std::string RepairStep::words() const {
    switch (action) {
        case RepairAction::RemoveLink: return "remove the link " + linkName(*link);
        case RepairAction::RemoveWire: return "remove the wire " + wireName(*wire);
        case RepairAction::TurnPart:
            return "turn " + ref + " round: " + leadPlaces(pinsBefore, pinsAfter);
        case RepairAction::ReorderPins:
            return "put the leads of " + ref + " back in order: " + leadPlaces(pinsBefore, pinsAfter);
        case RepairAction::MoveCut: {
            const bool hole = movedTo->kind == Cut::Kind::Hole;
            return "move the cut " + cutPlace(*cut) + " to " + (hole ? "" : "the gap ") +
                   (hole ? holeName(movedTo->hole) : cutPlace(*movedTo));
        }
        case RepairAction::RemoveCut: return "remove the cut " + cutPlace(*cut);
        case RepairAction::MoveLead: {
            const std::size_t k = movedPin(pinsBefore, pinsAfter);
            return "move lead " + pinsAfter[k].name + " of " + ref + " from " +
                   holeName(pinsBefore[k].hole) + " to " + holeName(pinsAfter[k].hole);
        }
        case RepairAction::AddCut: return "cut the track " + cutPlace(*cut);
        case RepairAction::AddLink: return "add a link " + linkName(*link);
    }
    return "";
}

std::vector<Hole> RepairStep::holes() const {
    std::vector<Hole> holes;
    if (cut) holes.push_back(cut->hole);
    if (movedTo) holes.push_back(movedTo->hole);
    if (link) holes.insert(holes.end(), {link->from, link->to});
    if (wire) {
        for (const Endpoint* end : {&wire->from, &wire->to}) {
            if (end->hole) holes.push_back(*end->hole);
        }
    }
    for (const Pin& pin : pinsAfter) holes.push_back(pin.hole);
    return holes;
}

double RepairStep::cost() const {
    switch (action) {
        case RepairAction::RemoveLink:
        case RepairAction::RemoveWire:
        case RepairAction::TurnPart: return 1;
        case RepairAction::ReorderPins: return 1.5;
        case RepairAction::RemoveCut: return 1.5;
        case RepairAction::MoveCut: return 2;
        case RepairAction::MoveLead: return 3;
        case RepairAction::AddCut: return 4;
        case RepairAction::AddLink:
            return 5 + 0.2 * std::hypot(link->to.row - link->from.row, link->to.col - link->from.col);
    }
    return 10;
}

std::string RepairStep::key() const { return std::string(repairActionId(action)) + " " + words(); }

std::unique_ptr<edit::Command> RepairStep::command(const Board& board) const {
    const std::string label = capitalised(words());
    switch (action) {
        case RepairAction::RemoveLink:
            if (auto i = indexOf(board.links, *link)) return std::make_unique<edit::RemoveLink>(board, *i, label);
            return nullptr;
        case RepairAction::RemoveWire:
            if (auto i = indexOf(board.wires, *wire)) return std::make_unique<edit::RemoveWire>(board, *i, label);
            return nullptr;
        case RepairAction::TurnPart:
        case RepairAction::ReorderPins:
        case RepairAction::MoveLead:
            if (auto i = partIndex(board, ref, pinsBefore)) {
                Part after = board.parts[*i];
                after.pins = pinsAfter;
                return std::make_unique<edit::ReplacePart>(board, *i, std::move(after), label);
            }
            return nullptr;
        case RepairAction::MoveCut:
            if (indexOf(board.cuts, *movedTo)) return nullptr;
            if (auto i = indexOf(board.cuts, *cut)) return std::make_unique<edit::ReplaceCut>(board, *i, *movedTo, label);
            return nullptr;
        case RepairAction::RemoveCut:
            if (auto i = indexOf(board.cuts, *cut)) return std::make_unique<edit::RemoveCut>(board, *i, label);
            return nullptr;
        case RepairAction::AddCut:
            if (indexOf(board.cuts, *cut)) return nullptr;
            return std::make_unique<edit::AddCut>(*cut, std::nullopt, label);
        case RepairAction::AddLink:
            return std::make_unique<edit::AddLink>(*link, std::nullopt, label);
    }
    return nullptr;
}

}  // namespace netcheck
