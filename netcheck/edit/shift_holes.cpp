#include "netcheck/edit/shift_holes.hpp"

namespace netcheck::edit {

namespace {

void shift(Hole& hole, int rows, int cols) {
    hole.row += rows;
    hole.col += cols;
}

}  // namespace

void shiftHoles(Cut& cut, int rows, int cols) { shift(cut.hole, rows, cols); }

void shiftHoles(Part& part, int rows, int cols) {
    for (Pin& pin : part.pins) shift(pin.hole, rows, cols);
}

void shiftHoles(Link& link, int rows, int cols) {
    shift(link.from, rows, cols);
    shift(link.to, rows, cols);
}

void shiftHoles(Wire& wire, int rows, int cols) {
    if (wire.from.hole) shift(*wire.from.hole, rows, cols);
    if (wire.to.hole) shift(*wire.to.hole, rows, cols);
}

}  // namespace netcheck::edit
