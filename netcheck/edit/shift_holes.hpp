// Moving every hole reference of a board element by whole holes.
#pragma once

#include "netcheck/model/board.hpp"

namespace netcheck::edit {

/// Adds `rows` and `cols` to every hole the element names. Wire ends at lugs stay as they are.
void shiftHoles(Cut& cut, int rows, int cols);
void shiftHoles(Part& part, int rows, int cols);
void shiftHoles(Link& link, int rows, int cols);
void shiftHoles(Wire& wire, int rows, int cols);

}  // namespace netcheck::edit
