// The calibration bar: a 50 mm scale and a 10-hole ruler, to prove the print is at true scale.
#pragma once

#include <cairo.h>

#include "page_layout.hpp"

namespace sheet {

/// Length of the millimetre scale.
inline constexpr double kCalibrationLengthMm = 50.0;

/// Draws the instruction line, the 50 mm scale and a ruler of 10 hole pitches inside `area`.
void drawCalibrationBar(cairo_t* cr, const Rect& area, double pitchMm);

}  // namespace sheet
