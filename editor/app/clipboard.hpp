// What Ctrl+C copied, kept for Ctrl+V and Ctrl+D.
#pragma once

#include <vector>

#include "netcheck/model/board.hpp"

namespace stripsmith {

/// Elements copied with Ctrl+C, positions relative to their top-left hole.
struct ClipboardContent {
    std::vector<netcheck::Part> parts;
    std::vector<netcheck::Link> links;
    std::vector<netcheck::Cut> cuts;
    bool empty() const { return parts.empty() && links.empty() && cuts.empty(); }
};

}  // namespace stripsmith
