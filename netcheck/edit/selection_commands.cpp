#include "netcheck/edit/selection_commands.hpp"

#include <algorithm>

#include "netcheck/edit/compound_command.hpp"
#include "netcheck/edit/cut_commands.hpp"
#include "netcheck/edit/link_commands.hpp"
#include "netcheck/edit/offboard_commands.hpp"
#include "netcheck/edit/part_commands.hpp"
#include "netcheck/edit/shift_holes.hpp"
#include "netcheck/edit/wire_commands.hpp"

namespace netcheck::edit {

namespace {

using Members = std::vector<std::unique_ptr<Command>>;

// Folds the members into one command: the member itself when it is alone, so the Edit menu
// reads "Remove R1" rather than "Delete 1 item".
std::unique_ptr<Command> group(Members members, std::string label, const std::string& verb) {
    if (members.empty()) return nullptr;
    if (members.size() == 1 && label.empty()) return std::move(members.front());
    if (label.empty()) label = verb + " " + std::to_string(members.size()) + " items";
    return std::make_unique<CompoundCommand>(std::move(label), std::move(members));
}

std::unique_ptr<Command> removeOne(const Board& board, ElementRef ref) {
    switch (ref.kind) {
        case ElementRef::Kind::Part: return std::make_unique<RemovePart>(board, ref.index);
        case ElementRef::Kind::Link: return std::make_unique<RemoveLink>(board, ref.index);
        case ElementRef::Kind::Cut: return std::make_unique<RemoveCut>(board, ref.index);
        case ElementRef::Kind::Offboard: return std::make_unique<RemoveOffboard>(board, ref.index);
        case ElementRef::Kind::Wire: return std::make_unique<RemoveWire>(board, ref.index);
    }
    return nullptr;
}

bool wireTouchesPart(const Wire& wire, const std::string& ref) {
    return (!wire.from.isHole() && wire.from.lug.ref == ref) ||
           (!wire.to.isHole() && wire.to.lug.ref == ref);
}

// Adds the wires to every selected off-board part to the selection.
void addDanglingWires(const Board& board, std::vector<ElementRef>& selection) {
    const std::size_t selected = selection.size();
    for (std::size_t s = 0; s < selected; ++s) {
        if (selection[s].kind != ElementRef::Kind::Offboard) continue;
        if (selection[s].index >= board.offboard.size()) continue;  // reported by removeOne
        const std::string& ref = board.offboard[selection[s].index].ref;
        for (std::size_t w = 0; w < board.wires.size(); ++w) {
            if (wireTouchesPart(board.wires[w], ref)) {
                selection.push_back(ElementRef{ElementRef::Kind::Wire, w});
            }
        }
    }
}

std::unique_ptr<Command> moveOne(const Board& board, ElementRef ref, int rows, int cols) {
    switch (ref.kind) {
        case ElementRef::Kind::Part: {
            requireInStep(ref.index < board.parts.size(), "Move", "no such part");
            Part part = board.parts[ref.index];
            shiftHoles(part, rows, cols);
            return std::make_unique<ReplacePart>(board, ref.index, std::move(part));
        }
        case ElementRef::Kind::Link: {
            requireInStep(ref.index < board.links.size(), "Move", "no such link");
            Link link = board.links[ref.index];
            shiftHoles(link, rows, cols);
            return std::make_unique<ReplaceLink>(board, ref.index, std::move(link));
        }
        case ElementRef::Kind::Cut: {
            requireInStep(ref.index < board.cuts.size(), "Move", "no such cut");
            Cut cut = board.cuts[ref.index];
            shiftHoles(cut, rows, cols);
            return std::make_unique<ReplaceCut>(board, ref.index, cut);
        }
        case ElementRef::Kind::Wire: {
            requireInStep(ref.index < board.wires.size(), "Move", "no such wire");
            Wire wire = board.wires[ref.index];
            shiftHoles(wire, rows, cols);
            if (wire == board.wires[ref.index]) return nullptr;  // lug to lug: nothing moves
            return std::make_unique<ReplaceWire>(board, ref.index, std::move(wire));
        }
        case ElementRef::Kind::Offboard: return nullptr;
    }
    return nullptr;
}

void sortUnique(std::vector<ElementRef>& selection, bool descending) {
    std::sort(selection.begin(), selection.end());
    selection.erase(std::unique(selection.begin(), selection.end()), selection.end());
    if (descending) std::reverse(selection.begin(), selection.end());
}

}  // namespace

std::unique_ptr<Command> deleteElements(const Board& board, std::vector<ElementRef> selection,
                                        std::string label) {
    addDanglingWires(board, selection);
    // Each list is its own vector, so removing from the back of each keeps the other indices.
    sortUnique(selection, true);
    Members members;
    for (const ElementRef& ref : selection) members.push_back(removeOne(board, ref));
    return group(std::move(members), std::move(label), "Delete");
}

std::unique_ptr<Command> moveElements(const Board& board, std::vector<ElementRef> selection,
                                      int rows, int cols, std::string label) {
    if (rows == 0 && cols == 0) return nullptr;
    sortUnique(selection, false);
    Members members;
    for (const ElementRef& ref : selection) {
        if (auto member = moveOne(board, ref, rows, cols)) members.push_back(std::move(member));
    }
    return group(std::move(members), std::move(label), "Move");
}

}  // namespace netcheck::edit
