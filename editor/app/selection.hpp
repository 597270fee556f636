// What is selected on the canvas. Parts and off-board parts by ref, links and wires by index,
// cuts by value; cleared whenever indexes may have shifted (undo, redo, delete).
#pragma once

#include <set>
#include <string>

#include "netcheck/board.hpp"

namespace stripsmith {

struct Selection {
    std::set<std::string> parts;
    std::set<std::string> offboard;
    std::set<std::size_t> links;
    std::set<std::size_t> wires;
    std::set<netcheck::Cut> cuts;

    bool empty() const {
        return parts.empty() && offboard.empty() && links.empty() && wires.empty() && cuts.empty();
    }
    std::size_t size() const {
        return parts.size() + offboard.size() + links.size() + wires.size() + cuts.size();
    }
    void clear() { *this = Selection{}; }
};

}  // namespace stripsmith
