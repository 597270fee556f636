// Commands on wire links between holes: add, remove, replace (move, stretch, side).
#pragma once

#include <string>
#include <vector>

#include "netcheck/edit/element_commands.hpp"

namespace netcheck::edit {

/// The board's links, for the element commands. Labels: "Add link A1–C1", "Remove link A1–C1",
/// "Move link A1–C1", "Edit link A1–C1" (side or drawing hints only).
struct LinkList {
    using Element = Link;
    static std::vector<Link>& of(Board& board) { return board.links; }
    static const std::vector<Link>& of(const Board& board) { return board.links; }
    static std::string addLabel(const Link& link);
    static std::string removeLabel(const Link& link);
    static std::string changeLabel(const Link& before, const Link& after);
    static std::vector<Hole> holes(const Link& link);
};

/// Adds a link (at the end of the list unless an index is given).
using AddLink = AddElement<LinkList>;
/// Removes the link at an index.
using RemoveLink = RemoveElement<LinkList>;
/// Replaces the link at an index; consecutive replaces of the same link merge (drags).
using ReplaceLink = ReplaceElement<LinkList>;

}  // namespace netcheck::edit
