// The check result as printed: one banner line that cannot be missed, and the findings.
#pragma once

#include <string>

#include <cairo.h>

#include "netcheck/check/check_report.hpp"
#include "page_layout.hpp"

namespace sheet {

/// What the banner says and how loudly.
struct CheckBanner {
    enum class Tone { Passed, Caution, Failed };
    Tone tone = Tone::Passed;
    std::string text;
};

/// Words of the banner for a report (errors, warnings, and whether there was a circuit).
CheckBanner checkBanner(const netcheck::CheckReport& report);

/// Draws the banner as a filled box across `area` (height about 6 mm); returns its height.
double drawCheckBanner(cairo_t* cr, const Rect& area, const CheckBanner& banner);

}  // namespace sheet
