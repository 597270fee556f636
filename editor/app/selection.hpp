// The selected board elements: what the canvas outlines, the Properties panel edits and the Edit
// menu acts on. View state: never in the document and never in undo.
#pragma once

#include <set>

#include "netcheck/edit/selection_commands.hpp"

namespace stripsmith {

using Selected = std::set<netcheck::edit::ElementRef>;

}  // namespace stripsmith
