#include "editor/tools/edit_actions.hpp"

#include <algorithm>
#include <climits>

#include "editor/canvas/offboard_layout.hpp"
#include "editor/tools/hit_test.hpp"
#include "editor/tools/part_factory.hpp"
#include "editor/tools/ref_names.hpp"
#include "netcheck/edit/edit.hpp"

namespace stripsmith {

using netcheck::Hole;
using netcheck::edit::ElementRef;

void undo(const EditContext& c) {
    if (c.commands.undo()) c.selection.clear();
}

void redo(const EditContext& c) {
    if (c.commands.redo()) c.selection.clear();
}

void deleteSelection(const EditContext& c) {
    if (c.selection.empty()) return;
    std::vector<ElementRef> refs(c.selection.begin(), c.selection.end());
    if (c.commands.perform(netcheck::edit::deleteElements(c.doc.board(), refs))) c.selection.clear();
}

void rotateSelection(const EditContext& c) {
    const auto& board = c.doc.board();
    std::vector<std::unique_ptr<netcheck::edit::Command>> members;
    for (const ElementRef& ref : c.selection) {
        if (ref.kind != ElementRef::Kind::Part) continue;
        const netcheck::Part turned = rotatePart(board.parts[ref.index]);
        if (!fitsOnBoard(turned, board)) continue;
        members.push_back(std::make_unique<netcheck::edit::ReplacePart>(board, ref.index, turned, "Rotate " + turned.ref));
    }
    if (members.empty()) return;
    if (members.size() == 1) c.commands.perform(std::move(members.front()));
    else c.commands.perform(std::make_unique<netcheck::edit::CompoundCommand>("Rotate parts", std::move(members)));
}

void nudgeSelection(const EditContext& c, int rows, int cols) {
    const auto& board = c.doc.board();
    for (const ElementRef& ref : c.selection)
        for (const Hole& h : holesOf(board, ref))
            if (!board.contains({h.row + rows, h.col + cols})) return;
    c.commands.perform(moveCommand(board, c.selection, rows, cols), kMergeArrowMove);
}

std::unique_ptr<netcheck::edit::Command> moveCommand(const netcheck::Board& board, const Selected& selection,
                                                     int rows, int cols) {
    if (rows == 0 && cols == 0) return nullptr;
    std::vector<ElementRef> inHoles;
    std::vector<std::size_t> offboard;
    for (const ElementRef& ref : selection) {
        if (ref.kind != ElementRef::Kind::Offboard) inHoles.push_back(ref);
        else if (ref.index < board.offboard.size()) offboard.push_back(ref.index);
    }
    std::vector<std::unique_ptr<netcheck::edit::Command>> members;
    if (auto moved = netcheck::edit::moveElements(board, inHoles, rows, cols)) members.push_back(std::move(moved));
    if (!offboard.empty()) {
        const std::vector<OffboardSpot> spots = layoutOffboard(board);
        for (std::size_t index : offboard) {
            const netcheck::OffboardPart& part = board.offboard[index];
            const ImVec2 corner{spots[index].min.x + static_cast<float>(cols), spots[index].min.y + static_cast<float>(rows)};
            members.push_back(std::make_unique<netcheck::edit::ReplaceOffboard>(board, index, placedAt(part, corner),
                                                                                "Move " + part.ref));
        }
    }
    if (members.empty()) return nullptr;
    if (members.size() == 1) return std::move(members.front());
    return std::make_unique<netcheck::edit::CompoundCommand>("Move " + std::to_string(selection.size()) + " items",
                                                             std::move(members));
}

ClipboardContent copyOf(const netcheck::Board& board, const Selected& selection) {
    ClipboardContent clip;
    Hole corner{INT_MAX, INT_MAX};
    for (const ElementRef& ref : selection)
        for (const Hole& h : holesOf(board, ref)) corner = {std::min(corner.row, h.row), std::min(corner.col, h.col)};
    if (corner.row == INT_MAX) return clip;
    auto rel = [&](Hole h) { return Hole{h.row - corner.row, h.col - corner.col}; };
    for (const ElementRef& ref : selection) {
        switch (ref.kind) {
        case ElementRef::Kind::Part: clip.parts.push_back(movePart(board.parts[ref.index], -corner.row, -corner.col)); break;
        case ElementRef::Kind::Link: {
            netcheck::Link link = board.links[ref.index];
            link.from = rel(link.from);
            link.to = rel(link.to);
            clip.links.push_back(link);
            break;
        }
        case ElementRef::Kind::Cut: {
            netcheck::Cut cut = board.cuts[ref.index];
            cut.hole = rel(cut.hole);
            clip.cuts.push_back(cut);
            break;
        }
        default: break;  // wires and off-board parts are not copied: they belong to one build
        }
    }
    return clip;
}

std::unique_ptr<netcheck::edit::Command> pasteCommand(const netcheck::Board& board, const ClipboardContent& clip,
                                                      Hole at, std::string* reason) {
    std::vector<std::unique_ptr<netcheck::edit::Command>> members;
    netcheck::Board scratch = board;  // to number refs as they are taken
    auto fits = [&](Hole h) { return board.contains({h.row + at.row, h.col + at.col}); };
    for (const netcheck::Part& p : clip.parts) {
        netcheck::Part part = movePart(p, at.row, at.col);
        if (!fitsOnBoard(part, board)) {
            if (reason) *reason = "The pasted parts would not fit on the board there.";
            return nullptr;
        }
        if (refTaken(scratch, part.ref)) part.ref = nextFreeRef(scratch, prefixOf(part.ref));
        scratch.parts.push_back(part);
        members.push_back(std::make_unique<netcheck::edit::AddPart>(part));
    }
    for (netcheck::Link link : clip.links) {
        if (!fits(link.from) || !fits(link.to)) {
            if (reason) *reason = "The pasted links would not fit on the board there.";
            return nullptr;
        }
        link.from = {link.from.row + at.row, link.from.col + at.col};
        link.to = {link.to.row + at.row, link.to.col + at.col};
        members.push_back(std::make_unique<netcheck::edit::AddLink>(link));
    }
    for (netcheck::Cut cut : clip.cuts) {
        cut.hole = {cut.hole.row + at.row, cut.hole.col + at.col};
        if (!board.contains(cut.hole) || std::find(board.cuts.begin(), board.cuts.end(), cut) != board.cuts.end()) continue;
        members.push_back(std::make_unique<netcheck::edit::AddCut>(cut));
    }
    if (members.empty()) return nullptr;
    return std::make_unique<netcheck::edit::CompoundCommand>("Paste", std::move(members));
}

void copySelection(const EditContext& c) {
    c.clipboard = copyOf(c.doc.board(), c.selection);
    if (!c.clipboard.empty()) c.commands.say("Copied");
}

void paste(const EditContext& c, std::optional<Hole> at) {
    if (c.clipboard.empty()) return;
    const Hole where = at.value_or(Hole{1, 1});
    std::string reason;
    auto command = pasteCommand(c.doc.board(), c.clipboard, where, &reason);
    if (!command) {
        if (!reason.empty()) c.commands.say(reason);
        return;
    }
    const auto& board = c.doc.board();
    const std::size_t parts = board.parts.size(), links = board.links.size(), cuts = board.cuts.size();
    if (!c.commands.perform(std::move(command))) return;
    c.selection.clear();
    const auto& after = c.doc.board();
    for (std::size_t i = parts; i < after.parts.size(); ++i) c.selection.insert({ElementRef::Kind::Part, i});
    for (std::size_t i = links; i < after.links.size(); ++i) c.selection.insert({ElementRef::Kind::Link, i});
    for (std::size_t i = cuts; i < after.cuts.size(); ++i) c.selection.insert({ElementRef::Kind::Cut, i});
}

void duplicateSelection(const EditContext& c) {
    const auto& board = c.doc.board();
    Hole corner{INT_MAX, INT_MAX};
    for (const ElementRef& ref : c.selection)
        for (const Hole& h : holesOf(board, ref)) corner = {std::min(corner.row, h.row), std::min(corner.col, h.col)};
    if (corner.row == INT_MAX) return;
    c.clipboard = copyOf(board, c.selection);
    paste(c, Hole{corner.row + 1, corner.col + 1});
}

void selectAll(const EditContext& c) {
    const auto& b = c.doc.board();
    c.selection.clear();
    for (std::size_t i = 0; i < b.parts.size(); ++i) c.selection.insert({ElementRef::Kind::Part, i});
    for (std::size_t i = 0; i < b.links.size(); ++i) c.selection.insert({ElementRef::Kind::Link, i});
    for (std::size_t i = 0; i < b.cuts.size(); ++i) c.selection.insert({ElementRef::Kind::Cut, i});
    for (std::size_t i = 0; i < b.wires.size(); ++i) c.selection.insert({ElementRef::Kind::Wire, i});
    for (std::size_t i = 0; i < b.offboard.size(); ++i) c.selection.insert({ElementRef::Kind::Offboard, i});
}

}  // namespace stripsmith
